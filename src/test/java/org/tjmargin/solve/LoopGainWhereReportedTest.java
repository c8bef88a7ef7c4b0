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
 * The sweep solves its corners without the loop gain and adds it where a corner is reported. Checked against the
 * solve with the gain (the central difference at the root that {@link LowestFixedPoint} takes, design 2.3): the
 * completed point is that solve's, bit for bit; and every corner an output shows carries a gain.
 */
class LoopGainWhereReportedTest {

    @Test
    void theCompletedPointIsTheSolveWithTheGain() {
        Random rnd = new Random(20_261_202L);
        int converged = 0;
        for (int n = 0; n < 30; n++) {
            Board board = RandomCoupledBoards.draw(rnd, "board " + n);
            for (List<PositionInstance> insts : PreparedBoard.of(board).instances()) {
                for (PositionInstance inst : insts) {
                    double air = board.ambient().minK() + (board.ambient().maxK() + 40 - board.ambient().minK())
                            * rnd.nextDouble();
                    ThermalOutcome with = inst.solve(air, SolverSettings.DEFAULT);
                    ThermalOutcome without = inst.solveWithoutLoopGain(air, SolverSettings.DEFAULT);
                    assertEquals(with, ElectroThermalSolver.withLoopGain(inst, without), "board " + n + " at " + air);
                    if (with instanceof ThermalOutcome.Converged) {
                        converged++;
                    }
                }
            }
        }
        assertTrue(converged > 500, "only " + converged + " converged corners compared");
    }

    @Test
    void everyReportedCornerHasItsGain() {
        Policy policy = ProfileLoader.shipped("general-commercial").policy().withBuiltInMinimum();
        for (Board board : List.of(DesignLoader.load(Path.of("demo/design.yaml")).board(),
                RandomCoupledBoards.draw(new Random(7), "coupled"))) {
            AnalysisResult r = Analysis.run(board, policy, SolverSettings.DEFAULT);
            for (BoardAtAmbient b : r.sweep()) {
                boolean top = b == r.atMaximumAmbient();
                for (PositionAtAmbient p : b.positions()) {
                    for (int k = 0; k < p.corners().size(); k++) {
                        boolean reported = top || k == p.hottestIndex() || k == p.leastCurrentIndex();
                        p.corners().get(k).point().ifPresent(op -> {
                            if (reported) {
                                assertTrue(Double.isFinite(op.loopGain()), p.positionId() + " at " + b.ambientK());
                            }
                        });
                    }
                }
            }
        }
    }
}
