package org.tjmargin.surge;

import org.tjmargin.device.Celsius;
/**
 * A clamp line whose breakdown voltage moves linearly with junction temperature:
 * {@code Vbr(Tj) = Vbr25 + αV·(Tj − 298.15 K)} (design §2.1; TVS datasheet convention
 * {@code ΔVBR = αT·(Tj − 25 °C)·VBR(25 °C)}, reference 1.4).
 *
 * @param breakdownVoltage25V        {@code Vbr} at 25 °C (V), positive
 * @param temperatureCoefficientVPerK {@code αV} (V/K), finite, either sign
 * @param dynamicResistanceOhm       {@code Rd} (Ω), finite, not negative
 */
public record LinearClampLine(double breakdownVoltage25V, double temperatureCoefficientVPerK, double dynamicResistanceOhm)
        implements ClampLine {

    /** 25 °C in kelvin, the reference temperature of datasheet breakdown voltages. */
    public static final double REFERENCE_TEMPERATURE_K = Celsius.T25_K;

    public LinearClampLine {
        if (!(breakdownVoltage25V > 0) || !Double.isFinite(breakdownVoltage25V)) {
            throw new IllegalArgumentException("breakdown voltage at 25 °C must be positive and finite: " + breakdownVoltage25V + " V");
        }
        if (!Double.isFinite(temperatureCoefficientVPerK)) {
            throw new IllegalArgumentException("temperature coefficient must be finite: " + temperatureCoefficientVPerK + " V/K");
        }
        if (!(dynamicResistanceOhm >= 0) || !Double.isFinite(dynamicResistanceOhm)) {
            throw new IllegalArgumentException("dynamic resistance must be finite and not negative: " + dynamicResistanceOhm + " Ω");
        }
    }

    /**
     * The high-current line of a breakdown diode (design 2.1): {@code Vbr(25 °C)} is the breakdown line's intercept
     * at 25 °C, {@code αV} its temperature coefficient, {@code Rd} as given (e.g. {@link SurgeRating#dynamicResistanceOhm}).
     */
    public static LinearClampLine of(org.tjmargin.device.BreakdownDiode diode, double dynamicResistanceOhm) {
        return new LinearClampLine(diode.vz0At25V(), diode.tc().alphaVPerK(), dynamicResistanceOhm);
    }

    @Override
    public double breakdownVoltageV(double tjK) {
        return breakdownVoltage25V + temperatureCoefficientVPerK * (tjK - REFERENCE_TEMPERATURE_K);
    }
}
