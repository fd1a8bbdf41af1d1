package org.nebulith.report.sequence;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

import org.nebulith.condensation.CondensationSequence;
import org.nebulith.condensation.ElementCondensation;
import org.nebulith.condensation.PhaseEvent;
import org.nebulith.condensation.SequenceStep;
import org.nebulith.equilibrium.ChemicalSystem;
import org.nebulith.equilibrium.PhaseKind;
import org.nebulith.thermo.Element;
import org.nebulith.files.Table;
import org.nebulith.thermo.PhaseNames;
import org.nebulith.files.Table;

/**
 * The four tables of a sequence run. Layout of {@code sequence.csv}: one row per grid temperature
 * (wide format), {@code T_K,P_bar}, then for every condensed phase that is present at any grid
 * step, in order of first appearance on cooling, its amount in moles of formula units (as the
 * species is written; a solution counts the formula units of its end-members) per 1e6 atoms of
 * the normalising element (Si) of the input, and after a solution its end-members. In withdrawal
 * mode the withdrawn amounts follow, prefixed {@code withdrawn_}. Column names carry the
 * normalisation, e.g. {@code olivine.forsterite_per_1e6_Si}. Phases are named by
 * {@link PhaseNames#display} (spaces become {@code _} in column names); the data pieces of one pure
 * phase (FeS(a), FeS(b), FeS(c): troilite) share one column. The tables of phases keep the raw ids in
 * a {@code data_id} column.
 */
public final class SequenceTables {
    /** File names. */
    public static final String SEQUENCE = "sequence.csv";
    /** File name of the element fractions. */
    public static final String FRACTIONS = "element-fractions.csv";
    /** File name of the condensation temperatures. */
    public static final String TEMPERATURES = "condensation-temperatures.csv";
    /** File name of the phase appearance table. */
    public static final String APPEARANCE = "phase-appearance.csv";
    /** Prefix of the withdrawn-amount columns. */
    public static final String WITHDRAWN = "withdrawn_";

    private final CondensationSequence seq;
    private final ChemicalSystem sys;
    private final Element norm;
    private final double perNorm;

    /** @param seq a computed sequence */
    public SequenceTables(CondensationSequence seq) {
        this.seq = seq;
        this.sys = seq.system();
        this.norm = normalisingElement(sys);
        this.perNorm = 1e6 / seq.inputTotals()[sys.elementIndex(norm)];
    }

    /** @param sys a system @return Si if present, else H, else the first element */
    public static Element normalisingElement(ChemicalSystem sys) {
        if (sys.elementIndex(Element.Si) >= 0) {
            return Element.Si;
        }
        return sys.elementIndex(Element.H) >= 0 ? Element.H : sys.elements().get(0);
    }

    /** @return the normalising element */
    public Element normalisingElement() {
        return norm;
    }

    /** @return the column suffix of the amounts, e.g. {@code _per_1e6_Si} */
    public String amountSuffix() {
        return "_per_1e6_" + norm.symbol();
    }

    /** @return condensed phases present at any grid step, in order of first appearance */
    public List<Integer> phasesShown() {
        Set<Integer> order = new LinkedHashSet<>();
        for (SequenceStep s : seq.steps()) {
            for (int p : s.result().presentCondensedPhases()) {
                order.add(p);
            }
            if (seq.settings().isFractional()) {
                for (int p = 1; p < sys.phaseCount(); p++) {
                    if (withdrawnPhase(s, p) > 0) {
                        order.add(p);
                    }
                }
            }
        }
        return new ArrayList<>(order);
    }

