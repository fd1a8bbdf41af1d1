package org.nebulith.report;

import java.util.Map;

/**
 * The one place where a phase's data id (e.g. {@code FeS(c)}, {@code MgTi2O5(cr)}) becomes the name
 * a reader sees in a chart legend, a label or a report table. Polymorphs and state suffixes collapse
 * to one name, so that the three FeS data entries are one series.
 */
public final class PhaseLabels {

    private static final Map<String, String> MINERALS = Map.of(
            "FeS", "troilite",
            "Ni3S2", "heazlewoodite",
            "Ti4O7", "Ti4O7 (Magneli)",
            "AL2SiO5(an)", "andalusite",
            "Mn", "Mn metal");

    private PhaseLabels() {
    }

    /**
     * @param dataId the phase or species id of the data set
     * @return the reader's name: a mineral or solution name, or the formula without its state suffix
     */
    public static String display(final String dataId) {
        return org.nebulith.thermo.PhaseNames.display(dataId);
    }
}
