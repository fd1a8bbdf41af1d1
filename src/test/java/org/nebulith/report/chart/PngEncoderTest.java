package org.nebulith.report.chart;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.util.Random;

import javax.imageio.ImageIO;
import javax.imageio.ImageReader;
import javax.imageio.metadata.IIOMetadata;
import javax.imageio.stream.ImageInputStream;

import org.junit.jupiter.api.Test;
import org.w3c.dom.Element;
import org.w3c.dom.Node;

/** The PNG writer against the JDK's own PNG reader (an independent decoder of the format). */
class PngEncoderTest {

    @Test
    void theJdkReaderGetsBackEveryPixelAndTheResolution() throws IOException {
        BufferedImage image = new BufferedImage(301, 97, BufferedImage.TYPE_INT_RGB);
        Random random = new Random(7);
        for (int y = 0; y < image.getHeight(); y++) {
            for (int x = 0; x < image.getWidth(); x++) {
                // flat runs (as in charts) and noise, every channel used
                image.setRGB(x, y, x % 50 < 25 ? 0xffffff : random.nextInt(1 << 24));
            }
        }
        byte[] png = PngEncoder.encode(image, 300);
        try (ImageInputStream in = ImageIO.createImageInputStream(new ByteArrayInputStream(png))) {
            ImageReader reader = ImageIO.getImageReadersByFormatName("png").next();
            reader.setInput(in);
            BufferedImage back = reader.read(0);
            int[] expected = image.getRGB(0, 0, 301, 97, null, 0, 301);
            int[] actual = back.getRGB(0, 0, 301, 97, null, 0, 301);
            assertArrayEquals(expected, actual);
            IIOMetadata meta = reader.getImageMetadata(0);
            Element phys = child(meta.getAsTree("javax_imageio_png_1.0"), "pHYs");
            // 300 pixels per inch = 11811 per metre (1 in = 0.0254 m exactly)
            assertEquals("11811", phys.getAttribute("pixelsPerUnitXAxis"));
            assertEquals("11811", phys.getAttribute("pixelsPerUnitYAxis"));
            assertEquals("meter", phys.getAttribute("unitSpecifier"));
        }
    }

    @Test
    void refusesImagesWithAnAlphaChannel() {
        BufferedImage argb = new BufferedImage(2, 2, BufferedImage.TYPE_INT_ARGB);
        assertThrows(IllegalArgumentException.class, () -> PngEncoder.encode(argb, 300));
    }

    private static Element child(Node root, String name) {
        for (Node n = root.getFirstChild(); n != null; n = n.getNextSibling()) {
            if (n.getNodeName().equals(name)) {
                return (Element) n;
            }
        }
        throw new AssertionError("no " + name + " in the PNG metadata");
    }
}
