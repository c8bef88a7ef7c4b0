package org.tjmargin.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tjmargin.surge.RatingConversion;
import org.tjmargin.surge.SurgeCase;
import org.tjmargin.surge.SurgeRating;
import org.tjmargin.thermal.FosterNetwork;
import org.tjmargin.thermal.FosterPeakSearch;
import org.tjmargin.thermal.FosterPulse;
import org.tjmargin.thermal.PulseRatingFit;

/** How a part's surge data and a position's surges map into the domain. */
class SurgeMappingTest {

    @TempDir
    Path dir;

    private static final String PART = "parts:\n"
            + "  - id: c\n"
            + "    kind: tvs\n"
            + "    breakdown: {vz: 30 V, tolerance: 5 %, test-current: 5 mA, impedance: 2 Ω, knee-current: 0.5 mA}\n"
            + "    ratings: {tj-max: 150 °C, power: 5 W, derating: {reference: ambient, knee: 25 °C, zero-at: 150 °C}}\n"
            + "    package: {given: {rtheta-ja: 40 K/W}}\n"
            + "    clamp: {standoff: 26 V}\n"
            + "    surge:\n"
            + "      peak-pulse-power: 1.5 kW\n"
            + "      waveform: 10/1000 µs\n"
            + "      clamping-voltage: 48 V\n"
            + "      clamping-current: 31 A\n";

    private SurgeRating rating(String surgeExtra) throws IOException {
        Files.writeString(dir.resolve("parts.yaml"), PART + surgeExtra);
        Path d = dir.resolve("design.yaml");
        Files.writeString(d, "design: t\nparts: parts.yaml\nambient: {min: 0 °C, max: 40 °C, step: 20 K}\n"
                + "enclosure: {open-air: true}\npositions:\n"
                + "  - id: D1\n    part: c\n    circuit: {standoff-clamp: {line: {min: 12 V, max: 16 V}}}\n"
                + "    surges:\n      - {id: s, current-pulse: {waveform: 8/20, peak: 100 A}, protected-limit: 70 V}\n");
        LoadedDesign loaded = DesignLoader.load(d);
        SurgeCase c = loaded.board().positions().get(0).surges().orElseThrow().cases().get(0);
        assertEquals(70.0, c.protectedLimitV().getAsDouble(), 0.0);
        return loaded.board().positions().get(0).surges().orElseThrow().rating();
    }

    @Test
    void fosterStagesAreTakenAsGivenAndPulseTjMaxDefaultsToTjMax() throws IOException {
        SurgeRating r = rating("      transient: {foster: [{r: 0.5 K/W, tau: 100 µs}, {r: 4 K/W, tau: 10 ms}]}\n");
        assertEquals(FosterNetwork.of(new double[] {0.5, 4}, new double[] {1e-4, 1e-2}), r.network());
        assertEquals(SurgeRating.NetworkSource.GIVEN_FOSTER, r.networkSource());
        assertEquals(423.15, r.pulseTjMaxK(), 1e-9);
        assertEquals(FosterPulse.exponentialDecay(1e-3), r.ratedPulse());
    }

    @Test
    void aRatingCurveIsFittedSoThatItsPointsReachPulseTjMax() throws IOException {
        // Synthetic points on a √t curve, P ∝ 1/√width (reference 3.5: 1.5 kW at 1 ms → 4.74 kW at 100 µs).
        SurgeRating r = rating("      pulse-tj-max: 175 °C\n      transient:\n        stages: 2\n        rating-curve:\n"
                + "          - {width: 100 µs, power: 4.74 kW}\n          - {width: 300 µs, power: 2.74 kW}\n"
                + "          - {width: 1 ms, power: 1.5 kW}\n          - {width: 3 ms, power: 0.866 kW}\n");
        assertEquals(SurgeRating.NetworkSource.RATING_CURVE, r.networkSource());
        double p = PulseRatingFit.ratedPeakPowerW(r.network(), FosterPulse.exponentialDecay(1e-3), 448.15,
                FosterPeakSearch.defaults());
        assertEquals(1500, p, 0.03 * 1500);
    }

    @Test
    void withoutTransientDataTheDieEstimateIsFlagged() throws IOException {
        SurgeRating r = rating("");
        assertEquals(SurgeRating.NetworkSource.SEMI_INFINITE_DIE_ESTIMATE, r.networkSource());
        assertTrue(r.estimated());
        assertTrue(r.notes().stream().anyMatch(n -> n.startsWith("surge die area estimated")), r.notes()::toString);
        // The estimate settles near the position's steady Rθja (the cap of the fit).
        assertEquals(40.0, r.network().steadyStateKPerW(), 0.1 * 40);
        // Within the √t regime it reproduces the rating it was sized to (the rated pulse's rise to Tj max) to the fit's
        // accuracy: 1425 W against 1500 W with six stages over nine decades (a hotter network: conservative).
        double p = PulseRatingFit.ratedPeakPowerW(r.network(), FosterPulse.exponentialDecay(1e-3), r.pulseTjMaxK(),
                FosterPeakSearch.defaults());
        assertEquals(1500, p, 0.06 * 1500);
        assertEquals(0.292729, RatingConversion.EXPONENTIAL_EQUIVALENT_RECTANGLE_PER_TAU, 0.0);
    }

    @Test
    void positionsOfOnePartOnOneMountingShareTheirDieEstimate() throws IOException {
        // Three clamps of the same part: two on the part's own package path, one on a doubled Rθ (another steady
        // resistance, so another fit). The shared fit is the same network the first position's own fit gives.
        Files.writeString(dir.resolve("parts.yaml"), PART);
        Path d = dir.resolve("design.yaml");
        String clamp = "    part: c\n    circuit: {standoff-clamp: {line: {min: 12 V, max: 16 V}}}\n"
                + "    surges:\n      - {id: s, current-pulse: {waveform: 8/20, peak: 100 A}}\n";
        Files.writeString(d, "design: t\nparts: parts.yaml\nambient: {min: 0 °C, max: 40 °C, step: 20 K}\n"
                + "enclosure: {open-air: true}\npositions:\n"
                + "  - id: D1\n" + clamp + "  - id: D2\n" + clamp
                + "  - id: D3\n    mounting: {rtheta-ja: 80 K/W}\n" + clamp);
        var positions = DesignLoader.load(d).board().positions();
        FosterNetwork d1 = positions.get(0).surges().orElseThrow().rating().network();
        FosterNetwork d2 = positions.get(1).surges().orElseThrow().rating().network();
        FosterNetwork d3 = positions.get(2).surges().orElseThrow().rating().network();
        assertTrue(d1 == d2, "one fit for the same part on the same mounting");
        assertEquals(40.0, d1.steadyStateKPerW(), 0.1 * 40);
        assertEquals(80.0, d3.steadyStateKPerW(), 0.1 * 80);
    }
}
