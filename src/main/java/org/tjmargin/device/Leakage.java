package org.tjmargin.device;

/**
 * Reverse leakage below breakdown: {@code Ir} at {@code Vr} at 25 °C, growing with junction temperature as
 * {@code Ir(Tj) = Ir(25 °C)·2^((Tj − 25 °C)/Td)}.
 *
 * <p>The doubling interval {@code Td = 10 K} is the usual rule of thumb (common practice, no single source). It is
 * rough over wide spans: generation current scales with the intrinsic carrier density and gives about ×2.1 per
 * 10 K near 300 K, diffusion current with its square, about ×4.5 (Sze and Ng, <i>Physics of Semiconductor
 * Devices</i>, 3rd ed. 2007, ch. 2). Hence {@code Td} is an input.
 *
 * @param irA       leakage current at {@code vrV} and 25 °C (A), ≥ 0; 0 means "no leakage data"
 * @param vrV       the voltage at which {@code irA} is specified (V), > 0
 * @param doublingK temperature interval over which the leakage doubles (K), > 0
 */
public record Leakage(double irA, double vrV, double doublingK) {

    /** Default doubling interval (K): common practice, no single source. */
    public static final double DEFAULT_DOUBLING_K = 10.0;

    /** No leakage data: the diode conducts nothing below its knee. */
    public static final Leakage NONE = new Leakage(0.0, 1.0, DEFAULT_DOUBLING_K);

    public Leakage {
        if (!(irA >= 0) || !Double.isFinite(irA)) {
            throw new IllegalArgumentException("leakage current must be ≥ 0 and finite, got " + irA + " A");
        }
        if (!(vrV > 0) || !Double.isFinite(vrV)) {
            throw new IllegalArgumentException("leakage test voltage must be > 0, got " + vrV + " V");
        }
        if (!(doublingK > 0) || !Double.isFinite(doublingK)) {
            throw new IllegalArgumentException("leakage doubling interval must be > 0, got " + doublingK + " K");
        }
    }

    /** True when leakage data were given. */
    public boolean isKnown() {
        return irA > 0;
    }

    /**
     * Leakage at {@code vrV} and junction temperature {@code tjK}.
     *
     * @param tjK junction temperature (K)
     * @return {@code Ir(Tj)} (A)
     */
    public double currentAtTestVoltageA(double tjK) {
        return irA * Math.pow(2.0, (tjK - Celsius.T25_K) / doublingK);
    }
}
