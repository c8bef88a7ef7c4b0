package org.tjmargin.report;

import com.github.mustachejava.DefaultMustacheFactory;
import com.github.mustachejava.Mustache;
import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.regex.Pattern;
import org.tjmargin.derating.Bound;
import org.tjmargin.derating.Rule;
import org.tjmargin.solve.AnalysisResult;
import org.tjmargin.solve.BoardAtAmbient;
import org.tjmargin.solve.Verdict;
import org.tjmargin.thermal.Enclosure;
import org.tjmargin.units.Dimension;
import org.tjmargin.variation.statistical.PositionStatistics;
import org.tjmargin.variation.statistical.StatisticsResult;

/**
 * The review report: one self-contained HTML page (inline CSS and inline SVG charts; no script, no external file, no
 * web font) that a design reviewer reads from top to bottom: the verdict, a table of every position, a section per
 * position (inputs, estimates, assumptions, operating points at every corner at the design's highest ambient, the
 * margin of every rule, regulation, runaway, charts and, with statistics, the statistical spread), the policy, the
 * safety cautions, and the provenance of the inputs.
 *
 * <p>Text comes from the Mustache templates in {@code src/main/resources/org/tjmargin/report/}; every value is
 * HTML-escaped by the template engine ({@code {{value}}}), except the SVG of the charts, which this tool drew itself
 * (JFreeSVG escapes the text inside). The page carries no date, so the same inputs give the same bytes.
 *
 * <p>Thread-safe: the compiled template is shared and read-only.
 */
public final class HtmlReport {

    private static final String TEMPLATE_ROOT = "org/tjmargin/report";
    private static final String TEMPLATE = "report.mustache";

    /** Namespace declarations on the SVG root: needed in a file, not inline in HTML, where they are the only URLs. */
    private static final Pattern SVG_NAMESPACES = Pattern.compile("\\s+xmlns(?::[A-Za-z]+)?='[^']*'");

    private HtmlReport() {
    }

    /** Compiles the template now rather than at the first report (see {@link RenderingWarmUp}). */
    static void compileTemplate() {
        Objects.requireNonNull(Template.PAGE);
    }

    /** Compiled once, on first use (initialisation-on-demand holder). */
    private static final class Template {
        static final Mustache PAGE = new DefaultMustacheFactory(TEMPLATE_ROOT).compile(TEMPLATE);
    }

    /**
     * Renders the report.
     *
     * @param result      the analysis
     * @param cautions    safety cautions to print, in order (plain text)
     * @param inputs      every input file with its SHA-256
     * @param toolVersion the tool's version
     * @param charts      the charts to place inline, as {@link ChartSet#render} made them (matched by name; a chart
     *                    not found is left out)
     * @return the page, UTF-8 text
     */
    public static String render(AnalysisResult result, List<String> cautions, List<ReportInputs.InputDigest> inputs,
                                String toolVersion, List<RenderedChart> charts) {
        return render(result, new ReportInputs(toolVersion, cautions, inputs), charts);
    }

    /** Renders the report; see {@link #render(AnalysisResult, List, List, String, List)}. */
    public static String render(AnalysisResult result, ReportInputs inputs, List<RenderedChart> charts) {
        return render(result, Optional.empty(), inputs, charts, ReportDetail.all(result));
    }

    /**
     * Renders the report with its statistics, when given: a "Statistical spread" block in the section of every
     * position they cover (the three methods side by side, per-rule probabilities, inputs, ranking and the
     * statistics charts of {@link ChartSet#render(AnalysisResult, Optional)}), and a statistics line in the verdict
     * area. Without statistics the page is the one of {@link #render(AnalysisResult, ReportInputs, List)}.
     */
    public static String render(AnalysisResult result, Optional<StatisticsResult> stats, ReportInputs inputs,
                                List<RenderedChart> charts) {
        return render(result, stats, inputs, charts, ReportDetail.all(result));
    }

