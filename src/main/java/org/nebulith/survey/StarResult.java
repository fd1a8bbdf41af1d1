package org.nebulith.survey;

import java.io.Serializable;
import java.util.List;
import java.util.Optional;

/**
 * The survey of one star: its rows and the estimates that failed. A star whose nominal estimate
 * fails has no rows and one failure (stage {@code nominal}); otherwise every failed draw is listed
 * and the rows summarise the draws that converged.
 *
 * @param rows     the star's survey rows (empty when the nominal estimate failed)
 * @param failures failed estimates, nominal first, then draws in increasing order
 * @param draws    draws requested for the star
 */
public record StarResult(List<SurveyRow> rows, List<DrawFailure> failures, int draws) implements Serializable {

    private static final long serialVersionUID = 1L;

    public StarResult {
        rows = List.copyOf(rows);
        failures = List.copyOf(failures);
    }

    /** @return the nominal failure, if the star could not be estimated at its catalogue values */
    public Optional<DrawFailure> nominalFailure() {
        return failures.isEmpty() || failures.get(0).draw() != StarJobException.NOMINAL ? Optional.empty()
                : Optional.of(failures.get(0));
    }

    /** @return whether the star failed as a whole (no rows) */
    public boolean failed() {
        return nominalFailure().isPresent();
    }

    /** @return draws lost: all of them when the nominal estimate failed, else the failed draws */
    public long failedDraws() {
        return failed() ? draws : failures.size();
    }
}
