package org.tjmargin.report;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import org.tjmargin.solve.AnalysisResult;
import org.tjmargin.solve.OperatingPoint;
import org.tjmargin.solve.PositionAtAmbient;
import org.tjmargin.solve.PositionResult;
import org.tjmargin.solve.RunawayOnset;
import org.tjmargin.solve.PositionSpec;
import org.tjmargin.solve.Verdict;
import org.tjmargin.units.Dimension;
import org.tjmargin.units.Quantities;
import org.tjmargin.variation.statistical.MonteCarloResult;
import org.tjmargin.variation.statistical.PositionStatistics;
import org.tjmargin.variation.statistical.RssOutcome;
import org.tjmargin.variation.statistical.StatisticsResult;

/**
 * The terminal summary: one row per position with its verdict, the hottest corner at the design's highest ambient
 * (junction temperature, diode power, output voltage), the least diode current anywhere in the sweep, the maximum
 * ambient and the limiting rule; then notes on estimated values and the cautions. On a large board only the
 * detailed positions ({@link ReportDetail}) get rows; one line counts the rest.
 */
public final class SummaryTable {

    private static final String[] HEADER = {"position", "circuit", "verdict", "Tj hot", "P diode", "Vout",
        "min Iz", "max ambient", "limiting rule", "margin"};

    private SummaryTable() {
    }

    /** Renders the summary as plain text (UTF-8, fixed-width columns). */
    public static String render(AnalysisResult r, List<String> cautions) {
        return render(r, Optional.empty(), cautions);
    }

    /** As above, with a statistics table after the corner table when there are statistics. */
    public static String render(AnalysisResult r, Optional<StatisticsResult> stats, List<String> cautions) {
        return render(r, stats, cautions, ReportDetail.all(r));
    }

    /**
     * As above, with rows for the detailed positions only (in board order) and one line counting the others by
     * verdict with their least margin, so that a board of a thousand positions still reads on a terminal. Notes that
     * several positions share are printed once, with the first few identifiers and a count.
     */
    public static String render(AnalysisResult r, Optional<StatisticsResult> stats, List<String> cautions,
                                ReportDetail detail) {
        List<String[]> rows = new ArrayList<>();
        rows.add(HEADER);
        for (int i : detail.indices()) {
            rows.add(row(r, i));
        }
        StringBuilder sb = new StringBuilder();
        sb.append(r.board().name()).append(" — policy: ").append(r.policy().name()).append(", ambient ")
                .append(String.format(Locale.ROOT, "%.1f … %.1f °C", Labels.celsius(r.board().ambient().minK()),
                        Labels.celsius(r.board().ambient().maxK())))
                .append(", design verdict ").append(r.verdict()).append('\n');
        table(sb, rows);
        if (detail.omitted() > 0) {
            sb.append(omitted(r, detail)).append('\n');
        }
        sb.append("(Tj hot, P diode, Vout: hottest corner at the highest ambient; min Iz: least diode current over the "
                + "sweep)\n");
        stats.ifPresent(st -> statistics(sb, st));
        Map<String, List<String>> notes = new LinkedHashMap<>();
        for (PositionResult pr : r.positions()) {
            for (String n : pr.notes()) {
                notes.computeIfAbsent(n, k -> new ArrayList<>()).add(pr.id());
            }
        }
        for (Map.Entry<String, List<String>> n : notes.entrySet()) {
            sb.append("note ").append(Labels.ids(n.getValue(), NOTE_IDS)).append(": ").append(n.getKey()).append('\n');
        }
        int runawayOmitted = 0;
        r.enclosureRunaway().ifPresent(e -> sb.append("note: ").append(RunawayText.enclosure(e, NOTE_IDS))
                .append('\n'));
        for (int i = 0; i < r.positions().size(); i++) {
            PositionResult pr = r.positions().get(i);
            // A position that only runs away with the enclosure air is in the note above.
            if (pr.runaway().isEmpty() || pr.runaway().get().cause() == RunawayOnset.Cause.ENCLOSURE) {
                continue;
            }
            if (!detail.isDetailed(i)) {
                runawayOmitted++;
                continue;
            }
            sb.append("note ").append(pr.id()).append(": ").append(RunawayText.onset(pr.runaway().get()))
                    .append('\n');
        }
        if (runawayOmitted > 0) {
            sb.append("note: thermal runaway begins within or near the range for ").append(runawayOmitted)
                    .append(" positions not listed above (onsets in report.html and results.json)\n");
        }
        for (String c : cautions) {
            sb.append("CAUTION: ").append(c).append('\n');
        }
        return sb.toString();
    }

    private static final String[] STATS_HEADER = {"position", "P(violation), 95 % interval", "samples",
        "Tj mean ± σ", "margin mean ± σ", "RSS: Tj ± σ", "corners: Tj", "strongest input"};

