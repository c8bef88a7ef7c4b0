package org.tjmargin.report;

/**
 * The size a chart is drawn at: pixels of the PNG, user units (px) of the SVG.
 *
 * @param widthPx  width (px), 200 … 4000
 * @param heightPx height (px), 150 … 4000
 */
public record ChartSize(int widthPx, int heightPx) {

    /** The default size, 800 × 480 px: readable on a laptop screen and on an A4 page at 96 dpi. */
    public static final ChartSize DEFAULT = new ChartSize(800, 480);

    /** Smallest width that still leaves room for axis labels and a legend (px). */
    public static final int MIN_WIDTH_PX = 200;
    /** Smallest height that still leaves room for axis labels and a legend (px). */
    public static final int MIN_HEIGHT_PX = 150;
    /** Largest side accepted (px): beyond it a PNG needs tens of megabytes of memory for no reader's gain. */
    public static final int MAX_SIDE_PX = 4000;

    public ChartSize {
        if (widthPx < MIN_WIDTH_PX || heightPx < MIN_HEIGHT_PX || widthPx > MAX_SIDE_PX || heightPx > MAX_SIDE_PX) {
            throw new IllegalArgumentException("chart size must be " + MIN_WIDTH_PX + "…" + MAX_SIDE_PX + " × "
                    + MIN_HEIGHT_PX + "…" + MAX_SIDE_PX + " px, got " + widthPx + " × " + heightPx);
        }
    }
}
