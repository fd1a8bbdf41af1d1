package org.nebulith.report.survey;

import org.nebulith.composition.SolarReference;
import org.nebulith.report.Cautions;
import org.nebulith.survey.SurveyFailures;
import org.nebulith.survey.SurveySettings;

/** The text of {@code survey-notes.txt}: settings, counts, method and cautions of a survey. */
final class SurveyNotes {

    private SurveyNotes() {
    }

    static String text(LocalSurvey.Request r, long stars, long skipped, long failed, long failedDraws, long runDraws) {
        SurveySettings s = r.settings();
        StringBuilder t = new StringBuilder();
        t.append("Nebulith host-star survey\n\n");
        t.append("catalogue: ").append(r.shownName()).append('\n');
        t.append("solar reference: ").append(describe(s.solar())).append('\n');
        t.append("disk: ").append(s.disk() == null ? "the planet estimate's default" : s.disk())
                .append(" (a star's own 'disk' column overrides it)\n");
        t.append("zones: ").append(s.zones() == null ? "the planet estimate's default zone" : s.zones())
                .append(" (a star's own 'zones' column overrides it)\n");
        t.append("draws per star: ").append(s.draws()).append("\nseed: ").append(s.seed()).append("\n\n");
        t.append("stars computed: ").append(stars).append("\nbad rows skipped: ").append(skipped)
                .append("\nstars failed (nominal estimate): ").append(failed)
                .append("\ndraws failed: ").append(failedDraws).append(" of ").append(runDraws)
                .append(" (listed in ").append(SurveyFailures.FILE).append("; limit --max-failed-fraction ")
                .append(r.maxFailedFraction()).append(r.strict() ? ", --strict" : "").append(')')
                .append("\nper star (status, measured elements, elements that followed [Fe/H]): ")
                .append(StarsTable.FILE).append("\n\n");
        t.append("""
                Method
                - Each draw takes [X/H] ~ Normal(value, error) for every measured element (independent errors,
                  or a common correlation err_corr where the catalogue gives one) and runs the planet estimate.
                  Draws come in antithetic pairs (the second of a pair mirrors the first about the catalogue
                  values), which keeps every draw Normal and makes medians converge faster.
                - median, p16, p84: 50th, 16th and 84th percentiles of the draws, by linear interpolation of
                  order statistics (Hyndman & Fan 1996, definition 7); nominal: the estimate at the catalogue
                  values. Zone 'host' holds the star's own molar ratios.
                - A draw whose estimate fails (no converged equilibrium) is listed in failures.csv and left out;
                  a quantity that does not apply to a draw (no rock for a core mass fraction, no Mg and Fe in
                  the mantle for Mg#) is left out too. n_draws counts the draws behind each row's percentiles,
                  n_not_applicable the converged draws to which the quantity does not apply; an empty cell is
                  a value that does not exist.
                - Draw d of star S uses a random stream derived from (seed, S, d) only (see DrawRandom), so the
                  results do not depend on threads, order or machine.

                Cautions
                """);
        Cautions.survey().forEach(c -> t.append("- ").append(c).append('\n'));
        if (s.solar() == SolarReference.LODDERS2003) {
            t.append("- The Lodders 2003 reference is proto-solar: metals/H are then bulk (settling-corrected)"
                    + " values; metal ratios such as Mg/Si and Fe/Si are nearly unaffected.\n");
        }
        return t.toString();
    }

    private static String describe(SolarReference r) {
        return r == SolarReference.ASPLUND2009 ? "Asplund et al. 2009 (ARA&A 47, 481), photosphere"
                : "Lodders 2003 (ApJ 591, 1220), proto-solar";
    }
}
