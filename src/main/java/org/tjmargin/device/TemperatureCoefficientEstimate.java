package org.tjmargin.device;

/**
 * Estimate of the breakdown-voltage temperature coefficient from the nominal voltage alone, for parts whose data
 * give none. Every result is flagged {@link TemperatureCoefficient#estimated() estimated}.
 *
 * <p>The rule: the relative coefficient (%/K) is interpolated linearly in {@code Vz} through the minimum and
 * maximum values commonly tabulated for generic 500 mW glass Zener series at 5 mA (negative below about 5 V
 * where tunnelling dominates, crossing zero near 5–6 V, positive and slowly rising in the avalanche range;
 * K. Walters and C. Clark, "Zener voltage regulation with temperature", application-note series no. 203, and
 * generic series tables; common practice, no single source). The nominal is the middle of the interpolated
 * range and the range itself becomes the coefficient's tolerance, so a corner analysis covers the spread of the
 * rule. Outside 2.4 V … 33 V the end values are held: the avalanche coefficient saturates near 0.1 %/K
 * (typical series tables reach 0.096 %/K at 51 V).
 */
public final class TemperatureCoefficientEstimate {

    /** Nominal voltages (V) of the table's rows, increasing. */
    private static final double[] VZ_V = {2.4, 3.0, 3.9, 4.3, 4.7, 5.1, 5.6, 6.2, 6.8, 7.5, 10, 11, 20, 22, 33};
    /** Lower end of the relative coefficient at each row (%/K). */
    private static final double[] MIN_PCT_PER_K =
        {-0.09, -0.08, -0.08, -0.06, -0.05, -0.02, -0.05, 0.03, 0.03, 0.03, 0.03, 0.03, 0.03, 0.04, 0.04};
    /** Upper end of the relative coefficient at each row (%/K). */
    private static final double[] MAX_PCT_PER_K =
        {-0.06, -0.05, -0.05, -0.03, 0.02, 0.02, 0.05, 0.06, 0.07, 0.07, 0.10, 0.11, 0.11, 0.12, 0.12};

    private TemperatureCoefficientEstimate() {
    }

    /**
     * Estimates {@code αV} for a part of nominal breakdown voltage {@code vzNomV}.
     *
     * @param vzNomV nominal breakdown voltage (V), positive
     * @return nominal and range in V/K, flagged as estimated
     */
    public static TemperatureCoefficient forNominalVoltage(double vzNomV) {
        if (!(vzNomV > 0) || !Double.isFinite(vzNomV)) {
            throw new IllegalArgumentException("nominal voltage must be positive and finite, got " + vzNomV + " V");
        }
        double lo = interpolate(MIN_PCT_PER_K, vzNomV) / 100.0 * vzNomV;
        double hi = interpolate(MAX_PCT_PER_K, vzNomV) / 100.0 * vzNomV;
        return new TemperatureCoefficient(0.5 * (lo + hi), lo, hi, true);
    }

    private static double interpolate(double[] values, double vz) {
        if (vz <= VZ_V[0]) {
            return values[0];
        }
        int last = VZ_V.length - 1;
        if (vz >= VZ_V[last]) {
            return values[last];
        }
        int i = 1;
        while (VZ_V[i] < vz) {
            i++;
        }
        double f = (vz - VZ_V[i - 1]) / (VZ_V[i] - VZ_V[i - 1]);
        return values[i - 1] + f * (values[i] - values[i - 1]);
    }
}
