package org.tjmargin.thermal;

/**
 * Budget and tolerances of the one-dimensional search for the time of peak junction rise through a Foster network.
 * The search brackets a sign change of the rise's time derivative and solves it with Brent's method
 * (Commons Math {@code BrentSolver}).
 *
 * @param maxEvaluationsPerRoot   evaluation budget of each bracketed root solve
 * @param relativeTimeTolerance   time tolerance relative to the bracket's width; the peak value's error is second
 *                                order in the time error, so 1e-10 gives the value to about 1e-20 of the bracket's
 *                                curvature, far below double precision
 * @param derivativeSamples       samples of the derivative across a bracket that may hold more than one sign
 *                                change (sum of stages with different time constants), at least 2
 */
public record FosterPeakSearch(int maxEvaluationsPerRoot, double relativeTimeTolerance, int derivativeSamples) {

    public FosterPeakSearch {
        if (maxEvaluationsPerRoot < 1) {
            throw new IllegalArgumentException("peak search budget must be at least 1: " + maxEvaluationsPerRoot);
        }
        if (!(relativeTimeTolerance > 0 && relativeTimeTolerance < 1)) {
            throw new IllegalArgumentException("peak search relative time tolerance must be in (0, 1): " + relativeTimeTolerance);
        }
        if (derivativeSamples < 2) {
            throw new IllegalArgumentException("peak search needs at least 2 derivative samples: " + derivativeSamples);
        }
    }

    /**
     * Defaults: 100 evaluations per root (Brent on a bracket needs about 40 in the worst, bisection-like case for
     * a 1e-10 relative tolerance), tolerance 1e-10, 32 derivative samples.
     */
    public static FosterPeakSearch defaults() {
        return new FosterPeakSearch(100, 1e-10, 32);
    }
}
