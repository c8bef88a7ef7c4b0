package org.tjmargin.circuit;

import java.util.EnumSet;
import java.util.Optional;
import java.util.Set;
import org.tjmargin.variation.Axis;
import org.tjmargin.variation.AxisValues;
import org.tjmargin.variation.Corner;
import org.tjmargin.variation.Range;

/**
 * A clamp across a DC line, with the line's range (the SUPPLY axis) and its source resistance.
 *
 * @param lineV     line voltage (V), ≥ 0
 * @param sourceOhm source resistance of the line (Ω), ≥ 0
 */
public record StandoffClampSpec(Range lineV, double sourceOhm) implements CircuitSpec {

    public StandoffClampSpec {
        if (!(lineV.lo() >= 0) || !(sourceOhm >= 0)) {
            throw new IllegalArgumentException("need line ≥ 0 V and source ≥ 0 Ω, got " + lineV.lo() + " V, "
                    + sourceOhm + " Ω");
        }
    }

    @Override
    public StandoffClamp at(Corner c) {
        return new StandoffClamp(c.valueOf(Axis.SUPPLY, lineV), sourceOhm);
    }

    @Override
    public StandoffClamp atValues(AxisValues v) {
        return new StandoffClamp(v.valueOf(Axis.SUPPLY, lineV), sourceOhm);
    }

    @Override
    public Optional<Range> rangeOf(Axis axis) {
        return axis == Axis.SUPPLY ? Optional.of(lineV) : Optional.empty();
    }

    @Override
    public Set<Axis> varyingAxes() {
        return lineV.varies() ? EnumSet.of(Axis.SUPPLY) : EnumSet.noneOf(Axis.class);
    }

    @Override
    public boolean regulates() {
        return false;
    }
}
