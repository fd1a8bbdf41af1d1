package org.nebulith.condensation;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.util.ArrayList;
import java.util.List;

import org.nebulith.errors.InputException;

/**
 * Reads a P-T path: optional {@code #} comment lines and blank lines, the header {@code T_K,P_bar}
 * exactly, then at least one row of temperature [K] and total pressure [bar], both finite and
 * &gt; 0, with T strictly monotonic (either direction). Any fault is an {@link InputException}
 * naming file, line and field. Between rows the pressure is interpolated linearly in log P; beyond
 * the first and last rows it is held constant ({@link PressurePath#tabulated}).
 */
public final class PressurePathReader {
    /** The exact header. */
    public static final String HEADER = "T_K,P_bar";
    private static final String[] FIELDS = HEADER.split(",");
    private static final String POSITIVE = "a finite number > 0";

    private PressurePathReader() {
    }

    /**
     * @param in   the file contents (closed here)
     * @param name the file name for messages
     * @return the path
     * @throws IOException on read failure
     * @throws InputException on a malformed file
     */
    public static PressurePath read(Reader in, String name) throws IOException {
        List<double[]> rows = new ArrayList<>();
        boolean header = false;
        int lineNo = 0;
        try (BufferedReader br = new BufferedReader(org.nebulith.format.TextInput.withoutBom(in))) {
            for (String raw = br.readLine(); raw != null; raw = br.readLine()) {
                lineNo++;
                String line = raw.strip();
                if (line.isEmpty() || line.startsWith("#")) {
                    continue;
                }
                if (!header) {
                    if (!line.equals(HEADER)) {
                        throw InputException.atField(name, lineNo, "header", line, "not the header", "exactly " + HEADER);
                    }
                    header = true;
                    continue;
                }
                double[] row = parseRow(line, lineNo, name);
                checkMonotonic(rows, row, lineNo, name);
                rows.add(row);
            }
        }
        if (rows.isEmpty()) {
            throw InputException.atField(name, Math.max(lineNo, 1), header ? "T_K" : "header", "",
                    header ? "no data rows" : "no header", "the header " + HEADER + " and at least one row");
        }
        double[] t = new double[rows.size()];
        double[] p = new double[rows.size()];
        for (int i = 0; i < t.length; i++) {
            t[i] = rows.get(i)[0];
            p[i] = rows.get(i)[1];
        }
        return PressurePath.tabulated(t, p);
    }

    private static void checkMonotonic(List<double[]> rows, double[] row, int lineNo, String name) {
        int n = rows.size();
        if (n == 0) {
            return;
        }
        double step = row[0] - rows.get(n - 1)[0];
        boolean ok = step != 0 && (n < 2 || Math.signum(step) == Math.signum(rows.get(n - 1)[0] - rows.get(n - 2)[0]));
        if (!ok) {
            throw InputException.atField(name, lineNo, "T_K", row[0], "breaks the order of the rows above",
                    "T_K strictly increasing or strictly decreasing");
        }
    }

    private static double[] parseRow(String line, int lineNo, String name) {
        String[] f = line.split(",", -1);
        if (f.length != FIELDS.length) {
            throw InputException.atField(name, lineNo, "row", line, f.length + " fields", FIELDS.length + " fields: " + HEADER);
        }
        double[] v = new double[f.length];
        for (int i = 0; i < f.length; i++) {
            String cell = f[i].strip();
            try {
                v[i] = Double.parseDouble(cell);
            } catch (NumberFormatException ex) {
                throw InputException.atField(name, lineNo, FIELDS[i], cell, "not a number", POSITIVE);
            }
            if (!(v[i] > 0) || Double.isInfinite(v[i])) {
                throw InputException.atField(name, lineNo, FIELDS[i], cell, "out of range", POSITIVE);
            }
        }
        return v;
    }
}
