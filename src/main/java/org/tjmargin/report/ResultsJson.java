package org.tjmargin.report;

import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.util.Map;
import java.util.Optional;
import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.StreamWriteFeature;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.tjmargin.derating.Rule;
import org.tjmargin.derating.RuleCheck;
import org.tjmargin.solve.AnalysisResult;
import org.tjmargin.solve.BoardAtAmbient;
import org.tjmargin.solve.CornerPoint;
import org.tjmargin.solve.OperatingPoint;
import org.tjmargin.solve.PositionAtAmbient;
import org.tjmargin.solve.PositionResult;
import org.tjmargin.solve.PositionSpec;
import org.tjmargin.solve.ThermalOutcome;
import org.tjmargin.solve.WorstCheck;
import org.tjmargin.surge.PositionSurges;
import org.tjmargin.surge.SurgeCase;
import org.tjmargin.surge.SurgeRating;
import org.tjmargin.surge.SurgeResult;
import org.tjmargin.variation.statistical.PositionStatistics;
import org.tjmargin.variation.statistical.StatisticsResult;

/**
 * {@code results.json} (design section 4): per position the identifier, verdict, limiting rule, maximum ambient and,
 * for each ambient of the sweep, the hottest and the least-current corner with the quantities of design 2.3, every
 * rule at its worst corner; and every corner at the design's highest ambient. SI units with the unit in the key
 * ({@code tjC}, {@code powerW}, {@code currentA}, {@code voltageV}, {@code ambientC}); temperatures in °C.
 */
public final class ResultsJson {

    /**
     * The tree is built from plain nodes and written by {@link #write} through the streaming generator with its
     * default pretty printer: the text an {@code ObjectMapper} with {@code INDENT_OUTPUT} writes, without starting
     * the mapper (some three hundred classes, about a fifth of a second of a command-line run).
     */
    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;
    /**
     * Numbers as the shortest decimal that reads back as the same double (Schubfach, as {@code sweep.csv} writes
     * them, see {@link SweepCsv#num}): the same text on every Java version, where Java 17's {@code Double.toString}
     * sometimes writes a digit too many and is slow to compile and run.
     */
    private static final JsonFactory JSON = JsonFactory.builder().enable(StreamWriteFeature.USE_FAST_DOUBLE_WRITER)
            .build();

    private ResultsJson() {
    }

    /** Renders the whole result. */
    public static String render(AnalysisResult r, ReportInputs provenance) {
        return render(r, Optional.empty(), provenance);
    }

    /**
     * Renders the whole result with its statistics, when there are any: a top-level {@code statistics} object
     * with the run's budget, and a {@code statistics} object in every position ({@code null} without).
     */
    public static String render(AnalysisResult r, Optional<StatisticsResult> stats, ReportInputs provenance) {
        return render(r, stats, provenance, ReportDetail.all(r));
    }

    /**
     * As above, with the every-ambient {@code points} and {@code cornersAtMaxAmbient} only for the detailed positions
     * ({@code "detailed": true}). Every other position keeps its summary (verdict, limiting rule, worst margin,
     * maximum ambient, runaway onset, regulation, notes, surges) and {@code atMaxAmbient}, its hottest and
     * least-current corners at the design's highest ambient with the quantities of design 2.3;
     * {@code "pointsIn": "sweep.csv"} says where its every ambient is. On a board of a thousand positions and a
     * hundred ambients the points of all would make the file about 150 MB (sweep.csv holds the same corners in a
     * third of that). A top-level {@code detail} object says how many were detailed and how they were chosen.
     */
    public static String render(AnalysisResult r, Optional<StatisticsResult> stats, ReportInputs provenance,
                                ReportDetail detail) {
        StringWriter text = new StringWriter(1 << 20);
        try (JsonGenerator g = JSON.createGenerator(text)) {
            g.useDefaultPrettyPrinter();
            write(g, tree(r, stats, provenance, detail));
        } catch (IOException e) {
            // A StringWriter does not fail; an IOException here is a broken generator.
            throw new UncheckedIOException("results could not be rendered as JSON", e);
        }
        return text + "\n";
    }

    /** The whole result as a tree, before it is written. */
    static ObjectNode tree(AnalysisResult r, ReportInputs provenance) {
        return tree(r, Optional.empty(), provenance, ReportDetail.all(r));
    }

