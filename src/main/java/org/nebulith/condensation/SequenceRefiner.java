package org.nebulith.condensation;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;

import org.nebulith.equilibrium.ChemicalSystem;
import org.nebulith.equilibrium.EquilibriumProblem;
import org.nebulith.equilibrium.EquilibriumResult;
import org.nebulith.equilibrium.EquilibriumSolver;
import org.nebulith.equilibrium.WarmStart;
import org.nebulith.thermo.Element;

/**
 * Locates phase boundaries and 50% condensation points between grid steps by bisection on
 * temperature, solving the reacting system of the colder step (its composition after the
 * withdrawal of earlier steps) at intermediate temperatures.
 */
final class SequenceRefiner {
    private final EquilibriumSolver solver;
    private final SequenceSettings settings;

    SequenceRefiner(EquilibriumSolver solver, SequenceSettings settings) {
        this.solver = solver;
        this.settings = settings;
    }

    List<PhaseEvent> phaseEvents(List<SequenceStep> steps) {
        ChemicalSystem sys = steps.get(0).result().system();
        Map<Integer, Double> openSince = new LinkedHashMap<>();
        Map<Integer, Boolean> atStart = new LinkedHashMap<>();
        List<PhaseEvent> events = new ArrayList<>();
        for (int p : steps.get(0).result().presentCondensedPhases()) {
            openSince.put(p, steps.get(0).temperatureK());
            atStart.put(p, true);
        }
        for (int i = 1; i < steps.size(); i++) {
            SequenceStep warm = steps.get(i - 1);
            SequenceStep cold = steps.get(i);
            for (int p = 1; p < sys.phaseCount(); p++) {
                boolean was = warm.result().phaseMoles(p) > 0;
                boolean is = cold.result().phaseMoles(p) > 0;
                final int ph = p;
                if (!was && is) {
                    openSince.put(p, boundary(warm, cold, r -> r.phaseMoles(ph) > 0));
                    atStart.put(p, false);
                } else if (was && !is && openSince.containsKey(p)) {
                    double t = boundary(warm, cold, r -> r.phaseMoles(ph) <= 0);
                    events.add(new PhaseEvent(sys.phaseName(p), openSince.remove(p), OptionalDouble.of(t), atStart.remove(p)));
                }
            }
        }
        for (Map.Entry<Integer, Double> e : openSince.entrySet()) {
            events.add(new PhaseEvent(sys.phaseName(e.getKey()), e.getValue(), OptionalDouble.empty(), atStart.get(e.getKey())));
        }
        events.sort((a, b) -> Double.compare(b.appearK(), a.appearK()));
        return events;
    }

    List<ElementCondensation> condensationTemperatures(List<SequenceStep> steps, List<PhaseEvent> events) {
        ChemicalSystem sys = steps.get(0).result().system();
        List<ElementCondensation> out = new ArrayList<>();
        for (Element e : sys.elements()) {
            out.add(forElement(e, steps, sys));
        }
        return out;
    }

    private ElementCondensation forElement(Element e, List<SequenceStep> steps, ChemicalSystem sys) {
        OptionalDouble onset = OptionalDouble.empty();
        OptionalDouble t50 = OptionalDouble.empty();
        String host = "";
        if (steps.get(0).result().condensedMoles(e) > 0) {
            onset = OptionalDouble.of(steps.get(0).temperatureK());
        }
        if (steps.get(0).condensedFraction(e) >= 0.5) {
            t50 = OptionalDouble.of(steps.get(0).temperatureK());
            host = host(steps.get(0).result(), e);
        }
        for (int i = 1; i < steps.size() && (onset.isEmpty() || t50.isEmpty()); i++) {
            SequenceStep warm = steps.get(i - 1);
            SequenceStep cold = steps.get(i);
            if (onset.isEmpty() && warm.condensedFraction(e) <= 0 && cold.condensedFraction(e) > 0) {
                onset = OptionalDouble.of(boundary(warm, cold, r -> fraction(r, cold, e) > 0));
            }
            if (t50.isEmpty() && warm.condensedFraction(e) < 0.5 && cold.condensedFraction(e) >= 0.5) {
                double t = boundary(warm, cold, r -> fraction(r, cold, e) >= 0.5);
                t50 = OptionalDouble.of(t);
                host = host(solveAt(cold, t, cold.result()), e);
            }
        }
        return new ElementCondensation(e, t50, host, onset);
    }

    /** Condensed fraction of e with the reacting system in state r and the solids withdrawn before the cold step. */
    private static double fraction(EquilibriumResult r, SequenceStep cold, Element e) {
        return (r.condensedMoles(e) + cold.withdrawnElementMoles(e)) / cold.inputTotal(e);
    }

    /** The condensed phase holding most of e in r. */
    static String host(EquilibriumResult r, Element e) {
        ChemicalSystem sys = r.system();
        int j = sys.elementIndex(e);
        String best = "";
        double bv = 0;
        for (int p : r.presentCondensedPhases()) {
            double s = 0;
            for (int k = 0; k < sys.memberNames(p).size(); k++) {
                s += r.memberMoles(p, k) * sys.memberStoichiometry(p, k)[j];
            }
            if (s > bv) {
                bv = s;
                best = sys.phaseName(p);
            }
        }
        return best;
    }

    /**
     * Bisects between a warm step where the test fails and a cold step where it holds.
     *
     * @return the midpoint of the final bracket [K]
     */
    private double boundary(SequenceStep warm, SequenceStep cold, java.util.function.Predicate<EquilibriumResult> holds) {
        double hi = warm.temperatureK();
        double lo = cold.temperatureK();
        EquilibriumResult near = cold.result();
        while (hi - lo > settings.refineK()) {
            double mid = 0.5 * (hi + lo);
            EquilibriumResult r = solveAt(cold, mid, near);
            if (holds.test(r)) {
                lo = mid;
                near = r;
            } else {
                hi = mid;
            }
        }
        return 0.5 * (hi + lo);
    }

    private EquilibriumResult solveAt(SequenceStep cold, double t, EquilibriumResult near) {
        EquilibriumProblem pr = cold.result().problem().at(t, settings.path().pressureBar(t));
        return solver.solve(pr, WarmStart.of(near));
    }
}
