package org.tjmargin.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.tjmargin.solve.CornerPoint;
import org.tjmargin.solve.PositionAtAmbient;
import org.tjmargin.surge.DoubleExponentialPulse;
import org.tjmargin.surge.LoadDumpPulse;
import org.tjmargin.surge.LoadDumpSystem;
import org.tjmargin.surge.PositionSurges;
import org.tjmargin.surge.SurgeCase;
import org.tjmargin.surge.SurgeRating;
import org.tjmargin.surge.SurgeResult;
import org.tjmargin.surge.TheveninSource;
import org.tjmargin.thermal.FosterPulse;
import org.tjmargin.circuit.CurrentFedSpec;
import org.tjmargin.circuit.LoadRange;
import org.tjmargin.circuit.ShuntRegulatorSpec;
import org.tjmargin.circuit.StandoffClampSpec;
import org.tjmargin.derating.Policy;
import org.tjmargin.device.BreakdownPart;
import org.tjmargin.device.Celsius;
import org.tjmargin.device.KneeModel;
import org.tjmargin.device.VzTestCondition;
import org.tjmargin.solve.Analysis;
import org.tjmargin.solve.AnalysisResult;
import org.tjmargin.solve.Board;
import org.tjmargin.solve.MaximumAmbient;
import org.tjmargin.solve.PositionResult;
import org.tjmargin.solve.PositionSpec;
import org.tjmargin.solve.SolverSettings;
import org.tjmargin.solve.Verdict;
import org.tjmargin.thermal.AxialLeadMount;
import org.tjmargin.thermal.Enclosure;
import org.tjmargin.thermal.SurfaceMountPad;
import org.tjmargin.variation.Range;

/** The demo scenario: parse then map, in YAML and in JSON, and the tuning that keeps D1 near its limit. */
class DemoDesignTest {

    static final Path DEMO = Path.of("demo/design.yaml");
    static final Path JSON_MIRROR = Path.of("src/test/resources/design/design.json");

