package org.nebulith.condensation;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;

import org.nebulith.composition.AbundancePresets;
import org.nebulith.composition.DustEnrichment;
import org.nebulith.composition.ElementAbundances;
import org.nebulith.equilibrium.ChemicalSystem;
import org.nebulith.equilibrium.EquilibriumSolver;
import org.nebulith.equilibrium.SolutionModel;
import org.nebulith.equilibrium.SolutionModels;
import org.nebulith.thermo.DataSet;
import org.nebulith.thermo.Element;
import org.nebulith.thermo.Species;
import org.nebulith.thermo.ThermoModel;

/**
 * Sequences shared by the condensation tests, computed once per JVM: the proto-solar gas of
 * Lodders (2003, Table 2; preset protosolar-lodders2003) with the default data set and all solutions
 * on a 5 K grid (boundaries bisected to 0.05 K, so 50% points do not depend on the grid step).
 */
final class SequenceRuns {
    private static final Map<String, CondensationSequence> CACHE = new ConcurrentHashMap<>();

    private SequenceRuns() {
    }

    static ElementAbundances protosolar() {
        return AbundancePresets.preset(AbundancePresets.PROTOSOLAR_LODDERS2003).abundances();
    }

    static double[] totals(ChemicalSystem sys, ElementAbundances comp) {
        double[] b = new double[sys.elementCount()];
        for (int j = 0; j < b.length; j++) {
            b[j] = comp.moles(sys.elements().get(j));
        }
        return b;
    }

    static CondensationSequence run(List<Species> species, ElementAbundances comp, double pBar, double tMax,
                                    double tMin, double phi) {
        return run(species, SolutionModels.all(), comp, pBar, tMax, tMin, phi);
    }

    static CondensationSequence run(List<Species> species, List<SolutionModel> solutions, ElementAbundances comp,
                                    double pBar, double tMax, double tMin, double phi) {
        ChemicalSystem sys = ChemicalSystem.of(comp.elements(), species, solutions);
        SequenceSettings s = new SequenceSettings(PressurePath.constant(pBar), tMax, tMin, 5, phi, 0.05);
        return new SequenceRunner(new EquilibriumSolver()).run(sys, totals(sys, comp), s);
    }

    static List<Species> defaultData() {
        return DataSet.named(DataSet.DEFAULT).species();
    }

    /** The reference run: 1e-4 bar, 2000 to 300 K, equilibrium. */
    static CondensationSequence base() {
        return CACHE.computeIfAbsent("base", k -> run(defaultData(), protosolar(), 1e-4, 2000, 300, 0));
    }

    /** Hot part at 1e-3 bar, 2000 to 1000 K. */
    static CondensationSequence hot(double pBar) {
        return CACHE.computeIfAbsent("hot" + pBar, k -> run(defaultData(), protosolar(), pBar, 2000, 1000, 0));
    }

    /** Hot part (2000 to 1350 K) at 1e-4 bar with CI dust added: (factor - 1) x CI dust per Si of the gas. */
    static CondensationSequence dusty(double factor) {
        return CACHE.computeIfAbsent("dust" + factor, k -> run(defaultData(), DustEnrichment.enrich(protosolar(),
                AbundancePresets.preset(AbundancePresets.CI_CHONDRITE).abundances(), factor), 1e-4, 2000, 1350, 0));
    }

    /** The sulfide window, 760 to 600 K, at pBar, default data or with ds62 troilite instead of the NASA FeS entries. */
    static CondensationSequence sulfide(double pBar, boolean troilite) {
        return CACHE.computeIfAbsent("S" + pBar + troilite, k -> run(troilite
                ? DataSet.named(DataSet.DEFAULT).withVariant(org.nebulith.thermo.SensitivityVariants.TROILITE_DS62).species()
                : defaultData(), protosolar(), pBar, 760, 600, 0));
    }

    /** 1e-4 bar, 1800 to 1400 K, with the ALOH gas made dH less stable [J/mol]. */
    static CondensationSequence alohShifted(double dHJPerMol) {
        List<Species> sp = new ArrayList<>();
        for (Species s : defaultData()) {
            sp.add(s.isGas() && s.id().equals("ALOH") ? shifted(s, dHJPerMol) : s);
        }
        return CACHE.computeIfAbsent("aloh" + dHJPerMol, k -> run(sp, protosolar(), 1e-4, 1800, 1400, 0));
    }

    /** 1e-4 bar, 1800 to 1400 K, default data (the comparison for {@link #alohShifted}). */
    static CondensationSequence alohBase() {
        return CACHE.computeIfAbsent("alohbase", k -> run(defaultData(), protosolar(), 1e-4, 1800, 1400, 0));
    }

    private static Species shifted(Species s, double dH) {
        ThermoModel m = s.thermo();
        ThermoModel shifted = new ThermoModel() {
            @Override public double tMinK() { return m.tMinK(); }
            @Override public double tMaxK() { return m.tMaxK(); }
            @Override public double cpOverR(double t) { return m.cpOverR(t); }
            @Override public double hOverRT(double t) { return m.hOverRT(t) + dH / (R * t); }
            @Override public double sOverR(double t) { return m.sOverR(t); }
            @Override public double gOverRT(double t) { return m.gOverRT(t) + dH / (R * t); }
        };
        return new Species(s.id(), s.state(), s.formula(), s.source(), s.sourceRow(), s.role(), shifted, s.variant());
    }

    static ElementCondensation t50(CondensationSequence seq, Element e) {
        return seq.condensationTemperatures().stream().filter(c -> c.element() == e).findFirst().orElseThrow();
    }

    static double t50K(CondensationSequence seq, Element e) {
        return t50(seq, e).t50K().orElseThrow();
    }
}
