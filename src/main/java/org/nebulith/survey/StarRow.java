package org.nebulith.survey;

import java.io.Serializable;
import java.util.Collections;
import java.util.EnumMap;
import java.util.Map;

import org.nebulith.thermo.Element;

/**
 * One validated catalogue row: everything a star's survey depends on besides the run settings.
 *
 * @param star      the star's name (non-empty, unique in the catalogue)
 * @param line      1-based line of the catalogue file (for messages only; never affects results)
 * @param abundances measured [X/H] with errors, in {@link Element} order; always holds Fe
 * @param disk      the star's own disk (preset name or file), or null to use the run's
 * @param zones     the star's own feeding-zone file, or null to use the run's
 * @param errorCorrelation common correlation coefficient of the star's [X/H] errors, in [0, 1]
 *                  (0: independent errors)
 */
public record StarRow(String star, long line, Map<Element, Measurement> abundances, String disk, String zones,
                      double errorCorrelation) implements Serializable {
    public StarRow {
        if (star == null || star.isBlank()) {
            throw new IllegalArgumentException("a star needs a name");
        }
        if (!abundances.containsKey(Element.Fe)) {
            throw new IllegalArgumentException("star " + star + " has no [Fe/H]");
        }
        if (!(errorCorrelation >= 0 && errorCorrelation <= 1)) {
            throw new IllegalArgumentException("error correlation must be in [0, 1], got " + errorCorrelation);
        }
        abundances = Collections.unmodifiableMap(new EnumMap<>(abundances));
    }

    /** @return a row without per-star disk, zones or correlation */
    public static StarRow of(String star, Map<Element, Measurement> abundances) {
        return new StarRow(star, 0, abundances, null, null, 0);
    }
}