    /** The whole result with its statistics as a tree, before it is written; see {@link #render}. */
    static ObjectNode tree(AnalysisResult r, Optional<StatisticsResult> stats, ReportInputs provenance,
                           ReportDetail detail) {
        ObjectNode root = NODES.objectNode();
        root.putObject("tool").put("name", "tjmargin").put("version", provenance.toolVersion());
        root.put("design", r.board().name());
        root.put("verdict", r.verdict().name());
        ObjectNode amb = root.putObject("ambient");
        amb.put("minC", Labels.celsius(r.board().ambient().minK()));
        amb.put("maxC", Labels.celsius(r.board().ambient().maxK()));
        amb.put("points", r.board().ambient().points());
        r.enclosureRunaway().ifPresentOrElse(e -> {
            ObjectNode er = root.putObject("enclosureRunaway");
            er.put("onsetC", Labels.celsius(e.ambientK()));
            er.put("onsetAtOrBelow", e.atOrBelow());
            e.drivers().forEach(er.putArray("drivers")::add);
        }, () -> root.putNull("enclosureRunaway"));
        ObjectNode pol = root.putObject("policy");
        pol.put("name", r.policy().name());
        pol.put("provenance", r.policy().provenance());
        ArrayNode rules = pol.putArray("rules");
        for (Rule rule : r.policy().rules()) {
            rules.addObject().put("id", rule.id()).put("title", rule.title()).put("measure", rule.measure().name())
                    .put("bound", rule.bound().name()).put("limit", rule.limit().describe(rule.measure().isTemperature()))
                    .put("provenance", rule.provenance());
        }
        if (stats.isPresent()) {
            root.set("statistics", StatisticsJson.plan(NODES, stats.get().plan(),
                    r.positions().stream().map(PositionResult::id).toList()));
        } else {
            root.putNull("statistics");
        }
        root.putObject("detail").put("detailedPositions", detail.count()).put("limit", detail.limit())
                .put("positions", r.positions().size())
                .put("selection", "least margin, failing, runaway and unresolved first")
                .put("others", "summary and atMaxAmbient here; every ambient in sweep.csv");
        ArrayNode positions = root.putArray("positions");
        for (int i = 0; i < r.positions().size(); i++) {
            ObjectNode p = position(r, i, detail.isDetailed(i));
            PositionSpec spec = r.board().positions().get(i);
            Optional<PositionStatistics> ps = stats.flatMap(st -> st.of(spec.id()));
            if (ps.isPresent()) {
                p.set("statistics", StatisticsJson.position(NODES, spec, ps.get()));
            } else {
                p.putNull("statistics");
            }
            positions.add(p);
        }
        ArrayNode inputs = root.putArray("inputs");
        for (ReportInputs.InputDigest d : provenance.inputs()) {
            inputs.addObject().put("path", d.path()).put("sha256", d.sha256());
        }
        ArrayNode c = root.putArray("cautions");
        provenance.cautions().forEach(c::add);
        return root;
    }

    /** Writes a tree of the node kinds this class builds: objects, arrays, text, numbers, booleans and nulls. */
    static void write(JsonGenerator g, JsonNode n) throws IOException {
        switch (n.getNodeType()) {
            case OBJECT -> {
                g.writeStartObject();
                for (Map.Entry<String, JsonNode> e : n.properties()) {
                    g.writeFieldName(e.getKey());
                    write(g, e.getValue());
                }
                g.writeEndObject();
            }
            case ARRAY -> {
                g.writeStartArray();
                for (JsonNode e : n) {
                    write(g, e);
                }
                g.writeEndArray();
            }
            case STRING -> g.writeString(n.textValue());
            case NUMBER -> {
                switch (n.numberType()) {
                    case INT -> g.writeNumber(n.intValue());
                    case LONG -> g.writeNumber(n.longValue());
                    case DOUBLE -> g.writeNumber(n.doubleValue());
                    default -> throw new IllegalArgumentException("number node of type " + n.numberType());
                }
            }
            case BOOLEAN -> g.writeBoolean(n.booleanValue());
            case NULL -> g.writeNull();
            default -> throw new IllegalArgumentException("unexpected JSON node " + n.getNodeType());
        }
    }

