package org.tjmargin.variation;

import org.tjmargin.units.Decimals;

/**
 * A toleranced value: its nominal and the extremes it can take, in one SI unit.
 *
 * @param lo      lowest value
 * @param nominal nominal value, {@code lo ≤ nominal ≤ hi}
 * @param hi      highest value
 */
public record Range(double lo, double nominal, double hi) {

    public Range {
        if (!Double.isFinite(lo) || !Double.isFinite(nominal) || !Double.isFinite(hi)) {
            throw new IllegalArgumentException("range must be finite, got " + lo + " … " + nominal + " … " + hi);
        }
        if (!(lo <= nominal && nominal <= hi)) {
            throw new IllegalArgumentException("range must satisfy lo ≤ nominal ≤ hi, got " + lo + " ≤ " + nominal
                    + " ≤ " + hi);
        }
    }

    /** A value without tolerance. */
    public static Range exact(double v) {
        return new Range(v, v, v);
    }

    /**
     * {@code nominal·(1 ± relative)}, for a positive nominal: each end the double nearest to its decimal value
     * ({@link Decimals#relativeEnds}), so that {@code 5 mA ± 10 %} runs from 4.5 mA, not from
     * 4.5000000000000005 mA.
     */
    public static Range relative(double nominal, double relative) {
        double[] ends = Decimals.relativeEnds(nominal, relative);
        return new Range(ends[0], nominal, ends[1]);
    }

    /** From {@code lo} to {@code hi} with the nominal in the middle. */
    public static Range between(double lo, double hi) {
        return new Range(lo, 0.5 * (lo + hi), hi);
    }

    /** True when the extremes differ, i.e. the value is a corner axis. */
    public boolean varies() {
        return hi > lo;
    }

    /** The value at one extreme. */
    public double at(Extreme e) {
        return switch (e) {
            case LOW -> lo;
            case NOMINAL -> nominal;
            case HIGH -> hi;
        };
    }
}
