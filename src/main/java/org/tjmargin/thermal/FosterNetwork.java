package org.tjmargin.thermal;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.TooManyEvaluationsException;

/**
 * Foster network of transient thermal impedance, {@code Zth(t) = Σ R_i·(1 − e^(−t/τ_i))} (reference 3.1; common
 * practice, e.g. JESD51-14 uses this form): the junction rise is the sum of independent first-order stages.
 *
 * <p>Responses are exact for power that is linear between samples ({@link FosterStep} holds the per-stage closed
 * form and its derivation). Pulse trains use the exact periodic state per stage (geometric series, reference 3.3):
 * a stage that reaches {@code x_T} at the end of one period starting from rest starts every period of the periodic
 * steady state at {@code x_T / (1 − e^(−T/τ))}, and the {@code n}-th pulse of a train starting from rest at
 * {@code x_T·(1 − e^(−nT/τ))/(1 − e^(−T/τ))} after {@code n} earlier pulses. Superposition assumes
 * temperature-independent properties (reference 3.2).
 *
 * @param stages the stages, at least one; stored as an unmodifiable copy in the given order
 */
public record FosterNetwork(List<FosterStage> stages) implements TransientThermalImpedance {

    public FosterNetwork {
        stages = List.copyOf(stages);
        if (stages.isEmpty()) {
            throw new IllegalArgumentException("a Foster network needs at least one stage");
        }
    }

    /**
     * @param rKPerW stage resistances (K/W)
     * @param tauS   stage time constants (s), same length
     */
    public static FosterNetwork of(double[] rKPerW, double[] tauS) {
        if (rKPerW.length != tauS.length) {
            throw new IllegalArgumentException("Foster network has " + rKPerW.length + " resistances but " + tauS.length + " time constants");
        }
        List<FosterStage> list = new ArrayList<>(rKPerW.length);
        for (int i = 0; i < rKPerW.length; i++) {
            list.add(new FosterStage(rKPerW[i], tauS[i]));
        }
        return new FosterNetwork(list);
    }

    /** @return number of stages */
    public int stageCount() {
        return stages.size();
    }

    /** @return the stage resistances (K/W), a fresh array in stage order */
    public double[] resistancesKPerW() {
        double[] r = new double[stages.size()];
        for (int i = 0; i < r.length; i++) {
            r[i] = stages.get(i).rKPerW();
        }
        return r;
    }

    /** @return the stage time constants (s), a fresh array in stage order */
    public double[] timeConstantsS() {
        double[] tau = new double[stages.size()];
        for (int i = 0; i < tau.length; i++) {
            tau[i] = stages.get(i).tauS();
        }
        return tau;
    }

    /** @return the same stages ordered by increasing time constant */
    public FosterNetwork sortedByTimeConstant() {
        List<FosterStage> sorted = new ArrayList<>(stages);
        sorted.sort(Comparator.comparingDouble(FosterStage::tauS));
        return new FosterNetwork(sorted);
    }

    @Override
    public double zthKPerW(double tS) {
        double z = 0;
        for (FosterStage s : stages) {
            z += s.zthKPerW(tS);
        }
        return z;
    }

    /** @return {@code Σ R_i} (K/W) */
    @Override
    public double steadyStateKPerW() {
        double r = 0;
        for (FosterStage s : stages) {
            r += s.rKPerW();
        }
        return r;
    }

    /** @return the state at rest (every stage at zero rise) */
    public FosterState rest() {
        return FosterState.rest(stages.size());
    }

    /** @return the exact per-stage response over a step of length {@code hS} (s) with linear power */
    public FosterStep step(double hS) {
        return new FosterStep(resistancesKPerW(), timeConstantsS(), hS);
    }

    /**
     * @param start       state at the start (K)
     * @param hS          step length (s)
     * @param startPowerW power at the start (W)
     * @param endPowerW   power at the end (W); linear in between
     * @return the state at the end of the step
     */
    public FosterState advance(FosterState start, double hS, double startPowerW, double endPowerW) {
        double[] x = checkedRise(start);
        step(hS).advanceInPlace(x, startPowerW, endPowerW);
        return new FosterState(x);
    }

    /** @return the state after {@code dtS} (s) without power: each stage times {@code e^(−dt/τ)} */
    public FosterState decay(FosterState start, double dtS) {
        return advance(start, dtS, 0, 0);
    }

    /**
     * @param profile power history, applied from its time zero
     * @param start   state at time zero
     * @return the state at the profile's last sample
     */
    public FosterState stateAfter(FosterPowerProfile profile, FosterState start) {
        double[] x = checkedRise(start);
        advanceThrough(profile, x);
        return new FosterState(x);
    }

