package org.nebulith.condensation;

import java.util.OptionalDouble;

import org.nebulith.thermo.Element;

/**
 * The temperatures quoted for one element: the 50% condensation temperature and where the element
 * first condenses.
 *
 * @param element   the element
 * @param t50K      temperature at which half of the element is condensed [K], if reached
 * @param hostPhase the condensed phase holding most of the element at T50 ("" if not reached)
 * @param onsetK    temperature at which the element starts to condense [K], if it does
 */
public record ElementCondensation(Element element, OptionalDouble t50K, String hostPhase, OptionalDouble onsetK) {
}
