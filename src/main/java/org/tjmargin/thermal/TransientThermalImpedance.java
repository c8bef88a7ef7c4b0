package org.tjmargin.thermal;

/**
 * Transient thermal impedance {@code Zth(t)}: the temperature rise (K) at time {@code t} per watt of a power step
 * applied at {@code t = 0} (JESD24-3/-4 style definition {@code Zth = ΔTj(t)/P}).
 *
 * <p>Linear superposition of such step responses gives the response to any power history (reference: the
 * superposition integral {@code ΔTj(t) = ∫ P'(u)·Zth(t − u) du}; common practice, valid while the material
 * properties do not depend on temperature).
 */
public interface TransientThermalImpedance {

    /**
     * @param tS time since the start of the power step (s); zero or negative gives zero
     * @return temperature rise per watt (K/W)
     */
    double zthKPerW(double tS);

    /**
     * @return the limit of {@link #zthKPerW(double)} for long times (K/W); {@code +∞} for models that never settle
     */
    double steadyStateKPerW();
}