    /**
     * @param profile power history, applied from its time zero
     * @param start   state at time zero
     * @return the junction rise (K) at each of the profile's samples (the rise is continuous across jumps)
     */
    public double[] riseAtSamplesK(FosterPowerProfile profile, FosterState start) {
        double[] x = checkedRise(start);
        double[] rise = new double[profile.size()];
        rise[0] = sum(x);
        for (int k = 1; k < profile.size(); k++) {
            double h = profile.timeS(k) - profile.timeS(k - 1);
            if (h > 0) {
                step(h).advanceInPlace(x, profile.powerW(k - 1), profile.powerW(k));
            }
            rise[k] = sum(x);
        }
        return rise;
    }

    /**
     * The peak junction rise over a power history and the decay after it.
     *
     * <p>Candidates are the samples (the rise is continuous there) and, inside each segment whose rise derivative
     * changes from positive at its start to negative at its end, the root of that derivative,
     * {@code dx_i/dt = (R_i·P(t) − x_i)/τ_i}, solved with Brent's method within the given budget. A segment
     * whose derivative changes sign twice inside is not resolved: refine the profile. After the last sample the
     * power is zero and, all stage rises being non-negative for non-negative power from a non-negative start,
     * the rise only falls.
     *
     * @param profile power history, from its time zero
     * @param start   state at time zero
     * @param search  budget and tolerance
     */
    public FosterPeak peakRise(FosterPowerProfile profile, FosterState start, FosterPeakSearch search) {
        double[] x = checkedRise(start);
        double[] r = resistancesKPerW();
        double[] tau = timeConstantsS();
        double bestRise = sum(x);
        double bestTime = profile.timeS(0);
        int evaluations = 0;
        boolean converged = true;
        for (int k = 1; k < profile.size(); k++) {
            double t0 = profile.timeS(k - 1);
            double h = profile.timeS(k) - t0;
            if (h <= 0) {
                continue;
            }
            double p0 = profile.powerW(k - 1);
            double p1 = profile.powerW(k);
            double[] xStart = x.clone();
            FosterStep whole = new FosterStep(r, tau, h);
            whole.advanceInPlace(x, p0, p1);
            double endRise = sum(x);
            if (endRise > bestRise) {
                bestRise = endRise;
                bestTime = profile.timeS(k);
            }
            if (riseDerivative(xStart, r, tau, p0) > 0 && riseDerivative(x, r, tau, p1) < 0) {
                SegmentRise seg = new SegmentRise(r, tau, xStart, p0, p1, h);
                BrentSolver solver = new BrentSolver(search.relativeTimeTolerance() * h);
                double sPeak;
                try {
                    sPeak = solver.solve(search.maxEvaluationsPerRoot(), seg::derivative, 0, h);
                } catch (TooManyEvaluationsException e) {
                    converged = false;
                    sPeak = 0.5 * h;
                }
                evaluations += solver.getEvaluations();
                double rise = seg.rise(sPeak);
                if (rise > bestRise) {
                    bestRise = rise;
                    bestTime = t0 + sPeak;
                }
            }
        }
        return new FosterPeak(bestRise, bestTime, evaluations, converged);
    }

    /**
     * @param profile one pulse of the train, from rest
     * @param periodS repetition period (s), not shorter than the profile
     * @return the state at the end of one period (the pulse then free decay), starting from rest
     */
    public FosterState endOfPeriodFromRest(FosterPowerProfile profile, double periodS) {
        checkPeriod(profile, periodS);
        double[] x = new double[stages.size()];
        advanceThrough(profile, x);
        double rest = periodS - profile.endS();
        if (rest > 0) {
            step(rest).advanceInPlace(x, 0, 0);
        }
        return new FosterState(x);
    }

    /**
     * The exact periodic steady state: each stage starts every period at
     * {@code x_T,i / (1 − e^(−T/τ_i))}, with {@code x_T} the state after one period from rest (reference 3.3,
     * generalised to any pulse shape; derived).
     *
     * @param profile one pulse
     * @param periodS period (s), not shorter than the profile
     * @return the state at the start of a period in the periodic steady state
     */
    public FosterState periodicStartState(FosterPowerProfile profile, double periodS) {
        double[] xT = endOfPeriodFromRest(profile, periodS).stageRiseK();
        for (int i = 0; i < xT.length; i++) {
            xT[i] /= -Math.expm1(-periodS / stages.get(i).tauS());
        }
        return new FosterState(xT);
    }

