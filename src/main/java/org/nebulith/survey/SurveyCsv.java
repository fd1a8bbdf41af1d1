package org.nebulith.survey;

import java.util.ArrayList;
import java.util.List;

import org.nebulith.files.CellText;
import org.nebulith.files.CsvTableWriter;

/**
 * The text of {@code survey.csv}: the header, and each star's block of rows (numbers by
 * {@link CellText}, the shortest round-trip decimal, so equal results give equal bytes).
 * Columns: {@code star,zone,quantity,median,p16,p84,unit}, then {@code nominal} (the single
 * estimate at the catalogue values), {@code draws} (run for the star), {@code n_draws} (behind the
 * percentiles: converged, and the quantity applies) and {@code n_not_applicable} (converged draws to
 * which the quantity does not apply); draws - n_draws - n_not_applicable failed (failures.csv).
 * A value that does not exist is an empty cell.
 */
public final class SurveyCsv {

    /** The file name. */
    public static final String FILE = "survey.csv";
    /** The columns, in order. */
    public static final List<String> COLUMNS = List.of("star", "zone", "quantity", "median", "p16", "p84", "unit",
            "nominal", "draws", "n_draws", "n_not_applicable");
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
            cells.add(cell(r.median(), "median", n));
            cells.add(cell(r.p16(), "p16", n));
            cells.add(cell(r.p84(), "p84", n));
            cells.add(r.unit());
            cells.add(cell(r.nominal(), "nominal", n));
            cells.add(Integer.toString(r.draws()));
            cells.add(Integer.toString(r.nDraws()));
            cells.add(Integer.toString(r.notApplicable()));
            text.append(CsvTableWriter.FORMAT.format(cells.toArray())).append('\n');
        }
        return text.toString();
    }

    /** NaN is the row's "no value" (see {@link SurveyRow}): an empty cell; infinities are refused. */
    private static String cell(double v, String column, long row) {
        return Double.isNaN(v) ? "" : CellText.of(v, FILE, column, row);
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
