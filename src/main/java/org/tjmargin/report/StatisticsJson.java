package org.tjmargin.report;

import java.util.List;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.tjmargin.solve.PositionSpec;
import org.tjmargin.variation.Histogram;
import org.tjmargin.variation.WilsonInterval;
import org.tjmargin.variation.statistical.AxisSensitivity;
import org.tjmargin.variation.statistical.Evaluation;
import org.tjmargin.variation.statistical.MonteCarloResult;
import org.tjmargin.variation.statistical.PositionStatistics;
import org.tjmargin.variation.statistical.RssOutcome;
import org.tjmargin.variation.statistical.RuleViolation;
import org.tjmargin.variation.statistical.SampledAxis;
import org.tjmargin.variation.statistical.StatisticsPlan;
import org.tjmargin.variation.statistical.TornadoBar;
import org.tjmargin.variation.statistical.YieldPoint;

/**
 * The statistics sections of {@code results.json}: the run's budget at the top, and per position the corners, the
 * root-sum-square spread, the Monte Carlo run (violation probabilities with their Wilson intervals, moments,
 * histograms), the tornado ranking and the yield curve. Same conventions as {@link ResultsJson}: the unit in the
 * key, temperatures in °C, temperature differences and spreads in K; axis values in their own unit, named beside.
 */
final class StatisticsJson {

    private StatisticsJson() {
    }

    /** The run's budget and methods. */
    static ObjectNode plan(JsonNodeFactory mapper, StatisticsPlan plan, List<String> positionIds) {
        ObjectNode o = mapper.objectNode();
        ArrayNode covered = o.putArray("positions");
        positionIds.stream().filter(plan::covers).forEach(covered::add);
        o.put("selected", plan.positions().isPresent());
        o.put("samples", plan.settings().samples());
        o.put("seed", plan.settings().seed());
        o.put("blockSize", plan.settings().blockSize());
        o.put("histogramBins", plan.settings().histogramBins());
        o.put("yieldPoints", plan.yieldPoints());
        o.put("surgeSamples", plan.surgeSamples());
        o.put("interval", "Wilson score, 95 %");
        o.put("air", StatisticsText.AIR);
        return o;
    }

    /** One position's statistics. */
    static ObjectNode position(JsonNodeFactory mapper, PositionSpec spec, PositionStatistics s) {
        ObjectNode o = mapper.objectNode();
        o.put("ambientC", Labels.celsius(s.ambientK()));
        putCelsiusOrNull(o, "tLocalC", s.tLocalK());
        ObjectNode c = o.putObject("corners");
        c.put("method", StatisticsText.CORNERS);
        putCelsiusOrNull(c, "tjMinC", s.corners().tjMinK());
        putCelsiusOrNull(c, "tjMaxC", s.corners().tjMaxK());
        c.put("margin", s.corners().margin());
        c.put("limitingRule", s.corners().limitingRuleId());
        c.put("corners", s.corners().corners());
        o.set("rss", rss(mapper, spec, s.rss()));
        o.set("monteCarlo", monteCarlo(mapper, spec, s.monteCarlo(), s.surgesIncluded()));
        ObjectNode t = o.putObject("tornado");
        t.put("method", StatisticsText.TORNADO);
        t.set("nominal", evaluation(mapper, s.tornado().nominal()));
        ArrayNode bars = t.putArray("bars");
        for (TornadoBar b : s.tornado().bars()) {
            ObjectNode bar = bars.addObject();
            bar.put("axis", b.axis().label());
            bar.put("name", Labels.axisName(spec, b.axis()));
            bar.put("unit", Labels.axisUnit(spec, b.axis()));
            bar.put("low", b.lowValue());
            bar.put("high", b.highValue());
            bar.set("atLow", evaluation(mapper, b.atLow()));
            bar.set("atHigh", evaluation(mapper, b.atHigh()));
            bar.put("marginSwing", b.swing());
        }
        o.set("yield", yieldCurve(mapper, StatisticsText.YIELD_RULES, s.yield()));
        if (s.yieldWithSurges().isEmpty()) {
            o.putNull("yieldWithSurges");
        } else {
            o.set("yieldWithSurges", yieldCurve(mapper, StatisticsText.YIELD_WITH_SURGES, s.yieldWithSurges()));
        }
        return o;
    }

    private static ObjectNode yieldCurve(JsonNodeFactory mapper, String rules, List<YieldPoint> points) {
        ObjectNode y = mapper.objectNode();
        y.put("rules", rules);
        ArrayNode pts = y.putArray("points");
        for (YieldPoint p : points) {
            ObjectNode pt = pts.addObject().put("ambientC", Labels.celsius(p.ambientK()));
            putCelsiusOrNull(pt, "tLocalC", p.tLocalK());
            pt.put("yield", p.yield()).put("lower", p.wilsonLo()).put("upper", p.wilsonHi())
                    .put("samples", p.samples());
            ArrayNode pr = pt.putArray("rules");
            for (RuleViolation v : p.rules()) {
                pr.addObject().put("id", v.ruleId()).setAll(interval(mapper, v.probability()));
            }
        }
        return y;
    }

