package org.tjmargin.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tjmargin.circuit.LoadRange;
import org.tjmargin.circuit.ShuntRegulatorSpec;
import org.tjmargin.device.BreakdownPart;
import org.tjmargin.device.Celsius;
import org.tjmargin.device.KneeModel;
import org.tjmargin.device.PowerRatingCurve;
import org.tjmargin.device.RatingReference;
import org.tjmargin.solve.PositionSpec;
import org.tjmargin.thermal.Enclosure;
import org.tjmargin.thermal.GivenPath;
import org.tjmargin.thermal.LeadConduction;
import org.tjmargin.thermal.SurfaceMountPad;
import org.tjmargin.variation.Range;

/** How each key of the format maps into the domain: defaults, conversions, alternatives and notes. */
class MappingTest {

    @TempDir
    Path dir;

    /** A part with the given ratings/package/extra blocks (YAML, indented as list-item content). */
    private static String part(String id, String extra) {
        return "  - id: " + id + "\n"
                + "    kind: zener\n"
                + "    breakdown: {vz: 10 V, tolerance: 5 %, test-current: 20 mA, impedance: 5 Ω, knee-current: 1 mA}\n"
                + extra;
    }

    private static final String AXIAL_LEAD = "    ratings:\n"
            + "      tj-max: 175 °C\n"
            + "      power: 1 W\n"
            + "      derating: {reference: lead, reference-distance: 10 mm, knee: 25 °C}\n"
            + "    package: {axial: {lead-diameter: 1 mm, lead-conductivity: 400 W/(m·K)}}\n";

    private PartsLibrary parts(String text) throws IOException {
        Path p = dir.resolve("parts.yaml");
        Files.writeString(p, "parts:\n" + text);
        return DesignLoader.loadParts(p);
    }

    private BreakdownPart onlyPart(String text) throws IOException {
        return parts(text).parts().values().iterator().next().part();
    }

    private LoadedDesign design(String partsText, String position, String extraTop) throws IOException {
        Files.writeString(dir.resolve("parts.yaml"), "parts:\n" + partsText
                + "resistors:\n  - {id: r, power: 0.5 W, derating: {knee: 70 °C, slope: 5 mW/K}}\n");
        Path d = dir.resolve("design.yaml");
        Files.writeString(d, "design: t\nparts: parts.yaml\nambient: {min: 0 °C, max: 40 °C, step: 15 K}\n"
                + "enclosure: {open-air: true}\n" + extraTop + "positions:\n" + position);
        return DesignLoader.load(d);
    }

    @Test
    void toleranceAndPercentPerKelvinConvertAtTheNominalVoltage() throws IOException {
        BreakdownPart p = onlyPart(part("a", AXIAL_LEAD).replace("knee-current: 1 mA}",
                "knee-current: 1 mA, temperature-coefficient: 0.06 %/K}"));
        assertEquals(0.05, p.vzTolerance(), 1e-15);
        // αV = tc/100 · Vz_nom (design 2.1): 0.06 %/K of 10 V is 6 mV/K.
        assertEquals(6e-3, p.model().tc().alphaVPerK(), 1e-15);
        assertInstanceOf(KneeModel.Linear.class, p.model().knee());
        // Default maximum current P/Vz, noted.
        assertEquals(0.1, p.ratings().izmA(), 1e-15);
        assertTrue(p.estimates().stream().anyMatch(n -> n.startsWith("maximum current not given")));
    }

    @Test
    void voltsPerKelvinIsReadAsIs() throws IOException {
        BreakdownPart p = onlyPart(part("a", AXIAL_LEAD).replace("knee-current: 1 mA}",
                "knee-current: 1 mA, temperature-coefficient: -2 mV/K}"));
        assertEquals(-2e-3, p.model().tc().alphaVPerK(), 1e-15);
    }

    @Test
    void defaultCurveEndsAtTjMaxAndDefaultTestIsAPulseAt25C() throws IOException {
        BreakdownPart p = onlyPart(part("a", AXIAL_LEAD));
        PowerRatingCurve c = p.ratings().powerCurve();
        assertEquals(Celsius.toKelvin(175), c.zeroPowerTemperatureK(), 1e-12);
        assertEquals(RatingReference.LEAD, c.reference());
        assertEquals(0.01, c.referenceLengthM(), 1e-15);
        // Pulse at 25 °C: Vz0 = Vz − Zzt·Izt.
        assertEquals(10 - 5 * 0.02, p.model().vz0At25V(), 1e-12);
    }

    @Test
    void slopeDisagreeingWithTjMaxIsNotedNotRefused() throws IOException {
        // 1 W/(175 − 25) K = 6.67 mW/K expected; 8 mW/K given.
        BreakdownPart p = onlyPart(part("a", AXIAL_LEAD.replace("knee: 25 °C}", "knee: 25 °C, slope: 8 mW/K}")));
        assertTrue(p.estimates().stream().anyMatch(n -> n.contains("8 mW/K") && n.contains("6.67 mW/K")),
                p.estimates()::toString);
        assertEquals(Celsius.toKelvin(25 + 125), p.ratings().powerCurve().zeroPowerTemperatureK(), 1e-9);
        BreakdownPart close = onlyPart(part("a", AXIAL_LEAD.replace("knee: 25 °C}", "knee: 25 °C, slope: 6.7 mW/K}")));
        assertTrue(close.estimates().stream().noneMatch(n -> n.contains("slope")), close.estimates()::toString);
    }

