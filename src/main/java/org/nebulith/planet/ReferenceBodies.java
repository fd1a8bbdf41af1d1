package org.nebulith.planet;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.Collections;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.OptionalDouble;

import org.nebulith.composition.CiReference;
import org.nebulith.composition.ElementAbundances;
import org.nebulith.thermo.Element;

/**
 * Known bodies to compare planets with, read from the bundled {@code reference-bodies.csv}
 * (provenance in its header): bulk Earth (McDonough 2003), bulk silicate Earth (McDonough &amp; Sun
 * 1995), CI chondrite (Palme &amp; O'Neill 2014, {@code ci-chondrite-palme-oneill2014}), and the core mass
 * fractions of Earth and of Mars (Mars values from memory, flagged). Element wt% are converted to moles
 * with IUPAC weights. {@code ci-chondrite} is the default CI reference ({@link CiReference#DEFAULT},
 * Lodders, Palme &amp; Gail 2009), the same composition the dust enrichment adds; {@link #ci} gives either.
 */
public final class ReferenceBodies {
    /**
     * @param name             body name
     * @param elements         element amounts [mol per 100 g] (empty if only a CMF is known)
     * @param coreMassFraction core mass fraction, if known
     * @param mgNumber         mantle Mg#, if known
     * @param fromMemory       true if any value is recalled rather than read in a source
     */
    public record Body(String name, ElementAbundances elements, OptionalDouble coreMassFraction, OptionalDouble mgNumber,
                       boolean fromMemory) {
    }

    private static final Map<String, Body> BODIES = load();

    private ReferenceBodies() {
    }

    /** @return all bodies by name, in file order */
    public static Map<String, Body> all() {
        return BODIES;
    }

    /** Name of the CI body of the default reference. */
    public static final String CI = "ci-chondrite";

    /**
     * @param ref a CI reference
     * @return its body (named {@value #CI} with the reference's citation)
     */
    public static Body ci(CiReference ref) {
        return new Body(CI + " (" + ref.citation() + ")", ref.abundances(), OptionalDouble.empty(), OptionalDouble.empty(),
                false);
    }

    /** @return the named body @throws IllegalArgumentException if unknown */
    public static Body get(String name) {
        Body b = BODIES.get(name);
        if (b == null) {
            throw new IllegalArgumentException("unknown reference body '" + name + "'; accepted: " + BODIES.keySet());
        }
        return b;
    }

    private static Map<String, Body> load() {
        Map<String, EnumMap<Element, Double>> el = new LinkedHashMap<>();
        Map<String, Double> cmf = new LinkedHashMap<>();
        Map<String, Double> mg = new LinkedHashMap<>();
        Map<String, Boolean> memory = new LinkedHashMap<>();
        try (InputStream in = ReferenceBodies.class.getResourceAsStream("reference-bodies.csv");
             BufferedReader br = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8))) {
            br.lines().filter(l -> !l.startsWith("#") && !l.startsWith("body,") && !l.isBlank()).forEach(l -> {
                String[] f = l.split(",");
                el.computeIfAbsent(f[0], k -> new EnumMap<>(Element.class));
                memory.merge(f[0], f[5].equals("from-memory"), Boolean::logicalOr);
                double v = Double.parseDouble(f[3]);
                if (f[1].equals("element")) {
                    Element e = Element.fromSymbol(f[2]);
                    el.get(f[0]).put(e, v / e.atomicWeight());
                } else if (f[1].equals("core_mass_fraction")) {
                    cmf.put(f[0], v);
                } else {
                    mg.put(f[0], v);
                }
            });
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read reference-bodies.csv", e);
        }
        Map<String, Body> out = new LinkedHashMap<>();
        el.put(CI, new EnumMap<>(Element.class));
        for (String name : el.keySet()) {
            if (name.equals(CI)) {
                out.put(CI, ci(CiReference.DEFAULT));
                continue;
            }
            out.put(name, new Body(name, ElementAbundances.of(el.get(name)),
                    cmf.containsKey(name) ? OptionalDouble.of(cmf.get(name)) : OptionalDouble.empty(),
                    mg.containsKey(name) ? OptionalDouble.of(mg.get(name)) : OptionalDouble.empty(), memory.get(name)));
        }
        return Collections.unmodifiableMap(out);
    }
}
