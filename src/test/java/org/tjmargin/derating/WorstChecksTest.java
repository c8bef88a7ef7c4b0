package org.tjmargin.derating;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.tjmargin.design.ProfileLoader;

/**
 * {@link WorstChecks} against its definition: {@link Policy#check} at every corner, reduced to each rule's least
 * margin (first corner on a tie) in a map kept in insertion order, which is what the sweep did before. Seeded random
 * corners, each with a random subset of the quantities (as unresolved corners and surge-free corners have), held
 * against every shipped profile with the built-in minimum. The gathering reads each corner from one
 * {@link CornerReadings} refilled corner after corner, as the sweep does; the reference from a fresh
 * {@link RuleContext} per corner.
 */
class WorstChecksTest {

    private static final String[] PROFILES = {"general-commercial", "industrial", "high-reliability",
        "reliability-level-1", "reliability-level-2", "reliability-level-3"};

    @Test
    void sameChecksCornersAndOrderAsTheReductionOfEveryCheck() {
        SplittableRandom rnd = new SplittableRandom(20_261_202L);
        Measure[] all = Measure.values();
        int compared = 0;
        for (String name : PROFILES) {
            Policy policy = ProfileLoader.shipped(name).policy().withBuiltInMinimum();
            for (int position = 0; position < 300; position++) {
                int corners = 1 + rnd.nextInt(24);
                WorstChecks fast = new WorstChecks(policy);
                CornerReadings readings = new CornerReadings();
                Map<String, RuleCheck> byRule = new LinkedHashMap<>();
                Map<String, Integer> cornerOf = new LinkedHashMap<>();
                for (int k = 0; k < corners; k++) {
                    EnumMap<Measure, Double> values = new EnumMap<>(Measure.class);
                    for (Measure m : all) {
                        if (rnd.nextInt(4) != 0) {
                            // Temperatures around a few hundred kelvin, ratios and currents around one; repeated
                            // values make ties.
                            double v = m.isTemperature() ? 250 + 20 * rnd.nextInt(12) : 0.25 * rnd.nextInt(8);
                            values.put(m, v);
                        }
                    }
                    double tLocal = 260 + 10 * rnd.nextInt(10);
                    RuleContext ctx = new RuleContext(values, 423.15, tLocal + 5, tLocal);
                    readings.reset(423.15, tLocal + 5, tLocal);
                    values.forEach(readings::put);
                    assertEquals(ctx, readings.toContext());
                    for (Limit.Basis basis : Limit.Basis.values()) {
                        assertEquals(ctx.temperatureK(basis), readings.temperatureK(basis));
                    }
                    fast.add(readings, k);
                    for (RuleCheck rc : policy.check(ctx)) {
                        RuleCheck w = byRule.get(rc.ruleId());
                        if (w == null || rc.margin() < w.margin()) {
                            byRule.put(rc.ruleId(), rc);
                            cornerOf.put(rc.ruleId(), k);
                        }
                    }
                }
                List<WorstChecks.Worst> got = fast.worst();
                List<String> ids = new ArrayList<>(byRule.keySet());
                assertEquals(ids.size(), got.size(), name + " position " + position);
                for (int i = 0; i < ids.size(); i++) {
                    assertEquals(byRule.get(ids.get(i)), got.get(i).check(), name + " position " + position);
                    assertEquals(cornerOf.get(ids.get(i)), got.get(i).cornerIndex(), name + " position " + position);
                    compared++;
                }
            }
        }
        assertTrue(compared > 5000, "only " + compared + " rule checks compared");
    }
}