    private static ObjectNode rss(JsonNodeFactory mapper, PositionSpec spec, RssOutcome rss) {
        ObjectNode o = mapper.objectNode();
        o.put("method", RssOutcome.METHOD);
        if (rss instanceof RssOutcome.Spread sp) {
            o.put("nominalTjC", Labels.celsius(sp.nominalTjK()));
            o.put("tjSigmaK", sp.tjSigmaK());
            o.put("nominalMargin", sp.nominalMargin());
            o.put("marginSigma", sp.marginSigma());
            o.put("limitingRule", sp.limitingRuleId());
            ArrayNode axes = o.putArray("axes");
            for (AxisSensitivity a : sp.axes()) {
                String unit = Labels.axisUnit(spec, a.axis());
                axes.addObject().put("axis", a.axis().label()).put("name", Labels.axisName(spec, a.axis()))
                        .put("unit", unit).put("inputSigma", a.inputSigma()).put("step", a.stepSize())
                        .put("tjKPerUnit", a.tjPerUnit()).put("marginPerUnit", a.marginPerUnit())
                        .put("tjSigmaK", a.tjSigmaK()).put("marginSigma", a.marginSigma());
            }
        } else {
            RssOutcome.Unresolved u = (RssOutcome.Unresolved) rss;
            o.put("unresolved", u.status().name());
            if (u.axis() == null) {
                o.putNull("axis");
            } else {
                o.put("axis", u.axis().label());
            }
        }
        return o;
    }

    private static ObjectNode monteCarlo(JsonNodeFactory mapper, PositionSpec spec, MonteCarloResult mc,
                                         boolean surges) {
        ObjectNode o = mapper.objectNode();
        o.put("method", StatisticsText.MONTE_CARLO);
        o.put("samples", mc.settings().samples());
        o.put("seed", mc.settings().seed());
        o.put("surgesIncluded", surges);
        ArrayNode axes = o.putArray("axes");
        for (SampledAxis a : mc.axes()) {
            var r = a.toleranced().range();
            axes.addObject().put("axis", a.axis().label()).put("name", Labels.axisName(spec, a.axis()))
                    .put("unit", Labels.axisUnit(spec, a.axis())).put("distribution", a.toleranced().distribution()
                            .label()).put("min", r.lo()).put("nominal", r.nominal()).put("max", r.hi());
        }
        o.set("violation", interval(mapper, mc.violation()));
        ArrayNode rules = o.putArray("rules");
        for (RuleViolation v : mc.rules()) {
            ObjectNode rv = interval(mapper, v.probability());
            rules.addObject().put("id", v.ruleId()).setAll(rv);
        }
        o.put("runawaySamples", mc.runawaySamples());
        o.put("notConvergedSamples", mc.notConvergedSamples());
        o.put("closedFormSamples", mc.fastPathSamples());
        ObjectNode tj = o.putObject("tj");
        tj.put("count", mc.tj().count());
        tj.put("meanC", Labels.celsius(mc.tj().mean()));
        tj.put("standardDeviationK", mc.tj().standardDeviation());
        ObjectNode m = o.putObject("margin");
        m.put("count", mc.margin().count());
        m.put("mean", mc.margin().mean());
        m.put("standardDeviation", mc.margin().standardDeviation());
        o.set("tjHistogramC", histogram(mapper, mc.tjHistogram(), true));
        o.set("marginHistogram", histogram(mapper, mc.marginHistogram(), false));
        return o;
    }

    private static ObjectNode interval(JsonNodeFactory mapper, WilsonInterval w) {
        return mapper.objectNode().put("probability", w.estimate()).put("lower", w.lower())
                .put("upper", w.upper()).put("count", w.successes()).put("samples", w.trials());
    }

    private static ObjectNode histogram(JsonNodeFactory mapper, Histogram h, boolean temperature) {
        ObjectNode o = mapper.objectNode();
        o.put("lo", temperature ? Labels.celsius(h.lo()) : h.lo());
        o.put("hi", temperature ? Labels.celsius(h.hi()) : h.hi());
        o.put("binWidth", h.binWidth());
        ArrayNode counts = o.putArray("counts");
        for (long c : h.counts()) {
            counts.add(c);
        }
        o.put("underflow", h.underflow());
        o.put("overflow", h.overflow());
        return o;
    }

    private static ObjectNode evaluation(JsonNodeFactory mapper, Evaluation e) {
        return mapper.objectNode().put("status", e.status().name()).put("tjC", Labels.celsius(e.tjK()))
                .put("margin", e.margin()).put("limitingRule", e.limitingRuleId()).put("passes", e.passes());
    }

    private static void putCelsiusOrNull(ObjectNode o, String key, double kelvin) {
        if (Double.isNaN(kelvin)) {
            o.putNull(key);
        } else {
            o.put(key, Labels.celsius(kelvin));
        }
    }
}
