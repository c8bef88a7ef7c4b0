package org.tjmargin.variation.statistical;

import org.tjmargin.solve.PointStatus;

/**
 * One point of the input space solved and held against the policy.
 *
 * @param status         converged, runaway or not converged
 * @param tjK            junction temperature (K): the root, or for an unresolved point the last temperature reached
 *                       (the search cap for runaway)
 * @param margin         the smallest margin of the applicable rules (1), 1 when none applies (as the corner analysis)
 * @param limitingRuleId the rule giving it, {@code none} when none applies
 * @param violatedMask   bit {@code i} set when rule {@code i} of the policy (policy order) applies and fails
 * @param fastPath       true when the closed form of {@link LinearFastPath} gave the point
 */
public record Evaluation(PointStatus status, double tjK, double margin, String limitingRuleId, long violatedMask,
                         boolean fastPath) {

    public Evaluation {
        if (status == null || limitingRuleId == null || !Double.isFinite(tjK) || !Double.isFinite(margin)) {
            throw new IllegalArgumentException("an evaluation needs a status, a rule and finite values; got " + status
                    + ", " + tjK + " K, margin " + margin);
        }
    }

    /** True when the point converged and every applicable rule holds. */
    public boolean passes() {
        return status == PointStatus.CONVERGED && violatedMask == 0;
    }
}
