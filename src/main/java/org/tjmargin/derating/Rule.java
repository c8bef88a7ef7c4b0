package org.tjmargin.derating;

import java.util.Optional;
import org.tjmargin.device.Celsius;

/**
 * A named derating rule: a quantity, a ceiling or floor, a limit, and where the limit comes from.
 *
 * <p>Margin (design 2.5): for a ceiling {@code 1 − actual/limit}; for a floor {@code actual/limit − 1}, which is
 * ≥ 0 exactly when the rule holds and never below −1. Temperatures are taken as rises above 25 °C, the reference
 * of datasheet ratings, so that a 150 °C junction against a 175 °C limit has the margin
 * {@code 1 − 125/150 = 16.7 %} rather than a ratio of kelvin values. The difference in the rule's own unit is
 * reported beside it.
 *
 * @param id         identifier, unique in a policy
 * @param title      human title
 * @param measure    the quantity
 * @param bound      ceiling or floor
 * @param limit      the limit
 * @param provenance where the limit comes from (a standard and clause, or "common practice")
 */
public record Rule(String id, String title, Measure measure, Bound bound, Limit limit, String provenance) {

    /** Rise origin of temperature margins (K): 25 °C, where datasheet ratings start. */
    public static final double TEMPERATURE_MARGIN_ORIGIN_K = Celsius.T25_K;

    public Rule {
        if (id == null || id.isBlank() || measure == null || bound == null || limit == null) {
            throw new IllegalArgumentException("a rule needs an id, a measure, a bound and a limit");
        }
        title = title == null ? id : title;
        provenance = provenance == null ? "" : provenance;
    }

    /**
     * Holds the rule against a context.
     *
     * @return the check, or empty when the rule's quantity does not apply to this point
     */
    public Optional<RuleCheck> check(RuleContext context) {
        return Optional.ofNullable(checkOrNull(context));
    }

    /** As {@link #check}, with {@code null} for a quantity that does not apply (no Optional per rule per corner). */
    RuleCheck checkOrNull(RuleInputs context) {
        double actual = context.valueOrNaN(measure);
        if (Double.isNaN(actual)) {
            return null;
        }
        return checkOf(actual, limit.valueFor(context));
    }

    /** The check of {@code actual} against {@code lim}: the one place a {@link RuleCheck} is made. */
    RuleCheck checkOf(double actual, double lim) {
        return new RuleCheck(id, measure, bound, actual, lim, marginOf(actual, lim),
                bound == Bound.MAX ? lim - actual : actual - lim);
    }

    /** The relative margin of {@code actual} against {@code limit} under this rule's bound and measure. */
    public double marginOf(double actual, double limit) {
        double a = actual;
        double l = limit;
        if (measure.isTemperature()) {
            a -= TEMPERATURE_MARGIN_ORIGIN_K;
            l -= TEMPERATURE_MARGIN_ORIGIN_K;
        }
        if (bound == Bound.MAX) {
            if (l <= 0) {
                return a <= l ? 0.0 : -1.0;
            }
            return 1.0 - a / l;
        }
        if (l <= 0) {
            return a >= l ? 0.0 : -1.0;
        }
        return Math.max(-1.0, a / l - 1.0);
    }
}
