package org.nebulith.condensation;

import java.util.OptionalDouble;

/**
 * One stability interval of a condensed phase on cooling: where it appears and, if it does, where
 * it vanishes again. A phase that appears twice has two events.
 *
 * @param phase       phase name (species id or solution name)
 * @param appearK     appearance temperature [K] (bisected)
 * @param disappearK  disappearance temperature [K], empty if still present at the end
 * @param presentAtStart true if the phase was already stable at the hottest temperature
 */
public record PhaseEvent(String phase, double appearK, OptionalDouble disappearK, boolean presentAtStart) {
}
