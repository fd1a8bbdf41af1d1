package org.nebulith.condensation;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.concurrent.ConcurrentHashMap;
import java.util.function.Predicate;

import org.nebulith.equilibrium.ChemicalSystem;
import org.nebulith.equilibrium.EquilibriumProblem;
import org.nebulith.equilibrium.EquilibriumResult;
import org.nebulith.equilibrium.EquilibriumSolver;
import org.nebulith.equilibrium.WarmStart;
import org.nebulith.thermo.Element;

/**
 * Locates phase boundaries and 50% condensation points between grid steps by bisection on
 * temperature, solving the reacting system of the colder step (its composition after the
 * withdrawal of earlier steps) at intermediate temperatures. The brackets are independent: they
 * are bisected in parallel (the common fork-join pool), each the same way whatever the number of
 * threads, and a probe that two brackets share (an element's onset is its first carrier's
 * appearance) is solved once.
 */
final class SequenceRefiner {
    private final EquilibriumSolver solver;
    private final SequenceSettings settings;
    /** Probes solved so far, by cold step, temperature and start (the same inputs give the same state). */
    private final Map<Probe, EquilibriumResult> probes = new ConcurrentHashMap<>();
    /** The states at the final midpoints of the brackets that report a host (50% points), by bracket. */
    private final Map<Integer, EquilibriumResult> hosts = new ConcurrentHashMap<>();

    private record Probe(SequenceStep cold, double tK, EquilibriumResult near) {
        @Override
        public boolean equals(Object o) {
            return o instanceof Probe p && p.cold == cold && Double.compare(p.tK, tK) == 0 && p.near == near;
        }

        @Override
        public int hashCode() {
            return 31 * (31 * System.identityHashCode(cold) + Double.hashCode(tK)) + System.identityHashCode(near);
        }
    }

    /** A phase appearing or vanishing between two grid steps, and the bracket that locates it. */
    private record PhaseChange(int phase, boolean appears, int bracket) {
    }

    /**
     * One bracket to bisect: between a warm step where the test fails and the next, colder, where it
     * holds; {@code host}: the state at the final midpoint is solved too (a 50% point's host phase).
     */
    private record Bracket(SequenceStep warm, SequenceStep cold, Predicate<EquilibriumResult> holds, boolean host) {
    }

    SequenceRefiner(EquilibriumSolver solver, SequenceSettings settings) {
        this.solver = solver;
        this.settings = settings;
    }

    /**
     * @param steps the grid steps, hottest first
     * @return every phase's appearance and (if it happens) disappearance, hottest appearance first,
     *         and each element's onset and 50% point
     */
    Refined refine(List<SequenceStep> steps) {
        ChemicalSystem sys = steps.get(0).result().system();
        List<Bracket> brackets = new ArrayList<>();
        List<PhaseChange> phaseChanges = phaseChanges(steps, sys, brackets);
        List<int[]> elementCrossings = new ArrayList<>();
        for (Element e : sys.elements()) {
            elementCrossings.add(crossings(e, steps, brackets));
        }
        double[] t = bisectAll(brackets);
        List<PhaseEvent> events = phaseEvents(steps, sys, phaseChanges, t);
        List<ElementCondensation> temps = new ArrayList<>();
        for (int j = 0; j < sys.elements().size(); j++) {
            temps.add(forElement(sys.elements().get(j), steps, elementCrossings.get(j), t));
        }
        return new Refined(events, temps);
    }

    /** @param events phase intervals @param temperatures per element, in the system's order */
    record Refined(List<PhaseEvent> events, List<ElementCondensation> temperatures) {
    }

    /** @return the phase changes between grid steps, hottest first, each with its bracket added */
    private static List<PhaseChange> phaseChanges(List<SequenceStep> steps, ChemicalSystem sys, List<Bracket> brackets) {
        List<PhaseChange> changes = new ArrayList<>();
        for (int i = 1; i < steps.size(); i++) {
            SequenceStep warm = steps.get(i - 1);
            SequenceStep cold = steps.get(i);
            for (int p = 1; p < sys.phaseCount(); p++) {
                boolean was = warm.result().phaseMoles(p) > 0;
                boolean is = cold.result().phaseMoles(p) > 0;
                final int ph = p;
                if (was != is) {
                    changes.add(new PhaseChange(p, is, brackets.size()));
                    brackets.add(new Bracket(warm, cold, is ? r -> r.phaseMoles(ph) > 0 : r -> r.phaseMoles(ph) <= 0, false));
                }
            }
        }
        return changes;
    }

