package org.tjmargin.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import com.fasterxml.jackson.databind.ObjectMapper;
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
        ObjectMapper mapper = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
        ReportInputs provenance = new ReportInputs("test", List.of("a caution"),
                List.of(new ReportInputs.InputDigest("design.yaml", "0123456789abcdef".repeat(4))));
        for (AnalysisResult r : List.of(ReportFixtures.surgeOnly("surge"), ReportFixtures.hopeless("hopeless"),
                ReportFixtures.mixed("mixed"))) {
            assertEquals(mapper.writeValueAsString(ResultsJson.tree(r, provenance)) + "\n",
                    ResultsJson.render(r, provenance), r.board().name());
        }
    }
}
