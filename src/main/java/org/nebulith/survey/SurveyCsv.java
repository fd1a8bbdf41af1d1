package org.nebulith.survey;

import java.util.ArrayList;
import java.util.List;

import org.nebulith.files.CellText;
import org.nebulith.files.CsvTableWriter;

/**
 * The text of {@code survey.csv}: the header, and each star's block of rows (numbers by
 * {@link CellText}, the shortest round-trip decimal, so equal results give equal bytes).
 * Columns: {@code star,zone,quantity,median,p16,p84,unit}, then {@code nominal} (the single
 * estimate at the catalogue values) and {@code draws}.
 */
public final class SurveyCsv {

    /** The file name. */
    public static final String FILE = "survey.csv";
    /** The columns, in order. */
    public static final List<String> COLUMNS = List.of("star", "zone", "quantity", "median", "p16", "p84", "unit",
            "nominal", "draws");
    /** The header line, with its line end. */
    public static final String HEADER = CsvTableWriter.FORMAT.format(COLUMNS.toArray()) + "\n";

    private SurveyCsv() {
    }

    /**
     * @param rows one star's rows
     * @return their CSV lines, each ending in {@code \n}
     */
    public static String block(List<SurveyRow> rows) {
        StringBuilder text = new StringBuilder(rows.size() * 64);
        long n = 0;
        for (SurveyRow r : rows) {
            n++;
            List<String> cells = new ArrayList<>(COLUMNS.size());
            cells.add(r.star());
            cells.add(r.zone());
            cells.add(r.quantity());
            cells.add(CellText.of(r.median(), FILE, "median", n));
            cells.add(CellText.of(r.p16(), FILE, "p16", n));
            cells.add(CellText.of(r.p84(), FILE, "p84", n));
            cells.add(r.unit());
            cells.add(CellText.of(r.nominal(), FILE, "nominal", n));
            cells.add(Integer.toString(r.draws()));
            text.append(CsvTableWriter.FORMAT.format(cells.toArray())).append('\n');
        }
        return text.toString();
    }

    /**
     * @param line a data line of survey.csv (without its line end)
     * @return the star name (first cell)
     */
    public static String starOf(String line) {
        try (org.apache.commons.csv.CSVParser p = org.apache.commons.csv.CSVParser.parse(line, CsvTableWriter.FORMAT)) {
            return p.getRecords().get(0).get(0);
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }
}