    @Test
    void equilibriumWithAGivenResistanceAndPulseAtAnotherTemperature() throws IOException {
        String given = "    ratings: {tj-max: 150 °C, power: 0.5 W, derating: {reference: ambient, knee: 25 °C}}\n"
                + "    package: {given: {rtheta-ja: 300 K/W}}\n";
        BreakdownPart eq = onlyPart(part("a", given).replace("knee-current: 1 mA}", "knee-current: 1 mA,"
                + " temperature-coefficient: 5 mV/K, measured: {at: equilibrium, held-temperature: 25 °C,"
                + " held-rtheta: 200 K/W}}"));
        // Tj_test = 25 °C + Vz·Izt·Rθ = 25 °C + 10 V · 20 mA · 200 K/W = 65 °C.
        assertEquals(10 - 5 * 0.02 - 5e-3 * 40, eq.model().vz0At25V(), 1e-12);
        BreakdownPart pulse = onlyPart(part("a", given).replace("knee-current: 1 mA}", "knee-current: 1 mA,"
                + " temperature-coefficient: 5 mV/K, measured: {at: pulse, junction-temperature: 35 °C}}"));
        assertEquals(10 - 5 * 0.02 - 5e-3 * 10, pulse.model().vz0At25V(), 1e-12);
    }

    @Test
    void ratingPointsAreKeptAsGiven() throws IOException {
        BreakdownPart p = onlyPart(part("a", AXIAL_LEAD.replace("{reference: lead, reference-distance: 10 mm, knee: 25 °C}",
                "{reference: lead, reference-distance: 10 mm, points: [{temperature: 25 °C, power: 1 W},"
                        + " {temperature: 100 °C, power: 0.4 W}, {temperature: 175 °C, power: 0 W}]}")));
        assertEquals(List.of(new PowerRatingCurve.Point(Celsius.toKelvin(25), 1.0),
                new PowerRatingCurve.Point(Celsius.toKelvin(100), 0.4),
                new PowerRatingCurve.Point(Celsius.toKelvin(175), 0.0)), p.ratings().powerCurve().points());
    }

    @Test
    void axialInternalResistanceIsCalibratedFromALeadCurve() throws IOException {
        LibraryPart lp = parts(part("a", AXIAL_LEAD)).part("a").orElseThrow();
        PackageSpec.Axial a = assertInstanceOf(PackageSpec.Axial.class, lp.pkg());
        double leads = LeadConduction.resistanceKPerW(0.01, 1e-3, 400) / 2;
        // Implied Rθjl(10 mm) = (175 − 25) K / 1 W.
        assertEquals(150 - leads, a.internalKPerW(), 1e-9);
    }

    @Test
    void axialPartWithoutInternalNeedsALeadCurve() throws IOException {
        String text = part("a", AXIAL_LEAD.replace("{reference: lead, reference-distance: 10 mm, knee: 25 °C}",
                "{reference: ambient, knee: 25 °C}"));
        InputException e = assertThrows(InputException.class, () -> parts(text));
        InputProblem p = e.problems().get(0);
        assertEquals(InputProblem.Kind.MISSING_FIELD, p.kind());
        assertEquals("parts[0].package.axial.internal", p.field());
    }

    @Test
    void mountingComposesTheThermalPath() throws IOException {
        String lib = part("ax", AXIAL_LEAD)
                + part("sm", "    ratings: {tj-max: 150 °C, power: 0.5 W, derating: {reference: ambient, knee: 25 °C}}\n"
                        + "    package: {surface-mount: {rtheta-ja: [{copper-area: 10 mm², rtheta: 300 K/W}]}}\n")
                + part("gv", "    ratings: {tj-max: 150 °C, power: 0.5 W, derating: {reference: case, knee: 100 °C}}\n"
                        + "    package: {given: {rtheta-ja: 250 K/W}}\n");
        String positions = "  - {id: A, part: ax, mounting: {lead-length: 5 mm, tie-point: 20 K/W},"
                + " circuit: {current-fed: {current: 5 mA}}}\n"
                + "  - {id: S, part: sm, mounting: {copper-area: 40 mm²}, circuit: {current-fed: {current: 5 mA}}}\n"
                + "  - {id: G, part: gv, circuit: {current-fed: {current: 5 mA}}}\n"
                + "  - {id: O, part: ax, mounting: {rtheta-ja: 90 K/W}, circuit: {current-fed: {current: 5 mA}}}\n";
        List<PositionSpec> ps = design(lib, positions, "").board().positions();
        double internal = 150 - LeadConduction.resistanceKPerW(0.01, 1e-3, 400) / 2;
        assertEquals(internal + LeadConduction.resistanceKPerW(0.005, 1e-3, 400) / 2 + 20,
                ps.get(0).path().rThetaJaKPerW(), 1e-9);
        SurfaceMountPad pad = assertInstanceOf(SurfaceMountPad.class, ps.get(1).path());
        // One table point: Rθja ∝ A^(−1/2), 300 K/W at 10 mm² → 150 K/W at 40 mm²; ambient reference → Rθja.
        assertEquals(150, pad.rThetaJaKPerW(), 1e-9);
        assertEquals(150, pad.rThetaJrKPerW(), 1e-9);
        // Given, case reference: Rθjr = min(implied (150 − 100) K / 0.5 W = 100 K/W, Rθja).
        assertEquals(new GivenPath(250, 100, List.of()), ps.get(2).path());
        // Override on a lead-referenced axial part: min(implied 150 K/W, 90 K/W).
        assertEquals(new GivenPath(90, 90, List.of()), ps.get(3).path());
    }

