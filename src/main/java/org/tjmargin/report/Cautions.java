package org.tjmargin.report;

import java.util.ArrayList;
import java.util.List;
import org.tjmargin.circuit.ShuntRegulatorSpec;
import org.tjmargin.circuit.StandoffClampSpec;
import org.tjmargin.device.BreakdownPart;
import org.tjmargin.solve.AnalysisResult;
import org.tjmargin.solve.BoardAtAmbient;
import org.tjmargin.solve.PositionAtAmbient;
import org.tjmargin.solve.PositionSpec;

/**
 * The safety cautions an analysis must carry, chosen from what the results show. Worded for this tool; the
 * substance follows general practice for hot components, clamps and mains or high-energy inputs (IEC 62368-1
 * hazard-based safety; IEC 61643-321 for avalanche breakdown diodes; from memory, verify clauses against the
 * editions at hand). They always defer to the product's safety standard, local codes and licensed practice.
 */
public final class Cautions {

    /** Junction temperature above which a hot-surface caution is given (°C): skin burns and board charring become
     * possible well below a diode's Tj max (common practice, no single source; apply the touch limits of the
     * product standard, e.g. IEC 62368-1 clause 9). */
    public static final double HOT_SURFACE_C = 100.0;

    /** Supply or line voltage from which the mains/high-energy caution is given (V): 60 V DC, the usual upper
     * bound of the lowest electrical energy class for DC in hazard-based standards (IEC 62368-1, ES1; from memory,
     * verify). */
    public static final double HIGH_VOLTAGE_V = 60.0;

    /** Positions a caution names before it counts the rest (the report's table and results.json list them all). */
    static final int LISTED_IDS = 12;

    private Cautions() {
    }

    /** The general cautions every output carries. */
    public static List<String> general() {
        return List.of(
                "These results are engineering estimates from a thermal and electrical model. Confirm them by "
                        + "measurement on the real board in its enclosure (junction temperature by the diode's own "
                        + "voltage, or lead and body temperatures with fine thermocouples) before relying on them.",
                "This tool does not replace the product's safety standard, local electrical codes, or the judgement "
                        + "of a qualified, licensed professional. Where they differ from these results, they govern.");
    }

    /** Every caution for this result: the general ones and those its positions call for. */
    public static List<String> forResult(AnalysisResult r) {
        List<String> out = new ArrayList<>();
        BoardAtAmbient hottest = r.atMaximumAmbient();
        List<String> hot = new ArrayList<>();
        for (PositionAtAmbient p : hottest.positions()) {
            p.hottest().flatMap(c -> c.point()).ifPresent(op -> {
                if (Labels.celsius(op.tjK()) > HOT_SURFACE_C) {
                    hot.add(p.positionId());
                }
            });
            if (p.status() != org.tjmargin.solve.PointStatus.CONVERGED) {
                hot.add(p.positionId());
            }
        }
        if (!hot.isEmpty()) {
            out.add("Hot surface: at the highest ambient the junction of " + Labels.ids(hot, LISTED_IDS) + " runs above "
                    + (int) HOT_SURFACE_C + " °C. The part's body and leads get nearly as hot: they can burn skin "
                    + "and char or discolour the board. Keep them clear of touchable surfaces, plastics and cables, "
                    + "and apply the touch-temperature limits of the product standard.");
        }
        r.enclosureRunaway().ifPresent(e -> out.add("Enclosure runaway: " + RunawayText.enclosure(e, LISTED_IDS)
                + ". In such a box the parts, the board and the box's inner surfaces keep heating until a part fails"
                + " (a clamp usually short) or something opens; the result is a fire and burn hazard, not a slow"
                + " derating. Keep the product's ambient well below this limit, or give the box more surface or"
                + " venting, or the board less heat; where the limit can be reached in service, a thermal cut-out"
                + " chosen under the product's safety standard is the last line."));
        boolean clamps = false;
        boolean highVoltage = false;
        for (PositionSpec s : r.board().positions()) {
            if (s.part().kind() == BreakdownPart.Kind.TVS || s.circuit() instanceof StandoffClampSpec) {
                clamps = true;
            }
            double v = s.circuit() instanceof ShuntRegulatorSpec sr ? sr.supplyV().hi()
                    : s.circuit() instanceof StandoffClampSpec c ? c.lineV().hi() : 0.0;
            if (v >= HIGH_VOLTAGE_V) {
                highVoltage = true;
            }
        }
        if (clamps) {
            out.add("Clamp failure: an overstressed avalanche clamp usually fails short; a very large, very fast "
                    + "transient can blow it open, and a degraded part leaks more, worst when hot. A shorted clamp "
                    + "across a supply becomes a short on that supply: fuse or current-limit the line so that the "
                    + "fault clears before tracks, the clamp or the series resistor overheat, while normal surges "
                    + "(their I²t) pass. The part alone cannot be called fail-safe.");
        }
        List<String> surged = r.board().positions().stream().filter(s -> s.surges().isPresent()).map(PositionSpec::id).toList();
        if (!surged.isEmpty()) {
            out.add("Surges (" + Labels.ids(surged, LISTED_IDS) + "): " + org.tjmargin.surge.SurgeResult.THERMAL_MODEL_CAUTION);
        }
        if (highVoltage) {
            out.add("Mains or high-energy input: a supply or line of " + (int) HIGH_VOLTAGE_V + " V or more is in "
                    + "this design. Work on it only de-energised, follow the product safety standard for insulation, "
                    + "creepage and clearance, and have clamps across mains or from line to earth reviewed against "
                    + "that standard: temporary overvoltages can hold them in conduction for seconds.");
        }
        out.addAll(general());
        return out;
    }
}
