package org.tjmargin.solve;

import org.tjmargin.circuit.CircuitPoint;
import org.tjmargin.circuit.CircuitState;

/**
 * The heat one corner of a position puts into the enclosure air (diode plus series resistor), as the board's air
 * balance counts it (design 2.2): at the converged operating point; for a corner that runs away, at the junction
 * search's cap, the worst it can be; for a solve that ran out of budget, at its last iterate.
 *
 * <p>Stateless and thread-safe.
 */
final class CornerHeat {

    private CornerHeat() {
    }

    /** The heat of a corner whose outcome is already known (W). */
    static double of(PositionInstance inst, ThermalOutcome out, SolverSettings settings) {
        if (out instanceof ThermalOutcome.Converged c) {
            return c.point().heatW();
        }
        double tj = out instanceof ThermalOutcome.NotConverged n ? n.lastTjK() : settings.capK();
        return heatAt(inst, tj);
    }

    /**
     * The heat of a corner in air at {@code tLocalK}, solving only what the heat needs: the same lowest fixed point
     * as {@link PositionInstance#solve} (same iterates, same root, so the same heat to the last bit) without the
     * loop gain's two extra evaluations and without building the operating point.
     */
    static double inAir(PositionInstance inst, double tLocalK, SolverSettings settings) {
        return heatInAir(inst, tLocalK, settings).totalW();
    }

    /** As above, evaluating through {@code balance}, a caller's reusable map (one per thread). */
    static double inAir(PositionInstance inst, double tLocalK, SolverSettings settings, HeatBalance balance) {
        return heatInAir(inst, tLocalK, settings, balance).totalW();
    }

    /**
     * A corner's heat in air at {@code tLocalK}, with what a floor of its heat in hotter air needs (see
     * {@link AirMap.HeatFloor}).
     *
     * @param totalW  diode plus resistor (W), as {@link #inAir}
     * @param diodeW  the diode's share at the operating point (W); 0 unless converged
     * @param outcome converged, runaway or not converged
     */
    record Heat(double totalW, double diodeW, PointStatus outcome) {
    }

    /** As {@link #inAir}, with the diode's share and the outcome. */
    static Heat heatInAir(PositionInstance inst, double tLocalK, SolverSettings settings) {
        return heatInAir(inst, tLocalK, settings, new HeatBalance());
    }

    /** As above, evaluating through {@code balance}, a caller's reusable map (one per thread). */
    static Heat heatInAir(PositionInstance inst, double tLocalK, SolverSettings settings, HeatBalance balance) {
        // The instance's prepared constants (equal results, see PreparedDiode), one map and one state for every
        // evaluation; the state holds the last one when the search returns.
        FixedPointOutcome outcome = LowestFixedPoint.find(balance.aim(inst, tLocalK), tLocalK, settings);
        if (outcome instanceof FixedPointOutcome.Root r) {
            CircuitState last = balance.stateAt(r.x());
            return new Heat(last.diodePowerW() + last.resistorPowerW(), last.diodePowerW(), PointStatus.CONVERGED);
        }
        if (outcome instanceof FixedPointOutcome.Runaway) {
            return new Heat(heatAt(inst, settings.capK()), 0.0, PointStatus.RUNAWAY);
        }
        return new Heat(heatAt(inst, ((FixedPointOutcome.Exhausted) outcome).lastX()), 0.0,
                PointStatus.NOT_CONVERGED);
    }

    private static double heatAt(PositionInstance inst, double tjK) {
        CircuitPoint cp = inst.circuit().at(inst.prepared(), tjK);
        return cp.diodePowerW() + cp.resistorPowerW();
    }
}