    private static ObjectNode position(AnalysisResult r, int i, boolean detailed) {
        PositionResult pr = r.positions().get(i);
        PositionSpec spec = r.board().positions().get(i);
        ObjectNode o = NODES.objectNode();
        o.put("id", pr.id());
        o.put("detailed", detailed);
        o.put("part", spec.part().id());
        o.put("circuit", Labels.circuitKind(spec.circuit()));
        o.put("verdict", pr.verdict().name());
        o.put("limitingRule", pr.limitingRuleId());
        o.put("worstMargin", pr.worstMargin());
        o.put("worstAmbientC", Labels.celsius(pr.worstAmbientK()));
        o.put("maxAmbientStatus", pr.maxAmbient().status().name());
        if (pr.maxAmbient().status() == org.tjmargin.solve.MaximumAmbient.Status.NONE) {
            o.putNull("maxAmbientC");
        } else {
            o.put("maxAmbientC", Labels.celsius(pr.maxAmbient().ambientK()));
        }
        if (pr.runaway().isPresent()) {
            o.put("runawayOnsetC", Labels.celsius(pr.runaway().get().ambientK()));
            o.put("runawayOnsetAtOrBelow", pr.runaway().get().atOrBelowSearch());
            o.put("runawayCause", pr.runaway().get().cause().name());
        } else {
            o.putNull("runawayOnsetC");
        }
        pr.regulation().ifPresentOrElse(reg -> o.putObject("regulation")
                .put("lineInstantVPerV", reg.lineInstantVPerV())
                .put("lineEquilibriumVPerV", reg.lineEquilibriumVPerV())
                .put("loadInstantVPerA", reg.loadInstantVPerA())
                .put("loadEquilibriumVPerA", reg.loadEquilibriumVPerA())
                .put("tLocalC", Labels.celsius(reg.tLocalK())), () -> o.putNull("regulation"));
        ArrayNode notes = o.putArray("notes");
        pr.notes().forEach(notes::add);
        if (!detailed) {
            // Every ambient of this position is in sweep.csv; here the highest ambient's two reported corners.
            PositionAtAmbient top = r.atMaximumAmbient().positions().get(i);
            ObjectNode at = o.putObject("atMaxAmbient");
            at.put("ambientC", Labels.celsius(top.ambientK()));
            airOrNull(at, "tLocalC", r.atMaximumAmbient(), Labels.celsius(top.tLocalK()));
            at.put("status", top.status().name());
            at.put("margin", top.margin());
            at.put("limitingRule", top.limitingRuleId());
            top.hottest().ifPresent(c -> at.set("hottest", corner(c)));
            top.leastCurrent().ifPresent(c -> at.set("leastCurrent", corner(c)));
            o.put("pointsIn", "sweep.csv");
            o.set("surges", surges(r, i));
            return o;
        }
        ArrayNode points = o.putArray("points");
        for (BoardAtAmbient b : r.sweep()) {
            PositionAtAmbient p = b.positions().get(i);
            ObjectNode pt = points.addObject();
            pt.put("ambientC", Labels.celsius(p.ambientK()));
            airOrNull(pt, "tLocalC", b, Labels.celsius(p.tLocalK()));
            airOrNull(pt, "enclosureRiseK", b, b.enclosureRiseK());
            pt.put("status", p.status().name());
            pt.put("margin", p.margin());
            pt.put("limitingRule", p.limitingRuleId());
            p.hottest().ifPresent(c -> pt.set("hottest", corner(c)));
            p.leastCurrent().ifPresent(c -> pt.set("leastCurrent", corner(c)));
            ArrayNode checks = pt.putArray("rules");
            for (WorstCheck w : p.worst()) {
                checks.add(check(w.check(), p.corners().get(w.cornerIndex()).corner().label()));
            }
        }
        ArrayNode corners = o.putArray("cornersAtMaxAmbient");
        for (CornerPoint c : r.atMaximumAmbient().positions().get(i).corners()) {
            corners.add(corner(c));
        }
        o.set("surges", surges(r, i));
        return o;
    }

    /** An air temperature or rise at {@code b}'s ambient; null where the air has no balance there. */
    private static void airOrNull(ObjectNode o, String key, BoardAtAmbient b, double value) {
        if (b.airBalanced()) {
            o.put(key, value);
        } else {
            o.putNull(key);
        }
    }

    /**
     * Every surge of the position: its test, and its result at the worst corner at the design's highest ambient,
     * with the thermal-model caution (reference 3.3) beside each verdict.
     */
    private static ArrayNode surges(AnalysisResult r, int i) {
        ArrayNode out = NODES.arrayNode();
        PositionSpec spec = r.board().positions().get(i);
        if (spec.surges().isEmpty()) {
            return out;
        }
        PositionSurges ps = spec.surges().get();
        SurgeRating rating = ps.rating();
        PositionAtAmbient hot = r.atMaximumAmbient().positions().get(i);
        for (SurgeCase c : ps.cases()) {
            ObjectNode s = out.addObject();
            s.put("id", c.id());
            s.put("description", c.description());
            s.put("pulseCount", c.pulseCount());
            if (c.pulseCount() > 1) {
                s.put("periodS", c.periodS());
            } else {
                s.putNull("periodS");
            }
            if (c.protectedLimitV().isPresent()) {
                s.put("protectedLimitV", c.protectedLimitV().getAsDouble());
            } else {
                s.putNull("protectedLimitV");
            }
            s.put("ratedPeakPowerW", rating.ratedPeakPowerW());
            s.put("ratedPulseHalfValueS", rating.ratedPulse().widthS());
            s.put("pulseTjMaxC", Labels.celsius(rating.pulseTjMaxK()));
            s.put("thermalNetwork", rating.networkSource().name());
            Optional<CornerPoint> worst = hot.worstCornerForSurge(c.id(), spec.part().ratings().tjMaxK());
            if (worst.isPresent()) {
                SurgeResult sr = worst.get().surge(c.id()).orElseThrow();
                ObjectNode w = s.putObject("atMaxAmbient");
                w.put("ambientC", Labels.celsius(hot.ambientK()));
                w.put("corner", worst.get().corner().label());
                surgeResult(w, sr);
            } else {
                s.putNull("atMaxAmbient");
            }
            s.put("caution", SurgeResult.THERMAL_MODEL_CAUTION);
        }
        return out;
    }

