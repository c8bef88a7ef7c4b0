package org.tjmargin.solve;

import java.util.List;
import java.util.Optional;

/**
 * A position's result over the whole ambient range.
 *
 * @param id             the position
 * @param verdict        its verdict
 * @param limitingRuleId the rule with the smallest margin over the sweep
 * @param worstMargin    that margin
 * @param worstAmbientK  the ambient where it occurs (K)
 * @param maxAmbient     the highest ambient at which every rule holds
 * @param runaway        where thermal runaway begins, if it does in the range
 * @param regulation     line and load regulation at the design's highest ambient (regulators only)
 * @param notes          estimated values and assumptions to flag in every output
 */
public record PositionResult(String id, Verdict verdict, String limitingRuleId, double worstMargin,
                             double worstAmbientK, MaximumAmbient maxAmbient, Optional<RunawayOnset> runaway,
                             Optional<Regulation> regulation, List<String> notes) {
    public PositionResult {
        notes = List.copyOf(notes);
    }
}
