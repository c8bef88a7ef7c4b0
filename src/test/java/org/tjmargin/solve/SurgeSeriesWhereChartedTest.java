package org.tjmargin.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.tjmargin.derating.Policy;
import org.tjmargin.design.DesignLoader;
import org.tjmargin.design.ProfileLoader;
import org.tjmargin.surge.ClampTransientResult;
import org.tjmargin.surge.SurgeResult;

/**
 * The sweep's surge checks solve their transients without the time history; the design's highest ambient, where
 * the surges are charted, gets the histories afterwards by solving the same transients again with recording on.
 * Checked on the demo (its input clamp D4 faces a combination wave and a load dump): every surge result there has
 * its history, and the completed results are the sweep's own in every other number, bit for bit.
 */
class SurgeSeriesWhereChartedTest {

    @Test
    void theHighestAmbientHasEverySeriesAndTheSameNumbers() {
        Policy policy = ProfileLoader.shipped("general-commercial").policy().withBuiltInMinimum();
        Board board = DesignLoader.load(Path.of("demo/design.yaml")).board();
        PreparedBoard prepared = PreparedBoard.of(board);
        AnalysisResult r = Analysis.run(board, policy, SolverSettings.DEFAULT);
        int charted = 0;
        for (int i = 0; i < board.positions().size(); i++) {
            PositionAtAmbient top = r.atMaximumAmbient().positions().get(i);
            for (int k = 0; k < top.corners().size(); k++) {
                CornerPoint c = top.corners().get(k);
                if (c.surges().isEmpty()) {
                    continue;
                }
                OperatingPoint p = c.point().orElseThrow();
                List<SurgeResult> bare = SurgeChecks.at(board.positions().get(i), prepared.instances().get(i).get(k),
                        p);
                assertEquals(bare.size(), c.surges().size());
                for (int s = 0; s < bare.size(); s++) {
                    SurgeResult full = c.surges().get(s);
                    assertTrue(full.pulse().series().size() > 2, full.caseId());
                    assertEquals(0, bare.get(s).pulse().series().size(), "the sweep's checks keep no history");
                    assertEquals(withSeriesOf(bare.get(s), full.pulse()), full, full.caseId());
                    charted++;
                }
            }
        }
        assertTrue(charted >= 2, "the demo's D4 has two surges at its hottest corner, got " + charted);
        // Below the highest ambient the reported corners keep their surges' numbers without the history.
        for (BoardAtAmbient b : r.sweep().subList(0, r.sweep().size() - 1)) {
            for (PositionAtAmbient p : b.positions()) {
                for (CornerPoint c : p.corners()) {
                    for (SurgeResult s : c.surges()) {
                        assertEquals(0, s.pulse().series().size());
                        assertTrue(s.peakPowerW() > 0);
                    }
                }
            }
        }
    }

    /** {@code bare} with the series of {@code full}: what the completion must give, if it changes nothing else. */
    private static SurgeResult withSeriesOf(SurgeResult bare, ClampTransientResult full) {
        ClampTransientResult b = bare.pulse();
        ClampTransientResult pulse = new ClampTransientResult(full.series(), b.startJunctionTemperatureK(),
                b.peakCurrentA(), b.peakClampVoltageV(), b.peakPowerW(), b.peakJunctionTemperatureK(),
                b.peakJunctionTimeS(), b.energyJ(), b.chargeC(), b.actionIntegralA2s(), b.steps(), b.endTimeS(),
                b.finalRise());
        return new SurgeResult(bare.caseId(), bare.startTjK(), pulse, bare.pulseCount(),
                bare.peakJunctionTemperatureK(), bare.peakPowerW(), bare.averagePowerW(), bare.rating(),
                bare.deratingFactor(), bare.allowedPeakPowerW(), bare.powerRatio(), bare.protectedLimitV(),
                bare.stopped(), bare.estimated());
    }
}
