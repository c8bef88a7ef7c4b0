package org.tjmargin.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.tjmargin.solve.AnalysisResult;
import org.tjmargin.solve.PositionAtAmbient;
import org.tjmargin.solve.PositionSpec;
import org.tjmargin.solve.WorstCheck;
import org.tjmargin.variation.statistical.MonteCarloResult;
import org.tjmargin.variation.statistical.PositionStatistics;
import org.tjmargin.variation.statistical.RssOutcome;
import org.tjmargin.variation.statistical.SampledAxis;
import org.tjmargin.variation.statistical.StatisticsResult;
import org.tjmargin.variation.statistical.TornadoBar;

/**
 * The report's "Statistical spread" sections and statistics line, from real results of the demo design: what a
 * reviewer needs beside the worst-case corners, escaped, self-contained, and absent without statistics.
 */
class HtmlStatisticsTest {

    private static final StatisticsFixtures.Run DEMO = StatisticsFixtures.demo();
    private static final ReportInputs INPUTS = new ReportInputs("0.1.0-test", List.of("a caution"),
            List.of(ReportInputs.InputDigest.ofText("demo/design.yaml", "design")));
    private static final String HTML = HtmlReport.render(DEMO.result(), DEMO.optional(), INPUTS, DEMO.charts());

    @Test
    void everyPositionHasAStatisticalSpreadSection() {
        for (int i = 0; i < DEMO.result().positions().size(); i++) {
            String id = DEMO.result().positions().get(i).id();
            int start = HTML.indexOf("<section class=\"position\" id=\"pos-" + id + "\">");
            int heading = HTML.indexOf("<h3 id=\"pos-" + id + "-statistics\">Statistical spread</h3>");
            assertTrue(start >= 0 && heading > start && heading < HTML.indexOf("</section>", start),
                    "the block sits inside " + id + "'s own section");
        }
    }

    @Test
    void theThreeMethodsStandSideBySideAtTheHighestAmbient() {
        PositionStatistics d1 = stats("D1");
        String s = section(HTML, "D1");
        assertTrue(s.contains(escaped(StatisticsText.CORNERS)), "corner method named");
        assertTrue(s.contains(escaped(RssOutcome.METHOD)), "RSS method named");
        assertTrue(s.contains(escaped(StatisticsText.MONTE_CARLO)), "Monte Carlo method named");
        assertTrue(s.contains("coolest " + StatisticsFormat.temperature(d1.corners().tjMinK(), d1.corners().tjMaxK()
                - d1.corners().tjMinK())), "corners' coolest Tj");
        assertTrue(s.contains(HtmlFormat.margin(d1.corners().margin()) + " (rule " + d1.corners().limitingRuleId()
                + ")"), "corners' worst margin");
        RssOutcome.Spread rss = (RssOutcome.Spread) d1.rss();
        assertTrue(s.contains(HtmlFormat.temperature(rss.nominalTjK()) + " ± " + HtmlFormat.kelvinDifference(
                rss.tjSigmaK()) + " (nominal ± 1σ)"), "RSS Tj ± σ");
        MonteCarloResult mc = d1.monteCarlo();
        assertTrue(s.contains(escaped(HtmlStatisticsView.meanAndSigma(mc.tj(), true))), "Monte Carlo Tj mean ± σ");
        assertTrue(s.contains(escaped(HtmlStatisticsView.meanAndSigma(mc.margin(), false))), "margin mean ± σ");
        assertTrue(s.contains(StatisticsFormat.withInterval(mc.violation())), "violation with its Wilson interval");
        assertTrue(s.contains(StatisticsFixtures.SAMPLES + " samples, seed " + mc.settings().seed()), "budget");
        assertTrue(s.contains(escaped(ChartStatisticsData.air())), "the air assumption");
    }

