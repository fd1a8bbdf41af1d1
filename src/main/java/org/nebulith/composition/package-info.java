/**
 * Elemental compositions of gas and dust: {@link org.nebulith.composition.ElementAbundances}
 * (immutable moles per element), abundance files and named presets, and the operations that turn a
 * reference composition into the gas of a given disk (dust enrichment, C/O override, stellar [X/H]).
 * Depends only on {@code org.nebulith.thermo} (elements).
 */
package org.nebulith.composition;
