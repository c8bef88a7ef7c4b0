package org.tjmargin.thermal;

/**
 * The default die model for short pulses: heat entering a semi-infinite slab of silicon through an area {@code A}
 * at constant flux {@code q = P/A}. The surface rises by
 * <pre>
 *   ΔT(t) = 2·q·√(t/(π·k·ρ·c))            so   Zth(t) = 2·√t / (A·√(π·k·ρ·c))
 * </pre>
 * (Carslaw and Jaeger, <i>Conduction of Heat in Solids</i>, 2nd ed. 1959, §2.9; Incropera and DeWitt,
 * <i>Fundamentals of Heat and Mass Transfer</i>, Table 5.1, constant surface heat flux; reference 3.4). Valid
 * while the diffusion length {@code √(α·t)} is small against the die thickness and lateral size: roughly the
 * Wunsch–Bell regime of 0.1–100 µs (reference 3.5). It never settles: {@link #steadyStateKPerW()} is {@code +∞}.
 *
 * <p>{@link #fosterEstimate} expresses it as a Foster network for the transient solvers (see there); that network is
 * an estimate and is flagged as such.
 *
 * @param areaM2               heated (junction) area (m²), positive
 * @param conductivityWPerMK   thermal conductivity {@code k} (W/(m·K)), positive
 * @param densityKgPerM3       density {@code ρ} (kg/m³), positive
 * @param specificHeatJPerKgK  specific heat {@code c} (J/(kg·K)), positive
 */
public record SemiInfiniteDie(double areaM2, double conductivityWPerMK, double densityKgPerM3,
        double specificHeatJPerKgK) implements TransientThermalImpedance {

    /** Silicon at 300 K: {@code k} = 148 W/(m·K) (Incropera and DeWitt, 6th ed., Table A.1). */
    public static final double SILICON_CONDUCTIVITY_W_PER_MK = 148;
    /** Silicon at 300 K: {@code ρ} = 2330 kg/m³ (Incropera and DeWitt, 6th ed., Table A.1). */
    public static final double SILICON_DENSITY_KG_PER_M3 = 2330;
    /** Silicon at 300 K: {@code c} = 712 J/(kg·K) (Incropera and DeWitt, 6th ed., Table A.1). */
    public static final double SILICON_SPECIFIC_HEAT_J_PER_KGK = 712;

    /** Samples per decade of the target curve in {@link #fosterEstimate}: ample for a smooth √t curve. */
    private static final int SAMPLES_PER_DECADE = 10;

    public SemiInfiniteDie {
        double[] values = {areaM2, conductivityWPerMK, densityKgPerM3, specificHeatJPerKgK};
        for (double v : values) {
            if (!(v > 0) || !Double.isFinite(v)) {
                throw new IllegalArgumentException("die area and material properties must be positive and finite: areaM2 = "
                        + areaM2 + ", k = " + conductivityWPerMK + " W/(m·K), ρ = " + densityKgPerM3 + " kg/m³, c = "
                        + specificHeatJPerKgK + " J/(kg·K)");
            }
        }
    }

    /** @return a silicon die (properties at 300 K, Incropera and DeWitt Table A.1) of the given junction area (m²) */
    public static SemiInfiniteDie silicon(double areaM2) {
        return new SemiInfiniteDie(areaM2, SILICON_CONDUCTIVITY_W_PER_MK, SILICON_DENSITY_KG_PER_M3,
                SILICON_SPECIFIC_HEAT_J_PER_KGK);
    }

    /** @return the thermal effusivity {@code √(k·ρ·c)} (W·s^½/(m²·K)) */
    public double effusivity() {
        return Math.sqrt(conductivityWPerMK * densityKgPerM3 * specificHeatJPerKgK);
    }

    /** @return the thermal diffusivity {@code α = k/(ρ·c)} (m²/s) */
    public double diffusivityM2PerS() {
        return conductivityWPerMK / (densityKgPerM3 * specificHeatJPerKgK);
    }

    /** @return the diffusion length {@code √(α·t)} at time {@code tS} (m) */
    public double diffusionLengthM(double tS) {
        return Math.sqrt(diffusivityM2PerS() * Math.max(tS, 0));
    }

    /**
     * @param fluxWPerM2 constant surface heat flux (W/m²)
     * @param tS         time since the flux started (s)
     * @return the surface rise {@code 2q√(t/(πkρc))} (K)
     */
    public double surfaceRiseK(double fluxWPerM2, double tS) {
        return tS <= 0 ? 0 : 2 * fluxWPerM2 * Math.sqrt(tS / Math.PI) / effusivity();
    }

    @Override
    public double zthKPerW(double tS) {
        return surfaceRiseK(1 / areaM2, tS);
    }

    @Override
    public double steadyStateKPerW() {
        return Double.POSITIVE_INFINITY;
    }

    /**
     * A Foster network that follows this die over a stated time range and settles at a stated steady-state
     * resistance. The target is {@code min(Zth_die(t), R_ss)} sampled at 10 points per decade over
     * {@code [fromS, toS]}, fitted by {@link ZthFit}'s method with the start's time constants spread from
     * {@code fromS} to the cap's corner {@code t_c}. The √t law crosses {@code R_ss} at
     * {@code t_c = π·(A·√(kρc)·R_ss/2)²}; choose {@code toS} a decade or more beyond it so the fit sees the
     * plateau. The corner of the {@code min} is not physical (the package takes over gradually): the result is
     * an estimate (basis {@link FosterFitOutcome.Basis#SEMI_INFINITE_DIE_ESTIMATE}) and its RMS log residual says
     * how closely the network follows the target (common practice, no single source).
     *
     * @param fromS            start of the range (s), positive
     * @param toS              end of the range (s), above {@code fromS}
     * @param steadyStateKPerW the cap (K/W), positive: the path's steady-state junction-to-reference resistance
     * @param stages           Foster stages
     * @param settings         fit budget and tolerances
     */
    public FosterFitOutcome fosterEstimate(double fromS, double toS, double steadyStateKPerW, int stages,
            FosterFitSettings settings) {
        if (!(fromS > 0) || !(toS > fromS) || !Double.isFinite(toS)) {
            throw new IllegalArgumentException("die estimate range must satisfy 0 < fromS < toS < ∞: fromS = " + fromS
                    + ", toS = " + toS);
        }
        if (!(steadyStateKPerW > 0) || !Double.isFinite(steadyStateKPerW)) {
            throw new IllegalArgumentException("steady-state resistance must be positive and finite: " + steadyStateKPerW + " K/W");
        }
        double decades = Math.log10(toS / fromS);
        int count = Math.max(2 * stages + 2, (int) Math.ceil(decades * SAMPLES_PER_DECADE) + 1);
        double[] t = ZthFit.spreadGeometrically(fromS, toS, count);
        double[] z = new double[count];
        for (int j = 0; j < count; j++) {
            z[j] = Math.min(zthKPerW(t[j]), steadyStateKPerW);
        }
        // start time constants where the target still rises: beyond the cap's corner a stage only adds to the plateau
        return ZthFit.fit(t, z, stages, settings, FosterFitOutcome.Basis.SEMI_INFINITE_DIE_ESTIMATE, fromS,
                Math.min(toS, Math.max(capTimeS(steadyStateKPerW), fromS * 10)));
    }

    /** @return the time (s) at which the √t law reaches {@code steadyStateKPerW} */
    public double capTimeS(double steadyStateKPerW) {
        double x = areaM2 * effusivity() * steadyStateKPerW / 2;
        return Math.PI * x * x;
    }
}