    /**
     * The state at the start of a pulse of a finite train from rest: after {@code n} earlier identical pulses each
     * stage holds {@code x_T,i·(1 − q_i^n)/(1 − q_i)}, {@code q_i = e^(−T/τ_i)} (geometric series; derived).
     *
     * @param endOfPeriodFromRest the state after one period from rest ({@link #endOfPeriodFromRest})
     * @param periodS             period (s), positive
     * @param earlierPulses       number of pulses before this one, not negative
     */
    public FosterState trainStartState(FosterState endOfPeriodFromRest, double periodS, int earlierPulses) {
        if (!(periodS > 0) || !Double.isFinite(periodS)) {
            throw new IllegalArgumentException("train period must be positive and finite: periodS = " + periodS);
        }
        if (earlierPulses < 0) {
            throw new IllegalArgumentException("number of earlier pulses must not be negative: " + earlierPulses);
        }
        double[] x = checkedRise(endOfPeriodFromRest);
        for (int i = 0; i < x.length; i++) {
            double tau = stages.get(i).tauS();
            // (1 − q^n)/(1 − q) with expm1 on both: exact for q near 1 (slow stages)
            x[i] *= earlierPulses == 0 ? 0 : Math.expm1(-earlierPulses * periodS / tau) / Math.expm1(-periodS / tau);
        }
        return new FosterState(x);
    }

    /**
     * Peak rise of a pulse in the periodic steady state of a train.
     *
     * @param profile one pulse
     * @param periodS period (s), not shorter than the profile
     * @param search  budget and tolerance of the peak search
     */
    public FosterPeak periodicPeakRise(FosterPowerProfile profile, double periodS, FosterPeakSearch search) {
        return peakRise(profile, periodicStartState(profile, periodS), search);
    }

    /**
     * Closed-form periodic steady-state peak rise of rectangular pulses,
     * {@code ΔT_peak = P·Σ R_i(1 − e^(−tp/τ_i))/(1 − e^(−T/τ_i))} (reference 3.3, exact for a Foster network,
     * derived). Every stage peaks at the end of the pulse, so the sum is the peak.
     *
     * @param powerW  pulse power (W)
     * @param widthS  pulse width (s), positive
     * @param periodS period (s), not shorter than the width
     * @return the peak rise (K)
     */
    public double periodicRectangularPeakRiseK(double powerW, double widthS, double periodS) {
        if (!(widthS > 0) || !(periodS >= widthS) || !Double.isFinite(periodS)) {
            throw new IllegalArgumentException("need 0 < widthS <= periodS < ∞: widthS = " + widthS + ", periodS = " + periodS);
        }
        double rise = 0;
        for (FosterStage s : stages) {
            rise += s.rKPerW() * Math.expm1(-widthS / s.tauS()) / Math.expm1(-periodS / s.tauS());
        }
        return powerW * rise;
    }

    private void advanceThrough(FosterPowerProfile profile, double[] x) {
        for (int k = 1; k < profile.size(); k++) {
            double h = profile.timeS(k) - profile.timeS(k - 1);
            if (h > 0) {
                step(h).advanceInPlace(x, profile.powerW(k - 1), profile.powerW(k));
            }
        }
    }

    private static void checkPeriod(FosterPowerProfile profile, double periodS) {
        if (!(periodS >= profile.endS()) || !(periodS > 0) || !Double.isFinite(periodS)) {
            throw new IllegalArgumentException("train period must be finite, positive and not shorter than one pulse: periodS = "
                    + periodS + ", pulse ends at " + profile.endS() + " s");
        }
    }

    private double[] checkedRise(FosterState state) {
        if (state.stages() != stages.size()) {
            throw new IllegalArgumentException("Foster state has " + state.stages() + " stages, network has " + stages.size());
        }
        return state.stageRiseK();
    }

    private static double sum(double[] x) {
        double s = 0;
        for (double v : x) {
            s += v;
        }
        return s;
    }

    private static double riseDerivative(double[] x, double[] r, double[] tau, double powerW) {
        double d = 0;
        for (int i = 0; i < x.length; i++) {
            d += (r[i] * powerW - x[i]) / tau[i];
        }
        return d;
    }

    /** The rise inside one linear-power segment as a function of the time into it. */
    private static final class SegmentRise {
        private final double[] r;
        private final double[] tau;
        private final double[] x0;
        private final double p0;
        private final double slopeWPerS;

        SegmentRise(double[] r, double[] tau, double[] x0, double p0, double p1, double h) {
            this.r = r;
            this.tau = tau;
            this.x0 = x0;
            this.p0 = p0;
            this.slopeWPerS = (p1 - p0) / h;
        }

        private double[] stateAt(double s) {
            double[] x = x0.clone();
            new FosterStep(r, tau, s).advanceInPlace(x, p0, p0 + slopeWPerS * s);
            return x;
        }

        double rise(double s) {
            return sum(stateAt(s));
        }

        double derivative(double s) {
            return riseDerivative(stateAt(s), r, tau, p0 + slopeWPerS * s);
        }
    }
}
