package org.nebulith.thermo.source;

import java.io.IOException;
import java.io.Reader;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.nebulith.errors.InputException;
import org.nebulith.thermo.Formula;
import org.nebulith.thermo.mineral.MineralForm;

/**
 * Reads the mineral table ({@code minerals.csv}, described in the README of the thermo sources):
 * one row per phase and source, with the transition terms named in the {@code notes} column.
 * Produces one {@link MineralRow} per table row, with the project id, the variant tag, the
 * species-file form and the {@code key=value} parameters.
 */
final class MineralTableReader {
    /** Source column prefix to (source key, variant tag). */
    private static final String[][] SOURCES = {
        {"Holland & Powell 2011", "HollandPowell2011", "ds62"},
        {"Berman 1988", "Berman1988", "B88"},
        {"Hallstedt 1990", "Hallstedt1990", "Hallstedt1990"},
        {"Geiger", "Geiger1988", "Geiger1988"},
        {"Cemdata18", "Lothenbach2019", "Cemdata18"},
        {"MELTS", "GhiorsoSack1995", "GS1995"},
        {"Zhu & Sverjensky 1992", "ZhuSverjensky1992", "ZS92"},
        {"Robie & Hemingway 1995", "RobieHemingway1995", "RH95"},
        {"NASA Glenn", SourceKeys.NASA, "NASA"},
    };

    /** Names that the table spells differently for the same mineral (B88 K-feldspar is the sanidine alternative). */
    private static final Map<String, String> SAME_MINERAL = Map.of("K-feldspar", "sanidine");

    private static final String NUM = "(-?[0-9.]+(?:[eE][-+]?[0-9]+)?)";

    /** One trigger phrase of the notes, the pattern that must then match, and the keys of its groups. */
    private record TermPattern(String trigger, Pattern pattern, String[] keys) {
    }

    private static final List<TermPattern> TERMS = List.of(
        new TermPattern("HP2011 Landau", Pattern.compile("HP2011 Landau: Tc0=" + NUM + " K, Smax=" + NUM + " J/K"),
                new String[] {"landau_Tc0", "landau_Smax"}),
        new TermPattern("Bragg-Williams order-disorder:", Pattern.compile("Bragg-Williams order-disorder: dH=" + NUM
                + " J, dV=" + NUM + " J/bar, W=" + NUM + " J, Wv=" + NUM + " J/bar, n=" + NUM + ", factor=" + NUM),
                new String[] {"bw_dH", null, "bw_W", null, "bw_n", "bw_f"}),
        new TermPattern("lambda term Cp = T", Pattern.compile("lambda term Cp = T\\*\\(l1 \\+ l2\\*T\\)\\^2 from Tref="
                + NUM + " K to Tlambda=" + NUM + " K with l1=" + NUM + ", l2=" + NUM + ", plus first-order dH=" + NUM
                + " J at Tlambda"),
                new String[] {"lambda_Tref", "lambda_Tlambda", "lambda_l1", "lambda_l2", "trans_dH"}),
        new TermPattern("lambda term Cp_l", Pattern.compile("lambda term Cp_l = T\\*\\(l1 \\+ l2\\*T\\)\\^2 with l1="
                + NUM + ", l2=" + NUM + " from " + NUM + " K up to Tt=" + NUM + " K, plus first-order dH=" + NUM
                + " J at " + NUM + " K"),
                new String[] {"lambda_l1", "lambda_l2", "lambda_Tref", "lambda_Tlambda", "trans_dH", "trans_Tt"}),
        new TermPattern("disorder Cp_dis", Pattern.compile("disorder Cp_dis = .*? between Tmin=" + NUM + " and Tmax="
                + NUM + " K \\(d0=" + NUM + ", d1=" + NUM + ", d2=" + NUM + ", d3=" + NUM + ", d4=" + NUM + "\\)"),
                new String[] {"disorder_Tmin", "disorder_Tmax", "disorder_d0", "disorder_d1", "disorder_d2",
                    "disorder_d3", "disorder_d4"}),
        new TermPattern("first-order transition at", Pattern.compile("first-order transition at " + NUM
                + " K with dH = " + NUM + " J"), new String[] {"trans_Tt", "trans_dH"}));

