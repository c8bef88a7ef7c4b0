package org.tjmargin.solve;

import org.tjmargin.circuit.Circuit;
import org.tjmargin.circuit.CircuitPoint;
import org.tjmargin.device.BreakdownDiode;
import org.tjmargin.thermal.SteadyThermalPath;

/**
 * The coupled operating point of one diode in its circuit and mounting: the lowest root of
 * {@code g(Tj) = Tj − T_local − Rθja·P(Tj)}, where {@code P(Tj)} is the diode dissipation from the circuit solved at
 * {@code Tj} (design 2.3). The breakdown voltage moves with the junction temperature, which moves the current and the
 * dissipation, which moves the temperature: {@link LowestFixedPoint} finds the state the part reaches warming from
 * the local air.
 *
 * <p>Stateless and thread-safe.
 */
public final class ElectroThermalSolver {

    private ElectroThermalSolver() {
    }

    /**
     * Solves one operating point.
     *
     * @param circuit  the circuit (at one corner)
     * @param diode    the diode model (at one corner)
     * @param path     the thermal path (at one corner)
     * @param tLocalK  local air temperature (K)
     * @param settings budgets and tolerances
     * @return converged point, runaway, or not converged
     */
    public static ThermalOutcome solve(Circuit circuit, BreakdownDiode diode, SteadyThermalPath path, double tLocalK,
                                       SolverSettings settings) {
        final double rTheta = path.rThetaJaKPerW();
        // The last circuit point, so that the point at the root (usually the last one evaluated before the loop
        // gain) is not solved again. Local to this call: the solver stays thread-safe.
        final CircuitPoint[] last = new CircuitPoint[1];
        final double[] lastTj = {Double.NaN};
        FixedPointOutcome outcome = LowestFixedPoint.find(tj -> {
            CircuitPoint cp = circuit.at(diode, tj);
            last[0] = cp;
            lastTj[0] = tj;
            return tLocalK + rTheta * cp.diodePowerW();
        }, tLocalK, settings);
        if (outcome instanceof FixedPointOutcome.Root r) {
            boolean cached = lastTj[0] == r.x();
            CircuitPoint cp = cached ? last[0] : circuit.at(diode, r.x());
            double refK = path.referenceTemperatureK(r.x(), cp.diodePowerW());
            return new ThermalOutcome.Converged(
                    new OperatingPoint(r.x(), tLocalK, refK, cp, r.evaluations() + (cached ? 0 : 1), r.loopGain(), r.residual()));
        }
        if (outcome instanceof FixedPointOutcome.Runaway) {
            return new ThermalOutcome.Runaway(tLocalK, settings.capK());
        }
        FixedPointOutcome.Exhausted e = (FixedPointOutcome.Exhausted) outcome;
        return new ThermalOutcome.NotConverged(tLocalK, e.lastX(), e.residual(), e.evaluations());
    }
}
