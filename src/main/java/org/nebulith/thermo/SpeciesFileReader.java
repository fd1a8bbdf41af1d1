package org.nebulith.thermo;

import java.io.IOException;
import java.io.StringReader;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.nebulith.errors.InputException;
import org.nebulith.thermo.mineral.MineralForm;
import org.nebulith.thermo.mineral.MineralParameters;

/**
 * Parses a species file (see {@link SpeciesFileFormat}). Any fault raises one
 * {@link InputException}; nothing is returned from a file that failed.
 */
final class SpeciesFileReader {
    private final String file;
    private final Map<String, String> sources = new LinkedHashMap<>();
    private final Map<String, Long> lines = new LinkedHashMap<>();
    private final List<Species> species = new ArrayList<>();

    /** One parsed CSV row. */
    private record Row(long line, CSVRecord rec) {
        String get(String column) {
            return rec.get(column);
        }
    }

    private SpeciesFileReader(String file) {
        this.file = file;
    }

    /** Result: the species, the declared sources and the line of each species' first row. */
    record Result(List<Species> species, Map<String, String> sources, Map<String, Long> lines) {
    }

    static Result read(String file, String text) {
        SpeciesFileReader r = new SpeciesFileReader(file);
        r.parse(text);
        return new Result(List.copyOf(r.species), Map.copyOf(r.sources), Map.copyOf(r.lines));
    }

    private void parse(String text) {
        Body body = stripComments(org.nebulith.format.TextInput.withoutBom(text));
        List<Row> rows = new ArrayList<>();
        CSVFormat fmt = CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get();
        try (CSVParser p = CSVParser.parse(new StringReader(body.text), fmt)) {
            checkHeader(p.getHeaderNames(), body.headerLine());
            for (CSVRecord rec : p) {
                long line = body.headerLine() + rec.getRecordNumber();
                if (!rec.isConsistent()) {
                    throw InputException.atField(file, line, "row", String.join(",", rec.toList()), rec.size() + " fields",
                            SpeciesFileFormat.COLUMNS.size() + " comma-separated fields (quote fields containing commas)");
                }
                rows.add(new Row(line, rec));
            }
        } catch (IOException | java.io.UncheckedIOException | IllegalStateException ex) {
            throw InputException.atField(file, 0, "row", "", "not readable as RFC-4180 CSV (" + ex.getMessage() + ")",
                    "comma-separated fields, double quotes around fields with commas or quotes");
        }
        int i = 0;
        while (i < rows.size()) {
            int j = i + 1;
            String id = rows.get(i).get("id");
            while (j < rows.size() && rows.get(j).get("id").equals(id)
                    && SpeciesFileFormat.NASA9.equals(rows.get(i).get("form"))) {
                j++;
            }
            addSpecies(rows.subList(i, j));
            i = j;
        }
    }

    private record Body(String text, long headerLine) {
    }

    /** Collects {@code # source} declarations, drops comment and blank lines before the header. */
    private Body stripComments(String text) {
        String[] all = text.split("\r?\n", -1);
        int end = all.length;
        while (end > 0 && all[end - 1].isBlank()) {
            end--;
        }
        all = java.util.Arrays.copyOf(all, end);
        int k = 0;
        while (k < all.length && (all[k].startsWith("#") || all[k].isBlank())) {
            String l = all[k];
            if (l.startsWith(SpeciesFileFormat.SOURCE_DECLARATION)) {
                String decl = l.substring(SpeciesFileFormat.SOURCE_DECLARATION.length());
                int colon = decl.indexOf(':');
                if (colon <= 0 || decl.substring(0, colon).isBlank() || decl.substring(0, colon).contains(" ")) {
                    throw InputException.atField(file, k + 1, "source declaration", l, "no KEY: before the citation",
                            "# source KEY: citation (KEY without spaces)");
                }
                sources.put(decl.substring(0, colon), decl.substring(colon + 1).trim());
            }
            k++;
        }
        if (k == all.length) {
            throw InputException.atField(file, 0, "header", "", "no header line found",
                    String.join(",", SpeciesFileFormat.COLUMNS));
        }
        StringBuilder b = new StringBuilder();
        for (int m = k; m < all.length; m++) {
            b.append(all[m]).append('\n');
        }
        return new Body(b.toString(), k + 1);
    }

    private void checkHeader(List<String> header, long line) {
        if (!header.equals(SpeciesFileFormat.COLUMNS)) {
            throw InputException.atField(file, line, "header", String.join(",", header), "not the header",
                    "exactly " + String.join(",", SpeciesFileFormat.COLUMNS));
        }
    }

