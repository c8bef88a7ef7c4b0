package org.tjmargin.thermal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class ZthFitTest {

    /** Invented three-stage network, time constants a decade or more apart so that they are identifiable. */
    private static final FosterNetwork TRUE_NETWORK = FosterNetwork.of(new double[] {0.8, 4.0, 25.0}, new double[] {50e-6, 2e-3, 0.3});

    private static double[] times(int count) {
        return ZthFit.spreadGeometrically(1e-6, 10, count);
    }

    private static double[] zth(double[] t) {
        double[] z = new double[t.length];
        for (int j = 0; j < t.length; j++) {
            z[j] = TRUE_NETWORK.zthKPerW(t[j]);
        }
        return z;
    }

    @Test
    void recoversTheNetworkThatGeneratedThePoints() {
        double[] t = times(29);
        FosterFitOutcome.Fitted fit = assertInstanceOf(FosterFitOutcome.Fitted.class,
                ZthFit.fit(t, zth(t), 3, FosterFitSettings.defaults()));
        // noise-free points: the optimizer's 1e-10 stops leave the parameters good to far better than 1e-6
        for (int i = 0; i < 3; i++) {
            FosterStage want = TRUE_NETWORK.stages().get(i);
            FosterStage got = fit.network().stages().get(i);
            assertEquals(want.rKPerW(), got.rKPerW(), 1e-6 * want.rKPerW(), "R of stage " + i);
            assertEquals(want.tauS(), got.tauS(), 1e-6 * want.tauS(), "τ of stage " + i);
        }
        assertTrue(fit.rmsLogResidual() < 1e-8);
        assertTrue(fit.evaluations() < 200, "evaluations " + fit.evaluations());
    }

    @Test
    void exhaustedBudgetIsATypedFailureWithTheLastIterate() {
        double[] t = times(29);
        FosterFitSettings tight = new FosterFitSettings(3, 3, 1e-10, 1e-10, 1e-10, FosterPeakSearch.defaults());
        FosterFitOutcome.Failed failed = assertInstanceOf(FosterFitOutcome.Failed.class, ZthFit.fit(t, zth(t), 3, tight));
        assertEquals(FosterFitOutcome.Reason.BUDGET_EXHAUSTED, failed.reason());
        assertTrue(failed.lastNetwork().isPresent());
        assertTrue(Double.isFinite(failed.lastRmsLogResidual()));
        FosterFitException e = assertThrows(FosterFitException.class, failed::networkOrThrow);
        assertEquals(failed, e.failure());
    }

    @Test
    void badPointsAreRejectedNamingThePoint() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> ZthFit.fit(new double[] {1e-3, 1e-3, 1e-2, 1e-1}, new double[] {1, 2, 3, 4}, 1, FosterFitSettings.defaults()));
        assertTrue(e.getMessage().contains("point 1"), e.getMessage());
        assertThrows(IllegalArgumentException.class,
                () -> ZthFit.fit(new double[] {1e-3, 1e-2, 1e-1}, new double[] {1, 2, 3}, 2, FosterFitSettings.defaults()));
        assertThrows(IllegalArgumentException.class,
                () -> ZthFit.fit(new double[] {1e-3, 1e-2}, new double[] {1, -2}, 1, FosterFitSettings.defaults()));
    }
}
