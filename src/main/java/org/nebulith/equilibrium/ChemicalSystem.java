package org.nebulith.equilibrium;

import java.util.ArrayList;
import java.util.Collections;
import java.util.EnumSet;
import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.nebulith.thermo.Element;
import org.nebulith.thermo.Species;

/**
 * The species and phases over which equilibrium is computed, independent of temperature,
 * pressure and amounts: an ideal gas of the gas species, one pure phase per condensed species
 * (each polymorph separately), and the enabled ideal solutions, whose end-member species are then
 * no longer offered as pure phases. The stoichiometry is precomputed once, so one system serves a
 * whole condensation sequence or survey.
 */
public final class ChemicalSystem {
    private final Element[] elements;
    private final List<PhaseDef> phases;
    private final Map<String, Integer> phaseIndex = new HashMap<>();
    /** the names of each phase's members, built once (the survey asks for them per draw) */
    private final List<List<String>> memberNames = new ArrayList<>();
    private final double gasTMin;
    private final double gasTMax;
    /**
     * T- and P-dependent data of recent states, by (T, P): a survey's draws revisit the same few
     * radial nodes, where these data cost about as much as a Newton step. Bounded: cleared when full
     * (a condensation sequence visits a new temperature at every step).
     */
    private final java.util.concurrent.ConcurrentHashMap<ThermalKey, StateData.Thermal> thermal =
            new java.util.concurrent.ConcurrentHashMap<>();
    private static final int THERMAL_CACHE_SIZE = 256;

    private record ThermalKey(double tK, double pBar) {
    }

    private ChemicalSystem(Element[] elements, List<PhaseDef> phases) {
        this.elements = elements;
        this.phases = phases;
        for (int p = 0; p < phases.size(); p++) {
            phaseIndex.put(phases.get(p).name, p);
            List<String> names = new ArrayList<>();
            for (Constituent c : phases.get(p).members) {
                names.add(c.name);
            }
            memberNames.add(List.copyOf(names));
        }
        double lo = 0;
        double hi = Double.POSITIVE_INFINITY;
        for (Constituent c : phases.get(0).members) {
            Species s = c.candidates[0];
            lo = Math.max(lo, s.thermo().tMinK() - Species.GAS_EXTRAPOLATION_BELOW_K);
            hi = Math.min(hi, s.thermo().tMaxK());
        }
        gasTMin = lo;
        gasTMax = hi;
    }

    /**
     * Builds a system from species and solutions, keeping only species made of {@code elements}.
     *
     * @param elements  the elements of the system
     * @param species   gas and condensed species (others' elements are dropped silently)
     * @param solutions solutions to enable; end-members whose species are missing are dropped,
     *                  and a solution left with fewer than two end-members becomes pure phases
     * @return the system
     */
    public static ChemicalSystem of(Set<Element> elements, List<Species> species, List<SolutionModel> solutions) {
        Element[] els = EnumSet.copyOf(elements).toArray(new Element[0]);
        Map<String, Species> byId = new HashMap<>();
        List<Species> usable = new ArrayList<>();
        for (Species s : species) {
            if (s.formula().madeOnlyOf(elements)) {
                if (byId.putIfAbsent(s.id(), s) != null) {
                    throw new IllegalArgumentException("species id '" + s.id() + "' given twice");
                }
                usable.add(s);
            }
        }
        List<PhaseDef> phases = new ArrayList<>();
        List<Constituent> gas = new ArrayList<>();
        for (Species s : usable) {
            if (s.isGas()) {
                gas.add(new Constituent(s.id(), stoich(els, s), 1.0, List.of(s)));
            }
        }
        if (gas.isEmpty()) {
            throw new IllegalArgumentException("no gas species made of the elements " + elements);
        }
        phases.add(new PhaseDef(PhaseKind.GAS, "gas", gas));
        Set<String> inSolution = new LinkedHashSet<>();
        List<PhaseDef> solutionPhases = new ArrayList<>();
        for (SolutionModel sm : solutions) {
            List<Constituent> members = new ArrayList<>();
            List<String> ids = new ArrayList<>();
            for (SolutionModel.EndMember em : sm.endMembers()) {
                List<Species> cands = new ArrayList<>();
                for (String id : em.speciesIds()) {
                    Species s = byId.get(id);
                    if (s != null && !s.isGas()) {
                        cands.add(s);
                    }
                }
                if (!cands.isEmpty()) {
                    checkSameFormula(sm, em, cands);
                    members.add(new Constituent(em.name(), stoich(els, cands.get(0)), em.multiplicity(), cands));
                    cands.forEach(c -> ids.add(c.id()));
                }
            }
            if (members.size() >= 2) {
                solutionPhases.add(new PhaseDef(PhaseKind.SOLUTION, sm.name(), members));
                inSolution.addAll(ids);
            }
        }
        for (Species s : usable) {
            if (!s.isGas() && !inSolution.contains(s.id())) {
                phases.add(new PhaseDef(PhaseKind.PURE, s.id(),
                        List.of(new Constituent(s.id(), stoich(els, s), 1.0, List.of(s)))));
            }
        }
        phases.addAll(solutionPhases);
        return new ChemicalSystem(els, phases);
    }

