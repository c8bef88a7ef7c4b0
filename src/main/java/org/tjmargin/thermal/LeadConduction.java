package org.tjmargin.thermal;

/**
 * One-dimensional conduction along a round lead, {@code R = L/(k·A)} with {@code A = π·d²/4}: Fourier's law for a
 * plane wall of constant section (F. P. Incropera et al., <i>Fundamentals of Heat and Mass Transfer</i>, 6th ed.,
 * §3.1, eq. 3.6). Convection from the lead's surface is neglected: for a 0.8 mm copper lead of 9.5 mm at
 * {@code h = 10 W/(m²·K)} the fin resistance is about 4200 K/W against 47 K/W along it (Incropera §3.6), so the
 * tie point, not the air, is the sink.
 */
public final class LeadConduction {

    /** Thermal conductivity of pure copper at 300 K, 401 W/(m·K) (Incropera, 6th ed., Table A.1). */
    public static final double COPPER_W_PER_M_K = 401.0;

    private LeadConduction() {
    }

    /**
     * Conduction resistance of one lead.
     *
     * @param lengthM       lead length from body to tie point (m), ≥ 0
     * @param diameterM     lead diameter (m), > 0
     * @param conductivityWPerMK lead material's thermal conductivity (W/(m·K)), > 0
     * @return {@code L/(k·A)} (K/W)
     */
    public static double resistanceKPerW(double lengthM, double diameterM, double conductivityWPerMK) {
        if (!(lengthM >= 0) || !(diameterM > 0) || !(conductivityWPerMK > 0)) {
            throw new IllegalArgumentException("need L ≥ 0, d > 0, k > 0; got L " + lengthM + " m, d " + diameterM
                    + " m, k " + conductivityWPerMK + " W/(m·K)");
        }
        double areaM2 = Math.PI * diameterM * diameterM / 4.0;
        return lengthM / (conductivityWPerMK * areaM2);
    }
}