    /**
     * Renders the report, with its statistics when given, and a section for each detailed position only; every
     * position keeps its row in the verdict table, and the page says which positions are detailed and where the
     * others are.
     */
    public static String render(AnalysisResult result, Optional<StatisticsResult> stats, ReportInputs inputs,
                                List<RenderedChart> charts, ReportDetail detail) {
        Objects.requireNonNull(result, "result");
        Objects.requireNonNull(stats, "stats");
        Objects.requireNonNull(inputs, "inputs");
        Objects.requireNonNull(detail, "detail");
        StringWriter out = new StringWriter(256 * 1024);
        try {
            Template.PAGE.execute(out, page(result, stats, inputs, charts, detail)).flush();
        } catch (IOException e) {
            // A StringWriter never fails; an IOException here comes from a broken template engine.
            throw new UncheckedIOException("rendering the HTML report failed", e);
        }
        return out.toString();
    }

    static HtmlView.Page page(AnalysisResult result, ReportInputs inputs, List<RenderedChart> charts) {
        return page(result, Optional.empty(), inputs, charts, ReportDetail.all(result));
    }

    static HtmlView.Page page(AnalysisResult result, Optional<StatisticsResult> stats, ReportInputs inputs,
                              List<RenderedChart> charts, ReportDetail detail) {
        Map<String, RenderedChart> byName = new HashMap<>();
        for (RenderedChart c : charts) {
            byName.put(c.baseName(), c);
        }
        List<String> stems = ChartNames.stems(result);
        List<HtmlView.SummaryRow> summary = new ArrayList<>();
        List<HtmlView.Position> positions = new ArrayList<>();
        List<String> anchors = new ArrayList<>();
        for (int i = 0; i < result.positions().size(); i++) {
            HtmlPositionView v = new HtmlPositionView(result, i, stems.get(i));
            summary.add(v.summaryRow(detail.isDetailed(i)));
            if (!detail.isDetailed(i)) {
                anchors.add(null);
                continue;
            }
            List<HtmlView.Chart> inline = new ArrayList<>();
            for (ChartKind kind : ChartSet.kindsFor(result, i)) {
                RenderedChart c = byName.get(ChartNames.baseName(stems.get(i), kind));
                if (c != null) {
                    inline.add(new HtmlView.Chart(kind.caption(), inlineSvg(c.svg()), c.svgFileName()));
                }
            }
            anchors.add(v.anchor());
            positions.add(v.section(inline, statistics(result, stats, i, v.anchor(), stems.get(i), byName)));
        }
        List<HtmlView.Input> files = inputs.inputs().stream()
                .map(d -> new HtmlView.Input(d.path(), d.sha256())).toList();
        String designMax = HtmlFormat.temperature(result.atMaximumAmbient().ambientK());
        return new HtmlView.Page(result.board().name(), inputs.toolVersion(),
                HtmlPositionView.badge(result.verdict()), verdictText(result), designFacts(result), summary,
                designMax, emptyToNull(detail.note("in the table above (without a section), in results.json and at "
                        + "every ambient in sweep.csv")), positions, policy(result), inputs.cautions(), files, colours(),
                stats.flatMap(st -> HtmlStatisticsView.summary(result, st, anchors)).orElse(null));
    }

    private static String emptyToNull(String s) {
        return s.isEmpty() ? null : s;
    }

    /** A position's statistical spread with its charts, or {@code null} when {@code stats} does not cover it. */
    private static HtmlView.Statistics statistics(AnalysisResult result, Optional<StatisticsResult> stats, int index,
                                                  String anchor, String stem, Map<String, RenderedChart> byName) {
        Optional<PositionStatistics> ps = ChartSet.statisticsOf(result, stats, index);
        if (ps.isEmpty()) {
            return null;
        }
        List<HtmlView.Chart> inline = new ArrayList<>();
        for (ChartKind kind : ChartKind.STATISTICAL) {
            RenderedChart c = byName.get(ChartNames.baseName(stem, kind));
            if (c != null) {
                inline.add(new HtmlView.Chart(kind.caption(), inlineSvg(c.svg()), c.svgFileName()));
            }
        }
        return HtmlStatisticsView.of(result, index, ps.get(), anchor, inline);
    }

