package org.tjmargin.surge;

/**
 * Budget and tolerance of the nested one-dimensional solves that turn a front time and a time to half value into
 * the time constants of a {@link DoubleExponentialPulse} (Commons Math {@code BrentSolver}).
 *
 * @param maxEvaluations     evaluation budget of each solve (outer and each inner one)
 * @param relativeAccuracy   relative accuracy of each solve
 */
public record TimingSolveBudget(int maxEvaluations, double relativeAccuracy) {

    public TimingSolveBudget {
        if (maxEvaluations < 1) {
            throw new IllegalArgumentException("timing solve budget must be at least 1: " + maxEvaluations);
        }
        if (!(relativeAccuracy > 0 && relativeAccuracy < 1e-3)) {
            throw new IllegalArgumentException("timing solve relative accuracy must be in (0, 1e-3): " + relativeAccuracy);
        }
    }

    /**
     * Defaults: 200 evaluations per solve (Brent needs 10–40 here), relative accuracy 1e-13, so the time constants
     * are good to about 1e-12, far inside the references' printed digits.
     */
    public static TimingSolveBudget defaults() {
        return new TimingSolveBudget(200, 1e-13);
    }
}
