package org.nebulith.report.chart;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.EnumMap;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.CompletableFuture;

import javax.imageio.IIOImage;
import javax.imageio.ImageIO;
import javax.imageio.ImageTypeSpecifier;
import javax.imageio.ImageWriteParam;
import javax.imageio.ImageWriter;
import javax.imageio.metadata.IIOInvalidTreeException;
import javax.imageio.metadata.IIOMetadata;
import javax.imageio.metadata.IIOMetadataNode;
import javax.imageio.stream.ImageOutputStream;

import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.pdmodel.font.PDType0Font;
import org.knowm.xchart.VectorGraphicsEncoder;
import org.knowm.xchart.internal.chartpart.Chart;
import org.nebulith.files.RunFolder;

import de.rototor.pdfbox.graphics2d.PdfBoxGraphics2D;
import de.rototor.pdfbox.graphics2d.PdfBoxGraphics2DFontTextDrawer;

/**
 * Renders a chart to PNG (at {@link ChartStyle#PNG_DPI}, with the resolution recorded in the
 * file), SVG and PDF (XChart's {@link VectorGraphicsEncoder}). Every file is written through a
 * temporary file and moved into place, so a failed render (missing fonts, say) never leaves an
 * empty or partial file. Requires {@code java.awt.headless=true} on machines without a display.
 */
public final class ChartRenderer {

