package org.tjmargin.solve;

import org.tjmargin.circuit.Circuit;
import org.tjmargin.device.BreakdownDiode;
import org.tjmargin.thermal.SteadyThermalPath;
import org.tjmargin.variation.Corner;

/**
 * A position at one corner: every toleranced value fixed.
 *
 * @param corner  the corner
 * @param diode   the diode at that corner
 * @param circuit the circuit at that corner
 * @param path    the thermal path at that corner
 */
public record PositionInstance(Corner corner, BreakdownDiode diode, Circuit circuit, SteadyThermalPath path) {

    /** Solves this instance's operating point in air at {@code tLocalK}. */
    public ThermalOutcome solve(double tLocalK, SolverSettings settings) {
        return ElectroThermalSolver.solve(circuit, diode, path, tLocalK, settings);
    }
}
