package org.nebulith.report.sequence;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Map;

import org.nebulith.condensation.CondensationSequence;
import org.nebulith.condensation.SequenceStep;
import org.nebulith.equilibrium.ChemicalSystem;
import org.nebulith.files.RunFolder;
import org.nebulith.report.chart.ChartFormat;
import org.nebulith.report.chart.ChartRenderer;
import org.nebulith.report.chart.ChartSize;
import org.nebulith.report.chart.CondensationCurves;
import org.nebulith.report.chart.Curve;
import org.nebulith.report.chart.PhaseAssemblage;
import org.nebulith.thermo.Element;

/**
 * The charts of a sequence run: condensation curves (fraction of each rock-forming element
 * condensed against T) and the phase assemblage (amount of each major phase against T, log scale),
 * as PNG, SVG and PDF.
 */
public final class SequenceCharts {
    /** Elements shown in the condensation curves, when present in the system. */
    static final List<Element> SHOWN = List.of(Element.Al, Element.Ti, Element.Ca, Element.Mg, Element.Si,
            Element.Fe, Element.Ni, Element.Cr, Element.Na, Element.K, Element.P, Element.S, Element.Mn);
    /** Largest number of phases drawn in the assemblage chart (the most abundant ones). */
    static final int MAX_PHASES = 12;

    private SequenceCharts() {
    }

    /** The rendered charts. */
    public record Charts(ChartRenderer.Rendered curves, ChartRenderer.Rendered assemblage) {
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
     * @param run    the open run folder
     * @param seq    the sequence
     * @param tables its tables
     * @param pressureNote pressure shown in the curves' corner
     * @return the charts written
     */
    public static Charts write(RunFolder run, CondensationSequence seq, SequenceTables tables, String pressureNote) {
        double[] t = temperatures(seq);
        ChartRenderer.Rendered curves = ChartRenderer.write(new CondensationCurves(t, curves(seq), pressureNote)
                .chart(ChartSize.COLUMN_TALL), run, "condensation-curves", EnumSet.allOf(ChartFormat.class));
        ChartRenderer.Rendered assemblage = ChartRenderer.write(new PhaseAssemblage(t, phases(seq, tables),
                "mol per 10^6 " + tables.normalisingElement().symbol()).chart(ChartSize.COLUMN_TALL, true), run,
                "phase-assemblage", EnumSet.allOf(ChartFormat.class));
        return new Charts(curves, assemblage);
    }

    private static double[] temperatures(CondensationSequence seq) {
        double[] t = new double[seq.steps().size()];
        for (int i = 0; i < t.length; i++) {
            t[i] = seq.steps().get(i).temperatureK();
        }
        return t;
    }

    private static List<Curve> curves(CondensationSequence seq) {
        List<Curve> out = new ArrayList<>();
        for (Element e : SHOWN) {
            if (seq.system().elementIndex(e) < 0) {
                continue;
            }
            double[] f = new double[seq.steps().size()];
            for (int i = 0; i < f.length; i++) {
                f[i] = seq.steps().get(i).condensedFraction(e);
            }
            out.add(new Curve(e.symbol(), f));
        }
        return out;
    }

    private static List<Curve> phases(CondensationSequence seq, SequenceTables tables) {
        ChemicalSystem sys = seq.system();
        int norm = sys.elementIndex(tables.normalisingElement());
        double scale = 1e6 / seq.inputTotals()[norm];
        List<Curve> all = new ArrayList<>();
        List<Double> peaks = new ArrayList<>();
        for (Map.Entry<String, List<Integer>> group : tables.shownGroups().entrySet()) {
            double[] v = new double[seq.steps().size()];
            double peak = 0;
            for (int i = 0; i < v.length; i++) {
                SequenceStep s = seq.steps().get(i);
                double n = 0;
                for (int p : group.getValue()) {
                    for (int k = 0; k < sys.memberNames(p).size(); k++) {
                        n += s.result().memberMoles(p, k);
                    }
                }
                v[i] = n > 0 ? n * scale : Double.NaN;
                peak = Math.max(peak, n * scale);
            }
            all.add(new Curve(group.getKey(), v));
            peaks.add(peak);
        }
        List<Integer> order = new ArrayList<>();
        for (int i = 0; i < all.size(); i++) {
            order.add(i);
        }
        order.sort((a, b) -> Double.compare(peaks.get(b), peaks.get(a)));
        List<Curve> out = new ArrayList<>();
        for (int i = 0; i < Math.min(MAX_PHASES, order.size()); i++) {
            out.add(all.get(order.get(i)));
        }
        return out;
    }
}
