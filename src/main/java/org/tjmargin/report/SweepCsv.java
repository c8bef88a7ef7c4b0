package org.tjmargin.report;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.List;
import com.fasterxml.jackson.core.io.NumberOutput;
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

    private static final CSVFormat FORMAT = CSVFormat.RFC4180;

    private SweepCsv() {
    }

    /**
     * Renders the sweep. The ambients are rendered on all cores, each into its own buffer, and joined in order: the
     * text is the one a single printer writes (a board of a thousand positions has two hundred thousand rows).
     */
    public static String render(AnalysisResult r) {
        StringBuilder out = new StringBuilder();
        try (CSVPrinter csv = new CSVPrinter(out, FORMAT.builder().setHeader(HEADER).get())) {
            csv.flush();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        List<String> parts = r.sweep().parallelStream().map(SweepCsv::rows).toList();
        int length = out.length() + parts.stream().mapToInt(String::length).sum();
        StringBuilder all = new StringBuilder(length).append(out);
        parts.forEach(all::append);
        return all.toString();
    }

    /** The rows of one ambient, without the header. */
    private static String rows(BoardAtAmbient b) {
        StringBuilder out = new StringBuilder(256 * 2 * b.positions().size());
        try (CSVPrinter csv = new CSVPrinter(out, FORMAT)) {
            for (PositionAtAmbient p : b.positions()) {
                boolean same = p.hottestIndex() == p.leastCurrentIndex();
                if (p.hottest().isPresent()) {
                    row(csv, b, p, same ? "hottest,least-current" : "hottest", p.hottest().get());
                }
                if (!same && p.leastCurrent().isPresent()) {
                    row(csv, b, p, "least-current", p.leastCurrent().get());
                }
            }
        } catch (IOException e) {
            // A StringBuilder does not fail.
            throw new UncheckedIOException(e);
        }
        return out.toString();
    }

    private static void row(CSVPrinter csv, BoardAtAmbient b, PositionAtAmbient p, String role, CornerPoint c)
            throws IOException {
        OperatingPoint op = c.point().orElse(null);
        csv.printRecord(p.positionId(), num(Labels.celsius(p.ambientK())), num(Labels.celsius(p.tLocalK())),
                num(b.enclosureRiseK()), c.status().name(), num(p.margin()), p.limitingRuleId(), role,
                c.corner().label(),
                op == null ? "" : num(Labels.celsius(op.tjK())), op == null ? "" : num(Labels.celsius(op.referenceK())),
                op == null ? "" : num(op.circuit().voltageV()), op == null ? "" : num(op.circuit().diodeCurrentA()),
                op == null ? "" : num(op.diodePowerW()), op == null ? "" : num(op.circuit().resistorPowerW()),
                num(c.allowedPowerW()), op == null ? "" : num(op.loopGain()), op == null ? "" : op.evaluations());
    }

    /**
     * A number as the shortest decimal that reads back as the same double (the Schubfach algorithm, R. Giulietti,
     * "The Schubfach way to render doubles", 2020, as Jackson ships it; Java 19 and later use the same in
     * {@code Double.toString}). Java 17's {@code Double.toString} sometimes writes a digit more than needed
     * ({@code 0.0020} for 2e-3) and is several times slower, which shows on the two hundred thousand rows of a
     * large board.
     */
    static String num(double v) {
        return NumberOutput.toString(v, true);
    }
}
