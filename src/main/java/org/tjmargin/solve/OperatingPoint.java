package org.tjmargin.solve;

import org.tjmargin.circuit.CircuitPoint;

/**
 * A converged electro-thermal operating point (design 2.3, the quantities every report shows).
 *
 * @param tjK          junction temperature (K)
 * @param tLocalK      local air temperature around the part, ambient plus enclosure rise (K)
 * @param referenceK   temperature of the rating's reference point: lead at the rating distance, case, or air (K)
 * @param circuit      the electrical point at {@code tjK}
 * @param evaluations  circuit evaluations the solve used
 * @param loopGain     {@code Rθ·dP/dTj} at the root; stable below 1. NaN for a sweep corner that is not reported
 *                     (its gain is read by nothing, see {@link ElectroThermalSolver#withLoopGain}): every corner a
 *                     result shows (the hottest and least-current at each ambient, every corner at the highest) has
 *                     it
 * @param residualK    heat-balance residual {@code Tj − T_local − Rθ·P} (K)
 */
public record OperatingPoint(double tjK, double tLocalK, double referenceK, CircuitPoint circuit, int evaluations,
                             double loopGain, double residualK) {

    /** Diode dissipation (W). */
    public double diodePowerW() {
        return circuit.diodePowerW();
    }

    /** Heat this position puts into the enclosure air: diode plus series resistor (W). */
    public double heatW() {
        return circuit.diodePowerW() + circuit.resistorPowerW();
    }
}
