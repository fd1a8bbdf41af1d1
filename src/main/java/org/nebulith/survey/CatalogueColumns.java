package org.nebulith.survey;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;

import org.nebulith.thermo.Element;

/**
 * The header of a star catalogue: which column holds what.
 *
 * <p>Columns (any order, names case-insensitive): {@code star} (required); for each element X
 * given, {@code X_H} ([X/H] in dex) and {@code X_H_err} (its 1-sigma error in dex), with
 * {@code Fe_H} required; optionally {@code disk} (the star's own disk preset or file),
 * {@code zones} (its own feeding-zone file) and {@code err_corr} (a common correlation
 * coefficient, 0 to 1, of the star's [X/H] errors, as from shared T_eff and log g errors).
 */
final class CatalogueColumns {

    static final String STAR = "star";
    static final String DISK = "disk";
    static final String ZONES = "zones";
    static final String ERROR_CORRELATION = "err_corr";
    static final String ACCEPTED = "star, X_H and X_H_err for elements X among " + elementList()
            + " (Fe_H required), disk, zones, err_corr";

    final List<String> names;
    int star = -1;
    int disk = -1;
    int zones = -1;
    int errorCorrelation = -1;
    /** Element to {value column, error column} (-1 where absent). */
    final Map<Element, int[]> elements = new EnumMap<>(Element.class);
    final List<CatalogueProblem> problems = new ArrayList<>();

    private CatalogueColumns(List<String> names) {
        this.names = names;
    }

    /**
     * @param names the header cells
     * @param line  the header's line
     * @return the columns, with any header problems in {@link #problems}
     */
    static CatalogueColumns parse(List<String> names, long line) {
        CatalogueColumns c = new CatalogueColumns(names);
        Set<String> seen = new HashSet<>();
        for (int i = 0; i < names.size(); i++) {
            String name = names.get(i).trim();
            if (!seen.add(name.toLowerCase(Locale.ROOT))) {
                c.problems.add(new CatalogueProblem(line, name, "", name, "column given twice", "each column once"));
                continue;
            }
            c.assign(name, i, line);
        }
        if (c.star < 0) {
            c.problems.add(new CatalogueProblem(line, STAR, "", "no star column", "a header with a 'star' column"));
        }
        if (!c.elements.containsKey(Element.Fe)) {
            c.problems.add(new CatalogueProblem(line, "Fe_H", "", "no [Fe/H] column (elements a star lacks follow [Fe/H])",
                    "columns Fe_H and Fe_H_err"));
        }
        c.elements.forEach((el, idx) -> {
            if (idx[0] < 0) {
                c.problems.add(new CatalogueProblem(line, el + "_H_err", "", "an error column without a value column " + el + "_H",
                        "both " + el + "_H and " + el + "_H_err"));
            } else if (idx[1] < 0) {
                c.problems.add(new CatalogueProblem(line, el + "_H", "", "a value column without an error column " + el + "_H_err",
                        "both " + el + "_H and " + el + "_H_err (error 0 for an exact value)"));
            }
        });
        return c;
    }

    private void assign(String name, int index, long line) {
        String lower = name.toLowerCase(Locale.ROOT);
        switch (lower) {
            case STAR: star = index; return;
            case DISK: disk = index; return;
            case ZONES: zones = index; return;
            case ERROR_CORRELATION: errorCorrelation = index; return;
            default: break;
        }
        boolean error = lower.endsWith("_h_err");
        boolean value = !error && lower.endsWith("_h");
        if (!error && !value) {
            problems.add(new CatalogueProblem(line, name, "", name, "unknown column", ACCEPTED));
            return;
        }
        String symbol = name.substring(0, name.length() - (error ? 6 : 2));
        Element el = Element.fromSymbol(symbol);
        if (el == null || el == Element.H || el == Element.He) {
            String why = el == null ? "unknown element '" + org.nebulith.errors.Messages.echo(symbol) + "'"
                    : "[" + el + "/H] is not accepted (H is the reference, He stays solar)";
            problems.add(new CatalogueProblem(line, name, "", name, why, ACCEPTED));
            return;
        }
        elements.computeIfAbsent(el, k -> new int[] {-1, -1})[error ? 1 : 0] = index;
    }

    private static String elementList() {
        List<String> s = new ArrayList<>();
        for (Element e : Element.values()) {
            if (e != Element.H && e != Element.He) {
                s.add(e.symbol());
            }
        }
        return String.join(" ", s);
    }
}
