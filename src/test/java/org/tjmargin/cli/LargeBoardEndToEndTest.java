package org.tjmargin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Stream;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tjmargin.derating.Policy;
import org.tjmargin.design.DesignLoader;
import org.tjmargin.design.LargeBoardGenerator;
import org.tjmargin.design.LoadedDesign;
import org.tjmargin.design.ProfileLoader;
import org.tjmargin.report.ReportDetail;
import org.tjmargin.solve.Analysis;
import org.tjmargin.solve.AnalysisResult;
import org.tjmargin.solve.BoardAtAmbient;
import org.tjmargin.solve.PointStatus;
import org.tjmargin.solve.PositionAtAmbient;
import org.tjmargin.solve.PositionResult;
import org.tjmargin.solve.SolverSettings;
import org.tjmargin.solve.Verdict;
import org.tjmargin.thermal.Enclosure;

/**
 * A generated INVENTED board of 50 positions in one sealed box ({@link LargeBoardGenerator}), loaded and analysed end
 * to end, in process and through the command line, checked against invariants that hold whatever the numbers: every
 * position in every output, the enclosure air's energy balance (design 2.2, {@code ΔT = (P_board + P_other)/(h·A)}
 * with the board heat each position's corner of greatest heat), and verdicts consistent with the margins they come
 * from (design 2.5).
 */
class LargeBoardEndToEndTest {

    private static final int POSITIONS = 50;
    private static final long SEED = 42;

    @TempDir
    static Path tmp;

    private static Path design;

    @BeforeAll
    static void generate() throws IOException {
        design = LargeBoardGenerator.write(POSITIONS, SEED, LargeBoardGenerator.demoParts(), tmp.resolve("big.yaml"));
    }

    @Test
    void generatorIsDeterministicAndKeepsItsMix() {
        String a = LargeBoardGenerator.yaml(POSITIONS, SEED, "parts.yaml");
        assertEquals(a, LargeBoardGenerator.yaml(POSITIONS, SEED, "parts.yaml"), "same seed, same bytes");
        assertNotEquals(a, LargeBoardGenerator.yaml(POSITIONS, SEED + 1, "parts.yaml"));
        int[] mix = LargeBoardGenerator.mix(1000);
        assertEquals(600, mix[0]);
        assertEquals(250, mix[1]);
        assertEquals(140, mix[2]);
        assertEquals(10, mix[3]);
        assertEquals(1, LargeBoardGenerator.mix(50)[3], "at least one surge-rated clamp");
    }

    @Test
    void analysisKeepsEveryPositionTheAirBalanceAndVerdictsConsistentWithMargins() {
        LoadedDesign loaded = DesignLoader.load(design);
        assertEquals(POSITIONS, loaded.board().positions().size());
        // Two policies: the design's, which this board passes at most positions, and a stricter one that fails some.
        for (String profile : new String[] {"general-commercial", "high-reliability"}) {
            Policy policy = ProfileLoader.resolve(profile, null).policy().withBuiltInMinimum();
            AnalysisResult r = Analysis.run(loaded.board(), policy, SolverSettings.DEFAULT);
            assertEquals(POSITIONS, r.positions().size(), profile);
            for (int i = 0; i < POSITIONS; i++) {
                assertEquals(loaded.board().positions().get(i).id(), r.positions().get(i).id(), profile);
            }
            Enclosure.SealedBox box = (Enclosure.SealedBox) loaded.board().enclosure();
            double conductance = box.heatTransferWPerM2K() * box.surfaceAreaM2();
            for (BoardAtAmbient b : r.sweep()) {
                assertEquals(POSITIONS, b.positions().size());
                double heat = 0;
                for (PositionAtAmbient p : b.positions()) {
                    // Below the highest ambient only the reported corners are kept; the envelope spans them all.
                    heat += p.envelope().heatMaxW();
                    assertEquals(b.ambientK() + b.enclosureRiseK(), p.tLocalK(), 1e-12, "one air for all");
                }
                assertEquals(heat, b.boardHeatW(), 1e-9 * heat, profile + " board heat at " + b.ambientK());
                // The balance is held to 1e-9 K of residual by the air search (a bracketed finish may stop at
                // 1e-6 K, LowestFixedPoint.ACCEPTED_RESIDUAL).
                assertEquals((heat + box.otherDissipationW()) / conductance, b.enclosureRiseK(), 1e-6,
                        profile + " air balance at " + b.ambientK());
            }
            boolean anyFail = false;
            for (int i = 0; i < POSITIONS; i++) {
                PositionResult pr = r.positions().get(i);
                Verdict expected = Verdict.PASS;
                double worst = Double.POSITIVE_INFINITY;
                String limiting = null;
                for (BoardAtAmbient b : r.sweep()) {
                    PositionAtAmbient p = b.positions().get(i);
                    expected = expected.worse(p.status() == PointStatus.CONVERGED
                            ? (p.margin() >= 0 ? Verdict.PASS : Verdict.FAIL)
                            : p.status() == PointStatus.RUNAWAY ? Verdict.RUNAWAY : Verdict.UNRESOLVED);
                    if (p.margin() < worst) {
                        worst = p.margin();
                        limiting = p.limitingRuleId();
                    }
                }
                String at = profile + " " + pr.id();
                assertEquals(expected, pr.verdict(), at);
                assertEquals(worst, pr.worstMargin(), 0.0, at);
                assertEquals(limiting, pr.limitingRuleId(), at);
                PositionAtAmbient top = r.atMaximumAmbient().positions().get(i);
                if (top.passes()) {
                    assertTrue(pr.maxAmbient().ambientK() >= top.ambientK(), at + ": passes at the top, limit above");
                } else {
                    assertTrue(pr.maxAmbient().ambientK() < top.ambientK(), at + ": fails at the top, limit below");
                }
                anyFail |= pr.verdict() != Verdict.PASS;
            }
            Verdict design = r.positions().stream().map(PositionResult::verdict).reduce(Verdict.PASS, Verdict::worse);
            assertEquals(design, r.verdict());
            if (profile.equals("high-reliability")) {
                assertTrue(anyFail, "the stricter policy fails some positions, so both verdicts are exercised");
            }
        }
    }

