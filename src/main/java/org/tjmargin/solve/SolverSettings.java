package org.tjmargin.solve;

/**
 * Budgets and tolerances of the electro-thermal fixed point.
 *
 * @param capK            highest junction temperature searched (K); no root below it means thermal runaway.
 *                        1000 °C: far above any diode's survival, so a root there is never mistaken for a real one
 * @param toleranceK      absolute tolerance on the junction temperature and on the heat-balance residual (K)
 * @param maxEvaluations  budget of circuit evaluations for one operating point
 * @param maxStepK        longest upward step of the search (K). A positive excursion of the heat balance narrower
 *                        than this (two operating points closer together than the step) can be stepped over; the
 *                        search then reports the next higher state or runaway, the conservative side. 20 K keeps
 *                        that blind spot to states that sit within 20 K of runaway anyway.
 */
public record SolverSettings(double capK, double toleranceK, int maxEvaluations, double maxStepK) {

    /**
     * Defaults: cap 1000 °C (design 2.3); tolerance 1e-10 K, which keeps the energy balance
     * {@code P·Rθ = Tj − T_local} within 1e-9 K while staying above the rounding of kelvin values near 300 K
     * (ulp ≈ 6e-14 K); 200 evaluations, enough to walk to the cap in 20 K steps four times over.
     */
    public static final SolverSettings DEFAULT = new SolverSettings(1273.15, 1e-10, 200, 20.0);

    public SolverSettings {
        if (!(capK > 0) || !(toleranceK > 0) || maxEvaluations < 10 || !(maxStepK > 0)) {
            throw new IllegalArgumentException("need cap > 0 K, tolerance > 0 K, budget ≥ 10, step > 0 K; got "
                    + capK + " K, " + toleranceK + " K, " + maxEvaluations + ", " + maxStepK + " K");
        }
    }
}
