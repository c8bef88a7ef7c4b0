package org.tjmargin.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.stream.Collectors;
import org.tjmargin.circuit.CircuitSpec;
import org.tjmargin.circuit.CurrentFedSpec;
import org.tjmargin.circuit.LoadRange;
import org.tjmargin.circuit.ShuntRegulatorSpec;
import org.tjmargin.circuit.StandoffClampSpec;
import org.tjmargin.derating.Bound;
import org.tjmargin.derating.Limit;
import org.tjmargin.derating.Measure;
import org.tjmargin.derating.Policy;
import org.tjmargin.derating.Rule;
import org.tjmargin.derating.RuleCheck;
import org.tjmargin.device.BreakdownDiode;
import org.tjmargin.device.BreakdownPart;
import org.tjmargin.device.DiodeRatings;
import org.tjmargin.device.Leakage;
import org.tjmargin.device.TemperatureCoefficient;
import org.tjmargin.solve.AnalysisResult;
import org.tjmargin.solve.BoardAtAmbient;
import org.tjmargin.solve.CornerPoint;
import org.tjmargin.solve.MaximumAmbient;
import org.tjmargin.solve.OperatingPoint;
import org.tjmargin.solve.PositionAtAmbient;
import org.tjmargin.solve.PositionResult;
import org.tjmargin.solve.PositionSpec;
import org.tjmargin.solve.Regulation;
import org.tjmargin.solve.RunawayOnset;
import org.tjmargin.solve.ThermalOutcome;
import org.tjmargin.solve.Verdict;
import org.tjmargin.solve.WorstCheck;
import org.tjmargin.thermal.AxialLeadMount;
import org.tjmargin.thermal.Enclosure;
import org.tjmargin.thermal.SteadyThermalPath;
import org.tjmargin.thermal.SurfaceMountPad;
import org.tjmargin.units.Dimension;
import org.tjmargin.variation.Axis;

/**
 * One position of the report: its row of the verdict table and its section, read from the analysis and formatted.
 * Chooses and formats values; computes none.
 */
final class HtmlPositionView {

    private final AnalysisResult result;
    private final PositionSpec spec;
    private final PositionResult pr;
    private final PositionAtAmbient atMax;
    private final String anchor;

    HtmlPositionView(AnalysisResult result, int index, String stem) {
        this.result = result;
        this.spec = result.board().positions().get(index);
        this.pr = result.positions().get(index);
        this.atMax = result.atMaximumAmbient().positions().get(index);
        this.anchor = "pos-" + stem;
    }

    /** The anchor of the position's section, {@code pos-<stem>}. */
    String anchor() {
        return anchor;
    }

    static HtmlView.Badge badge(Verdict v) {
        return new HtmlView.Badge(v.name(), "verdict-" + v.name().toLowerCase(Locale.ROOT));
    }

    HtmlView.SummaryRow summaryRow(boolean detailed) {
        Optional<OperatingPoint> hot = atMax.hottest().flatMap(CornerPoint::point);
        String hottestTj = hot.map(p -> HtmlFormat.temperature(p.tjK()))
                .orElse(atMax.hottest().isPresent() ? statusWord(atMax.hottest().get()) : HtmlFormat.NONE);
        return new HtmlView.SummaryRow(pr.id(), anchor, detailed, spec.part().id(), circuitKind(spec.circuit()),
                badge(pr.verdict()), pr.limitingRuleId(), worstMargin(), maxAmbient(pr.maxAmbient()), hottestTj,
                hot.map(p -> HtmlFormat.si(p.diodePowerW(), Dimension.POWER)).orElse(HtmlFormat.NONE),
                outputRange(atMax),
                atMax.leastCurrent().flatMap(CornerPoint::point)
                        .map(p -> HtmlFormat.si(p.circuit().diodeCurrentA(), Dimension.CURRENT))
                        .orElse(HtmlFormat.NONE));
    }

    HtmlView.Position section(List<HtmlView.Chart> charts) {
        return section(charts, null);
    }

