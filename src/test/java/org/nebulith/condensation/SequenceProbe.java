package org.nebulith.condensation;

import java.util.List;

import org.nebulith.equilibrium.ChemicalSystem;
import org.nebulith.thermo.Element;

/** Small queries on a sequence used by the tests. */
final class SequenceProbe {
    private SequenceProbe() {
    }

    /** @return first appearance [K] of the first phase matching one of the names, or -1 */
    static double firstAppearance(CondensationSequence seq, String... names) {
        List<String> n = List.of(names);
        return seq.phaseEvents().stream().filter(e -> n.contains(e.phase())).mapToDouble(PhaseEvent::appearK)
                .max().orElse(-1);
    }

    /** @return first appearance [K] of a phase made only of Fe and S, or -1 */
    static double sulfideAppearance(CondensationSequence seq) {
        ChemicalSystem sys = seq.system();
        return seq.phaseEvents().stream().filter(e -> madeOf(sys, sys.phaseIndex(e.phase()), Element.Fe, Element.S))
                .mapToDouble(PhaseEvent::appearK).max().orElse(-1);
    }

    /** @return true if every member of phase p contains only the given elements (and not none) */
    static boolean madeOf(ChemicalSystem sys, int p, Element... allowed) {
        List<Element> ok = List.of(allowed);
        for (int k = 0; k < sys.memberNames(p).size(); k++) {
            double[] a = sys.memberStoichiometry(p, k);
            for (int j = 0; j < a.length; j++) {
                if (a[j] != 0 && !ok.contains(sys.elements().get(j))) {
                    return false;
                }
            }
        }
        return true;
    }

    /** @return mass [g] of the named phases at the step (reacting plus withdrawn) */
    static double mass(SequenceStep s, List<String> phases) {
        ChemicalSystem sys = s.result().system();
        double m = 0;
        for (String name : phases) {
            int p = sys.phaseIndex(name);
            if (p < 0) {
                continue;
            }
            for (int k = 0; k < sys.memberNames(p).size(); k++) {
                double[] a = sys.memberStoichiometry(p, k);
                double w = 0;
                for (int j = 0; j < a.length; j++) {
                    w += a[j] * sys.elements().get(j).atomicWeight();
                }
                m += s.totalMoles(p, k) * w;
            }
        }
        return m;
    }

    /** @return the grid step nearest to T */
    static SequenceStep at(CondensationSequence seq, double tK) {
        SequenceStep best = seq.steps().get(0);
        for (SequenceStep s : seq.steps()) {
            if (Math.abs(s.temperatureK() - tK) < Math.abs(best.temperatureK() - tK)) {
                best = s;
            }
        }
        return best;
    }

    /** @return moles of member of a phase at the step (0 if the phase is not in the system) */
    static double member(SequenceStep s, String phase, String member) {
        ChemicalSystem sys = s.result().system();
        int p = sys.phaseIndex(phase);
        return p < 0 ? 0 : s.totalMoles(p, sys.memberNames(p).indexOf(member));
    }
}