    @Test
    void tolerancesOverrideThePart() throws IOException {
        String pos = "  - id: D1\n    part: a\n    mounting: {lead-length: 5 mm, tie-point: 20 K/W}\n"
                + "    circuit:\n      shunt-regulator:\n        supply: {nominal: 12 V, tolerance: 10 %}\n"
                + "        series-resistor: {resistor: r, value: 100 Ω}\n"
                + "        load: {resistance: {min: 1 kΩ, max: 2 kΩ}}\n"
                + "    tolerances: {thermal-resistance: 20 %, vz: 2 %,"
                + " temperature-coefficient: {min: 0.01 %/K, max: 3 mV/K}}\n";
        LoadedDesign d = design(part("a", AXIAL_LEAD), pos, "policy: company-default\n");
        assertEquals(java.util.Optional.of("company-default"), d.policy());
        PositionSpec p = d.board().positions().get(0);
        assertEquals(new Range(-0.2, 0, 0.2), p.vzShiftV());
        assertEquals(new Range(0.8, 1.0, 1.2), p.rThetaFactor());
        assertEquals(1e-3, p.alphaVPerK().lo(), 1e-15);
        assertEquals(3e-3, p.alphaVPerK().hi(), 1e-15);
        ShuntRegulatorSpec s = assertInstanceOf(ShuntRegulatorSpec.class, p.circuit());
        assertEquals(10.8, s.supplyV().lo(), 1e-12);
        assertEquals(Range.exact(100), s.resistor().ohm());
        assertEquals(new LoadRange.Resistive(new Range(1000, 1500, 2000)), s.load());
        // The resistor's curve: 0.5 W to 70 °C, 5 mW/K to zero at 170 °C, against its ambient.
        assertEquals(Celsius.toKelvin(170), s.resistor().rating().zeroPowerTemperatureK(), 1e-9);
        assertEquals(RatingReference.AMBIENT, s.resistor().rating().reference());
        // Step 15 K over 40 K: the fewest equal steps not above 15 K are three, so four points.
        assertEquals(4, d.board().ambient().points());
        assertEquals(new Enclosure.FixedRise(0), d.board().enclosure());
    }

    @Test
    void estimatedCoefficientIsNotedAtThePosition() throws IOException {
        String pos = "  - {id: D1, part: a, mounting: {lead-length: 5 mm, tie-point: 20 K/W},"
                + " circuit: {standoff-clamp: {line: 5 V}}}\n";
        PositionSpec p = design(part("a", AXIAL_LEAD), pos, "").board().positions().get(0);
        assertTrue(p.part().model().tc().estimated());
        assertTrue(p.allNotes().get(0).startsWith("temperature coefficient estimated from Vz"), p.allNotes()::toString);
        // The part's estimated range becomes the position's corner range.
        assertTrue(p.alphaVPerK().varies());
    }

    @Test
    void problemsOfBothFilesAreReportedTogether() throws IOException {
        String lib = part("a", AXIAL_LEAD.replace("power: 1 W", "power: -1 W"));
        String pos = "  - {id: D1, part: a, mounting: {lead-length: 5 mm, tie-point: 20 K/W},"
                + " circuit: {current-fed: {current: -5 mA}}}\n"
                + "  - {id: D2, part: nowhere, circuit: {current-fed: {current: 5 mA}}}\n";
        InputException e = assertThrows(InputException.class, () -> design(lib, pos, "colour: red\n"));
        // The design's problems first (it was read first), then the library's; a reference to a declared part that
        // failed its own checks is not reported again.
        assertEquals(List.of(InputProblem.Kind.UNKNOWN_KEY, InputProblem.Kind.NOT_PHYSICAL,
                InputProblem.Kind.UNKNOWN_REFERENCE, InputProblem.Kind.NOT_PHYSICAL),
                e.problems().stream().map(InputProblem::kind).toList());
        assertTrue(e.problems().get(0).file().endsWith("design.yaml"));
        assertTrue(e.problems().get(3).file().endsWith("parts.yaml"));
    }
}
