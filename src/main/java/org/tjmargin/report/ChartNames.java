package org.tjmargin.report;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.regex.Pattern;
import org.tjmargin.solve.AnalysisResult;
import org.tjmargin.solve.PositionResult;

/**
 * File names of the charts: {@code <position>-<kind>} with the position's identifier reduced to
 * {@code [A-Za-z0-9_-]}, so that no identifier can leave the output directory or clash with the file system.
 *
 * <p>Every other character becomes {@code _}. Two identifiers that reduce to the same stem (e.g. {@code D1/A} and
 * {@code D1:A}) are kept apart by a suffix {@code -2}, {@code -3} … in board order; the comparison ignores case,
 * since some file systems do.
 */
public final class ChartNames {

    private static final Pattern SAFE = Pattern.compile("[A-Za-z0-9_-]+");
    /** Longest stem kept (chars): file names stay well under the 255-byte limit of common file systems. */
    static final int MAX_STEM = 80;

    private ChartNames() {
    }

    /** True when {@code name} is non-empty and only {@code [A-Za-z0-9_-]}. */
    public static boolean isSafe(String name) {
        return SAFE.matcher(name).matches();
    }

    /** An identifier reduced to {@code [A-Za-z0-9_-]}, at most {@value #MAX_STEM} characters, never empty. */
    public static String sanitise(String id) {
        StringBuilder sb = new StringBuilder(id.length());
        id.codePoints().forEach(c -> sb.append(c < 128 && (Character.isLetterOrDigit(c) || c == '-' || c == '_')
                ? (char) c : '_'));
        String s = sb.length() > MAX_STEM ? sb.substring(0, MAX_STEM) : sb.toString();
        return s.isEmpty() ? "position" : s;
    }

    /** The file-name stem of every position, in board order, unique ignoring case. */
    public static List<String> stems(AnalysisResult result) {
        List<String> out = new ArrayList<>();
        Set<String> taken = new HashSet<>();
        for (PositionResult p : result.positions()) {
            String base = sanitise(p.id());
            String stem = base;
            for (int n = 2; !taken.add(stem.toLowerCase(Locale.ROOT)); n++) {
                stem = base + "-" + n;
            }
            out.add(stem);
        }
        return out;
    }

    /** The base name of one chart: {@code <stem>-<suffix>}. */
    public static String baseName(String stem, ChartKind kind) {
        return stem + "-" + kind.suffix();
    }
}
