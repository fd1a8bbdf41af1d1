package org.nebulith.disk;

import java.io.IOException;
import java.io.Reader;
import java.util.ArrayList;
import java.util.List;

import org.nebulith.errors.InputException;
import org.nebulith.format.HeaderedLines;

/**
 * Reads a tabulated disk: optional {@code #} comment lines, the header
 * {@code r_AU,T_K,P_bar,sigma_gas_g_cm2} exactly, then rows in strictly increasing r with every
 * value finite and &gt; 0 (at least two rows). Any fault is a {@link InputException} naming
 * file, line and field.
 */
public final class TabulatedDiskReader {
    /** The exact header. */
    public static final String HEADER = "r_AU,T_K,P_bar,sigma_gas_g_cm2";
    private static final String[] FIELDS = HEADER.split(",");

    private TabulatedDiskReader() {
    }

    /**
     * @param in   the file contents (closed here)
     * @param name the file name for messages
     * @return the disk
     * @throws IOException on read failure
     */
    public static TabulatedDisk read(Reader in, String name) throws IOException {
        List<double[]> rows = new ArrayList<>();
        List<String> comments = new ArrayList<>();
        HeaderedLines.read(in, HEADER, comments,
                (line, lineNo) -> InputException.atField(name, lineNo, "header", line, "not the header", "exactly " + HEADER),
                (line, lineNo) -> {
                    double[] row = parseRow(line, lineNo, name);
                    if (!rows.isEmpty() && !(row[0] > rows.get(rows.size() - 1)[0])) {
                        throw InputException.atField(name, lineNo, "r_AU", row[0],
                                "does not increase on the previous row", "rows in strictly increasing r_AU");
                    }
                    rows.add(row);
                });
        if (rows.size() < 2) {
            throw InputException.atField(name, 0, "r_AU", "", rows.size() + " data rows", "header " + HEADER
                    + " and at least 2 rows");
        }
        return build(rows, name + (comments.isEmpty() ? "" : " (" + comments.get(0) + ")"));
    }

    private static double[] parseRow(String line, int lineNo, String name) {
        String[] f = line.split(",", -1);
        if (f.length != FIELDS.length) {
            throw InputException.atField(name, lineNo, "row", line, f.length + " fields", FIELDS.length + " fields: " + HEADER);
        }
        double[] v = new double[f.length];
        for (int i = 0; i < f.length; i++) {
            try {
                v[i] = Double.parseDouble(f[i].strip());
            } catch (NumberFormatException ex) {
                throw InputException.atField(name, lineNo, FIELDS[i], f[i], "not a number",
                        "a finite number > 0");
            }
            if (!(v[i] > 0) || Double.isInfinite(v[i])) {
                throw InputException.atField(name, lineNo, FIELDS[i], f[i], "out of range", "a finite number > 0");
            }
        }
        return v;
    }

    private static TabulatedDisk build(List<double[]> rows, String description) {
        int n = rows.size();
        double[][] c = new double[4][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < 4; j++) {
                c[j][i] = rows.get(i)[j];
            }
        }
        return new TabulatedDisk(c[0], c[1], c[2], c[3], "tabulated disk " + description);
    }
}
