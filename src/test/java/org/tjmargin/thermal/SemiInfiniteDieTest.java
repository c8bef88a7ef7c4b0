package org.tjmargin.thermal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class SemiInfiniteDieTest {

    private static final SemiInfiniteDie DIE = SemiInfiniteDie.silicon(1e-6);

    @Test
    void surfaceRiseMatchesReference34() {
        // reference 3.4 (derived from Carslaw & Jaeger §2.9, Si properties Incropera Table A.1); 4 printed digits
        assertEquals(15669, DIE.effusivity(), 0.5);
        assertEquals(2.277, DIE.surfaceRiseK(1e6, 1e-3), 0.0005);
        assertEquals(22.77, DIE.surfaceRiseK(1e8, 10e-6), 0.005);
        assertEquals(72.01, DIE.surfaceRiseK(1e9, 1e-6), 0.005);
        // 1 W on 1 mm² is 1e6 W/m²
        assertEquals(2.277, DIE.zthKPerW(1e-3), 0.0005);
    }

    @Test
    void diffusionLengthsMatchReference34() {
        // reference 3.4: 9.4 µm at 1 µs, 29.9 µm at 10 µs, 299 µm at 1 ms
        assertEquals(9.4e-6, DIE.diffusionLengthM(1e-6), 0.05e-6);
        assertEquals(29.9e-6, DIE.diffusionLengthM(10e-6), 0.05e-6);
        assertEquals(299e-6, DIE.diffusionLengthM(1e-3), 0.5e-6);
    }

    @Test
    void fosterEstimateFollowsTheSquareRootLawAndSettlesAtTheCap() {
        double cap = 20;
        double tCap = DIE.capTimeS(cap);
        FosterFitOutcome outcome = DIE.fosterEstimate(1e-7, 100 * tCap, cap, 5, FosterFitSettings.defaults());
        FosterFitOutcome.Fitted fit = assertInstanceOf(FosterFitOutcome.Fitted.class, outcome);
        assertTrue(fit.estimated());
        // a 5-stage network follows √t over 7 decades with a few percent ripple (the min() corner costs most)
        assertTrue(fit.rmsLogResidual() < 0.05, "rms " + fit.rmsLogResidual());
        for (double t : new double[] {1e-6, 1e-5, 1e-4}) {
            assertEquals(1, fit.network().zthKPerW(t) / DIE.zthKPerW(t), 0.1, "t = " + t);
        }
        assertEquals(cap, fit.network().steadyStateKPerW(), 0.05 * cap);
    }
}