    @Test
    void everyRuleThatAppliesHasItsViolationProbability() {
        PositionAtAmbient atMax = DEMO.result().atMaximumAmbient().positions().get(0);
        String table = between(section(HTML, "D1"), "<table class=\"rule-probabilities\">", "</table>");
        for (WorstCheck w : atMax.worst()) {
            assertTrue(table.contains("<code>" + w.check().ruleId() + "</code>"), w.check().ruleId());
        }
        // D1 is a shunt regulator: the clamp's standoff rule does not apply to it and is left out.
        assertFalse(table.contains("<code>standoff</code>"), "a rule that does not apply");
        assertTrue(table.contains(StatisticsFormat.interval(stats("D1").monteCarlo().rules().get(0).probability())));
    }

    @Test
    void inputsShowTheirDistributionAndRangeInTheirUnits() {
        PositionSpec spec = DEMO.result().board().positions().get(0);
        String table = between(section(HTML, "D1"), "<table class=\"inputs\">", "</table>");
        for (SampledAxis a : stats("D1").monteCarlo().axes()) {
            assertTrue(table.contains("<td>" + StatisticsFormat.axisTitle(spec, a.axis()) + "</td><td>"
                    + a.toleranced().distribution().label() + "</td>"), a.axis().label());
        }
        // demo/design.yaml: D1's supply is 19.2 V … 28 V around 24 V.
        assertTrue(table.contains("19.2 V … 28.0 V (nominal 24.0 V)"), "supply range in volts");
    }

    @Test
    void tornadoTableIsInRankOrder() {
        PositionSpec spec = DEMO.result().board().positions().get(0);
        String table = between(section(HTML, "D1"), "<table class=\"tornado\">", "</table>");
        int at = 0;
        int rank = 1;
        for (TornadoBar b : stats("D1").tornado().bars()) {
            int i = table.indexOf("<td class=\"num\">" + rank + "</td><td>" + StatisticsFormat.axisTitle(spec,
                    b.axis()) + "</td>");
            assertTrue(i > at, "rank " + rank + " (" + b.axis().label() + ") out of order");
            at = i;
            rank++;
        }
    }

    @Test
    void theFourStatisticsChartsAreInlinedInTheSection() {
        for (PositionStatistics p : DEMO.stats().positions()) {
            String s = section(HTML, p.positionId());
            assertEquals(ChartKind.STATISTICAL.size(), count(s, "<svg"), p.positionId());
            for (ChartKind k : ChartKind.STATISTICAL) {
                assertTrue(s.contains("<code>" + p.positionId() + "-" + k.suffix() + ".svg</code>"), k.suffix());
            }
        }
        assertEquals(DEMO.charts().size(), count(HTML, "<svg"), "every chart once on the page");
    }

    @Test
    void aPositionWithSurgesHasASecondYieldCurveWithThem() {
        String d4 = section(HTML, "D4");
        assertTrue(d4.contains("The yield chart has two curves: the " + StatisticsText.YIELD_RULES + " ("
                + StatisticsFixtures.SAMPLES + " samples at each ambient) and " + StatisticsText.YIELD_WITH_SURGES
                + " (" + StatisticsFixtures.SURGE_SAMPLES + ", "), "D4 runs surges");
        assertFalse(section(HTML, "D1").contains(StatisticsText.YIELD_WITH_SURGES), "D1 has none");
        assertTrue(d4.contains(StatisticsFixtures.SURGE_SAMPLES + " samples, seed"), "the surge run's own budget");
    }

    @Test
    void theVerdictAreaCarriesAStatisticsLinePerPosition() {
        String head = HTML.substring(0, HTML.indexOf("<section class=\"position\""));
        assertTrue(head.contains("<p class=\"statistics-summary\">"));
        for (PositionStatistics p : DEMO.stats().positions()) {
            assertTrue(head.contains("<li><a href=\"#pos-" + p.positionId() + "-statistics\">" + p.positionId()
                    + "</a>: " + StatisticsFormat.withInterval(p.monteCarlo().violation())), p.positionId());
        }
    }

