package org.tjmargin.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Ellipse2D;
import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.util.Random;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;

/**
 * The PNG encoder against the runtime's ImageIO, an independent implementation of the PNG specification (W3C, 2nd
 * ed., 2003): ImageIO decodes every file to the pixels drawn, and its own writer, with its defaults, writes the same
 * bytes (the encoder makes the same choices: no filter, zlib level 4, IDAT chunks of 32 KiB).
 */
class PngEncoderTest {

    @Test
    void imageIoReadsThePixelsBackAndWritesTheSameBytes() throws Exception {
        long seed = 20261206L;
        Random rnd = new Random(seed);
        for (int n = 0; n < 24; n++) {
            int w = 1 + rnd.nextInt(n < 4 ? 4 : 900);
            int h = 1 + rnd.nextInt(n < 4 ? 4 : 600);
            BufferedImage img = new BufferedImage(w, h, BufferedImage.TYPE_INT_RGB);
            if (n % 3 == 0) {
                // Noise: incompressible, so the stream spans many IDAT chunks.
                for (int y = 0; y < h; y++) {
                    for (int x = 0; x < w; x++) {
                        img.setRGB(x, y, rnd.nextInt());
                    }
                }
            } else {
                // Antialiased shapes on a flat ground, like a chart.
                Graphics2D g = img.createGraphics();
                g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
                g.setColor(new Color(rnd.nextInt()));
                g.fillRect(0, 0, w, h);
                for (int k = 0; k < 30; k++) {
                    g.setColor(new Color(rnd.nextInt()));
                    g.fill(new Ellipse2D.Double(rnd.nextDouble() * w, rnd.nextDouble() * h, 40 * rnd.nextDouble(),
                            40 * rnd.nextDouble()));
                    g.drawLine(rnd.nextInt(w), rnd.nextInt(h), rnd.nextInt(w), rnd.nextInt(h));
                }
                g.dispose();
            }
            String where = "seed " + seed + " image " + n + " (" + w + " × " + h + ")";
            byte[] png = PngEncoder.encode(img);
            BufferedImage back = ImageIO.read(new ByteArrayInputStream(png));
            assertEquals(w, back.getWidth(), where);
            assertEquals(h, back.getHeight(), where);
            for (int y = 0; y < h; y++) {
                for (int x = 0; x < w; x++) {
                    if ((back.getRGB(x, y) & 0xffffff) != (img.getRGB(x, y) & 0xffffff)) {
                        assertEquals(img.getRGB(x, y) & 0xffffff, back.getRGB(x, y) & 0xffffff,
                                where + " at " + x + ", " + y);
                    }
                }
            }
            ByteArrayOutputStream imageIo = new ByteArrayOutputStream();
            ImageIO.write(img, "png", imageIo);
            assertArrayEquals(imageIo.toByteArray(), png, where);
        }
    }

    /** A reused scanline buffer, left full of another image's bytes (or of noise), encodes as a new one does. */
    @Test
    void aReusedBufferEncodesAsANewOne() {
        Random rnd = new Random(20261204L);
        byte[] raw = new byte[PngEncoder.scanlineBytes(300, 200)];
        for (int n = 0; n < 6; n++) {
            rnd.nextBytes(raw);
            int w = 1 + rnd.nextInt(300);
            int h = 1 + rnd.nextInt(200);
            BufferedImage img = new BufferedImage(w, h, BufferedImage.TYPE_INT_RGB);
            Graphics2D g = img.createGraphics();
            g.setColor(new Color(rnd.nextInt()));
            g.fillRect(0, 0, w / 2, h);
            g.setColor(new Color(rnd.nextInt()));
            g.fill(new Ellipse2D.Double(0, 0, w, h));
            g.dispose();
            assertArrayEquals(PngEncoder.encode(img), PngEncoder.encode(img, raw), "image " + n);
        }
        assertThrows(IllegalArgumentException.class,
                () -> PngEncoder.encode(new BufferedImage(400, 4, BufferedImage.TYPE_INT_RGB), new byte[10]));
    }

    @Test
    void onlyOpaqueRgbImages() {
        assertThrows(IllegalArgumentException.class,
                () -> PngEncoder.encode(new BufferedImage(4, 4, BufferedImage.TYPE_INT_ARGB)));
    }
}
