package org.tjmargin.derating;

/**
 * The value a rule holds its quantity against, possibly depending on the part.
 */
public sealed interface Limit permits Limit.Fixed, Limit.BelowTjMax, Limit.LowerOf {

    /** The limit for this context (SI, the rule's unit). */
    double valueFor(RuleContext context);

    /** A readable form, e.g. {@code Tj max − 40 K}. */
    String describe();

    /**
     * A fixed number in the rule's unit (K for temperatures).
     *
     * @param value the limit
     */
    record Fixed(double value) implements Limit {
        public Fixed {
            if (!Double.isFinite(value)) {
                throw new IllegalArgumentException("limit must be finite, got " + value);
            }
        }

        @Override
        public double valueFor(RuleContext context) {
            return value;
        }

        @Override
        public String describe() {
            return Double.toString(value);
        }
    }

    /**
     * The part's maximum junction temperature less a margin.
     *
     * @param marginK margin below Tj max (K), ≥ 0
     */
    record BelowTjMax(double marginK) implements Limit {
        public BelowTjMax {
            if (!(marginK >= 0) || !Double.isFinite(marginK)) {
                throw new IllegalArgumentException("margin below Tj max must be ≥ 0, got " + marginK + " K");
            }
        }

        @Override
        public double valueFor(RuleContext context) {
            return context.tjMaxK() - marginK;
        }

        @Override
        public String describe() {
            return marginK == 0 ? "Tj max" : "Tj max − " + marginK + " K";
        }
    }

    /**
     * The lower of two limits, e.g. "125 °C or Tj max − 40 K, whichever is lower".
     *
     * @param a one limit
     * @param b the other
     */
    record LowerOf(Limit a, Limit b) implements Limit {
        @Override
        public double valueFor(RuleContext context) {
            return Math.min(a.valueFor(context), b.valueFor(context));
        }

        @Override
        public String describe() {
            return "lower of (" + a.describe() + ", " + b.describe() + ")";
        }
    }
}
