package org.nebulith.condensation.output;

import java.util.List;

import org.nebulith.condensation.CondensationSequence;
import org.nebulith.report.RunFolder;

/**
 * Hook for the charts and the HTML report of a sequence run (condensation curves: fraction of each
 * element condensed against T; phase assemblage: amount of each phase against T). The chart
 * builders of the report layer are not in this build yet, so {@link #write} writes nothing and
 * says so; wire them here when they are.
 */
public final class SequenceCharts {
    private SequenceCharts() {
    }

    /**
     * @param run    the open run folder
     * @param seq    the sequence
     * @param tables its tables
     * @return the names of the files written (none in this build)
     */
    public static List<String> write(RunFolder run, CondensationSequence seq, SequenceTables tables) {
        return List.of();
    }

    /** @return the sentence the run notes show while no charts are produced */
    public static String absenceNote() {
        return "Charts and the HTML report are not produced by this build (the chart layer is not merged yet); "
                + "plot sequence.csv and element-fractions.csv directly.";
    }
}