    /** The section with its statistical spread, {@code null} for none. */
    HtmlView.Position section(List<HtmlView.Chart> charts, HtmlView.Statistics statistics) {
        String summary = "Verdict " + pr.verdict() + "; smallest margin " + HtmlFormat.margin(pr.worstMargin())
                + " (rule " + pr.limitingRuleId() + ") at " + HtmlFormat.temperature(pr.worstAmbientK())
                + " ambient; maximum ambient " + maxAmbient(pr.maxAmbient()) + ".";
        String design = HtmlFormat.temperature(atMax.ambientK());
        return new HtmlView.Position(pr.id(), anchor, badge(pr.verdict()), summary, partFacts(), mountingFacts(),
                circuitFacts(), pr.notes(), assumptions(),
                "Operating points at the design's highest ambient, " + design + " (" + (result.atMaximumAmbient()
                        .airBalanced() ? "air around the part " + HtmlFormat.temperature(atMax.tLocalK())
                        : "the enclosure air has no steady state there") + "), " + atMax.cornerCount() + " corner"
                        + (atMax.cornerCount() == 1 ? "" : "s") + ".",
                cornerRows(), spec.circuit() instanceof ShuntRegulatorSpec,
                "Each rule at its worst corner at " + design + " ambient.", marginRows(),
                "Over the whole range the smallest margin is " + HtmlFormat.margin(pr.worstMargin()) + " (rule "
                        + pr.limitingRuleId() + ") at " + HtmlFormat.temperature(pr.worstAmbientK()) + " ambient.",
                pr.regulation().map(r -> new HtmlView.Facts(regulationFacts(r))).orElse(null),
                pr.runaway().map(o -> new HtmlView.Text(runawayText(o))).orElse(null), charts,
                HtmlSurgeView.of(result, spec, atMax).orElse(null), statistics);
    }

    /** The worst margin; a runaway position's comes from the search cap, and says so. */
    private String worstMargin() {
        String m = HtmlFormat.margin(pr.worstMargin());
        return pr.verdict() == Verdict.RUNAWAY ? m + " (runaway)" : m;
    }

    static String maxAmbient(MaximumAmbient m) {
        return switch (m.status()) {
            case FOUND -> HtmlFormat.temperature(m.ambientK());
            case HOLDS_TO_LIMIT -> "≥ " + HtmlFormat.temperature(m.ambientK()) + " (end of search)";
            case NONE -> "none (fails at every ambient searched)";
        };
    }

    static String circuitKind(CircuitSpec c) {
        if (c instanceof ShuntRegulatorSpec) {
            return "shunt regulator";
        }
        if (c instanceof CurrentFedSpec) {
            return "current-fed diode";
        }
        return "DC clamp at standoff";
    }

    private static String outputRange(PositionAtAmbient p) {
        if (!p.envelope().any()) {
            return HtmlFormat.NONE;
        }
        double lo = p.envelope().outputMinV();
        double hi = p.envelope().outputMaxV();
        return lo == hi ? HtmlFormat.si(lo, Dimension.VOLTAGE)
                : HtmlFormat.si(lo, Dimension.VOLTAGE) + " … " + HtmlFormat.si(hi, Dimension.VOLTAGE);
    }

    private List<HtmlView.Fact> partFacts() {
        BreakdownPart part = spec.part();
        BreakdownDiode m = part.model();
        DiodeRatings r = part.ratings();
        List<HtmlView.Fact> f = new ArrayList<>();
        f.add(fact("Part", part.id()
                + (part.kind() == BreakdownPart.Kind.ZENER ? " (Zener)" : " (transient suppressor)")));
        f.add(fact("Nominal breakdown voltage", HtmlFormat.si(part.vzNomV(), Dimension.VOLTAGE) + " ± "
                + HtmlFormat.si(part.vzTolerance(), Dimension.FRACTION) + " at Izt "
                + HtmlFormat.si(m.iztA(), Dimension.CURRENT)));
        f.add(fact("Dynamic impedance Rz", HtmlFormat.si(m.rzOhm(), Dimension.RESISTANCE)));
        f.add(fact("Knee current Izk", HtmlFormat.si(m.izkA(), Dimension.CURRENT)));
        TemperatureCoefficient tc = m.tc();
        String alpha = HtmlFormat.si(tc.alphaVPerK(), Dimension.VOLTAGE_TEMPERATURE_COEFFICIENT) + " ("
                + HtmlFormat.si(tc.alphaVPerK() / part.vzNomV(), Dimension.RELATIVE_TEMPERATURE_COEFFICIENT) + ")";
        if (tc.maxAlphaVPerK() > tc.minAlphaVPerK()) {
            alpha += ", range " + HtmlFormat.si(tc.minAlphaVPerK(), Dimension.VOLTAGE_TEMPERATURE_COEFFICIENT) + " … "
                    + HtmlFormat.si(tc.maxAlphaVPerK(), Dimension.VOLTAGE_TEMPERATURE_COEFFICIENT);
        }
        f.add(fact("Temperature coefficient αV", alpha + (tc.estimated() ? " — estimated" : "")));
        Leakage leak = m.leakage();
        f.add(fact("Leakage", leak.isKnown() ? HtmlFormat.si(leak.irA(), Dimension.CURRENT) + " at "
                + HtmlFormat.si(leak.vrV(), Dimension.VOLTAGE) + " and 25.0 °C, doubling every "
                + HtmlFormat.kelvinDifference(leak.doublingK()) : "no data"));
        f.add(fact("Tj max", HtmlFormat.temperature(r.tjMaxK())));
        f.add(fact("Power rating", ChartRating.describe(r.powerCurve()) + " — "
                + ChartDeviceRating.referenceLabel(r.powerCurve()).replace(" (°C)", "").toLowerCase(Locale.ROOT)));
        f.add(fact("Maximum Zener current Izm", HtmlFormat.si(r.izmA(), Dimension.CURRENT)));
        if (part.standoffV() > 0) {
            f.add(fact("Standoff voltage Vwm", HtmlFormat.si(part.standoffV(), Dimension.VOLTAGE)));
        }
        return f;
    }

