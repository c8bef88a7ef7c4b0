package org.tjmargin.thermal;

/**
 * The air around the board: its rise above the room, {@code T_local = T_ambient + ΔT_enclosure} (design 2.2).
 */
public sealed interface Enclosure permits Enclosure.FixedRise, Enclosure.SealedBox {

    /**
     * Rise of the inside air above the room (K) when the board dissipates {@code boardPowerW}.
     *
     * @param boardPowerW total dissipation of all positions on the board (W)
     */
    double riseK(double boardPowerW);

    /** True when the rise depends on the board's dissipation, so positions couple through the air. */
    boolean couplesPositions();

    /**
     * A rise given by the user (measured, or from a system-level model), independent of the board's power.
     *
     * @param riseK rise (K), ≥ 0
     */
    record FixedRise(double riseK) implements Enclosure {
        public FixedRise {
            if (!(riseK >= 0) || !Double.isFinite(riseK)) {
                throw new IllegalArgumentException("enclosure rise must be ≥ 0, got " + riseK + " K");
            }
        }

        @Override
        public double riseK(double boardPowerW) {
            return riseK;
        }

        @Override
        public boolean couplesPositions() {
            return false;
        }
    }

    /**
     * A sealed box losing heat only through its walls: {@code ΔT = P_total/(h·A_surface)}, with
     * {@code P_total} the board's dissipation plus any other heat inside. The combined coefficient {@code h}
     * for natural convection plus radiation from a painted box in still room air is commonly 5–10 W/(m²·K)
     * (common practice, no single source; see Incropera, 6th ed., §9.6 and §12.7 for the two parts).
     *
     * @param surfaceAreaM2      outside surface area of the box (m²), > 0
     * @param heatTransferWPerM2K combined heat-transfer coefficient (W/(m²·K)), > 0
     * @param otherDissipationW  heat from everything else in the box (W), ≥ 0
     */
    record SealedBox(double surfaceAreaM2, double heatTransferWPerM2K, double otherDissipationW) implements Enclosure {
        public SealedBox {
            if (!(surfaceAreaM2 > 0) || !(heatTransferWPerM2K > 0) || !(otherDissipationW >= 0)
                    || !Double.isFinite(surfaceAreaM2 * heatTransferWPerM2K * (1 + otherDissipationW))) {
                throw new IllegalArgumentException("sealed box needs area > 0, h > 0, other dissipation ≥ 0; got "
                        + surfaceAreaM2 + " m², " + heatTransferWPerM2K + " W/(m²·K), " + otherDissipationW + " W");
            }
        }

        @Override
        public double riseK(double boardPowerW) {
            return (boardPowerW + otherDissipationW) / (heatTransferWPerM2K * surfaceAreaM2);
        }

        @Override
        public boolean couplesPositions() {
            return true;
        }
    }
}
