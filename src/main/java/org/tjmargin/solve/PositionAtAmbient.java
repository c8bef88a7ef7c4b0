package org.tjmargin.solve;

import java.util.List;
import java.util.Optional;
import org.tjmargin.derating.Rule;
import org.tjmargin.surge.SurgeResult;

/**
 * One position at one ambient: every corner, the hottest and the least-current corners, each rule at its worst
 * corner, and the position's margin (the smallest) with the rule that limits it.
 *
 * @param positionId        the position
 * @param ambientK          room temperature (K)
 * @param tLocalK           air temperature around the part (K)
 * @param corners           every corner
 * @param hottestIndex      corner with the hottest junction (a runaway corner counts as hottest); −1 if none
 * @param leastCurrentIndex corner with the least diode current among converged corners; −1 if none
 * @param worst             each applicable rule at its worst corner, in policy order
 * @param margin            smallest margin of all rules at all corners
 * @param limitingRuleId    the rule giving that margin
 * @param status            converged, runaway or not converged
 */
public record PositionAtAmbient(String positionId, double ambientK, double tLocalK, List<CornerPoint> corners,
                                int hottestIndex, int leastCurrentIndex, List<WorstCheck> worst, double margin,
                                String limitingRuleId, PointStatus status) {

    public PositionAtAmbient {
        corners = List.copyOf(corners);
        worst = List.copyOf(worst);
    }

    /** The hottest corner. */
    public Optional<CornerPoint> hottest() {
        return hottestIndex < 0 ? Optional.empty() : Optional.of(corners.get(hottestIndex));
    }

    /** The corner with the least diode current. */
    public Optional<CornerPoint> leastCurrent() {
        return leastCurrentIndex < 0 ? Optional.empty() : Optional.of(corners.get(leastCurrentIndex));
    }

    /**
     * The corner where surge {@code caseId} comes closest to its limits: the largest of its power ratio and its
     * junction rise over the rise to Tj max (design 2.6); empty when no corner evaluated it.
     *
     * @param tjMaxK the part's maximum junction temperature (K)
     */
    public Optional<CornerPoint> worstCornerForSurge(String caseId, double tjMaxK) {
        CornerPoint worst = null;
        double worstScore = Double.NEGATIVE_INFINITY;
        for (CornerPoint c : corners) {
            Optional<SurgeResult> s = c.surge(caseId);
            if (s.isPresent()) {
                double score = Math.max(s.get().powerRatio(), (s.get().peakJunctionTemperatureK() - Rule.TEMPERATURE_MARGIN_ORIGIN_K)
                        / (tjMaxK - Rule.TEMPERATURE_MARGIN_ORIGIN_K));
                if (score > worstScore) {
                    worstScore = score;
                    worst = c;
                }
            }
        }
        return Optional.ofNullable(worst);
    }

    /** True when every rule holds at every corner and nothing ran away. */
    public boolean passes() {
        return status == PointStatus.CONVERGED && margin >= 0;
    }
}
