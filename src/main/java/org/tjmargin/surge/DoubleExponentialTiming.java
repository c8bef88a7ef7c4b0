package org.tjmargin.surge;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.TooManyEvaluationsException;

/**
 * The timing of the normalised double exponential {@code f(s) = e^(−s) − e^(−s/r)}, {@code s = t/τ1},
 * {@code r = τ2/τ1 ∈ (0, 1)}, and the inverse problem: the {@code r} that gives a requested {@code T1/T2}.
 *
 * <p>Shape facts (derived): {@code f} peaks at {@code s_p = ln(1 + d)/d}, {@code d = 1/r − 1}; computed as
 * {@code f(s) = e^(−s)·(1 − e^(−s·d))} with {@code expm1}, exact even as {@code r → 1} where both exponentials
 * nearly cancel. {@code T1/T2} grows monotonically with {@code r} (checked numerically over the whole range) from 0
 * to the limit of the shape {@code s·e^(−s)}: 0.26284 for the current definition, 0.28876 for the voltage one
 * (reference 4.2 quotes ≈ 0.263 for current). Crossings are solved with Brent's method on brackets known from the
 * shape: the rise on {@code [0, s_p]}, the tail on {@code [s_p, s_p + ln(2/f(s_p)) + 1]}, where
 * {@code f ≤ e^(−s) < f(s_p)/2}.
 */
final class DoubleExponentialTiming {

    /** Smallest {@code r} tried: {@code T1/T2} there is about 4e-11, far below any standard pulse. */
    static final double R_MIN = 1e-12;
    /** Largest {@code r} tried: {@code T1/T2} there equals its limit to about 1e-13. */
    static final double R_MAX = 1 - 1e-7;

    private final SurgeQuantity quantity;
    private final TimingSolveBudget budget;

    DoubleExponentialTiming(SurgeQuantity quantity, TimingSolveBudget budget) {
        this.quantity = quantity;
        this.budget = budget;
    }

    static double shape(double s, double r) {
        double d = 1 / r - 1;
        return -Math.exp(-s) * Math.expm1(-s * d);
    }

    static double peakTime(double r) {
        double d = 1 / r - 1;
        return d < 1e-12 ? 1 : Math.log1p(d) / d;
    }

    /** @return {T1, T2} in units of τ1 for ratio {@code r} */
    double[] normalisedTimings(double r) {
        double sp = peakTime(r);
        double pk = shape(sp, r);
        double lo = quantity.frontLowFraction();
        double sLo = crossing(r, lo * pk, 0, sp);
        double s90 = crossing(r, SurgeQuantity.FRONT_HIGH_FRACTION * pk, 0, sp);
        double s50 = crossing(r, SurgeQuantity.HALF_VALUE_FRACTION * pk, sp, sp + Math.log(2 / pk) + 1);
        double origin = sLo - lo * (s90 - sLo) / (SurgeQuantity.FRONT_HIGH_FRACTION - lo);
        return new double[] {quantity.frontTimeFactor() * (s90 - sLo), s50 - origin};
    }

    double ratio(double r) {
        double[] t = normalisedTimings(r);
        return t[0] / t[1];
    }

    /**
     * @return {τ1, τ2} (s) for the requested timing
     * @throws PulseTimingException if the ratio is unreachable or a solve ran out of budget
     */
    double[] timeConstants(double frontTimeS, double timeToHalfS) {
        double target = frontTimeS / timeToHalfS;
        double lowest;
        double highest;
        try {
            lowest = ratio(R_MIN);
            highest = ratio(R_MAX);
        } catch (TooManyEvaluationsException e) {
            throw new PulseTimingException(PulseTimingException.Kind.NOT_CONVERGED, quantity, frontTimeS, timeToHalfS,
                    Double.NaN, Double.NaN, e.getMessage());
        }
        if (!(target > lowest && target < highest)) {
            String hint = target >= highest ? "; the front is too slow for the tail: use another model (e.g. the cubic-exponential 8/20 current)" : "";
            throw new PulseTimingException(PulseTimingException.Kind.UNREACHABLE_RATIO, quantity, frontTimeS, timeToHalfS,
                    lowest, highest, hint);
        }
        BrentSolver outer = new BrentSolver(budget.relativeAccuracy(), budget.relativeAccuracy() * R_MIN);
        try {
            double r = outer.solve(budget.maxEvaluations(), x -> ratio(x) - target, R_MIN, R_MAX);
            double tau1 = timeToHalfS / normalisedTimings(r)[1];
            return new double[] {tau1, r * tau1};
        } catch (TooManyEvaluationsException e) {
            throw new PulseTimingException(PulseTimingException.Kind.NOT_CONVERGED, quantity, frontTimeS, timeToHalfS,
                    lowest, highest, e.getMessage());
        }
    }

    private double crossing(double r, double level, double from, double to) {
        BrentSolver solver = new BrentSolver(budget.relativeAccuracy(), budget.relativeAccuracy() * to);
        return solver.solve(budget.maxEvaluations(), s -> shape(s, r) - level, from, to);
    }
}
