package org.tjmargin.surge;

import java.util.List;
import org.tjmargin.device.Celsius;
import org.tjmargin.thermal.FosterNetwork;
import org.tjmargin.thermal.FosterPulse;

/**
 * A clamp's surge data as the part states it: a rated peak pulse power at a stated rating pulse, the clamping
 * voltage at a stated peak current, the junction temperature at which the pulse rating reaches zero, and the
 * transient thermal impedance the transient is solved with.
 *
 * <p>Pulse derating (reference 4.6, TVS pulse-derating curves, sourced): the rating falls linearly from 100 % at a
 * 25 °C start to zero at {@code pulseTjMaxK}; below 25 °C it is held at 100 % (datasheet curves start flat there;
 * common practice, no single source).
 *
 * <p>High-current line (design 2.1): {@code Rd = (Vc − Vbr)/Ipp}, {@code Vbr} the breakdown line's intercept at
 * 25 °C.
 *
 * @param ratedPeakPowerW  rated peak pulse power (W), positive
 * @param ratedPulse       the pulse the rating is stated for
 * @param clampingVoltageV clamping voltage {@code Vc} at {@code clampingCurrentA} (V), positive
 * @param clampingCurrentA the peak pulse current of the clamping voltage {@code Ipp} (A), positive
 * @param pulseTjMaxK      junction temperature at which the pulse rating reaches zero (K), above 25 °C
 * @param network          the junction's transient thermal impedance
 * @param networkSource    where the network comes from
 * @param notes            estimates and assumptions to show in every output
 */
public record SurgeRating(double ratedPeakPowerW, FosterPulse ratedPulse, double clampingVoltageV, double clampingCurrentA,
        double pulseTjMaxK, FosterNetwork network, NetworkSource networkSource, List<String> notes) {

    /** 25 °C in kelvin, the start temperature of pulse ratings (reference 4.6). */
    public static final double RATING_START_K = Celsius.T25_K;

    /** Where the transient thermal impedance comes from. */
    public enum NetworkSource {
        /** Foster stages given by the part */
        GIVEN_FOSTER(false),
        /** fitted to the part's {@code Zth(t)} points */
        ZTH_POINTS(false),
        /** fitted to the part's peak-pulse-power curve */
        RATING_CURVE(false),
        /** the semi-infinite silicon die sized to the single rating point, capped by the steady path: an estimate */
        SEMI_INFINITE_DIE_ESTIMATE(true);

        private final boolean estimate;

        NetworkSource(boolean estimate) {
            this.estimate = estimate;
        }

        /** @return whether every output must flag the network as estimated */
        public boolean isEstimate() {
            return estimate;
        }
    }

    public SurgeRating {
        notes = List.copyOf(notes);
        if (!(ratedPeakPowerW > 0) || !Double.isFinite(ratedPeakPowerW)) {
            throw new IllegalArgumentException("rated peak pulse power must be positive and finite: " + ratedPeakPowerW + " W");
        }
        if (!(clampingVoltageV > 0) || !Double.isFinite(clampingVoltageV) || !(clampingCurrentA > 0)
                || !Double.isFinite(clampingCurrentA)) {
            throw new IllegalArgumentException("clamping voltage and its current must be positive and finite: "
                    + clampingVoltageV + " V at " + clampingCurrentA + " A");
        }
        if (!(pulseTjMaxK > RATING_START_K) || !Double.isFinite(pulseTjMaxK)) {
            throw new IllegalArgumentException("pulse Tj max must be finite and above 25 °C: " + pulseTjMaxK + " K");
        }
        if (ratedPulse == null || network == null || networkSource == null) {
            throw new IllegalArgumentException("a surge rating needs its rating pulse, a network and the network's source");
        }
    }

    /**
     * @param breakdownVoltage25V the breakdown line's intercept at 25 °C (V)
     * @return {@code Rd = (Vc − Vbr)/Ipp} (Ω), design 2.1
     * @throws IllegalArgumentException when {@code Vc} does not exceed {@code Vbr}
     */
    public double dynamicResistanceOhm(double breakdownVoltage25V) {
        double rd = (clampingVoltageV - breakdownVoltage25V) / clampingCurrentA;
        if (!(rd > 0)) {
            throw new IllegalArgumentException("clamping voltage " + clampingVoltageV + " V must exceed the breakdown intercept "
                    + breakdownVoltage25V + " V");
        }
        return rd;
    }

    /**
     * @param startTjK the junction temperature the surge starts from (K)
     * @return the pulse rating's fraction at that start, {@code (Tjmax − Tstart)/(Tjmax − 25 °C)} within [0, 1]
     *         (reference 4.6)
     */
    public double deratingFactor(double startTjK) {
        double f = (pulseTjMaxK - startTjK) / (pulseTjMaxK - RATING_START_K);
        return Math.max(0.0, Math.min(1.0, f));
    }

    /**
     * The area (m²) of a semi-infinite silicon die on which the rated pulse takes the surface from 25 °C to
     * {@code pulseTjMaxK} in the √t regime: with the equivalent rectangle {@code te} of the rating pulse
     * ({@link RatingConversion#equivalentRectangleWidthS}), {@code ΔT = 2·P·√te/(A·√π·√(kρc))} (Carslaw and Jaeger,
     * §2.9; reference 3.4), so {@code A = 2·P·√te/(√π·√(kρc)·ΔT)}. Used only to size the default estimate.
     *
     * @param effusivity {@code √(kρc)} of the die (W·s^0.5/(m²·K))
     */
    public static double dieAreaForRatingM2(double ratedPeakPowerW, FosterPulse ratedPulse, double pulseTjMaxK, double effusivity) {
        double te = RatingConversion.equivalentRectangleWidthS(ratedPulse);
        return 2 * ratedPeakPowerW * Math.sqrt(te) / (Math.sqrt(Math.PI) * effusivity * (pulseTjMaxK - RATING_START_K));
    }

    /** @return whether any part of the surge model is an estimate */
    public boolean estimated() {
        return networkSource.isEstimate();
    }
}
