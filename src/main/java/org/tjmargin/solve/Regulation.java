package org.tjmargin.solve;

import java.util.Optional;
import org.tjmargin.circuit.Load;
import org.tjmargin.circuit.ShuntRegulator;
import org.tjmargin.circuit.ShuntRegulatorSpec;
import org.tjmargin.variation.Corner;

/**
 * Line and load regulation of a shunt regulator at its nominal corner, both instantaneous (junction temperature
 * held, only {@code Rz} acts: the small-signal result {@code ΔVout/ΔVs = (Rz∥RL)/(Rs + Rz∥RL)},
 * {@code ΔVout/ΔIL = −(Rs∥Rz)}, Sedra and Smith, 5th ed., §3.5.1) and at thermal equilibrium (the junction
 * settles to the new dissipation and {@code αV} moves the breakdown voltage; this is why datasheets specify
 * {@code Vz} at equilibrium). Both are difference quotients of the full solution: line by a central difference of
 * ±1 % of the supply, load by a forward step of 1 % of the load current (or of {@code Izt} at no load), steps
 * small enough to stay on one segment of the characteristic in any sensible design and large enough to keep six
 * digits.
 *
 * @param lineInstantVPerV      instantaneous line regulation (V/V)
 * @param lineEquilibriumVPerV  line regulation at thermal equilibrium (V/V)
 * @param loadInstantVPerA      instantaneous load regulation (V/A, negative: output falls with load)
 * @param loadEquilibriumVPerA  load regulation at thermal equilibrium (V/A)
 * @param tLocalK               air temperature at which they were computed (K)
 */
public record Regulation(double lineInstantVPerV, double lineEquilibriumVPerV, double loadInstantVPerA,
                         double loadEquilibriumVPerA, double tLocalK) {

    private static final double LINE_STEP = 0.01;
    private static final double LOAD_STEP = 0.01;

    /**
     * Regulation of a position, if it is a shunt regulator and its nominal corner converges at {@code tLocalK}.
     */
    public static Optional<Regulation> of(PositionSpec spec, double tLocalK, SolverSettings settings) {
        if (!(spec.circuit() instanceof ShuntRegulatorSpec)) {
            return Optional.empty();
        }
        PositionInstance nominal = spec.at(Corner.NOMINAL);
        ShuntRegulator r = (ShuntRegulator) nominal.circuit();
        Optional<OperatingPoint> base = solve(nominal, r, tLocalK, settings);
        if (base.isEmpty() || r.supplyV() <= 0) {
            return Optional.empty();
        }
        double tj = base.get().tjK();
        double dVs = LINE_STEP * r.supplyV();
        ShuntRegulator up = r.withSupplyV(r.supplyV() + dVs);
        ShuntRegulator down = r.withSupplyV(r.supplyV() - dVs);
        double lineInst = (up.at(nominal.diode(), tj).voltageV() - down.at(nominal.diode(), tj).voltageV()) / (2 * dVs);
        Optional<OperatingPoint> pu = solve(nominal, up, tLocalK, settings);
        Optional<OperatingPoint> pd = solve(nominal, down, tLocalK, settings);
        if (pu.isEmpty() || pd.isEmpty()) {
            return Optional.empty();
        }
        double lineEq = (pu.get().circuit().voltageV() - pd.get().circuit().voltageV()) / (2 * dVs);

        ShuntRegulator heavier = r.withLoad(heavier(r.load(), nominal.diode().iztA()));
        var p0 = r.at(nominal.diode(), tj);
        var p1 = heavier.at(nominal.diode(), tj);
        double loadInst = (p1.voltageV() - p0.voltageV()) / (p1.loadCurrentA() - p0.loadCurrentA());
        Optional<OperatingPoint> ph = solve(nominal, heavier, tLocalK, settings);
        if (ph.isEmpty()) {
            return Optional.empty();
        }
        var e1 = ph.get().circuit();
        var e0 = base.get().circuit();
        double loadEq = (e1.voltageV() - e0.voltageV()) / (e1.loadCurrentA() - e0.loadCurrentA());
        return Optional.of(new Regulation(lineInst, lineEq, loadInst, loadEq, tLocalK));
    }

    private static Load heavier(Load load, double iztA) {
        if (load instanceof Load.Current c) {
            double step = LOAD_STEP * (c.currentA() > 0 ? c.currentA() : iztA);
            return new Load.Current(c.currentA() + step);
        }
        return load.scaledBy(1.0 + LOAD_STEP);
    }

    private static Optional<OperatingPoint> solve(PositionInstance inst, ShuntRegulator r, double tLocalK,
                                                  SolverSettings settings) {
        ThermalOutcome out = ElectroThermalSolver.solve(r, inst.prepared(), inst.path(), tLocalK, settings);
        return out instanceof ThermalOutcome.Converged c ? Optional.of(c.point()) : Optional.empty();
    }
}
