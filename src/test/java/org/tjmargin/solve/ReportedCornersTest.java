package org.tjmargin.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.tjmargin.derating.Policy;
import org.tjmargin.design.DesignLoader;
import org.tjmargin.design.ProfileLoader;

/**
 * Below the design's highest ambient the sweep keeps only each position's reported corners
 * ({@link PositionAtAmbient#reportedOnly()}). Held against the full point the board solver gives at the same ambient
 * ({@link BoardSolver#solveAt}, every corner kept): the same hottest, least-current and worst-per-rule corners, the
 * same checks, and an envelope that spans every converged corner with each bound attained by one; and the
 * envelope's hottest junction is the hottest corner's (the hottest corner is chosen by junction temperature).
 */
class ReportedCornersTest {

    private static final Policy POLICY = ProfileLoader.shipped("general-commercial").policy().withBuiltInMinimum();

    @Test
    void theReportedCornersAreTheFullPointsReportedCorners() {
        Random rnd = new Random(20_261_203L);
        int compared = 0;
        int dropped = 0;
        for (int n = 0; n < 12; n++) {
            Board board = demoThenRandom(n, rnd);
            PreparedBoard prepared = PreparedBoard.of(board);
            double[] ambients = board.ambient().temperaturesK();
            for (double ta : new double[] {ambients[0], ambients[ambients.length / 2]}) {
                BoardAtAmbient full = BoardSolver.solveAt(prepared, POLICY, ta, SolverSettings.DEFAULT);
                BoardAtAmbient kept = full.reportedOnly();
                for (int i = 0; i < full.positions().size(); i++) {
                    PositionAtAmbient p = full.positions().get(i);
                    PositionAtAmbient q = kept.positions().get(i);
                    String at = "board " + n + " " + p.positionId() + " at " + ta;
                    assertTrue(p.keepsEveryCorner(), at);
                    assertEquals(p.cornerCount(), q.cornerCount(), at);
                    assertEquals(p.hottest(), q.hottest(), at);
                    assertEquals(p.leastCurrent(), q.leastCurrent(), at);
                    assertEquals(p.worst().size(), q.worst().size(), at);
                    for (int r = 0; r < p.worst().size(); r++) {
                        assertEquals(p.worst().get(r).check(), q.worst().get(r).check(), at);
                        assertEquals(p.corners().get(p.worst().get(r).cornerIndex()),
                                q.corners().get(q.worst().get(r).cornerIndex()), at);
                    }
                    assertEnvelopeSpans(p.corners(), q.envelope(), at);
                    assertEquals(p.margin(), q.margin(), at);
                    assertEquals(p.status(), q.status(), at);
                    q.hottest().flatMap(CornerPoint::point).ifPresent(
                            hot -> assertEquals(hot.tjK(), q.envelope().tjMaxK(), at));
                    dropped += p.corners().size() - q.corners().size();
                    compared++;
                }
            }
        }
        assertTrue(compared > 50, "only " + compared + " points compared");
        assertTrue(dropped > 100, "only " + dropped + " corners dropped: the test does not exercise the renumbering");
    }

    /** The demo first, then seeded random coupled boards. */
    private static Board demoThenRandom(int n, Random rnd) {
        return n == 0 ? DesignLoader.load(Path.of("demo/design.yaml")).board()
                : RandomCoupledBoards.draw(rnd, "board " + n);
    }

    /** Every converged corner lies within the envelope and each of its bounds is some corner's value. */
    private static void assertEnvelopeSpans(List<CornerPoint> corners, CornerEnvelope e, String at) {
        List<OperatingPoint> points = corners.stream().flatMap(c -> c.point().stream()).toList();
        assertEquals(!points.isEmpty(), e.any(), at);
        if (points.isEmpty()) {
            return;
        }
        for (OperatingPoint op : points) {
            assertTrue(op.tjK() >= e.tjMinK() && op.tjK() <= e.tjMaxK(), at);
            assertTrue(op.circuit().voltageV() >= e.outputMinV() && op.circuit().voltageV() <= e.outputMaxV(), at);
            assertTrue(op.circuit().resistorPowerW() <= e.resistorMaxW() && op.heatW() <= e.heatMaxW(), at);
        }
        assertTrue(points.stream().anyMatch(op -> op.tjK() == e.tjMinK()), at);
        assertTrue(points.stream().anyMatch(op -> op.tjK() == e.tjMaxK()), at);
        assertTrue(points.stream().anyMatch(op -> op.circuit().voltageV() == e.outputMinV()), at);
        assertTrue(points.stream().anyMatch(op -> op.circuit().voltageV() == e.outputMaxV()), at);
        assertTrue(points.stream().anyMatch(op -> op.circuit().resistorPowerW() == e.resistorMaxW()), at);
        assertTrue(points.stream().anyMatch(op -> op.heatW() == e.heatMaxW()), at);
    }

    /**
     * The point the sweep and the searches build with only its reported corners is, record for record, the full
     * point thinned out by {@link PositionAtAmbient#reportedOnly()}: same corners (with their loop gains), same
     * renumbered indices, checks, margin, status, count and envelope. Airs from the sweep's coldest to 60 K above
     * its hottest, where some clamps run away.
     */
    @Test
    void builtWithItsReportedCornersAloneIsTheFullPointThinnedOut() {
        Random rnd = new Random(20_261_204L);
        int compared = 0;
        int thinned = 0;
        for (int n = 0; n < 20; n++) {
            Board board = demoThenRandom(n, rnd);
            PreparedBoard prepared = PreparedBoard.of(board);
            for (int probe = 0; probe < 4; probe++) {
                double air = board.ambient().minK() + (board.ambient().maxK() + 60 - board.ambient().minK())
                        * rnd.nextDouble();
                for (int i = 0; i < board.positions().size(); i++) {
                    PositionSpec spec = board.positions().get(i);
                    List<PositionInstance> insts = prepared.instances().get(i);
                    PositionAtAmbient full = BoardSolver.evaluate(spec, insts, POLICY, air - 5, air,
                            SolverSettings.DEFAULT, CornersKept.EVERY);
                    PositionAtAmbient reported = BoardSolver.evaluate(spec, insts, POLICY, air - 5, air,
                            SolverSettings.DEFAULT, CornersKept.REPORTED);
                    String at = "board " + n + " " + spec.id() + " in air at " + air;
                    assertTrue(full.keepsEveryCorner(), at);
                    assertEquals(full.reportedOnly(), reported, at);
                    if (!reported.keepsEveryCorner()) {
                        thinned++;
                    }
                    compared++;
                }
            }
        }
        assertTrue(compared > 150 && thinned > 100, compared + " compared, " + thinned + " thinned");
    }

    @Test
    void theSweepKeepsEveryCornerOnlyAtTheHighestAmbient() {
        for (Board board : List.of(DesignLoader.load(Path.of("demo/design.yaml")).board(),
                RandomCoupledBoards.draw(new Random(11), "coupled"))) {
            AnalysisResult r = Analysis.run(board, POLICY, SolverSettings.DEFAULT);
            for (PositionAtAmbient p : r.atMaximumAmbient().positions()) {
                assertTrue(p.keepsEveryCorner(), p.positionId());
            }
            for (BoardAtAmbient b : r.sweep().subList(0, r.sweep().size() - 1)) {
                for (PositionAtAmbient p : b.positions()) {
                    assertTrue(p.corners().size() <= 2 + p.worst().size(), p.positionId() + " at " + b.ambientK());
                }
            }
        }
    }
}
