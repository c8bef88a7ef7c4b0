package org.tjmargin.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.tjmargin.solve.AnalysisResult;
import org.tjmargin.solve.MaximumAmbient;
import org.tjmargin.solve.PositionAtAmbient;
import org.tjmargin.solve.PositionResult;

/** The review page: escaped, self-contained, and carrying what a reviewer needs. */
class HtmlReportTest {

    private static final AnalysisResult MIXED = ReportFixtures.mixed("Mixed board");
    private static final List<RenderedChart> CHARTS = ChartSet.render(MIXED);
    private static final List<String> CAUTIONS = List.of(
            "A clamp that fails short becomes a short on the supply: limit the fault current.",
            "Fuse I²t must exceed the surge's & stay below the track's <limit>.");
    private static final List<ReportInputs.InputDigest> INPUTS = List.of(
            ReportInputs.InputDigest.ofText("designs/board.yaml", "board"),
            ReportInputs.InputDigest.ofText("parts/zener.yaml", "part"));
    private static final String HTML = HtmlReport.render(MIXED, CAUTIONS, INPUTS, "0.1.0-test", CHARTS);

    @Test
    void maliciousDesignNameIsEscaped() {
        String name = "<script>alert(1)</script>";
        String html = HtmlReport.render(ReportFixtures.regulatorOnly(name, "D1"), List.of(), List.of(), "0.1.0",
                List.of());
        assertFalse(html.contains("<script"), "raw script tag in the page");
        assertTrue(html.contains("&lt;script&gt;alert(1)&lt;/script&gt;"), "escaped name missing");
    }

    @Test
    void maliciousPositionIdIsEscapedInTextAndCharts() {
        String id = "<img src=x onerror=alert(1)>";
        AnalysisResult r = ReportFixtures.regulatorOnly("board", id);
        String html = HtmlReport.render(r, List.of(), List.of(), "0.1.0", ChartSet.render(r));
        assertFalse(html.contains("<img"), "raw tag from a position id");
        assertTrue(html.contains("&lt;img src&#61;x onerror&#61;alert(1)&gt;"), "escaped id missing");
        assertEquals(4, count(html, "<svg"), "the hostile position's charts are still inlined");
    }

    @Test
    void userTextWithLinksStaysText() {
        String name = "<a href=\"http://example.invalid/\">board</a>";
        String html = HtmlReport.render(ReportFixtures.regulatorOnly(name, "D1"), List.of(), List.of(), "0.1.0",
                List.of());
        assertFalse(html.contains("<a href=\"http"), "user text became a link");
        assertOnlyInternalLinks(html);
    }

    @Test
    void containsTheCautionsGivenEscaped() {
        assertTrue(HTML.contains(CAUTIONS.get(0)), "first caution missing");
        assertTrue(HTML.contains(
                "Fuse I²t must exceed the surge&#39;s &amp; stay below the track&#39;s &lt;limit&gt;."),
                "second caution missing or unescaped");
    }

    @Test
    void saysSoWhenNoCautionIsGiven() {
        String html = HtmlReport.render(MIXED, List.of(), INPUTS, "0.1.0", List.of());
        assertTrue(html.contains("No cautions were supplied"));
    }

    @Test
    void containsEveryPositionInTheTableAndAsASection() {
        for (PositionResult p : MIXED.positions()) {
            assertTrue(HTML.contains("<a href=\"#pos-" + p.id() + "\">" + p.id() + "</a>"), "table row " + p.id());
            assertTrue(HTML.contains("<section class=\"position\" id=\"pos-" + p.id() + "\">"), "section " + p.id());
        }
        assertTrue(HTML.contains("verdict-runaway\">RUNAWAY</span>"), "overall verdict");
    }

    @Test
    void selfContainedWithoutScriptsOrExternalResources() {
        assertFalse(HTML.contains("<script"), "script element");
        assertFalse(HTML.toLowerCase(Locale.ROOT).contains("http"),
                "a URL in a page whose user text has none");
        for (String forbidden : List.of("<link", "<img", "<iframe", "<object", "<embed", "src=", "@import",
                "@font-face", "javascript:")) {
            assertFalse(HTML.contains(forbidden), forbidden);
        }
        // The inline SVG clips through url(#id) references to its own definitions; nothing else may use url().
        Matcher url = Pattern.compile("url\\((?!#)").matcher(HTML);
        assertFalse(url.find(), "url() to something outside the page");
        assertTrue(HTML.contains("url(#D1-margin-"), "clip references keep the chart's prefix");
        assertOnlyInternalLinks(HTML);
    }

