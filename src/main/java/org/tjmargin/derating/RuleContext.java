package org.tjmargin.derating;

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
public record RuleContext(Map<Measure, Double> values, double tjMaxK, double referenceK, double tLocalK)
        implements RuleInputs {

    public RuleContext {
        // Array-backed and immutable: lookups by ordinal, no hashing or boxing (this runs for every rule of every
        // corner). Values that already are MeasureValues (CornerReadings.values) are taken as they are.
        values = MeasureValues.copyOf(values);
    }

    /** The value of {@code m}, if it applies here. */
    public OptionalDouble value(Measure m) {
        double v = valueOrNaN(m);
        return Double.isNaN(v) ? OptionalDouble.empty() : OptionalDouble.of(v);
    }

    @Override
    public double valueOrNaN(Measure m) {
        return ((MeasureValues) values).valueOrNaN(m);
    }
}
