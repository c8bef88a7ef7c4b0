package org.tjmargin.report;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.Comparator;
import java.util.List;
import org.tjmargin.solve.AnalysisResult;
import org.tjmargin.solve.PositionResult;

/**
 * Which positions the outputs show in detail: their sections and charts in the report, their rows in the terminal
 * table, their every-ambient points and corners in {@code results.json}. A board of a thousand positions cannot carry
 * five thousand charts; the reviewer needs the positions closest to failing, so those are the ones detailed: the
 * {@code limit} positions of least margin, failing, runaway and unresolved ones first (worst verdict first, then
 * least worst margin, then board order). Every position, detailed or not, stays in the report's summary table, in
 * {@code results.json} with its verdict, margin, limiting rule and maximum ambient, and in {@code sweep.csv} at every
 * ambient.
 *
 * <p>Immutable.
 */
public final class ReportDetail {

    /**
     * Positions detailed when the command line does not say (25): a report of 25 sections and about a hundred
     * charts still opens quickly and prints in one go, and the demo's four positions are all detailed.
     */
    public static final int DEFAULT_LIMIT = 25;

    private final int limit;
    private final int positions;
    private final BitSet detailed;

    private ReportDetail(int limit, int positions, BitSet detailed) {
        this.limit = limit;
        this.positions = positions;
        this.detailed = detailed;
    }

    /** Every position detailed. */
    public static ReportDetail all(AnalysisResult r) {
        BitSet all = new BitSet();
        all.set(0, r.positions().size());
        return new ReportDetail(r.positions().size(), r.positions().size(), all);
    }

    /**
     * The {@code limit} positions of least margin, failing, runaway and unresolved first.
     *
     * @param limit how many, ≥ 0
     */
    public static ReportDetail leastMargin(AnalysisResult r, int limit) {
        if (limit < 0) {
            throw new IllegalArgumentException("the number of detailed positions must be ≥ 0, got " + limit);
        }
        List<PositionResult> ps = r.positions();
        List<Integer> order = new ArrayList<>(ps.size());
        for (int i = 0; i < ps.size(); i++) {
            order.add(i);
        }
        order.sort(Comparator.<Integer>comparingInt(i -> -ps.get(i).verdict().ordinal())
                .thenComparingDouble(i -> ps.get(i).worstMargin())
                .thenComparingInt(i -> i));
        BitSet chosen = new BitSet();
        for (int k = 0; k < Math.min(limit, order.size()); k++) {
            chosen.set(order.get(k));
        }
        return new ReportDetail(limit, ps.size(), chosen);
    }

    /** True when position {@code index} (board order) is detailed. */
    public boolean isDetailed(int index) {
        return detailed.get(index);
    }

    /** How many positions are detailed. */
    public int count() {
        return detailed.cardinality();
    }

    /** How many are not. */
    public int omitted() {
        return positions - count();
    }

    /** The limit asked for. */
    public int limit() {
        return limit;
    }

    /** The detailed positions' indices, in board order. */
    public List<Integer> indices() {
        return detailed.stream().boxed().toList();
    }

    /**
     * One sentence saying which positions are detailed and where the rest are; empty when every position is.
     *
     * @param where what the reader finds where, e.g. "in the table above, in results.json and in sweep.csv"
     */
    public String note(String where) {
        if (omitted() == 0) {
            return "";
        }
        return "Detailed: the " + count() + " position" + (count() == 1 ? "" : "s") + " of least margin (failing, "
                + "runaway and unresolved first; --detail sets how many). The other " + omitted() + " are " + where
                + ".";
    }
}
