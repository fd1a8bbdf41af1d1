package org.nebulith.report.chart;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.EnumSet;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;

import javax.imageio.ImageIO;
import javax.xml.parsers.DocumentBuilderFactory;

import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.knowm.xchart.XYChart;
import org.nebulith.files.AtomicOutput;
import org.nebulith.files.RunFolder;
import org.nebulith.files.RunInputs;
import org.w3c.dom.Document;

/** Every chart kind renders headless to valid, non-empty PNG, SVG and PDF files. */
@Tag("slow")
class ChartRenderTest {

    private static final byte[] PNG_MAGIC = {(byte) 0x89, 'P', 'N', 'G', '\r', '\n', 0x1a, '\n'};

    @TempDir
    Path dir;

    @Test
    void everyChartRendersToValidFilesInEveryFormat() throws Exception {
        Path target = dir.resolve("charts");
        try (RunFolder run = AtomicOutput.openRunFolder(target, false, new RunInputs())) {
            for (Map.Entry<String, XYChart> e : ChartSamples.all().entrySet()) {
                ChartRenderer.write(e.getValue(), run, e.getKey(), EnumSet.allOf(ChartFormat.class));
            }
            run.commit();
        }
        for (String name : ChartSamples.all().keySet()) {
            checkPng(target.resolve(name + ".png"));
            checkSvg(target.resolve(name + ".svg"));
            checkPdf(target.resolve(name + ".pdf"));
        }
        try (Stream<Path> files = Files.list(dir)) {
            assertEquals(List.of(target), files.toList(), "no temporary files left next to the run folder");
        }
    }

    private static void checkPng(final Path file) throws IOException {
        byte[] bytes = Files.readAllBytes(file);
        assertArrayEquals(PNG_MAGIC, Arrays.copyOf(bytes, 8), file + " PNG signature");
        BufferedImage image = ImageIO.read(file.toFile());
        assertNotNull(image, file + " decodable");
        // 3.5 in wide at 300 dpi, from the 252 pt layout width
        assertEquals(1050, image.getWidth(), file.toString());
        assertTrue(image.getHeight() > 700, file.toString());
    }

    private static void checkSvg(final Path file) throws Exception {
        DocumentBuilderFactory factory = DocumentBuilderFactory.newInstance();
        factory.setFeature("http://apache.org/xml/features/nonvalidating/load-external-dtd", false);
        factory.setNamespaceAware(true);
        Document svg = factory.newDocumentBuilder().parse(file.toFile());
        assertEquals("svg", svg.getDocumentElement().getLocalName(), file.toString());
        assertTrue(svg.getDocumentElement().getElementsByTagName("*").getLength() > 10, file + " has content");
    }

    private static void checkPdf(final Path file) throws IOException {
        byte[] bytes = Files.readAllBytes(file);
        String head = new String(bytes, 0, 5, StandardCharsets.ISO_8859_1);
        String tail = new String(bytes, Math.max(0, bytes.length - 16), Math.min(16, bytes.length),
                StandardCharsets.ISO_8859_1).strip();
        assertEquals("%PDF-", head, file.toString());
        assertTrue(tail.endsWith("%%EOF"), file + " ends with %%EOF: " + tail);
        assertTrue(bytes.length > 5000, file + " not trivially small");
    }

    @Test
    void aFailedRenderLeavesNoFile() throws IOException {
        Path target = dir.resolve("failed");
        try (RunFolder run = AtomicOutput.openRunFolder(target, false, new RunInputs())) {
            assertThrows(UncheckedIOException.class, () -> run.write("broken.png", out -> {
                out.write(PNG_MAGIC);
                throw new IOException("simulated font failure");
            }));
            try (Stream<Path> files = Files.list(run.workingFolder())) {
                assertEquals(0, files.count(), "neither the file nor its temporary copy remains");
            }
        }
        assertTrue(Files.notExists(target));
    }

    @Test
    void dataHoldersRefuseBadData() {
        double[] t = {2000, 1500};
        assertThrows(IllegalArgumentException.class,
                () -> new CondensationCurves(t, List.of(new Curve("Al", new double[] {0.2, 1.5})), ""));
        assertThrows(IllegalArgumentException.class,
                () -> new CondensationCurves(t, List.of(new Curve("Al", new double[] {0.2, Double.NaN})), ""));
        assertThrows(IllegalArgumentException.class,
                () -> new PhaseAssemblage(t, List.of(new Curve("metal", new double[] {1})), "mol"));
        assertThrows(IllegalArgumentException.class, () -> new RadialProfile.Zone("b", 1.2, 0.8));
        assertThrows(IllegalArgumentException.class, () -> SurveyScatter.Point.of("x", Double.NaN, 1));
    }

    @Test
    void temperatureAxisDecreasesToTheRight() {
        XYChart chart = ChartSamples.condensation().chart(ChartSize.COLUMN);
        double[] x = chart.getSeries("Al").getXData();
        assertEquals(-2000.0, x[0]); // plotted against -T, so the hottest point is leftmost
        assertTrue(x[1] > x[0]);
    }
}
