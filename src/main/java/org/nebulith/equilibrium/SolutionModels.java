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

    /** Olivine, forsterite-fayalite-tephroite (Mg, Fe, Mn on two M sites; tephroite: ds62). */
    public static final SolutionModel OLIVINE = new SolutionModel("olivine", List.of(
            new SolutionModel.EndMember("forsterite", 2, List.of("forsterite")),
            new SolutionModel.EndMember("fayalite", 2, List.of("fayalite")),
            new SolutionModel.EndMember("tephroite", 2, List.of("tephroite"))));

    /** Olivine without its Mn end-member (the form used before tephroite was added). */
    public static final SolutionModel OLIVINE_FE_MG = new SolutionModel("olivine-fe-mg", List.of(
            OLIVINE.endMembers().get(0), OLIVINE.endMembers().get(1)));

    /**
     * Orthopyroxene, enstatite-ferrosilite-Mn2Si2O6, two M sites. The Mg end-member takes the most
     * stable Mg2Si2O6 polymorph at each temperature (orthoenstatite, protoenstatite or clinoenstatite):
     * otherwise a pure Mg polymorph and the Fe-poor solution are nearly degenerate and the phase rule
     * cannot decide between them; the Mn end-member likewise takes pyroxmangite or rhodonite (ds62,
     * doubled to Mn2Si2O6).
     */
    public static final SolutionModel ORTHOPYROXENE_MN = new SolutionModel("orthopyroxene-mn", List.of(
            new SolutionModel.EndMember("enstatite", 2, List.of("enstatite", "protoenstatite", "clinoenstatite")),
            new SolutionModel.EndMember("ferrosilite", 2, List.of("ferrosilite")),
            new SolutionModel.EndMember("Mn2Si2O6", 2, List.of("pyroxmangite", "rhodonite"))));

    /**
     * Orthopyroxene enstatite-ferrosilite, the standard form. The form with the Mn end-member
     * ({@link #ORTHOPYROXENE_MN}) is offered but not standard, so that the default results and their golden
     * files keep Mn in its pure phases; both forms run the equilibrium and the fractional sequence of the
     * proto-solar gas to the floor.
     */
    public static final SolutionModel ORTHOPYROXENE = new SolutionModel("orthopyroxene", List.of(
            ORTHOPYROXENE_MN.endMembers().get(0), ORTHOPYROXENE_MN.endMembers().get(1)));

    /** Melilite, gehlenite-akermanite, one site. */
    public static final SolutionModel MELILITE = new SolutionModel("melilite", List.of(
            new SolutionModel.EndMember("gehlenite", 1, List.of("gehlenite")),
            new SolutionModel.EndMember("akermanite", 1, List.of("akermanite"))));

    /**
     * Plagioclase, anorthite-albite, one site; sanidine stays a separate pure phase. Measured at 1e-4 bar
     * (proto-solar gas): K T50 861 K as pure sanidine, against 1031 K in the ternary {@link #FELDSPAR}.
     */
    public static final SolutionModel PLAGIOCLASE = new SolutionModel("plagioclase", List.of(
            new SolutionModel.EndMember("anorthite", 1, List.of("anorthite")),
            new SolutionModel.EndMember("albite", 1, List.of("albite"))));

    /**
     * Ternary feldspar anorthite-albite-sanidine, ideal, one site. Real alkali and plagioclase feldspars
     * are separated by a wide miscibility gap at low temperature, so an ideal ternary overstates the K
     * a plagioclase can take (a caution for any K figure). The standard choice: trace K in a nebular gas
     * can only condense into a feldspar it dilutes in, as the published condensation calculations treat it
     * (Lodders 2003 dissolves K in feldspar); {@link #PLAGIOCLASE} plus pure sanidine is the alternative.
     */
    public static final SolutionModel FELDSPAR = new SolutionModel("feldspar", List.of(
            new SolutionModel.EndMember("anorthite", 1, List.of("anorthite")),
            new SolutionModel.EndMember("albite", 1, List.of("albite")),
            new SolutionModel.EndMember("sanidine", 1, List.of("sanidine"))));

    /**
     * Spinel, spinel-hercynite-chromite, one site. Chromite is the Robie &amp; Hemingway 1995 row (the only
     * source found), beside ds62 spinel and hercynite: two calibrations in one solution, a caution for the
     * Cr partitioning. Measured: Cr stays in the metal at its T50 and moves to ds62 picrochromite near
     * 900 K and to chromite in this solution by 600 K.
     */
    public static final SolutionModel SPINEL = new SolutionModel("spinel", List.of(
            new SolutionModel.EndMember("spinel", 1, List.of("spinel")),
            new SolutionModel.EndMember("hercynite", 1, List.of("hercynite")),
            new SolutionModel.EndMember("chromite", 1, List.of("chromite"))));

    /** Spinel-hercynite without chromite, one site. */
    public static final SolutionModel SPINEL_HERCYNITE = new SolutionModel("spinel-hercynite", List.of(
            SPINEL.endMembers().get(0), SPINEL.endMembers().get(1)));

    /** @return the standard solutions (those of {@code --solutions all}), in a fixed order */
    public static List<SolutionModel> all() {
        return List.of(METAL, OLIVINE, ORTHOPYROXENE, MELILITE, FELDSPAR, SPINEL);
    }

    /** @return every solution offered by name, the standard ones first, then their alternative forms */
    public static List<SolutionModel> offered() {
        return List.of(METAL, OLIVINE, ORTHOPYROXENE, MELILITE, FELDSPAR, SPINEL, OLIVINE_FE_MG,
                ORTHOPYROXENE_MN, PLAGIOCLASE, SPINEL_HERCYNITE);
    }

    /** @return the names of {@link #offered()}, comma-separated */
    public static String offeredNames() {
        StringBuilder b = new StringBuilder();
        offered().forEach(s -> b.append(b.length() == 0 ? "" : ", ").append(s.name()));
        return b.toString();
    }

    /**
     * @param name a solution name
     * @return the solution
     * @throws IllegalArgumentException listing the accepted names
     */
    public static SolutionModel byName(String name) {
        for (SolutionModel s : offered()) {
            if (s.name().equalsIgnoreCase(name)) {
                return s;
            }
        }
        throw new IllegalArgumentException("unknown solution '" + name + "'; accepted: " + offeredNames());
    }
}