    private List<HtmlView.Fact> mountingFacts() {
        SteadyThermalPath path = spec.path();
        List<HtmlView.Fact> f = new ArrayList<>();
        String kind;
        if (path instanceof AxialLeadMount a) {
            kind = "axial leads, " + HtmlFormat.si(a.leadLengthM(), Dimension.LENGTH) + " each to the tie point";
        } else if (path instanceof SurfaceMountPad s) {
            kind = "surface mount on " + HtmlFormat.si(s.copperAreaM2(), Dimension.AREA) + " of copper";
        } else {
            kind = "thermal resistances given";
        }
        f.add(fact("Mounting", kind));
        f.add(fact("Rθja (junction → local air)",
                HtmlFormat.si(path.rThetaJaKPerW(), Dimension.THERMAL_RESISTANCE)));
        f.add(fact("Junction → rating reference point", HtmlFormat.si(path.rThetaJrKPerW(),
                Dimension.THERMAL_RESISTANCE)));
        f.add(fact("Rθ tolerance (factor)", HtmlFormat.plainRange(spec.rThetaFactor())));
        f.add(fact("Vz tolerance (shift)", HtmlFormat.range(spec.vzShiftV(), Dimension.VOLTAGE)));
        f.add(fact("αV range at this position", HtmlFormat.range(spec.alphaVPerK(),
                Dimension.VOLTAGE_TEMPERATURE_COEFFICIENT)));
        return f;
    }

    private List<HtmlView.Fact> circuitFacts() {
        CircuitSpec c = spec.circuit();
        List<HtmlView.Fact> f = new ArrayList<>();
        f.add(fact("Circuit", circuitKind(c)));
        if (c instanceof ShuntRegulatorSpec s) {
            f.add(fact("Supply Vs", HtmlFormat.range(s.supplyV(), Dimension.VOLTAGE)));
            f.add(fact("Series resistor Rs", HtmlFormat.range(s.resistor().ohm(), Dimension.RESISTANCE)));
            f.add(fact("Rs power rating", ChartRating.describe(s.resistor().rating())));
            if (s.load() instanceof LoadRange.Current lc) {
                f.add(fact("Load current IL", HtmlFormat.range(lc.currentA(), Dimension.CURRENT)));
            } else {
                f.add(fact("Load resistance RL", HtmlFormat.range(((LoadRange.Resistive) s.load()).ohm(),
                        Dimension.RESISTANCE)));
            }
        } else if (c instanceof CurrentFedSpec cf) {
            f.add(fact("Feed current", HtmlFormat.range(cf.currentA(), Dimension.CURRENT)));
        } else {
            StandoffClampSpec sc = (StandoffClampSpec) c;
            f.add(fact("Line voltage", HtmlFormat.range(sc.lineV(), Dimension.VOLTAGE)));
            f.add(fact("Source resistance", HtmlFormat.si(sc.sourceOhm(), Dimension.RESISTANCE)));
        }
        String axes = spec.varyingAxes().stream().map(Axis::label).collect(Collectors.joining(", "));
        f.add(fact("Varying inputs (corner axes)", axes.isEmpty() ? "none: the nominal point only" : axes));
        return f;
    }

