package org.tjmargin.derating;

import org.tjmargin.device.Celsius;
/**
 * The value a rule holds its quantity against, possibly depending on the part.
 */
public sealed interface Limit permits Limit.Fixed, Limit.BelowTjMax, Limit.LowerOf, Limit.TemperatureCurve {

    /** The temperature a {@link TemperatureCurve} is read at. */
    enum Basis {
        /** The junction. */
        JUNCTION,
        /** The part's rating reference point (lead, case or air, as its rating curve states). */
        REFERENCE,
        /** The air around the part inside the enclosure. */
        LOCAL_AIR
    }

    /** The limit for this point (SI, the rule's unit). */
    double valueFor(RuleInputs context);

    /**
     * A readable form in the rule's display unit, e.g. {@code Tj max − 40 K}, {@code 125.0 °C}, {@code 0.5}.
     *
     * @param temperature true for a temperature rule (values shown in °C), false for a ratio
     */
    String describe(boolean temperature);

    /** Formats one limit value: °C with one decimal for temperatures, four significant digits for ratios. */
    static String value(double v, boolean temperature) {
        return temperature ? String.format(java.util.Locale.ROOT, "%.1f °C", Celsius.toCelsius(v))
                : String.format(java.util.Locale.ROOT, "%.4g", v).replaceAll("\\.?0+$", "");
    }

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
        public double valueFor(RuleInputs context) {
            return value;
        }

        @Override
        public String describe(boolean temperature) {
            return Limit.value(value, temperature);
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
        public double valueFor(RuleInputs context) {
            return context.tjMaxK() - marginK;
        }

        @Override
        public String describe(boolean temperature) {
            return marginK == 0 ? "Tj max"
                    : "Tj max − " + String.format(java.util.Locale.ROOT, "%.4g", marginK).replaceAll("\\.?0+$", "")
                    + " K";
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
        public double valueFor(RuleInputs context) {
            return Math.min(a.valueFor(context), b.valueFor(context));
        }

        @Override
        public String describe(boolean temperature) {
            return "lower of (" + a.describe(temperature) + ", " + b.describe(temperature) + ")";
        }
    }

    /**
     * A limit that depends on temperature: piecewise linear through its points, held constant beyond the ends
     * (e.g. a power fraction that tightens above 100 °C).
     *
     * @param basis         which temperature
     * @param temperaturesK breakpoint temperatures (K), strictly increasing
     * @param values        the limit at each breakpoint
     */
    record TemperatureCurve(Basis basis, double[] temperaturesK, double[] values) implements Limit {
        public TemperatureCurve {
            temperaturesK = temperaturesK.clone();
            values = values.clone();
            if (basis == null || temperaturesK.length == 0 || temperaturesK.length != values.length) {
                throw new IllegalArgumentException("a temperature curve needs a basis and matching, non-empty "
                        + "temperature and value lists");
            }
            for (int i = 0; i < temperaturesK.length; i++) {
                if (!Double.isFinite(temperaturesK[i]) || !Double.isFinite(values[i])
                        || (i > 0 && !(temperaturesK[i] > temperaturesK[i - 1]))) {
                    throw new IllegalArgumentException("temperature curve points must be finite with temperatures "
                            + "strictly increasing; bad point " + i);
                }
            }
        }

        /** Breakpoint temperatures (K), a copy. */
        @Override
        public double[] temperaturesK() {
            return temperaturesK.clone();
        }

        /** Limit values at the breakpoints, a copy. */
        @Override
        public double[] values() {
            return values.clone();
        }

        @Override
        public double valueFor(RuleInputs context) {
            double t = context.temperatureK(basis);
            int n = temperaturesK.length;
            if (t <= temperaturesK[0]) {
                return values[0];
            }
            for (int i = 1; i < n; i++) {
                if (t <= temperaturesK[i]) {
                    double f = (t - temperaturesK[i - 1]) / (temperaturesK[i] - temperaturesK[i - 1]);
                    return values[i - 1] + f * (values[i] - values[i - 1]);
                }
            }
            return values[n - 1];
        }

        @Override
        public String describe(boolean temperature) {
            StringBuilder sb = new StringBuilder("by ").append(basis.name().toLowerCase(java.util.Locale.ROOT)
                    .replace('_', ' ')).append(" temperature:");
            for (int i = 0; i < temperaturesK.length; i++) {
                sb.append(String.format(java.util.Locale.ROOT, " %.1f °C → %s", Celsius.toCelsius(temperaturesK[i]),
                        Limit.value(values[i], temperature)));
                if (i + 1 < temperaturesK.length) {
                    sb.append(',');
                }
            }
            return sb.toString();
        }

        @Override
        public boolean equals(Object o) {
            return o instanceof TemperatureCurve t && t.basis == basis
                    && java.util.Arrays.equals(t.temperaturesK, temperaturesK) && java.util.Arrays.equals(t.values, values);
        }

        @Override
        public int hashCode() {
            return basis.hashCode() * 31 + java.util.Arrays.hashCode(temperaturesK) * 17
                    + java.util.Arrays.hashCode(values);
        }

        @Override
        public String toString() {
            return describe(false);
        }
    }
}
