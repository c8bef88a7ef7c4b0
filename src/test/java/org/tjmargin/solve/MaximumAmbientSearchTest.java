package org.tjmargin.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.tjmargin.circuit.LoadRange;
import org.tjmargin.circuit.SeriesResistor;
import org.tjmargin.circuit.ShuntRegulatorSpec;
import org.tjmargin.derating.Bound;
import org.tjmargin.derating.Limit;
import org.tjmargin.derating.Measure;
import org.tjmargin.derating.Policy;
import org.tjmargin.derating.Rule;
import org.tjmargin.device.BreakdownDiode;
import org.tjmargin.device.BreakdownPart;
import org.tjmargin.device.Celsius;
import org.tjmargin.device.DiodeRatings;
import org.tjmargin.device.KneeModel;
import org.tjmargin.device.Leakage;
import org.tjmargin.device.PowerRatingCurve;
import org.tjmargin.device.RatingReference;
import org.tjmargin.device.TemperatureCoefficient;
import org.tjmargin.thermal.Enclosure;
import org.tjmargin.thermal.GivenPath;
import org.tjmargin.variation.Range;

/** The maximum ambient found by root finding agrees with a brute-force 0.01 K scan (issue requirement). */
class MaximumAmbientSearchTest {

    /** An invented regulator with corners on supply, Vz, Rθ and αV, in a sealed box so positions couple. */
    private static Board board(double ambientMaxC) {
        BreakdownDiode d = new BreakdownDiode(11.8, 8, 20e-3, 0.5e-3, new KneeModel.Linear(),
                new TemperatureCoefficient(9e-3, 7e-3, 11e-3, false), Leakage.NONE);
        PowerRatingCurve curve = PowerRatingCurve.flatThenLinear(RatingReference.LEAD, 9.5e-3, 1.0,
                Celsius.toKelvin(50), Celsius.toKelvin(175));
        BreakdownPart part = new BreakdownPart("invented-test-zener", BreakdownPart.Kind.ZENER, 12, 0.05, d,
                new DiodeRatings(Celsius.toKelvin(175), curve, 0.08), 0, List.of());
        SeriesResistor rs = new SeriesResistor(Range.relative(300, 0.01), PowerRatingCurve.flatThenLinear(
                RatingReference.AMBIENT, 0, 2, Celsius.toKelvin(70), Celsius.toKelvin(155)));
        ShuntRegulatorSpec c = new ShuntRegulatorSpec(Range.between(20, 26), rs,
                new LoadRange.Current(Range.between(1e-3, 5e-3)));
        PositionSpec p = new PositionSpec("D", part, new GivenPath(180, 125, List.of()), c, Range.between(-0.6, 0.6),
                Range.relative(1, 0.1), Range.between(7e-3, 11e-3), List.of());
        return new Board("invented", List.of(p), new Enclosure.SealedBox(0.05, 6, 1),
                new AmbientRange(Celsius.toKelvin(0), Celsius.toKelvin(ambientMaxC), 11));
    }

    private static final Policy POLICY = new Policy("test", "test", List.of(new Rule("tj", "Tj ≤ 150 °C",
            Measure.JUNCTION_TEMPERATURE, Bound.MAX, new Limit.Fixed(Celsius.toKelvin(150)), "test")));

    @Test
    void rootFindingMatchesBruteForceScan() {
        for (double maxC : new double[] {20, 60}) { // two sweep ranges: the bracket comes from the sweep or beyond it
            AnalysisResult r = Analysis.run(board(maxC), POLICY, SolverSettings.DEFAULT);
            MaximumAmbient m = r.positions().get(0).maxAmbient();
            assertEquals(MaximumAmbient.Status.FOUND, m.status());
            PreparedBoard pb = PreparedBoard.of(board(maxC));
            // Brute force: 0.01 K steps from 1 K below the found value; the first failing ambient.
            double firstFail = Double.NaN;
            for (double t = m.ambientK() - 1.0; t < m.ambientK() + 1.0; t += 0.01) {
                if (MaximumAmbientSearch.marginAt(pb, POLICY, 0, t, SolverSettings.DEFAULT) < 0) {
                    firstFail = t;
                    break;
                }
            }
            assertTrue(!Double.isNaN(firstFail), "brute force found no failure near " + m.ambientK());
            // The reported ambient passes, and lies within the 0.1 K tolerance below the true limit.
            assertTrue(MaximumAmbientSearch.marginAt(pb, POLICY, 0, m.ambientK(), SolverSettings.DEFAULT) >= 0);
            assertEquals(firstFail, m.ambientK(), MaximumAmbientSearch.TOLERANCE_K + 0.01, "design max " + maxC);
        }
    }
}
