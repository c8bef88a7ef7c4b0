package org.tjmargin.report;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import com.fasterxml.jackson.core.io.NumberOutput;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.tjmargin.solve.AnalysisResult;
import org.tjmargin.solve.BoardAtAmbient;
import org.tjmargin.solve.CornerPoint;
import org.tjmargin.solve.OperatingPoint;
import org.tjmargin.solve.PositionAtAmbient;
import org.tjmargin.variation.Corner;

/**
 * {@code sweep.csv}: one row per position, ambient and reported corner (the hottest and the least-current), for
 * spreadsheets and plotting. Units in the column names; temperatures in °C. Quoting by Commons CSV (RFC 4180).
 * Where the enclosure air has no balance (it runs away), {@code tLocalC} and {@code enclosureRiseK} are empty and
 * every position's rows say {@code RUNAWAY}.
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
     * ambients are rendered on all cores, each into its own buffer: the text is the one a single Commons CSV printer
     * writes (a board of a thousand positions has two hundred thousand rows, some 50 MB, which are never held
     * joined).
     *
     * <p>The rows are written as bytes, not through a printer into a string: text fields (position, status, rule,
     * role, corner) go through Commons CSV's own RFC 4180 quoting once per distinct text and are then reused as
     * UTF-8 bytes, numbers are ASCII and never need quotes ({@code SweepCsvNumberTest}). Through a printer each row
     * cost some 5 kB of garbage (a UTF-16 buffer, since the corner labels hold non-Latin-1 signs, copied into a
     * string and encoded again; a delimiter array per value), a gigabyte on a thousand positions, which a cold JVM
     * pays for in fresh heap pages. {@code SweepCsvTest} holds the bytes equal to the printer's.
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
        Texts texts = new Texts();
        pieces.addAll(r.sweep().parallelStream().map(b -> rows(b, texts)).toList());
        return pieces;
    }

    /** The rows of one ambient, without the header, as UTF-8. */
    private static byte[] rows(BoardAtAmbient b, Texts texts) {
        Utf8Rows out = new Utf8Rows(300 * 2 * b.positions().size());
        // The ambient, the enclosure's rise and (in a sealed box) the air are the same on every row of an ambient:
        // each is written once and its text reused.
        Repeated ambient = new Repeated();
        Repeated air = new Repeated();
        // Air without a balance has no temperature: both fields stay empty (BoardAtAmbient#airBalanced).
        boolean balanced = b.airBalanced();
        String rise = balanced ? num(b.enclosureRiseK()) : "";
        for (PositionAtAmbient p : b.positions()) {
            boolean same = p.hottestIndex() == p.leastCurrentIndex();
            String amb = ambient.num(Labels.celsius(p.ambientK()));
            String local = balanced ? air.num(Labels.celsius(p.tLocalK())) : "";
            if (p.hottest().isPresent()) {
                row(out, texts, amb, local, rise, p, same ? "hottest,least-current" : "hottest", p.hottest().get());
            }
            if (!same && p.leastCurrent().isPresent()) {
                row(out, texts, amb, local, rise, p, "least-current", p.leastCurrent().get());
            }
        }
        return out.toByteArray();
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

    private static void row(Utf8Rows out, Texts texts, String ambientC, String tLocalC, String riseK,
                            PositionAtAmbient p, String role, CornerPoint c) {
        OperatingPoint op = c.point().orElse(null);
        out.bytes(texts.first(p.positionId()));
        out.number(ambientC);
        out.number(tLocalC);
        out.number(riseK);
        out.text(texts.later(c.status().name()));
        out.number(num(p.margin()));
        out.text(texts.later(p.limitingRuleId()));
        out.text(texts.later(role));
        out.text(texts.label(c.corner()));
        if (op == null) {
            // No operating point: its six quantities empty, the allowed power, then loop gain and iterations empty.
            byte[] empty = texts.later("");
            for (int f = 0; f < 6; f++) {
                out.text(empty);
            }
            out.number(num(c.allowedPowerW()));
            out.text(empty);
            out.text(empty);
        } else {
            out.number(num(Labels.celsius(op.tjK())));
            out.number(num(Labels.celsius(op.referenceK())));
            out.number(num(op.circuit().voltageV()));
            out.number(num(op.circuit().diodeCurrentA()));
            out.number(num(op.diodePowerW()));
            out.number(num(op.circuit().resistorPowerW()));
            out.number(num(c.allowedPowerW()));
            out.number(num(op.loopGain()));
            out.integer(op.evaluations());
        }
        out.endRecord();
    }

    /**
     * Text fields as Commons CSV prints them (RFC 4180, minimal quoting), each distinct text quoted and encoded
     * once. The printer's quoting depends on whether a field starts its record (an empty first field, or one that
     * starts with some signs, is quoted there and not later), so the two places are kept apart. Thread-safe: the
     * ambients' pieces share it.
     */
    private static final class Texts {
        private final Map<String, byte[]> first = new ConcurrentHashMap<>();
        private final Map<String, byte[]> later = new ConcurrentHashMap<>();
        private final Map<Corner, byte[]> labels = new ConcurrentHashMap<>();

        /** {@code s} as the first field of a record. */
        byte[] first(String s) {
            return first.computeIfAbsent(s, k -> printed(k, true));
        }

        /** {@code s} as a field after the first, without its delimiter. */
        byte[] later(String s) {
            return later.computeIfAbsent(s, k -> printed(k, false));
        }

        /** A corner's label as a field after the first. */
        byte[] label(Corner c) {
            return labels.computeIfAbsent(c, k -> later(k.label()));
        }

        private static byte[] printed(String s, boolean newRecord) {
            StringBuilder sb = new StringBuilder();
            try {
                FORMAT.print(s, sb, newRecord);
            } catch (IOException e) {
                // A StringBuilder does not fail.
                throw new UncheckedIOException(e);
            }
            // After the first field the printer writes the delimiter first; the row writer writes its own.
            String field = newRecord ? sb.toString() : sb.substring(1);
            return field.getBytes(StandardCharsets.UTF_8);
        }
    }

    /** A growing UTF-8 buffer of records: fields after the first are preceded by the RFC 4180 delimiter. */
    private static final class Utf8Rows {
        private byte[] buf;
        private int size;

        Utf8Rows(int capacity) {
            buf = new byte[Math.max(64, capacity)];
        }

        /** The first field, already quoted and encoded. */
        void bytes(byte[] b) {
            room(b.length);
            System.arraycopy(b, 0, buf, size, b.length);
            size += b.length;
        }

        /** A later field, already quoted and encoded. */
        void text(byte[] b) {
            room(1 + b.length);
            buf[size++] = ',';
            System.arraycopy(b, 0, buf, size, b.length);
            size += b.length;
        }

        /** A later field holding a number's text (ASCII, never quoted). */
        void number(String s) {
            int n = s.length();
            room(1 + n);
            buf[size++] = ',';
            for (int i = 0; i < n; i++) {
                buf[size++] = (byte) s.charAt(i);
            }
        }

        /** A later field holding a whole number. */
        void integer(int v) {
            room(12);
            buf[size++] = ',';
            size = NumberOutput.outputInt(v, buf, size);
        }

        /** The RFC 4180 record separator. */
        void endRecord() {
            room(2);
            buf[size++] = '\r';
            buf[size++] = '\n';
        }

        byte[] toByteArray() {
            return Arrays.copyOf(buf, size);
        }

        private void room(int n) {
            if (size + n > buf.length) {
                buf = Arrays.copyOf(buf, Math.max(buf.length * 2, size + n));
            }
        }
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
