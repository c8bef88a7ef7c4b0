package org.tjmargin.surge;

/**
 * Grid, budget and tolerances of the {@link ClampTransient} solver.
 *
 * @param pointsPerFront        the least number of steps in every front of the waveform (and the longest step is
 *                              the waveform's duration over this number), at least 2
 * @param relativeTolerance     local tolerance of the piecewise-linear power and current: at each step's midpoint
 *                              the true value may differ from the chord by this fraction of the step's largest
 *                              value, or of 1e-4 of the peak for smaller values
 * @param maxSteps              accepted-step budget
 * @param maxCouplingIterations fixed-point iterations allowed per step for the junction temperature
 * @param couplingToleranceK    the fixed point's stop: change of the junction temperature between iterations (K)
 * @param maxStepGrowth         the largest factor from one step to the next, above 1
 * @param keepsSeries           whether the result keeps the time history ({@link ClampTransientResult#series()});
 *                              without it the series is empty and every other number is the same (recording
 *                              changes nothing in the computation). A surge checked at every corner of every
 *                              ambient needs only its peaks and integrals; its history is for the charts.
 */
public record TransientSettings(int pointsPerFront, double relativeTolerance, int maxSteps, int maxCouplingIterations,
        double couplingToleranceK, double maxStepGrowth, boolean keepsSeries) {

    public TransientSettings {
        if (pointsPerFront < 2) {
            throw new IllegalArgumentException("points per front must be at least 2: " + pointsPerFront);
        }
        if (!(relativeTolerance > 0 && relativeTolerance < 0.1)) {
            throw new IllegalArgumentException("transient relative tolerance must be in (0, 0.1): " + relativeTolerance);
        }
        if (maxSteps < 1 || maxCouplingIterations < 1) {
            throw new IllegalArgumentException("transient budgets must be positive: maxSteps = " + maxSteps
                    + ", maxCouplingIterations = " + maxCouplingIterations);
        }
        if (!(couplingToleranceK > 0) || !Double.isFinite(couplingToleranceK)) {
            throw new IllegalArgumentException("coupling tolerance must be positive and finite: " + couplingToleranceK + " K");
        }
        if (!(maxStepGrowth > 1) || !Double.isFinite(maxStepGrowth)) {
            throw new IllegalArgumentException("step growth limit must be finite and above 1: " + maxStepGrowth);
        }
    }

    /**
     * Defaults: 50 points per front (the brief's minimum), relative tolerance 1e-4 (energies then agree with
     * closed forms to about 1e-4), 200 000 steps (a load dump needs a few hundred), 50 coupling iterations (a
     * few suffice: the per-step loop gain is small), coupling tolerance 1e-9 K, growth at most 2 per step; the
     * time history kept.
     */
    public static TransientSettings defaults() {
        return new TransientSettings(50, 1e-4, 200_000, 50, 1e-9, 2.0, true);
    }

    /** @return a copy with another number of points per front */
    public TransientSettings withPointsPerFront(int n) {
        return new TransientSettings(n, relativeTolerance, maxSteps, maxCouplingIterations, couplingToleranceK, maxStepGrowth,
                keepsSeries);
    }

    /** @return a copy with another relative tolerance */
    public TransientSettings withRelativeTolerance(double tol) {
        return new TransientSettings(pointsPerFront, tol, maxSteps, maxCouplingIterations, couplingToleranceK, maxStepGrowth,
                keepsSeries);
    }

    /** @return a copy with another step budget */
    public TransientSettings withMaxSteps(int steps) {
        return new TransientSettings(pointsPerFront, relativeTolerance, steps, maxCouplingIterations, couplingToleranceK, maxStepGrowth,
                keepsSeries);
    }

    /** @return a copy that keeps the time history or not */
    public TransientSettings withSeries(boolean keep) {
        return new TransientSettings(pointsPerFront, relativeTolerance, maxSteps, maxCouplingIterations, couplingToleranceK,
                maxStepGrowth, keep);
    }
}
