package org.tjmargin.solve;

import java.util.List;
import java.util.Optional;
import org.tjmargin.surge.SurgeResult;
import org.tjmargin.variation.Corner;

/**
 * One corner of one position at one ambient: the solve's outcome and the ratings it was held against. The rules'
 * results are kept per rule at its worst corner ({@link PositionAtAmbient#worst()}), not per corner: a board of a
 * thousand positions swept over a hundred ambients has millions of corners, and a check for every rule at each
 * of them would hold about a gigabyte that no output reads.
 *
 * @param corner          the corner
 * @param outcome         converged, runaway or not converged
 * @param allowedPowerW   the device rating read at the reference point's temperature (W); 0 when not converged
 * @param resistorAllowedW the series resistor's derated rating at the local air (W); 0 without a resistor
 * @param surges          each of the position's surges started from this corner's steady state, in the design's
 *                        order; empty without surges or without a converged point
 */
public record CornerPoint(Corner corner, ThermalOutcome outcome, double allowedPowerW, double resistorAllowedW,
                          List<SurgeResult> surges) {

    public CornerPoint {
        surges = List.copyOf(surges);
    }

    /** The result of surge {@code caseId} at this corner, if evaluated. */
    public Optional<SurgeResult> surge(String caseId) {
        return surges.stream().filter(s -> s.caseId().equals(caseId)).findFirst();
    }

    /** The converged point, if any. */
    public Optional<OperatingPoint> point() {
        return outcome instanceof ThermalOutcome.Converged c ? Optional.of(c.point()) : Optional.empty();
    }

    /** This corner's status. */
    public PointStatus status() {
        if (outcome instanceof ThermalOutcome.Converged) {
            return PointStatus.CONVERGED;
        }
        return outcome instanceof ThermalOutcome.Runaway ? PointStatus.RUNAWAY : PointStatus.NOT_CONVERGED;
    }
}