    /** The SVG for inline use: without its namespace declarations, which HTML does not need. */
    static String inlineSvg(String svg) {
        int end = svg.indexOf('>');
        if (!svg.startsWith("<svg") || end < 0) {
            return svg;
        }
        return SVG_NAMESPACES.matcher(svg.substring(0, end)).replaceAll("") + svg.substring(end);
    }

    private static String verdictText(AnalysisResult r) {
        long failing = r.positions().stream().filter(p -> p.verdict() != Verdict.PASS).count();
        int n = r.positions().size();
        return switch (r.verdict()) {
            case PASS -> "Every rule of the policy holds at every corner of all " + n + " position"
                    + (n == 1 ? "" : "s") + " over the whole ambient range.";
            case FAIL -> failing + " of " + n + " positions violate a rule of the policy within the ambient range.";
            case RUNAWAY -> failing + " of " + n + " positions fail; at least one runs away thermally within the "
                    + "ambient range.";
            case UNRESOLVED -> "At least one operating point did not converge: the tool cannot stand behind this "
                    + "result.";
        };
    }

    private static List<HtmlView.Fact> designFacts(AnalysisResult r) {
        BoardAtAmbient first = r.sweep().get(0);
        BoardAtAmbient last = r.atMaximumAmbient();
        List<HtmlView.Fact> f = new ArrayList<>();
        f.add(new HtmlView.Fact("Ambient range", HtmlFormat.temperature(first.ambientK()) + " … "
                + HtmlFormat.temperature(last.ambientK()) + " in " + r.sweep().size() + " steps"));
        Enclosure e = r.board().enclosure();
        f.add(new HtmlView.Fact("Enclosure", e instanceof Enclosure.FixedRise fr
                ? "given rise " + HtmlFormat.kelvinDifference(fr.riseK())
                : !last.airBalanced() ? "sealed box; " + r.enclosureRunaway().map(x -> RunawayText.enclosure(x,
                        SummaryTable.NOTE_IDS, HtmlFormat::temperature)).orElse("the air has no steady state at "
                        + HtmlFormat.temperature(last.ambientK()))
                : "sealed box, rise " + HtmlFormat.kelvinDifference(last.enclosureRiseK()) + " at "
                        + HtmlFormat.temperature(last.ambientK()) + " for a board heat of "
                        + HtmlFormat.si(last.boardHeatW(), Dimension.POWER)));
        f.add(new HtmlView.Fact("Positions", Integer.toString(r.positions().size())));
        f.add(new HtmlView.Fact("Policy", r.policy().name()));
        return f;
    }

    private static HtmlView.Policy policy(AnalysisResult r) {
        List<HtmlView.RuleRow> rows = new ArrayList<>();
        for (Rule rule : r.policy().rules()) {
            rows.add(new HtmlView.RuleRow(rule.id(), rule.title(), rule.measure().description(),
                    rule.bound() == Bound.MAX ? "at most" : "at least", HtmlFormat.limit(rule.limit(), rule.measure()),
                    rule.provenance().isBlank() ? HtmlFormat.NONE : rule.provenance()));
        }
        return new HtmlView.Policy(r.policy().name(), r.policy().provenance(), rows);
    }

    /** The palette as CSS custom properties, so the page and the charts share one source of colour. */
    private static List<HtmlView.Fact> colours() {
        return List.of(
                new HtmlView.Fact("paper", Palette.css(Palette.PAPER)),
                new HtmlView.Fact("sheet", Palette.css(Palette.SHEET)),
                new HtmlView.Fact("ink", Palette.css(Palette.INK)),
                new HtmlView.Fact("ink-soft", Palette.css(Palette.INK_SOFT)),
                new HtmlView.Fact("grid", Palette.css(Palette.GRID)),
                new HtmlView.Fact("rule", Palette.css(Palette.RULE)),
                new HtmlView.Fact("accent", Palette.css(Palette.ACCENT)),
                new HtmlView.Fact("pass", Palette.css(Palette.VERDICT_PASS)),
                new HtmlView.Fact("fail", Palette.css(Palette.VERDICT_FAIL)),
                new HtmlView.Fact("runaway", Palette.css(Palette.VERDICT_RUNAWAY)),
                new HtmlView.Fact("unresolved", Palette.css(Palette.VERDICT_UNRESOLVED)));
    }
}
