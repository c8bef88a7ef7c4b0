package org.tjmargin.solve;

import java.util.function.DoubleUnaryOperator;
import org.tjmargin.circuit.Circuit;
import org.tjmargin.circuit.CircuitState;
import org.tjmargin.device.PreparedDiode;

/**
 * The heat balance's map of one corner in one air, {@code F(Tj) = T_local + Rθja·P(Tj)}
 * ({@link ElectroThermalSolver#junctionK}, design 2.3), the function every junction search iterates: each
 * evaluation solves the circuit at {@code Tj} into one {@link CircuitState}, which therefore holds the last
 * evaluation's point when a search returns (its root, by {@link LowestFixedPoint}'s contract).
 *
 * <p>Reusable: {@link #aim} points it at another corner or air, so that a loop over a position's corners, or over a
 * board, solves them all with one map and one state instead of a closure, a state and a holder per solve (on a board
 * of a thousand positions, three objects for each of some three million solves per sweep).
 *
 * <p>Mutable and not thread-safe: one per thread of work.
 */
final class HeatBalance implements DoubleUnaryOperator {

    private final CircuitState state = new CircuitState();
    private Circuit circuit;
    private PreparedDiode prepared;
    private double rThetaKPerW;
    private double tLocalK;
    private double lastTjK = Double.NaN;

    /**
     * Points the map at a corner in an air, forgetting the last evaluation.
     *
     * @param circuit     the corner's circuit
     * @param prepared    its diode
     * @param rThetaKPerW its thermal resistance to the air (K/W)
     * @param tLocalK     the air (K)
     * @return this
     */
    HeatBalance aim(Circuit circuit, PreparedDiode prepared, double rThetaKPerW, double tLocalK) {
        this.circuit = circuit;
        this.prepared = prepared;
        this.rThetaKPerW = rThetaKPerW;
        this.tLocalK = tLocalK;
        this.lastTjK = Double.NaN;
        return this;
    }

    /** As {@link #aim(Circuit, PreparedDiode, double, double)} for a position's corner. */
    HeatBalance aim(PositionInstance inst, double tLocalK) {
        return aim(inst.circuit(), inst.prepared(), inst.path().rThetaJaKPerW(), tLocalK);
    }

    @Override
    public double applyAsDouble(double tjK) {
        circuit.solve(prepared, tjK, state);
        lastTjK = tjK;
        return ElectroThermalSolver.junctionK(tLocalK, rThetaKPerW, state.diodePowerW());
    }

    /** The circuit solved at {@code tjK}, from the last evaluation where that was at {@code tjK}, else anew. */
    CircuitState stateAt(double tjK) {
        if (lastTjK != tjK) {
            applyAsDouble(tjK);
        }
        return state;
    }

    /** @return the junction temperature of the last evaluation (K), NaN before the first since {@link #aim} */
    double lastTjK() {
        return lastTjK;
    }
}
