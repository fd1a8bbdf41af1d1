package org.nebulith.report.sequence;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;

import org.nebulith.condensation.CondensationSequence;
import org.nebulith.condensation.ElementCondensation;
import org.nebulith.condensation.SequenceStep;
import org.nebulith.equilibrium.ChemicalSystem;
import org.nebulith.format.Decimal;
import org.nebulith.progress.Alongside;
import org.nebulith.report.PhaseLabels;
import org.nebulith.files.RunFolder;
import org.nebulith.report.chart.ChartFormat;
import org.nebulith.report.chart.ChartRenderer;
import org.nebulith.report.chart.ChartSize;
import org.nebulith.report.chart.CondensationCurves;
import org.nebulith.report.chart.Curve;
import org.nebulith.report.chart.PhaseAssemblage;
import org.nebulith.thermo.Element;

/**
 * The charts of a sequence run: condensation curves (fraction of each rock-forming element condensed
 * against T, T50 marked) and the phase assemblage (mass share of each phase in the condensate
 * against T; in a fractional run the condensate is everything condensed so far, withdrawn and still
 * reacting), as PNG, SVG and PDF.
 */
public final class SequenceCharts {
    /** Elements shown in the condensation curves, when present in the system. */
    static final List<Element> SHOWN = List.of(Element.Al, Element.Ti, Element.Ca, Element.Mg, Element.Si,
            Element.Fe, Element.Ni, Element.Cr, Element.Na, Element.K, Element.P, Element.S, Element.Mn);
    /** Phases whose share of the condensate never reaches this [wt%] are drawn summed as "other". */
    public static final double OTHER_BELOW_WT_PCT = 0.5;

    private SequenceCharts() {
    }

    /** The rendered charts. */
    public record Charts(ChartRenderer.Rendered curves, ChartRenderer.Rendered assemblage, String assemblageCaption) {
        /** @return the file names written */
        public List<String> files() {
            List<String> f = new ArrayList<>();
            for (ChartRenderer.Rendered r : List.of(curves, assemblage)) {
                r.files().values().forEach(p -> f.add(p.getFileName().toString()));
            }
            return f;
        }
    }

    /**
     * @param run          the open run folder
     * @param seq          the sequence
     * @param tables       its tables
     * @param pressureNote pressure shown in the curves' corner
     * @return the charts written
     */
    public static Charts write(RunFolder run, CondensationSequence seq, SequenceTables tables, String pressureNote) {
        double[] t = temperatures(seq);
        List<String> notes = notes(seq, pressureNote);
        List<Element> shown = shown(seq);
        Alongside<ChartRenderer.Rendered> curves = Alongside.start("condensation curves", () ->
                ChartRenderer.write(new CondensationCurves(t, curves(seq, shown), t50(seq, shown), notes)
                        .chart(ChartSize.COLUMN_TALL), run, "condensation-curves", EnumSet.allOf(ChartFormat.class)));
        Assemblage a = assemblage(seq);
        ChartRenderer.Rendered[] assemblage = new ChartRenderer.Rendered[1];
        ChartRenderer.Rendered c = curves.joinAfter(() -> assemblage[0] = ChartRenderer.write(new PhaseAssemblage(t,
                a.curves(), "Share of the condensate [wt%]", notes).chart(ChartSize.PAGE), run, "phase-assemblage",
                EnumSet.allOf(ChartFormat.class)));
        return new Charts(c, assemblage[0], caption(seq, a));
    }

    private static List<String> notes(CondensationSequence seq, String pressureNote) {
        List<String> n = new ArrayList<>();
        if (pressureNote != null && !pressureNote.isBlank()) {
            n.add(pressureNote);
        }
        n.add(seq.settings().isFractional() ? "removal fraction " + Decimal.format(seq.settings().removalFraction())
                : "equilibrium condensation");
        return n;
    }

    private static String caption(CondensationSequence seq, Assemblage a) {
        String what = seq.settings().isFractional()
                ? "everything condensed so far: solids withdrawn from reaction plus those still reacting"
                : "all condensed phases in equilibrium with the gas";
        return "Mass share of each condensed phase in the condensate (" + what + ") against temperature, log scale "
                + "from " + Decimal.format(PhaseAssemblage.AXIS_FLOOR) + " wt%. Polymorphs of one phase are summed"
                + (a.grouped() > 0 ? "; " + a.grouped() + " phases that never reach " + Decimal.format(OTHER_BELOW_WT_PCT)
                        + " wt% are summed as \"other\"" : "")
                + ".";
    }

