package org.tjmargin.report;

import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.awt.image.DataBufferInt;
import java.util.Arrays;
import org.jfree.chart.JFreeChart;
import org.jfree.svg.SVGGraphics2D;
import org.jfree.svg.ViewBox;

/**
 * Draws a built chart twice: into an RGB image encoded as PNG ({@link PngEncoder}), and through JFreeSVG into an SVG
 * element of the same size. Headless: needs no display (the build runs with {@code java.awt.headless=true}, and so should the command
 * line). Thread-safe as long as each chart is drawn by one thread; each thread keeps one image to draw PNGs into.
 */
final class ChartRenderer {

    private ChartRenderer() {
    }

    /**
     * Renders one chart.
     *
     * @param baseName file name without extension; also the prefix of the SVG's internal ids, so that several SVG
     *                 charts inline in one HTML page never share a clip-path id
     */
    static RenderedChart render(String baseName, ChartKind kind, JFreeChart chart, ChartSize size) {
        return new RenderedChart(baseName, kind, size, png(chart, size), svg(baseName, chart, size));
    }

    private static byte[] png(JFreeChart chart, ChartSize size) {
        Canvas canvas = CANVAS.get().sized(size);
        Graphics2D g2 = canvas.image.createGraphics();
        try {
            chart.draw(g2, new Rectangle2D.Double(0, 0, size.widthPx(), size.heightPx()));
        } finally {
            g2.dispose();
        }
        return PngEncoder.encode(canvas.image, canvas.scanlines);
    }

    /**
     * Each rendering thread's image and PNG scanline buffer, cleared and reused from chart to chart: a chart of the
     * default size is about 2.7 MB of the two, which a board's charts would otherwise allocate anew every time (and
     * on a host where every fresh page of memory is slow, pay for again).
     */
    private static final ThreadLocal<Canvas> CANVAS = ThreadLocal.withInitial(Canvas::new);

    /** One thread's reusable image (RGB, not ARGB: the background is opaque paper, the file smaller) and buffer. */
    private static final class Canvas {
        private BufferedImage image;
        private byte[] scanlines;

        /** This canvas at {@code size}, every pixel 0 as in a new image. */
        Canvas sized(ChartSize size) {
            if (image == null || image.getWidth() != size.widthPx() || image.getHeight() != size.heightPx()) {
                image = new BufferedImage(size.widthPx(), size.heightPx(), BufferedImage.TYPE_INT_RGB);
                scanlines = new byte[PngEncoder.scanlineBytes(size.widthPx(), size.heightPx())];
            } else {
                Arrays.fill(((DataBufferInt) image.getRaster().getDataBuffer()).getData(), 0);
            }
            return this;
        }
    }

    private static String svg(String baseName, JFreeChart chart, ChartSize size) {
        SVGGraphics2D g2 = new SVGGraphics2D(size.widthPx(), size.heightPx());
        g2.setDefsKeyPrefix(baseName + "-");
        // Two decimals of a pixel: invisible at any zoom a reader uses, and a third of the file size of the default;
        // written as JFreeSVG's own two-decimal converter writes them, at a fraction of its cost (SvgDecimals).
        g2.setGeomDoubleConverter(new SvgDecimals());
        chart.draw(g2, new Rectangle2D.Double(0, 0, size.widthPx(), size.heightPx()));
        // Width, height and a view box: fixed size as a file, and scalable to the column when inline in HTML.
        return g2.getSVGElement(null, true, new ViewBox(0, 0, size.widthPx(), size.heightPx()), null, null);
    }
}
