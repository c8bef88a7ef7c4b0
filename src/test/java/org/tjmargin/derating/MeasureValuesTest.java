package org.tjmargin.derating;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * The array-backed values a rule context holds, against the {@code EnumMap} they replace (the straightforward
 * container): the same map, the same iteration order, the same lookups, and the same rejection of values that are
 * not finite.
 */
class MeasureValuesTest {

    @Test
    void behavesAsTheEnumMapOfTheSameValues() {
        long seed = 20261205L;
        Random rnd = new Random(seed);
        Measure[] all = Measure.values();
        for (int n = 0; n < 500; n++) {
            EnumMap<Measure, Double> plain = new EnumMap<>(Measure.class);
            CornerReadings b = new CornerReadings();
            for (Measure m : all) {
                if (rnd.nextBoolean()) {
                    double v = (rnd.nextDouble() - 0.5) * 1e3;
                    plain.put(m, v);
                    b.put(m, v);
                }
            }
            MeasureValues values = b.values();
            String where = "seed " + seed + " case " + n;
            assertEquals(plain, values, where);
            assertEquals(values, plain, where);
            assertEquals(plain.hashCode(), values.hashCode(), where);
            assertEquals(List.copyOf(plain.entrySet()), List.copyOf(values.entrySet()), where);
            for (Measure m : all) {
                assertEquals(plain.get(m), values.get(m), where);
                assertEquals(plain.containsKey(m), values.containsKey(m), where);
                RuleContext ctx = new RuleContext(plain, 450, 300, 300);
                assertEquals(plain.containsKey(m) ? plain.get(m) : Double.NaN, ctx.valueOrNaN(m), where);
            }
            assertSame(values, MeasureValues.copyOf(values));
        }
    }

    @Test
    void largestOfSeveralAndOnlyFiniteValues() {
        // Surge quantities are the worst over the position's surges: merge by maximum, as Map.merge(…, Math::max).
        MeasureValues v = new CornerReadings().max(Measure.SURGE_POWER_RATIO, 0.4)
                .max(Measure.SURGE_POWER_RATIO, 0.9).max(Measure.SURGE_POWER_RATIO, 0.7).values();
        assertEquals(Map.of(Measure.SURGE_POWER_RATIO, 0.9), v);
        assertThrows(IllegalArgumentException.class,
                () -> new CornerReadings().put(Measure.POWER_RATIO, Double.NaN));
        assertThrows(IllegalArgumentException.class,
                () -> new RuleContext(Map.of(Measure.JUNCTION_TEMPERATURE, Double.POSITIVE_INFINITY), 450, 300, 300));
    }
}