    @Test
    void inlinesEveryChartOnce() {
        assertEquals(CHARTS.size(), count(HTML, "<svg"));
        for (RenderedChart c : CHARTS) {
            assertEquals(1, count(HTML, "<code>" + c.svgFileName() + "</code>"), c.baseName());
        }
    }

    @Test
    void formatsNumbersForHumans() {
        PositionAtAmbient d1 = MIXED.atMaximumAmbient().positions().get(0);
        double tjK = d1.hottest().orElseThrow().point().orElseThrow().tjK();
        assertTrue(HTML.contains("<td class=\"num\">" + HtmlFormat.temperature(tjK) + "</td>"), "hottest Tj");
        assertTrue(HtmlFormat.temperature(tjK).matches("-?\\d+\\.\\d °C"), HtmlFormat.temperature(tjK));
        assertTrue(HTML.contains("0.0 °C … 85.0 °C in 10 steps"), "ambient range");
        assertTrue(HTML.contains("10.8 V … 13.2 V (nominal 12.0 V)"), "supply range with SI display");
        assertTrue(HTML.contains("mV/V"), "line regulation");
        assertFalse(HTML.contains("NaN") || HTML.contains("Infinity"), "a raw non-finite number");
    }

    @Test
    void showsRunawayOnsetAndRunawayCorners() {
        double onsetK = MIXED.positions().get(2).runaway().orElseThrow().ambientK();
        assertTrue(HTML.contains("Thermal runaway begins at an ambient of " + HtmlFormat.temperature(onsetK)));
        assertTrue(HTML.contains("<strong>runaway</strong> — Thermal runaway: no operating point up to"));
        assertTrue(HTML.contains("runaway (taken at the search cap, "), "a runaway corner's actual is not a Tj");
        assertTrue(HTML.contains("(runaway)</td>"), "the verdict table flags a runaway position's margin");
    }

    @Test
    void showsPolicyProvenanceAndInputDigests() {
        assertTrue(HTML.contains("Policy: built-in minimum"));
        assertTrue(HTML.contains("absolute maximum rating of the part"), "rule provenance");
        assertTrue(HTML.contains("<td class=\"num\">≤ Tj max &#61; "), "part-dependent limit with its value");
        for (ReportInputs.InputDigest d : INPUTS) {
            assertTrue(HTML.contains("<tr><td>" + d.path() + "</td><td class=\"hash\">" + d.sha256() + "</td></tr>"),
                    d.path());
        }
        assertTrue(HTML.contains("tjmargin 0.1.0-test"));
    }

    @Test
    void flagsEstimatedValues() {
        assertTrue(HTML.contains("<li>Rθja from a rule of thumb</li>"));
        assertTrue(HTML.contains("<li>leakage doubling interval: common practice</li>"));
    }

    @Test
    void aPositionFailingEverywhereHasNoMaximumAmbient() {
        AnalysisResult r = ReportFixtures.hopeless("Hopeless board");
        assertEquals(MaximumAmbient.Status.NONE, r.positions().get(0).maxAmbient().status());
        String html = HtmlReport.render(r, List.of(), List.of(), "0.1.0", ChartSet.render(r));
        assertTrue(html.contains("none (fails at every ambient searched)"));
        assertTrue(html.contains("Enclosure air: a sealed box of "), "sealed-box assumption");
        assertTrue(html.contains("Load resistance RL"), "resistive load");
        assertTrue(html.contains("no rating left here (0 W allowed)"), "a zero rating is not shown as a ratio");
        assertTrue(html.contains("verdict-fail\">FAIL</span>"));
        assertEquals(4, count(html, "<svg"));
    }

    @Test
    void sameInputsGiveTheSamePage() {
        assertEquals(HTML, HtmlReport.render(MIXED, CAUTIONS, INPUTS, "0.1.0-test", CHARTS));
    }

    private static void assertOnlyInternalLinks(String html) {
        Matcher m = Pattern.compile("href=\"([^\"]*)\"").matcher(html);
        int links = 0;
        while (m.find()) {
            links++;
            assertTrue(m.group(1).startsWith("#"), "external link " + m.group(1));
        }
        assertTrue(links > 0, "the verdict table links to the sections");
    }

    private static int count(String s, String part) {
        int n = 0;
        for (int i = s.indexOf(part); i >= 0; i = s.indexOf(part, i + part.length())) {
            n++;
        }
        return n;
    }
}