    @Test
    void demoMapsEveryPositionIntoTheDomain() {
        LoadedDesign d = DesignLoader.load(DEMO);
        Board b = d.board();
        assertEquals("demo-field-interface", d.designName());
        assertEquals(Optional.of("general-commercial"), d.policy());
        assertEquals(List.of("D1", "D2", "D3", "D4"), b.positions().stream().map(PositionSpec::id).toList());
        assertEquals(new Enclosure.SealedBox(0.09, 6.0, 2.0), b.enclosure());
        assertEquals(Celsius.toKelvin(-20), b.ambient().minK(), 1e-12);
        assertEquals(Celsius.toKelvin(55), b.ambient().maxK(), 1e-12);
        assertEquals(76, b.ambient().points());

        PositionSpec d1 = b.positions().get(0);
        assertInstanceOf(AxialLeadMount.class, d1.path());
        ShuntRegulatorSpec shunt = assertInstanceOf(ShuntRegulatorSpec.class, d1.circuit());
        assertEquals(new Range(19.2, 24.0, 28.0), shunt.supplyV());
        assertEquals(390 * 0.99, shunt.resistor().ohm().lo(), 1e-9);
        assertEquals(new LoadRange.Current(new Range(2e-3, 8.5e-3, 15e-3)), shunt.load());
        assertEquals(0.85, d1.rThetaFactor().lo(), 1e-12);
        // Vz 12 V ± 5 %.
        assertEquals(0.6, d1.vzShiftV().hi(), 1e-12);
        BreakdownPart p1 = d1.part();
        assertInstanceOf(KneeModel.CurrentDependent.class, p1.model().knee());
        // 0.077 %/K of 12 V.
        assertEquals(9.24e-3, p1.model().tc().alphaVPerK(), 1e-15);
        assertEquals(0.065e-2 * 12, d1.alphaVPerK().lo(), 1e-15);
        assertEquals(0.085e-2 * 12, d1.alphaVPerK().hi(), 1e-15);

        PositionSpec d2 = b.positions().get(1);
        assertInstanceOf(SurfaceMountPad.class, d2.path());
        assertEquals(new CurrentFedSpec(Range.relative(5e-3, 0.1)), d2.circuit());
        assertTrue(d2.part().model().tc().estimated());
        assertTrue(d2.allNotes().stream().anyMatch(n -> n.startsWith("temperature coefficient estimated from Vz")),
                d2.allNotes()::toString);

        PositionSpec d3 = b.positions().get(2);
        assertEquals(BreakdownPart.Kind.TVS, d3.part().kind());
        assertEquals(28.0, d3.part().standoffV());
        assertEquals(new StandoffClampSpec(new Range(21.6, 24.0, 26.4), 0.5), d3.circuit());
        assertTrue(d3.part().model().leakage().isKnown());
        // Case-referenced curve: the pad's reference resistance is the part's Rθjc.
        assertEquals(20.0, d3.path().rThetaJrKPerW(), 1e-12);
        assertTrue(d3.surges().isEmpty());

        PositionSpec d4 = b.positions().get(3);
        PositionSurges surges = d4.surges().orElseThrow();
        assertEquals(List.of("cwg-1kv", "load-dump"), surges.cases().stream().map(SurgeCase::id).toList());
        SurgeCase cwg = surges.cases().get(0);
        assertEquals(5, cwg.pulseCount());
        assertEquals(60.0, cwg.periodS(), 1e-12);
        assertEquals(60.0, cwg.protectedLimitV().getAsDouble(), 1e-12);
        // 1.2/50 µs open-circuit voltage behind 2 Ω (IEC 61000-4-5, reference 4.2) plus the 10 Ω coupling.
        assertEquals(new TheveninSource(DoubleExponentialPulse.voltage1p2x50(1000), 12.0), cwg.source());
        assertEquals(LoadDumpPulse.testA(LoadDumpSystem.TWELVE_VOLT, 79, 4, 0.040).source(), surges.cases().get(1).source());
        SurgeRating rating = surges.rating();
        assertEquals(5000, rating.ratedPeakPowerW(), 1e-9);
        assertEquals(FosterPulse.exponentialDecay(1e-3), rating.ratedPulse());
        assertEquals(Celsius.toKelvin(175), rating.pulseTjMaxK(), 1e-9);
        assertEquals(SurgeRating.NetworkSource.SEMI_INFINITE_DIE_ESTIMATE, rating.networkSource());
        assertTrue(d4.allNotes().stream().anyMatch(n -> n.startsWith("surge transient thermal impedance not given")),
                d4.allNotes()::toString);
    }

    @Test
    void d4SurvivesItsSurgesFromTheSteadyStateAndPasses() {
        Policy policy = ProfileLoader.shipped("general-commercial").policy().withBuiltInMinimum();
        AnalysisResult r = Analysis.run(DesignLoader.load(DEMO).board(), policy, SolverSettings.DEFAULT);
        PositionResult d4 = r.positions().get(3);
        assertEquals(Verdict.PASS, d4.verdict());
        PositionAtAmbient hot = r.atMaximumAmbient().positions().get(3);
        CornerPoint worst = hot.worstCornerForSurge("load-dump", Celsius.toKelvin(175)).orElseThrow();
        SurgeResult dump = worst.surge("load-dump").orElseThrow();
        // Item 5: the surge starts from the corner's converged steady state.
        assertEquals(worst.point().orElseThrow().tjK(), dump.startTjK(), 0.0);
        assertTrue(dump.peakJunctionTemperatureK() > dump.startTjK() + 10, () -> "peak " + dump.peakJunctionTemperatureK());
        // Every surge rule of the built-in minimum is checked at 55 °C.
        List<String> ids = hot.worst().stream().map(w -> w.check().ruleId()).toList();
        assertTrue(ids.containsAll(List.of("surge-tj-below-max", "surge-within-rating", "clamp-within-protected-limit")),
                ids::toString);
        assertEquals(Verdict.PASS, r.verdict());
    }

