package org.nebulith.survey;

import java.io.Serializable;

/**
 * One catalogue abundance: [X/H] and its 1-sigma error.
 *
 * @param dex   [X/H] [dex] relative to the run's solar reference, finite
 * @param error 1-sigma error [dex], finite and &gt;= 0
 */
public record Measurement(double dex, double error) implements Serializable {
    public Measurement {
        if (!Double.isFinite(dex) || !Double.isFinite(error) || error < 0) {
            throw new IllegalArgumentException("[X/H] = " + dex + " +- " + error + " is not a finite value with an error >= 0");
        }
    }
}
