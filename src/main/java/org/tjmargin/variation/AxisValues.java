package org.tjmargin.variation;

import java.util.Arrays;
import java.util.EnumMap;
import java.util.Map;
import java.util.Optional;

/**
 * One point of the input space: a value for some axes, every other axis at its nominal. Generalises a
 * {@link Corner} (which only takes extremes) to any value, e.g. a Monte Carlo sample or a sensitivity step.
 *
 * <p>Each value is in its axis's own SI unit, that of the range it is drawn from: {@code SUPPLY} the supply or line
 * voltage (V) or the feed current (A); {@code LOAD} the load current (A) or the load resistance (Ω), whichever the
 * load is given as; {@code VZ} the shift of the breakdown line (V); {@code SERIES_RESISTOR} (Ω);
 * {@code THERMAL_RESISTANCE} the factor on every thermal resistance (1); {@code TEMPERATURE_COEFFICIENT} (V/K).
 *
 * <p>Immutable and thread-safe.
 */
public final class AxisValues {

    private static final Axis[] AXES = Axis.values();
    private static final AxisValues NOMINAL = new AxisValues(new double[AXES.length], 0);

    private final double[] values;
    private final int presentMask;

    private AxisValues(double[] values, int presentMask) {
        this.values = values;
        this.presentMask = presentMask;
    }

    /** Every axis at its nominal. */
    public static AxisValues nominal() {
        return NOMINAL;
    }

    /** The given values; axes not in {@code values} stay nominal. */
    public static AxisValues of(Map<Axis, Double> values) {
        double[] v = new double[AXES.length];
        int mask = 0;
        for (Map.Entry<Axis, Double> e : values.entrySet()) {
            double x = e.getValue();
            if (!Double.isFinite(x)) {
                throw new IllegalArgumentException("axis " + e.getKey() + " needs a finite value, got " + x);
            }
            v[e.getKey().ordinal()] = x;
            mask |= 1 << e.getKey().ordinal();
        }
        return new AxisValues(v, mask);
    }

    /** This point with {@code axis} at {@code value}. */
    public AxisValues with(Axis axis, double value) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("axis " + axis + " needs a finite value, got " + value);
        }
        double[] v = values.clone();
        v[axis.ordinal()] = value;
        return new AxisValues(v, presentMask | (1 << axis.ordinal()));
    }

    /** The value of {@code axis} if it is set. */
    public Optional<Double> value(Axis axis) {
        return isSet(axis) ? Optional.of(values[axis.ordinal()]) : Optional.empty();
    }

    /** True when {@code axis} has a value here (otherwise it is nominal). */
    public boolean isSet(Axis axis) {
        return (presentMask & (1 << axis.ordinal())) != 0;
    }

    /** The value of {@code axis} here, or the nominal of {@code range} when the axis is not set. */
    public double valueOf(Axis axis, Range range) {
        return isSet(axis) ? values[axis.ordinal()] : range.nominal();
    }

    /** The values that are set, by axis. */
    public Map<Axis, Double> asMap() {
        EnumMap<Axis, Double> m = new EnumMap<>(Axis.class);
        for (Axis a : AXES) {
            if (isSet(a)) {
                m.put(a, values[a.ordinal()]);
            }
        }
        return m;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof AxisValues other && other.presentMask == presentMask
                && Arrays.equals(masked(), other.masked());
    }

    @Override
    public int hashCode() {
        return 31 * presentMask + Arrays.hashCode(masked());
    }

    @Override
    public String toString() {
        return "AxisValues" + asMap();
    }

    private double[] masked() {
        double[] v = values.clone();
        for (int i = 0; i < v.length; i++) {
            if ((presentMask & (1 << i)) == 0) {
                v[i] = 0;
            }
        }
        return v;
    }
}
