package org.nebulith.cli;

import java.util.Locale;

import org.nebulith.composition.SolarReference;
import org.nebulith.errors.InputException;

/** The {@code --solar-reference} values of the catalogue commands. */
final class SolarReferences {
    private SolarReferences() {
    }

    /**
     * @param value the option's value
     * @return the reference
     * @throws InputException for an unknown name
     */
    static SolarReference parse(final String value) {
        switch (value.toLowerCase(Locale.ROOT)) {
            case "asplund2009": return SolarReference.ASPLUND2009;
            case "lodders2003": return SolarReference.LODDERS2003;
            default: throw InputException.atOption("--solar-reference", value, "unknown solar reference",
                    "asplund2009, lodders2003");
        }
    }
}
