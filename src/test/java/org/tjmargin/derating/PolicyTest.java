package org.tjmargin.derating;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.tjmargin.device.Celsius;
import org.tjmargin.device.PowerRatingCurve;
import org.tjmargin.device.RatingReference;

/** Rules, limits and margins against published derating practice (reference.md section 5). */
class PolicyTest {

    private static final Limit HIGH_REL_TJ = new Limit.LowerOf(new Limit.Fixed(Celsius.toKelvin(125)),
            new Limit.BelowTjMax(40));

    private static RuleContext tjOnly(double tjK, double tjMaxK) {
        return new RuleContext(Map.of(Measure.JUNCTION_TEMPERATURE, tjK), tjMaxK, tjK, tjK);
    }

    @Test
    void highReliabilityJunctionLimitForThreeTjMax() {
        // Tj ≤ 125 °C or Tj max − 40 K, whichever is lower: Tj max 150/175/200 °C → 110/125/125 °C
        // (NASA EEE-INST-002, 2003, from memory, verify; reference.md 5.1, derived check).
        double[][] cases = {{150, 110}, {175, 125}, {200, 125}};
        for (double[] c : cases) {
            double lim = HIGH_REL_TJ.valueFor(tjOnly(300, Celsius.toKelvin(c[0])));
            assertEquals(c[1], Celsius.toCelsius(lim), 1e-9, "Tj max " + c[0]);
        }
    }

    @Test
    void engineCheckOfDeratedPower() {
        // allowed = fraction × P_rated(T): 1 W part (50 °C knee, 200 °C zero), 50 %: TL 100 °C → 0.3333 W,
        // TL 40 °C → 0.5 W (reference.md 5.7, derived). Held as a power-ratio rule: P/P_allowed(T) ≤ 50 %.
        PowerRatingCurve curve = PowerRatingCurve.flatThenLinear(RatingReference.LEAD, 9.5e-3, 1.0,
                Celsius.toKelvin(50), Celsius.toKelvin(200));
        Rule r = new Rule("power-ratio", null, Measure.POWER_RATIO, Bound.MAX, new Limit.Fixed(0.5), "test");
        double allowed100 = curve.allowedPowerAt(Celsius.toKelvin(100));
        assertEquals(0.3333, 0.5 * allowed100, 5e-5);
        assertEquals(0.5, 0.5 * curve.allowedPowerAt(Celsius.toKelvin(40)), 0);
        // At exactly the allowed power the margin is zero; at 0.25 W (half of it) it is 50 %.
        RuleCheck at = check(r, 0.5 * allowed100 / allowed100);
        assertEquals(0.0, at.margin(), 1e-12);
        assertEquals(0.5, check(r, 0.25).margin(), 1e-12);
    }

    private static RuleCheck check(Rule r, double ratio) {
        return r.check(new RuleContext(Map.of(Measure.POWER_RATIO, ratio), 473.15, 373.15, 323.15)).orElseThrow();
    }

    @Test
    void resistorCurveValues() {
        // Thick-film chip rated to 70 °C, zero at 155 °C: (155 − T)/85 → 100 °C 0.6471, 125 °C 0.3529
        // (IEC 60115-1/-8 convention, reference.md 5.8, from memory, verify).
        PowerRatingCurve r = PowerRatingCurve.flatThenLinear(RatingReference.AMBIENT, 0, 1.0, Celsius.toKelvin(70),
                Celsius.toKelvin(155));
        assertEquals(0.6471, r.allowedPowerAt(Celsius.toKelvin(100)), 5e-5);
        assertEquals(0.3529, r.allowedPowerAt(Celsius.toKelvin(125)), 5e-5);
        // Military film chart: 100 % to 70 °C, 60 % at 100 °C, 20 % at 140 °C, 10 % at 145 °C (reference.md 5.8).
        PowerRatingCurve mil = new PowerRatingCurve(RatingReference.AMBIENT, 0, List.of(
                new PowerRatingCurve.Point(Celsius.toKelvin(70), 1), new PowerRatingCurve.Point(Celsius.toKelvin(100), 0.6),
                new PowerRatingCurve.Point(Celsius.toKelvin(140), 0.2), new PowerRatingCurve.Point(Celsius.toKelvin(145), 0.1),
                new PowerRatingCurve.Point(Celsius.toKelvin(150), 0)));
        assertEquals(0.4, mil.allowedPowerAt(Celsius.toKelvin(120)), 1e-12);
    }

