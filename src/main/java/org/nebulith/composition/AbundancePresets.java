package org.nebulith.composition;

import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

/**
 * Resolves a composition argument: a preset name, an abundance file, or an inline list.
 *
 * <p>Presets live in the repository folder {@code presets/} and are shipped on the classpath
 * under {@code presets/} (the build copies the folder), so the jar works from any directory.
 */
public final class AbundancePresets {
    /** Proto-solar abundances, Lodders 2003 Table 2. */
    public static final String PROTOSOLAR_LODDERS2003 = "protosolar-lodders2003";
    /** Present-day photosphere, Asplund et al. 2009 Table 1. */
    public static final String PHOTOSPHERE_ASPLUND2009 = "photosphere-asplund2009";
    /** CI chondrite (Lodders, Palme &amp; Gail 2009 via Asplund et al. 2009 Table 1), for dust. */
    public static final String CI_CHONDRITE = "ci-chondrite";
    /** CI chondrite (Palme &amp; O'Neill 2014, wt%), the alternative CI reference ({@link CiReference}). */
    public static final String CI_CHONDRITE_PALME_ONEILL2014 = "ci-chondrite-palme-oneill2014";
    /** All abundance presets. */
    /** The invented host star of the demo scenario (not a real star). */
    public static final String DEMO_STAR = "star-tessaly";
    /** The preset names. */
    public static final List<String> NAMES = List.of(PROTOSOLAR_LODDERS2003, PHOTOSPHERE_ASPLUND2009, CI_CHONDRITE,
            CI_CHONDRITE_PALME_ONEILL2014, DEMO_STAR);

    private AbundancePresets() {
    }

    /**
     * @param name a name from {@link #NAMES}
     * @return the preset, read from the classpath
     * @throws IllegalArgumentException for an unknown name
     */
    public static AbundanceSet preset(String name) {
        String resource = "/presets/" + name + ".csv";
        InputStream in = AbundancePresets.class.getResourceAsStream(resource);
        if (!NAMES.contains(name) || in == null) {
            throw new IllegalArgumentException("unknown composition preset '" + name + "'; accepted: " + NAMES
                    + ", an abundance file, or inline Element=amount pairs");
        }
        try (Reader r = new InputStreamReader(in, StandardCharsets.UTF_8)) {
            return AbundanceFileReader.read(r, name);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read preset " + name, e);
        }
    }

    /**
     * Resolves, in this order: inline notation (contains '='), preset name, existing file.
     *
     * @param arg the user's argument
     * @return the composition
     * @throws IOException if the file cannot be read
     */
    public static AbundanceSet resolve(String arg) throws IOException {
        if (arg.contains("=")) {
            return new AbundanceSet("inline", List.of("inline composition"), ElementAbundances.parseInline(arg));
        }
        if (NAMES.contains(arg)) {
            return preset(arg);
        }
        Path p = Path.of(arg);
        if (Files.isRegularFile(p)) {
            try (Reader r = Files.newBufferedReader(p, StandardCharsets.UTF_8)) {
                return AbundanceFileReader.read(r, p.toString());
            }
        }
        throw new IllegalArgumentException("composition '" + arg + "' is neither a preset " + NAMES
                + ", an existing file, nor inline Element=amount pairs");
    }
}
