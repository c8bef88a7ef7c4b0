package org.tjmargin.circuit;

import java.util.Optional;
import java.util.Set;
import org.tjmargin.variation.Axis;
import org.tjmargin.variation.AxisValues;
import org.tjmargin.variation.Corner;
import org.tjmargin.variation.Range;

/**
 * A circuit with its toleranced inputs; {@link #at} gives the concrete circuit at one worst-case corner.
 */
public sealed interface CircuitSpec permits ShuntRegulatorSpec, CurrentFedSpec, StandoffClampSpec {

    /** The circuit at a corner. */
    Circuit at(Corner corner);

    /**
     * The circuit at any values of its axes (a Monte Carlo sample, a sensitivity step), each in the unit of its
     * {@link #rangeOf range}; axes not set stay nominal. At the extremes it is the circuit of the corner.
     */
    Circuit atValues(AxisValues values);

    /** The range of {@code axis} in this circuit, if the circuit has that axis. */
    Optional<Range> rangeOf(Axis axis);

    /** The axes of this circuit whose ranges vary. */
    Set<Axis> varyingAxes();

    /** True when the diode is meant to regulate (its current must stay above the knee). */
    boolean regulates();
}
