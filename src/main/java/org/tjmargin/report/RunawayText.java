package org.tjmargin.report;

import java.util.Locale;
import java.util.function.DoubleFunction;
import org.tjmargin.solve.EnclosureRunaway;
import org.tjmargin.solve.RunawayOnset;

/**
 * The words for a runaway onset and for the enclosure air's own runaway, the same in the table, the report and the
 * cautions.
 */
final class RunawayText {

    /** Temperatures as the terminal table writes them: one decimal, °C. */
    static final DoubleFunction<String> TABLE = k -> String.format(Locale.ROOT, "%.1f °C", Labels.celsius(k));

    private RunawayText() {
    }

    /** One position's onset, e.g. {@code thermal runaway begins at 129.0 °C ambient}, in the table's numbers. */
    static String onset(RunawayOnset o) {
        return onset(o, TABLE);
    }

    /** As above, temperatures written by {@code temperature} (from kelvin). */
    static String onset(RunawayOnset o, DoubleFunction<String> temperature) {
        String ambient = temperature.apply(o.ambientK()) + " ambient";
        String at = (o.atOrBelowSearch() ? "at or below " : "at ") + ambient;
        return switch (o.cause()) {
            case OWN -> "thermal runaway begins " + at;
            case DRIVES_ENCLOSURE -> "thermal runaway begins " + at + ": its heat leaps there by more than the box"
                    + " can shed, and the enclosure air runs away with it";
            case ENCLOSURE -> "runs away with the enclosure air from " + (o.atOrBelowSearch() ? "or below " : "")
                    + ambient;
        };
    }

    /**
     * The enclosure air's runaway, naming at most {@code shown} of its driving positions, e.g. {@code the enclosure
     * air has no steady state from 129.0 °C ambient ...}.
     */
    static String enclosure(EnclosureRunaway e, int shown) {
        return enclosure(e, shown, TABLE);
    }

    /** As above, temperatures written by {@code temperature} (from kelvin). */
    static String enclosure(EnclosureRunaway e, int shown, DoubleFunction<String> temperature) {
        String why = e.drivers().isEmpty()
                ? "the board's heat as a whole grows with temperature faster than the box sheds it"
                : "driven by " + Labels.ids(e.drivers(), shown);
        return "the enclosure air has no steady state from " + (e.atOrBelow() ? "at or below " : "")
                + temperature.apply(e.ambientK()) + " ambient (" + why + "): the air, and every junction in it, heats"
                + " without bound, so every position runs away above it";
    }
}
