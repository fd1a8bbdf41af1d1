package org.nebulith.composition;

import java.util.List;
import java.util.Objects;

/**
 * A named composition with its provenance.
 *
 * @param name       preset name or file name
 * @param provenance the file's {@code #} header lines (citation), without the {@code #}
 * @param abundances the element amounts (relative; see {@link AbundanceUnit} for the scale read)
 */
public record AbundanceSet(String name, List<String> provenance, ElementAbundances abundances) {
    public AbundanceSet {
        Objects.requireNonNull(name);
        provenance = List.copyOf(provenance);
        Objects.requireNonNull(abundances);
    }
}