    private List<String> assumptions() {
        List<String> a = new ArrayList<>();
        Enclosure enc = result.board().enclosure();
        BoardAtAmbient last = result.atMaximumAmbient();
        if (enc instanceof Enclosure.FixedRise fr) {
            a.add("Enclosure air: a given rise of " + HtmlFormat.kelvinDifference(fr.riseK())
                    + " above the room, independent of what the board dissipates.");
        } else {
            Enclosure.SealedBox b = (Enclosure.SealedBox) enc;
            a.add("Enclosure air: a sealed box of " + HtmlFormat.si(b.surfaceAreaM2(), Dimension.AREA)
                    + " outside surface with a combined heat-transfer coefficient of "
                    + HtmlFormat.si(b.heatTransferWPerM2K(), Dimension.HEAT_TRANSFER_COEFFICIENT) + " and "
                    + HtmlFormat.si(b.otherDissipationW(), Dimension.POWER) + " from other parts; its rise follows"
                    + " the board's heat, each position taken at its corner of greatest heat ("
                    + (last.airBalanced() ? HtmlFormat.kelvinDifference(last.enclosureRiseK()) + " for "
                            + HtmlFormat.si(last.boardHeatW(), Dimension.POWER) + " at the design's highest ambient)."
                            : "at the design's highest ambient no air temperature balances the board's heat against"
                                    + " what the box sheds: the air runs away)."));
        }
        a.add("Worst-case corners: every combination of the extremes of the varying inputs ("
                + spec.corners().size() + " corner" + (spec.corners().size() == 1 ? "" : "s") + ").");
        a.add("Junction temperature: the lowest steady operating point, the one the part reaches heating up from "
                + "the air; no such point below the solver's search cap is reported as thermal runaway.");
        a.add("The diode's power rating is read at the temperature of its rating's reference point; the series "
                + "resistor's, where present, at the air around the position.");
        a.add("Temperature margins are taken on the rise above 25.0 °C, the reference of datasheet ratings.");
        if (pr.regulation().isPresent()) {
            a.add("Line and load regulation at the nominal corner, in the air of the design's highest ambient.");
        }
        return a;
    }

    private List<HtmlView.CornerRow> cornerRows() {
        List<HtmlView.CornerRow> rows = new ArrayList<>();
        for (int k = 0; k < atMax.corners().size(); k++) {
            CornerPoint c = atMax.corners().get(k);
            List<String> tags = new ArrayList<>();
            if (k == atMax.hottestIndex()) {
                tags.add("hottest");
            }
            if (k == atMax.leastCurrentIndex()) {
                tags.add("least current");
            }
            String css = tags.isEmpty() ? "" : "marked";
            String label = c.corner().label() + (tags.isEmpty() ? "" : " (" + String.join(", ", tags) + ")");
            if (c.outcome() instanceof ThermalOutcome.Converged conv) {
                OperatingPoint p = conv.point();
                boolean shunt = spec.circuit() instanceof ShuntRegulatorSpec;
                rows.add(new HtmlView.CornerRow(label, "converged", true, null, HtmlFormat.temperature(p.tjK()),
                        HtmlFormat.si(p.circuit().voltageV(), Dimension.VOLTAGE),
                        HtmlFormat.si(p.circuit().diodeCurrentA(), Dimension.CURRENT),
                        HtmlFormat.si(p.diodePowerW(), Dimension.POWER),
                        HtmlFormat.si(c.allowedPowerW(), Dimension.POWER),
                        shunt ? HtmlFormat.si(p.circuit().resistorPowerW(), Dimension.POWER) : HtmlFormat.NONE,
                        HtmlFormat.temperature(p.referenceK()), HtmlFormat.plain(p.loopGain()),
                        Integer.toString(p.evaluations()), css));
            } else {
                rows.add(new HtmlView.CornerRow(label, statusWord(c), false, outcomeNote(c.outcome()), null, null,
                        null, null, null, null, null, null, null, "unresolved"));
            }
        }
        return rows;
    }

    private static String statusWord(CornerPoint c) {
        return switch (c.status()) {
            case CONVERGED -> "converged";
            case RUNAWAY -> "runaway";
            case NOT_CONVERGED -> "not converged";
        };
    }

