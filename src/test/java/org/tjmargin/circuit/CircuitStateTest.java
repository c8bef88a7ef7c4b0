package org.tjmargin.circuit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.EnumSet;
import java.util.Set;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.tjmargin.device.BreakdownDiode;
import org.tjmargin.device.Celsius;
import org.tjmargin.device.Leakage;
import org.tjmargin.device.PreparedDiode;
import org.tjmargin.device.TemperatureCoefficient;
import org.tjmargin.device.VzTestCondition;

/**
 * The junction searches solve every evaluation into a reused {@link CircuitState}: a field left over from the
 * previous evaluation (another region, another branch) would give a wrong point. Seeded loop over the three circuits,
 * with and without hot leakage, through every region, in random order into one state, each held equal to the point a
 * fresh {@code at()} gives (the {@code at()} results themselves are held against reference solvers and worked
 * examples in {@code KneeIntersectionTest} and {@code ShuntRegulatorTest}).
 */
class CircuitStateTest {

    @Test
    void aReusedStateGivesTheFreshPointEveryTime() {
        // Invented parts: a 6.8 V reference with a soft knee, and the same with leakage that doubles every 10 K.
        BreakdownDiode tight = BreakdownDiode.fromDatasheet(6.8, 5e-3, 20.0, 0.25e-3, 700.0,
                TemperatureCoefficient.exact(3e-3), new VzTestCondition.Pulsed(Celsius.T25_K), Leakage.NONE);
        BreakdownDiode leaky = BreakdownDiode.fromDatasheet(6.8, 5e-3, 20.0, 0.25e-3, 700.0,
                TemperatureCoefficient.exact(3e-3), new VzTestCondition.Pulsed(Celsius.T25_K),
                new Leakage(2e-6, 5.0, 10.0));
        PreparedDiode[] diodes = {PreparedDiode.of(tight), PreparedDiode.of(leaky)};
        SplittableRandom rnd = new SplittableRandom(20_261_202L);
        CircuitState reused = new CircuitState();
        Set<Region> seen = EnumSet.noneOf(Region.class);
        for (int n = 0; n < 30_000; n++) {
            PreparedDiode d = diodes[rnd.nextInt(2)];
            double tj = 230 + 200 * rnd.nextDouble();
            Circuit c = switch (rnd.nextInt(4)) {
                case 0 -> new ShuntRegulator(12 * rnd.nextDouble(), 100 + 3000 * rnd.nextDouble(),
                        new Load.Current(2e-3 * rnd.nextDouble()));
                case 1 -> new ShuntRegulator(12 * rnd.nextDouble(), 100 + 3000 * rnd.nextDouble(),
                        new Load.Resistive(500 + 5000 * rnd.nextDouble()));
                case 2 -> new StandoffClamp(8 * rnd.nextDouble(), rnd.nextBoolean() ? 0.0 : 50 * rnd.nextDouble());
                default -> new CurrentFedDiode(1e-6 + 1e-2 * rnd.nextDouble());
            };
            c.solve(d, tj, reused);
            CircuitPoint fresh = c.at(d, tj);
            assertEquals(fresh, reused.point(), "case " + n + ": " + c);
            seen.add(fresh.region());
        }
        assertEquals(EnumSet.allOf(Region.class), seen, "every region reached");
        assertThrows(IllegalStateException.class, () -> new CircuitState().point());
        assertTrue(reused.point().diodeCurrentA() >= 0);
    }
}
