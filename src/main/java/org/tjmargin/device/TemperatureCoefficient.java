package org.tjmargin.device;

import org.tjmargin.units.Decimals;

/**
 * Temperature coefficient of the breakdown voltage, {@code αV = dVz/dTj} in V/K, with its tolerance range
 * and whether it was estimated from the nominal voltage rather than read from the part's data.
 *
 * <p>A coefficient given in %/K converts as {@code αV = tc/100 · Vz_nom} (design 2.1; the usual datasheet
 * definition {@code ΔVz = αVz·Vz(25 °C)·ΔTj}).
 *
 * @param alphaVPerK    nominal coefficient (V/K)
 * @param minAlphaVPerK lower end of its range (V/K), ≤ nominal
 * @param maxAlphaVPerK upper end of its range (V/K), ≥ nominal
 * @param estimated     true when no coefficient was given and {@link TemperatureCoefficientEstimate} supplied it
 */
public record TemperatureCoefficient(double alphaVPerK, double minAlphaVPerK, double maxAlphaVPerK,
                                     boolean estimated) {

    public TemperatureCoefficient {
        if (!Double.isFinite(alphaVPerK) || !Double.isFinite(minAlphaVPerK) || !Double.isFinite(maxAlphaVPerK)) {
            throw new IllegalArgumentException("temperature coefficient must be finite: nominal " + alphaVPerK
                    + " V/K, range " + minAlphaVPerK + " … " + maxAlphaVPerK + " V/K");
        }
        if (minAlphaVPerK > alphaVPerK || maxAlphaVPerK < alphaVPerK) {
            throw new IllegalArgumentException("temperature coefficient range " + minAlphaVPerK + " … "
                    + maxAlphaVPerK + " V/K does not contain the nominal " + alphaVPerK + " V/K");
        }
    }

    /** A coefficient known exactly (no range). */
    public static TemperatureCoefficient exact(double alphaVPerK) {
        return new TemperatureCoefficient(alphaVPerK, alphaVPerK, alphaVPerK, false);
    }

    /**
     * Converts a relative coefficient (1/K; 0.06 %/K is 6e-4 1/K) to V/K at the nominal voltage.
     *
     * @param relativePerK coefficient as a fraction per kelvin (1/K)
     * @param vzNomV       nominal breakdown voltage (V)
     * @return {@code αV} (V/K)
     */
    public static double voltsPerKelvin(double relativePerK, double vzNomV) {
        // In decimal: 0.085 %/K of 12 V is 0.0102 V/K, not 0.010199999999999999 (Decimals).
        return Decimals.product(relativePerK, vzNomV);
    }

    /** A copy with the nominal moved to {@code alpha} (used by corners), keeping the range and the flag. */
    public TemperatureCoefficient withNominal(double alpha) {
        return new TemperatureCoefficient(alpha, Math.min(minAlphaVPerK, alpha), Math.max(maxAlphaVPerK, alpha),
                estimated);
    }
}
