package org.nebulith.planet;

/** What a condensed phase contributes to a planet. */
public enum PhaseKind {
    /** Fe-Ni(-Co-Cr) metal: goes to the core. */
    METAL,
    /** Sulfides (troilite FeS...): core by default, mantle on request. */
    SULFIDE,
    /** Silicates and oxides: mantle. */
    SILICATE_OXIDE,
    /** Water and other ices: a volatile layer, outside the rock. */
    ICE,
    /** Graphite, carbides, organics: counted in the mantle budget (no oxide form). */
    CARBON,
    /** Anything else (phosphides, halides...): mantle budget. */
    OTHER
}