    private static double[] temperatures(CondensationSequence seq) {
        double[] t = new double[seq.steps().size()];
        for (int i = 0; i < t.length; i++) {
            t[i] = seq.steps().get(i).temperatureK();
        }
        return t;
    }

    private static List<Element> shown(CondensationSequence seq) {
        List<Element> out = new ArrayList<>();
        for (Element e : SHOWN) {
            if (seq.system().elementIndex(e) >= 0) {
                out.add(e);
            }
        }
        return out;
    }

    private static List<Curve> curves(CondensationSequence seq, List<Element> shown) {
        List<Curve> out = new ArrayList<>();
        for (Element e : shown) {
            double[] f = new double[seq.steps().size()];
            for (int i = 0; i < f.length; i++) {
                f[i] = Math.min(1, Math.max(0, seq.steps().get(i).condensedFraction(e)));
            }
            out.add(new Curve(e.symbol(), f));
        }
        return out;
    }

    private static double[] t50(CondensationSequence seq, List<Element> shown) {
        double[] t = new double[shown.size()];
        for (int i = 0; i < t.length; i++) {
            t[i] = Double.NaN;
            for (ElementCondensation ec : seq.condensationTemperatures()) {
                OptionalDouble v = ec.t50K();
                if (ec.element() == shown.get(i) && v.isPresent()) {
                    t[i] = v.getAsDouble();
                }
            }
        }
        return t;
    }

    /** @param curves the phase curves drawn @param grouped how many phases were summed as "other" */
    record Assemblage(List<Curve> curves, int grouped) {
    }

    /** Mass share [wt%] of each phase (polymorphs summed) in the condensate, at each step. */
    static Assemblage assemblage(CondensationSequence seq) {
        ChemicalSystem sys = seq.system();
        int n = seq.steps().size();
        Map<String, double[]> mass = new LinkedHashMap<>();
        double[] total = new double[n];
        double[][] molar = molarMasses(sys);
        String[] labels = new String[sys.phaseCount()];
        for (int p = 1; p < labels.length; p++) {
            labels[p] = PhaseLabels.display(sys.phaseName(p));
        }
        for (int i = 0; i < n; i++) {
            SequenceStep s = seq.steps().get(i);
            for (int p = 1; p < sys.phaseCount(); p++) {
                for (int k = 0; k < molar[p].length; k++) {
                    double g = s.totalMoles(p, k) * molar[p][k];
                    if (g > 0) {
                        mass.computeIfAbsent(labels[p], x -> new double[n])[i] += g;
                        total[i] += g;
                    }
                }
            }
        }
        List<Curve> major = new ArrayList<>();
        double[] other = new double[n];
        int grouped = 0;
        for (Map.Entry<String, double[]> e : mass.entrySet()) {
            double[] share = new double[n];
            double peak = 0;
            for (int i = 0; i < n; i++) {
                share[i] = total[i] > 0 && e.getValue()[i] > 0 ? 100 * e.getValue()[i] / total[i] : Double.NaN;
                peak = Double.isNaN(share[i]) ? peak : Math.max(peak, share[i]);
            }
            if (peak >= OTHER_BELOW_WT_PCT) {
                major.add(new Curve(e.getKey(), share));
            } else {
                grouped++;
                for (int i = 0; i < n; i++) {
                    other[i] += Double.isNaN(share[i]) ? 0 : share[i];
                }
            }
        }
        if (grouped > 0) {
            for (int i = 0; i < n; i++) {
                other[i] = other[i] > 0 ? other[i] : Double.NaN;
            }
            major.add(new Curve("other (" + grouped + " phases, each < " + Decimal.format(OTHER_BELOW_WT_PCT)
                    + " wt%)", other));
        }
        return new Assemblage(major, grouped);
    }

    /** @return the molar mass of every member of every phase [g/mol], by phase and member */
    private static double[][] molarMasses(ChemicalSystem sys) {
        List<org.nebulith.thermo.Element> elements = sys.elements();
        double[][] out = new double[sys.phaseCount()][];
        for (int p = 0; p < out.length; p++) {
            out[p] = new double[sys.memberNames(p).size()];
            for (int k = 0; k < out[p].length; k++) {
                double[] stoich = sys.memberStoichiometry(p, k);
                for (int j = 0; j < stoich.length; j++) {
                    out[p][k] += stoich[j] * elements.get(j).atomicWeight();
                }
            }
        }
        return out;
    }
}
