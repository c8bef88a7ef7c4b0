package org.tjmargin.solve;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import org.tjmargin.circuit.CircuitSpec;
import org.tjmargin.device.BreakdownPart;
import org.tjmargin.surge.PositionSurges;
import org.tjmargin.thermal.SteadyThermalPath;
import org.tjmargin.variation.Axis;
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

    /** The position at one corner. */
    public PositionInstance at(Corner c) {
        var diode = part.model().withVoltageShift(c.valueOf(Axis.VZ, vzShiftV))
                .withAlpha(c.valueOf(Axis.TEMPERATURE_COEFFICIENT, alphaVPerK));
        double f = c.valueOf(Axis.THERMAL_RESISTANCE, rThetaFactor);
        return new PositionInstance(c, diode, circuit.at(c), f == 1.0 ? path : path.scaledBy(f));
    }

    /** All notes of this position: the part's estimates, the mounting's, and the position's own. */
    public List<String> allNotes() {
        List<String> all = new ArrayList<>(part.estimates());
        all.addAll(path.notes());
        surges.ifPresent(s -> all.addAll(s.rating().notes()));
        all.addAll(notes);
        return all;
    }
}
