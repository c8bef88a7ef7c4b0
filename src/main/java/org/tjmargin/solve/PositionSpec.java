package org.tjmargin.solve;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import org.tjmargin.circuit.CircuitSpec;
import org.tjmargin.circuit.ShuntRegulatorSpec;
import org.tjmargin.derating.RuleContext;
import org.tjmargin.device.BreakdownPart;
import org.tjmargin.thermal.SteadyThermalPath;
import org.tjmargin.variation.Axis;
import org.tjmargin.variation.AxisValues;
import org.tjmargin.variation.Corner;
import org.tjmargin.variation.Range;

/**
 * One diode position on the board: the part, its mounting, its circuit, and the tolerances of the part and the
 * mounting.
 *
 * @param id               the position's identifier (e.g. a reference designator)
 * @param part             the part placed there
 * @param path             its steady thermal path in this mounting (nominal)
 * @param circuit          its circuit with the circuit's tolerances
 * @param vzShiftV         shift of the breakdown voltage within its tolerance (V), nominal 0
 * @param rThetaFactor     factor on every thermal resistance within its tolerance (1), nominal 1
 * @param alphaVPerK       the temperature coefficient's range (V/K)
 * @param notes            notes on estimated values (part and mounting), shown in every output
 */
public record PositionSpec(String id, BreakdownPart part, SteadyThermalPath path, CircuitSpec circuit, Range vzShiftV,
                           Range rThetaFactor, Range alphaVPerK, List<String> notes) {

    public PositionSpec {
        notes = List.copyOf(notes);
        if (id == null || id.isBlank() || part == null || path == null || circuit == null) {
            throw new IllegalArgumentException("a position needs an id, a part, a thermal path and a circuit");
        }
        if (!(rThetaFactor.lo() > 0)) {
            throw new IllegalArgumentException("thermal resistance factor must stay > 0, got " + rThetaFactor.lo());
        }
    }

    /** The axes that vary at this position. */
    public Set<Axis> varyingAxes() {
        Set<Axis> axes = EnumSet.noneOf(Axis.class);
        axes.addAll(circuit.varyingAxes());
        if (vzShiftV.varies()) {
            axes.add(Axis.VZ);
        }
        if (rThetaFactor.varies()) {
            axes.add(Axis.THERMAL_RESISTANCE);
        }
        if (alphaVPerK.varies()) {
            axes.add(Axis.TEMPERATURE_COEFFICIENT);
        }
        return axes;
    }

    /** Every worst-case corner: all combinations of the varying axes' extremes. */
    public List<Corner> corners() {
        return Corner.all(varyingAxes());
    }

    /** The position at one corner. */
    public PositionInstance at(Corner c) {
        var diode = part.model().withVoltageShift(c.valueOf(Axis.VZ, vzShiftV))
                .withAlpha(c.valueOf(Axis.TEMPERATURE_COEFFICIENT, alphaVPerK));
        double f = c.valueOf(Axis.THERMAL_RESISTANCE, rThetaFactor);
        return new PositionInstance(c, diode, circuit.at(c), f == 1.0 ? path : path.scaledBy(f));
    }

    /**
     * The position at any values of its axes (design 2.7: Monte Carlo samples, sensitivity steps), each in the unit
     * of its {@link #rangeOf range}; axes not set stay nominal. At the extremes it is the instance {@link #at} gives
     * for that corner, except that the instance's corner is {@link Corner#NOMINAL}: a sampled point is no corner.
     */
    public PositionInstance atValues(AxisValues v) {
        var diode = part.model().withVoltageShift(v.valueOf(Axis.VZ, vzShiftV))
                .withAlpha(v.valueOf(Axis.TEMPERATURE_COEFFICIENT, alphaVPerK));
        double f = v.valueOf(Axis.THERMAL_RESISTANCE, rThetaFactor);
        if (!(f > 0)) {
            throw new IllegalArgumentException("thermal resistance factor must be > 0, got " + f);
        }
        return new PositionInstance(Corner.NOMINAL, diode, circuit.atValues(v), f == 1.0 ? path : path.scaledBy(f));
    }

    /** The range of {@code axis} at this position, if it has that axis (a clamp has no series resistor). */
    public Optional<Range> rangeOf(Axis axis) {
        return switch (axis) {
            case VZ -> Optional.of(vzShiftV);
            case THERMAL_RESISTANCE -> Optional.of(rThetaFactor);
            case TEMPERATURE_COEFFICIENT -> Optional.of(alphaVPerK);
            default -> circuit.rangeOf(axis);
        };
    }

    /**
     * What the policy's rules see of {@code instance} solved in air at {@code tLocalK} with outcome {@code out}:
     * the same quantities the corner analysis holds against the policy (the device rating read at the reference
     * point's temperature, the series resistor's at the local air; an unresolved point as its last junction
     * temperature).
     */
    public RuleContext ruleContext(PositionInstance instance, ThermalOutcome out, double tLocalK) {
        if (out instanceof ThermalOutcome.Converged c) {
            OperatingPoint p = c.point();
            double allowed = part.ratings().powerCurve().allowedPowerAt(p.referenceK());
            double resistorAllowed = circuit instanceof ShuntRegulatorSpec s
                    ? s.resistor().rating().allowedPowerAt(tLocalK) : 0.0;
            return Measurements.of(this, instance, p, allowed, resistorAllowed);
        }
        if (out instanceof ThermalOutcome.Runaway r) {
            return Measurements.unresolved(this, r.capK(), tLocalK);
        }
        return Measurements.unresolved(this, ((ThermalOutcome.NotConverged) out).lastTjK(), tLocalK);
    }

    /** All notes of this position: the part's estimates, the mounting's, and the position's own. */
    public List<String> allNotes() {
        List<String> all = new ArrayList<>(part.estimates());
        all.addAll(path.notes());
        all.addAll(notes);
        return all;
    }
}
