package org.tjmargin.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;
import java.util.stream.IntStream;
import org.junit.jupiter.api.Test;
import org.tjmargin.thermal.Enclosure;

/**
 * The corner analysis tells its progress (the command line's progress bar reads it): every ambient of the sweep
 * once, then every position's searches once, with the totals; and telling changes nothing in the result.
 * A contract of this project's own, checked on seeded random boards.
 */
class AnalysisProgressTest {

    /** Records what the analysis reports, from any thread. */
    private static final class Recorder implements AnalysisProgress {
        final List<Integer> ambients = Collections.synchronizedList(new ArrayList<>());
        final List<Integer> positions = Collections.synchronizedList(new ArrayList<>());
        volatile int ambientTotal;
        volatile int positionTotal;
        /** Whether a position's search was reported before the sweep had finished. */
        volatile boolean searchBeforeSweepEnded;

        @Override
        public void ambientsSwept(int done, int total) {
            ambients.add(done);
            ambientTotal = total;
        }

        @Override
        public void positionsSearched(int done, int total) {
            if (ambients.size() < ambientTotal || ambientTotal == 0) {
                searchBeforeSweepEnded = true;
            }
            positions.add(done);
            positionTotal = total;
        }
    }

    @Test
    void aSealedBoxReportsEachAmbientInOrderThenEachPositionOnce() {
        Random rnd = new Random(20_261_202L);
        for (int n = 0; n < 6; n++) {
            Board board = RandomCoupledBoards.draw(rnd, "progress board " + n);
            check(board);
        }
    }

    @Test
    void independentAmbientsReportEachAmbientOnceThoughNotInOrder() {
        Random rnd = new Random(20_261_203L);
        for (int n = 0; n < 6; n++) {
            Board coupled = RandomCoupledBoards.draw(rnd, "progress board " + n);
            Board fixed = new Board(coupled.name(), coupled.positions(), new Enclosure.FixedRise(5.0),
                    coupled.ambient());
            check(fixed);
        }
    }

    private static void check(Board board) {
        Recorder rec = new Recorder();
        AnalysisResult told = Analysis.run(board, RandomCoupledBoards.POLICY, SolverSettings.DEFAULT, rec);
        AnalysisResult quiet = Analysis.run(board, RandomCoupledBoards.POLICY, SolverSettings.DEFAULT);
        int a = board.ambient().points();
        int p = board.positions().size();
        String where = board.name() + (board.enclosure().couplesPositions() ? " (sealed box)" : " (fixed rise)");
        assertEquals(a, rec.ambientTotal, where);
        assertEquals(p, rec.positionTotal, where);
        List<Integer> ambients = new ArrayList<>(rec.ambients);
        if (!board.enclosure().couplesPositions()) {
            Collections.sort(ambients);
        }
        // The counts 1 … total, each once (in order for the sweep by continuation, which runs ambient by ambient).
        assertEquals(IntStream.rangeClosed(1, a).boxed().toList(), ambients, where);
        List<Integer> positions = new ArrayList<>(rec.positions);
        Collections.sort(positions);
        assertEquals(IntStream.rangeClosed(1, p).boxed().toList(), positions, where);
        assertEquals(false, rec.searchBeforeSweepEnded, where + ": the searches come after the sweep");
        // Telling changes nothing.
        for (int i = 0; i < p; i++) {
            PositionResult x = told.positions().get(i);
            PositionResult y = quiet.positions().get(i);
            assertEquals(y.verdict(), x.verdict(), where);
            assertEquals(y.worstMargin(), x.worstMargin(), 0.0, where);
            assertEquals(y.maxAmbient(), x.maxAmbient(), where);
        }
        for (int k = 0; k < a; k++) {
            assertEquals(quiet.sweep().get(k).enclosureRiseK(), told.sweep().get(k).enclosureRiseK(), 0.0, where);
        }
    }
}
