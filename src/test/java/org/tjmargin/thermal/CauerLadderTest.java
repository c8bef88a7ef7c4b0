package org.tjmargin.thermal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;
import org.junit.jupiter.api.Test;

class CauerLadderTest {

    /** An arbitrary four-rung ladder (invented numbers; time constants from about 10 µs to 1 s). */
    private static final CauerLadder LADDER = new CauerLadder(new double[] {0.5, 1.5, 4.0, 20.0},
            new double[] {2e-5, 4e-4, 5e-3, 5e-2});

    @Test
    void fosterEquivalentHasTheLaddersImpedanceAtEveryFrequency() {
        // exact algebra: the continued fraction and Σ R_k/(1 + sτ_k) are the same rational function (reference 3.1)
        FosterNetwork foster = LADDER.toFoster();
        for (double s : new double[] {0, 1e-2, 1, 1e2, 1e4, 1e6}) {
            double z = 0;
            for (FosterStage st : foster.stages()) {
                z += st.rKPerW() / (1 + s * st.tauS());
            }
            assertEquals(LADDER.impedanceKPerW(s), z, 1e-12 * LADDER.impedanceKPerW(s), "s = " + s);
        }
        assertEquals(26.0, foster.steadyStateKPerW(), 1e-12 * 26.0);
    }

    @Test
    void fosterStepResponseEqualsTheLaddersIntegratedStepResponse() {
        // the ladder's node equations integrated with an 8th-order Dormand–Prince method at 1e-13 tolerance
        // (independent of the eigen-decomposition); the brief asks for 1e-9 relative agreement
        double[] r = LADDER.rKPerW();
        double[] c = LADDER.cJPerK();
        int n = r.length;
        FirstOrderDifferentialEquations ladder = new FirstOrderDifferentialEquations() {
            @Override
            public int getDimension() {
                return n;
            }

            @Override
            public void computeDerivatives(double t, double[] temp, double[] dot) {
                for (int i = 0; i < n; i++) {
                    double in = i == 0 ? 1.0 : (temp[i - 1] - temp[i]) / r[i - 1];
                    double out = (temp[i] - (i + 1 < n ? temp[i + 1] : 0)) / r[i];
                    dot[i] = (in - out) / c[i];
                }
            }
        };
        FosterNetwork foster = LADDER.toFoster();
        double[] state = new double[n];
        double t = 0;
        for (double target : new double[] {1e-5, 1e-4, 1e-3, 1e-2, 0.1, 1, 5}) {
            DormandPrince853Integrator integrator = new DormandPrince853Integrator(1e-14, 1, 1e-15, 1e-13);
            integrator.integrate(ladder, t, state, target, state);
            t = target;
            assertEquals(state[0], foster.zthKPerW(t), 1e-9 * state[0], "t = " + t);
        }
    }

    @Test
    void oneRungLadderIsOneFosterStage() {
        FosterNetwork f = new CauerLadder(new double[] {3}, new double[] {2e-3}).toFoster();
        assertEquals(1, f.stageCount());
        assertEquals(3, f.stages().get(0).rKPerW(), 1e-15);
        assertEquals(6e-3, f.stages().get(0).tauS(), 1e-17);
    }

    @Test
    void invalidRungsAreRejected() {
        assertThrows(IllegalArgumentException.class, () -> new CauerLadder(new double[] {1, 2}, new double[] {1}));
        assertThrows(IllegalArgumentException.class, () -> new CauerLadder(new double[] {1, -2}, new double[] {1, 1}));
    }
}
