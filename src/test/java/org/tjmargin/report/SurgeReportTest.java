package org.tjmargin.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.tjmargin.solve.AnalysisResult;
import org.tjmargin.surge.SurgeResult;

/** Every surge reaches results.json, report.html and the charts, with the thermal-model caution beside it. */
class SurgeReportTest {

    private static final AnalysisResult SURGE = ReportFixtures.surgeOnly("Surge board");

    @Test
    void resultsJsonHasEverySurgeAtItsWorstCornerWithTheCaution() throws Exception {
        JsonNode root = new ObjectMapper().readTree(ResultsJson.render(SURGE, new ReportInputs("test", List.of(), List.of())));
        JsonNode s = root.path("positions").get(0).path("surges").get(0);
        assertEquals("cwg-1kv", s.path("id").asText());
        assertEquals(3, s.path("pulseCount").asInt());
        assertEquals(70.0, s.path("protectedLimitV").asDouble(), 0.0);
        assertEquals(SurgeResult.THERMAL_MODEL_CAUTION, s.path("caution").asText());
        JsonNode w = s.path("atMaxAmbient");
        assertEquals(50.0, w.path("ambientC").asDouble(), 1e-9);
        assertTrue(w.path("peakTjC").asDouble() > w.path("startTjC").asDouble());
        assertEquals("FOSTER_NETWORK", w.path("conversionMethod").asText());
        assertFalse(w.path("estimated").asBoolean());
        assertTrue(w.path("stopped").isNull());
        // The ratio is the writer's copy of the domain's, not a recomputation.
        assertEquals(w.path("peakPowerW").asDouble() / w.path("allowedPeakPowerW").asDouble(), w.path("powerRatio").asDouble(),
                1e-12);
        // Surge temperatures in the rule list are in °C like the steady junction's.
        JsonNode rules = root.path("positions").get(0).path("points").get(0).path("rules");
        boolean found = false;
        for (JsonNode r : rules) {
            if (r.path("measure").asText().equals("SURGE_JUNCTION_TEMPERATURE")) {
                assertEquals("°C", r.path("unit").asText());
                found = true;
            }
        }
        assertTrue(found, rules::toString);
    }

    @Test
    void reportHasASurgeBlockWithItsVerdictAndTheCaution() {
        String html = HtmlReport.render(SURGE, List.of(), List.of(), "0.1.0-test", List.of());
        assertTrue(html.contains("<h3>Surges"), "no surge block");
        assertTrue(html.contains("cwg-1kv"));
        assertTrue(html.contains("current crowding"), "no thermal-model caution");
        assertTrue(html.contains("Peak power / derated rating"));
    }

    @Test
    void surgePositionsGetTheSurgeCharts() {
        assertEquals(List.of(ChartKind.MARGIN, ChartKind.OPERATING, ChartKind.RATING, ChartKind.SURGE, ChartKind.SURGE_MARGIN),
                ChartSet.kindsFor(SURGE, 0));
        List<RenderedChart> charts = ChartSet.render(SURGE, ChartSize.DEFAULT);
        assertTrue(charts.stream().anyMatch(c -> c.baseName().equals("TVS9-surge") && c.svg().contains("cwg-1kv")));
        assertTrue(charts.stream().anyMatch(c -> c.baseName().equals("TVS9-surge-margin")
                && c.svg().contains("surge-within-rating")));
    }
}
