package org.tjmargin.circuit;

import java.util.Set;
import org.tjmargin.variation.Axis;
import org.tjmargin.variation.Corner;

/**
 * A circuit with its toleranced inputs; {@link #at} gives the concrete circuit at one worst-case corner.
 */
public sealed interface CircuitSpec permits ShuntRegulatorSpec, CurrentFedSpec, StandoffClampSpec {

    /** The circuit at a corner. */
    Circuit at(Corner corner);

    /** The axes of this circuit whose ranges vary. */
    Set<Axis> varyingAxes();

    /** True when the diode is meant to regulate (its current must stay above the knee). */
    boolean regulates();
}
