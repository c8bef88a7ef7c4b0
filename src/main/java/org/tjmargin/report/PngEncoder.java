package org.tjmargin.report;

import java.awt.image.BufferedImage;
import java.awt.image.DataBufferInt;
import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import java.util.zip.CRC32;
import java.util.zip.Deflater;

/**
 * PNG encoding of an opaque RGB image: 8-bit truecolour, no interlace, every row unfiltered, one zlib stream at
 * compression level 4 split into IDAT chunks of 32 KiB (W3C, <i>Portable Network Graphics (PNG) Specification</i>,
 * 2nd ed., 2003: §5 datastream, §11.2 chunks IHDR, IDAT, IEND, §9 filter type 0). These are the choices the
 * runtime's own ImageIO writer makes for such an image by default, so the files are the same bytes; this encoder
 * spares a command-line run the image-writer registry and a writer whose row loop is slow until compiled.
 * {@code PngEncoderTest} decodes the result with ImageIO and compares it with ImageIO's own file.
 *
 * <p>Stateless and thread-safe.
 */
final class PngEncoder {

    /** The PNG signature (§5.2). */
    private static final byte[] SIGNATURE = {(byte) 0x89, 'P', 'N', 'G', '\r', '\n', 0x1a, '\n'};
    /** zlib level: 4, the runtime writer's default, a fast level that keeps chart files small (about 40 KiB). */
    private static final int LEVEL = 4;
    /** Largest IDAT chunk written (bytes), as the runtime writer splits its stream. */
    private static final int IDAT_CHUNK = 32768;

    private PngEncoder() {
    }

    /**
     * Encodes {@code image}.
     *
     * @param image an image of type {@link BufferedImage#TYPE_INT_RGB}
     * @return the PNG file's bytes
     */
    static byte[] encode(BufferedImage image) {
        return encode(image, new byte[scanlineBytes(image.getWidth(), image.getHeight())]);
    }

    /**
     * As above, with the scanlines laid out in {@code raw} (a caller's reusable buffer of at least
     * {@link #scanlineBytes} bytes; every byte encoded is written first).
     */
    static byte[] encode(BufferedImage image, byte[] raw) {
        if (image.getType() != BufferedImage.TYPE_INT_RGB) {
            throw new IllegalArgumentException("only TYPE_INT_RGB images are encoded, got type " + image.getType());
        }
        int w = image.getWidth();
        int h = image.getHeight();
        if (raw.length < scanlineBytes(w, h)) {
            throw new IllegalArgumentException("scanline buffer of " + raw.length + " bytes for a " + w + " × " + h
                    + " image, which needs " + scanlineBytes(w, h));
        }
        int[] pixels = ((DataBufferInt) image.getRaster().getDataBuffer()).getData();
        // Each scanline: its filter-type byte (0, none) and R, G, B per pixel (§7.2, §9.2).
        int stride = 1 + 3 * w;
        for (int y = 0; y < h; y++) {
            int p = y * w;
            raw[y * stride] = 0;
            int q = y * stride + 1;
            for (int x = 0; x < w; x++) {
                int rgb = pixels[p + x];
                raw[q++] = (byte) (rgb >> 16);
                raw[q++] = (byte) (rgb >> 8);
                raw[q++] = (byte) rgb;
            }
        }
        ByteArrayOutputStream z = new ByteArrayOutputStream(64 * 1024);
        Deflater deflater = new Deflater(LEVEL);
        try {
            deflater.setInput(raw, 0, stride * h);
            deflater.finish();
            byte[] buf = new byte[IDAT_CHUNK];
            while (!deflater.finished()) {
                z.write(buf, 0, deflater.deflate(buf));
            }
        } finally {
            deflater.end();
        }
        byte[] zlib = z.toByteArray();
        ByteArrayOutputStream out = new ByteArrayOutputStream(zlib.length + 128);
        out.writeBytes(SIGNATURE);
        byte[] header = new byte[13];
        putInt(header, 0, w);
        putInt(header, 4, h);
        header[8] = 8; // bit depth
        header[9] = 2; // colour type 2: truecolour
        // compression 0 (deflate), filter method 0, interlace 0 (none): the three zero bytes left as they are
        chunk(out, "IHDR", header, 0, header.length);
        for (int off = 0; off < zlib.length; off += IDAT_CHUNK) {
            chunk(out, "IDAT", zlib, off, Math.min(IDAT_CHUNK, zlib.length - off));
        }
        chunk(out, "IEND", new byte[0], 0, 0);
        return out.toByteArray();
    }

    /** Bytes of the scanlines of a {@code w × h} image: a filter-type byte and three bytes a pixel per row. */
    static int scanlineBytes(int w, int h) {
        return (1 + 3 * w) * h;
    }

    /** One chunk: length, type, data, and the CRC-32 of type and data (§5.3). */
    private static void chunk(ByteArrayOutputStream out, String type, byte[] data, int off, int len) {
        byte[] t = type.getBytes(StandardCharsets.US_ASCII);
        byte[] four = new byte[4];
        putInt(four, 0, len);
        out.writeBytes(four);
        out.writeBytes(t);
        out.write(data, off, len);
        CRC32 crc = new CRC32();
        crc.update(t);
        crc.update(data, off, len);
        putInt(four, 0, (int) crc.getValue());
        out.writeBytes(four);
    }

    private static void putInt(byte[] b, int at, int v) {
        b[at] = (byte) (v >>> 24);
        b[at + 1] = (byte) (v >>> 16);
        b[at + 2] = (byte) (v >>> 8);
        b[at + 3] = (byte) v;
    }
}
