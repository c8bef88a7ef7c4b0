package org.tjmargin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/** The command line through picocli's execute, output captured (design section 4 contracts). */
class CommandLineTest {

    @TempDir
    Path tmp;

    /** What one command-line run returned and printed (also used by the other command-line tests). */
    record Run(int status, String out, String err) {
    }

    /** Runs the command line in process with {@code args}, its output captured. */
    static Run run(String... args) {
        CommandLine cl = Main.commandLine();
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(err));
        int status = cl.execute(args);
        return new Run(status, out.toString(), err.toString());
    }

    @Test
    void demoPassesAndWritesEveryOutput() throws IOException {
        Path out = tmp.resolve("out");
        Run r = run("analyse", "demo/design.yaml", "--out", out.toString());
        assertEquals(ExitCodes.PASS, r.status(), r.err());
        assertTrue(r.out().contains("D1") && r.out().contains("shunt-regulator") && r.out().contains("PASS"));
        assertTrue(r.out().contains("CAUTION: Hot surface"), "the hot-surface caution is shown");
        for (String f : new String[] {"results.json", "sweep.csv", "report.html", "D1-margin.png", "D1-margin.svg"}) {
            assertTrue(Files.size(out.resolve(f)) > 0, f);
        }
        try (Stream<Path> s = Files.list(out)) {
            assertTrue(s.noneMatch(p -> p.getFileName().toString().endsWith(".part")), "no temporary files left");
        }
    }

    @Test
    void jsonCarriesTheContractKeys() throws IOException {
        Run r = run("analyse", "demo/design.yaml", "--out", tmp.resolve("o").toString(), "--json",
                "--samples", "500");
        assertEquals(ExitCodes.PASS, r.status(), r.err());
        JsonNode root = new ObjectMapper().readTree(r.out());
        JsonNode d1 = root.get("positions").get(0);
        assertEquals("D1", d1.get("id").asText());
        for (String k : new String[] {"verdict", "limitingRule", "maxAmbientC", "points"}) {
            assertTrue(d1.has(k), k);
        }
        JsonNode hot = d1.get("points").get(0).get("hottest");
        for (String k : new String[] {"tjC", "voltageV", "currentA", "powerW", "resistorPowerW", "tLocalC",
            "referenceC", "iterations", "loopGain"}) {
            assertTrue(hot.has(k), k);
        }
        assertTrue(d1.get("points").get(0).has("ambientC"));
        assertEquals("general-commercial", root.get("policy").get("name").asText());
    }

    @Test
    void statisticsReachTheTableTheJsonAndTheirCsvFiles() throws IOException {
        Path out = tmp.resolve("stats");
        Run r = run("analyse", "demo/design.yaml", "--out", out.toString(), "--samples", "1000", "--seed", "5",
                "--quiet");
        assertEquals(ExitCodes.PASS, r.status(), r.err());
        assertTrue(r.out().contains("statistics at 55.0 °C ambient (seed 5"), r.out());
        assertEquals("", r.err(), "no progress bar where the console is not interactive");
        JsonNode root = new ObjectMapper().readTree(Files.readString(out.resolve("results.json")));
        assertEquals(1000, root.get("statistics").get("samples").asLong());
        JsonNode d1 = root.get("positions").get(0).get("statistics");
        for (String k : new String[] {"corners", "rss", "monteCarlo", "tornado", "yield"}) {
            assertTrue(d1.has(k), k);
        }
        assertEquals(1000, d1.get("monteCarlo").get("samples").asLong());
        assertTrue(d1.get("monteCarlo").get("violation").has("upper"));
        assertEquals(root.get("positions").size(), Files.readAllLines(out.resolve("spread.csv")).size() / 3,
                "three methods per position plus a header");
        assertTrue(Files.readString(out.resolve("yield.csv")).startsWith("position,ambientC,tLocalC,yield"));
        assertTrue(Files.readString(out.resolve("sensitivity.csv")).contains("D1,1,"));
    }

    @Test
    void noStatisticsSkipsThemAndTheirFiles() throws IOException {
        Path out = tmp.resolve("nostats");
        Run r = run("analyse", "demo/design.yaml", "--out", out.toString(), "--no-statistics");
        assertEquals(ExitCodes.PASS, r.status(), r.err());
        assertFalse(r.out().contains("statistics at"));
        assertFalse(Files.exists(out.resolve("spread.csv")));
        assertTrue(new ObjectMapper().readTree(Files.readString(out.resolve("results.json"))).get("statistics")
                .isNull());
    }

    @Test
    void badInputGivesStatusTwoLocatedMessageAndWritesNothing() {
        Path out = tmp.resolve("never");
        Run r = run("analyse", "src/test/resources/bad-input/negative-resistance.yaml", "--out", out.toString());
        assertEquals(ExitCodes.INVALID_INPUT, r.status());
        assertTrue(r.err().matches("(?s).*negative-resistance\\.yaml:\\d+:\\d+: .*"), r.err());
        assertFalse(r.err().contains("Exception"), "no stack trace");
        assertFalse(Files.exists(out), "nothing written");
    }

    @Test
    void policyOptionOverridesTheDesignAndCanMakeItFail() {
        Run r = run("analyse", "demo/design.yaml", "--out", tmp.resolve("p").toString(), "--policy",
                "high-reliability", "--no-statistics");
        assertEquals(ExitCodes.VIOLATION, r.status(), r.err());
        assertTrue(r.out().contains("policy: high-reliability"));
        assertTrue(r.out().contains("FAIL"));
    }

    @Test
    void profileFileWithATemperatureCurveLimitReachesEveryWriter() throws IOException {
        Path out = tmp.resolve("curve");
        Run r = run("analyse", "demo/design.yaml", "--out", out.toString(), "--policy",
                "src/test/resources/profiles/child-of-industrial.yaml", "--no-statistics");
        assertTrue(r.status() == ExitCodes.PASS || r.status() == ExitCodes.VIOLATION, r.err());
        assertTrue(Files.readString(out.resolve("report.html")).contains("by reference temperature"));
        assertTrue(Files.readString(out.resolve("results.json")).contains("by reference temperature"));
    }

    @Test
    void unknownPolicyIsInvalidInput() {
        Run r = run("analyse", "demo/design.yaml", "--out", tmp.resolve("q").toString(), "--policy", "no-such");
        assertEquals(ExitCodes.INVALID_INPUT, r.status());
        assertTrue(r.err().contains("no-such"));
    }

    @Test
    void outputFolderThatWouldOverwriteAnInputIsRefused() throws IOException {
        Path dir = tmp.resolve("d");
        Files.createDirectories(dir);
        Files.copy(Path.of("demo/design.yaml"), dir.resolve("design.yaml"));
        Files.copy(Path.of("demo/parts.yaml"), dir.resolve("parts.yaml"));
        // An input named like an output: the design itself called results.json would be overwritten.
        Files.copy(Path.of("src/test/resources/design/design.json"), dir.resolve("results.json"));
        Files.copy(Path.of("src/test/resources/design/parts.json"), dir.resolve("parts.json"));
        Run r = run("analyse", dir.resolve("results.json").toString(), "--out", dir.toString());
        assertEquals(ExitCodes.INVALID_INPUT, r.status(), r.err());
        assertTrue(r.err().contains("overwrite"));
        assertFalse(Files.exists(dir.resolve("sweep.csv")), "nothing written");
    }

    @Test
    void helpVersionAndProfiles() {
        Run help = run("--help");
        assertEquals(0, help.status());
        assertTrue(help.out().contains("analyse") && help.out().contains("Exit status"));
        Run version = run("--version");
        assertEquals(0, version.status());
        assertTrue(version.out().startsWith("tjmargin "));
        Run profiles = run("profiles", "--brief");
        assertEquals(0, profiles.status());
        assertTrue(profiles.out().contains("high-reliability"));
        Run check = run("check-profile", "derating-profiles/industrial.yaml");
        assertEquals(0, check.status(), check.err());
        Run bad = run("check-profile", "src/test/resources/bad-profile/max-and-min.yaml");
        assertEquals(ExitCodes.INVALID_INPUT, bad.status());
        assertTrue(bad.err().contains("max-and-min.yaml:4:"), bad.err());
    }

    @Test
    void unknownOptionIsAUsageError() {
        assertEquals(2, run("analyse", "demo/design.yaml", "--bogus").status());
    }
}
