package org.tjmargin.solve;

/**
 * Outcome of one electro-thermal solve: a converged point, thermal runaway, or a solve the tool cannot stand
 * behind. Never a silent NaN.
 */
public sealed interface ThermalOutcome
        permits ThermalOutcome.Converged, ThermalOutcome.Runaway, ThermalOutcome.NotConverged {

    /**
     * A converged operating point.
     *
     * @param point the point
     */
    record Converged(OperatingPoint point) implements ThermalOutcome {
    }

    /**
     * No operating point below the search cap: the junction heats without bound (until the part fails).
     *
     * @param tLocalK local air temperature of the solve (K)
     * @param capK    the cap searched to (K)
     */
    record Runaway(double tLocalK, double capK) implements ThermalOutcome {
    }

    /**
     * The budget ran out.
     *
     * @param tLocalK   local air temperature of the solve (K)
     * @param lastTjK   last iterate (K)
     * @param residualK heat-balance residual there (K)
     * @param evaluations evaluations used
     */
    record NotConverged(double tLocalK, double lastTjK, double residualK, int evaluations) implements ThermalOutcome {
    }
}
