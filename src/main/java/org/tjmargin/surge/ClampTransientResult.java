package org.tjmargin.surge;

import org.tjmargin.thermal.FosterPowerProfile;
import org.tjmargin.thermal.FosterState;

/**
 * What a clamp transient produced. Peaks are the largest sampled values (the grid resolves every front, so the
 * error is second order in the step). Integrals are trapezoidal over the grid, i.e. exact for the
 * piecewise-linear quantities the thermal model integrated.
 *
 * @param series                     the time history (empty where the settings did not keep it)
 * @param startJunctionTemperatureK  the steady-state junction temperature the surge started from (K)
 * @param peakCurrentA               largest clamp current (A)
 * @param peakClampVoltageV          largest clamp voltage (V)
 * @param peakPowerW                 largest clamp dissipation (W), 0 when it never conducts: the largest power of
 *                                   the series, also where the series is not kept
 * @param peakJunctionTemperatureK   largest junction temperature (K)
 * @param peakJunctionTimeS          its time (s)
 * @param energyJ                    {@code ∫ V·I dt} (J)
 * @param chargeC                    {@code ∫ I dt} (C)
 * @param actionIntegralA2s          {@code ∫ I² dt} (A²·s), for fuses and series resistors
 * @param steps                      accepted steps
 * @param endTimeS                   the last time solved (s)
 * @param finalRise                  the Foster network's stage rises at {@code endTimeS}
 */
public record ClampTransientResult(TransientSeries series, double startJunctionTemperatureK, double peakCurrentA,
        double peakClampVoltageV, double peakPowerW, double peakJunctionTemperatureK, double peakJunctionTimeS,
        double energyJ, double chargeC, double actionIntegralA2s, int steps, double endTimeS, FosterState finalRise) {

    public ClampTransientResult {
        double[] values = {startJunctionTemperatureK, peakCurrentA, peakClampVoltageV, peakPowerW, peakJunctionTemperatureK,
            peakJunctionTimeS, energyJ, chargeC, actionIntegralA2s, endTimeS};
        for (double v : values) {
            if (!Double.isFinite(v)) {
                throw new IllegalArgumentException("clamp transient result has a non-finite value: peak I = " + peakCurrentA
                        + " A, peak V = " + peakClampVoltageV + " V, peak P = " + peakPowerW + " W, peak Tj = " + peakJunctionTemperatureK + " K, E = "
                        + energyJ + " J, Q = " + chargeC + " C, I²t = " + actionIntegralA2s + " A²s");
            }
        }
    }

    /** @return the peak junction rise above the start temperature (K) */
    public double peakRiseK() {
        return peakJunctionTemperatureK - startJunctionTemperatureK;
    }

    /** @return the dissipation history as a power profile for the thermal train algebra */
    public FosterPowerProfile powerProfile() {
        double[] p = series.powerW();
        for (int i = 0; i < p.length; i++) {
            // a clamp only dissipates; round-off below zero at the edges of conduction is cleared
            p[i] = Math.max(0, p[i]);
        }
        return new FosterPowerProfile(series.timeS(), p);
    }
}
