package org.tjmargin.solve;

import java.util.List;
import java.util.Optional;
import org.tjmargin.derating.RuleCheck;
import org.tjmargin.variation.Corner;

/**
 * One corner of one position at one ambient: the solve's outcome and the rules held against it.
 *
 * @param corner          the corner
 * @param outcome         converged, runaway or not converged
 * @param allowedPowerW   the device rating read at the reference point's temperature (W); 0 when not converged
 * @param resistorAllowedW the series resistor's derated rating at the local air (W); 0 without a resistor
 * @param checks          the policy's applicable rules at this corner
 */
public record CornerPoint(Corner corner, ThermalOutcome outcome, double allowedPowerW, double resistorAllowedW,
                          List<RuleCheck> checks) {

    public CornerPoint {
        checks = List.copyOf(checks);
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
