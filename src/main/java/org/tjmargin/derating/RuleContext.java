package org.tjmargin.derating;

import java.util.EnumMap;
import java.util.Map;
import java.util.OptionalDouble;

/**
 * What a rule sees of one operating point: the measured quantities that apply, and the part's constants that
 * limits may refer to.
 *
 * @param values     measured quantities (SI), only those that apply
 * @param tjMaxK     the part's maximum junction temperature (K)
 * @param referenceK temperature of the part's rating reference point (K)
 * @param tLocalK    temperature of the air around the part (K)
 */
public record RuleContext(Map<Measure, Double> values, double tjMaxK, double referenceK, double tLocalK) {

    public RuleContext {
        EnumMap<Measure, Double> copy = new EnumMap<>(Measure.class);
        for (Map.Entry<Measure, Double> e : values.entrySet()) {
            if (!Double.isFinite(e.getValue())) {
                throw new IllegalArgumentException(e.getKey() + " must be finite, got " + e.getValue());
            }
            copy.put(e.getKey(), e.getValue());
        }
        // An unmodifiable view of the EnumMap: lookups by ordinal, no hashing (this runs for every corner).
        values = java.util.Collections.unmodifiableMap(copy);
    }

    /** The temperature a temperature-dependent limit is read at. */
    public double temperatureK(Limit.Basis basis) {
        return switch (basis) {
            case JUNCTION -> values.getOrDefault(Measure.JUNCTION_TEMPERATURE, referenceK);
            case REFERENCE -> referenceK;
            case LOCAL_AIR -> tLocalK;
        };
    }

    /** The value of {@code m}, if it applies here. */
    public OptionalDouble value(Measure m) {
        Double v = values.get(m);
        return v == null ? OptionalDouble.empty() : OptionalDouble.of(v);
    }
}
