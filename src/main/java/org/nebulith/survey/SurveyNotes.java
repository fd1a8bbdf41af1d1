package org.nebulith.survey;

import org.nebulith.composition.SolarReference;

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
                - Elements a star lacks follow its [Fe/H] (common practice): a ratio that involves such an
                  element reflects the solar ratio scaled by [Fe/H], not a measurement of this star.
                - Only the catalogue's random errors are propagated; systematic offsets between abundance
                  analyses, and the error of the solar reference itself, are not.
                - With few draws the 16th and 84th percentiles are noisy: for a Gaussian spread sigma their
                  standard error is about 1.5 sigma / sqrt(draws) (0.15 sigma at 100 draws, 0.05 sigma at
                  1000; asymptotic error of a sample quantile, common practice).
                - Draws left out are not a random sample: if failures or not-applicable draws cluster in one
                  part of the abundance distribution, the percentiles describe the rest; compare n_draws
                  with draws.
                - The planet quantities inherit every assumption of the planet estimate (equilibrium
                  condensation in the given disk, solids accreted where they condensed, no later
                  processing); they are a composition expected from the star, not a measurement.
                """);
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
