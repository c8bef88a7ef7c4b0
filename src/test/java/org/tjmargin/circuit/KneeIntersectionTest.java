package org.tjmargin.circuit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.junit.jupiter.api.Test;
import org.tjmargin.device.BreakdownDiode;
import org.tjmargin.device.Celsius;
import org.tjmargin.device.Leakage;
import org.tjmargin.device.TemperatureCoefficient;
import org.tjmargin.device.VzTestCondition;

/**
 * Where a shunt regulator's operating point lies on the current-dependent knee, its current against the root of
 * Kirchhoff's law {@code Vth − V(I) − Rth·I = 0} found by a general-purpose reference solver (Commons Math
 * {@code BrentSolver}, to 1e-18 A) on the diode's own characteristic. Seeded random supplies, series resistors and
 * junction temperatures; many land where the knee's Newton iteration meets its root exactly ({@code h = 0}),
 * the case that once made it bisect away from the root.
 */
class KneeIntersectionTest {

    @Test
    void kneeCurrentIsTheRootOfKirchhoffsLaw() {
        // An invented 6.8 V part with a soft knee: Zzt 20 Ω at 5 mA, Zzk 700 Ω at 0.25 mA.
        BreakdownDiode z = BreakdownDiode.fromDatasheet(6.8, 5e-3, 20.0, 0.25e-3, 700.0,
                TemperatureCoefficient.exact(3e-3), new VzTestCondition.Pulsed(Celsius.T25_K), Leakage.NONE);
        SplittableRandom rnd = new SplittableRandom(20_261_202L);
        BrentSolver reference = new BrentSolver(1e-18, 1e-18);
        int onKnee = 0;
        for (int n = 0; n < 20_000; n++) {
            double supply = 7 + 6 * rnd.nextDouble();
            double series = 300 + 1500 * rnd.nextDouble();
            double load = 1e-3 * rnd.nextDouble();
            double tj = 250 + 150 * rnd.nextDouble();
            CircuitPoint p = new ShuntRegulator(supply, series, new Load.Current(load)).at(z, tj);
            if (p.region() != Region.KNEE) {
                continue;
            }
            onKnee++;
            double vth = supply - load * series;
            double root = reference.solve(200, i -> vth - z.breakdownVoltageV(i, tj) - series * i, z.izkA(),
                    z.iztA());
            assertEquals(root, p.diodeCurrentA(), 1e-12 * root, "case " + n);
        }
        assertTrue(onKnee > 2000, "only " + onKnee + " points on the knee");
    }
}
