package org.tjmargin.surge;

/**
 * A voltage source {@code v(t)} behind a resistance {@code R}. Against the clamp's line
 * {@code V = Vbr(Tj) + Rd·I} the current is {@code I = max(0, (v(t) − Vbr(Tj))/(R + Rd))} (Kirchhoff's voltage
 * law around the loop; reference 4.2 gives the stiff-clamp form {@code (Voc − Vc)/Zs}).
 *
 * @param openCircuitVoltage the open-circuit voltage waveform (V)
 * @param resistanceOhm      source resistance (Ω), finite, not negative (zero needs a clamp with {@code Rd > 0})
 */
public record TheveninSource(Waveform openCircuitVoltage, double resistanceOhm) implements SurgeSource {

    public TheveninSource {
        if (openCircuitVoltage == null || openCircuitVoltage.quantity() != SurgeQuantity.VOLTAGE) {
            throw new IllegalArgumentException("a Thevenin source needs a voltage waveform, got "
                    + (openCircuitVoltage == null ? "none" : openCircuitVoltage.quantity()));
        }
        if (!(resistanceOhm >= 0) || !Double.isFinite(resistanceOhm)) {
            throw new IllegalArgumentException("Thevenin resistance must be finite and not negative: " + resistanceOhm + " Ω");
        }
    }

    @Override
    public Waveform waveform() {
        return openCircuitVoltage;
    }

    @Override
    public double clampCurrentA(double sourceValue, double breakdownVoltageV, double dynamicResistanceOhm) {
        double excess = sourceValue - breakdownVoltageV;
        return excess > 0 ? excess / (resistanceOhm + dynamicResistanceOhm) : 0;
    }

    @Override
    public double idleClampVoltageV(double sourceValue) {
        return sourceValue;
    }
}