    private static void checkSameFormula(SolutionModel sm, SolutionModel.EndMember em, List<Species> cands) {
        for (Species c : cands) {
            if (!c.formula().equals(cands.get(0).formula())) {
                throw new IllegalArgumentException("end-member " + em.name() + " of " + sm.name()
                        + ": candidates " + cands.get(0).id() + " and " + c.id() + " differ in formula");
            }
        }
    }

    private static double[] stoich(Element[] els, Species s) {
        double[] a = new double[els.length];
        for (int j = 0; j < els.length; j++) {
            a[j] = s.formula().count(els[j]);
        }
        return a;
    }

    /** @return the elements, in the order of element potentials and totals */
    public List<Element> elements() {
        return List.of(elements);
    }

    /** @return number of elements */
    public int elementCount() {
        return elements.length;
    }

    /**
     * @param tK   temperature [K]
     * @param pBar pressure [bar]
     * @return the data of this system that depend on T and P only (shared, never to be modified)
     */
    StateData.Thermal thermal(double tK, double pBar) {
        ThermalKey key = new ThermalKey(tK, pBar);
        StateData.Thermal th = thermal.get(key);
        if (th == null) {
            th = new StateData.Thermal(this, tK, pBar);
            if (thermal.size() >= THERMAL_CACHE_SIZE) {
                thermal.clear();
            }
            thermal.put(key, th);
        }
        return th;
    }

    /** @return number of phases (gas first) */
    public int phaseCount() {
        return phases.size();
    }

    /** @param p phase index @return its name */
    public String phaseName(int p) {
        return phases.get(p).name;
    }

    /** @param p phase index @return its kind */
    public PhaseKind phaseKind(int p) {
        return phases.get(p).kind;
    }

    /** @param p phase index @return the number of its constituents (gas species, end-members) */
    public int memberCount(int p) {
        return phases.get(p).members.length;
    }

    /** @param p phase index @return names of its constituents (gas species, end-members) */
    public List<String> memberNames(int p) {
        return memberNames.get(p);
    }

    /** @param p phase index @param k member index @return stoichiometry over {@link #elements()} */
    public double[] memberStoichiometry(int p, int k) {
        return phases.get(p).members[k].a.clone();
    }

    /** @param name phase name @return its index, or -1 */
    public int phaseIndex(String name) {
        Integer i = phaseIndex.get(name);
        return i == null ? -1 : i;
    }

    /** @return lowest temperature at which every gas species may be evaluated [K] */
    public double gasTMinK() {
        return gasTMin;
    }

    /** @return highest temperature at which every gas species has data [K] */
    public double gasTMaxK() {
        return gasTMax;
    }

    PhaseDef phase(int p) {
        return phases.get(p);
    }

    /** @param e an element @return its index in this system, or -1 */
    public int elementIndex(Element e) {
        for (int j = 0; j < elements.length; j++) {
            if (elements[j] == e) {
                return j;
            }
        }
        return -1;
    }
}
