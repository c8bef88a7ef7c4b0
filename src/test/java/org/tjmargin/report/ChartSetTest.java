package org.tjmargin.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.StringReader;
import java.util.ArrayList;
import java.util.List;
import javax.imageio.ImageIO;
import javax.xml.XMLConstants;
import javax.xml.parsers.DocumentBuilder;
import javax.xml.parsers.DocumentBuilderFactory;
import javax.xml.parsers.ParserConfigurationException;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.title.TextTitle;
import org.junit.jupiter.api.Test;
import org.tjmargin.solve.AnalysisResult;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;
import org.xml.sax.InputSource;
import org.xml.sax.SAXException;

/** The charts: one set per position, both encodings at the stated size, readable and not blank. */
class ChartSetTest {

    /** Shared, immutable: one analysis of the three-position board (a regulator, a reference, a runaway clamp). */
    private static final AnalysisResult MIXED = ReportFixtures.mixed("chart test board");
    private static final List<RenderedChart> CHARTS = ChartSet.render(MIXED);

    @Test
    void everyPositionGetsItsChartsWithSafeNames() {
        List<String> names = CHARTS.stream().map(RenderedChart::baseName).toList();
        assertEquals(List.of("D1-margin", "D1-operating", "D1-rating", "D1-resistor",
                "REF2-margin", "REF2-operating", "REF2-rating",
                "TVS3-margin", "TVS3-operating", "TVS3-rating"), names);
        assertEquals("D1-margin.png", CHARTS.get(0).pngFileName());
        assertEquals("D1-margin.svg", CHARTS.get(0).svgFileName());
    }

    @Test
    void pngDecodesToTheDefaultSizeAndIsNotBlank() throws IOException {
        for (RenderedChart c : CHARTS) {
            assertPngOfSize(c, 800, 480);
        }
    }

    @Test
    void svgParsesWithAnSvgRootOfTheDefaultSize() throws Exception {
        for (RenderedChart c : CHARTS) {
            assertSvgOfSize(c, 800, 480);
        }
    }

    @Test
    void anotherSizeIsHonouredInBothEncodings() throws Exception {
        RenderedChart operating = ChartRenderer.render("D1-operating", ChartKind.OPERATING,
                ChartSet.build(MIXED, 0, ChartKind.OPERATING), new ChartSize(640, 400));
        assertPngOfSize(operating, 640, 400);
        assertSvgOfSize(operating, 640, 400);
    }

    @Test
    void svgIdsCarryTheChartNameSoInlineChartsNeverShareOne() throws Exception {
        for (RenderedChart c : CHARTS) {
            NodeList all = parse(c.svg()).getElementsByTagNameNS("*", "*");
            int ids = 0;
            for (int i = 0; i < all.getLength(); i++) {
                String id = ((Element) all.item(i)).getAttribute("id");
                if (!id.isEmpty()) {
                    ids++;
                    assertTrue(id.startsWith(c.baseName() + "-"), c.baseName() + ": id " + id);
                }
            }
            assertTrue(ids > 0, "JFreeSVG writes clip paths with ids; none found in " + c.baseName());
        }
    }

    @Test
    void hostilePositionIdIsSanitisedInNamesAndEscapedInTheSvg() throws Exception {
        String hostile = "<script>alert(1)</script>/../D&1";
        List<RenderedChart> charts = ChartSet.render(ReportFixtures.regulatorOnly("board", hostile));
        assertEquals(4, charts.size());
        for (RenderedChart c : charts) {
            assertTrue(ChartNames.isSafe(c.baseName()), c.baseName());
            assertFalse(c.svg().contains("<script"), "unescaped id in " + c.baseName());
            assertNotNull(parse(c.svg()).getDocumentElement());
        }
        assertEquals("_script_alert_1___script_____D_1-margin", charts.get(0).baseName());
    }

    @Test
    void resistorChartExistsOnlyForShuntRegulators() {
        assertEquals(List.of(ChartKind.MARGIN, ChartKind.OPERATING, ChartKind.RATING, ChartKind.RESISTOR),
                ChartSet.kindsFor(MIXED, 0));
        assertEquals(List.of(ChartKind.MARGIN, ChartKind.OPERATING, ChartKind.RATING), ChartSet.kindsFor(MIXED, 2));
        assertThrows(IllegalArgumentException.class, () -> ChartSet.build(MIXED, 2, ChartKind.RESISTOR));
    }

