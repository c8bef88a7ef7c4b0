package org.tjmargin.design;

import java.util.List;
import org.tjmargin.thermal.AxialLeadMount;
import org.tjmargin.thermal.SurfaceMountPad;

/**
 * A part's package as the parts library describes it: what the thermal path of a position is composed from once
 * the design says how the part is mounted.
 */
public sealed interface PackageSpec permits PackageSpec.Axial, PackageSpec.SurfaceMount, PackageSpec.Given {

    /**
     * An axial part held by two leads.
     *
     * @param leadDiameterM          lead diameter (m), > 0
     * @param leadConductivityWPerMK lead material's conductivity (W/(m·K)), > 0
     * @param internalKPerW          junction → lead roots inside the body (K/W), ≥ 0: given, or calibrated from a
     *                               lead-referenced rating curve ({@link AxialLeadMount#calibrated})
     * @param internalFromRating     true when {@code internalKPerW} was calibrated from the rating curve
     */
    record Axial(double leadDiameterM, double leadConductivityWPerMK, double internalKPerW,
                 boolean internalFromRating) implements PackageSpec {

        /**
         * The part mounted on leads of {@code leadLengthM}, tied to the air through {@code tiePointToAirKPerW}.
         *
         * @param referenceLengthM the rating's reference distance along the lead (m)
         */
        public AxialLeadMount mount(double leadLengthM, double referenceLengthM, double tiePointToAirKPerW,
                                    List<String> notes) {
            return new AxialLeadMount(leadLengthM, leadDiameterM, leadConductivityWPerMK, internalKPerW,
                    referenceLengthM, tiePointToAirKPerW, notes);
        }

        /** Junction → lead at {@code distanceM} from the body (K/W), these leads' {@code R_int + (L/(k·A))/2}. */
        public double junctionToLeadKPerW(double distanceM) {
            if (distanceM == 0 && internalKPerW == 0) {
                return 0.0;
            }
            return mount(distanceM, distanceM, 0.0, List.of()).rThetaJunctionToLeadKPerW(distanceM);
        }
    }

    /**
     * A surface-mount part whose {@code Rθja} depends on the copper area.
     *
     * @param table         (copper area, Rθja) points of the datasheet, areas increasing
     * @param rThetaJcKPerW junction → case or terminal (K/W), {@code NaN} when not given
     */
    record SurfaceMount(List<SurfaceMountPad.AreaPoint> table, double rThetaJcKPerW) implements PackageSpec {
        public SurfaceMount {
            table = List.copyOf(table);
        }
    }

    /**
     * A package whose junction-to-air resistance is given for the mounting it will have.
     *
     * @param rThetaJaKPerW junction → local air (K/W), > 0
     */
    record Given(double rThetaJaKPerW) implements PackageSpec {
    }
}
