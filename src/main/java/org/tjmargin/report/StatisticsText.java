package org.tjmargin.report;

/**
 * The words every writer uses for the statistical methods, so that the table, the JSON, the CSV and the HTML name
 * each method the same way.
 */
final class StatisticsText {

    private StatisticsText() {
    }

    /** The extreme-value method. */
    static final String CORNERS = "worst-case corners: every toleranced input at its extremes together";

    /** The sampling method. */
    static final String MONTE_CARLO = "seeded Monte Carlo, each input drawn from its distribution, every sample "
            + "solved and held against the policy";

    /** The ranking. */
    static final String TORNADO = "each input swung over its range with the others nominal, ranked by the swing of "
            + "the limiting margin";

    /** What the yield curve holds. */
    static final String YIELD_RULES = "steady-state rules";

    /** What the second yield curve of a position with surges holds. */
    static final String YIELD_WITH_SURGES = "every rule, each surge run on every sample";

    /** The air in which every statistical run is taken. */
    static final String AIR = "the position's air at each ambient is the corner analysis's worst-case board balance"
            + " (ambient not sampled), so the probabilities err on the safe side";
}
