package org.tjmargin.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.core.StreamWriteFeature;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.json.JsonMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.tjmargin.solve.AnalysisResult;

/**
 * results.json is written by a small tree writer on the streaming generator instead of an {@code ObjectMapper}
 * (which costs a fifth of a second to start): the text must be the mapper's own, character for character, for
 * every kind of result the fixtures hold (surges, runaway, mixed circuits).
 */
class ResultsJsonWriterTest {

    @Test
    void treeWriterWritesWhatTheObjectMapperWrites() throws Exception {
        ObjectMapper mapper = JsonMapper.builder().enable(SerializationFeature.INDENT_OUTPUT)
                .enable(StreamWriteFeature.USE_FAST_DOUBLE_WRITER).build();
        ReportInputs provenance = new ReportInputs("test", List.of("a caution"),
                List.of(new ReportInputs.InputDigest("design.yaml", "0123456789abcdef".repeat(4))));
        for (AnalysisResult r : List.of(ReportFixtures.surgeOnly("surge"), ReportFixtures.hopeless("hopeless"),
                ReportFixtures.mixed("mixed"))) {
            assertEquals(mapper.writeValueAsString(ResultsJson.tree(r, provenance)) + "\n",
                    ResultsJson.render(r, provenance), r.board().name());
        }
    }

    /**
     * Every fractional number in results.json is the shortest decimal that reads back as the same double (IEEE 754
     * round trip; the text sweep.csv writes), whatever the Java version's {@code Double.toString} would give.
     */
    @Test
    void numbersAreTheShortestRoundTripDecimals() throws Exception {
        ReportInputs provenance = new ReportInputs("test", List.of(), List.of());
        int seen = 0;
        for (AnalysisResult r : List.of(ReportFixtures.surgeOnly("surge"), ReportFixtures.mixed("mixed"))) {
            try (JsonParser p = new JsonFactory().createParser(ResultsJson.render(r, provenance))) {
                for (JsonToken t = p.nextToken(); t != null; t = p.nextToken()) {
                    if (t == JsonToken.VALUE_NUMBER_FLOAT) {
                        double v = Double.parseDouble(p.getText());
                        assertEquals(SweepCsv.num(v), p.getText());
                        seen++;
                    }
                }
            }
        }
        assertTrue(seen > 100, "only " + seen + " numbers");
    }
}
