package org.tjmargin.variation.statistical;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Random;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.tjmargin.circuit.CurrentFedSpec;
import org.tjmargin.circuit.LoadRange;
import org.tjmargin.circuit.SeriesResistor;
import org.tjmargin.circuit.ShuntRegulatorSpec;
import org.tjmargin.device.PowerRatingCurve;
import org.tjmargin.device.RatingReference;
import org.tjmargin.solve.OperatingPoint;
import org.tjmargin.solve.PositionInstance;
import org.tjmargin.solve.PositionSpec;
import org.tjmargin.solve.SolverSettings;
import org.tjmargin.solve.ThermalOutcome;
import org.tjmargin.variation.Axis;
import org.tjmargin.variation.AxisValues;
import org.tjmargin.variation.Corner;
import org.tjmargin.variation.Range;

class FastPathAndValuesTest {

    /**
     * The closed form (electrothermal README §1) against the general bracketed solver on seeded random linear
     * regulators and current-fed diodes: the same root within 1e-8 K (the solver's tolerance is 1e-10 K; the margin
     * covers the rounding of the quadratic's coefficients), and the same electrical point.
     */
    @Test
    void fastPathAgreesWithGeneralSolver() {
        long seed = 424242L;
        Random rnd = new Random(seed);
        int used = 0;
        for (int k = 0; k < 400; k++) {
            double alpha = (rnd.nextDouble() - 0.3) * 6e-3;
            var part = VariationFixtures.zener(alpha);
            SeriesResistor rs = new SeriesResistor(Range.exact(100 + 400 * rnd.nextDouble()),
                    PowerRatingCurve.flatThenLinear(RatingReference.AMBIENT, 0.0, 0.5, VariationFixtures.c(70),
                            VariationFixtures.c(155)));
            PositionSpec spec = k % 2 == 0
                    ? VariationFixtures.position("D", part, 50 + 400 * rnd.nextDouble(), new ShuntRegulatorSpec(
                            Range.exact(8 + 12 * rnd.nextDouble()), rs,
                            new LoadRange.Current(Range.exact(10e-3 * rnd.nextDouble()))), Range.exact(0.0),
                            Range.exact(1.0), Range.exact(alpha))
                    : VariationFixtures.position("D", part, 50 + 400 * rnd.nextDouble(),
                            new CurrentFedSpec(Range.exact(0.5e-3 + 40e-3 * rnd.nextDouble())), Range.exact(0.0),
                            Range.exact(1.0), Range.exact(alpha));
            double tLocal = VariationFixtures.c(-20 + 100 * rnd.nextDouble());
            PositionInstance inst = spec.atValues(AxisValues.nominal());
            Optional<OperatingPoint> fast = LinearFastPath.solve(inst, tLocal, SolverSettings.DEFAULT);
            ThermalOutcome general = inst.solve(tLocal, SolverSettings.DEFAULT);
            if (fast.isEmpty()) {
                // Not applicable: below the straight line at some temperature, or no stable root below the cap.
                continue;
            }
            used++;
            OperatingPoint g = ((ThermalOutcome.Converged) general).point();
            OperatingPoint f = fast.get();
            String msg = "seed " + seed + ", case " + k + ": " + spec.circuit();
            assertEquals(g.tjK(), f.tjK(), 1e-8, msg);
            assertEquals(g.circuit().diodeCurrentA(), f.circuit().diodeCurrentA(), 1e-12, msg);
            assertEquals(g.circuit().voltageV(), f.circuit().voltageV(), 1e-10, msg);
            assertEquals(g.circuit().resistorPowerW(), f.circuit().resistorPowerW(), 1e-10, msg);
            assertEquals(g.referenceK(), f.referenceK(), 1e-8, msg);
            assertEquals(g.loopGain(), f.loopGain(), 1e-6, msg);
            assertEquals(0.0, f.residualK(), 1e-9, msg);
        }
        assertTrue(used > 200, "the fast path applied in only " + used + " of 400 cases");
    }

    /** Below the knee the closed form does not apply and says so. */
    @Test
    void fastPathDeclinesOutsideItsAssumptions() {
        var part = VariationFixtures.zener(2e-3);
        PositionSpec spec = VariationFixtures.position("D", part, 200, new CurrentFedSpec(Range.exact(0.5e-3)),
                Range.exact(0.0), Range.exact(1.0), Range.exact(2e-3));
        assertTrue(LinearFastPath.solve(spec.atValues(AxisValues.nominal()), VariationFixtures.c(25),
                SolverSettings.DEFAULT).isEmpty());
    }

    /**
     * {@code atValues} generalises {@code at(Corner)}: at the extremes of every axis it builds the same instances
     * (as a set: for a resistive load the LOAD corner HIGH is the lowest resistance, while axis values carry the
     * resistance itself).
     */
    @Test
    void atValuesReproducesEveryCorner() {
        SeriesResistor rs = new SeriesResistor(Range.relative(220.0, 0.05),
                PowerRatingCurve.flatThenLinear(RatingReference.AMBIENT, 0.0, 0.5, VariationFixtures.c(70),
                        VariationFixtures.c(155)));
        for (PositionSpec spec : List.of(VariationFixtures.regulator(), VariationFixtures.position("D",
                VariationFixtures.zener(2e-3), 300, new ShuntRegulatorSpec(Range.relative(15.0, 0.1), rs,
                        new LoadRange.Resistive(Range.between(1e3, 5e3))), new Range(-0.1, 0, 0.1),
                Range.relative(1.0, 0.1), Range.exact(2e-3)))) {
            Set<PositionInstance> byCorner = new HashSet<>();
            Set<PositionInstance> byValues = new HashSet<>();
            for (Corner c : spec.corners()) {
                PositionInstance i = spec.at(c);
                byCorner.add(new PositionInstance(Corner.NOMINAL, i.diode(), i.circuit(), i.path()));
                AxisValues v = AxisValues.nominal();
                for (Axis a : spec.varyingAxes()) {
                    v = v.with(a, c.valueOf(a, spec.rangeOf(a).orElseThrow()));
                }
                byValues.add(spec.atValues(v));
            }
            assertEquals(byCorner, byValues);
            PositionInstance nominal = spec.at(Corner.NOMINAL);
            assertEquals(nominal, spec.atValues(AxisValues.nominal()));
        }
    }
}
