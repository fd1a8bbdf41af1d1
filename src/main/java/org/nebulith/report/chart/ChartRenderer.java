package org.nebulith.report.chart;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.pdmodel.font.PDType0Font;
import org.nebulith.files.RunFolder;

import de.erichseifert.vectorgraphics2d.Document;
import de.erichseifert.vectorgraphics2d.Processors;
import de.erichseifert.vectorgraphics2d.VectorGraphics2D;
import de.erichseifert.vectorgraphics2d.util.PageSize;
import de.rototor.pdfbox.graphics2d.PdfBoxGraphics2D;
import de.rototor.pdfbox.graphics2d.PdfBoxGraphics2DFontTextDrawer;

/**
 * Renders a {@link Figure} (XChart charts) to PNG at {@link ChartStyle#PNG_DPI} (the resolution
 * recorded in the file), to SVG (VectorGraphics2D) and to PDF (pdfbox-graphics2d, the bundled
 * DejaVu Sans embedded as a subset), the vector files painted through a {@link VectorCanvas} so
 * that labels stay text and each series one path. Every file is written through a temporary file
 * and moved into place, so a failed render never leaves an empty or partial file. Requires
 * {@code java.awt.headless=true} on machines without a display.
 */
public final class ChartRenderer {

    private static final double POINTS_PER_INCH = 72.0;

    private ChartRenderer() {
    }

    /**
     * A chart written to a run folder.
     *
     * @param baseName file name without extension
     * @param png      the PNG bytes (for embedding in the HTML report)
     * @param files    the written files by format (paths in the run folder's working copy)
     */
    public record Rendered(String baseName, byte[] png, Map<ChartFormat, Path> files) {
    }

    /**
     * Starts drawing a small throw-away chart in all three formats on a background thread of low
     * priority and returns at once: a command that computes for a while first (on one core) then
     * finds the chart code loaded and compiled (XChart, VectorGraphics2D, PDFBox, the font), which
     * otherwise takes a second or more of its first chart. Nothing is written; a failure here is
     * ignored (the real charts report their own).
     */
    public static void warmUpInBackground() {
        Thread t = new Thread(ChartRenderer::warmUp, "chart warm-up");
        t.setDaemon(true);
        t.setPriority(Thread.MIN_PRIORITY);
        t.start();
    }

    private static void warmUp() {
        try {
            double[] x = {1, 2, 3, 5, 8};
            double[] y = {0.1, 0.4, 0.2, 0.9, 0.5};
            Figure f = new DevolatilisationPattern(List.of("Mg", "Si", "Fe", "Na", "S"), new double[] {1300, 1310, 1330,
                    960, 660}, List.of(new DevolatilisationPattern.Body("warm-up", y)), "ratio", List.of("warm-up"))
                    .chart(ChartSize.COLUMN);
            png(f);
            svg(f);
            pdf(f);
            new CondensationCurves(x, List.of(new Curve("Mg", y)), new double[] {2}, List.of()).chart(ChartSize.COLUMN);
        } catch (RuntimeException e) {
            // only a warm-up
        }
    }

    /**
     * Writes {@code baseName.png/.svg/.pdf} (those requested) into a run folder.
     *
     * @param figure   the chart
     * @param run      the open run folder
     * @param baseName file name without extension (e.g. {@code condensation-curves})
     * @param formats  formats to write; PNG is always rendered (the report embeds it)
     * @return what was written
     */
    public static Rendered write(final Figure figure, final RunFolder run, final String baseName,
                                 final Set<ChartFormat> formats) {
        // XChart charts keep layout state while painting: the three encodings are made one after the other
        byte[] png = png(figure);
        Map<ChartFormat, Path> files = new EnumMap<>(ChartFormat.class);
        for (ChartFormat format : formats) {
            byte[] bytes = format == ChartFormat.PNG ? png : format == ChartFormat.SVG ? svg(figure) : pdf(figure);
            files.put(format, run.write(baseName + "." + format.extension(), out -> out.write(bytes)));
        }
        return new Rendered(baseName, png, files);
    }

    /**
     * @param figure the chart
     * @return PNG bytes at {@link ChartStyle#PNG_DPI}
     */
    public static byte[] png(final Figure figure) {
        double scale = ChartStyle.PNG_DPI / POINTS_PER_INCH;
        int width = (int) Math.round(figure.widthPt() * scale);
        int height = (int) Math.round(figure.heightPt() * scale);
        BufferedImage image = new BufferedImage(width, height, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = image.createGraphics();
        try {
            g.setColor(Color.WHITE);
            g.fillRect(0, 0, width, height);
            g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_FRACTIONALMETRICS, RenderingHints.VALUE_FRACTIONALMETRICS_ON);
            g.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
            g.scale(scale, scale);
            figure.paint(g);
        } finally {
            g.dispose();
        }
        return PngEncoder.encode(image, ChartStyle.PNG_DPI);
    }

    /**
     * @param figure the chart
     * @return the SVG document (UTF-8), sized in points, labels as {@code <text>}
     */
    public static byte[] svg(final Figure figure) {
        VectorGraphics2D g = new VectorGraphics2D();
        VectorCanvas canvas = new VectorCanvas(g, new TextOutlines(figure.texts(), figure.fonts()));
        figure.paint(canvas);
        canvas.dispose();
        Document doc = Processors.get("svg").getDocument(g.getCommands(),
                new PageSize(0, 0, figure.widthPt(), figure.heightPt()));
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try {
            doc.writeTo(out);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        String text = out.toString(StandardCharsets.UTF_8);
        // the page is laid out in points: say so, so that the file prints at its figure size
        int tag = text.indexOf("<svg");
        int end = text.indexOf('>', tag);
        String root = text.substring(tag, end).replaceAll("(width|height)=\"([0-9.]+)px\"", "$1=\"$2pt\"");
        text = text.substring(0, tag) + root + text.substring(end);
        return text.getBytes(StandardCharsets.UTF_8);
    }

    /**
     * @param figure the chart
     * @return a one-page PDF of the figure's size, text as text in the embedded (subset) chart font;
     *         the same figure gives the same bytes
     */
    public static byte[] pdf(final Figure figure) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try (PDDocument doc = new PDDocument()) {
            // the file identifier from the chart's own text rather than the clock, so that the same
            // chart gives the same bytes on every run
            doc.setDocumentId((long) figure.texts().hashCode());
            float w = (float) figure.widthPt();
            float h = (float) figure.heightPt();
            PDPage page = new PDPage(new PDRectangle(w, h));
            doc.addPage(page);
            PdfBoxGraphics2D g = new PdfBoxGraphics2D(doc, w, h);
            PdfBoxGraphics2DFontTextDrawer text = new PdfBoxGraphics2DFontTextDrawer();
            try (InputStream font = Fonts.open()) {
                text.registerFont(Fonts.at(1).getFontName(), PDType0Font.load(doc, font, true));
            }
            g.setFontTextDrawer(text);
            VectorCanvas canvas = new VectorCanvas(g, new TextOutlines(figure.texts(), figure.fonts()));
            figure.paint(canvas);
            canvas.dispose();
            g.dispose();
            try (PDPageContentStream content = new PDPageContentStream(doc, page)) {
                content.drawForm(g.getXFormObject());
            }
            doc.save(out);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out.toByteArray();
    }
}
