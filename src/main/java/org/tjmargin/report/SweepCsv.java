package org.tjmargin.report;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
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
     * Renders the sweep as text: the pieces of {@link #renderUtf8(AnalysisResult)} joined and read back.
     */
    public static String render(AnalysisResult r) {
        List<byte[]> pieces = renderUtf8(r);
        int length = pieces.stream().mapToInt(b -> b.length).sum();
        ByteArrayOutputStream all = new ByteArrayOutputStream(length);
        pieces.forEach(all::writeBytes);
        return all.toString(StandardCharsets.UTF_8);
    }

    /**
     * Renders the sweep as UTF-8, the header and then one piece per ambient, to be written one after another. The
     * ambients are rendered on all cores, each into its own buffer: the text is the one a single printer writes (a
     * board of a thousand positions has two hundred thousand rows, some 50 MB, which are never held joined).
     */
    public static List<byte[]> renderUtf8(AnalysisResult r) {
        StringBuilder out = new StringBuilder();
        try (CSVPrinter csv = new CSVPrinter(out, FORMAT.builder().setHeader(HEADER).get())) {
            csv.flush();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        List<byte[]> pieces = new ArrayList<>(r.sweep().size() + 1);
        pieces.add(out.toString().getBytes(StandardCharsets.UTF_8));
        pieces.addAll(r.sweep().parallelStream().map(b -> rows(b).getBytes(StandardCharsets.UTF_8)).toList());
        return pieces;
    }

    /** The rows of one ambient, without the header. */
    private static String rows(BoardAtAmbient b) {
        StringBuilder out = new StringBuilder(256 * 2 * b.positions().size());
        try (CSVPrinter csv = new CSVPrinter(out, FORMAT)) {
            // The ambient, the enclosure's rise and (in a sealed box) the air are the same on every row of an
            // ambient: each is written once and its text reused.
            Repeated ambient = new Repeated();
            Repeated air = new Repeated();
            String rise = num(b.enclosureRiseK());
            for (PositionAtAmbient p : b.positions()) {
                boolean same = p.hottestIndex() == p.leastCurrentIndex();
                String amb = ambient.num(Labels.celsius(p.ambientK()));
                String local = air.num(Labels.celsius(p.tLocalK()));
                if (p.hottest().isPresent()) {
                    row(csv, amb, local, rise, p, same ? "hottest,least-current" : "hottest", p.hottest().get());
                }
                if (!same && p.leastCurrent().isPresent()) {
                    row(csv, amb, local, rise, p, "least-current", p.leastCurrent().get());
                }
            }
        } catch (IOException e) {
            // A StringBuilder does not fail.
            throw new UncheckedIOException(e);
        }
        return out.toString();
    }

    /** The text of the last number written, reused while the same number comes again. */
    private static final class Repeated {
        private double last = Double.NaN;
        private String text;

        String num(double v) {
            if (text == null || Double.doubleToRawLongBits(v) != Double.doubleToRawLongBits(last)) {
                last = v;
                text = SweepCsv.num(v);
            }
            return text;
        }
    }

    private static void row(CSVPrinter csv, String ambientC, String tLocalC, String riseK, PositionAtAmbient p,
                            String role, CornerPoint c) throws IOException {
        OperatingPoint op = c.point().orElse(null);
        csv.printRecord(p.positionId(), ambientC, tLocalC, riseK, c.status().name(), num(p.margin()),
                p.limitingRuleId(), role, c.corner().label(),
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