    @Test
    void marginChartSaysSoWhenNoAmbientPasses() {
        JFreeChart chart = ChartSet.build(ReportFixtures.hopeless("board"), 0, ChartKind.MARGIN);
        List<String> lines = new ArrayList<>();
        for (Object t : chart.getSubtitles()) {
            if (t instanceof TextTitle tt) {
                lines.add(tt.getText());
            }
        }
        assertTrue(lines.contains("No ambient in the search passes every rule."), lines.toString());
    }

    @Test
    void renderingIsRepeatable() {
        RenderedChart again = ChartRenderer.render("D1-margin", ChartKind.MARGIN,
                ChartSet.build(MIXED, 0, ChartKind.MARGIN), ChartSize.DEFAULT);
        assertEquals(CHARTS.get(0).svg(), again.svg());
    }

    /**
     * A thread draws its PNGs into one image it clears and reuses: every chart comes out as it does drawn into a new
     * image, whatever was drawn there before (charts of several kinds and sizes in turn on this thread).
     */
    @Test
    void aReusedImageDrawsAsANewOne() {
        ChartSize wide = new ChartSize(1000, 500);
        for (ChartSize size : List.of(ChartSize.DEFAULT, wide, ChartSize.DEFAULT)) {
            for (ChartKind kind : List.of(ChartKind.MARGIN, ChartKind.RATING, ChartKind.OPERATING, ChartKind.RESISTOR)) {
                RenderedChart reused = ChartRenderer.render("D1-" + kind.suffix(), kind, ChartSet.build(MIXED, 0, kind),
                        size);
                java.awt.image.BufferedImage fresh = new java.awt.image.BufferedImage(size.widthPx(), size.heightPx(),
                        java.awt.image.BufferedImage.TYPE_INT_RGB);
                java.awt.Graphics2D g2 = fresh.createGraphics();
                ChartSet.build(MIXED, 0, kind).draw(g2, new java.awt.geom.Rectangle2D.Double(0, 0, size.widthPx(),
                        size.heightPx()));
                g2.dispose();
                assertArrayEquals(PngEncoder.encode(fresh), reused.png(), kind + " at " + size);
            }
        }
    }

    @Test
    void chartSizeRejectsUnreadableAndHugeSizes() {
        assertThrows(IllegalArgumentException.class, () -> new ChartSize(100, 480));
        assertThrows(IllegalArgumentException.class, () -> new ChartSize(800, 100));
        assertThrows(IllegalArgumentException.class, () -> new ChartSize(5000, 480));
    }

    @Test
    void renderedChartCopiesItsBytesAndRejectsUnsafeNames() {
        byte[] png = {1, 2, 3};
        RenderedChart c = new RenderedChart("a-margin", ChartKind.MARGIN, ChartSize.DEFAULT, png, "<svg/>");
        png[0] = 9;
        assertEquals(1, c.png()[0]);
        c.png()[1] = 9;
        assertEquals(2, c.png()[1]);
        assertThrows(IllegalArgumentException.class,
                () -> new RenderedChart("../a", ChartKind.MARGIN, ChartSize.DEFAULT, png, "<svg/>"));
    }

    static void assertPngOfSize(RenderedChart c, int w, int h) throws IOException {
        BufferedImage img = ImageIO.read(new ByteArrayInputStream(c.png()));
        assertNotNull(img, c.baseName() + ": not a readable PNG");
        assertEquals(w, img.getWidth(), c.baseName());
        assertEquals(h, img.getHeight(), c.baseName());
        int background = img.getRGB(0, 0);
        int differing = 0;
        for (int y = 0; y < h; y += 2) {
            for (int x = 0; x < w; x += 2) {
                if (img.getRGB(x, y) != background) {
                    differing++;
                }
            }
        }
        // Title, axes, grid, lines and legend cover several per cent of a chart; 1 % of the sampled pixels is far
        // above any stray pixel and far below any real chart.
        assertTrue(differing > w * h / 4 / 100, c.baseName() + ": only " + differing + " sampled pixels drawn");
    }

    static void assertSvgOfSize(RenderedChart c, int w, int h) throws Exception {
        Element root = parse(c.svg()).getDocumentElement();
        assertEquals("svg", root.getLocalName(), c.baseName());
        assertEquals("http://www.w3.org/2000/svg", root.getNamespaceURI(), c.baseName());
        assertEquals(w, Double.parseDouble(root.getAttribute("width")), 0.0, c.baseName());
        assertEquals(h, Double.parseDouble(root.getAttribute("height")), 0.0, c.baseName());
    }

    static Document parse(String xml) throws ParserConfigurationException, SAXException, IOException {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        f.setFeature(XMLConstants.FEATURE_SECURE_PROCESSING, true);
        f.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
        DocumentBuilder b = f.newDocumentBuilder();
        return b.parse(new InputSource(new StringReader(xml)));
    }
}
