package org.nebulith.thermo.source;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.nebulith.thermo.Nasa9Model;

/**
 * Reads the NASA Glenn 9-coefficient thermodynamic database in its published fixed-column
 * format (McBride, Zehe &amp; Gordon 2002, NASA TP-2002-211556, appendix A). Only the product
 * section (up to {@code END PRODUCTS}) is read; reactant-only entries and entries without
 * temperature intervals are skipped. Entries of one name that the file splits into several
 * records (Fe(a) below and above its lambda transition) are merged into one entry.
 */
public final class NasaGlennReader {

    /**
     * One NASA entry.
     *
     * @param name        the NASA name, e.g. {@code AL2O3(a)}
     * @param comment     the comment on the name line (sources)
     * @param dateCode    the six-character reference-date code
     * @param elements    element symbol (as spelled in the file, e.g. "AL") to atom count
     * @param condensed   true if the phase flag is non-zero
     * @param molarMass   molecular weight from the file [g/mol]
     * @param hf298       heat of formation at 298.15 K [J/mol]
     * @param intervals   temperature intervals with coefficients
     * @param lineNumber  line of the name record (1-based)
     * @param intervalLines for each interval, the line of the name record it was read from (1-based)
     */
    public record Entry(String name, String comment, String dateCode, Map<String, Double> elements,
                        boolean condensed, double molarMass, double hf298, List<Nasa9Model.Interval> intervals,
                        int lineNumber, List<Integer> intervalLines) {
        /** An entry whose intervals all come from the record at {@code lineNumber}. */
        public Entry(String name, String comment, String dateCode, Map<String, Double> elements,
                     boolean condensed, double molarMass, double hf298, List<Nasa9Model.Interval> intervals,
                     int lineNumber) {
            this(name, comment, dateCode, elements, condensed, molarMass, hf298, intervals, lineNumber,
                    java.util.Collections.nCopies(intervals.size(), lineNumber));
        }

        /** @return true for ions (electron in the formula) */
        public boolean isIon() {
            return elements.containsKey("E");
        }
    }

    private NasaGlennReader() {
    }

    /**
     * @param in   the file contents
     * @param name the file name, for error messages
     * @return entries in file order
     * @throws IOException on read failure
     * @throws IllegalArgumentException naming the file and line on malformed records
     */
    public static List<Entry> read(Reader in, String name) throws IOException {
        List<String> lines = new ArrayList<>();
        try (BufferedReader br = new BufferedReader(in)) {
            for (String l = br.readLine(); l != null; l = br.readLine()) {
                lines.add(l);
            }
        }
        int i = 0;
        while (i < lines.size() && !lines.get(i).startsWith("thermo")) {
            i++;
        }
        i += 2; // "thermo" line and the global temperature line
        Map<String, Entry> merged = new LinkedHashMap<>();
        while (i < lines.size()) {
            String l = lines.get(i);
            if (l.startsWith("END PRODUCTS") || l.startsWith("END REACTANTS")) {
                break;
            }
            if (l.startsWith("!") || l.isBlank()) {
                i++;
                continue;
            }
            i = readEntry(lines, i, name, merged);
        }
        return new ArrayList<>(merged.values());
    }

    private static int readEntry(List<String> lines, int i, String file, Map<String, Entry> out) {
        int first = i;
        try {
            String nameLine = lines.get(i);
            String species = field(nameLine, 0, 24).trim().split("\\s+")[0];
            String comment = nameLine.length() > 18 ? nameLine.substring(18).trim() : "";
            String l2 = lines.get(i + 1);
            int nInt = Integer.parseInt(field(l2, 0, 2).trim());
            String date = field(l2, 3, 9).trim();
            Map<String, Double> el = new LinkedHashMap<>();
            for (int k = 0; k < 5; k++) {
                String sym = field(l2, 10 + 8 * k, 12 + 8 * k).trim();
                double n = parse(field(l2, 12 + 8 * k, 18 + 8 * k));
                if (!sym.isEmpty() && n != 0) {
                    el.merge(sym, n, Double::sum);
                }
            }
            boolean condensed = Integer.parseInt(field(l2, 50, 52).trim()) != 0;
            double mw = parse(field(l2, 52, 65));
            double hf = parse(field(l2, 65, 80));
            List<Nasa9Model.Interval> ivs = new ArrayList<>();
            i += 2;
            for (int k = 0; k < nInt; k++) {
                ivs.add(readInterval(lines.get(i), lines.get(i + 1), lines.get(i + 2)));
                i += 3;
            }
            if (nInt == 0) {
                i += 1; // reactant-style entry: one line with the assigned enthalpy
            }
            if (nInt > 0) {
                Entry prev = out.get(species);
                if (prev != null) {
                    List<Nasa9Model.Interval> all = new ArrayList<>(prev.intervals());
                    all.addAll(ivs);
                    List<Integer> recLines = new ArrayList<>(prev.intervalLines());
                    recLines.addAll(java.util.Collections.nCopies(ivs.size(), first + 1));
                    out.put(species, new Entry(species, prev.comment(), prev.dateCode(), prev.elements(),
                            prev.condensed(), prev.molarMass(), prev.hf298(), all, prev.lineNumber(), recLines));
                } else {
                    out.put(species, new Entry(species, comment, date, el, condensed, mw, hf, ivs, first + 1));
                }
            }
            return i;
        } catch (RuntimeException ex) {
            throw new IllegalArgumentException(file + ": line " + (first + 1) + ": malformed NASA-9 entry ("
                    + ex.getMessage() + "); expected the 9-coefficient record layout of NASA TP-2002-211556", ex);
        }
    }

    private static Nasa9Model.Interval readInterval(String l1, String l2, String l3) {
        double tLow = parse(field(l1, 0, 11));
        double tHigh = parse(field(l1, 11, 22));
        double[] c = new double[9];
        for (int k = 0; k < 5; k++) {
            c[k] = parse(field(l2, 16 * k, 16 * k + 16));
        }
        c[5] = parse(field(l3, 0, 16));
        c[6] = parse(field(l3, 16, 32));
        c[7] = parse(field(l3, 48, 64));
        c[8] = parse(field(l3, 64, 80));
        return new Nasa9Model.Interval(tLow, tHigh, c);
    }

    private static String field(String line, int from, int to) {
        if (from >= line.length()) {
            return "";
        }
        return line.substring(from, Math.min(to, line.length()));
    }

    private static double parse(String s) {
        String t = s.trim().replace('D', 'E').replace('d', 'e');
        return t.isEmpty() ? 0.0 : Double.parseDouble(t);
    }
}
