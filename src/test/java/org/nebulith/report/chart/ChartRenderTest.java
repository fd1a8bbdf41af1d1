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
import org.nebulith.files.AtomicOutput;
import org.nebulith.files.RunFolder;
import org.nebulith.files.RunInputs;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.XYStyler;
import org.w3c.dom.Document;

/**
 * Every chart kind renders headless to valid PNG, SVG and PDF files: live text in the SVG
 * ({@code <text>} elements) and the PDF (the chart font embedded, text shown with text operators),
 * each vector file under {@value #SIZE_LIMIT} bytes.
 */
@Tag("slow")
class ChartRenderTest {

    private static final byte[] PNG_MAGIC = {(byte) 0x89, 'P', 'N', 'G', '\r', '\n', 0x1a, '\n'};

    /** Largest accepted vector file [bytes]. */
    static final int SIZE_LIMIT = 500_000;

    @TempDir
    Path dir;

    @Test
    void theSameChartGivesTheSameBytesInEveryFormat() {
        // no clock in the files (the PDF's file identifier once came from the time of writing)
        for (Map.Entry<String, Figure> e : ChartSamples.all().entrySet()) {
            Figure f = e.getValue();
            assertArrayEquals(ChartRenderer.pdf(f), ChartRenderer.pdf(f), e.getKey() + ".pdf");
            assertArrayEquals(ChartRenderer.svg(f), ChartRenderer.svg(f), e.getKey() + ".svg");
            assertArrayEquals(ChartRenderer.png(f), ChartRenderer.png(f), e.getKey() + ".png");
        }
    }