    @Test
    void commandLineWritesEveryPositionAndDetailsTheLeastMargins() throws IOException {
        Path out = tmp.resolve("out");
        int detail = 7;
        CommandLineTest.Run run = CommandLineTest.run("analyse", design.toString(), "--out", out.toString(), "--detail",
                Integer.toString(detail), "--policy", "high-reliability", "-q");
        int status = run.status();
        assertTrue(status == ExitCodes.PASS || status == ExitCodes.VIOLATION, run.err());
        LoadedDesign loaded = DesignLoader.load(design);
        List<String> ids = loaded.board().positions().stream().map(p -> p.id()).toList();

        JsonNode root = new ObjectMapper().readTree(out.resolve("results.json").toFile());
        JsonNode positions = root.get("positions");
        assertEquals(POSITIONS, positions.size());
        int detailed = 0;
        for (int i = 0; i < POSITIONS; i++) {
            JsonNode p = positions.get(i);
            assertEquals(ids.get(i), p.get("id").asText());
            if (p.get("detailed").asBoolean()) {
                detailed++;
                assertEquals(LargeBoardGenerator.SWEEP_POINTS, p.get("points").size());
            } else {
                assertTrue(p.has("atMaxAmbient") && !p.has("points"), ids.get(i));
            }
        }
        assertEquals(detail, detailed);
        assertEquals(detail, root.get("detail").get("detailedPositions").asInt());
        // The detailed ones are those of least margin, failing ones first: no position left out is worse (by verdict,
        // then margin) than any one shown.
        java.util.Comparator<JsonNode> worseFirst = java.util.Comparator
                .<JsonNode>comparingInt(p -> -Verdict.valueOf(p.get("verdict").asText()).ordinal())
                .thenComparingDouble(p -> p.get("worstMargin").asDouble());
        JsonNode leastBadShown = null;
        JsonNode worstLeftOut = null;
        for (JsonNode p : positions) {
            if (p.get("detailed").asBoolean()) {
                leastBadShown = leastBadShown == null || worseFirst.compare(p, leastBadShown) > 0 ? p : leastBadShown;
            } else {
                worstLeftOut = worstLeftOut == null || worseFirst.compare(p, worstLeftOut) < 0 ? p : worstLeftOut;
            }
        }
        assertTrue(worseFirst.compare(leastBadShown, worstLeftOut) <= 0,
                leastBadShown.get("id") + " is shown, " + worstLeftOut.get("id") + " is worse but left out");

        Set<String> csvPositions = new HashSet<>();
        Map<String, Set<String>> ambientsOf = new HashMap<>();
        try (Reader in = Files.newBufferedReader(out.resolve("sweep.csv"), StandardCharsets.UTF_8)) {
            for (CSVRecord rec : CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get().parse(in)) {
                csvPositions.add(rec.get("position"));
                ambientsOf.computeIfAbsent(rec.get("position"), k -> new HashSet<>()).add(rec.get("ambientC"));
            }
        }
        assertEquals(new HashSet<>(ids), csvPositions, "every position in sweep.csv");
        for (String id : ids) {
            assertEquals(LargeBoardGenerator.SWEEP_POINTS, ambientsOf.get(id).size(), id + " at every ambient");
        }

        String html = Files.readString(out.resolve("report.html"), StandardCharsets.UTF_8);
        for (String id : ids) {
            assertTrue(html.contains("<td>" + id + "</td>") || html.contains(">" + id + "</a></td>"),
                    id + " in the verdict table");
        }
        assertEquals(detail, html.split("<section class=\"position", -1).length - 1, "one section per detailed");
        assertTrue(html.contains("The other " + (POSITIONS - detail) + " are"), "the report says where the rest are");
        try (Stream<Path> files = Files.list(out)) {
            Set<String> charted = new HashSet<>();
            files.map(f -> f.getFileName().toString()).filter(f -> f.endsWith("-margin.svg"))
                    .forEach(f -> charted.add(f.substring(0, f.length() - "-margin.svg".length())));
            assertEquals(detail, charted.size(), "charts only for the detailed positions");
            for (int i = 0; i < POSITIONS; i++) {
                assertEquals(positions.get(i).get("detailed").asBoolean(), charted.contains(ids.get(i)), ids.get(i));
            }
        }
        String table = run.out();
        assertTrue(table.contains("… and " + (POSITIONS - detail) + " more positions"), table);
        assertEquals(detail + 3, table.lines().takeWhile(l -> !l.startsWith("…")).count(),
                "title, header, rule and one row per detailed position before the count of the rest");
        assertEquals(25, ReportDetail.DEFAULT_LIMIT, "DEVELOPERS.md and the help text quote this default");
    }
    /**
     * Item 6 of the large-board work: a board of 1,000 positions in one sealed box with a 100-point sweep, through the
     * command line with its defaults. Every position is in results.json and in sweep.csv at every ambient, the detail
     * default holds, and the exit status is the design's verdict (design 4). Its speed is measured by
     * {@code org.tjmargin.bench.LargeBoardScaling}, never here.
     */
    @Test
    void aThousandPositionsEndToEnd() throws IOException {
        int n = 1000;
        Path big = LargeBoardGenerator.write(n, 1, LargeBoardGenerator.demoParts(), tmp.resolve("board-1000.yaml"));
        Path out = tmp.resolve("out-1000");
        CommandLineTest.Run run = CommandLineTest.run("analyse", big.toString(), "--out", out.toString(), "-q");
        JsonNode root = new ObjectMapper().readTree(out.resolve("results.json").toFile());
        assertEquals(ExitCodes.of(Verdict.valueOf(root.get("verdict").asText())), run.status(), run.err());
        JsonNode positions = root.get("positions");
        assertEquals(n, positions.size());
        List<String> ids = DesignLoader.load(big).board().positions().stream().map(p -> p.id()).toList();
        int detailed = 0;
        for (int i = 0; i < n; i++) {
            assertEquals(ids.get(i), positions.get(i).get("id").asText());
            detailed += positions.get(i).get("detailed").asBoolean() ? 1 : 0;
        }
        assertEquals(ReportDetail.DEFAULT_LIMIT, detailed);
        Map<String, Set<String>> ambientsOf = new HashMap<>();
        try (Reader in = Files.newBufferedReader(out.resolve("sweep.csv"), StandardCharsets.UTF_8)) {
            for (CSVRecord rec : CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get().parse(in)) {
                ambientsOf.computeIfAbsent(rec.get("position"), k -> new HashSet<>()).add(rec.get("ambientC"));
            }
        }
        assertEquals(new HashSet<>(ids), ambientsOf.keySet(), "every position in sweep.csv");
        for (String id : ids) {
            assertEquals(LargeBoardGenerator.SWEEP_POINTS, ambientsOf.get(id).size(), id + " at every ambient");
        }
        assertTrue(run.out().contains("… and " + (n - ReportDetail.DEFAULT_LIMIT) + " more positions"));
    }
}
