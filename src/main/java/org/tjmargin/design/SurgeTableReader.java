package org.tjmargin.design;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.tjmargin.surge.SurgeQuantity;
import org.tjmargin.surge.TabulatedWaveform;
import org.tjmargin.units.Dimension;
import org.tjmargin.units.Quantities;
import org.tjmargin.units.QuantityException;

/**
 * Reads a user's surge waveform table: a comma-separated text file whose first line names the two columns with
 * their units in parentheses, {@code time (µs), current (A)} or {@code time (ms), voltage (V)}, followed by one
 * row of two plain numbers per line (blank lines and lines starting with {@code #} are skipped). Time must rise
 * strictly and every value be finite. Every problem is reported with the table's file, line and column.
 */
final class SurgeTableReader {

    private SurgeTableReader() {
    }

    /**
     * Reads the table named at {@code at} in the design.
     *
     * @param ctx  the design file's context (problems are reported there and in the table's own name)
     * @param at   the node naming the file
     * @param path the field path of that node
     * @param file the table file, resolved against the design's folder
     */
    static Optional<TabulatedWaveform> read(FileContext ctx, Node at, String path, Path file) {
        String name = file.normalize().toString();
        List<String> lines;
        try {
            byte[] bytes = Files.readAllBytes(file);
            ctx.problems().readAlso(new InputFile(file.normalize(), SourceFile.sha256Of(bytes)));
            lines = new String(bytes, StandardCharsets.UTF_8).lines().toList();
        } catch (NoSuchFileException e) {
            ctx.report(InputProblem.Kind.FILE_NOT_FOUND, at, path, "no such file: " + name);
            return Optional.empty();
        } catch (IOException e) {
            ctx.report(InputProblem.Kind.FILE_NOT_FOUND, at, path, "cannot read " + name + ": " + e.getMessage());
            return Optional.empty();
        }
        FileContext table = ctx.problems().contextFor(name);
        int headerLine = -1;
        for (int i = 0; i < lines.size(); i++) {
            if (!skip(lines.get(i))) {
                headerLine = i;
                break;
            }
        }
        if (headerLine < 0) {
            table.report(InputProblem.Kind.SYNTAX, 1, 1, "", "the table is empty: expected a header such as "
                    + "'time (µs), current (A)' and rows of numbers");
            return Optional.empty();
        }
        String[] head = lines.get(headerLine).split(",", -1);
        if (head.length != 2) {
            table.report(InputProblem.Kind.SYNTAX, headerLine + 1, 1, "header", "expected two columns, time and "
                    + "current or voltage, got " + head.length);
            return Optional.empty();
        }
        Optional<Double> timeScale = unitOf(table, headerLine, 1, head[0], "time", Dimension.TIME);
        SurgeQuantity quantity = head[1].trim().startsWith("voltage") ? SurgeQuantity.VOLTAGE : SurgeQuantity.CURRENT;
        int col2 = head[0].length() + 2 + leading(head[1]);
        Optional<Double> valueScale = unitOf(table, headerLine, col2, head[1],
                quantity == SurgeQuantity.VOLTAGE ? "voltage" : "current",
                quantity == SurgeQuantity.VOLTAGE ? Dimension.VOLTAGE : Dimension.CURRENT);
        if (timeScale.isEmpty() || valueScale.isEmpty()) {
            return Optional.empty();
        }
        List<double[]> rows = new ArrayList<>();
        boolean ok = true;
        for (int i = headerLine + 1; i < lines.size(); i++) {
            String line = lines.get(i);
            if (skip(line)) {
                continue;
            }
            String[] cells = line.split(",", -1);
            if (cells.length != 2) {
                table.report(InputProblem.Kind.SYNTAX, i + 1, 1, "row", "expected two numbers, got " + cells.length
                        + " cells");
                ok = false;
                continue;
            }
            int c2 = cells[0].length() + 2 + leading(cells[1]);
            Optional<Double> t = number(table, i, 1 + leading(cells[0]), cells[0], "time");
            Optional<Double> v = number(table, i, c2, cells[1], quantity == SurgeQuantity.VOLTAGE ? "voltage" : "current");
            if (t.isEmpty() || v.isEmpty()) {
                ok = false;
                continue;
            }
            double ts = t.get() * timeScale.get();
            if (!rows.isEmpty() && !(ts > rows.get(rows.size() - 1)[0])) {
                table.report(InputProblem.Kind.INCONSISTENT, i + 1, 1, "time", "time must rise strictly: "
                        + cells[0].trim() + " follows a time at or after it");
                ok = false;
                continue;
            }
            rows.add(new double[] {ts, v.get() * valueScale.get()});
        }
        if (!ok) {
            return Optional.empty();
        }
        if (rows.size() < 2) {
            table.report(InputProblem.Kind.MISSING_FIELD, headerLine + 1, 1, "rows", "a waveform table needs at "
                    + "least two rows, has " + rows.size());
            return Optional.empty();
        }
        double[] ts = rows.stream().mapToDouble(r -> r[0]).toArray();
        double[] vs = rows.stream().mapToDouble(r -> r[1]).toArray();
        try {
            return Optional.of(new TabulatedWaveform(ts, vs, quantity));
        } catch (RuntimeException e) {
            table.report(InputProblem.Kind.INCONSISTENT, headerLine + 1, 1, "rows", e.getMessage());
            return Optional.empty();
        }
    }

    /** Blanks before a cell's text, so that columns point at the text itself. */
    private static int leading(String cell) {
        int n = 0;
        while (n < cell.length() && Character.isWhitespace(cell.charAt(n))) {
            n++;
        }
        return n;
    }

    private static boolean skip(String line) {
        String t = line.trim();
        return t.isEmpty() || t.startsWith("#");
    }

    /** The SI factor of a header cell such as {@code time (µs)}: the value of one unit in SI. */
    private static Optional<Double> unitOf(FileContext table, int line, int column, String cell, String expected,
                                           Dimension d) {
        String c = cell.trim();
        int open = c.indexOf('(');
        int close = c.lastIndexOf(')');
        if (!c.startsWith(expected) || open < 0 || close < open) {
            table.report(InputProblem.Kind.SYNTAX, line + 1, column, "header", "expected '" + expected
                    + " (unit)', e.g. '" + expected + " (" + (d == Dimension.TIME ? "µs" : d.symbol()) + ")', got '"
                    + c + "'");
            return Optional.empty();
        }
        try {
            return Optional.of(Quantities.parse("1 " + c.substring(open + 1, close).trim(), d));
        } catch (QuantityException e) {
            table.report(InputProblem.Kind.WRONG_DIMENSION, line + 1, column, "header", "the " + expected
                    + " column's unit: " + e.getMessage());
            return Optional.empty();
        }
    }

    private static Optional<Double> number(FileContext table, int line, int column, String cell, String field) {
        try {
            double v = Double.parseDouble(cell.trim());
            if (Double.isFinite(v)) {
                return Optional.of(v);
            }
            table.report(InputProblem.Kind.NOT_PHYSICAL, line + 1, column, field, "must be finite, got '"
                    + cell.trim() + "'");
        } catch (NumberFormatException e) {
            table.report(InputProblem.Kind.BAD_QUANTITY, line + 1, column, field, "not a number: '" + cell.trim()
                    + "' (the unit belongs in the header)");
        }
        return Optional.empty();
    }
}
