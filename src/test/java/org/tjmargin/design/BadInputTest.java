package org.tjmargin.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.junit.jupiter.api.Test;
import org.tjmargin.design.InputProblem.Kind;

/**
 * Every fixture under {@code bad-input/} is named after its one defect; each is loaded (a parts library on its own,
 * a design with its library) and must fail with exactly that problem, at that line, column and field.
 */
class BadInputTest {

    static final Path DIR = Path.of("src/test/resources/bad-input");

    static Stream<Arguments> fixtures() {
        return Stream.of(
                Arguments.of("negative-resistance.yaml", Kind.NOT_PHYSICAL, 9, 18, "parts[0].breakdown.impedance"),
                Arguments.of("unknown-key.yaml", Kind.UNKNOWN_KEY, 5, 5, "parts[0].colour"),
                Arguments.of("izk-above-izt.yaml", Kind.INCONSISTENT, 10, 21, "parts[0].breakdown.knee-current"),
                Arguments.of("tj-max-below-25c.yaml", Kind.NOT_PHYSICAL, 12, 15, "parts[0].ratings.tj-max"),
                Arguments.of("wrong-dimension.yaml", Kind.WRONG_DIMENSION, 6, 11, "parts[0].breakdown.vz"),
                // A missing key is reported where its object starts (the object's first key).
                Arguments.of("missing-field.yaml", Kind.MISSING_FIELD, 6, 7, "parts[0].breakdown.test-current"),
                Arguments.of("duplicate-id.yaml", Kind.DUPLICATE_ID, 17, 9, "parts[1].id"),
                // The parser notices the unclosed flow mapping where the next block key's colon stands.
                Arguments.of("yaml-syntax.yaml", Kind.SYNTAX, 15, 12, ""),
                Arguments.of("non-finite.yaml", Kind.NOT_PHYSICAL, 6, 11, "parts[0].breakdown.vz"),
                Arguments.of("duplicate-key.yaml", Kind.DUPLICATE_KEY, 10, 7, "parts[0].breakdown.impedance"),
                Arguments.of("knee-impedance-below-zzt.yaml", Kind.INCONSISTENT, 11, 23,
                        "parts[0].breakdown.knee-impedance"),
                Arguments.of("leakage-above-knee.yaml", Kind.INCONSISTENT, 11, 39, "parts[0].leakage.voltage"),
                Arguments.of("bad-quantity.yaml", Kind.BAD_QUANTITY, 8, 21, "parts[0].breakdown.test-current"),
                Arguments.of("missing-unit.yaml", Kind.BAD_QUANTITY, 13, 14, "parts[0].ratings.power"),
                Arguments.of("standoff-above-breakdown.yaml", Kind.INCONSISTENT, 15, 23, "parts[0].clamp.standoff"),
                Arguments.of("tvs-without-clamp.yaml", Kind.MISSING_FIELD, 3, 5, "parts[0].clamp"),
                Arguments.of("unknown-kind.yaml", Kind.WRONG_TYPE, 4, 11, "parts[0].kind"),
                Arguments.of("two-packages.yaml", Kind.INCONSISTENT, 17, 7, "parts[0].package.given"),
                Arguments.of("derating-points-rising.yaml", Kind.INCONSISTENT, 19, 42,
                        "parts[0].ratings.derating.points[1].power"),
                Arguments.of("leads-contradict-rating.yaml", Kind.INCONSISTENT, 16, 30,
                        "parts[0].package.axial.lead-diameter"),
                Arguments.of("held-distance-on-surface-mount.yaml", Kind.INCONSISTENT, 11, 75,
                        "parts[0].breakdown.measured.held-distance"),
                Arguments.of("tolerance-not-below-100-percent.yaml", Kind.NOT_PHYSICAL, 7, 18,
                        "parts[0].breakdown.tolerance"),
                Arguments.of("knee-above-tj-max.yaml", Kind.INCONSISTENT, 14, 69, "parts[0].ratings.derating.knee"),
                Arguments.of("unknown-part.yaml", Kind.UNKNOWN_REFERENCE, 8, 11, "positions[0].part"),
                Arguments.of("unknown-resistor.yaml", Kind.UNKNOWN_REFERENCE, 13, 37,
                        "positions[0].circuit.shunt-regulator.series-resistor.resistor"),
                Arguments.of("min-above-max.yaml", Kind.INCONSISTENT, 12, 23,
                        "positions[0].circuit.shunt-regulator.supply.min"),
                Arguments.of("duplicate-position-id.yaml", Kind.DUPLICATE_ID, 15, 9, "positions[1].id"),
                Arguments.of("zero-current.yaml", Kind.NOT_PHYSICAL, 11, 30, "positions[0].circuit.current-fed.current"),
                Arguments.of("two-circuits.yaml", Kind.INCONSISTENT, 12, 7, "positions[0].circuit.shunt-regulator"),
                Arguments.of("parts-file-not-found.yaml", Kind.FILE_NOT_FOUND, 3, 8, "parts"),
                Arguments.of("wrong-type.yaml", Kind.WRONG_TYPE, 4, 42, "ambient.points"),
                Arguments.of("mounting-does-not-apply.yaml", Kind.INCONSISTENT, 9, 16,
                        "positions[0].mounting.copper-area"),
                Arguments.of("missing-mounting.yaml", Kind.MISSING_FIELD, 7, 5, "positions[0].mounting"),
                Arguments.of("unknown-file-type.txt", Kind.SYNTAX, 0, 0, ""),
                Arguments.of("json-syntax.json", Kind.SYNTAX, 4, 3, ""),
                Arguments.of("unknown-key.json", Kind.UNKNOWN_KEY, 8, 53, "positions[0].circuit.current-fed.ripple"),
                Arguments.of("surges-without-part-surge-data.yaml", Kind.INCONSISTENT, 13, 7, "positions[0].surges"),
                // The standard's ranges are checked together by the load-dump model: reported at its object.
                Arguments.of("load-dump-outside-standard-range.yaml", Kind.NOT_PHYSICAL, 14, 20,
                        "positions[0].surges[0].load-dump"),
                Arguments.of("surge-period-shorter-than-pulse.yaml", Kind.INCONSISTENT, 15, 37,
                        "positions[0].surges[0].repeat.period"),
                Arguments.of("duplicate-surge-id.yaml", Kind.DUPLICATE_ID, 15, 13, "positions[0].surges[1].id"),
                Arguments.of("surge-with-two-sources.yaml", Kind.INCONSISTENT, 15, 9,
                        "positions[0].surges[0].current-pulse"),
                Arguments.of("clamping-voltage-below-breakdown.yaml", Kind.INCONSISTENT, 18, 74,
                        "parts[0].surge.clamping-voltage"),
                Arguments.of("surge-waveform-front-after-half-value.yaml", Kind.WRONG_TYPE, 18, 47,
                        "parts[0].surge.waveform"),
                Arguments.of("zth-times-not-increasing.yaml", Kind.INCONSISTENT, 26, 20,
                        "parts[0].surge.transient.zth[1].time"),
                Arguments.of("unknown-distribution.yaml", Kind.WRONG_TYPE, 15, 29,
                        "positions[0].distributions.supply"),
                Arguments.of("distribution-axis-not-in-circuit.yaml", Kind.INCONSISTENT, 12, 27,
                        "positions[0].distributions.load"),
                Arguments.of("normal-distribution-reaches-zero.yaml", Kind.NOT_PHYSICAL, 16, 38,
                        "positions[0].distributions.series-resistor"),
                Arguments.of("statistics-samples-not-a-count.yaml", Kind.WRONG_TYPE, 6, 23, "statistics.samples"),
                Arguments.of("statistics-unknown-position.yaml", Kind.UNKNOWN_REFERENCE, 6, 54,
                        "statistics.positions[1]"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("fixtures")
    void fixtureFailsWithItsOneProblem(String name, Kind kind, int line, int column, String field) throws IOException {
        InputException e = assertThrows(InputException.class, () -> load(DIR.resolve(name)));
        assertEquals(1, e.problems().size(), e::getMessage);
        InputProblem p = e.problems().get(0);
        assertEquals(kind, p.kind(), p::format);
        assertEquals(line, p.line(), p::format);
        assertEquals(column, p.column(), p::format);
        assertEquals(field, p.field(), p::format);
        assertEquals(DIR.resolve(name).normalize().toString(), p.file());
    }

    @Test
    void everyFixtureIsListed() throws IOException {
        List<String> listed = fixtures().map(a -> (String) a.get()[0]).toList();
        try (Stream<Path> files = Files.list(DIR)) {
            for (Path f : files.toList()) {
                String n = f.getFileName().toString();
                assertTrue(listed.contains(n) || n.equals("many-problems.yaml") || n.equals("README.md"),
                        n + " has no test");
            }
        }
    }

    @Test
    void allProblemsOfAFileAreReportedTogetherInLineOrder() {
        InputException e = assertThrows(InputException.class,
                () -> DesignLoader.loadParts(DIR.resolve("many-problems.yaml")));
        List<InputProblem> ps = e.problems();
        assertEquals(List.of(Kind.UNKNOWN_KEY, Kind.NOT_PHYSICAL, Kind.NOT_PHYSICAL, Kind.WRONG_DIMENSION),
                ps.stream().map(InputProblem::kind).toList());
        assertEquals(List.of("parts[0].colour", "parts[0].breakdown.impedance", "parts[0].ratings.tj-max",
                "parts[0].ratings.power"), ps.stream().map(InputProblem::field).toList());
        assertEquals(List.of(5, 10, 13, 14), ps.stream().map(InputProblem::line).toList());
        // The message holds one formatted line per problem.
        assertEquals(4, e.getMessage().lines().count());
        assertTrue(e.getMessage().startsWith(DIR.resolve("many-problems.yaml") + ":5:5: parts[0].colour: "));
    }

    @Test
    void aMissingDesignFileHasNoLocation() {
        Path p = DIR.resolve("no-such-design.yaml");
        InputException e = assertThrows(InputException.class, () -> DesignLoader.load(p));
        InputProblem only = e.problems().get(0);
        assertEquals(Kind.FILE_NOT_FOUND, only.kind());
        assertEquals(0, only.line());
        assertEquals(p + ": no such file: " + p, only.format());
    }

    /** A library file (top-level {@code parts:}) is loaded on its own, anything else as a design. */
    static Object load(Path p) throws IOException {
        String text = Files.readString(p);
        return text.contains("\nparts:\n") ? DesignLoader.loadParts(p) : DesignLoader.load(p);
    }
}
