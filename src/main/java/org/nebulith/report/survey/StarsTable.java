package org.nebulith.report.survey;

import java.io.IOException;
import java.io.Writer;
import java.util.Iterator;
import java.util.Map;
import java.util.Set;
import java.util.StringJoiner;

import org.nebulith.composition.SolarReference;
import org.nebulith.files.CsvTableWriter;
import org.nebulith.survey.StarJob;
import org.nebulith.survey.StarJobException;
import org.nebulith.survey.StarRow;
import org.nebulith.survey.SurveyFailures;
import org.nebulith.thermo.Element;

/**
 * The per-star notes, {@code survey-stars.csv}, streamed in catalogue order: for every catalogue
 * row its status ({@code computed}, {@code skipped} for a bad row under {@code --skip-bad},
 * {@code failed} for a star whose nominal estimate failed), the elements measured, the elements that
 * followed [Fe/H] because the star lacks them, and the reason: why a row was skipped or a star
 * failed, or how many of a computed star's draws failed (listed in {@code failures.csv}).
 */
final class StarsTable {

    static final String FILE = "survey-stars.csv";
    static final String HEADER = CsvTableWriter.FORMAT.format("star", "catalogue_line", "status", "measured",
            "followed_FeH", "reason") + "\n";

    private final Writer out;
    private final Iterator<Map.Entry<Long, String>> bad;
    private final Map<Long, String> reasons;
    private final SolarReference solar;
    private Map.Entry<Long, String> nextBad;

    StarsTable(Writer out, Map<Long, String> badRows, Map<Long, String> reasons, SolarReference solar) throws IOException {
        this.out = out;
        this.bad = badRows.entrySet().iterator();
        this.reasons = reasons;
        this.solar = solar;
        this.nextBad = bad.hasNext() ? bad.next() : null;
        out.write(HEADER);
    }

    void computed(StarRow row, long failedDraws, int draws) throws IOException {
        skippedBefore(row.line());
        line(row.star(), row.line(), "computed", elements(row.abundances().keySet()),
                elements(StarJob.followedFeH(row, solar)),
                failedDraws == 0 ? "" : failedDraws + " of " + draws + " draws failed (" + SurveyFailures.FILE + ")");
    }

    void failed(StarRow row, String reason) throws IOException {
        skippedBefore(row.line());
        line(row.star(), row.line(), "failed", elements(row.abundances().keySet()),
                elements(StarJob.followedFeH(row, solar)), reason);
    }

    /** Writes the bad rows after the last good one. */
    void finish() throws IOException {
        skippedBefore(Long.MAX_VALUE);
        out.flush();
    }

    private void skippedBefore(long line) throws IOException {
        while (nextBad != null && nextBad.getKey() < line) {
            line(nextBad.getValue(), nextBad.getKey(), "skipped", "", "", reasons.get(nextBad.getKey()));
            nextBad = bad.hasNext() ? bad.next() : null;
        }
    }

    private void line(String star, long line, String status, String measured, String followed, String reason)
            throws IOException {
        out.write(CsvTableWriter.FORMAT.format(star, Long.toString(line), status, measured, followed, reason) + "\n");
    }

    private static String elements(Set<Element> set) {
        StringJoiner j = new StringJoiner(" ");
        set.forEach(e -> j.add(e.symbol()));
        return j.toString();
    }
}
