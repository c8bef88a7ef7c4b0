package org.tjmargin.thermal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;

import org.junit.jupiter.api.Test;

class FosterPulseTest {

    @Test
    void exponentialStageResponseMatchesItsDefinitionAndLimit() {
        // x(t) = R·τp/(τp − τ)·(e^(−t/τp) − e^(−t/τ)) (convolution of e^(−t/τp) with the stage's impulse response,
        // derived); at τ = τp the limit R·(t/τ)·e^(−t/τ)
        FosterPulse pulse = FosterPulse.exponentialDecay(1e-3);
        double tauP = 1e-3 / Math.log(2);
        for (double tau : new double[] {1e-5, 3e-4, 5e-3}) {
            for (double t : new double[] {1e-5, 1e-3, 1e-2}) {
                double expected = 2 * tauP / (tauP - tau) * (Math.exp(-t / tauP) - Math.exp(-t / tau));
                assertEquals(expected, pulse.stageRiseKPerW(t, 2, tau), 1e-12 * expected, "τ " + tau + ", t " + t);
            }
        }
        double t = 7e-4;
        assertEquals(2 * (t / tauP) * Math.exp(-t / tauP), pulse.stageRiseKPerW(t, 2, tauP), 1e-15);
        // and the same through the general piecewise-linear machinery, sampling e^(−t/τp) finely
        FosterNetwork one = FosterNetwork.of(new double[] {2}, new double[] {3e-4});
        int n = 20000;
        double[] ts = new double[n + 1];
        double[] ps = new double[n + 1];
        for (int k = 0; k <= n; k++) {
            ts[k] = 5e-3 * k / n;
            ps[k] = Math.exp(-ts[k] / tauP);
        }
        double viaProfile = one.stateAfter(new FosterPowerProfile(ts, ps), one.rest()).totalRiseK();
        // linear sampling of a convex exponential at 2.5e-7 s: relative error about (h/τp)²/12 ≈ 7e-9
        assertEquals(pulse.stageRiseKPerW(5e-3, 2, 3e-4), viaProfile, 1e-7 * viaProfile);
    }

    @Test
    void peakSearchFindsTheMaximumOfRandomNetworks() {
        long seed = 20261202L; // fixed, so that every run checks the same cases
        Random random = new Random(seed);
        for (int trial = 0; trial < 50; trial++) {
            int n = 1 + random.nextInt(4);
            double[] r = new double[n];
            double[] tau = new double[n];
            for (int i = 0; i < n; i++) {
                r[i] = Math.pow(10, -1 + 2 * random.nextDouble());
                tau[i] = Math.pow(10, -6 + 5 * random.nextDouble());
            }
            FosterNetwork net = FosterNetwork.of(r, tau);
            FosterPulse pulse = FosterPulse.exponentialDecay(Math.pow(10, -6 + 4 * random.nextDouble()));
            FosterPeak peak = pulse.peakRiseKPerW(net, FosterPeakSearch.defaults());
            String where = "seed " + seed + ", trial " + trial;
            assertTrue(peak.converged(), where);
            double best = 0;
            double tEnd = 20 * Math.max(pulse.decayTimeConstantS(), tau[0]);
            for (int k = 1; k <= 4000; k++) {
                best = Math.max(best, pulse.riseKPerW(net, tEnd * Math.pow(1e-6, 1 - k / 4000.0)));
            }
            assertTrue(peak.riseK() >= best * (1 - 1e-9), where + ": search " + peak.riseK() + " < sampled " + best);
        }
    }

    @Test
    void rectangularPeakIsZthAtTheWidth() {
        FosterNetwork net = FosterNetwork.of(new double[] {1, 10}, new double[] {1e-4, 1e-1});
        FosterPeak peak = FosterPulse.rectangular(1e-3).peakRiseKPerW(net, FosterPeakSearch.defaults());
        assertEquals(net.zthKPerW(1e-3), peak.riseK(), 1e-15);
        assertEquals(1e-3, peak.timeS(), 0);
    }
}
