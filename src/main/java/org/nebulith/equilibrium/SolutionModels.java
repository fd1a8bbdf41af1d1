package org.nebulith.equilibrium;

import java.util.List;

/**
 * The ideal solutions Nebulith offers, each switchable by name. Site multiplicities follow the
 * usual one-site or two-site ideal mixing (common practice, e.g. Wood &amp; Fraser 1977,
 * Elementary Thermodynamics for Geologists): olivine and orthopyroxene mix Mg and Fe on two
 * octahedral sites per formula unit as written (Mg2SiO4, Mg2Si2O6); the other solutions are
 * treated as molecular (one-site) mixtures.
 */
public final class SolutionModels {
    private SolutionModels() {
    }

    /** Fe-Ni-Co-Cr metal, each end-member choosing its stable polymorph or liquid. */
    public static final SolutionModel METAL = new SolutionModel("metal", List.of(
            new SolutionModel.EndMember("Fe", 1, List.of("Fe(a)", "Fe(c)", "Fe(d)", "Fe(L)")),
            new SolutionModel.EndMember("Ni", 1, List.of("Ni(cr)", "Ni(L)")),
            new SolutionModel.EndMember("Co", 1, List.of("Co(a)", "Co(b)", "Co(L)")),
            new SolutionModel.EndMember("Cr", 1, List.of("Cr(cr)", "Cr(L)"))));

    /** Olivine, forsterite-fayalite, two M sites. */
    public static final SolutionModel OLIVINE = new SolutionModel("olivine", List.of(
            new SolutionModel.EndMember("forsterite", 2, List.of("forsterite")),
            new SolutionModel.EndMember("fayalite", 2, List.of("fayalite"))));

    /**
     * Orthopyroxene, enstatite-ferrosilite (Mg2Si2O6-Fe2Si2O6), two M sites. The Mg end-member takes
     * the most stable Mg2Si2O6 polymorph at each temperature (orthoenstatite, protoenstatite or
     * clinoenstatite): otherwise a pure Mg polymorph and the Fe-poor solution are nearly degenerate
     * and the phase rule cannot decide between them.
     */
    public static final SolutionModel ORTHOPYROXENE = new SolutionModel("orthopyroxene", List.of(
            new SolutionModel.EndMember("enstatite", 2, List.of("enstatite", "protoenstatite", "clinoenstatite")),
            new SolutionModel.EndMember("ferrosilite", 2, List.of("ferrosilite"))));

    /** Melilite, gehlenite-akermanite, one site. */
    public static final SolutionModel MELILITE = new SolutionModel("melilite", List.of(
            new SolutionModel.EndMember("gehlenite", 1, List.of("gehlenite")),
            new SolutionModel.EndMember("akermanite", 1, List.of("akermanite"))));

    /** Plagioclase, anorthite-albite, one site. */
    public static final SolutionModel PLAGIOCLASE = new SolutionModel("plagioclase", List.of(
            new SolutionModel.EndMember("anorthite", 1, List.of("anorthite")),
            new SolutionModel.EndMember("albite", 1, List.of("albite"))));

    /** Spinel-hercynite, one site. */
    public static final SolutionModel SPINEL = new SolutionModel("spinel-hercynite", List.of(
            new SolutionModel.EndMember("spinel", 1, List.of("spinel")),
            new SolutionModel.EndMember("hercynite", 1, List.of("hercynite"))));

    /** @return all standard solutions, in a fixed order */
    public static List<SolutionModel> all() {
        return List.of(METAL, OLIVINE, ORTHOPYROXENE, MELILITE, PLAGIOCLASE, SPINEL);
    }

    /**
     * @param name a solution name
     * @return the solution
     * @throws IllegalArgumentException listing the accepted names
     */
    public static SolutionModel byName(String name) {
        for (SolutionModel s : all()) {
            if (s.name().equalsIgnoreCase(name)) {
                return s;
            }
        }
        throw new IllegalArgumentException("unknown solution '" + name + "'; accepted: metal, olivine, "
                + "orthopyroxene, melilite, plagioclase, spinel-hercynite");
    }
}
