package org.tjmargin.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tjmargin.solve.PositionSpec;
import org.tjmargin.surge.IdealCurrentSource;
import org.tjmargin.surge.SurgeCase;
import org.tjmargin.surge.TabulatedWaveform;

/** User waveform tables (CSV) and the other pulse shapes a design can name for a clamp. */
class SurgeTableReaderTest {

    @TempDir
    Path tmp;

    /** The demo with one more surge on D4, the table copied beside the design. */
    private Path designWith(String surgeYaml, String table) throws IOException {
        Files.copy(Path.of("demo/parts.yaml"), tmp.resolve("parts.yaml"));
        if (table != null) {
            Files.copy(Path.of("src/test/resources/surge-table/" + table), tmp.resolve(table));
        }
        String design = Files.readString(Path.of("demo/design.yaml"));
        String anchor = "      - id: load-dump\n";
        design = design.replace(anchor, surgeYaml + anchor);
        Path d = tmp.resolve("design.yaml");
        Files.writeString(d, design);
        return d;
    }

    private static SurgeCase surge(LoadedDesign d, String id) {
        PositionSpec d4 = d.board().positions().stream().filter(p -> p.id().equals("D4")).findFirst().orElseThrow();
        return d4.surges().orElseThrow().cases().stream().filter(c -> c.id().equals(id)).findFirst().orElseThrow();
    }

    @Test
    void currentTableIsReadInSiUnits() throws IOException {
        LoadedDesign d = DesignLoader.load(designWith("      - id: user\n        table: {file: pulse.csv}\n", "pulse.csv"));
        IdealCurrentSource s = assertInstanceOf(IdealCurrentSource.class, surge(d, "user").source());
        TabulatedWaveform w = assertInstanceOf(TabulatedWaveform.class, s.current());
        assertEquals(5, w.timeS().length);
        assertEquals(10e-6, w.timeS()[2], 1e-18);
        assertEquals(100.0, w.valueAt(10e-6), 1e-12);
        assertEquals(75.0, w.valueAt(6e-6), 1e-9); // linear between (2 µs, 50 A) and (10 µs, 100 A)
        // The table is an input like the others: its digest goes into the provenance.
        assertEquals(true, d.inputs().stream().anyMatch(f -> f.path().toString().endsWith("pulse.csv")));
    }

    @Test
    void halfSineAndRectangularPulsesAreAccepted() throws IOException {
        LoadedDesign d = DesignLoader.load(designWith("      - id: hs\n        current-pulse: {waveform: half-sine-8.3ms, "
                + "peak: 20 A}\n      - id: sq\n        current-pulse: {waveform: rectangular, peak: 10 A, width: 1 ms}\n",
                null));
        // 8.3 ms half sine: half a 60 Hz cycle (JEDEC surge convention, reference 4.5).
        assertEquals(8.3e-3, surge(d, "hs").source().waveform().durationS(), 1e-3);
        assertEquals(10.0, surge(d, "sq").source().waveform().valueAt(0.5e-3), 1e-12);
    }

    private InputProblem onlyProblem(String table) throws IOException {
        Path design = designWith("      - id: user\n        table: {file: " + table + "}\n", table);
        InputException e = assertThrows(InputException.class, () -> DesignLoader.load(design));
        assertEquals(1, e.problems().size(), e.problems().toString());
        return e.problems().get(0);
    }

    @Test
    void timeThatDoesNotRiseIsLocatedInTheTable() throws IOException {
        InputProblem p = onlyProblem("time-not-rising.csv");
        assertEquals(InputProblem.Kind.INCONSISTENT, p.kind());
        assertEquals(4, p.line());
        assertEquals(1, p.column());
        assertEquals("time", p.field());
        assertEquals(true, p.file().endsWith("time-not-rising.csv"));
    }

    @Test
    void headerUnitOfTheWrongDimension() throws IOException {
        InputProblem p = onlyProblem("wrong-unit.csv");
        assertEquals(InputProblem.Kind.WRONG_DIMENSION, p.kind());
        assertEquals(1, p.line());
        assertEquals(12, p.column());
        assertEquals("header", p.field());
    }

    @Test
    void unitInsideACellIsABadQuantity() throws IOException {
        InputProblem p = onlyProblem("unit-in-cell.csv");
        assertEquals(InputProblem.Kind.BAD_QUANTITY, p.kind());
        assertEquals(3, p.line());
        assertEquals(4, p.column());
        assertEquals("current", p.field());
    }

    @Test
    void missingTableIsLocatedInTheDesign() throws IOException {
        Path design = designWith("      - id: user\n        table: {file: absent.csv}\n", null);
        InputException e = assertThrows(InputException.class, () -> DesignLoader.load(design));
        assertEquals(InputProblem.Kind.FILE_NOT_FOUND, e.problems().get(0).kind());
        assertEquals(true, e.problems().get(0).file().endsWith("design.yaml"));
    }
}
