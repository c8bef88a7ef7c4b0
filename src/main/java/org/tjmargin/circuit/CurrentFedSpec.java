package org.tjmargin.circuit;

import java.util.EnumSet;
import java.util.Optional;
import java.util.Set;
import org.tjmargin.variation.Axis;
import org.tjmargin.variation.AxisValues;
import org.tjmargin.variation.Corner;
import org.tjmargin.variation.Range;

/**
 * A current-fed diode with its feed-current range (the SUPPLY axis).
 *
 * @param currentA feed current (A), > 0
 */
public record CurrentFedSpec(Range currentA) implements CircuitSpec {

    public CurrentFedSpec {
        if (!(currentA.lo() > 0)) {
            throw new IllegalArgumentException("feed current must be > 0, got " + currentA.lo() + " A");
        }
    }

    @Override
    public CurrentFedDiode at(Corner c) {
        return new CurrentFedDiode(c.valueOf(Axis.SUPPLY, currentA));
    }

    @Override
    public CurrentFedDiode atValues(AxisValues v) {
        return new CurrentFedDiode(v.valueOf(Axis.SUPPLY, currentA));
    }

    @Override
    public Optional<Range> rangeOf(Axis axis) {
        return axis == Axis.SUPPLY ? Optional.of(currentA) : Optional.empty();
    }

    @Override
    public Set<Axis> varyingAxes() {
        return currentA.varies() ? EnumSet.of(Axis.SUPPLY) : EnumSet.noneOf(Axis.class);
    }

    @Override
    public boolean regulates() {
        return true;
    }
}
