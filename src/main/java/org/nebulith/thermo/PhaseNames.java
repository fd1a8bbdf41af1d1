package org.nebulith.thermo;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.Collection;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.ArrayList;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The names users see for phases: mineral names where the phase has one (andalusite, troilite), the
 * conventional formula otherwise (NaAlO2, KCl, Ti4O7), one name for all data pieces of one phase
 * (FeS(a), FeS(b), FeS(c) are all troilite; albite/B88 is albite). The mapping lives in the resource
 * {@code phase-names.csv} beside this class, with its provenance; this is the only place that turns
 * a data id into a display name.
 *
 * <p>Data ids are the ids of {@code species.csv}: NASA Glenn ids {@code FORMULA(state)} with the NASA
 * upper-case {@code AL} and {@code CL}, mineral names, and {@code name/VARIANT} alternative rows. A
 * solid of one element without a mineral name shows as {@code Mn metal}. Gas
 * ids get the conventional casing only (ALCL becomes AlCl). Names that are no data id (solution
 * phases such as {@code olivine}) are returned unchanged.
 */
public final class PhaseNames {
    private static final String RESOURCE = "/org/nebulith/thermo/phase-names.csv";
    private static final Pattern NASA_ID = Pattern.compile("([A-Z][A-Za-z0-9().]*?)\\(([A-Za-z0-9'-]+)\\)");
    private static final Pattern UPPER_AL_CL = Pattern.compile("(AL|CL)(?![a-z])");
    private static final Pattern ONE_ELEMENT = Pattern.compile("[A-Z][a-z]?");
    private static final Map<String, String> NAMES = load();

    private PhaseNames() {
    }

    /**
     * Display name of a data id.
     *
     * @param dataId id of a species in the database, or any other phase name
     * @return the name to show users; never null, never empty for a non-empty id
     */
    public static String display(String dataId) {
        String exact = NAMES.get(dataId);
        if (exact != null) {
            return exact;
        }
        int slash = dataId.indexOf('/');
        if (slash > 0) {
            return display(dataId.substring(0, slash));
        }
        Matcher m = NASA_ID.matcher(dataId);
        if (!m.matches()) {
            return conventionalCase(dataId);
        }
        String formula = m.group(1);
        if (m.group(2).equals("L")) {
            return conventionalCase(formula) + " liquid";
        }
        String named = NAMES.get(formula);
        if (named != null) {
            return named;
        }
        String shown = conventionalCase(formula);
        return ONE_ELEMENT.matcher(shown).matches() ? shown + " metal" : shown;
    }

    /** True if the id is shown under a name different from itself (provenance worth a data_id column). */
    public static boolean isRenamed(String dataId) {
        return !display(dataId).equals(dataId);
    }

    /**
     * Groups data ids by display name, in the order of first appearance; pieces of one phase end up
     * in one group so tables can merge them.
     *
     * @param dataIds data ids in the order a table lists them
     * @return display name to the data ids shown under it (unmodifiable)
     */
    public static Map<String, List<String>> group(Collection<String> dataIds) {
        Map<String, List<String>> groups = new LinkedHashMap<>();
        for (String id : dataIds) {
            groups.computeIfAbsent(display(id), k -> new ArrayList<>()).add(id);
        }
        groups.replaceAll((k, v) -> List.copyOf(v));
        return Collections.unmodifiableMap(groups);
    }

    /** The data ids of a group joined for a {@code data_id} cell: {@code FeS(a)+FeS(b)}. */
    public static String dataIdCell(Collection<String> dataIds) {
        return String.join("+", dataIds);
    }

    /** Conventional element casing of a NASA formula: AL becomes Al and CL becomes Cl. */
    static String conventionalCase(String formula) {
        return UPPER_AL_CL.matcher(formula).replaceAll(r -> r.group(1).charAt(0) + r.group(1).substring(1).toLowerCase());
    }

    private static Map<String, String> load() {
        try (InputStream in = PhaseNames.class.getResourceAsStream(RESOURCE)) {
            if (in == null) {
                throw new IllegalStateException("resource " + RESOURCE + " missing from the classpath");
            }
            Map<String, String> names = new LinkedHashMap<>();
            String[] lines = new String(in.readAllBytes(), StandardCharsets.UTF_8).split("\r?\n");
            for (int i = 0; i < lines.length; i++) {
                String line = lines[i].strip();
                if (line.isEmpty() || line.startsWith("#")) {
                    continue;
                }
                String[] f = line.split(",", -1);
                if (f.length != 2 || f[0].isBlank() || f[1].isBlank() || names.put(f[0], f[1]) != null) {
                    throw new IllegalStateException(RESOURCE + " line " + (i + 1) + ": expected key,display once per key");
                }
            }
            return Map.copyOf(names);
        } catch (IOException ex) {
            throw new UncheckedIOException(ex);
        }
    }
}
