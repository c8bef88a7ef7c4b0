package org.tjmargin.report;

import java.util.Arrays;
import java.util.Objects;

/**
 * One chart drawn twice, as PNG bytes and as an SVG element, not yet written anywhere: whoever writes the output
 * directory names the files {@link #pngFileName()} and {@link #svgFileName()}.
 *
 * <p>The PNG array is copied in and out, so the record is immutable.
 *
 * @param baseName file name without extension, {@code <position>-<kind>}, only {@code [A-Za-z0-9_-]}
 * @param kind     what the chart shows
 * @param size     the size it was drawn at
 * @param png      the PNG file's bytes
 * @param svg      a standalone SVG document's root element (UTF-8 text, with its namespace), also fit to be
 *                 placed inline in HTML
 */
public record RenderedChart(String baseName, ChartKind kind, ChartSize size, byte[] png, String svg) {

    public RenderedChart {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(size, "size");
        Objects.requireNonNull(svg, "svg");
        if (baseName == null || !ChartNames.isSafe(baseName)) {
            throw new IllegalArgumentException("chart base name must be non-empty [A-Za-z0-9_-], got " + baseName);
        }
        png = png.clone();
    }

    /** The PNG file's bytes (a copy). */
    @Override
    public byte[] png() {
        return png.clone();
    }

    /** {@code <baseName>.png}. */
    public String pngFileName() {
        return baseName + ".png";
    }

    /** {@code <baseName>.svg}. */
    public String svgFileName() {
        return baseName + ".svg";
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof RenderedChart r && baseName.equals(r.baseName) && kind == r.kind && size.equals(r.size)
                && Arrays.equals(png, r.png) && svg.equals(r.svg);
    }

    @Override
    public int hashCode() {
        return Objects.hash(baseName, kind, size, Arrays.hashCode(png), svg);
    }

    @Override
    public String toString() {
        return "RenderedChart[" + baseName + ", " + kind + ", " + size.widthPx() + "×" + size.heightPx() + ", "
                + png.length + " B png, " + svg.length() + " chars svg]";
    }
}
