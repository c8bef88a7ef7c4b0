package org.tjmargin.circuit;

import java.util.EnumSet;
import java.util.Optional;
import java.util.Set;
import org.tjmargin.variation.Axis;
import org.tjmargin.variation.AxisValues;
import org.tjmargin.variation.Corner;
import org.tjmargin.variation.Range;

/**
 * A shunt regulator with its supply range, toleranced series resistor and load range.
 *
 * @param supplyV  supply voltage (V)
 * @param resistor series resistor
 * @param load     load range
 */
public record ShuntRegulatorSpec(Range supplyV, SeriesResistor resistor, LoadRange load) implements CircuitSpec {

    public ShuntRegulatorSpec {
        if (!(supplyV.lo() >= 0)) {
            throw new IllegalArgumentException("supply must be ≥ 0, got " + supplyV.lo() + " V");
        }
    }

    @Override
    public ShuntRegulator at(Corner c) {
        return new ShuntRegulator(c.valueOf(Axis.SUPPLY, supplyV), c.valueOf(Axis.SERIES_RESISTOR, resistor.ohm()),
                load.at(c.extreme(Axis.LOAD)));
    }

    @Override
    public ShuntRegulator atValues(AxisValues v) {
        return new ShuntRegulator(v.valueOf(Axis.SUPPLY, supplyV), v.valueOf(Axis.SERIES_RESISTOR, resistor.ohm()),
                load.atValue(v.valueOf(Axis.LOAD, load.range())));
    }

    @Override
    public Optional<Range> rangeOf(Axis axis) {
        return switch (axis) {
            case SUPPLY -> Optional.of(supplyV);
            case SERIES_RESISTOR -> Optional.of(resistor.ohm());
            case LOAD -> Optional.of(load.range());
            default -> Optional.empty();
        };
    }

    @Override
    public Set<Axis> varyingAxes() {
        Set<Axis> s = EnumSet.noneOf(Axis.class);
        if (supplyV.varies()) {
            s.add(Axis.SUPPLY);
        }
        if (resistor.ohm().varies()) {
            s.add(Axis.SERIES_RESISTOR);
        }
        if (load.varies()) {
            s.add(Axis.LOAD);
        }
        return s;
    }

    @Override
    public boolean regulates() {
        return true;
    }
}
