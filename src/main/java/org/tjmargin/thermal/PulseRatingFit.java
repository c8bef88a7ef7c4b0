package org.tjmargin.thermal;

import org.tjmargin.device.Celsius;
/**
 * Fits a Foster network to a peak-pulse-power versus pulse-width rating curve.
 *
 * <p>Each rated point (width {@code w_j}, peak power {@code P_j}) is read as a pulse of the stated
 * {@link FosterPulse.Shape} that takes the junction from the rating's start temperature, 25 °C, to its maximum
 * {@code Tj_max}: {@code P_j·u_j = Tj_max − 25 °C}, where {@code u_j} is the peak rise per watt of peak power of
 * that pulse through the network (the design's reading of such curves, §2.6; common practice for TVS ratings,
 * which are derated linearly to zero at {@code Tj_max}, reference 4.6). The fit is the inverse problem: residuals
 * {@code ln(P_j·u_j/ΔT)}, parameters {@code ln R_i}, {@code ln τ_i}, Levenberg–Marquardt.
 *
 * <p>The peak of each pulse's response is found by {@link FosterPulse#peakRiseKPerW}. Its derivatives use the
 * envelope theorem: at the peak time {@code t*} the rise is stationary in time, so
 * {@code ∂u/∂θ = Σ_i ∂x_i(t*)/∂θ} at fixed {@code t*} (exact at the true peak; the search's time error enters only
 * at second order).
 *
 * <p>Caution carried from reference 3.3: measured surge limits sit below thermal predictions (current crowding), so
 * a network fitted this way describes the rating, not the die.
 */
public final class PulseRatingFit {

    /** The start temperature of pulse ratings, 25 °C, in kelvin (datasheet convention, reference 4.6). */
    public static final double RATING_START_TEMPERATURE_K = Celsius.T25_K;

    /** How far beyond the widths' range a time constant may go. */
    private static final double TAU_RANGE_FACTOR = 1e3;

    private PulseRatingFit() {
    }

    /**
     * @param shape       the rating pulse's shape
     * @param widthsS     pulse widths (s; time to 50 % for exponential pulses), positive, strictly increasing
     * @param peakPowersW rated peak powers (W), positive, finite, same length
     * @param tjMaxK      maximum junction temperature (K), above 25 °C
     * @param stages      number of Foster stages; needs at least {@code 2·stages} points
     * @param settings    budget and tolerances (its peak search is used for every pulse)
     * @return the fitted network or the typed failure
     */
    public static FosterFitOutcome fit(FosterPulse.Shape shape, double[] widthsS, double[] peakPowersW, double tjMaxK,
            int stages, FosterFitSettings settings) {
        double riseK = tjMaxK - RATING_START_TEMPERATURE_K;
        if (!(riseK > 0) || !Double.isFinite(riseK)) {
            throw new IllegalArgumentException("Tj max must be finite and above 25 °C (298.15 K): tjMaxK = " + tjMaxK);
        }
        checkPoints(widthsS, peakPowersW, stages);
        int m = widthsS.length;
        FosterPulse[] pulses = new FosterPulse[m];
        double[] p = peakPowersW.clone();
        for (int j = 0; j < m; j++) {
            pulses[j] = new FosterPulse(shape, widthsS[j]);
        }
        double tFirst = pulses[0].decayTimeConstantS();
        double tLast = pulses[m - 1].decayTimeConstantS();
        double[] startTau = ZthFit.spreadGeometrically(tFirst, tLast, stages);
        // start as if each rating were a rectangle: Zth(width) ≈ ΔT/P
        double[] equivalentT = new double[m];
        double[] equivalentZ = new double[m];
        for (int j = 0; j < m; j++) {
            equivalentT[j] = pulses[j].decayTimeConstantS();
            equivalentZ[j] = riseK / p[j];
        }
        double[] startR = ZthFit.startResistances(equivalentT, equivalentZ, startTau);
        FosterPeakSearch search = settings.peakSearch();
        FosterLeastSquares.Model model = new FosterLeastSquares.Model() {
            @Override
            public int residualCount() {
                return m;
            }

            @Override
            public void evaluate(double[] r, double[] tau, double[] residual, double[][] jacobian) {
                FosterNetwork network = FosterNetwork.of(r, tau);
                for (int j = 0; j < m; j++) {
                    FosterPeak peak = pulses[j].peakRiseKPerW(network, search);
                    if (!peak.converged()) {
                        throw new FosterLeastSquares.PeakSearchFailure("peak search of rating point " + j + " (width "
                                + widthsS[j] + " s) did not converge in " + peak.evaluations() + " evaluations");
                    }
                    double u = peak.riseK();
                    residual[j] = Math.log(p[j] * u / riseK);
                    for (int i = 0; i < r.length; i++) {
                        jacobian[j][2 * i] = pulses[j].stageRiseKPerW(peak.timeS(), r[i], tau[i]) / u;
                        jacobian[j][2 * i + 1] = pulses[j].stageRiseLogTauDerivativeKPerW(peak.timeS(), r[i], tau[i]) / u;
                    }
                }
            }
        };
        return FosterLeastSquares.fit(model, startR, startTau, tFirst / TAU_RANGE_FACTOR, tLast * TAU_RANGE_FACTOR,
                settings, FosterFitOutcome.Basis.PULSE_RATING_CURVE);
    }

    /**
     * The rated peak power a network implies for a pulse: {@code (Tj_max − 25 °C)/u}.
     *
     * @param network the network
     * @param pulse   the pulse
     * @param tjMaxK  maximum junction temperature (K)
     * @param search  peak search
     * @return peak power (W)
     */
    public static double ratedPeakPowerW(FosterNetwork network, FosterPulse pulse, double tjMaxK, FosterPeakSearch search) {
        return (tjMaxK - RATING_START_TEMPERATURE_K) / pulse.peakRiseKPerW(network, search).riseK();
    }

    private static void checkPoints(double[] widthsS, double[] peakPowersW, int stages) {
        FitPoints.check("rating point", "width", widthsS, "peak power", "W", peakPowersW, stages);
    }
}
