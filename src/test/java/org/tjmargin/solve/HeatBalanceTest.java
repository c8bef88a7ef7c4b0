package org.tjmargin.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * One {@link HeatBalance} reused across corners and airs, as the sweep's loops use it, gives every solve and every
 * heat exactly what a fresh map gives (the definition: a closure and state per solve, as before it existed), bit for
 * bit, whatever it was aimed at before. Seeded random coupled boards, corners visited in a shuffled order, airs from
 * cold to 900 K above the sweep, where the solves run away.
 */
class HeatBalanceTest {

    @Test
    void aReusedMapSolvesAsAFreshOne() {
        Random rnd = new Random(20_261_204L);
        HeatBalance shared = new HeatBalance();
        int converged = 0;
        int compared = 0;
        for (int n = 0; n < 30; n++) {
            Board board = RandomCoupledBoards.draw(rnd, "board " + n);
            List<PositionInstance> all = PreparedBoard.of(board).instances().stream().flatMap(List::stream).toList();
            for (int j = 0; j < all.size(); j++) {
                PositionInstance inst = all.get(rnd.nextInt(all.size()));
                double air = board.ambient().minK() + (board.ambient().maxK() + 900 - board.ambient().minK())
                        * rnd.nextDouble();
                ThermalOutcome fresh = inst.solveWithoutLoopGain(air, SolverSettings.DEFAULT);
                assertEquals(fresh, inst.solveWithoutLoopGain(air, SolverSettings.DEFAULT, shared),
                        "board " + n + " at " + air);
                assertEquals(CornerHeat.heatInAir(inst, air, SolverSettings.DEFAULT),
                        CornerHeat.heatInAir(inst, air, SolverSettings.DEFAULT, shared), "board " + n + " at " + air);
                if (fresh instanceof ThermalOutcome.Converged) {
                    converged++;
                }
                compared++;
            }
        }
        assertTrue(converged > 300 && compared > converged, converged + " converged of " + compared);
    }
}