    /**
     * The shown phases under their display names: a pure phase's data pieces of the same formula
     * form one group; a solution is a group of its own.
     *
     * @return display name to the phase indices shown under it, in order of first appearance
     */
    public Map<String, List<Integer>> shownGroups() {
        Map<String, List<Integer>> groups = new LinkedHashMap<>();
        for (int p : phasesShown()) {
            String name = PhaseNames.display(sys.phaseName(p));
            List<Integer> g = groups.get(name);
            if (g != null && !mergeable(g.get(0), p)) {
                name = name + " [" + sys.phaseName(p) + "]";
                g = groups.get(name);
            }
            groups.computeIfAbsent(name, k -> new ArrayList<>()).add(p);
        }
        return groups;
    }

    private boolean mergeable(int p, int q) {
        return sys.phaseKind(p) == PhaseKind.PURE && sys.phaseKind(q) == PhaseKind.PURE
                && Arrays.equals(sys.memberStoichiometry(p, 0), sys.memberStoichiometry(q, 0));
    }

    /** @param name a display name @return its column stem: spaces become underscores */
    public static String columnStem(String name) {
        return name.replace(' ', '_');
    }

    /**
     * @param name   a group's display name
     * @param phases its phases
     * @return its column names: the phase, then end-members of a solution
     */
    private List<String> amountColumns(String name, List<Integer> phases) {
        List<String> c = new ArrayList<>();
        c.add(columnStem(name) + amountSuffix());
        int p = phases.get(0);
        if (sys.phaseKind(p) == PhaseKind.SOLUTION) {
            for (String m : sys.memberNames(p)) {
                c.add(columnStem(name) + "." + columnStem(PhaseNames.display(m)) + amountSuffix());
            }
        }
        return c;
    }

    /** @return {@code sequence.csv} */
    public Table sequence() {
        Map<String, List<Integer>> groups = shownGroups();
        boolean iso = seq.settings().isFractional();
        List<String> cols = new ArrayList<>(List.of("T_K", "P_bar"));
        groups.forEach((name, g) -> cols.addAll(amountColumns(name, g)));
        if (iso) {
            groups.forEach((name, g) -> amountColumns(name, g).forEach(c -> cols.add(WITHDRAWN + c)));
        }
        Table t = Table.withColumns(SEQUENCE, cols);
        for (SequenceStep s : seq.steps()) {
            List<Object> row = new ArrayList<>(List.of(s.temperatureK(), s.pressureBar()));
            groups.values().forEach(g -> addAmounts(row, g, s, false));
            if (iso) {
                groups.values().forEach(g -> addAmounts(row, g, s, true));
            }
            t.row(row);
        }
        return t;
    }

    private void addAmounts(List<Object> row, List<Integer> group, SequenceStep s, boolean withdrawn) {
        double total = 0;
        for (int p : group) {
            total += withdrawn ? withdrawnPhase(s, p) : s.result().phaseMoles(p);
        }
        row.add(total * perNorm);
        int p = group.get(0);
        if (sys.phaseKind(p) == PhaseKind.SOLUTION) {
            for (int k = 0; k < sys.memberNames(p).size(); k++) {
                double n = withdrawn ? s.withdrawnMoles(p, k) : s.result().memberMoles(p, k);
                row.add(n * perNorm);
            }
        }
    }

    private double withdrawnPhase(SequenceStep s, int p) {
        double sum = 0;
        for (int k = 0; k < sys.memberNames(p).size(); k++) {
            sum += s.withdrawnMoles(p, k);
        }
        return sum;
    }

    /** @param e an element @return its column in {@code element-fractions.csv} */
    public static String fractionColumn(Element e) {
        return e.symbol() + "_condensed_fraction";
    }

    /** @return {@code element-fractions.csv}: fraction of each element's input that is condensed (reacting or withdrawn) */
    public Table elementFractions() {
        List<String> cols = new ArrayList<>(List.of("T_K", "P_bar"));
        sys.elements().forEach(e -> cols.add(fractionColumn(e)));
        Table t = Table.withColumns(FRACTIONS, cols);
        for (SequenceStep s : seq.steps()) {
            List<Object> row = new ArrayList<>(List.of(s.temperatureK(), s.pressureBar()));
            sys.elements().forEach(e -> row.add(s.condensedFraction(e)));
            t.row(row);
        }
        return t;
    }

