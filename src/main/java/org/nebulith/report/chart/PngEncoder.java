package org.nebulith.report.chart;

import java.awt.image.BufferedImage;
import java.awt.image.DataBufferInt;
import java.io.ByteArrayOutputStream;
import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.util.zip.CRC32;
import java.util.zip.Deflater;

/**
 * Writes an opaque RGB image as a PNG file (ISO/IEC 15948, the W3C PNG specification): IHDR, pHYs
 * with the resolution, one IDAT holding the zlib stream of the rows (filter type None), IEND. The
 * general ImageIO writer tries five filters on every row in Java code; the charts' flat colours
 * compress as well unfiltered, and the native zlib does the rest: measured on the radial map at 300
 * dpi (2129 x 1542 pixels), 90 against 146 ms and 208 against 212 kB.
 */
final class PngEncoder {
    private static final byte[] SIGNATURE = {(byte) 0x89, 'P', 'N', 'G', '\r', '\n', 0x1a, '\n'};
    private static final double METRES_PER_INCH = 0.0254;

    private PngEncoder() {
    }

    /**
     * @param image an image of type {@link BufferedImage#TYPE_INT_RGB}
     * @param dpi   resolution recorded in the file [pixels per inch]
     * @return the PNG file
     */
    static byte[] encode(final BufferedImage image, final double dpi) {
        if (image.getType() != BufferedImage.TYPE_INT_RGB) {
            throw new IllegalArgumentException("PNG encoder takes TYPE_INT_RGB images, got type " + image.getType());
        }
        int w = image.getWidth();
        int h = image.getHeight();
        ByteArrayOutputStream out = new ByteArrayOutputStream(w * h / 4 + 1024);
        out.writeBytes(SIGNATURE);
        chunk(out, "IHDR", ByteBuffer.allocate(13).putInt(w).putInt(h)
                .put((byte) 8).put((byte) 2).put((byte) 0).put((byte) 0).put((byte) 0).array());
        int perMetre = (int) Math.round(dpi / METRES_PER_INCH);
        chunk(out, "pHYs", ByteBuffer.allocate(9).putInt(perMetre).putInt(perMetre).put((byte) 1).array());
        chunk(out, "IDAT", rows(image, w, h));
        chunk(out, "IEND", new byte[0]);
        return out.toByteArray();
    }

    /** The zlib stream of the scanlines, each a filter byte (0, None) and its RGB triplets. */
    private static byte[] rows(final BufferedImage image, final int w, final int h) {
        int[] pixels = ((DataBufferInt) image.getRaster().getDataBuffer()).getData();
        Deflater deflater = new Deflater(Deflater.DEFAULT_COMPRESSION);
        ByteArrayOutputStream z = new ByteArrayOutputStream(w * h / 4 + 1024);
        byte[] row = new byte[1 + 3 * w];
        byte[] buf = new byte[1 << 16];
        try {
            for (int y = 0; y < h; y++) {
                int from = y * w;
                for (int x = 0, i = 1; x < w; x++, i += 3) {
                    int p = pixels[from + x];
                    row[i] = (byte) (p >> 16);
                    row[i + 1] = (byte) (p >> 8);
                    row[i + 2] = (byte) p;
                }
                deflater.setInput(row);
                while (!deflater.needsInput()) {
                    z.write(buf, 0, deflater.deflate(buf));
                }
            }
            deflater.finish();
            while (!deflater.finished()) {
                z.write(buf, 0, deflater.deflate(buf));
            }
        } finally {
            deflater.end();
        }
        return z.toByteArray();
    }

    private static void chunk(final ByteArrayOutputStream out, final String type, final byte[] data) {
        byte[] name = type.getBytes(StandardCharsets.US_ASCII);
        CRC32 crc = new CRC32();
        crc.update(name);
        crc.update(data);
        out.writeBytes(ByteBuffer.allocate(4).putInt(data.length).array());
        out.writeBytes(name);
        out.writeBytes(data);
        out.writeBytes(ByteBuffer.allocate(4).putInt((int) crc.getValue()).array());
    }
}