    @Test
    void everyChartRendersToValidFilesInEveryFormat() throws Exception {
        Path target = dir.resolve("charts");
        try (RunFolder run = AtomicOutput.openRunFolder(target, false, new RunInputs())) {
            for (Map.Entry<String, Figure> e : ChartSamples.all().entrySet()) {
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
        // 3.5 in (252 pt) or 7.1 in (511 pt) wide at 300 dpi
        assertTrue(image.getWidth() == 1050 || image.getWidth() == 2129, file + " width " + image.getWidth());
        assertTrue(image.getHeight() > 250, file.toString());
    }

    private static void checkSvg(final Path file) throws Exception {
        DocumentBuilderFactory factory = DocumentBuilderFactory.newInstance();
        factory.setFeature("http://apache.org/xml/features/nonvalidating/load-external-dtd", false);
        factory.setNamespaceAware(true);
        Document svg = factory.newDocumentBuilder().parse(file.toFile());
        assertEquals("svg", svg.getDocumentElement().getLocalName(), file.toString());
        assertTrue(svg.getDocumentElement().getElementsByTagName("*").getLength() > 10, file + " has content");
        assertTrue(svg.getElementsByTagName("text").getLength() >= 10, file + " keeps its labels as <text>");
        assertTrue(Files.size(file) < SIZE_LIMIT, file + " under the size limit: " + Files.size(file));
    }

    private static void checkPdf(final Path file) throws IOException {
        byte[] bytes = Files.readAllBytes(file);
        String head = new String(bytes, 0, 5, StandardCharsets.ISO_8859_1);
        String tail = new String(bytes, Math.max(0, bytes.length - 16), Math.min(16, bytes.length),
                StandardCharsets.ISO_8859_1).strip();
        assertEquals("%PDF-", head, file.toString());
        assertTrue(tail.endsWith("%%EOF"), file + " ends with %%EOF: " + tail);
        assertTrue(bytes.length > 5000, file + " not trivially small");
        assertTrue(bytes.length < SIZE_LIMIT, file + " under the size limit: " + bytes.length);
        try (org.apache.pdfbox.pdmodel.PDDocument doc = org.apache.pdfbox.Loader.loadPDF(bytes)) {
            String text = new org.apache.pdfbox.text.PDFTextStripper().getText(doc);
            assertTrue(text.strip().length() > 20, file + " has extractable text: " + text);
            boolean embedded = false;
            org.apache.pdfbox.pdmodel.PDResources res = doc.getPage(0).getResources();
            for (org.apache.pdfbox.cos.COSName x : res.getXObjectNames()) {
                org.apache.pdfbox.pdmodel.graphics.PDXObject o = res.getXObject(x);
                if (o instanceof org.apache.pdfbox.pdmodel.graphics.form.PDFormXObject form) {
                    for (org.apache.pdfbox.cos.COSName f : form.getResources().getFontNames()) {
                        embedded |= form.getResources().getFont(f).isEmbedded();
                    }
                }
            }
            assertTrue(embedded, file + " embeds its font");
        }
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
                () -> new CondensationCurves(t, List.of(new Curve("Al", new double[] {0.2, 1.5})),
                        new double[] {Double.NaN}, List.of()));
        assertThrows(IllegalArgumentException.class,
                () -> new CondensationCurves(t, List.of(new Curve("Al", new double[] {0.2, Double.NaN})),
                        new double[] {Double.NaN}, List.of()));
        assertThrows(IllegalArgumentException.class,
                () -> new PhaseAssemblage(t, List.of(new Curve("metal", new double[] {1})), "wt%", List.of()));
        assertThrows(IllegalArgumentException.class, () -> new RadialProfile.Zone("b", 1.2, 0.8, new double[2]));
        assertThrows(IllegalArgumentException.class, () -> SurveyScatter.Point.of("x", Double.NaN, 1));
    }

    @Test
    void eachSeriesIsOnePathAndEveryAxisTitleIsText() {
        for (Map.Entry<String, Figure> e : ChartSamples.all().entrySet()) {
            Figure figure = e.getValue();
            String svg = new String(ChartRenderer.svg(figure), StandardCharsets.UTF_8);
            // glyph outlines of the bundled font are quadratic curves; lines and markers never are
            assertEquals(0, svg.lines().filter(l -> l.contains("<path") && l.contains(" Q")).count(),
                    e.getKey() + ": every label written as text, none left as glyph outlines");
            for (XYChart c : figure.charts()) {
                XYStyler s = c.getStyler();
                if (s.isXAxisTitleVisible() && !c.getXAxisTitle().isEmpty()) {
                    assertTrue(svg.contains(">" + escaped(c.getXAxisTitle()) + "</text>"), e.getKey() + ": "
                            + c.getXAxisTitle());
                }
                if (s.isYAxisTitleVisible() && !c.getYAxisTitle().isEmpty()) {
                    assertTrue(svg.contains(">" + escaped(c.getYAxisTitle()) + "</text>"), e.getKey() + ": "
                            + c.getYAxisTitle());
                }
                for (XYSeries series : c.getSeriesCollection()) {
                    if (series.getXYSeriesRenderStyle().orElse(null) == XYSeries.XYSeriesRenderStyle.Line
                            && series.getXData().length > 20) {
                        String[] style = strokeOf(series).split("\\|");
                        long paths = svg.lines().filter(l -> l.contains(style[0]) && l.contains(style[1])).count();
                        assertTrue(paths >= 1 && paths <= 3, e.getKey() + ": series " + series.getName() + " drawn as "
                                + paths + " paths");
                    }
                }
            }
        }
    }

    @Test
    void condensationCurvesAreOnePathEachAndLabelledAsText() {
        // 14 invented elements of 171 points each: one path per curve (and one legend sample), not 170 segments
        Figure f = ChartSamples.condensation().chart(ChartSize.COLUMN_TALL);
        String svg = new String(ChartRenderer.svg(f), StandardCharsets.UTF_8);
        long curvePaths = svg.lines().filter(l -> l.contains("<path") && l.contains("stroke-linejoin:round")).count();
        assertEquals(2 * 14, curvePaths, "one path per curve and one legend sample per curve");
        assertEquals(0, svg.lines().filter(l -> l.contains("<line")).count(), "no separate segments");
        for (String element : List.of("Al", "Ti", "Mg", "Na", "S", "T50")) {
            assertTrue(svg.contains(">" + element + "</text>"), element + " written as text");
        }
    }

    @Test
    void temperatureAxisDecreasesToTheRightWithPositiveLabels() {
        Figure f = ChartSamples.condensation().chart(ChartSize.COLUMN_TALL);
        XYChart c = f.charts().get(0);
        assertTrue(c.getScreenXFromChart(-2000) < c.getScreenXFromChart(-300), "hot at the left");
        String svg = new String(ChartRenderer.svg(f), StandardCharsets.UTF_8);
        assertTrue(svg.contains(">1500</text>") && !svg.contains(">\u22121500</text>"), "temperatures labelled as such");
    }

    private static String escaped(final String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;");
    }

    /**
     * @return the SVG style of a series' stroke (colour | width and dash pattern), as VectorGraphics2D writes
     *         it (an opacity between the two parts)
     */
    private static String strokeOf(final XYSeries s) {
        java.awt.Color c = s.getLineColor();
        java.awt.BasicStroke b = s.getLineStyle();
        StringBuilder style = new StringBuilder("stroke:rgb(").append(c.getRed()).append(',').append(c.getGreen())
                .append(',').append(c.getBlue()).append(")|");
        if (b.getLineWidth() != 1f) {
            style.append(";stroke-width:").append(number(b.getLineWidth()));
        }
        style.append(";stroke-miterlimit:10;stroke-linejoin:round;");
        float[] dash = b.getDashArray();
        if (dash == null) {
            return style.append('"').toString();
        }
        style.append("stroke-dasharray:");
        for (int i = 0; i < dash.length; i++) {
            style.append(i > 0 ? "," : "").append(number(dash[i]));
        }
        return style.append(";\"").toString();
    }

    private static String number(final float v) {
        return v == Math.rint(v) ? Integer.toString((int) v) : Float.toString(v);
    }
}
