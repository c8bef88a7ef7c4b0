package org.tjmargin.thermal;

/**
 * The exact response of every stage of a {@link FosterNetwork} over one time step of length {@code h} during
 * which the power varies linearly from {@code P0} to {@code P1}.
 *
 * <h2>Derivation</h2>
 * A stage obeys {@code τ·dx/dt = R·P(t) − x}. Over {@code 0 ≤ s ≤ h} with {@code P(s) = P0 + (P1 − P0)·s/h}:
 * <pre>
 *   x(h) = x(0)·E + (R/τ)·∫₀ʰ e^(−(h−s)/τ)·P(s) ds,                         E = e^(−h/τ)
 *   ∫₀ʰ e^(−(h−s)/τ) ds   = τ·(1 − E)
 *   ∫₀ʰ e^(−(h−s)/τ)·s ds = h·τ − τ²·(1 − E)
 * </pre>
 * so, with {@code g = (τ/h)·(1 − E)},
 * <pre>
 *   x(h) = E·x(0) + R·[(g − E)·P0 + (1 − g)·P1]
 * </pre>
 * A constant power ({@code P0 = P1 = P}) gives {@code E·x(0) + R·P·(1 − E)}, the familiar step response; a ramp
 * from zero gives {@code R·(P1/h)·(h − τ(1 − E))}, the integral of the step response. This is the linear
 * superposition of reference 3.2 done in closed form per stage (common practice; derivation as above).
 *
 * <p>For {@code h/τ < 1e-3} the weight {@code 1 − g} is taken from its Taylor series
 * {@code z/2 − z²/6 + z³/24 − z⁴/120} ({@code z = h/τ}) because {@code 1 − (1 − E)/z} cancels badly there; the
 * series' truncation error is below {@code z⁵/720}, under 1e-15 of the term.
 *
 * <p>Immutable and thread-safe when made by {@link FosterNetwork#step(double)}; a solver that changes its step
 * length at every step keeps one {@link #reusable(FosterNetwork, double)} step of its own instead.
 */
public final class FosterStep {

    /** Below this {@code h/τ}, the weight {@code 1 − g} comes from its Taylor series (see class comment). */
    private static final double SERIES_LIMIT = 1e-3;

    private final double[] rKPerW;
    private final double[] tauS;
    /** True for a step that {@link #relength(double)} may recompute; never shared then. */
    private final boolean reusable;
    private final double[] decay;
    private final double[] startWeightKPerW;
    private final double[] endWeightKPerW;
    private double hS;
    private double endPowerGainKPerW;

    FosterStep(double[] rKPerW, double[] tauS, double hS) {
        this(rKPerW, tauS, hS, false);
    }

    private FosterStep(double[] rKPerW, double[] tauS, double hS, boolean reusable) {
        int n = rKPerW.length;
        this.rKPerW = rKPerW;
        this.tauS = tauS;
        this.reusable = reusable;
        decay = new double[n];
        startWeightKPerW = new double[n];
        endWeightKPerW = new double[n];
        compute(hS);
    }

    /**
     * A step of {@code network}'s stages that {@link #relength(double)} recomputes in place, so that a solver that
     * changes its step at every step allocates nothing per step. Not thread-safe: for one solver's own use.
     *
     * @param hS the first length (s)
     */
    public static FosterStep reusable(FosterNetwork network, double hS) {
        return new FosterStep(network.resistancesKPerW(), network.timeConstantsS(), hS, true);
    }

    /**
     * This step recomputed for a new length, in place: the same numbers as {@link FosterNetwork#step(double)} for
     * that length.
     *
     * @return this step
     * @throws IllegalStateException for a step not made by {@link #reusable(FosterNetwork, double)}
     */
    public FosterStep relength(double hS) {
        if (!reusable) {
            throw new IllegalStateException("this Foster step is shared and immutable; make one with reusable()");
        }
        compute(hS);
        return this;
    }

    private void compute(double hS) {
        if (!(hS >= 0) || !Double.isFinite(hS)) {
            throw new IllegalArgumentException("Foster step length must be finite and not negative: hS = " + hS);
        }
        this.hS = hS;
        int n = rKPerW.length;
        double gain = 0;
        for (int i = 0; i < n; i++) {
            double z = hS / tauS[i];
            double oneMinusE = -Math.expm1(-z);
            double oneMinusG;
            if (z < SERIES_LIMIT) {
                oneMinusG = z * (0.5 - z * (1.0 / 6 - z * (1.0 / 24 - z / 120)));
            } else {
                oneMinusG = 1 - oneMinusE / z;
            }
            decay[i] = 1 - oneMinusE;
            // g − E = (1 − E) − (1 − g): both terms accurate, difference about z/2, no cancellation
            startWeightKPerW[i] = rKPerW[i] * (oneMinusE - oneMinusG);
            endWeightKPerW[i] = rKPerW[i] * oneMinusG;
            gain += endWeightKPerW[i];
        }
        endPowerGainKPerW = gain;
    }

    /** @return the step length (s) */
    public double lengthS() {
        return hS;
    }

    /** @return number of stages */
    public int stages() {
        return decay.length;
    }

    /**
     * The part of the junction rise at the end of the step that does not depend on the end power:
     * {@code Σ [E_i·x_i + R_i·(g_i − E_i)·P0]} (K). The full end rise is this plus
     * {@link #endPowerGainKPerW()}{@code ·P1}; a coupled solver iterates on {@code P1} with that split.
     *
     * @param stageRiseK stage rises at the start of the step (K), not modified
     * @param startPowerW power at the start of the step (W)
     */
    public double riseWithoutEndPowerK(double[] stageRiseK, double startPowerW) {
        double sum = 0;
        for (int i = 0; i < decay.length; i++) {
            sum += decay[i] * stageRiseK[i] + startWeightKPerW[i] * startPowerW;
        }
        return sum;
    }

    /** @return {@code Σ R_i·(1 − g_i)}: the junction rise at the end of the step per watt of end power (K/W) */
    public double endPowerGainKPerW() {
        return endPowerGainKPerW;
    }

    /**
     * Advances every stage over the step, in place.
     *
     * @param stageRiseK  stage rises (K): read at the start of the step, overwritten with those at its end
     * @param startPowerW power at the start of the step (W)
     * @param endPowerW   power at the end of the step (W)
     */
    public void advanceInPlace(double[] stageRiseK, double startPowerW, double endPowerW) {
        for (int i = 0; i < decay.length; i++) {
            stageRiseK[i] = decay[i] * stageRiseK[i] + startWeightKPerW[i] * startPowerW + endWeightKPerW[i] * endPowerW;
        }
    }

    /**
     * @param stageRiseK  stage rises at the start of the step (K), not modified
     * @param startPowerW power at the start (W)
     * @param endPowerW   power at the end (W)
     * @return the junction rise at the end of the step (K)
     */
    public double riseAfterK(double[] stageRiseK, double startPowerW, double endPowerW) {
        return riseWithoutEndPowerK(stageRiseK, startPowerW) + endPowerGainKPerW * endPowerW;
    }
}
