package org.tjmargin.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class OutputFilesTest {

    @Test
    void piecesAreWrittenJoinedAndNothingButTheFilesIsLeft(@TempDir Path dir) throws Exception {
        byte[] png = {1, 2, 3};
        new OutputFiles()
                .text("a.csv", "x,α\n")
                .pieces("b.csv", List.of("head\n".getBytes(StandardCharsets.UTF_8), new byte[0],
                        "row −1\n".getBytes(StandardCharsets.UTF_8)))
                .bytes("c.png", png)
                .writeTo(dir);
        png[0] = 9; // bytes() took a copy
        assertEquals("x,α\n", Files.readString(dir.resolve("a.csv")));
        assertEquals("head\nrow −1\n", Files.readString(dir.resolve("b.csv")));
        assertArrayEquals(new byte[] {1, 2, 3}, Files.readAllBytes(dir.resolve("c.png")));
        try (var listing = Files.list(dir)) {
            assertEquals(3, listing.count(), "no temporary files left behind");
        }
    }
}