    private static final double POINTS_PER_INCH = 72.0;
    private static final double METRES_PER_INCH = 0.0254;

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
     * Writes {@code baseName.png/.svg/.pdf} (those requested) into a run folder: PNG at
     * {@link ChartStyle#PNG_DPI}, SVG with live text ({@link SvgWriter}), PDF with the chart font
     * embedded (subset) and text kept as text.
     *
     * @param drawing  the chart
     * @param run      the open run folder
     * @param baseName file name without extension (e.g. {@code condensation-curves})
     * @param formats  formats to write; PNG is always rendered (the report embeds it)
     * @return what was written
     */
    public static Rendered write(final Drawing drawing, final RunFolder run, final String baseName,
                                 final Set<ChartFormat> formats) {
        // the three encodings are independent: computed in parallel, then written one after the other
        CompletableFuture<byte[]> png = CompletableFuture.supplyAsync(() -> png(drawing));
        CompletableFuture<byte[]> svg = formats.contains(ChartFormat.SVG)
                ? CompletableFuture.supplyAsync(() -> SvgWriter.write(drawing).getBytes(StandardCharsets.UTF_8)) : null;
        CompletableFuture<byte[]> pdf = formats.contains(ChartFormat.PDF)
                ? CompletableFuture.supplyAsync(() -> pdfBytes(drawing)) : null;
        Map<ChartFormat, Path> files = new EnumMap<>(ChartFormat.class);
        for (ChartFormat format : formats) {
            byte[] bytes = join(format == ChartFormat.PNG ? png : format == ChartFormat.SVG ? svg : pdf);
            files.put(format, run.write(baseName + "." + format.extension(), out -> out.write(bytes)));
        }
        return new Rendered(baseName, join(png), files);
    }

    private static byte[] join(final CompletableFuture<byte[]> f) {
        try {
            return f.join();
        } catch (java.util.concurrent.CompletionException e) {
            if (e.getCause() instanceof RuntimeException r) {
                throw r;
            }
            throw e;
        }
    }

    private static byte[] pdfBytes(final Drawing drawing) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try {
            pdf(drawing, out);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out.toByteArray();
    }

    /**
     * @param drawing the chart
     * @return PNG bytes at {@link ChartStyle#PNG_DPI}
     */
    public static byte[] png(final Drawing drawing) {
        double scale = ChartStyle.PNG_DPI / POINTS_PER_INCH;
        int width = (int) Math.round(drawing.widthPt() * scale);
        int height = (int) Math.round(drawing.heightPt() * scale);
        BufferedImage image = new BufferedImage(width, height, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = image.createGraphics();
        try {
            g.setColor(Color.WHITE);
            g.fillRect(0, 0, width, height);
            g.scale(scale, scale);
            Java2dPainter.paint(drawing, g);
        } finally {
            g.dispose();
        }
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try {
            encodePng(image, bytes);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return bytes.toByteArray();
    }

    /**
     * One-page PDF of the chart's size, text as text in the embedded (subset) chart font.
     *
     * @param drawing the chart
     * @param out     destination
     * @throws IOException on failure
     */
    public static void pdf(final Drawing drawing, final OutputStream out) throws IOException {
        try (PDDocument doc = new PDDocument()) {
            float w = (float) drawing.widthPt();
            float h = (float) drawing.heightPt();
            PDPage page = new PDPage(new PDRectangle(w, h));
            doc.addPage(page);
            PdfBoxGraphics2D g = new PdfBoxGraphics2D(doc, w, h);
            PdfBoxGraphics2DFontTextDrawer text = new PdfBoxGraphics2DFontTextDrawer();
            try (InputStream font = Fonts.open()) {
                text.registerFont(Fonts.at(1).getFontName(), PDType0Font.load(doc, font, true));
            }
            g.setFontTextDrawer(text);
            Java2dPainter.paint(drawing, g);
            g.dispose();
            try (PDPageContentStream content = new PDPageContentStream(doc, page)) {
                content.drawForm(g.getXFormObject());
            }
            doc.save(out);
        }
    }

    /**
     * Writes {@code baseName.png/.svg/.pdf} (those requested) into a run folder.
     *
     * @param chart    the chart
     * @param run      the open run folder
     * @param baseName file name without extension (e.g. {@code condensation-curves})
     * @param formats  formats to write; PNG is always rendered (the report embeds it)
     * @return what was written
     */
    public static Rendered write(final Chart<?, ?> chart, final RunFolder run, final String baseName,
                                 final Set<ChartFormat> formats) {
        byte[] png = png(chart);
        Map<ChartFormat, Path> files = new EnumMap<>(ChartFormat.class);
        for (ChartFormat format : formats) {
            String name = baseName + "." + format.extension();
            Path path = format == ChartFormat.PNG
                    ? run.write(name, out -> out.write(png))
                    : run.write(name, out -> vector(chart, format, out));
            files.put(format, path);
        }
        return new Rendered(baseName, png, files);
    }

    /**
     * @param chart the chart
     * @return PNG bytes at {@link ChartStyle#PNG_DPI}
     */
    public static byte[] png(final Chart<?, ?> chart) {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try {
            writePng(chart, bytes);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return bytes.toByteArray();
    }

    /**
     * @param chart  the chart
     * @param format SVG or PDF
     * @param out    destination
     * @throws IOException on failure
     */
    public static void vector(final Chart<?, ?> chart, final ChartFormat format, final OutputStream out)
            throws IOException {
        VectorGraphicsEncoder.VectorGraphicsFormat vg;
        switch (format) {
            case SVG:
                vg = VectorGraphicsEncoder.VectorGraphicsFormat.SVG;
                break;
            case PDF:
                vg = VectorGraphicsEncoder.VectorGraphicsFormat.PDF;
                break;
            default:
                throw new IllegalArgumentException("not a vector format: " + format);
        }
        VectorGraphicsEncoder.saveVectorGraphic(chart, out, vg);
    }

    private static void writePng(final Chart<?, ?> chart, final OutputStream out) throws IOException {
        double scale = ChartStyle.PNG_DPI / POINTS_PER_INCH;
        int width = (int) Math.round(chart.getWidth() * scale);
        int height = (int) Math.round(chart.getHeight() * scale);
        BufferedImage image = new BufferedImage(width, height, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = image.createGraphics();
        try {
            g.setColor(Color.WHITE);
            g.fillRect(0, 0, width, height);
            g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_FRACTIONALMETRICS, RenderingHints.VALUE_FRACTIONALMETRICS_ON);
            g.scale(scale, scale);
            chart.paint(g, chart.getWidth(), chart.getHeight());
        } finally {
            g.dispose();
        }
        encodePng(image, out);
    }

    private static void encodePng(final BufferedImage image, final OutputStream out) throws IOException {
        ImageWriter writer = ImageIO.getImageWritersByFormatName("png").next();
        try (ImageOutputStream stream = ImageIO.createImageOutputStream(out)) {
            ImageWriteParam param = writer.getDefaultWriteParam();
            IIOMetadata metadata = writer.getDefaultImageMetadata(ImageTypeSpecifier.createFromRenderedImage(image),
                    param);
            recordDpi(metadata);
            writer.setOutput(stream);
            writer.write(metadata, new IIOImage(image, null, metadata), param);
        } finally {
            writer.dispose();
        }
    }

    private static void recordDpi(final IIOMetadata metadata) throws IIOInvalidTreeException {
        String perMetre = Integer.toString((int) Math.round(ChartStyle.PNG_DPI / METRES_PER_INCH));
        IIOMetadataNode phys = new IIOMetadataNode("pHYs");
        phys.setAttribute("pixelsPerUnitXAxis", perMetre);
        phys.setAttribute("pixelsPerUnitYAxis", perMetre);
        phys.setAttribute("unitSpecifier", "meter");
        IIOMetadataNode root = new IIOMetadataNode("javax_imageio_png_1.0");
        root.appendChild(phys);
        metadata.mergeTree("javax_imageio_png_1.0", root);
    }
}
