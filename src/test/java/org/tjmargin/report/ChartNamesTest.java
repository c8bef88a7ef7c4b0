package org.tjmargin.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.tjmargin.derating.Policy;
import org.tjmargin.solve.Analysis;
import org.tjmargin.solve.AnalysisResult;
import org.tjmargin.solve.SolverSettings;

/** Chart file names: only [A-Za-z0-9_-], never empty, unique on a case-insensitive file system. */
class ChartNamesTest {

    @Test
    void keepsSafeIdentifiers() {
        assertEquals("D1", ChartNames.sanitise("D1"));
        assertEquals("U3_D-2", ChartNames.sanitise("U3_D-2"));
    }

    @Test
    void replacesEverythingElse() {
        assertEquals("___etc_passwd", ChartNames.sanitise("../etc/passwd"));
        assertEquals("D1_A", ChartNames.sanitise("D1 A"));
        assertEquals("R_1", ChartNames.sanitise("R\u00E91"));
        assertEquals("_", ChartNames.sanitise("\uD83D\uDD25"));
        assertEquals("position", ChartNames.sanitise(""));
        assertEquals(ChartNames.MAX_STEM, ChartNames.sanitise("x".repeat(500)).length());
    }

    @Test
    void safeNamesAreRecognised() {
        assertTrue(ChartNames.isSafe("D1-margin"));
        assertFalse(ChartNames.isSafe(""));
        assertFalse(ChartNames.isSafe("D1.margin"));
        assertFalse(ChartNames.isSafe("a/b"));
    }

    @Test
    void identifiersThatReduceAlikeGetDistinctStems() {
        AnalysisResult r = Analysis.run(ReportFixtures.board("clash", List.of(ReportFixtures.reference("D1/A"),
                ReportFixtures.reference("D1:A"), ReportFixtures.reference("d1_a"))), Policy.builtInMinimum(),
                SolverSettings.DEFAULT);
        assertEquals(List.of("D1_A", "D1_A-2", "d1_a-3"), ChartNames.stems(r));
    }
}