    /** Parameter output order (then the cp keys are inserted after S_298). */
    private static final List<String> TERM_ORDER = List.of("landau_Tc0", "landau_Smax", "bw_dH", "bw_W", "bw_n",
            "bw_f", "lambda_l1", "lambda_l2", "lambda_Tref", "lambda_Tlambda", "disorder_d0", "disorder_d1",
            "disorder_d2", "disorder_d3", "disorder_d4", "disorder_Tmin", "disorder_Tmax", "trans_Tt", "trans_dH");

    /**
     * One mineral-table row ready for the species file.
     *
     * @param id          project id ({@code name} or {@code name/VARIANT})
     * @param baseName    the mineral name
     * @param variant     variant tag for non-plain ids, else empty
     * @param role        primary, alternative or extra
     * @param formula     composition
     * @param sourceKey   publication key
     * @param line        line in the mineral table (1-based)
     * @param form        species-file form code ({@code nasa9} for NASA metal rows)
     * @param tMin        T_min_K text
     * @param tMax        T_max_K text (may be empty)
     * @param params      params text (mineral forms)
     * @param nasaEntries NASA entry names making up a {@code nasa9} row
     * @param file        the table's file name
     */
    record MineralRow(String id, String baseName, String variant, String role, Formula formula, String sourceKey,
                      long line, String form, String tMin, String tMax, String params, List<String> nasaEntries,
                      String file) {
    }

    private MineralTableReader() {
    }

    /**
     * @param in   the table
     * @param file its name for messages
     * @return the rows in table order
     * @throws InputException naming line and column of anything not understood
     */
    static List<MineralRow> read(Reader in, String file) throws IOException {
        List<CSVRecord> recs = new ArrayList<>();
        CSVFormat fmt = CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get();
        try (CSVParser p = CSVParser.parse(in, fmt)) {
            p.forEach(recs::add);
        }
        Map<String, List<CSVRecord>> byName = new LinkedHashMap<>();
        for (CSVRecord r : recs) {
            byName.computeIfAbsent(baseName(r.get("name")), k -> new ArrayList<>()).add(r);
        }
        List<MineralRow> out = new ArrayList<>();
        for (CSVRecord r : recs) {
            String base = baseName(r.get("name"));
            out.add(row(r, file, base, plainRow(byName.get(base), file) == r));
        }
        return out;
    }

    static String baseName(String name) {
        int par = name.indexOf('(');
        String base = (par < 0 ? name : name.substring(0, par)).trim();
        return SAME_MINERAL.getOrDefault(base, base);
    }

    /** The row of a name group that gets the plain id: the primary, else the ds62 row, else the first. */
    private static CSVRecord plainRow(List<CSVRecord> group, String file) {
        for (CSVRecord r : group) {
            if (role(r, file).equals("primary")) {
                return r;
            }
        }
        for (CSVRecord r : group) {
            if (source(r, file)[2].equals("ds62")) {
                return r;
            }
        }
        return group.get(0);
    }

    private static long line(CSVRecord r) {
        return r.getRecordNumber() + 1;
    }

    private static String role(CSVRecord r, String file) {
        Matcher m = Pattern.compile("^role=(primary|alternative|extra)").matcher(r.get("notes"));
        if (!m.find()) {
            throw InputException.atField(file, line(r), "notes", r.get("notes"), "does not start with role=...",
                    "role=primary|alternative|extra");
        }
        return m.group(1);
    }

    private static String[] source(CSVRecord r, String file) {
        for (String[] s : SOURCES) {
            if (r.get("source").startsWith(s[0])) {
                return s;
            }
        }
        throw InputException.atField(file, line(r), "source", r.get("source"), "unknown publication",
                "a source the converter knows (extend MineralTableReader.SOURCES)");
    }

