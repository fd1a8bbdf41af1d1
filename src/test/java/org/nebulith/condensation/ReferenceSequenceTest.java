package org.nebulith.condensation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStreamReader;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.nebulith.composition.AbundancePresets;
import org.nebulith.composition.ElementAbundances;
import org.nebulith.equilibrium.ChemicalSystem;
import org.nebulith.equilibrium.EquilibriumSolver;
import org.nebulith.equilibrium.SystemSpec;
import org.nebulith.thermo.DataSet;
import org.nebulith.thermo.Element;

/**
 * The pure-phase condensation sequence against the independent reference of the test resources
 * ({@code src/test/resources/reference-sequence/README.md}: a separate Gibbs minimisation on the
 * same data, data set {@code reference-pure}): the 17 elements of Lodders (2003, Table 2)
 * proto-solar gas, 1e-3 bar, 2000 to 400 K in 5 K steps, boundaries bisected to 0.05 K. Every
 * phase must appear and vanish at the reference temperatures within 0.5 K, and every 50%
 * condensation temperature must agree within 0.5 K with the same host phase.
 */
class ReferenceSequenceTest {
    static final String FOLDER = "/reference-sequence/";
    static final double TOLERANCE_K = 0.5;
    static final Set<Element> ELEMENTS = EnumSet.of(Element.H, Element.He, Element.C, Element.N, Element.O,
            Element.Na, Element.Mg, Element.Al, Element.Si, Element.P, Element.S, Element.K, Element.Ca, Element.Ti,
            Element.Cr, Element.Fe, Element.Ni);

    private static CondensationSequence sequence;

    @BeforeAll
    static void run() {
        ElementAbundances gas = AbundancePresets.preset(AbundancePresets.PROTOSOLAR_LODDERS2003).abundances()
                .restrictedTo(ELEMENTS).perH();
        ChemicalSystem sys = SystemSpec.pure(DataSet.REFERENCE_PURE).build(ELEMENTS);
        double[] totals = new double[sys.elementCount()];
        for (int j = 0; j < totals.length; j++) {
            totals[j] = gas.moles(sys.elements().get(j));
        }
        SequenceSettings settings = new SequenceSettings(PressurePath.constant(1e-3), 2000, 400, 5, 0, 0.05);
        sequence = new SequenceRunner(new EquilibriumSolver()).run(sys, totals, settings);
    }

    /** Every state of the sequence is an equilibrium by the test side's own check (not the solver's). */
    @Test
    void everyStepPassesTheIndependentCheck() {
        org.nebulith.equilibrium.IndependentCheck check =
                new org.nebulith.equilibrium.IndependentCheck(SystemSpec.pure(DataSet.REFERENCE_PURE));
        List<String> bad = new ArrayList<>();
        for (org.nebulith.condensation.SequenceStep step : sequence.steps()) {
            String f = check.check(step.result()).failure();
            if (f != null) {
                bad.add(step.temperatureK() + " K: " + f);
            }
        }
        assertTrue(sequence.steps().size() > 300, "steps: " + sequence.steps().size());
        assertTrue(bad.isEmpty(), String.join("; ", bad));
    }

    private static List<CSVRecord> records(String name) throws IOException {
        try (Reader in = new InputStreamReader(ReferenceSequenceTest.class.getResourceAsStream(FOLDER + name),
                StandardCharsets.UTF_8)) {
            return CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get().parse(in).getRecords();
        }
    }

    @Test
    void phasesAppearAndVanishAtTheReferenceTemperatures() throws IOException {
        List<PhaseEvent> ours = new ArrayList<>(sequence.phaseEvents());
        List<String> problems = new ArrayList<>();
        int compared = 0;
        double worst = 0;
        for (CSVRecord ref : records("phase-appearance.csv")) {
            String phase = ref.get("phase");
            if (phase.startsWith("[group]")) {
                continue;
            }
            double appear = Double.parseDouble(ref.get("T_appear_K"));
            String gone = ref.get("T_disappear_K");
            PhaseEvent match = null;
            for (PhaseEvent e : ours) {
                if (e.phase().equals(phase) && Math.abs(e.appearK() - appear) <= TOLERANCE_K) {
                    match = e;
                    break;
                }
            }
            if (match == null) {
                problems.add(String.format(Locale.ROOT, "%s appearing at %.2f K: no such event", phase, appear));
                continue;
            }
            ours.remove(match);
            compared++;
            worst = Math.max(worst, Math.abs(match.appearK() - appear));
            if (gone.isEmpty()) {
                if (match.disappearK().isPresent()) {
                    problems.add(phase + " vanishes at " + match.disappearK().getAsDouble() + " K, reference: stays");
                }
            } else if (match.disappearK().isEmpty()) {
                problems.add(phase + " stays, reference: vanishes at " + gone + " K");
            } else {
                double d = Math.abs(match.disappearK().getAsDouble() - Double.parseDouble(gone));
                worst = Math.max(worst, d);
                if (d > TOLERANCE_K) {
                    problems.add(String.format(Locale.ROOT, "%s vanishes at %.2f K, reference %s K", phase,
                            match.disappearK().getAsDouble(), gone));
                }
            }
        }
        for (PhaseEvent extra : ours) {
            problems.add(String.format(Locale.ROOT, "%s appears at %.2f K, not in the reference", extra.phase(),
                    extra.appearK()));
        }
        System.out.printf(Locale.ROOT, "reference sequence: %d phase intervals, largest difference %.3f K%n", compared,
                worst);
        assertTrue(compared >= 30, "compared " + compared + " intervals");
        assertTrue(problems.isEmpty(), String.join("; ", problems));
    }

    @Test
    void fiftyPercentTemperaturesMatchTheReference() throws IOException {
        List<String> problems = new ArrayList<>();
        double worst = 0;
        List<CSVRecord> refs = records("condensation-temperatures.csv");
        for (CSVRecord ref : refs) {
            Element el = Element.fromSymbol(ref.get("element"));
            double t50 = Double.parseDouble(ref.get("T50_K"));
            ElementCondensation ours = sequence.condensationTemperatures().stream().filter(c -> c.element() == el)
                    .findFirst().orElseThrow();
            if (ours.t50K().isEmpty()) {
                problems.add(el + ": no 50% point, reference " + t50 + " K");
                continue;
            }
            double d = Math.abs(ours.t50K().getAsDouble() - t50);
            worst = Math.max(worst, d);
            if (d > TOLERANCE_K || !ours.hostPhase().equals(ref.get("host_phase"))) {
                problems.add(String.format(Locale.ROOT, "%s: T50 %.2f K in %s, reference %.2f K in %s", el,
                        ours.t50K().getAsDouble(), ours.hostPhase(), t50, ref.get("host_phase")));
            }
        }
        System.out.printf(Locale.ROOT, "reference sequence: %d T50 values, largest difference %.3f K%n", refs.size(), worst);
        assertEquals(12, refs.size());
        assertTrue(problems.isEmpty(), String.join("; ", problems));
    }
}
