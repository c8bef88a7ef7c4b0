package org.tjmargin.surge;

/**
 * A breakdown diode's high-current line during a surge: {@code V = Vbr(Tj) + Rd·I} for {@code I > 0}; below
 * {@code Vbr} it draws no current (leakage is negligible during a surge). Design §2.1, "High current".
 */
public interface ClampLine {

    /**
     * @param tjK junction temperature (K)
     * @return the zero-current intercept of the high-current line (V)
     */
    double breakdownVoltageV(double tjK);

    /** @return the line's slope {@code Rd} (Ω), not negative */
    double dynamicResistanceOhm();
}
