package org.tjmargin.report;

import java.util.List;

/**
 * The HTML report's view model: plain text already formatted for reading, which the Mustache templates place and
 * escape. Nothing here is computed beyond choosing and formatting values of the results.
 *
 * <p>Each record's components are read by the template by name ({@code {{designName}}}); a {@code null} or an empty
 * list hides its section. A name the template looks up inside a section is searched outwards through the enclosing
 * records, so an optional block's name is unique on the page ({@code spread}, {@code statisticsSummary},
 * {@code surgeNote}): a {@code null} must never let an outer record's value of the same name show instead.
 */
final class HtmlView {

    private HtmlView() {
    }

    /** The whole page. */
    record Page(String designName, String toolVersion, Badge verdict, String verdictText, List<Fact> design,
                List<SummaryRow> summary, String summaryAmbient, String detailNote, List<Position> positions,
                Policy policy, List<String> cautions, List<Input> inputs, List<Fact> colours,
                StatisticsSummary statisticsSummary) {

        /** True when there is a caution to print. */
        boolean hasCautions() {
            return !cautions.isEmpty();
        }
    }

    /** A label and its value. */
    record Fact(String label, String value) {
    }

    /** A verdict word with its style class. */
    record Badge(String word, String cssClass) {
    }

    /** One row of the verdict table; {@code detailed} when the position has a section to link to. */
    record SummaryRow(String id, String anchor, boolean detailed, String part, String circuit, Badge verdict,
                      String limitingRule, String worstMargin, String maxAmbient, String hottestTj, String diodePower,
                      String output, String leastCurrent) {
    }

    /** One position's section. */
    record Position(String id, String anchor, Badge verdict, String summary, List<Fact> part, List<Fact> mounting,
                    List<Fact> circuit, List<String> estimates, List<String> assumptions, String cornersCaption,
                    List<CornerRow> corners, boolean hasResistor, String marginsCaption, List<MarginRow> margins,
                    String worstOverRange, Facts regulation, Text runaway, List<Chart> charts, Surges surges,
                    Statistics spread) {

        /** True when there is a chart to place. */
        boolean hasCharts() {
            return !charts.isEmpty();
        }
    }

    /**
     * The surges of a position ({@code null} without surges): the position's surge verdict at the design's highest
     * ambient, the thermal-model caution that goes with it, and one block per surge.
     */
    record Surges(Badge verdict, String verdictText, String caution, List<Surge> surges) {
    }

    /** One surge: its test and its result at its worst corner at the design's highest ambient. */
    record Surge(String id, String description, List<Fact> facts) {
    }

    /**
     * The statistics line of the verdict area ({@code null} without statistics): one sentence naming the position
     * most likely to violate the policy, and a line per position.
     */
    record StatisticsSummary(String text, List<StatisticsLine> lines) {
    }

    /** One position's line of the statistics summary, linking to its section. */
    record StatisticsLine(String id, String anchor, String text) {
    }

    /**
     * A position's statistical spread ({@code null} without statistics): the three methods side by side at the
     * design's highest ambient, the Monte Carlo run, each rule's violating probability, the inputs with their
     * distributions, the tornado ranking, the charts, and the notes on the air and on surges.
     */
    record Statistics(String anchor, String caption, List<MethodRow> methods, List<Fact> run,
                      List<ViolationRow> rules, String rulesCaption, List<InputRow> sampledInputs,
                      String tornadoCaption, List<TornadoRow> tornado, List<Chart> charts, String air,
                      Text surgeNote) {

        /** True when there is a chart to place. */
        boolean hasCharts() {
            return !charts.isEmpty();
        }
    }

    /** One method of the comparison table. */
    record MethodRow(String method, String description, String tj, String margin, String violation, String basis) {
    }

    /** One rule's probability of being violated in the Monte Carlo run. */
    record ViolationRow(String ruleId, String title, String probability, String interval, String count,
                        String cssClass) {
    }

    /** One sampled input. */
    record InputRow(String input, String distribution, String range, String sigma) {
    }

    /** One bar of the tornado, in rank order. */
    record TornadoRow(String rank, String input, String range, String atLow, String atHigh, String swing,
                      String rssShare) {
    }

    /** A group of facts that may be absent as a whole ({@code null}). */
    record Facts(List<Fact> facts) {
    }

    /** A paragraph that may be absent ({@code null}). */
    record Text(String text) {
    }

    /**
     * One corner at the design's highest ambient; for a corner without an operating point only {@code label},
     * {@code status} and {@code note} are set.
     */
    record CornerRow(String label, String status, boolean converged, String note, String tj, String voltage,
                     String current, String diodePower, String allowedPower, String resistorPower,
                     String reference, String loopGain, String evaluations, String cssClass) {
    }

    /** One rule at its worst corner. */
    record MarginRow(String ruleId, String title, String actual, String limit, String margin, String difference,
                     String corner, String cssClass) {
    }

    /** A chart placed inline. */
    record Chart(String caption, String svg, String fileName) {
    }

    /** The policy section. */
    record Policy(String name, String provenance, List<RuleRow> rules) {
    }

    /** One rule of the policy. */
    record RuleRow(String id, String title, String quantity, String bound, String limit, String provenance) {
    }

    /** One input file. */
    record Input(String path, String sha256) {
    }
}