    private static String outcomeNote(ThermalOutcome o) {
        if (o instanceof ThermalOutcome.Runaway r) {
            return "Thermal runaway: no operating point up to " + HtmlFormat.temperature(r.capK()) + " (air "
                    + HtmlFormat.temperature(r.tLocalK()) + ").";
        }
        ThermalOutcome.NotConverged n = (ThermalOutcome.NotConverged) o;
        return "Not converged after " + n.evaluations() + " evaluations: last Tj " + HtmlFormat.temperature(n.lastTjK())
                + ", heat-balance residual " + HtmlFormat.kelvinDifference(n.residualK()) + ".";
    }

    private List<HtmlView.MarginRow> marginRows() {
        Policy policy = result.policy();
        List<HtmlView.MarginRow> rows = new ArrayList<>();
        for (WorstCheck w : atMax.worst()) {
            RuleCheck rc = w.check();
            String title = policy.rule(rc.ruleId()).map(Rule::title).orElse(rc.ruleId());
            // A limit that depends on the part is shown with its rule, e.g. "Tj max − 40.0 K = 135.0 °C".
            String limit = policy.rule(rc.ruleId()).filter(r -> !(r.limit() instanceof Limit.Fixed))
                    .map(r -> HtmlFormat.limit(r.limit(), r.measure()) + " = ").orElse("")
                    + HtmlFormat.measure(rc.limit(), rc.measure());
            CornerPoint corner = atMax.corners().get(w.cornerIndex());
            String actual = HtmlFormat.measure(rc.actual(), rc.measure());
            if (corner.outcome() instanceof ThermalOutcome.Runaway) {
                // Without an operating point the rules see the junction at the solver's search cap.
                actual = "runaway (taken at the search cap, " + actual + ")";
            } else if (corner.outcome() instanceof ThermalOutcome.NotConverged) {
                actual = "not converged (last iterate " + actual + ")";
            } else if (rc.measure() == Measure.POWER_RATIO && corner.allowedPowerW() == 0
                    || rc.measure() == Measure.RESISTOR_POWER_RATIO && corner.resistorAllowedW() == 0) {
                // The ratio is a large stand-in when the rating has fallen to zero while power flows.
                actual = "no rating left here (0 W allowed)";
            }
            rows.add(new HtmlView.MarginRow(rc.ruleId(), title, actual,
                    (rc.bound() == Bound.MAX ? "≤ " : "≥ ") + limit,
                    HtmlFormat.margin(rc.margin()), HtmlFormat.measureDifference(rc.difference(), rc.measure()),
                    corner.corner().label(), rc.holds() ? "holds" : "violated"));
        }
        return rows;
    }

    private static List<HtmlView.Fact> regulationFacts(Regulation r) {
        return List.of(
                fact("Line regulation, instantaneous", perUnit(r.lineInstantVPerV(), 1.0, "V")),
                fact("Line regulation, at thermal equilibrium", perUnit(r.lineEquilibriumVPerV(), 1.0, "V")),
                fact("Load regulation, instantaneous", perUnit(r.loadInstantVPerA(), 1e-3, "mA")),
                fact("Load regulation, at thermal equilibrium", perUnit(r.loadEquilibriumVPerA(), 1e-3, "mA")),
                fact("Computed with the air at", HtmlFormat.temperature(r.tLocalK())));
    }

    /** A slope in volts per {@code per} of a unit, e.g. {@code 22.2 mV/V} or {@code -4.89 mV/mA}. */
    private static String perUnit(double voltsPerUnit, double per, String unit) {
        return HtmlFormat.si(voltsPerUnit * per, Dimension.VOLTAGE) + "/" + unit;
    }

    private static String runawayText(RunawayOnset o) {
        if (o.cause() != RunawayOnset.Cause.OWN) {
            String s = RunawayText.onset(o, HtmlFormat::temperature);
            return Character.toUpperCase(s.charAt(0)) + s.substring(1) + "; every corner has an operating point just"
                    + " below it.";
        }
        return o.atOrBelowSearch()
                ? "Thermal runaway already at the lowest ambient searched: it begins at or below "
                        + HtmlFormat.temperature(o.ambientK()) + "."
                : "Thermal runaway begins at an ambient of " + HtmlFormat.temperature(o.ambientK())
                        + "; every corner has an operating point just below it.";
    }

    private static HtmlView.Fact fact(String label, String value) {
        return new HtmlView.Fact(label, value);
    }
}
