package org.tjmargin.thermal;

/**
 * One stage of a Foster network: a resistance in parallel with a capacitance, {@code τ = R·C}.
 *
 * <p>Its step response is {@code R·(1 − e^(−t/τ))} (common practice; e.g. JESD51-14 describes the Foster form as
 * the sum of such terms). The nodes of a Foster network are not physical; only the sum is.
 *
 * @param rKPerW thermal resistance (K/W), positive and finite
 * @param tauS   time constant (s), positive and finite
 */
public record FosterStage(double rKPerW, double tauS) {

    public FosterStage {
        if (!(rKPerW > 0) || !Double.isFinite(rKPerW)) {
            throw new IllegalArgumentException("Foster stage resistance must be positive and finite: rKPerW = " + rKPerW);
        }
        if (!(tauS > 0) || !Double.isFinite(tauS)) {
            throw new IllegalArgumentException("Foster stage time constant must be positive and finite: tauS = " + tauS);
        }
    }

    /** @return the stage capacitance {@code τ/R} (J/K) */
    public double capacitanceJPerK() {
        return tauS / rKPerW;
    }

    /**
     * @param tS time since a unit power step (s)
     * @return the stage's step response {@code R·(1 − e^(−t/τ))} (K/W), zero for {@code t ≤ 0}
     */
    public double zthKPerW(double tS) {
        return tS <= 0 ? 0.0 : -rKPerW * Math.expm1(-tS / tauS);
    }
}
