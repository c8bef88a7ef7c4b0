package org.tjmargin.solve;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import org.tjmargin.derating.Rule;
import org.tjmargin.surge.SurgeResult;

/**
 * One position at one ambient: its corners, the hottest and the least-current corners, each rule at its worst
 * corner, the position's margin (the smallest) with the rule that limits it, and what all corners span.
 *
 * <p>A sweep keeps every corner only at the design's highest ambient, where every corner is reported; below it a
 * position keeps its reported corners (the hottest, the least-current and each rule's worst) with the indices
 * renumbered into that shorter list, and {@link #envelope()} for what all of them spanned
 * ({@link #reportedOnly()}). A thousand positions swept over a hundred ambients would otherwise hold two million
 * corners, about half a gigabyte, that no output reads.
 *
 * @param positionId        the position
 * @param ambientK          room temperature (K)
 * @param tLocalK           air temperature around the part (K)
 * @param corners           every corner, or only the reported ones (see above)
 * @param hottestIndex      corner with the hottest junction (a runaway corner counts as hottest); −1 if none
 * @param leastCurrentIndex corner with the least diode current among converged corners; −1 if none
 * @param worst             each applicable rule at its worst corner, in policy order
 * @param margin            smallest margin of all rules at all corners
 * @param limitingRuleId    the rule giving that margin
 * @param status            converged, runaway or not converged
 * @param cornerCount       how many corners were solved (≥ {@code corners.size()})
 * @param envelope          what all solved corners span
 */
public record PositionAtAmbient(String positionId, double ambientK, double tLocalK, List<CornerPoint> corners,
                                int hottestIndex, int leastCurrentIndex, List<WorstCheck> worst, double margin,
                                String limitingRuleId, PointStatus status, int cornerCount,
                                CornerEnvelope envelope) {

    public PositionAtAmbient {
        corners = List.copyOf(corners);
        worst = List.copyOf(worst);
        if (cornerCount < corners.size()) {
            throw new IllegalArgumentException(cornerCount + " corners solved but " + corners.size() + " kept");
        }
    }

    /** Every corner solved and kept: the count and the envelope are those of {@code corners}. */
    public PositionAtAmbient(String positionId, double ambientK, double tLocalK, List<CornerPoint> corners,
                             int hottestIndex, int leastCurrentIndex, List<WorstCheck> worst, double margin,
                             String limitingRuleId, PointStatus status) {
        this(positionId, ambientK, tLocalK, corners, hottestIndex, leastCurrentIndex, worst, margin, limitingRuleId,
                status, corners.size(), CornerEnvelope.of(corners));
    }

    /** True when every solved corner is kept. */
    public boolean keepsEveryCorner() {
        return corners.size() == cornerCount;
    }

    /**
     * This point with only its reported corners, in their order: the hottest, the least-current and each rule's
     * worst, the indices renumbered; the count and the envelope stay those of every corner.
     */
    public PositionAtAmbient reportedOnly() {
        int n = corners.size();
        int[] renumbered = new int[n];
        Arrays.fill(renumbered, -1);
        mark(renumbered, hottestIndex);
        mark(renumbered, leastCurrentIndex);
        for (WorstCheck w : worst) {
            mark(renumbered, w.cornerIndex());
        }
        List<CornerPoint> kept = new ArrayList<>();
        for (int k = 0; k < n; k++) {
            if (renumbered[k] >= 0) {
                renumbered[k] = kept.size();
                kept.add(corners.get(k));
            }
        }
        if (kept.size() == n) {
            return this;
        }
        List<WorstCheck> w2 = new ArrayList<>(worst.size());
        for (WorstCheck w : worst) {
            w2.add(new WorstCheck(w.check(), renumbered[w.cornerIndex()]));
        }
        return new PositionAtAmbient(positionId, ambientK, tLocalK, kept,
                hottestIndex < 0 ? -1 : renumbered[hottestIndex],
                leastCurrentIndex < 0 ? -1 : renumbered[leastCurrentIndex], w2, margin, limitingRuleId, status,
                cornerCount, envelope);
    }

    private static void mark(int[] keep, int index) {
        if (index >= 0) {
            keep[index] = 0;
        }
    }

    /** The same point with another status (the rest unchanged). */
    public PositionAtAmbient withStatus(PointStatus s) {
        return new PositionAtAmbient(positionId, ambientK, tLocalK, corners, hottestIndex, leastCurrentIndex, worst,
                margin, limitingRuleId, s, cornerCount, envelope);
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
