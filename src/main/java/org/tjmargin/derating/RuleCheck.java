package org.tjmargin.derating;

/**
 * One rule held against one operating point.
 *
 * @param ruleId     the rule's identifier
 * @param measure    the quantity
 * @param bound      ceiling or floor
 * @param actual     the quantity's value (SI)
 * @param limit      the limit's value (SI)
 * @param margin     relative margin, ≥ 0 when the rule holds (see {@link Rule#marginOf})
 * @param difference {@code limit − actual} for a ceiling, {@code actual − limit} for a floor, in the rule's unit
 */
public record RuleCheck(String ruleId, Measure measure, Bound bound, double actual, double limit, double margin,
                        double difference) {

    /** True when the rule holds. */
    public boolean holds() {
        return margin >= 0;
    }
}
