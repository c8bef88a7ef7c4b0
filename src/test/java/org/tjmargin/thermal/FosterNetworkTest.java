package org.tjmargin.thermal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Random;

import org.junit.jupiter.api.Test;

class FosterNetworkTest {

    /** An arbitrary three-stage network (invented numbers, decades apart like a die, a package and a lead). */
    private static final FosterNetwork NETWORK = FosterNetwork.of(new double[] {0.4, 2.0, 30.0}, new double[] {20e-6, 3e-3, 0.5});

    @Test
    void oneStageStepResponseMatchesClosedForm() {
        // closed form R·P·(1 − e^(−t/τ)) of a first-order stage (reference 3.1; any heat-transfer text)
        FosterNetwork one = FosterNetwork.of(new double[] {5.0}, new double[] {1e-3});
        for (double t : new double[] {1e-6, 1e-4, 1e-3, 7e-3}) {
            FosterState s = one.advance(one.rest(), t, 2.0, 2.0);
            double expected = 5.0 * 2.0 * (1 - Math.exp(-t / 1e-3));
            assertEquals(expected, s.totalRiseK(), 1e-13 * expected, "t = " + t);
            assertEquals(expected / 2.0, one.zthKPerW(t), 1e-13 * expected);
        }
    }

    @Test
    void aReusedStepGivesTheFreshStepsNumbersBitForBit() {
        // Seeded loop: a step recomputed in place (the surge transient's own step) against a fresh step of the same
        // length, over step lengths from far below to far above the time constants, on both sides of the series
        // limit. The closed form itself is held against the analytic step and ramp responses above.
        FosterNetwork net = FosterNetwork.of(new double[] {0.2, 1.5, 8.0, 30.0}, new double[] {2e-6, 1e-4, 5e-3, 2.0});
        Random rnd = new Random(20261202L);
        FosterStep reused = FosterStep.reusable(net, 1e-6);
        for (int n = 0; n < 2000; n++) {
            double h = Math.pow(10, -9 + 10 * rnd.nextDouble());
            FosterStep fresh = net.step(h);
            assertSame(reused, reused.relength(h));
            assertEquals(fresh.lengthS(), reused.lengthS(), 0.0);
            assertEquals(fresh.endPowerGainKPerW(), reused.endPowerGainKPerW(), 0.0);
            double[] x = {0.1, -0.3, 2.0, 5.0};
            double[] y = x.clone();
            fresh.advanceInPlace(x, 1.5, 0.25);
            reused.advanceInPlace(y, 1.5, 0.25);
            for (int i = 0; i < x.length; i++) {
                assertEquals(x[i], y[i], 0.0, "stage " + i + " at h = " + h);
            }
        }
        assertThrows(IllegalStateException.class, () -> net.step(1e-3).relength(2e-3));
    }

    @Test
    void oneStageRampResponseMatchesClosedForm() {
        // P = k·t from rest: x(t) = R·k·(t − τ(1 − e^(−t/τ))), the integral of the step response (derived);
        // for t/τ < 0.01 the test evaluates it as R·k·τ·(z²/2 − z³/6 + z⁴/24 − z⁵/120), z = t/τ, whose truncation
        // (z⁶/720 < 2e-15 of the leading term) is far below the tolerance and which avoids the cancellation
        double r = 3.0;
        double tau = 2e-4;
        double k = 1e5; // W/s
        FosterNetwork one = FosterNetwork.of(new double[] {r}, new double[] {tau});
        for (double t : new double[] {1e-9, 1e-7, 1e-5, 2e-4, 3e-3}) {
            double z = t / tau;
            double expected = z < 0.01 ? r * k * tau * z * z * (0.5 - z * (1.0 / 6 - z * (1.0 / 24 - z / 120)))
                    : r * k * (t - tau * (1 - Math.exp(-t / tau)));
            double actual = one.advance(one.rest(), t, 0, k * t).totalRiseK();
            // below h/τ = 1e-3 the series branch is used; both branches hold 1e-12 relative
            assertEquals(expected, actual, 1e-12 * expected + 1e-300, "t = " + t);
        }
    }

    @Test
    void manySmallStepsEqualOneStepForLinearPower() {
        // exactness: splitting a linear-power interval must not change the end state
        double h = 4e-3;
        double p0 = 10;
        double p1 = 90;
        FosterState once = NETWORK.advance(NETWORK.rest(), h, p0, p1);
        FosterState x = NETWORK.rest();
        int n = 1000;
        for (int k = 0; k < n; k++) {
            double a = p0 + (p1 - p0) * k / n;
            double b = p0 + (p1 - p0) * (k + 1) / n;
            x = NETWORK.advance(x, h / n, a, b);
        }
        for (int i = 0; i < 3; i++) {
            assertEquals(once.stageRiseK(i), x.stageRiseK(i), 1e-11 * Math.abs(once.stageRiseK(i)));
        }
    }

    @Test
    void periodicRectangularPeakMatchesBruteForceSuperposition() {
        // reference 3.3 closed form versus superposition of Zth steps (reference 3.2) over 2000 pulses:
        // ΔT(t) = P·Σ_k [Zth(t − kT) − Zth(t − kT − tp)], evaluated at the end of the last pulse
        double p = 50;
        double tp = 1e-3;
        double period = 5e-3;
        int pulses = 2000; // slowest τ 0.5 s against 10 s of train: e^(−20) ≈ 2e-9 of the build-up is missing
        double closed = NETWORK.periodicRectangularPeakRiseK(p, tp, period);
        double t = (pulses - 1) * period + tp;
        double sum = 0;
        for (int k = 0; k < pulses; k++) {
            double start = k * period;
            sum += p * (NETWORK.zthKPerW(t - start) - NETWORK.zthKPerW(t - start - tp));
        }
        assertEquals(closed, sum, 1e-7 * closed);
        FosterPeak viaProfile = NETWORK.periodicPeakRise(FosterPowerProfile.rectangle(p, tp), period, FosterPeakSearch.defaults());
        assertEquals(closed, viaProfile.riseK(), 1e-12 * closed);
        assertEquals(tp, viaProfile.timeS(), 1e-15);
    }

