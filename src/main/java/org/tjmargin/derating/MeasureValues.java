package org.tjmargin.derating;

import java.util.AbstractMap;
import java.util.AbstractSet;
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
        CornerReadings r = new CornerReadings();
        for (Map.Entry<Measure, Double> e : map.entrySet()) {
            r.put(e.getKey(), e.getValue());
        }
        return r.values();
    }

    /** The values of {@code byOrdinal} (NaN where absent; every other value finite), taken as they are. */
    static MeasureValues wrapping(double[] byOrdinal) {
        return new MeasureValues(byOrdinal);
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
}
