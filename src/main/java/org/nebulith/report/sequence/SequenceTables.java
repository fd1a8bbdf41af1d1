package org.nebulith.report.sequence;

import java.util.ArrayList;
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
import org.nebulith.report.Table;

/**
 * The four tables of a sequence run. Layout of {@code sequence.csv}: one row per grid temperature
 * (wide format), {@code T_K,P_bar}, then for every condensed phase that is present at any grid
 * step, in order of first appearance on cooling, its amount in moles of formula units (as the
 * species is written; a solution counts the formula units of its end-members) per 1e6 atoms of
 * the normalising element (Si) of the input, and after a solution its end-members. In isolation
 * mode the isolated amounts follow, prefixed {@code isolated_}. Column names carry the
 * normalisation, e.g. {@code olivine.forsterite_per_1e6_Si}.
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
    /** Prefix of the isolated-amount columns. */
    public static final String ISOLATED = "isolated_";

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
                    if (isolatedPhase(s, p) > 0) {
                        order.add(p);
                    }
                }
            }
        }
        return new ArrayList<>(order);
    }

    /** @param p phase @return its column names: the phase, then end-members of a solution */
    public List<String> amountColumns(int p) {
        List<String> c = new ArrayList<>();
        c.add(sys.phaseName(p) + amountSuffix());
        if (sys.phaseKind(p) == PhaseKind.SOLUTION) {
            for (String m : sys.memberNames(p)) {
                c.add(sys.phaseName(p) + "." + m + amountSuffix());
            }
        }
        return c;
    }

    /** @return {@code sequence.csv} */
    public Table sequence() {
        List<Integer> phases = phasesShown();
        boolean iso = seq.settings().isFractional();
        List<String> cols = new ArrayList<>(List.of("T_K", "P_bar"));
        phases.forEach(p -> cols.addAll(amountColumns(p)));
        if (iso) {
            phases.forEach(p -> amountColumns(p).forEach(c -> cols.add(ISOLATED + c)));
        }
        Table t = Table.withColumns(SEQUENCE, cols);
        for (SequenceStep s : seq.steps()) {
            List<Object> row = new ArrayList<>(List.of(s.temperatureK(), s.pressureBar()));
            phases.forEach(p -> addAmounts(row, p, s, false));
            if (iso) {
                phases.forEach(p -> addAmounts(row, p, s, true));
            }
            t.row(row);
        }
        return t;
    }

    private void addAmounts(List<Object> row, int p, SequenceStep s, boolean isolated) {
        double total = isolated ? isolatedPhase(s, p) : s.result().phaseMoles(p);
        row.add(total * perNorm);
        if (sys.phaseKind(p) == PhaseKind.SOLUTION) {
            for (int k = 0; k < sys.memberNames(p).size(); k++) {
                double n = isolated ? s.isolatedMoles(p, k) : s.result().memberMoles(p, k);
                row.add(n * perNorm);
            }
        }
    }

    private double isolatedPhase(SequenceStep s, int p) {
        double sum = 0;
        for (int k = 0; k < sys.memberNames(p).size(); k++) {
            sum += s.isolatedMoles(p, k);
        }
        return sum;
    }

    /** @param e an element @return its column in {@code element-fractions.csv} */
    public static String fractionColumn(Element e) {
        return e.symbol() + "_condensed_fraction";
    }

    /** @return {@code element-fractions.csv}: fraction of each element's input that is condensed (reacting or isolated) */
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
                "condensed_fraction_at_T_min");
        SequenceStep last = seq.steps().get(seq.steps().size() - 1);
        for (ElementCondensation ec : seq.condensationTemperatures()) {
            t.row(ec.element().symbol(), ec.t50K().isPresent() ? bracket(ec.t50K().getAsDouble()) : null,
                    ec.hostPhase().isEmpty() ? null : ec.hostPhase(),
                    ec.onsetK().isPresent() ? bracket(ec.onsetK().getAsDouble()) : null,
                    last.condensedFraction(ec.element()));
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

    /** @return {@code phase-appearance.csv}, in order of appearance; a phase that returns has two rows */
    public Table phaseAppearance() {
        Table t = Table.withColumns(APPEARANCE, "phase", "kind", "T_appear_K", "T_disappear_K", "present_at_T_max");
        for (PhaseEvent ev : seq.phaseEvents()) {
            int p = sys.phaseIndex(ev.phase());
            t.row(ev.phase(), sys.phaseKind(p).name().toLowerCase(java.util.Locale.ROOT), bracket(ev.appearK()),
                    ev.disappearK().isPresent() ? bracket(ev.disappearK().getAsDouble()) : null, ev.presentAtStart());
        }
        return t;
    }
}
