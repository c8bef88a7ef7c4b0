package org.tjmargin.device;

/**
 * How the datasheet measured the nominal breakdown voltage, which fixes the junction temperature {@code Tj_test}
 * at which {@code Vz_nom} holds.
 *
 * <ul>
 *   <li>{@link Pulsed}: a short pulse, no self-heating: {@code Tj_test} is the stated temperature (usually
 *   25 °C).</li>
 *   <li>{@link ThermalEquilibrium}: the test current flowed long enough (for small glass Zeners typically
 *   20 ± 5 s, with the leads clipped at a stated distance and temperature) for the junction to settle above the
 *   held reference by {@code Vz_nom·Izt·Rθ}, where {@code Rθ} is the resistance from the junction to the held
 *   point. This self-heating can reach 30 K or more (Walters and Clark, application-note series no. 204), so
 *   pulse-tested and equilibrium values must not be compared without it.</li>
 * </ul>
 */
public sealed interface VzTestCondition permits VzTestCondition.Pulsed, VzTestCondition.ThermalEquilibrium {

    /**
     * The junction temperature during the measurement.
     *
     * @param vzNomV nominal voltage (V)
     * @param iztA   test current (A)
     * @return {@code Tj_test} (K)
     */
    double junctionTemperatureK(double vzNomV, double iztA);

    /**
     * Pulse measurement at a junction temperature equal to {@code tjTestK}.
     *
     * @param tjTestK junction temperature of the measurement (K)
     */
    record Pulsed(double tjTestK) implements VzTestCondition {
        public Pulsed {
            if (!Double.isFinite(tjTestK) || tjTestK <= 0) {
                throw new IllegalArgumentException("test temperature must be a positive kelvin value, got " + tjTestK);
            }
        }

        @Override
        public double junctionTemperatureK(double vzNomV, double iztA) {
            return tjTestK;
        }
    }

    /**
     * Measurement at thermal equilibrium with a reference point held at {@code heldTemperatureK}.
     *
     * @param heldTemperatureK      temperature of the held point, e.g. the lead clips (K)
     * @param rThetaToHeldPointKPerW thermal resistance junction → held point at the test's distance (K/W)
     */
    record ThermalEquilibrium(double heldTemperatureK, double rThetaToHeldPointKPerW) implements VzTestCondition {
        public ThermalEquilibrium {
            if (!Double.isFinite(heldTemperatureK) || heldTemperatureK <= 0) {
                throw new IllegalArgumentException("held temperature must be a positive kelvin value, got "
                        + heldTemperatureK);
            }
            if (!(rThetaToHeldPointKPerW >= 0) || !Double.isFinite(rThetaToHeldPointKPerW)) {
                throw new IllegalArgumentException("thermal resistance to the held point must be ≥ 0, got "
                        + rThetaToHeldPointKPerW + " K/W");
            }
        }

        @Override
        public double junctionTemperatureK(double vzNomV, double iztA) {
            return heldTemperatureK + vzNomV * iztA * rThetaToHeldPointKPerW;
        }
    }
}
