package org.tjmargin.report;

import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import org.jfree.chart.JFreeChart;
import org.jfree.svg.SVGGraphics2D;
import org.jfree.svg.ViewBox;

/**
 * Draws a built chart twice: into an RGB image encoded as PNG ({@link PngEncoder}), and through JFreeSVG into an SVG
 * element of the same size. Headless: needs no display (the build runs with {@code java.awt.headless=true}, and so should the command
 * line). Stateless and thread-safe as long as each chart is drawn by one thread.
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
        // RGB, not ARGB: the background is opaque paper, and the file is smaller.
        BufferedImage image = new BufferedImage(size.widthPx(), size.heightPx(), BufferedImage.TYPE_INT_RGB);
        Graphics2D g2 = image.createGraphics();
        try {
            chart.draw(g2, new Rectangle2D.Double(0, 0, size.widthPx(), size.heightPx()));
        } finally {
            g2.dispose();
        }
        return PngEncoder.encode(image);
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