    /** The statistics at the highest ambient, one row per position. */
    private static void statistics(StringBuilder sb, StatisticsResult st) {
        List<String[]> rows = new ArrayList<>();
        rows.add(STATS_HEADER);
        double ambient = Double.NaN;
        for (PositionStatistics p : st.positions()) {
            ambient = p.ambientK();
            MonteCarloResult mc = p.monteCarlo();
            var v = mc.violation();
            String rss = p.rss() instanceof RssOutcome.Spread sp
                    ? String.format(Locale.ROOT, "%.1f °C ± %.2g K", Labels.celsius(sp.nominalTjK()), sp.tjSigmaK())
                    : "unresolved";
            String corners = Double.isNaN(p.corners().tjMaxK()) ? "-" : String.format(Locale.ROOT,
                    "%.1f … %.1f °C", Labels.celsius(p.corners().tjMinK()), Labels.celsius(p.corners().tjMaxK()));
            // No input moves the margin (e.g. every point runs away): none is the strongest.
            String top = p.tornado().bars().isEmpty() || !(p.tornado().bars().get(0).swing() > 0) ? "-"
                    : p.tornado().bars().get(0).axis().label();
            rows.add(new String[] {p.positionId(), String.format(Locale.ROOT, "%s [%s, %s]",
                StatisticsFormat.probability(v.estimate()), StatisticsFormat.probability(v.lower()),
                StatisticsFormat.probability(v.upper())),
                mc.settings().samples() + (p.surgesIncluded() ? " (surges)" : ""),
                mc.tj().count() == 0 ? "-" : String.format(Locale.ROOT, "%.1f °C ± %.2g K",
                        Labels.celsius(mc.tj().mean()), mc.tj().standardDeviation()),
                mc.margin().count() == 0 ? "-" : String.format(Locale.ROOT, "%.1f %% ± %.2g %%",
                        100 * mc.margin().mean(), 100 * mc.margin().standardDeviation()),
                rss, corners, top});
        }
        sb.append('\n').append(String.format(Locale.ROOT, "statistics at %.1f °C ambient (seed %d; yield curve "
                + "and histograms in the report):", Labels.celsius(ambient), st.plan().settings().seed()))
                .append('\n');
        table(sb, rows);
    }

    /** Identifiers printed with a shared note before the rest are counted. */
    static final int NOTE_IDS = 5;

    /** The line that stands for the positions not listed: how many, by verdict, and the least margin among them. */
    private static String omitted(AnalysisResult r, ReportDetail detail) {
        Map<Verdict, Integer> byVerdict = new EnumMap<>(Verdict.class);
        double least = Double.POSITIVE_INFINITY;
        String leastId = "";
        for (int i = 0; i < r.positions().size(); i++) {
            if (detail.isDetailed(i)) {
                continue;
            }
            PositionResult pr = r.positions().get(i);
            byVerdict.merge(pr.verdict(), 1, Integer::sum);
            if (pr.worstMargin() < least) {
                least = pr.worstMargin();
                leastId = pr.id();
            }
        }
        List<String> parts = new ArrayList<>();
        for (Verdict v : Verdict.values()) {
            if (byVerdict.containsKey(v)) {
                parts.add(byVerdict.get(v) + " " + v.name());
            }
        }
        return String.format(Locale.ROOT, "… and %d more positions (%s; least margin %.1f %%, %s), every one in "
                + "report.html, results.json and sweep.csv; --detail N lists more", detail.omitted(),
                String.join(", ", parts), 100 * least, leastId);
    }

    private static void table(StringBuilder sb, List<String[]> rows) {
        int[] w = new int[rows.get(0).length];
        for (String[] row : rows) {
            for (int c = 0; c < row.length; c++) {
                w[c] = Math.max(w[c], row[c].codePointCount(0, row[c].length()));
            }
        }
        for (int k = 0; k < rows.size(); k++) {
            String[] row = rows.get(k);
            for (int c = 0; c < row.length; c++) {
                sb.append(pad(row[c], w[c])).append(c + 1 < row.length ? "  " : "");
            }
            sb.append('\n');
            if (k == 0) {
                for (int c = 0; c < row.length; c++) {
                    sb.append("-".repeat(w[c])).append(c + 1 < row.length ? "  " : "");
                }
                sb.append('\n');
            }
        }
    }

    private static String[] row(AnalysisResult r, int i) {
        PositionResult pr = r.positions().get(i);
        PositionSpec spec = r.board().positions().get(i);
        PositionAtAmbient top = r.atMaximumAmbient().positions().get(i);
        OperatingPoint hot = top.hottest().flatMap(c -> c.point()).orElse(null);
        double minIz = Double.POSITIVE_INFINITY;
        for (var b : r.sweep()) {
            var lc = b.positions().get(i).leastCurrent().flatMap(c -> c.point());
            if (lc.isPresent()) {
                minIz = Math.min(minIz, lc.get().circuit().diodeCurrentA());
            }
        }
        String tj = hot == null ? (top.status().name().toLowerCase(Locale.ROOT)) : Quantities.format(hot.tjK(),
                Dimension.TEMPERATURE);
        return new String[] {pr.id(), Labels.circuitKind(spec.circuit()), pr.verdict().name(), tj,
            hot == null ? "-" : Quantities.format(hot.diodePowerW(), Dimension.POWER),
            hot == null ? "-" : Quantities.format(hot.circuit().voltageV(), Dimension.VOLTAGE),
            Double.isInfinite(minIz) ? "-" : Quantities.format(minIz, Dimension.CURRENT),
            Labels.maxAmbient(pr.maxAmbient()), pr.limitingRuleId(),
            // A runaway position's margin comes from the search cap, and says so (as in the report).
            Labels.marginPercent(pr.worstMargin(), f -> String.format(Locale.ROOT, "%.1f %%", 100 * f))
                    + (pr.verdict() == Verdict.RUNAWAY ? " (runaway)" : "")};
    }

    private static String pad(String s, int w) {
        int n = s.codePointCount(0, s.length());
        return s + " ".repeat(Math.max(0, w - n));
    }
}
