package org.tjmargin.report;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Paint;
import java.awt.Stroke;
import java.util.List;
import java.util.Locale;

/**
 * The colours and line styles of tjmargin's charts and HTML report, in one place so that a chart and the page around
 * it agree.
 *
 * <p>The look, chosen for this tool: "drafting paper". A warm off-white paper ({@link #PAPER}) under slate-grey ink
 * ({@link #INK}), a faint blue-grey grid ({@link #GRID}) like a cutting mat, and data in six saturated but dark
 * inks that stay apart for the common colour-vision deficiencies and in greyscale print, because each series also
 * has its own dash pattern ({@link #seriesStroke(int)}): deep teal, burnt sienna, indigo, moss, crimson-rose and
 * ochre. Reference lines are drawn in ink, never in a data colour: the zero-margin line solid and heavy, the
 * design's highest ambient in long dashes, the found maximum ambient in a thin double-dot line in teal (the only
 * place a data colour marks a reference, because it is the answer the chart is about), thermal runaway in the
 * crimson-rose, and the worst-case corners' extremes beside a statistical spread in short dashes of ink. Histogram
 * and tornado bars are filled with the data inks, a confidence band with a translucent wash of its line's ink
 * (the renderer's alpha). Verdicts use muted pigments with white text (spruce for pass, brick for fail, aubergine for
 * runaway, umber for unresolved) so that no verdict depends on red/green alone: each also carries its word.
 *
 * <p>Colours are sRGB. Constants only; no state.
 */
public final class Palette {

    /** Page and chart background: warm off-white. */
    public static final Color PAPER = new Color(0xFB, 0xF9, 0xF4);
    /** Plot area background: a shade lighter than the paper, so the plot reads as a sheet on it. */
    public static final Color SHEET = new Color(0xFF, 0xFE, 0xFB);
    /** Text, axes and reference lines: slate. */
    public static final Color INK = new Color(0x2B, 0x33, 0x3D);
    /** Secondary text (units, captions, tick labels). */
    public static final Color INK_SOFT = new Color(0x5B, 0x66, 0x73);
    /** Grid lines: faint blue-grey. */
    public static final Color GRID = new Color(0xD5, 0xDC, 0xE4);
    /** Table rules and borders in the HTML report. */
    public static final Color RULE = new Color(0xC9, 0xC2, 0xB4);
    /** Accent of headings and the found maximum ambient: deep teal. */
    public static final Color ACCENT = new Color(0x14, 0x6C, 0x74);
    /** Thermal runaway marks: crimson-rose. */
    public static final Color RUNAWAY_MARK = new Color(0xB0, 0x30, 0x5A);

    /** Verdict PASS: spruce. */
    public static final Color VERDICT_PASS = new Color(0x2E, 0x6B, 0x4F);
    /** Verdict FAIL: brick. */
    public static final Color VERDICT_FAIL = new Color(0xA8, 0x3A, 0x2B);
    /** Verdict RUNAWAY: aubergine. */
    public static final Color VERDICT_RUNAWAY = new Color(0x6B, 0x2D, 0x5C);
    /** Verdict UNRESOLVED: umber. */
    public static final Color VERDICT_UNRESOLVED = new Color(0x7A, 0x5C, 0x2E);

    /** Data inks, in the order series take them. */
    public static final List<Color> SERIES = List.of(
            new Color(0x14, 0x6C, 0x74),  // deep teal
            new Color(0xB5, 0x5A, 0x30),  // burnt sienna
            new Color(0x3F, 0x3F, 0x9A),  // indigo
            new Color(0x5E, 0x7A, 0x1F),  // moss
            new Color(0xB0, 0x30, 0x5A),  // crimson-rose
            new Color(0xB8, 0x8A, 0x12)); // ochre

    /** Dash patterns (px on, px off …) paired with the series inks; {@code null} is a solid line. */
    private static final float[][] DASHES = {null, {7f, 4f}, {2f, 3f}, {10f, 3f, 2f, 3f}, {4f, 4f}, {12f, 6f}};

    /** Width of data lines (px). */
    public static final float SERIES_WIDTH = 2.0f;

    private Palette() {
    }

    /** The ink of the {@code i}-th series (cycling). */
    public static Paint seriesPaint(int i) {
        return SERIES.get(Math.floorMod(i, SERIES.size()));
    }

    /** The line of the {@code i}-th series: its own dash pattern, so series differ without colour too. */
    public static Stroke seriesStroke(int i) {
        float[] dash = DASHES[Math.floorMod(i, DASHES.length)];
        return dash == null ? new BasicStroke(SERIES_WIDTH, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND)
                : new BasicStroke(SERIES_WIDTH, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f, dash, 0f);
    }

    /** The zero-margin line: solid, heavy. */
    public static Stroke zeroLine() {
        return new BasicStroke(1.8f);
    }

    /** The design's highest ambient: long dashes. */
    public static Stroke designLimitLine() {
        return new BasicStroke(1.4f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[] {9f, 5f}, 0f);
    }

    /** The found maximum ambient, and other answers: a dash followed by two dots. */
    public static Stroke answerLine() {
        return new BasicStroke(1.6f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f,
                new float[] {8f, 3f, 1.5f, 3f, 1.5f, 3f}, 0f);
    }

    /** The worst-case corners' extremes beside a statistical spread: short dashes. */
    public static Stroke cornerLine() {
        return new BasicStroke(1.4f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[] {3f, 3f}, 0f);
    }

    /** A nominal value a spread is drawn about: thin, solid. */
    public static Stroke nominalLine() {
        return new BasicStroke(1.2f);
    }

    /** A colour as a CSS hex string, {@code #rrggbb}. */
    public static String css(Color c) {
        return String.format(Locale.ROOT, "#%02x%02x%02x", c.getRed(), c.getGreen(), c.getBlue());
    }
}