    private static void surgeResult(ObjectNode w, SurgeResult sr) {
        w.put("startTjC", Labels.celsius(sr.startTjK()));
        w.put("peakTjC", Labels.celsius(sr.peakJunctionTemperatureK()));
        w.put("peakTjTimeS", sr.pulse().peakJunctionTimeS());
        w.put("peakCurrentA", sr.peakCurrentA());
        w.put("peakClampVoltageV", sr.peakClampVoltageV());
        w.put("peakPowerW", sr.peakPowerW());
        w.put("energyJ", sr.energyJ());
        w.put("chargeC", sr.pulse().chargeC());
        w.put("actionIntegralA2s", sr.pulse().actionIntegralA2s());
        if (sr.pulseCount() > 1) {
            w.put("averagePowerW", sr.averagePowerW());
        } else {
            w.putNull("averagePowerW");
        }
        w.put("convertedRatingW", sr.rating().peakPowerW());
        w.put("conversionMethod", sr.rating().method().name());
        w.put("appliedPulseHalfValueS", sr.rating().appliedPulse().widthS());
        w.put("deratingFactor", sr.deratingFactor());
        w.put("allowedPeakPowerW", sr.allowedPeakPowerW());
        w.put("powerRatio", sr.powerRatio());
        if (sr.clampVoltageRatio().isPresent()) {
            w.put("clampVoltageRatio", sr.clampVoltageRatio().getAsDouble());
        } else {
            w.putNull("clampVoltageRatio");
        }
        w.put("estimated", sr.estimated());
        w.put("steps", sr.pulse().steps());
        if (sr.stopped().isPresent()) {
            w.put("stopped", sr.stopped().get().name());
        } else {
            w.putNull("stopped");
        }
    }

    private static ObjectNode check(RuleCheck c, String corner) {
        boolean t = c.measure().isTemperature();
        ObjectNode o = NODES.objectNode();
        o.put("rule", c.ruleId());
        o.put("measure", c.measure().name());
        o.put("bound", c.bound().name());
        o.put("actual", t ? Labels.celsius(c.actual()) : c.actual());
        o.put("limit", t ? Labels.celsius(c.limit()) : c.limit());
        o.put("unit", t ? "°C" : c.measure().unit());
        o.put("margin", c.margin());
        o.put("difference", c.difference());
        o.put("differenceUnit", t ? "K" : c.measure().unit());
        o.put("corner", corner);
        return o;
    }

    /** One corner's point with the quantities of design 2.3. */
    static ObjectNode corner(CornerPoint c) {
        ObjectNode o = NODES.objectNode();
        o.put("corner", c.corner().label());
        o.put("status", c.status().name());
        if (c.outcome() instanceof ThermalOutcome.Converged conv) {
            OperatingPoint p = conv.point();
            o.put("tjC", Labels.celsius(p.tjK()));
            o.put("tLocalC", Labels.celsius(p.tLocalK()));
            o.put("referenceC", Labels.celsius(p.referenceK()));
            o.put("voltageV", p.circuit().voltageV());
            o.put("currentA", p.circuit().diodeCurrentA());
            o.put("powerW", p.diodePowerW());
            o.put("resistorPowerW", p.circuit().resistorPowerW());
            o.put("loadCurrentA", p.circuit().loadCurrentA());
            o.put("region", p.circuit().region().name());
            o.put("allowedPowerW", c.allowedPowerW());
            o.put("iterations", p.evaluations());
            o.put("loopGain", p.loopGain());
            o.put("residualK", p.residualK());
            if (!c.surges().isEmpty()) {
                ArrayNode surges = o.putArray("surges");
                for (SurgeResult sr : c.surges()) {
                    ObjectNode so = surges.addObject().put("id", sr.caseId());
                    surgeResult(so, sr);
                }
            }
        } else if (c.outcome() instanceof ThermalOutcome.NotConverged n) {
            o.put("lastTjC", Labels.celsius(n.lastTjK()));
            o.put("residualK", n.residualK());
            o.put("iterations", n.evaluations());
        }
        return o;
    }
}
