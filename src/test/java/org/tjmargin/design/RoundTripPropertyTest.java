package org.tjmargin.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tjmargin.device.BreakdownPart;
import org.tjmargin.device.Celsius;

/**
 * Seeded random loops (each failure names its seed): values written into a library come back from the mapping, in
 * YAML and in JSON; and no mutation of the demo makes the loader fail otherwise than with located problems.
 */
class RoundTripPropertyTest {

    private static final long SEED = 20240611L;
    private static final int PARTS = 200;
    private static final int MUTATIONS = 150;

    @TempDir
    Path dir;

    @Test
    void writtenPartValuesComeBackFromTheMapping() throws IOException {
        for (int i = 0; i < PARTS; i++) {
            long seed = SEED + i;
            Random r = new Random(seed);
            double vz = 2.4 + r.nextDouble() * 200;
            double tol = r.nextDouble() * 0.2;
            double izt = 1e-4 + r.nextDouble() * 0.1;
            double izk = izt * (0.01 + 0.9 * r.nextDouble());
            double zzt = 0.1 + r.nextDouble() * 100;
            double tcPercent = -0.1 + 0.25 * r.nextDouble();
            double tjMaxC = 100 + r.nextDouble() * 100;
            double power = 0.1 + r.nextDouble() * 5;
            boolean json = r.nextBoolean();
            boolean milli = r.nextBoolean();
            String current = milli ? izt * 1e3 + " mA" : izt + " A";
            String[][] breakdown = {{"vz", vz + " V"}, {"tolerance", tol * 100 + " %"}, {"test-current", current},
                {"impedance", zzt + " Ω"}, {"knee-current", izk + " A"},
                {"temperature-coefficient", tcPercent + " %/K"}};
            String[][] derating = {{"reference", "junction"}, {"knee", "25 °C"}};
            String text = json ? json(breakdown, tjMaxC, power, derating) : yaml(breakdown, tjMaxC, power, derating);
            Path f = dir.resolve(json ? "p" + i + ".json" : "p" + i + ".yaml");
            Files.writeString(f, text);
            BreakdownPart p;
            try {
                p = DesignLoader.loadParts(f).part("x").orElseThrow().part();
            } catch (InputException e) {
                fail("seed " + seed + ": " + e.getMessage() + "\n" + text);
                return;
            }
            String where = "seed " + seed;
            assertEquals(vz, p.vzNomV(), 0.0, where);
            assertEquals(tol, p.vzTolerance(), 1e-15 * Math.max(tol, 1e-3), where);
            assertEquals(izt, p.model().iztA(), 1e-15 * izt, where);
            assertEquals(izk, p.model().izkA(), 0.0, where);
            assertEquals(zzt, p.model().rzOhm(), 0.0, where);
            assertEquals(tcPercent / 100 * vz, p.model().tc().alphaVPerK(), 1e-15 * vz, where);
            assertEquals(Celsius.toKelvin(tjMaxC), p.ratings().tjMaxK(), 1e-12, where);
            assertEquals(power, p.ratings().ratedPowerW(), 0.0, where);
            assertEquals(vz - zzt * izt, p.model().vz0At25V(), 1e-12 * vz, where);
        }
    }

    private static String yaml(String[][] breakdown, double tjMaxC, double power, String[][] derating) {
        StringBuilder sb = new StringBuilder("parts:\n  - id: x\n    kind: zener\n    breakdown:\n");
        for (String[] kv : breakdown) {
            sb.append("      ").append(kv[0]).append(": ").append(kv[1]).append('\n');
        }
        sb.append("    ratings:\n      tj-max: ").append(tjMaxC).append(" °C\n      power: ").append(power)
                .append(" W\n      derating: {");
        for (int i = 0; i < derating.length; i++) {
            sb.append(i > 0 ? ", " : "").append(derating[i][0]).append(": ").append(derating[i][1]);
        }
        return sb.append("}\n    package: {given: {rtheta-ja: 100 K/W}}\n").toString();
    }

    private static String json(String[][] breakdown, double tjMaxC, double power, String[][] derating) {
        StringBuilder sb = new StringBuilder("{\"parts\": [{\"id\": \"x\", \"kind\": \"zener\", \"breakdown\": {");
        for (int i = 0; i < breakdown.length; i++) {
            sb.append(i > 0 ? ", " : "").append('"').append(breakdown[i][0]).append("\": \"").append(breakdown[i][1])
                    .append('"');
        }
        sb.append("},\n \"ratings\": {\"tj-max\": \"").append(tjMaxC).append(" °C\", \"power\": \"").append(power)
                .append(" W\", \"derating\": {");
        for (int i = 0; i < derating.length; i++) {
            sb.append(i > 0 ? ", " : "").append('"').append(derating[i][0]).append("\": \"").append(derating[i][1])
                    .append('"');
        }
        return sb.append("}},\n \"package\": {\"given\": {\"rtheta-ja\": \"100 K/W\"}}}]}\n").toString();
    }

    @Test
    void mutatedDemoFailsOnlyWithLocatedProblems() throws IOException {
        List<String> design = Files.readAllLines(Path.of("demo/design.yaml"));
        List<String> parts = Files.readAllLines(Path.of("demo/parts.yaml"));
        String[] garbage = {"", "-1 V", "x", "{", "[]", "{a: 1}", "0", "1e999 K/W", "12 mA", "- -", ": :"};
        int failures = 0;
        for (int i = 0; i < MUTATIONS; i++) {
            long seed = SEED + 1000 + i;
            Random r = new Random(seed);
            boolean inDesign = r.nextBoolean();
            List<String> lines = new ArrayList<>(inDesign ? design : parts);
            int at = r.nextInt(lines.size());
            String line = lines.get(at);
            if (r.nextInt(3) == 0) {
                lines.remove(at);
            } else {
                int colon = line.lastIndexOf(": ");
                String g = garbage[r.nextInt(garbage.length)];
                lines.set(at, colon < 0 ? g : line.substring(0, colon + 2) + g);
            }
            Path sub = Files.createDirectories(dir.resolve("m" + i));
            Files.write(sub.resolve("design.yaml"), inDesign ? lines : design);
            Files.write(sub.resolve("parts.yaml"), inDesign ? parts : lines);
            try {
                DesignLoader.load(sub.resolve("design.yaml"));
            } catch (InputException e) {
                failures++;
                for (InputProblem p : e.problems()) {
                    assertTrue(p.line() >= 0 && p.line() <= lines.size() + 1 && p.column() >= 0,
                            "seed " + seed + ": " + p.format());
                    assertTrue(p.file().endsWith(".yaml"), "seed " + seed + ": " + p.format());
                }
            } catch (RuntimeException e) {
                throw new AssertionError("seed " + seed + ": mutation of line " + (at + 1) + " of "
                        + (inDesign ? "design" : "parts") + " threw " + e, e);
            }
        }
        // Most mutations break something; a loop in which none did would test nothing.
        assertTrue(failures > MUTATIONS / 3, "only " + failures + " mutations were refused");
    }
}
