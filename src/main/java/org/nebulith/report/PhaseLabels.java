package org.nebulith.report;

import org.nebulith.thermo.PhaseNames;

/**
 * The one place where a phase's data id (e.g. {@code FeS(c)}) becomes the name a reader sees in a
 * chart legend or label: {@link PhaseNames#display}, so that polymorphs and state suffixes collapse to
 * one name and the three FeS data entries are one series.
 */
public final class PhaseLabels {

    private PhaseLabels() {
    }

    /**
     * @param dataId the phase or species id of the data set
     * @return the reader's name
     */
    public static String display(final String dataId) {
        return PhaseNames.display(dataId);
    }
}
