package org.nebulith.composition;

import java.io.IOException;
import java.io.Reader;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;

import org.nebulith.errors.InputException;
import org.nebulith.errors.Messages;
import org.nebulith.format.HeaderedLines;
import org.nebulith.thermo.Element;

/**
 * Reads the project's abundance file format: {@code #} lines (the citation, kept as provenance),
 * then the header {@code element,value,unit} exactly, then one row per element. All rows of a file
 * use one unit ({@link AbundanceUnit}). Blank lines are ignored. Unknown elements, repeated
 * elements, non-numeric or negative values and mixed units are errors naming file, line and field.
 */
public final class AbundanceFileReader {
    /** The exact header line. */
    public static final String HEADER = "element,value,unit";

    private AbundanceFileReader() {
    }

    /** Largest accepted log eps: 10^8 times hydrogen (log eps(H) = 12 by definition). */
    static final double MAX_LOG_EPS = 20;
    /** Smallest accepted log eps (10^-62 times hydrogen; anything less is absent). */
    static final double MIN_LOG_EPS = -50;

    /**
     * @param in   the file contents (closed by this method)
     * @param name file or preset name for messages
     * @return the composition with its provenance
     * @throws IOException on read failure
     * @throws InputException on malformed content
     */
    public static AbundanceSet read(Reader in, String name) throws IOException {
        List<String> provenance = new ArrayList<>();
        EnumMap<Element, Double> amounts = new EnumMap<>(Element.class);
        AbundanceUnit[] unit = new AbundanceUnit[1];
        boolean headerSeen = HeaderedLines.read(in, HEADER, provenance,
                (line, lineNo) -> InputException.atField(name, lineNo, "header", line, "not the header", "exactly " + HEADER),
                (line, lineNo) -> unit[0] = readRow(line, lineNo, name, unit[0], amounts));
        if (!headerSeen || amounts.isEmpty()) {
            throw InputException.atField(name, 0, "element", "", "no data rows", "header " + HEADER + " and one row per element");
        }
        if (amounts.values().stream().allMatch(v -> v == 0)) {
            throw InputException.atField(name, 0, "value", "", "every amount is zero",
                    "at least one element with an amount > 0");
        }
        return new AbundanceSet(name, provenance, ElementAbundances.of(amounts));
    }

    private static AbundanceUnit readRow(String line, int lineNo, String name, AbundanceUnit unit,
                                         EnumMap<Element, Double> amounts) {
        String[] f = line.split(",", -1);
        if (f.length != 3) {
            throw InputException.atField(name, lineNo, "row", line, f.length + " fields", "3 fields: element,value,unit");
        }
        Element el = Element.fromSymbol(f[0]);
        if (el == null) {
            throw InputException.atField(name, lineNo, "element", f[0], "unknown element",
                    java.util.Arrays.toString(Element.values()));
        }
        AbundanceUnit u = AbundanceUnit.fromToken(f[2]);
        if (u == null) {
            throw InputException.atField(name, lineNo, "unit", f[2], "unknown unit", AbundanceUnit.accepted());
        }
        if (unit != null && u != unit) {
            throw InputException.atField(name, lineNo, "unit", u.token(), "differs from earlier rows",
                    "one unit per file (" + unit.token() + " here)");
        }
        double v = parseValue(f[1], u, name, lineNo);
        if (amounts.put(el, u.toRelativeMoles(v, el)) != null) {
            throw InputException.atField(name, lineNo, "element", el, "appears twice", "each element once");
        }
        return u;
    }

    private static double parseValue(String s, AbundanceUnit u, String name, int lineNo) {
        double v;
        try {
            v = Double.parseDouble(s.strip());
        } catch (NumberFormatException ex) {
            throw InputException.atField(name, lineNo, "value", s, "not a number", "a finite number");
        }
        boolean ok = Double.isFinite(v) && (u == AbundanceUnit.LOG_EPS || v >= 0);
        if (!ok) {
            throw InputException.atField(name, lineNo, "value", s, "out of range",
                    u == AbundanceUnit.LOG_EPS ? "a finite number" : "a finite number >= 0");
        }
        if (u == AbundanceUnit.LOG_EPS && (v > MAX_LOG_EPS || v < MIN_LOG_EPS)) {
            throw InputException.atField(name, lineNo, "value", s, "log eps outside its range",
                    (int) MIN_LOG_EPS + " to " + (int) MAX_LOG_EPS + " (log eps(H) = 12 by definition)");
        }
        return v;
    }
}
