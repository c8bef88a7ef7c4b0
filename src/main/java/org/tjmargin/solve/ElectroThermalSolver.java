package org.tjmargin.solve;

import org.tjmargin.circuit.Circuit;
import org.tjmargin.circuit.CircuitPoint;
import org.tjmargin.device.BreakdownDiode;
import org.tjmargin.device.PreparedDiode;
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
        // The knee and leakage constants once per solve, not once per evaluation (equal results, see PreparedDiode).
        return solve(circuit, PreparedDiode.of(diode), path, tLocalK, settings);
    }

    /** As above, with the diode's constants already prepared (once per corner, see {@link PositionInstance}). */
    public static ThermalOutcome solve(Circuit circuit, PreparedDiode prepared, SteadyThermalPath path, double tLocalK,
                                       SolverSettings settings) {
        return solve(circuit, prepared, path, tLocalK, settings, true);
    }

    /**
     * As above; without {@code loopGain} the point's loop gain is left NaN and its two evaluations are saved, for
     * the sweep's corners whose gain nobody reads (only the reported corners' are: {@link #withLoopGain}).
     */
    static ThermalOutcome solve(Circuit circuit, PreparedDiode prepared, SteadyThermalPath path, double tLocalK,
                                SolverSettings settings, boolean loopGain) {
        return solve(circuit, prepared, path, tLocalK, settings, loopGain, new HeatBalance());
    }

    /**
     * As above, evaluating through {@code balance} (reused by a caller that solves many corners on one thread; its
     * previous aim is forgotten).
     */
    static ThermalOutcome solve(Circuit circuit, PreparedDiode prepared, SteadyThermalPath path, double tLocalK,
                                SolverSettings settings, boolean loopGain, HeatBalance balance) {
        final double rTheta = path.rThetaJaKPerW();
        // Every evaluation is solved into the balance's one state (no point allocated per evaluation). The search's
        // root is always its last evaluation (LowestFixedPoint), so the state holds the root's point when the search
        // returns; the loop gain's two evaluations come after it, into a state of their own.
        balance.aim(circuit, prepared, rTheta, tLocalK);
        FixedPointOutcome outcome = LowestFixedPoint.find(balance, tLocalK, settings);
        if (outcome instanceof FixedPointOutcome.Root r) {
            boolean kept = balance.lastTjK() == r.x();
            CircuitPoint cp = balance.stateAt(r.x()).point();
            double refK = path.referenceTemperatureK(r.x(), cp.diodePowerW());
            // The gain as the search with loopGain computes it (the same two evaluations at the root, the same
            // count): LowestFixedPoint.loopGain.
            double gain = Double.NaN;
            int evaluations = r.evaluations() + (kept ? 0 : 1);
            if (loopGain) {
                gain = loopGainAt(circuit, prepared, rTheta, tLocalK, r.x());
                evaluations += 2;
            }
            return new ThermalOutcome.Converged(new OperatingPoint(r.x(), tLocalK, refK, cp, evaluations, gain,
                    r.residual()));
        }
        if (outcome instanceof FixedPointOutcome.Runaway) {
            return new ThermalOutcome.Runaway(tLocalK, settings.capK());
        }
        FixedPointOutcome.Exhausted e = (FixedPointOutcome.Exhausted) outcome;
        return new ThermalOutcome.NotConverged(tLocalK, e.lastX(), e.residual(), e.evaluations());
    }

    /**
     * The heat balance's map {@code F(Tj) = T_local + Rθja·P(Tj)} (design 2.3, steady conduction through one thermal
     * resistance): the junction temperature that dissipating {@code diodePowerW} in air at {@code tLocalK} settles
     * at. Every junction search of the solvers iterates this one expression.
     */
    static double junctionK(double tLocalK, double rThetaKPerW, double diodePowerW) {
        return tLocalK + rThetaKPerW * diodePowerW;
    }

    /**
     * {@code out} with its loop gain, where a solve without it left NaN: the same two evaluations at the root that
     * the solve would have made ({@link LowestFixedPoint#loopGain}), so the point is the one the solve with the gain
     * returns, bit for bit, evaluation count included. Any other outcome is returned as it is.
     */
    static ThermalOutcome withLoopGain(PositionInstance inst, ThermalOutcome out) {
        if (!(out instanceof ThermalOutcome.Converged c) || !Double.isNaN(c.point().loopGain())) {
            return out;
        }
        OperatingPoint p = c.point();
        double rTheta = inst.path().rThetaJaKPerW();
        double gain = loopGainAt(inst.circuit(), inst.prepared(), rTheta, p.tLocalK(), p.tjK());
        return new ThermalOutcome.Converged(new OperatingPoint(p.tjK(), p.tLocalK(), p.referenceK(), p.circuit(),
                p.evaluations() + 2, gain, p.residualK()));
    }

    /** The loop gain of the heat balance's map at {@code tjK}: {@link LowestFixedPoint#loopGain}'s two evaluations. */
    private static double loopGainAt(Circuit circuit, PreparedDiode prepared, double rTheta, double tLocalK,
                                     double tjK) {
        return LowestFixedPoint.loopGain(new HeatBalance().aim(circuit, prepared, rTheta, tLocalK), tjK);
    }
}
