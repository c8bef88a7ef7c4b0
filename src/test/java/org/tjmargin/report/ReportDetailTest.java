package org.tjmargin.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.tjmargin.solve.AnalysisResult;
import org.tjmargin.solve.PositionResult;
import org.tjmargin.solve.Verdict;

/** Which positions are detailed: worst verdict first, then least margin, then board order. */
class ReportDetailTest {

    @Test
    void worstVerdictComesFirstThenLeastMargin() {
        AnalysisResult r = ReportFixtures.mixed("detail");
        List<PositionResult> ps = r.positions();
        int worst = 0;
        for (int i = 1; i < ps.size(); i++) {
            PositionResult a = ps.get(i);
            PositionResult b = ps.get(worst);
            if (a.verdict().ordinal() > b.verdict().ordinal()
                    || (a.verdict() == b.verdict() && a.worstMargin() < b.worstMargin())) {
                worst = i;
            }
        }
        assertEquals(Verdict.RUNAWAY, ps.get(worst).verdict(), "the fixture's clamp runs away in the hot end");
        ReportDetail one = ReportDetail.leastMargin(r, 1);
        assertEquals(List.of(worst), one.indices());
        assertEquals(ps.size() - 1, one.omitted());
        assertTrue(one.note("elsewhere").contains("The other " + (ps.size() - 1) + " are elsewhere"));
        assertEquals(0, ReportDetail.leastMargin(r, 0).count());
        assertEquals(ps.size(), ReportDetail.leastMargin(r, 1000).count());
        assertEquals("", ReportDetail.all(r).note("elsewhere"), "nothing to say when every position is detailed");
        assertThrows(IllegalArgumentException.class, () -> ReportDetail.leastMargin(r, -1));
    }

    @Test
    void tableListsOnlyTheDetailedAndCountsTheRest() {
        AnalysisResult r = ReportFixtures.mixed("detail");
        ReportDetail one = ReportDetail.leastMargin(r, 1);
        String table = SummaryTable.render(r, java.util.Optional.empty(), List.of(), one);
        String shown = r.positions().get(one.indices().get(0)).id();
        assertTrue(table.contains("\n" + shown + " "), table);
        for (int i = 0; i < r.positions().size(); i++) {
            if (!one.isDetailed(i)) {
                assertTrue(!table.contains("\n" + r.positions().get(i).id() + " "), table);
            }
        }
        assertTrue(table.contains("… and " + (r.positions().size() - 1) + " more positions"), table);
    }
}
