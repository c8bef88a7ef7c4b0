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
import org.tjmargin.surge.PositionSurges;
import org.tjmargin.surge.SurgeResult;
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
 * @param surges           the surges the position must withstand, with the part's surge data; none by default
 */
public record PositionSpec(String id, BreakdownPart part, SteadyThermalPath path, CircuitSpec circuit, Range vzShiftV,
                           Range rThetaFactor, Range alphaVPerK, List<String> notes, Optional<PositionSurges> surges) {

    /** A position without surges. */
    public PositionSpec(String id, BreakdownPart part, SteadyThermalPath path, CircuitSpec circuit, Range vzShiftV,
                        Range rThetaFactor, Range alphaVPerK, List<String> notes) {
        this(id, part, path, circuit, vzShiftV, rThetaFactor, alphaVPerK, notes, Optional.empty());
    }

    public PositionSpec {
        notes = List.copyOf(notes);
        surges = surges == null ? Optional.empty() : surges;
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

    /**
     * The position at one corner. Its path is the mounting's resistances evaluated once and scaled by the corner's
     * factor, a {@code GivenPath}, also at the factor 1 (exact: {@code x·1 = x} in IEEE 754): the solvers read
     * {@code Rθja} at every solve, and a surface-mount pad's interpolation (two logarithms and a power) is then not
     * repeated there.
     */
    public PositionInstance at(Corner c) {
        var diode = part.model().withVoltageShift(c.valueOf(Axis.VZ, vzShiftV))
                .withAlpha(c.valueOf(Axis.TEMPERATURE_COEFFICIENT, alphaVPerK));
        double f = c.valueOf(Axis.THERMAL_RESISTANCE, rThetaFactor);
        return new PositionInstance(c, diode, circuit.at(c), path.scaledBy(f));
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
        return new PositionInstance(Corner.NOMINAL, diode, circuit.atValues(v), path.scaledBy(f));
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

    /** The device's power rating read at the temperature the point's rating reference reaches (W). */
    public double allowedPowerW(OperatingPoint p) {
        return part.ratings().powerCurve().allowedPowerAt(p.referenceK());
    }

    /** The series resistor's rating at the local air (W); 0 for circuits without one. */
    public double resistorAllowedW(double tLocalK) {
        return circuit instanceof ShuntRegulatorSpec s ? s.resistor().rating().allowedPowerAt(tLocalK) : 0.0;
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
            return Measurements.of(this, instance, p, allowedPowerW(p), resistorAllowedW(tLocalK));
        }
        if (out instanceof ThermalOutcome.Runaway r) {
            return Measurements.unresolved(this, r.capK(), tLocalK);
        }
        return Measurements.unresolved(this, ((ThermalOutcome.NotConverged) out).lastTjK(), tLocalK);
    }

    /**
     * This position's surges (none when it has none) applied at the converged point {@code p} of {@code instance}:
     * the same transient evaluation the corner analysis runs at its hottest corner per clamp line.
     */
    public List<SurgeResult> surgesAt(PositionInstance instance, OperatingPoint p) {
        return SurgeChecks.at(this, instance, p);
    }

    /**
     * As {@link #ruleContext(PositionInstance, ThermalOutcome, double)} at a converged point, with the surge
     * results {@code surges} (from {@link #surgesAt}) joining the steady-state quantities.
     */
    public RuleContext ruleContext(PositionInstance instance, OperatingPoint p, double tLocalK,
                                   List<SurgeResult> surges) {
        return Measurements.of(this, instance, p, allowedPowerW(p), resistorAllowedW(tLocalK), surges);
    }

    /** Relative disagreement above which the rating curve's implied resistance is flagged (1): 10 %, well beyond
     * the rounding of printed slopes (6.67 mW/K for 1/150 W/K is 0.05 %) and within the spread of real parts. */
    public static final double RATING_RESISTANCE_TOLERANCE = 0.10;

    /** All notes of this position: the part's estimates, the mounting's, the rating check, and its own. */
    public List<String> allNotes() {
        List<String> all = new ArrayList<>(part.estimates());
        all.addAll(path.notes());
        ratingResistanceNote().ifPresent(all::add);
        surges.ifPresent(s -> all.addAll(s.rating().notes()));
        all.addAll(notes);
        return all;
    }

    /**
     * The power rating curve implies a junction-to-reference resistance, {@code (T_zero − T_knee)/P_max}; where the
     * reference is a lead or a case it should match the thermal data's junction-to-reference resistance. A
     * disagreement means either the curve is not purely thermal (a datasheet may derate more steeply) or the
     * thermal data belong to another mounting: the analysis reads the curve at the temperature the path computes,
     * and says so.
     */
    public java.util.Optional<String> ratingResistanceNote() {
        var curve = part.ratings().powerCurve();
        if (curve.reference() != org.tjmargin.device.RatingReference.LEAD
                && curve.reference() != org.tjmargin.device.RatingReference.CASE) {
            return java.util.Optional.empty();
        }
        double implied = curve.impliedResistanceKPerW();
        double path = this.path.rThetaJrKPerW();
        if (implied > 0 && Math.abs(path - implied) > RATING_RESISTANCE_TOLERANCE * implied) {
            return java.util.Optional.of(String.format(java.util.Locale.ROOT,
                    "the rating curve implies %.1f K/W from junction to its reference point, the thermal path "
                            + "%.1f K/W: they disagree by more than %.0f %%; check the part data", implied, path,
                    100 * RATING_RESISTANCE_TOLERANCE));
        }
        return java.util.Optional.empty();
    }
}
