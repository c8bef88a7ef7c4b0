package org.tjmargin.report;

import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.tjmargin.solve.AnalysisResult;
import org.tjmargin.solve.BoardAtAmbient;
import org.tjmargin.solve.CornerPoint;
import org.tjmargin.solve.OperatingPoint;
import org.tjmargin.solve.PositionAtAmbient;

/**
 * {@code sweep.csv}: one row per position, ambient and reported corner (the hottest and the least-current), for
 * spreadsheets and plotting. Units in the column names; temperatures in °C. Quoting by Commons CSV (RFC 4180).
 */
public final class SweepCsv {

    /** The header, in order. */
    public static final String[] HEADER = {"position", "ambientC", "tLocalC", "enclosureRiseK", "status", "margin",
        "limitingRule", "cornerRole", "corner", "tjC", "referenceC", "voltageV", "currentA", "powerW",
        "resistorPowerW", "allowedPowerW", "loopGain", "iterations"};

    private SweepCsv() {
    }

    /** Renders the sweep. */
    public static String render(AnalysisResult r) {
        StringWriter out = new StringWriter();
        try (CSVPrinter csv = new CSVPrinter(out, CSVFormat.RFC4180.builder().setHeader(HEADER).get())) {
            for (BoardAtAmbient b : r.sweep()) {
                for (PositionAtAmbient p : b.positions()) {
                    boolean same = p.hottestIndex() == p.leastCurrentIndex();
                    if (p.hottest().isPresent()) {
                        row(csv, b, p, same ? "hottest,least-current" : "hottest", p.hottest().get());
                    }
                    if (!same && p.leastCurrent().isPresent()) {
                        row(csv, b, p, "least-current", p.leastCurrent().get());
                    }
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out.toString();
    }

    private static void row(CSVPrinter csv, BoardAtAmbient b, PositionAtAmbient p, String role, CornerPoint c)
            throws IOException {
        OperatingPoint op = c.point().orElse(null);
        csv.printRecord(p.positionId(), Labels.celsius(p.ambientK()), Labels.celsius(p.tLocalK()), b.enclosureRiseK(),
                c.status().name(), p.margin(), p.limitingRuleId(), role, c.corner().label(),
                op == null ? "" : Labels.celsius(op.tjK()), op == null ? "" : Labels.celsius(op.referenceK()),
                op == null ? "" : op.circuit().voltageV(), op == null ? "" : op.circuit().diodeCurrentA(),
                op == null ? "" : op.diodePowerW(), op == null ? "" : op.circuit().resistorPowerW(),
                c.allowedPowerW(), op == null ? "" : op.loopGain(), op == null ? "" : op.evaluations());
    }
}
