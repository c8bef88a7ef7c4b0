package org.tjmargin.surge;

/**
 * An ideal current source: the clamp carries {@code max(0, i(t))} whatever its voltage (a surge rating's test
 * condition, or a generator whose source impedance is far above the clamp's).
 *
 * @param current the current waveform (A)
 */
public record IdealCurrentSource(Waveform current) implements SurgeSource {

    public IdealCurrentSource {
        if (current == null || current.quantity() != SurgeQuantity.CURRENT) {
            throw new IllegalArgumentException("an ideal current source needs a current waveform, got "
                    + (current == null ? "none" : current.quantity()));
        }
    }

    @Override
    public Waveform waveform() {
        return current;
    }

    @Override
    public double clampCurrentA(double sourceValue, double breakdownVoltageV, double dynamicResistanceOhm) {
        return Math.max(0, sourceValue);
    }

    @Override
    public double idleClampVoltageV(double sourceValue) {
        return 0;
    }
}
