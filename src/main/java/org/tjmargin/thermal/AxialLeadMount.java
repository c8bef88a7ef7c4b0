package org.tjmargin.thermal;

import java.util.List;

/**
 * An axial part held by its two leads: junction → (internal term) → the two leads in parallel → tie points →
 * board and air (design 2.2; the datasheet chain {@code TL = θLA·P + TA}, {@code TJ = TL + θJL·P}).
 *
 * <p>{@code Rθjl(L) = R_int + (L/(k·A))/2} for leads of length {@code L} each; {@code Rθja = Rθjl(L) + θLA}.
 * Where the rating gives the power at a lead temperature at distance {@code L_ref} with a linear derating slope,
 * {@code Rθjl(L_ref) = 1/slope} and the internal term follows as {@code R_int = 1/slope − (L_ref/(k·A))/2}
 * ({@link #calibrated}). The rating's reference point is the lead at {@code L_ref} from the body; when the user's
 * leads are shorter it lies beyond the tie point, which is then taken as the reference.
 *
 * @param leadLengthM          the user's lead length, body to tie point, each lead (m)
 * @param leadDiameterM        lead diameter (m)
 * @param leadConductivityWPerMK lead material conductivity (W/(m·K))
 * @param internalKPerW        junction → lead roots, inside the body (K/W), ≥ 0
 * @param referenceLengthM     the rating's reference distance along the lead (m)
 * @param tiePointToAirKPerW   tie points (pads, clips, wiring) → local air, both leads together (K/W), ≥ 0
 * @param notes                estimate notes
 */
public record AxialLeadMount(double leadLengthM, double leadDiameterM, double leadConductivityWPerMK,
                             double internalKPerW, double referenceLengthM, double tiePointToAirKPerW,
                             List<String> notes) implements SteadyThermalPath {

    public AxialLeadMount {
        notes = List.copyOf(notes);
        LeadConduction.resistanceKPerW(leadLengthM, leadDiameterM, leadConductivityWPerMK);
        if (!(internalKPerW >= 0) || !Double.isFinite(internalKPerW)) {
            throw new IllegalArgumentException("internal junction-to-lead resistance must be ≥ 0, got "
                    + internalKPerW + " K/W");
        }
        if (!(referenceLengthM >= 0) || !(tiePointToAirKPerW >= 0) || !Double.isFinite(tiePointToAirKPerW)) {
            throw new IllegalArgumentException("need reference length ≥ 0 and tie-point resistance ≥ 0, got "
                    + referenceLengthM + " m, " + tiePointToAirKPerW + " K/W");
        }
        if (leadLengthM <= 0 && tiePointToAirKPerW <= 0 && internalKPerW <= 0) {
            throw new IllegalArgumentException("an axial mount needs some thermal resistance");
        }
    }

    /**
     * Calibrates the internal term from the rating's reference.
     *
     * @param ratingResistanceKPerW {@code Rθjl(L_ref) = 1/slope} (K/W)
     * @throws IllegalArgumentException when the leads alone exceed the rating's resistance, i.e. the lead data
     *                                  contradict the rating
     */
    public static AxialLeadMount calibrated(double ratingResistanceKPerW, double referenceLengthM,
                                            double leadDiameterM, double leadConductivityWPerMK,
                                            double leadLengthM, double tiePointToAirKPerW, List<String> notes) {
        double leadsAtRefKPerW = LeadConduction.resistanceKPerW(referenceLengthM, leadDiameterM,
                leadConductivityWPerMK) / 2.0;
        double internal = ratingResistanceKPerW - leadsAtRefKPerW;
        if (internal < 0) {
            throw new IllegalArgumentException("the rating implies " + ratingResistanceKPerW + " K/W to the lead at "
                    + referenceLengthM + " m, but the two leads alone conduct with " + leadsAtRefKPerW
                    + " K/W: lead diameter or material disagree with the rating");
        }
        return new AxialLeadMount(leadLengthM, leadDiameterM, leadConductivityWPerMK, internal, referenceLengthM,
                tiePointToAirKPerW, notes);
    }

    /** Junction → lead at {@code distanceM} from the body (K/W): {@code R_int + (L/(k·A))/2}. */
    public double rThetaJunctionToLeadKPerW(double distanceM) {
        return internalKPerW + LeadConduction.resistanceKPerW(distanceM, leadDiameterM, leadConductivityWPerMK) / 2.0;
    }

    @Override
    public double rThetaJaKPerW() {
        return rThetaJunctionToLeadKPerW(leadLengthM) + tiePointToAirKPerW;
    }

    @Override
    public double rThetaJrKPerW() {
        return rThetaJunctionToLeadKPerW(Math.min(referenceLengthM, leadLengthM));
    }
}
