package org.nebulith.equilibrium;

import java.util.List;

/** A phase of a {@link ChemicalSystem}: its kind, name and constituents. */
final class PhaseDef {
    final PhaseKind kind;
    final String name;
    final Constituent[] members;

    PhaseDef(PhaseKind kind, String name, List<Constituent> members) {
        this.kind = kind;
        this.name = name;
        this.members = members.toArray(new Constituent[0]);
    }
}