    @Test
    void periodicStateOfAnyShapeMatchesStepping5000Periods() {
        // a triangular pulse (invented shape): per-stage geometric series versus stepping period after period
        FosterPowerProfile triangle = new FosterPowerProfile(new double[] {0, 2e-4, 1e-3}, new double[] {0, 80, 0});
        double period = 4e-3;
        FosterState periodic = NETWORK.periodicStartState(triangle, period);
        FosterState x = NETWORK.rest();
        // 5000 periods = 20 s = 40 slowest time constants: e^(−40) of the build-up is missing
        for (int k = 0; k < 5000; k++) {
            x = NETWORK.decay(NETWORK.stateAfter(triangle, x), period - triangle.endS());
        }
        for (int i = 0; i < 3; i++) {
            assertEquals(periodic.stageRiseK(i), x.stageRiseK(i), 1e-8 * periodic.totalRiseK());
        }
        double[] rises = NETWORK.riseAtSamplesK(triangle, periodic);
        assertEquals(NETWORK.stateAfter(triangle, periodic).totalRiseK(), rises[rises.length - 1], 1e-12 * rises[0]);
        assertEquals(periodic.totalRiseK(), rises[0], 0);
        FosterState after9 = NETWORK.trainStartState(NETWORK.endOfPeriodFromRest(triangle, period), period, 9);
        FosterState stepped = NETWORK.rest();
        for (int k = 0; k < 9; k++) {
            stepped = NETWORK.decay(NETWORK.stateAfter(triangle, stepped), period - triangle.endS());
        }
        for (int i = 0; i < 3; i++) {
            assertEquals(stepped.stageRiseK(i), after9.stageRiseK(i), 1e-12 * after9.totalRiseK());
        }
    }

    @Test
    void peakRiseInsideASegmentIsFoundAndBeatsDenseSampling() {
        // power falling linearly to zero: the rise peaks inside the segment, not at a sample
        FosterPowerProfile ramp = new FosterPowerProfile(new double[] {0, 0, 2e-3}, new double[] {0, 100, 0});
        FosterPeak peak = NETWORK.peakRise(ramp, NETWORK.rest(), FosterPeakSearch.defaults());
        assertTrue(peak.converged());
        assertTrue(peak.timeS() > 0 && peak.timeS() < 2e-3, "peak time " + peak.timeS());
        double best = 0;
        for (int k = 0; k <= 20000; k++) {
            double t = 2e-3 * k / 20000;
            FosterPowerProfile part = new FosterPowerProfile(new double[] {0, 0, t}, new double[] {0, 100, 100 * (1 - t / 2e-3)});
            best = Math.max(best, NETWORK.stateAfter(part, NETWORK.rest()).totalRiseK());
        }
        assertTrue(peak.riseK() >= best * (1 - 1e-12), peak.riseK() + " vs sampled " + best);
        assertEquals(best, peak.riseK(), 1e-6 * best); // sampling 1e-7 s apart: second-order error ≪ 1e-6
    }

    @Test
    void responseIsLinearInPowerAndZthRisesMonotonically() {
        long seed = 20261202L; // fixed, so that every run checks the same cases
        Random random = new Random(seed);
        for (int trial = 0; trial < 200; trial++) {
            int n = 1 + random.nextInt(4);
            double[] r = new double[n];
            double[] tau = new double[n];
            for (int i = 0; i < n; i++) {
                r[i] = Math.pow(10, -1 + 3 * random.nextDouble());
                tau[i] = Math.pow(10, -7 + 7 * random.nextDouble());
            }
            FosterNetwork net = FosterNetwork.of(r, tau);
            double h = Math.pow(10, -8 + 8 * random.nextDouble());
            double p0 = 100 * random.nextDouble();
            double p1 = 100 * random.nextDouble();
            double whole = net.advance(net.rest(), h, p0, p1).totalRiseK();
            double parts = net.advance(net.rest(), h, p0, 0).totalRiseK() + net.advance(net.rest(), h, 0, p1).totalRiseK();
            String where = "seed " + seed + ", trial " + trial;
            assertEquals(whole, parts, 1e-12 * Math.max(whole, 1e-300), where);
            double t1 = Math.pow(10, -8 + 8 * random.nextDouble());
            assertTrue(net.zthKPerW(t1 * 1.5) >= net.zthKPerW(t1), where);
            assertTrue(net.zthKPerW(t1) <= net.steadyStateKPerW(), where);
        }
    }

    @Test
    void invalidStagesAndProfilesAreRejectedWithTheirNumbers() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> new FosterStage(-1, 1));
        assertTrue(e.getMessage().contains("-1"));
        assertThrows(IllegalArgumentException.class, () -> new FosterStage(1, 0));
        assertThrows(IllegalArgumentException.class, () -> new FosterNetwork(List.of()));
        assertThrows(IllegalArgumentException.class, () -> new FosterPowerProfile(new double[] {0, 2, 1}, new double[] {1, 1, 1}));
        assertThrows(IllegalArgumentException.class, () -> new FosterPowerProfile(new double[] {0, 1}, new double[] {1, -1}));
        assertThrows(IllegalArgumentException.class, () -> NETWORK.advance(FosterState.rest(2), 1e-3, 0, 0));
        assertThrows(IllegalArgumentException.class, () -> NETWORK.periodicRectangularPeakRiseK(1, 2e-3, 1e-3));
    }
}
