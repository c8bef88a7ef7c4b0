package org.tjmargin.thermal;

/**
 * Budget and tolerances of the Levenberg–Marquardt fits of Foster networks (Commons Math
 * {@code LevenbergMarquardtOptimizer}, the MINPACK algorithm of Moré, 1978).
 *
 * @param maxEvaluations             model evaluations allowed
 * @param maxIterations              iterations allowed
 * @param costRelativeTolerance      stop when the relative reduction of the sum of squares falls below this
 * @param parameterRelativeTolerance stop when the relative change of the (log) parameters falls below this
 * @param orthoTolerance             stop when the residuals are this nearly orthogonal to the Jacobian's columns
 * @param peakSearch                 peak search used where a fit needs the peak of a pulse response
 */
public record FosterFitSettings(int maxEvaluations, int maxIterations, double costRelativeTolerance,
        double parameterRelativeTolerance, double orthoTolerance, FosterPeakSearch peakSearch) {

    public FosterFitSettings {
        if (maxEvaluations < 1 || maxIterations < 1) {
            throw new IllegalArgumentException("fit budget must be positive: maxEvaluations = " + maxEvaluations
                    + ", maxIterations = " + maxIterations);
        }
        for (double tol : new double[] {costRelativeTolerance, parameterRelativeTolerance, orthoTolerance}) {
            if (!(tol > 0 && tol < 1)) {
                throw new IllegalArgumentException("fit tolerances must be in (0, 1): " + costRelativeTolerance + ", "
                        + parameterRelativeTolerance + ", " + orthoTolerance);
            }
        }
        if (peakSearch == null) {
            throw new IllegalArgumentException("fit settings need a peak search");
        }
    }

    /**
     * Defaults: 2000 evaluations and iterations (a 4-stage fit to 20 points usually takes 10–60), tolerances 1e-10
     * (the data are datasheet readings good to a few percent; the tight stop only makes noise-free test cases
     * recover their parameters, and costs a handful of extra iterations).
     */
    public static FosterFitSettings defaults() {
        return new FosterFitSettings(2000, 2000, 1e-10, 1e-10, 1e-10, FosterPeakSearch.defaults());
    }
}