    private static MineralRow row(CSVRecord r, String file, String base, boolean plain) {
        String[] src = source(r, file);
        String role = role(r, file);
        String variant = plain ? "" : src[2];
        String id = plain ? base : base + "/" + variant;
        Formula formula;
        try {
            formula = ChemicalFormulaParser.parse(r.get("formula"));
        } catch (IllegalArgumentException ex) {
            throw InputException.atField(file, line(r), "formula", r.get("formula"), ex.getMessage(), "a chemical formula such as Ca3(PO4)2");
        }
        String cpForm = r.get("cp_form");
        if (cpForm.startsWith("NASA-9")) {
            Matcher m = Pattern.compile("\\(species (.*)\\)\\s*$").matcher(r.get("source_table_or_file"));
            if (!m.find()) {
                throw InputException.atField(file, line(r), "source_table_or_file", r.get("source_table_or_file"), "NASA-9 row names no NASA species",
                        "'(species A, B, ...)'");
            }
            List<String> names = List.of(m.group(1).split(",\\s*"));
            return new MineralRow(id, base, variant, role, formula, src[1], line(r), "nasa9", "", "", "", names, file);
        }
        MineralForm form = form(cpForm, r, file);
        return new MineralRow(id, base, variant, role, formula, src[1], line(r), form.code(),
                r.get("T_min_K").trim(), r.get("T_max_K").trim(), params(r, file, form), List.of(), file);
    }

    private static MineralForm form(String cpForm, CSVRecord r, String file) {
        String code = cpForm.substring(0, Math.max(0, cpForm.indexOf(':'))).trim().toLowerCase(java.util.Locale.ROOT);
        MineralForm f = MineralForm.fromCode(code);
        if (f == null) {
            throw InputException.atField(file, line(r), "cp_form", cpForm, "unknown form",
                    "HP:, Berman:, RH95:, Maier-Kelley: or NASA-9");
        }
        return f;
    }

    private static String params(CSVRecord r, String file, MineralForm form) {
        Map<String, String> p = new LinkedHashMap<>();
        p.put("H_f_298", required(r, "H_f_298_J_per_mol", file));
        p.put("S_298", required(r, "S_298_J_per_mol_K", file));
        String[] cols = {"cp_a", "cp_b", "cp_c", "cp_d", "cp_e"};
        for (int i = 0; i < form.cpKeys().size(); i++) {
            p.put(form.cpKeys().get(i), required(r, cols[i], file));
        }
        Map<String, String> terms = terms(r, file);
        for (String k : TERM_ORDER) {
            if (terms.containsKey(k)) {
                p.put(k, terms.get(k));
            }
        }
        StringBuilder b = new StringBuilder();
        p.forEach((k, v) -> b.append(b.length() == 0 ? "" : ";").append(k).append('=').append(v));
        return b.toString();
    }

    private static Map<String, String> terms(CSVRecord r, String file) {
        String notes = r.get("notes");
        Map<String, String> t = new LinkedHashMap<>();
        for (TermPattern tp : TERMS) {
            if (!notes.contains(tp.trigger())) {
                continue;
            }
            Matcher m = tp.pattern().matcher(notes);
            if (!m.find()) {
                throw InputException.atField(file, line(r), "notes", notes, "mentions '" + tp.trigger()
                        + "' but its parameters are not in the expected wording", tp.pattern().pattern());
            }
            for (int g = 0; g < tp.keys().length; g++) {
                if (tp.keys()[g] != null) {
                    t.put(tp.keys()[g], m.group(g + 1));
                }
            }
        }
        if (t.containsKey("lambda_Tlambda") && !t.containsKey("trans_Tt")) {
            t.put("trans_Tt", t.get("lambda_Tlambda"));
        }
        if (t.containsKey("trans_dH") && Double.parseDouble(t.get("trans_dH")) == 0) {
            t.remove("trans_dH");
            t.remove("trans_Tt");
        }
        return t;
    }

    private static String required(CSVRecord r, String column, String file) {
        String v = r.get(column).trim();
        if (v.isEmpty()) {
            throw InputException.atField(file, line(r), column, v, "empty", "a number");
        }
        return v;
    }
}
