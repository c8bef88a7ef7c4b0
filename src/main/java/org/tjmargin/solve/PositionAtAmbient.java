package org.tjmargin.solve;

import java.util.List;
import java.util.Optional;

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

    /** True when every rule holds at every corner and nothing ran away. */
    public boolean passes() {
        return status == PointStatus.CONVERGED && margin >= 0;
    }
}