    /** @return {@code condensation-temperatures.csv}; empty cells where a temperature is not reached */
    public Table condensationTemperatures() {
        Table t = Table.withColumns(TEMPERATURES, "element", "T50_K", "host_phase", "T_onset_K",
                "condensed_fraction_at_T_min", "host_data_id");
        SequenceStep last = seq.steps().get(seq.steps().size() - 1);
        for (ElementCondensation ec : seq.condensationTemperatures()) {
            t.row(ec.element().symbol(), ec.t50K().isPresent() ? bracket(ec.t50K().getAsDouble()) : null,
                    ec.hostPhase().isEmpty() ? null : PhaseNames.display(ec.hostPhase()),
                    ec.onsetK().isPresent() ? bracket(ec.onsetK().getAsDouble()) : null, last.condensedFraction(ec.element()),
                    ec.hostPhase().isEmpty() ? null : ec.hostPhase());
        }
        return t;
    }

    /**
     * @param kelvin a temperature found by bisection
     * @return it rounded to the decimals of the bisection bracket (its resolution)
     */
    private double bracket(double kelvin) {
        return Double.parseDouble(org.nebulith.format.Decimal.toResolution(kelvin, seq.settings().refineK()));
    }

    /**
     * @return {@code phase-appearance.csv}, in order of appearance; a phase that returns has two rows;
     *         the intervals of a phase's data pieces that meet (one ends where the next begins, within
     *         the refinement bracket) are one interval, with the pieces' ids joined by {@code +} in
     *         {@code data_id}
     */
    public Table phaseAppearance() {
        Table t = Table.withColumns(APPEARANCE, "phase", "kind", "T_appear_K", "T_disappear_K", "present_at_T_max",
                "data_id");
        for (MergedEvent ev : mergedEvents()) {
            int p = sys.phaseIndex(ev.ids().get(0));
            t.row(ev.name(), sys.phaseKind(p).name().toLowerCase(java.util.Locale.ROOT), ev.appearK(),
                    Double.isNaN(ev.disappearK()) ? null : ev.disappearK(), ev.presentAtStart(),
                    PhaseNames.dataIdCell(ev.ids()));
        }
        return t;
    }

    /** One interval of a displayed phase: display name, data ids, appearance and disappearance [K] (NaN: stays). */
    private record MergedEvent(String name, List<String> ids, double appearK, double disappearK,
                               boolean presentAtStart) {
    }

    private List<MergedEvent> mergedEvents() {
        double tol = 2 * seq.settings().refineK() + 1e-9;
        List<MergedEvent> out = new ArrayList<>();
        for (PhaseEvent ev : seq.phaseEvents()) {
            String name = PhaseNames.display(ev.phase());
            double off = ev.disappearK().isPresent() ? ev.disappearK().getAsDouble() : Double.NaN;
            int joined = -1;
            for (int i = 0; i < out.size() && joined < 0; i++) {
                MergedEvent m = out.get(i);
                boolean samePhase = m.name().equals(name)
                        && mergeable(sys.phaseIndex(m.ids().get(0)), sys.phaseIndex(ev.phase()));
                if (samePhase && !Double.isNaN(m.disappearK()) && Math.abs(m.disappearK() - ev.appearK()) <= tol) {
                    joined = i;
                }
            }
            if (joined < 0) {
                out.add(new MergedEvent(name, List.of(ev.phase()), ev.appearK(), off, ev.presentAtStart()));
            } else {
                MergedEvent m = out.get(joined);
                List<String> ids = new ArrayList<>(m.ids());
                if (!ids.contains(ev.phase())) {
                    ids.add(ev.phase());
                }
                out.set(joined, new MergedEvent(name, List.copyOf(ids), m.appearK(), off, m.presentAtStart()));
            }
        }
        return out;
    }
}
