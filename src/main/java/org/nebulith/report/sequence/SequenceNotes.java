package org.nebulith.report.sequence;

import java.util.List;
import java.util.Locale;

import org.nebulith.condensation.CondensationSequence;
import org.nebulith.condensation.ElementCondensation;
import org.nebulith.condensation.SequenceSettings;
import org.nebulith.condensation.SequenceStep;
import org.nebulith.equilibrium.EquilibriumResult;
import org.nebulith.format.Decimal;
import org.nebulith.files.RunInputs;

/**
 * The {@code run-notes.md} of a sequence run: settings with their origin, composition and data
 * sources, input checksums, the solver's checks over the run, the 50% temperatures, the files
 * written and the cautions.
 */
public final class SequenceNotes {
    /** File name. */
    public static final String FILE = "run-notes.md";

    /**
     * What the notes describe besides the sequence itself.
     *
     * @param toolVersion  tool version
     * @param started      start time (ISO-8601)
     * @param elapsedS     wall time of the computation [s]
     * @param settings     effective settings, one "key = value (origin)" line each
     * @param composition  the composition and its provenance lines
     * @param data         data set, variants and solutions, one line
     * @param pressure     the pressure or path, one line
     * @param inputs       registered input files
     * @param cautions     the cautions ({@link SequenceCautions})
     * @param chartsNote   what was done about charts
     */
    public record Context(String toolVersion, String started, double elapsedS, List<String> settings,
                          List<String> composition, String data, String pressure, RunInputs inputs,
                          List<String> cautions, String chartsNote) {
    }

    private SequenceNotes() {
    }

    /**
     * @param seq    the sequence
     * @param tables its tables
     * @param c      the run context
     * @return the Markdown text
     */
    public static String text(CondensationSequence seq, SequenceTables tables, Context c) {
        StringBuilder b = new StringBuilder("# Condensation sequence: run notes\n\n");
        SequenceSettings s = seq.settings();
        b.append("Nebulith ").append(c.toolVersion()).append(", started ").append(c.started()).append(", computed in ")
                .append(String.format(Locale.ROOT, "%.2f", c.elapsedS())).append(" s.\n\n");
        b.append("## Model\n\n");
        b.append("- Mode: ").append(mode(s)).append('\n');
        b.append("- Temperature grid: ").append(num(s.tMaxK())).append(" K down to ").append(num(s.tMinK()))
                .append(" K in steps of ").append(num(s.tStepK())).append(" K (").append(seq.steps().size())
                .append(" states); phase boundaries, onsets and 50% points bisected to a ").append(num(s.refineK()))
                .append(" K bracket (midpoint reported)\n");
        b.append("- Pressure: ").append(c.pressure()).append('\n');
        b.append("- Data: ").append(c.data()).append('\n');
        b.append("- Composition: ").append(String.join(" ", c.composition())).append('\n');
        b.append("- Amounts in sequence.csv: moles of formula units (as each species is written) per 1e6 ")
                .append(tables.normalisingElement().symbol()).append(" atoms of the input")
                .append(s.isFractional() ? "; withdrawn_ columns hold the solids removed from reaction so far" : "")
                .append('\n');
        appendChecks(b, seq);
        appendTemperatures(b, seq);
        b.append("\n## Cautions\n\n");
        c.cautions().forEach(x -> b.append("- ").append(x).append('\n'));
        b.append("\n## Files\n\n");
        b.append("- `").append(SequenceTables.SEQUENCE).append("`: amount of every condensed phase (and solution end-member) per T\n");
        b.append("- `").append(SequenceTables.FRACTIONS).append("`: fraction of each element condensed per T\n");
        b.append("- `").append(SequenceTables.TEMPERATURES).append("`: 50% and onset temperatures, host phase at T50\n");
        b.append("- `").append(SequenceTables.APPEARANCE).append("`: where each phase appears and disappears on cooling\n");
        b.append("- ").append(c.chartsNote()).append('\n');
        b.append("\n## Settings\n\n");
        c.settings().forEach(x -> b.append("- ").append(x).append('\n'));
        b.append("\n## Inputs\n\n");
        if (c.inputs().files().isEmpty()) {
            b.append("- none besides the built-in presets and data\n");
        }
        for (RunInputs.InputFile f : c.inputs().files()) {
            b.append("- ").append(f.role()).append(": `").append(f.path()).append("`, ").append(f.bytes())
                    .append(" bytes, SHA-256 ").append(f.sha256()).append('\n');
        }
        return b.toString();
    }

    private static String mode(SequenceSettings s) {
        if (!s.isFractional()) {
            return "equilibrium (removal fraction 0: all condensates keep reacting with the gas)";
        }
        return "removal fraction " + num(s.removalFraction()) + " (that fraction of each step's new condensate is withdrawn "
                + "from further reaction" + (s.removalFraction() == 1 ? "; fully fractional condensation" : "") + ")";
    }

    private static void appendChecks(StringBuilder b, CondensationSequence seq) {
        double worst = 0;
        int cold = 0;
        int excluded = 0;
        for (SequenceStep st : seq.steps()) {
            EquilibriumResult.Diagnostics d = st.result().diagnostics();
            worst = Math.max(worst, d.maxBalanceError());
            cold += d.coldStart() ? 1 : 0;
            excluded += d.excludedGasSpecies() > 0 ? 1 : 0;
        }
        b.append("\n## Checks\n\n");
        b.append("- Largest relative element-balance error of a state: ").append(sci(worst)).append('\n');
        b.append("- States solved from a cold start (warm start failed or first state): ").append(cold).append('\n');
        b.append("- States with gas species left out because T is outside their data: ").append(excluded).append('\n');
        if (seq.settings().isFractional()) {
            double floor = 0;
            double[] add = seq.floorAddedMoles();
            double[] in = seq.inputTotals();
            for (int j = 0; j < add.length; j++) {
                floor = Math.max(floor, add[j] / in[j]);
            }
            b.append("- Largest amount added to keep a reacting total at " + sci(org.nebulith.condensation.SequenceRunner.REACTING_FLOOR) + " of its input, relative to the input: ")
                    .append(sci(floor)).append('\n');
        }
    }

    private static void appendTemperatures(StringBuilder b, CondensationSequence seq) {
        b.append("\n## 50% condensation temperatures\n\n| element | T50 (K) | host phase at T50 | onset (K) |\n|---|---|---|---|\n");
        for (ElementCondensation ec : seq.condensationTemperatures()) {
            if (ec.onsetK().isEmpty()) {
                continue;
            }
            b.append("| ").append(ec.element().symbol()).append(" | ")
                    .append(ec.t50K().isPresent() ? String.format(Locale.ROOT, "%.1f", ec.t50K().getAsDouble()) : "not reached")
                    .append(" | ").append(ec.hostPhase().isEmpty() ? "" : org.nebulith.thermo.PhaseNames.display(ec.hostPhase())).append(" | ")
                    .append(String.format(Locale.ROOT, "%.1f", ec.onsetK().getAsDouble())).append(" |\n");
        }
    }

    private static String num(double x) {
        return Decimal.format(x);
    }

    private static String sci(double x) {
        return String.format(Locale.ROOT, "%.2e", x);
    }
}
