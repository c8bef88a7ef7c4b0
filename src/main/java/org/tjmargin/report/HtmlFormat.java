package org.tjmargin.report;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.Locale;
import org.tjmargin.derating.Limit;
import org.tjmargin.derating.Measure;
import org.tjmargin.units.Dimension;
import org.tjmargin.units.Quantities;
import org.tjmargin.variation.Range;

/**
 * Numbers of the HTML report as a reader wants them: temperatures in °C with one decimal, electrical quantities with
 * an SI prefix and three significant digits ({@link Quantities#format}), margins in per cent, ratios as plain numbers.
 * A value that is not finite shows as an em dash rather than failing the whole report. Stateless.
 */
final class HtmlFormat {

    /** Shown for a value that does not exist or is not finite. */
    static final String NONE = "—";

    /** Significant digits of ratios, loop gains and other plain numbers. */
    static final int PLAIN_DIGITS = 3;

    private HtmlFormat() {
    }

    /** An SI value with its unit and prefix, e.g. {@code 6.30 mA}. */
    static String si(double value, Dimension d) {
        return Double.isFinite(value) ? Quantities.format(value, d) : NONE;
    }

    /**
     * An absolute temperature in °C with one decimal, e.g. {@code 85.0 °C} or {@code 1000.0 °C}: the kelvin value
     * gets as many significant digits as it has integer digits plus one.
     */
    static String temperature(double kelvin) {
        if (!Double.isFinite(kelvin)) {
            return NONE;
        }
        double abs = Math.abs(kelvin);
        int digits = abs >= 1 ? (int) Math.floor(Math.log10(abs)) + 2 : Quantities.DEFAULT_TEMPERATURE_DIGITS;
        return Quantities.format(kelvin, Dimension.TEMPERATURE, Math.max(Quantities.DEFAULT_TEMPERATURE_DIGITS,
                Math.min(17, digits)));
    }

    /** A temperature difference, e.g. {@code 40.0 K}. */
    static String kelvinDifference(double k) {
        return si(k, Dimension.TEMPERATURE_DIFFERENCE);
    }

    /**
     * A relative margin in per cent with one decimal, e.g. {@code 12.1 %} or {@code -680.0 %}; below
     * {@link Labels#MARGIN_SHOWN_FLOOR}, {@code < -10000 %}.
     */
    static String margin(double fraction) {
        if (!Double.isFinite(fraction)) {
            return NONE;
        }
        return Labels.marginPercent(fraction, f -> new BigDecimal(100.0 * f).setScale(1, RoundingMode.HALF_EVEN)
                .toPlainString() + " %");
    }

    /** A plain number with {@value #PLAIN_DIGITS} significant digits, e.g. {@code 0.423}, {@code 25.0}. */
    static String plain(double x) {
        if (!Double.isFinite(x)) {
            return NONE;
        }
        if (x == 0) {
            return "0";
        }
        if (Math.abs(x) >= 1e6 || Math.abs(x) < 1e-4) {
            return String.format(Locale.ROOT, "%." + (PLAIN_DIGITS - 1) + "e", x);
        }
        BigDecimal b = new BigDecimal(x).round(new MathContext(PLAIN_DIGITS, RoundingMode.HALF_EVEN));
        // Keep trailing zeros up to the significant digits: 1 shows as 1.00, like the SI quantities beside it.
        int scale = PLAIN_DIGITS - 1 - (b.precision() - b.scale() - 1);
        return b.setScale(Math.max(0, scale), RoundingMode.HALF_EVEN).toPlainString();
    }

    /** A value of a rule's quantity in that quantity's display unit. */
    static String measure(double value, Measure m) {
        return m.isTemperature() ? temperature(value) : plain(value);
    }

    /** A difference in a rule's own unit: kelvin for temperatures, a plain number for ratios. */
    static String measureDifference(double diff, Measure m) {
        return m.isTemperature() ? kelvinDifference(diff) : plain(diff);
    }

    /**
     * A limit for a reader, in the rule's display unit. The report formats with the units module
     * (SI prefixes, °C), where {@link Limit#describe(boolean)} is the plain form for the terminal and JSON.
     */
    static String limit(Limit limit, Measure m) {
        if (limit instanceof Limit.Fixed f) {
            return measure(f.value(), m);
        }
        if (limit instanceof Limit.BelowTjMax b) {
            return b.marginK() == 0 ? "Tj max" : "Tj max − " + kelvinDifference(b.marginK());
        }
        if (limit instanceof Limit.TemperatureCurve c) {
            StringBuilder sb = new StringBuilder("by ").append(c.basis().name().toLowerCase(java.util.Locale.ROOT)
                    .replace('_', ' ')).append(" temperature:");
            double[] ts = c.temperaturesK();
            double[] vs = c.values();
            for (int i = 0; i < ts.length; i++) {
                sb.append(i == 0 ? " " : ", ").append(measure(ts[i], Measure.JUNCTION_TEMPERATURE)).append(" → ")
                        .append(measure(vs[i], m));
            }
            return sb.toString();
        }
        Limit.LowerOf l = (Limit.LowerOf) limit;
        return "lower of " + limit(l.a(), m) + " and " + limit(l.b(), m);
    }

    /** A range: one value when exact, else {@code lo … hi (nominal n)}. */
    static String range(Range r, Dimension d) {
        if (!r.varies()) {
            return si(r.nominal(), d);
        }
        return si(r.lo(), d) + " … " + si(r.hi(), d) + " (nominal " + si(r.nominal(), d) + ")";
    }

    /** A plain-number range, e.g. a factor {@code 0.900 … 1.10}. */
    static String plainRange(Range r) {
        if (!r.varies()) {
            return plain(r.nominal());
        }
        return plain(r.lo()) + " … " + plain(r.hi()) + " (nominal " + plain(r.nominal()) + ")";
    }
}
