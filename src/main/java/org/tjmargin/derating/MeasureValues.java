package org.tjmargin.derating;

import java.util.AbstractMap;
import java.util.AbstractSet;
import java.util.Arrays;
import java.util.Iterator;
import java.util.Map;
import java.util.NoSuchElementException;
import java.util.Set;

/**
 * The measured quantities of one operating point, immutable: an array by {@link Measure} ordinal, read without
 * hashing or boxing at every rule of every corner, and viewed as a {@code Map} in {@link Measure} order (the order
 * of an {@code EnumMap}) for everything else. Only finite values are held; a measure that does not apply is absent.
 */
public final class MeasureValues extends AbstractMap<Measure, Double> {

    private static final Measure[] MEASURES = Measure.values();

    /** {@code NaN} where the measure is absent (a held value is never NaN). */
    private final double[] byOrdinal;

    private MeasureValues(double[] byOrdinal) {
        this.byOrdinal = byOrdinal;
    }

    /**
     * The values of {@code map}; {@code map} itself when it already is one.
     *
     * @throws IllegalArgumentException for a value that is not finite
     */
    public static MeasureValues copyOf(Map<Measure, Double> map) {
        if (map instanceof MeasureValues m) {
            return m;
        }
        Builder b = new Builder();
        for (Map.Entry<Measure, Double> e : map.entrySet()) {
            b.put(e.getKey(), e.getValue());
        }
        return b.build();
    }

    /** A builder with no values. */
    public static Builder builder() {
        return new Builder();
    }

    /** The value of {@code m}, or {@code NaN} where it does not apply. */
    public double valueOrNaN(Measure m) {
        return byOrdinal[m.ordinal()];
    }

    @Override
    public Double get(Object key) {
        if (key instanceof Measure m) {
            double v = byOrdinal[m.ordinal()];
            return Double.isNaN(v) ? null : v;
        }
        return null;
    }

    @Override
    public boolean containsKey(Object key) {
        return key instanceof Measure m && !Double.isNaN(byOrdinal[m.ordinal()]);
    }

    /** Counted when asked (rarely: the rules read values by measure), not at every corner's construction. */
    @Override
    public int size() {
        int n = 0;
        for (double v : byOrdinal) {
            if (!Double.isNaN(v)) {
                n++;
            }
        }
        return n;
    }

    @Override
    public Set<Map.Entry<Measure, Double>> entrySet() {
        return new AbstractSet<>() {
            @Override
            public Iterator<Map.Entry<Measure, Double>> iterator() {
                return new Iterator<>() {
                    private int next = advance(0);

                    private int advance(int from) {
                        int i = from;
                        while (i < byOrdinal.length && Double.isNaN(byOrdinal[i])) {
                            i++;
                        }
                        return i;
                    }

                    @Override
                    public boolean hasNext() {
                        return next < byOrdinal.length;
                    }

                    @Override
                    public Map.Entry<Measure, Double> next() {
                        if (!hasNext()) {
                            throw new NoSuchElementException();
                        }
                        Map.Entry<Measure, Double> e = Map.entry(MEASURES[next], byOrdinal[next]);
                        next = advance(next + 1);
                        return e;
                    }
                };
            }

            @Override
            public int size() {
                return MeasureValues.this.size();
            }
        };
    }

    /** Collects the values of one point; each builder builds once. */
    public static final class Builder {

        private double[] byOrdinal = new double[MEASURES.length];

        private Builder() {
            Arrays.fill(byOrdinal, Double.NaN);
        }

        /**
         * Sets {@code m} to {@code value}.
         *
         * @throws IllegalArgumentException when {@code value} is not finite
         */
        public Builder put(Measure m, double value) {
            byOrdinal[m.ordinal()] = finite(m, value);
            return this;
        }

        /** Sets {@code m} to the larger of its value so far (if any) and {@code value}, which must be finite. */
        public Builder max(Measure m, double value) {
            double old = byOrdinal[m.ordinal()];
            byOrdinal[m.ordinal()] = Double.isNaN(old) ? finite(m, value) : Math.max(old, finite(m, value));
            return this;
        }

        /** The values collected. */
        public MeasureValues build() {
            if (byOrdinal == null) {
                throw new IllegalStateException("this builder has already built its values");
            }
            MeasureValues m = new MeasureValues(byOrdinal);
            byOrdinal = null;
            return m;
        }

        private static double finite(Measure m, double value) {
            if (!Double.isFinite(value)) {
                throw new IllegalArgumentException(m + " must be finite, got " + value);
            }
            return value;
        }
    }
}