    @Test
    void temperatureMarginIsTakenOnTheRiseAbove25C() {
        Rule r = new Rule("tj", null, Measure.JUNCTION_TEMPERATURE, Bound.MAX, new Limit.Fixed(Celsius.toKelvin(175)),
                "test");
        RuleCheck c = r.check(tjOnly(Celsius.toKelvin(150), Celsius.toKelvin(175))).orElseThrow();
        assertEquals(1 - 125.0 / 150.0, c.margin(), 1e-12);
        assertEquals(25.0, c.difference(), 1e-9);
    }

    @Test
    void floorMarginIsRelativeHeadroom() {
        Rule r = new Rule("knee", null, Measure.KNEE_CURRENT_RATIO, Bound.MIN, new Limit.Fixed(2.0), "test");
        RuleContext ctx = new RuleContext(Map.of(Measure.KNEE_CURRENT_RATIO, 3.0), 400, 300, 300);
        assertEquals(0.5, r.check(ctx).orElseThrow().margin(), 1e-12);
        RuleContext low = new RuleContext(Map.of(Measure.KNEE_CURRENT_RATIO, 0.0), 400, 300, 300);
        assertEquals(-1.0, r.check(low).orElseThrow().margin(), 0);
    }

    @Test
    void extendingOverridesExactlyTheNamedRules() {
        Rule a = new Rule("a", null, Measure.POWER_RATIO, Bound.MAX, new Limit.Fixed(0.8), "base");
        Rule b = new Rule("b", null, Measure.MAX_CURRENT_RATIO, Bound.MAX, new Limit.Fixed(0.9), "base");
        Policy base = new Policy("base", "", List.of(a, b));
        Rule a2 = new Rule("a", null, Measure.POWER_RATIO, Bound.MAX, new Limit.Fixed(0.5), "child");
        Rule c = new Rule("c", null, Measure.STANDOFF_RATIO, Bound.MAX, new Limit.Fixed(1.0), "child");
        Policy child = Policy.extending(base, "child", "", List.of(a2, c));
        assertEquals(List.of(a2, b, c), child.rules());
    }

    @Test
    void temperatureCurveLimitInterpolates() {
        Limit l = new Limit.TemperatureCurve(Limit.Basis.REFERENCE,
                new double[] {Celsius.toKelvin(25), Celsius.toKelvin(125)}, new double[] {0.6, 0.4});
        RuleContext ctx = new RuleContext(Map.of(), 450, Celsius.toKelvin(75), 300);
        assertEquals(0.5, l.valueFor(ctx), 1e-12);
        assertTrue(l.describe(false).contains("reference"));
    }

    @Test
    void limitsDescribeThemselvesInDisplayUnits() {
        assertEquals("lower of (125.0 °C, Tj max − 40 K)", HIGH_REL_TJ.describe(true));
        assertEquals("0.5", new Limit.Fixed(0.5).describe(false));
        assertEquals("1.5", new Limit.Fixed(1.5).describe(false));
        assertEquals("Tj max", new Limit.BelowTjMax(0).describe(true));
    }

    @Test
    void builtInMinimumIsAddedUnlessOverridden() {
        Policy p = new Policy("p", "", List.of(new Rule("tj-below-max", null, Measure.JUNCTION_TEMPERATURE, Bound.MAX,
                new Limit.BelowTjMax(10), "mine")));
        Policy full = p.withBuiltInMinimum();
        assertEquals(Policy.builtInMinimum().rules().size(), full.rules().size());
        assertEquals(new Limit.BelowTjMax(10), full.rule("tj-below-max").orElseThrow().limit());
    }
}