    @Test
    void theSummaryNamesThePositionMostLikelyToFail() {
        // Invented: a rule no point can meet, so every sample violates (ReportFixtures.hopeless).
        AnalysisResult r = ReportFixtures.hopeless("Hopeless board");
        StatisticsResult s = StatisticsFixtures.of(r);
        String html = HtmlReport.render(r, Optional.of(s), INPUTS, List.of());
        assertEquals(1.0, s.positions().get(0).monteCarlo().violation().estimate(), 0.0);
        assertTrue(html.contains("highest at D7, 100 % (95 % Wilson interval "), "summary");
        assertTrue(html.contains("<tr class=\"violated\"><td><code>power-nil</code>"), "violated rule row");
    }

    @Test
    void withoutStatisticsThereIsNoStatisticsSection() {
        String plain = HtmlReport.render(DEMO.result(), INPUTS, List.of());
        assertFalse(plain.contains("Statistical spread"));
        assertFalse(plain.contains("<p class=\"statistics-summary\">"));
        assertFalse(plain.contains("-statistics\""));
        assertEquals(plain, HtmlReport.render(DEMO.result(), Optional.empty(), INPUTS, List.of()));
    }

    @Test
    void hostilePositionIdIsEscapedInTheSection() {
        String id = "<img src=x onerror=alert(1)>";
        AnalysisResult r = ReportFixtures.regulatorOnly("board", id);
        Optional<StatisticsResult> s = Optional.of(StatisticsFixtures.of(r));
        String html = HtmlReport.render(r, s, INPUTS, ChartSet.render(r, s));
        assertFalse(html.contains("<img"), "raw tag from a position id");
        String escapedId = "&lt;img src&#61;x onerror&#61;alert(1)&gt;";
        int at = html.indexOf("-statistics\">Statistical spread</h3>");
        assertTrue(at > 0, "section present");
        String section = html.substring(at, html.indexOf("</section>", at));
        assertTrue(section.contains("Position " + escapedId + " at the design"), "escaped id in the section");
        assertEquals(4, count(section, "<svg"), "the hostile position's statistics charts are still inlined");
        assertTrue(html.contains("\">" + escapedId + "</a>: "), "escaped id in the statistics line");
    }

    @Test
    void staysSelfContained() {
        assertFalse(HTML.contains("<script"), "script element");
        assertFalse(HTML.toLowerCase(Locale.ROOT).contains("http"), "a URL in a page whose inputs have none");
        Matcher url = Pattern.compile("url\\((?!#)").matcher(HTML);
        assertFalse(url.find(), "url() to something outside the page");
        assertFalse(HTML.contains("NaN") || HTML.contains("Infinity"), "a raw non-finite number");
        Matcher href = Pattern.compile("href=\"([^\"]*)\"").matcher(HTML);
        while (href.find()) {
            String target = href.group(1);
            assertTrue(target.startsWith("#") && HTML.contains("id=\"" + target.substring(1) + "\""),
                    "link to nowhere: " + target);
        }
    }

    @Test
    void sameInputsGiveTheSamePage() {
        assertEquals(HTML, HtmlReport.render(DEMO.result(), DEMO.optional(), INPUTS, DEMO.charts()));
    }

    private static PositionStatistics stats(String id) {
        return DEMO.stats().of(id).orElseThrow();
    }

    /** A position's statistics block: from its heading to the end of the position's section. */
    private static String section(String html, String id) {
        int at = html.indexOf("<h3 id=\"pos-" + id + "-statistics\">");
        assertTrue(at > 0, "no statistics section for " + id);
        return html.substring(at, html.indexOf("</section>", at));
    }

    private static String between(String s, String from, String to) {
        int a = s.indexOf(from);
        assertTrue(a >= 0, from);
        return s.substring(a, s.indexOf(to, a));
    }

    /** Text as Mustache's default HTML escaping writes it (the characters our texts use). */
    private static String escaped(String text) {
        return text.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;")
                .replace("'", "&#39;").replace("=", "&#61;");
    }

    private static int count(String s, String part) {
        int n = 0;
        for (int i = s.indexOf(part); i >= 0; i = s.indexOf(part, i + part.length())) {
            n++;
        }
        return n;
    }
}
