package org.tjmargin.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.tjmargin.solve.AnalysisResult;
import org.tjmargin.solve.BoardAtAmbient;
import org.tjmargin.solve.EnclosureRunaway;
import org.tjmargin.solve.PointStatus;
import org.tjmargin.solve.PositionAtAmbient;
import org.tjmargin.solve.RunawayOnset;
import org.tjmargin.solve.SolverSettings;
import org.tjmargin.variation.statistical.MonteCarloSettings;
import org.tjmargin.variation.statistical.PositionStatistics;
import org.tjmargin.variation.statistical.StatisticalAnalysis;
import org.tjmargin.variation.statistical.StatisticsPlan;
import org.tjmargin.variation.statistical.StatisticsProgress;
import org.tjmargin.variation.statistical.StatisticsResult;
import org.tjmargin.variation.statistical.YieldPoint;

/**
 * A sealed box whose air runs away (an invented board, {@link ReportFixtures#boxRunsAway}): every output says that
 * the air has no steady state, from which ambient, and which position drives it, and none shows numbers solved in
 * the air where the balance's search stopped (a thousand kelvin above the room).
 */
class EnclosureRunawayReportTest {

    private static final AnalysisResult R = ReportFixtures.boxRunsAway("box-runs-away");

    @Test
    void theFixtureRunsItsAirAwayDrivenByTheClamp() {
        EnclosureRunaway e = R.enclosureRunaway().orElseThrow();
        assertEquals(List.of("TVS3"), e.drivers());
        BoardAtAmbient last = R.atMaximumAmbient();
        assertFalse(last.airBalanced());
        for (PositionAtAmbient p : last.positions()) {
            assertEquals(PointStatus.RUNAWAY, p.status(), p.positionId());
            assertTrue(p.hottest().orElseThrow().point().isEmpty(), p.positionId() + ": no operating point to show");
        }
        assertEquals(RunawayOnset.Cause.ENCLOSURE, R.positions().get(0).runaway().orElseThrow().cause());
        assertEquals(RunawayOnset.Cause.DRIVES_ENCLOSURE, R.positions().get(2).runaway().orElseThrow().cause());
        // The regulator has no air to regulate in at the highest ambient.
        assertTrue(R.positions().get(0).regulation().isEmpty());
    }

    @Test
    void theTableGivesOneNoteForTheAirAndOneForItsDriver() {
        String table = SummaryTable.render(R, Cautions.forResult(R));
        String onset = String.format(java.util.Locale.ROOT, "%.1f °C",
                Labels.celsius(R.enclosureRunaway().orElseThrow().ambientK()));
        assertTrue(table.contains("note: the enclosure air has no steady state from " + onset
                + " ambient (driven by TVS3)"), table);
        assertTrue(table.contains("note TVS3: thermal runaway begins at " + onset + " ambient: its heat leaps"), table);
        assertFalse(table.contains("note D1: thermal runaway"), table);
        assertFalse(table.contains("note REF2: thermal runaway"), table);
        assertTrue(table.contains("CAUTION: Enclosure runaway: "), table);
    }

    @Test
    void sweepCsvLeavesTheAirEmptyWhereItHasNoBalance() {
        String[] lines = SweepCsv.render(R).split("\r\n");
        int unbalanced = 0;
        for (String line : lines) {
            String[] f = line.split(",", -1);
            if (f[1].equals(SweepCsv.num(Labels.celsius(R.atMaximumAmbient().ambientK())))) {
                unbalanced++;
                assertEquals("", f[2], line);
                assertEquals("", f[3], line);
                assertEquals("RUNAWAY", f[4], line);
                assertEquals("", f[9], line + ": no junction temperature");
            }
        }
        assertEquals(3, unbalanced, "one row per position at the highest ambient: the hottest corner, a runaway");
    }

    @Test
    void resultsJsonNamesTheAirsRunawayAndItsCauses() throws Exception {
        JsonNode root = new ObjectMapper().readTree(ResultsJson.render(R, Optional.empty(),
                new ReportInputs("test", Cautions.forResult(R), List.of())));
        JsonNode e = root.get("enclosureRunaway");
        assertEquals("TVS3", e.get("drivers").get(0).asText());
        assertEquals(Labels.celsius(R.enclosureRunaway().orElseThrow().ambientK()), e.get("onsetC").asDouble());
        assertEquals("ENCLOSURE", root.get("positions").get(1).get("runawayCause").asText());
        assertEquals("DRIVES_ENCLOSURE", root.get("positions").get(2).get("runawayCause").asText());
        JsonNode points = root.get("positions").get(0).get("points");
        JsonNode top = points.get(points.size() - 1);
        assertTrue(top.get("tLocalC").isNull());
        assertTrue(top.get("enclosureRiseK").isNull());
        assertTrue(points.get(0).get("tLocalC").isNumber());
    }

    @Test
    void statisticsInRunawayAirCountEverySampleAsARunaway() {
        StatisticsPlan plan = new StatisticsPlan(new MonteCarloSettings(500, 7, 100, 20), 4, 10, Map.of());
        StatisticsResult s = StatisticalAnalysis.run(R, plan, SolverSettings.DEFAULT, StatisticsProgress.NONE);
        for (PositionStatistics p : s.positions()) {
            assertEquals(500, p.monteCarlo().runawaySamples(),
                    p.positionId() + ": every sample runs away with the air");
            assertEquals(1.0, p.monteCarlo().violation().estimate(), p.positionId());
            YieldPoint top = p.yield().get(p.yield().size() - 1);
            assertEquals(0.0, top.yield(), p.positionId());
            assertTrue(p.yield().get(0).yield() > 0.5,
                    p.positionId() + ": in the cool end, in balanced air, parts pass");
        }
        assertTrue(SummaryTable.render(R, Optional.of(s), Cautions.forResult(R)).contains("100 % ["));
        // No output names an air temperature where the air has none.
        for (PositionStatistics p : s.positions()) {
            assertTrue(Double.isNaN(p.tLocalK()), p.positionId());
            assertTrue(Double.isNaN(p.yield().get(p.yield().size() - 1).tLocalK()), p.positionId());
            assertFalse(Double.isNaN(p.yield().get(0).tLocalK()), p.positionId());
        }
        String top = SweepCsv.num(Labels.celsius(R.atMaximumAmbient().ambientK()));
        for (String line : StatisticsCsv.yield(s).split("\r\n")) {
            String[] f = line.split(",", -1);
            if (f[1].equals(top)) {
                assertEquals("", f[2], line);
            }
        }
        assertTrue(ChartStatisticsData.run(s.positions().get(0)).contains("the enclosure air has no steady state"));
    }

    @Test
    void theReportSaysTheAirHasNoSteadyState() {
        String html = HtmlReport.render(R, new ReportInputs("test", Cautions.forResult(R), List.of()), List.of());
        assertTrue(html.contains("the enclosure air has no steady state from"), "design facts");
        assertTrue(html.contains("Runs away with the enclosure air from"), "the regulator's section");
        assertFalse(html.contains("air around the part " + HtmlFormat.temperature(
                R.atMaximumAmbient().positions().get(0).tLocalK())), "no air temperature where it has none");
    }
}
