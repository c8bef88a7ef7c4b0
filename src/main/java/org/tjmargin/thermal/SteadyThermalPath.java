package org.tjmargin.thermal;

import java.util.List;

/**
 * A steady-state heat path from the junction to the local air around the part:
 * {@code Tj = T_local + P·Rθja} (design 2.2), with one intermediate node, the rating's reference point (lead at
 * the rating's distance, case, or the air itself), whose temperature a rating curve is read at:
 * {@code T_ref = Tj − P·Rθjr}.
 */
public interface SteadyThermalPath {

    /** Junction → local air (K/W), > 0. */
    double rThetaJaKPerW();

    /** Junction → the rating's reference point (K/W), 0 ≤ Rθjr ≤ Rθja. */
    double rThetaJrKPerW();

    /** Notes on values taken from rules of thumb or extrapolation; empty when every value was given. */
    List<String> notes();

    /** Temperature of the reference point (K) with the junction at {@code tjK} dissipating {@code powerW}. */
    default double referenceTemperatureK(double tjK, double powerW) {
        return tjK - powerW * rThetaJrKPerW();
    }

    /** This path with every resistance multiplied by {@code factor} (a tolerance corner of {@code Rθ}). */
    default SteadyThermalPath scaledBy(double factor) {
        return new GivenPath(rThetaJaKPerW() * factor, rThetaJrKPerW() * factor, notes());
    }
}
