package org.tjmargin.solve;

import org.tjmargin.circuit.Circuit;
import org.tjmargin.device.BreakdownDiode;
import org.tjmargin.device.PreparedDiode;
import org.tjmargin.thermal.SteadyThermalPath;
import org.tjmargin.variation.Corner;

/**
 * A position at one corner: every toleranced value fixed.
 *
 * @param corner   the corner
 * @param diode    the diode at that corner
 * @param circuit  the circuit at that corner
 * @param path     the thermal path at that corner
 * @param prepared the diode's temperature-independent constants, computed once for the instance (a sweep solves
 *                 each corner at every ambient; preparing per solve cost a few logarithms each time)
 */
public record PositionInstance(Corner corner, BreakdownDiode diode, Circuit circuit, SteadyThermalPath path,
                               PreparedDiode prepared) {

    public PositionInstance {
        if (prepared.diode() != diode) {
            throw new IllegalArgumentException("the prepared diode must be prepared from this instance's diode");
        }
    }

    /** The instance with its diode prepared. */
    public PositionInstance(Corner corner, BreakdownDiode diode, Circuit circuit, SteadyThermalPath path) {
        this(corner, diode, circuit, path, PreparedDiode.of(diode));
    }

    /** Equal when corner, diode, circuit and path are: the prepared constants follow from the diode. */
    @Override
    public boolean equals(Object o) {
        return o instanceof PositionInstance p && corner.equals(p.corner) && diode.equals(p.diode)
                && circuit.equals(p.circuit) && path.equals(p.path);
    }

    @Override
    public int hashCode() {
        return java.util.Objects.hash(corner, diode, circuit, path);
    }

    /** Solves this instance's operating point in air at {@code tLocalK}. */
    public ThermalOutcome solve(double tLocalK, SolverSettings settings) {
        return ElectroThermalSolver.solve(circuit, prepared, path, tLocalK, settings);
    }

    /**
     * As {@link #solve}, with the loop gain left NaN (two circuit evaluations fewer): for the sweep's corners, whose
     * gain is read only where a corner is reported, and completed there by {@link ElectroThermalSolver#withLoopGain}.
     */
    ThermalOutcome solveWithoutLoopGain(double tLocalK, SolverSettings settings) {
        return ElectroThermalSolver.solve(circuit, prepared, path, tLocalK, settings, false);
    }

    /** As above, evaluating through {@code balance}, a caller's reusable map (one per thread). */
    ThermalOutcome solveWithoutLoopGain(double tLocalK, SolverSettings settings, HeatBalance balance) {
        return ElectroThermalSolver.solve(circuit, prepared, path, tLocalK, settings, false, balance);
    }
}