    private static List<PhaseEvent> phaseEvents(List<SequenceStep> steps, ChemicalSystem sys, List<PhaseChange> changes,
                                                double[] t) {
        Map<Integer, Double> openSince = new LinkedHashMap<>();
        Map<Integer, Boolean> atStart = new LinkedHashMap<>();
        List<PhaseEvent> events = new ArrayList<>();
        for (int p : steps.get(0).result().presentCondensedPhases()) {
            openSince.put(p, steps.get(0).temperatureK());
            atStart.put(p, true);
        }
        for (PhaseChange c : changes) {
            int p = c.phase();
            if (c.appears()) {
                openSince.put(p, t[c.bracket()]);
                atStart.put(p, false);
            } else if (openSince.containsKey(p)) {
                events.add(new PhaseEvent(sys.phaseName(p), openSince.remove(p), OptionalDouble.of(t[c.bracket()]),
                        atStart.remove(p)));
            }
        }
        for (Map.Entry<Integer, Double> e : openSince.entrySet()) {
            events.add(new PhaseEvent(sys.phaseName(e.getKey()), e.getValue(), OptionalDouble.empty(), atStart.get(e.getKey())));
        }
        events.sort((a, b) -> Double.compare(b.appearK(), a.appearK()));
        return events;
    }

    /**
     * Finds the grid interval of e's onset and of its 50% point and adds their brackets.
     *
     * @return {onset bracket, 50% bracket}, each -1 if at the start or never
     */
    private static int[] crossings(Element e, List<SequenceStep> steps, List<Bracket> brackets) {
        int onset = steps.get(0).result().condensedMoles(e) > 0 ? -2 : -1;
        int half = steps.get(0).condensedFraction(e) >= 0.5 ? -2 : -1;
        for (int i = 1; i < steps.size() && (onset == -1 || half == -1); i++) {
            SequenceStep warm = steps.get(i - 1);
            SequenceStep cold = steps.get(i);
            if (onset == -1 && warm.condensedFraction(e) <= 0 && cold.condensedFraction(e) > 0) {
                onset = brackets.size();
                brackets.add(new Bracket(warm, cold, r -> fraction(r, cold, e) > 0, false));
            }
            if (half == -1 && warm.condensedFraction(e) < 0.5 && cold.condensedFraction(e) >= 0.5) {
                half = brackets.size();
                brackets.add(new Bracket(warm, cold, r -> fraction(r, cold, e) >= 0.5, true));
            }
        }
        return new int[] {onset, half};
    }

    private ElementCondensation forElement(Element e, List<SequenceStep> steps, int[] crossing, double[] t) {
        SequenceStep first = steps.get(0);
        OptionalDouble onset = crossing[0] == -2 ? OptionalDouble.of(first.temperatureK())
                : crossing[0] >= 0 ? OptionalDouble.of(t[crossing[0]]) : OptionalDouble.empty();
        OptionalDouble t50 = OptionalDouble.empty();
        String host = "";
        if (crossing[1] == -2) {
            t50 = OptionalDouble.of(first.temperatureK());
            host = host(first.result(), e);
        } else if (crossing[1] >= 0) {
            t50 = OptionalDouble.of(t[crossing[1]]);
            host = host(hosts.get(crossing[1]), e);
        }
        return new ElementCondensation(e, t50, host, onset);
    }

    /** Bisects every bracket (in parallel); a failure is rethrown as the first failing bracket's, in order. */
    private double[] bisectAll(List<Bracket> brackets) {
        Object[] out = java.util.stream.IntStream.range(0, brackets.size()).parallel().mapToObj(i -> {
            try {
                Bracket b = brackets.get(i);
                double mid = boundary(b);
                if (b.host) {
                    hosts.put(i, solveAt(b.cold, mid, b.cold.result()));
                }
                return (Object) mid;
            } catch (RuntimeException e) {
                return e;
            }
        }).toArray();
        double[] t = new double[out.length];
        for (int i = 0; i < out.length; i++) {
            if (out[i] instanceof RuntimeException e) {
                throw e;
            }
            t[i] = (Double) out[i];
        }
        return t;
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
    private double boundary(Bracket b) {
        double hi = b.warm.temperatureK();
        double lo = b.cold.temperatureK();
        EquilibriumResult near = b.cold.result();
        while (hi - lo > settings.refineK()) {
            double mid = 0.5 * (hi + lo);
            EquilibriumResult r = probe(b.cold, mid, near);
            if (b.holds.test(r)) {
                lo = mid;
                near = r;
            } else {
                hi = mid;
            }
        }
        return 0.5 * (hi + lo);
    }

    private EquilibriumResult probe(SequenceStep cold, double t, EquilibriumResult near) {
        return probes.computeIfAbsent(new Probe(cold, t, near), k -> solveAt(cold, t, near));
    }

    private EquilibriumResult solveAt(SequenceStep cold, double t, EquilibriumResult near) {
        EquilibriumProblem pr = cold.result().problem().at(t, settings.path().pressureBar(t));
        return solver.solve(pr, WarmStart.of(near));
    }
}