    @Test
    void equilibriumMeasurementBacksOutTheSelfHeatingThroughThePartsOwnLeads() {
        LibraryPart lp = DesignLoader.loadParts(Path.of("demo/parts.yaml")).part("demo-zener-12v-1w").orElseThrow();
        PackageSpec.Axial axial = assertInstanceOf(PackageSpec.Axial.class, lp.pkg());
        // 150 K/W to the lead at 9.5 mm: the rating's 1 W / 6.67 mW/K (design 5), so Rint = 150 − (L/(k·A))/2.
        assertTrue(axial.internalFromRating());
        double rHeld = axial.junctionToLeadKPerW(9.5e-3);
        assertEquals(1.0 / 6.67e-3, rHeld, 1e-9);
        double tjTest = new VzTestCondition.ThermalEquilibrium(Celsius.toKelvin(30), rHeld)
                .junctionTemperatureK(12.0, 21e-3);
        // Vz0(25 °C) = Vz − Zzt·Izt − αV·(Tj_test − 25 °C), design 2.1.
        double expected = 12.0 - 9.0 * 21e-3 - 9.24e-3 * (tjTest - Celsius.T25_K);
        assertEquals(expected, lp.part().model().vz0At25V(), 1e-12);
    }

    @Test
    void inputsAreRecordedWithTheirHashes() throws IOException {
        LoadedDesign d = DesignLoader.load(DEMO);
        assertEquals(List.of(Path.of("demo/design.yaml"), Path.of("demo/parts.yaml")),
                d.inputs().stream().map(InputFile::path).toList());
        assertEquals(SourceFile.sha256Of(Files.readAllBytes(DEMO)), d.inputs().get(0).sha256());
        assertEquals(SourceFile.sha256Of(Files.readAllBytes(Path.of("demo/parts.yaml"))), d.inputs().get(1).sha256());
        assertEquals(d.inputs().get(0), d.designFile());
    }

    @Test
    void sha256MatchesTheStandardTestVector() {
        // FIPS 180-2, appendix B.1: SHA-256("abc").
        assertEquals("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad",
                SourceFile.sha256Of("abc".getBytes(java.nio.charset.StandardCharsets.US_ASCII)));
    }

    @Test
    void jsonMirrorMapsToTheSameBoard() {
        assertEquals(DesignLoader.load(DEMO).board(), DesignLoader.load(JSON_MIRROR).board());
        assertEquals(DesignLoader.load(DEMO).statistics(), DesignLoader.load(JSON_MIRROR).statistics());
    }

    @Test
    void d1IsNearItsLimitAt55CButPasses() {
        Policy policy = ProfileLoader.shipped("general-commercial").policy().withBuiltInMinimum();
        AnalysisResult r = Analysis.run(DesignLoader.load(DEMO).board(), policy, SolverSettings.DEFAULT);
        PositionResult d1 = r.positions().get(0);
        assertEquals(Verdict.PASS, d1.verdict());
        assertEquals("tj-limit", d1.limitingRuleId());
        // Tuned by hand (invented demo): the hottest corner at 55 °C reaches about 172 °C against the profile's
        // 180 °C (Tj max 200 °C − 20 K).
        assertTrue(d1.worstMargin() > 0 && d1.worstMargin() < 0.06, () -> "margin " + d1.worstMargin());
        assertEquals(MaximumAmbient.Status.FOUND, d1.maxAmbient().status());
        double maxC = Celsius.toCelsius(d1.maxAmbient().ambientK());
        assertTrue(maxC > 55 && maxC < 65, () -> "maximum ambient " + maxC + " °C");
        assertEquals(Verdict.PASS, r.verdict());
    }
}
