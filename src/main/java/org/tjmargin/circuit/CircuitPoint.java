package org.tjmargin.circuit;

/**
 * The electrical operating point of one circuit at one junction temperature.
 *
 * @param voltageV        voltage across the diode, i.e. the output (V)
 * @param diodeCurrentA   reverse current through the diode (A)
 * @param diodePowerW     diode dissipation {@code V·I} (W)
 * @param resistorPowerW  dissipation of the series (or source) resistor (W)
 * @param loadCurrentA    current into the load (A); 0 for circuits without one
 * @param region          where on the characteristic the diode sits
 */
public record CircuitPoint(double voltageV, double diodeCurrentA, double diodePowerW, double resistorPowerW,
                           double loadCurrentA, Region region) {
}
