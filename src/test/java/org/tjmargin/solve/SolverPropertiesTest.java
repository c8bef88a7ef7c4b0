package org.tjmargin.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.util.Random;
import org.junit.jupiter.api.Test;
import org.tjmargin.device.Celsius;

/** Properties of the coupled solver over seeded random designs (seed printed on failure). */
class SolverPropertiesTest {

    private static final double[] AMBIENTS_C = {-40, -10, 25, 55, 85, 125};

    @Test
    void randomDesignsNeverGiveNaNStayInBudgetBalanceEnergyAndWarmWithAmbient() {
        long seed = 7_331_2026L;
        Random rnd = new Random(seed);
        SolverSettings settings = SolverSettings.DEFAULT;
        int unresolved = 0;
        for (int n = 0; n < 10_000; n++) {
            RandomDesigns d = RandomDesigns.draw(rnd);
            double lastTj = Double.NEGATIVE_INFINITY;
            boolean ranAway = false;
            String where = "seed " + seed + " case " + n;
            for (double ambientC : AMBIENTS_C) {
                double tl = Celsius.toKelvin(ambientC);
                ThermalOutcome out = ElectroThermalSolver.solve(d.circuit(), d.diode(), d.path(), tl, settings);
                if (out instanceof ThermalOutcome.Converged c) {
                    OperatingPoint p = c.point();
                    assertFalse(Double.isNaN(p.tjK()) || Double.isNaN(p.loopGain()), where);
                    assertTrue(p.evaluations() <= settings.maxEvaluations() + 3, where);
                    // Energy balance P·Rθ = Tj − T_local within 1e-9 K (design 2.3, issue requirement).
                    assertEquals(p.tjK() - tl, p.diodePowerW() * d.path().rThetaJaKPerW(), 1e-9, where);
                    assertFalse(ranAway, "converged above an ambient that ran away, " + where);
                    // Lowest root rises with T_local: g(T; Tl) falls with Tl (proof in the solver's notes).
                    assertTrue(p.tjK() >= lastTj - 1e-9, "Tj fell with ambient, " + where);
                    lastTj = p.tjK();
                } else if (out instanceof ThermalOutcome.Runaway) {
                    ranAway = true;
                } else {
                    ThermalOutcome.NotConverged nc = (ThermalOutcome.NotConverged) out;
                    assertFalse(Double.isNaN(nc.lastTjK()), where);
                    unresolved++;
                }
            }
        }
        if (unresolved > 0) {
            fail(unresolved + " unresolved solves among 60 000, seed " + seed);
        }
    }
}
