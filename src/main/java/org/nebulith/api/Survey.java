package org.nebulith.api;

import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;

import org.nebulith.survey.DrawFailure;
import org.nebulith.survey.SurveyRow;

/**
 * The rows of a survey, one per star, zone and quantity (median and 16th/84th percentiles of the
 * draws, and the nominal value), found by name: {@code median("NDC Alder", "host", "Mg_Si_molar")}.
 */
public final class Survey {
    private final List<SurveyRow> rows;
    private final List<DrawFailure> failures;

    Survey(List<SurveyRow> rows, List<DrawFailure> failures) {
        this.rows = List.copyOf(rows);
        this.failures = List.copyOf(failures);
    }

    /** @return the estimates that failed (star, draw, zone, state, reason), in catalogue order */
    public List<DrawFailure> failures() {
        return failures;
    }

    /** @return every row, in catalogue order */
    public List<SurveyRow> rows() {
        return rows;
    }

    /**
     * @param star     star name
     * @param zone     zone name ({@code host} for the star's own gas)
     * @param quantity quantity name, e.g. {@code Mg_Si_molar}
     * @return the median of the draws, empty if there is no such row
     */
    public OptionalDouble median(String star, String zone, String quantity) {
        for (SurveyRow r : rows) {
            if (r.star().equals(star) && r.zone().equals(zone) && r.quantity().equals(quantity)) {
                return OptionalDouble.of(r.median());
            }
        }
        return OptionalDouble.empty();
    }

    /** @return the number of distinct stars */
    public long stars() {
        return rows.stream().map(SurveyRow::star).distinct().count();
    }

    /** @return one line per row: star, zone, quantity, median [p16, p84] unit */
    public String summary() {
        StringBuilder b = new StringBuilder("survey of " + stars() + " stars, " + rows.size() + " rows, "
                + failures.size() + " failed estimates");
        for (SurveyRow r : rows) {
            b.append(String.format(Locale.ROOT, "%n  %s / %s / %s: %.4g [%.4g, %.4g] %s", r.star(), r.zone(),
                    r.quantity(), r.median(), r.p16(), r.p84(), r.unit()));
        }
        return b.toString();
    }

    @Override
    public String toString() {
        return summary();
    }
}
