package org.nebulith.survey;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;

import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.nebulith.files.CellText;
import org.nebulith.files.CsvTableWriter;

/**
 * The text of {@code failures.csv}: one row per failed estimate, stars in catalogue order, a star's
 * nominal failure first and its draws in increasing order. Columns
 * {@code star,draw,zone,T_K,P_bar,stage,reason}: {@code draw} is the draw index (empty for the
 * nominal estimate), {@code zone}, {@code T_K} and {@code P_bar} name the failing state where the
 * failure names it (empty otherwise), {@code stage} is {@code nominal} or {@code draw}. Numbers by
 * {@link CellText}, so equal failures give equal bytes.
 */
public final class SurveyFailures {

    /** The file name. */
    public static final String FILE = "failures.csv";
    /** The columns, in order. */
    public static final List<String> COLUMNS = List.of("star", "draw", "zone", "T_K", "P_bar", "stage", "reason");
    /** The header line, with its line end. */
    public static final String HEADER = CsvTableWriter.FORMAT.format(COLUMNS.toArray()) + "\n";

    private SurveyFailures() {
    }

    /**
     * @param failures one star's failures
     * @return their CSV lines, each ending in {@code \n} (empty for none)
     */
    public static String block(List<DrawFailure> failures) {
        StringBuilder text = new StringBuilder();
        for (DrawFailure f : failures) {
            text.append(CsvTableWriter.FORMAT.format(cells(f).toArray())).append('\n');
        }
        return text.toString();
    }

    /**
     * @param f a failure
     * @return its cells, as written
     */
    public static List<String> cells(DrawFailure f) {
        List<String> c = new ArrayList<>(COLUMNS.size());
        c.add(f.star());
        c.add(f.draw() == StarJobException.NOMINAL ? "" : Integer.toString(f.draw()));
        c.add(f.zone());
        c.add(Double.isNaN(f.tK()) ? "" : CellText.of(f.tK(), FILE, "T_K", 0));
        c.add(Double.isNaN(f.pBar()) ? "" : CellText.of(f.pBar(), FILE, "P_bar", 0));
        c.add(f.stage());
        c.add(f.reason());
        return c;
    }

    /**
     * @param block one star's lines of failures.csv
     * @param draws draws per star
     * @return draws lost: all of them for a nominal failure, else one per line
     */
    public static long failedDraws(String block, int draws) {
        long n = 0;
        try (CSVParser p = CSVParser.parse(block, CsvTableWriter.FORMAT)) {
            for (CSVRecord r : p) {
                if (DrawFailure.NOMINAL.equals(r.get(5))) {
                    return draws;
                }
                n++;
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return n;
    }

    /**
     * @param block one star's lines of failures.csv (at least one)
     * @return its first failure as one readable line: star, stage, zone, state, reason
     */
    public static String describeFirst(String block) {
        try (CSVParser p = CSVParser.parse(block, CsvTableWriter.FORMAT)) {
            CSVRecord r = p.getRecords().get(0);
            StringBuilder b = new StringBuilder("star '").append(r.get(0)).append("', ")
                    .append(r.get(1).isEmpty() ? "nominal estimate" : "draw " + r.get(1));
            if (!r.get(2).isEmpty()) {
                b.append(", zone '").append(r.get(2)).append('\'');
            }
            if (!r.get(3).isEmpty()) {
                b.append(", T = ").append(r.get(3)).append(" K, P = ").append(r.get(4)).append(" bar");
            }
            return b.append(": ").append(r.get(6)).toString();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
