package org.tjmargin.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.tjmargin.derating.Limit;
import org.tjmargin.derating.Policy;
import org.tjmargin.derating.Rule;
import org.tjmargin.device.Celsius;

/** Profile files: shipped profiles, inheritance, located errors. */
class ProfileLoaderTest {

    @Test
    void everyShippedProfileLoadsAndTheListMatchesTheFolder() throws IOException {
        try (Stream<Path> files = Files.list(Path.of("derating-profiles"))) {
            List<String> names = files.map(p -> p.getFileName().toString()).filter(n -> n.endsWith(".yaml"))
                    .map(n -> n.substring(0, n.length() - 5)).sorted().toList();
            assertEquals(ProfileLoader.SHIPPED.stream().sorted().toList(), names);
        }
        for (String n : ProfileLoader.SHIPPED) {
            Policy p = ProfileLoader.shipped(n).policy();
            assertEquals(n, p.name());
            for (Rule r : p.rules()) {
                assertTrue(!r.provenance().isBlank(), n + "." + r.id() + " has no provenance");
            }
        }
    }

    @Test
    void highReliabilityJunctionLimitFollowsPublishedPractice() {
        // 125 °C or Tj max − 40 K, lower of the two (NASA EEE-INST-002, 2003; from memory, verify).
        Limit l = ProfileLoader.shipped("high-reliability").policy().rule("tj-limit").orElseThrow().limit();
        double[][] cases = {{150, 110}, {175, 125}, {200, 125}};
        for (double[] c : cases) {
            var ctx = new org.tjmargin.derating.RuleContext(java.util.Map.of(), Celsius.toKelvin(c[0]), 300, 300);
            assertEquals(c[1], Celsius.toCelsius(l.valueFor(ctx)), 1e-9);
        }
    }

    @Test
    void aProfileThatExtendsAnotherOverridesExactlyTheRulesItNames() {
        Policy parent = ProfileLoader.shipped("industrial").policy();
        LoadedPolicy child = ProfileLoader.load(Path.of("src/test/resources/profiles/child-of-industrial.yaml"));
        List<Rule> rules = child.policy().rules();
        assertEquals(parent.rules().size() + 1, rules.size());
        for (Rule r : parent.rules()) {
            Rule c = child.policy().rule(r.id()).orElseThrow();
            if (r.id().equals("power-ratio")) {
                assertEquals(new Limit.Fixed(0.40), c.limit());
            } else {
                assertEquals(r, c, r.id());
            }
        }
        assertInstanceOf(Limit.TemperatureCurve.class, child.policy().rule("extra-tj").orElseThrow().limit());
        // The child file and the chain of shipped parents were all recorded.
        assertEquals(3, child.inputs().size());
    }

    private static InputProblem onlyProblem(String fixture) {
        InputException e = assertThrows(InputException.class,
                () -> ProfileLoader.load(Path.of("src/test/resources/bad-profile/" + fixture)));
        assertEquals(1, e.problems().size(), e.problems().toString());
        return e.problems().get(0);
    }

    @Test
    void unknownQuantityIsLocated() {
        InputProblem p = onlyProblem("unknown-quantity.yaml");
        assertEquals(InputProblem.Kind.UNKNOWN_REFERENCE, p.kind());
        assertEquals(5, p.line());
        assertEquals(15, p.column());
        assertEquals("rules[0].quantity", p.field());
    }

    @Test
    void ceilingAndFloorTogetherIsInconsistent() {
        InputProblem p = onlyProblem("max-and-min.yaml");
        assertEquals(InputProblem.Kind.INCONSISTENT, p.kind());
        assertEquals(4, p.line());
        assertEquals("rules[0]", p.field());
    }

    @Test
    void limitOfTheWrongDimensionIsLocated() {
        InputProblem p = onlyProblem("wrong-dimension-limit.yaml");
        assertEquals(InputProblem.Kind.WRONG_DIMENSION, p.kind());
        assertEquals(6, p.line());
        assertEquals("rules[0].max", p.field());
    }

    @Test
    void unknownParentIsLocated() {
        InputProblem p = onlyProblem("unknown-parent.yaml");
        assertEquals(InputProblem.Kind.UNKNOWN_REFERENCE, p.kind());
        assertEquals(2, p.line());
        assertEquals("extends", p.field());
    }
}