    private void addSpecies(List<Row> group) {
        Row first = group.get(0);
        String id = first.get("id");
        if (id.isEmpty() || !id.equals(id.trim())) {
            throw fault(first, "id", "empty or has surrounding spaces", "a non-empty name");
        }
        if (lines.containsKey(id)) {
            throw fault(first, "id", "already defined on line " + lines.get(id),
                    "unique ids (interval rows of one nasa9 species must be consecutive)");
        }
        Species.State state = state(first);
        Formula formula = formula(first);
        String source = first.get("source");
        if (!sources.containsKey(source)) {
            throw fault(first, "source", "not declared in the header",
                    "a key declared by a '# source KEY: citation' line, one of " + sources.keySet());
        }
        String role = first.get("role");
        if (!SpeciesFileFormat.ROLES.contains(role)) {
            throw fault(first, "role", "not a role", String.join("|", SpeciesFileFormat.ROLES));
        }
        String variant = first.get("variant");
        if (role.equals("primary") && !variant.isEmpty()) {
            throw fault(first, "variant", "a primary row has a variant", "empty variant for role primary");
        }
        String form = first.get("form");
        ThermoModel model;
        if (SpeciesFileFormat.NASA9.equals(form)) {
            model = nasa9(group, state, formula, source, role);
        } else {
            model = mineral(first, form, state);
        }
        List<String> rowsRef = new ArrayList<>();
        for (Row r : group) {
            if (!rowsRef.contains(r.get("source_row"))) {
                rowsRef.add(r.get("source_row"));
            }
        }
        species.add(new Species(id, state, formula, source, String.join(" ", rowsRef), role, model, variant));
        lines.put(id, first.line());
    }

    private Species.State state(Row r) {
        switch (r.get("state")) {
            case "gas":
                return Species.State.GAS;
            case "solid":
                return Species.State.SOLID;
            case "liquid":
                return Species.State.LIQUID;
            default:
                throw fault(r, "state", "not a state", "gas|solid|liquid");
        }
    }

    private Formula formula(Row r) {
        try {
            return Formula.parse(r.get("formula"));
        } catch (IllegalArgumentException ex) {
            throw fault(r, "formula", ex.getMessage(), "Element:count pairs separated by spaces, e.g. Mg:2 Si:1 O:4");
        }
    }

    private ThermoModel nasa9(List<Row> group, Species.State state, Formula formula, String source, String role) {
        List<Nasa9Model.Interval> ivs = new ArrayList<>();
        for (Row r : group) {
            if (!r.get("state").equals(group.get(0).get("state")) || !r.get("formula").equals(group.get(0).get("formula"))
                    || !r.get("source").equals(source) || !r.get("role").equals(role)
                    || !r.get("variant").equals(group.get(0).get("variant"))) {
                throw fault(r, "id", "interval row of '" + r.get("id") + "' differs in state, formula, source, role or variant "
                        + "from its first row", "identical descriptive fields on all interval rows of one species");
            }
            double lo = temperature(r, "T_min_K", false);
            double hi = temperature(r, "T_max_K", false);
            String[] toks = r.get("params").trim().split("\\s+");
            if (toks.length != 9) {
                throw fault(r, "params", toks.length + " coefficients", "9 numbers a1..a7 b1 b2 separated by spaces");
            }
            double[] c = new double[9];
            for (int k = 0; k < 9; k++) {
                c[k] = number(r, "params", toks[k], "9 numbers a1..a7 b1 b2 separated by spaces");
            }
            if (!ivs.isEmpty() && Math.abs(ivs.get(ivs.size() - 1).tHighK() - lo) > 1e-6) {
                throw fault(r, "T_min_K", lo + " K does not continue the previous interval ending at "
                        + ivs.get(ivs.size() - 1).tHighK() + " K", "contiguous intervals, lowest first");
            }
            try {
                ivs.add(new Nasa9Model.Interval(lo, hi, c));
            } catch (IllegalArgumentException ex) {
                throw fault(r, "T_max_K", ex.getMessage(), "T_max_K above T_min_K");
            }
        }
        return new Nasa9Model(ivs);
    }

    private ThermoModel mineral(Row r, String form, Species.State state) {
        MineralForm mf = MineralForm.fromCode(form);
        if (mf == null) {
            throw fault(r, "form", "not a form", "nasa9|hp|berman|rh95|maier-kelley");
        }
        if (state == Species.State.GAS) {
            throw fault(r, "form", "a mineral form for a gas", "nasa9 for gases");
        }
        double lo = temperature(r, "T_min_K", false);
        double hi = temperature(r, "T_max_K", true);
        if (!Double.isNaN(hi) && !(hi > lo)) {
            throw fault(r, "T_max_K", hi + " K is not above T_min_K " + lo + " K", "T_max_K > T_min_K, or empty");
        }
        try {
            return MineralParameters.build(mf, MineralParameters.parse(r.get("params")), lo, hi);
        } catch (IllegalArgumentException ex) {
            throw fault(r, "params", ex.getMessage(), MineralParameters.acceptedKeys(mf));
        }
    }

    private double temperature(Row r, String column, boolean mayBeEmpty) {
        String v = r.get(column).trim();
        if (v.isEmpty() && mayBeEmpty) {
            return Double.NaN;
        }
        String accepted = "a temperature > 0 in K" + (mayBeEmpty ? ", or empty" : "");
        double t = number(r, column, v, accepted);
        if (!(t > 0)) {
            throw fault(r, column, "not positive", accepted);
        }
        return t;
    }

    private double number(Row r, String column, String v, String accepted) {
        try {
            double d = Double.parseDouble(v.toUpperCase(Locale.ROOT).replace('D', 'E'));
            if (!Double.isFinite(d)) {
                throw new NumberFormatException();
            }
            return d;
        } catch (NumberFormatException ex) {
            throw fault(r, column, "not a finite number", accepted);
        }
    }

    private InputException fault(Row r, String field, String problem, String accepted) {
        return InputException.atField(file, r.line(), field, r.get(field), problem, accepted);
    }
}
