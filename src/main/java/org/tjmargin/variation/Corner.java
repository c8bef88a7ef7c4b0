package org.tjmargin.variation;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;

/**
 * One combination of extremes: every axis in {@code active} takes its LOW or HIGH value (HIGH when its bit in
 * {@code highMask} is set, bit = ordinal), every other axis its nominal.
 *
 * @param active   the axes that vary
 * @param highMask bits of the axes at their HIGH value
 */
public record Corner(Set<Axis> active, int highMask) {

    /** The all-nominal point. */
    public static final Corner NOMINAL = new Corner(EnumSet.noneOf(Axis.class), 0);

    public Corner {
        active = active.isEmpty() ? EnumSet.noneOf(Axis.class) : EnumSet.copyOf(active);
    }

    /** Which extreme this corner takes on {@code axis}. */
    public Extreme extreme(Axis axis) {
        if (!active.contains(axis)) {
            return Extreme.NOMINAL;
        }
        return (highMask & (1 << axis.ordinal())) != 0 ? Extreme.HIGH : Extreme.LOW;
    }

    /** The value of {@code range} at this corner's extreme for {@code axis}. */
    public double valueOf(Axis axis, Range range) {
        return range.at(extreme(axis));
    }

    /**
     * Every combination of the extremes of {@code axes}: {@code 2^n} corners (extreme-value analysis over all
     * combinations, design 2.7). With no axis, the nominal point alone.
     */
    public static List<Corner> all(Set<Axis> axes) {
        List<Axis> list = new ArrayList<>(axes);
        List<Corner> out = new ArrayList<>(1 << list.size());
        for (int combo = 0; combo < (1 << list.size()); combo++) {
            int mask = 0;
            for (int i = 0; i < list.size(); i++) {
                if ((combo & (1 << i)) != 0) {
                    mask |= 1 << list.get(i).ordinal();
                }
            }
            out.add(new Corner(axes, mask));
        }
        return out;
    }

    /** A compact label such as {@code Vs+ IL− Vz+}, or {@code nominal}. */
    public String label() {
        if (active.isEmpty()) {
            return "nominal";
        }
        StringBuilder sb = new StringBuilder();
        for (Axis a : active) {
            if (sb.length() > 0) {
                sb.append(' ');
            }
            sb.append(a.label()).append(extreme(a) == Extreme.HIGH ? '+' : '−');
        }
        return sb.toString();
    }
}
