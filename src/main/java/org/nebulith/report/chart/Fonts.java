package org.nebulith.report.chart;

import java.awt.Font;
import java.awt.FontFormatException;
import java.awt.font.FontRenderContext;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.concurrent.ConcurrentHashMap;
import java.util.Map;

/**
 * The one typeface of every chart: DejaVu Sans (Bitstream Vera licence, text beside the font file),
 * bundled so that text is measured, drawn and embedded (PDF) with the same glyphs on every machine.
 * It is registered with the graphics environment. SVG files name the family and let the viewer supply it (DejaVu Sans, else Verdana, a close match in
 * width).
 */
public final class Fonts {

    /** Family name written into SVG files, with fallbacks. */
    public static final String SVG_FAMILY = "'DejaVu Sans', Verdana, 'Bitstream Vera Sans', sans-serif";

    /** Classpath resource of the bundled font. */
    static final String RESOURCE = "fonts/DejaVuSans.ttf";

    private static final FontRenderContext FRC = new FontRenderContext(null, true, true);
    private static final Font BASE = load();
    private static final Map<Float, Font> SIZED = new ConcurrentHashMap<>();

    private Fonts() {
    }

    private static Font load() {
        try (InputStream in = Fonts.class.getResourceAsStream(RESOURCE)) {
            if (in == null) {
                throw new IllegalStateException("bundled chart font " + RESOURCE + " missing from the classpath");
            }
            Font font = Font.createFont(Font.TRUETYPE_FONT, in);
            // known by name to Java2D too, so that PNG and vector files draw the same glyphs
            java.awt.GraphicsEnvironment.getLocalGraphicsEnvironment().registerFont(font);
            return font;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (FontFormatException e) {
            throw new IllegalStateException("bundled chart font unreadable", e);
        }
    }

    /** @return the bytes of the bundled TrueType file (for embedding in PDF) */
    static InputStream open() {
        return Fonts.class.getResourceAsStream(RESOURCE);
    }

    /**
     * @param sizePt font size [pt]
     * @return the bundled font at that size
     */
    public static Font at(final double sizePt) {
        return SIZED.computeIfAbsent((float) sizePt, BASE::deriveFont);
    }

    /**
     * @param text   a string
     * @param sizePt font size [pt]
     * @return its advance width [pt]
     */
    public static double width(final String text, final double sizePt) {
        return at(sizePt).getStringBounds(text, FRC).getWidth();
    }

    /**
     * @param sizePt font size [pt]
     * @return the height of a capital letter [pt] (used to centre text vertically)
     */
    public static double capHeight(final double sizePt) {
        return 0.73 * sizePt;
    }
}
