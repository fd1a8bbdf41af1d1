package org.nebulith.cli;

import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

import org.nebulith.composition.ElementAbundances;
import org.nebulith.condensation.CondensationSequence;
import org.nebulith.condensation.PressurePath;
import org.nebulith.condensation.PressurePathReader;
import org.nebulith.condensation.SequenceRunner;
import org.nebulith.condensation.SequenceSettings;
import org.nebulith.report.sequence.SequenceCautions;
import org.nebulith.report.sequence.SequenceCharts;
import org.nebulith.report.sequence.SequenceReport;
import org.nebulith.report.sequence.SequenceNotes;
import org.nebulith.report.sequence.SequenceTables;
import org.nebulith.equilibrium.ChemicalSystem;
import org.nebulith.equilibrium.ConvergenceException;
import org.nebulith.equilibrium.EquilibriumSolver;
import org.nebulith.equilibrium.SystemSpec;
import org.nebulith.errors.InputException;
import org.nebulith.errors.Messages;
import org.nebulith.errors.NumericalException;
import org.nebulith.format.Decimal;
import org.nebulith.report.RunFolder;
import org.nebulith.thermo.Element;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/**
 * {@code nebulith sequence}: the condensation sequence of a gas cooling at constant pressure or
 * along a P-T path, in equilibrium (default) or with a fraction of each step's condensates isolated.
 * Writes the four tables and the run notes into the run folder; prints the cautions on stderr.
 */
@Command(name = "sequence",
        description = {
            "Condensation sequence: what condenses, and when, as a gas cools.",
            "At fixed pressure or along a P-T path: phases against T, the fraction of each",
            "element condensed, 50%% condensation temperatures, phase appearance.",
            "Writes sequence.csv, element-fractions.csv, condensation-temperatures.csv,",
            "phase-appearance.csv and run-notes.md under --out (default reports/sequence/).",
        },
        footerHeading = "%nExamples:%n",
        footer = {
            "  nebulith sequence --composition protosolar-lodders2003 --P-bar 1e-4",
            "  nebulith sequence --P-bar 1e-3 --T-max-K 1800 --T-min-K 400 --T-step-K 2",
            "  nebulith sequence --isolation 1 --out reports/fractional     (fully fractional)",
            "  nebulith sequence --dust-enrichment 10 --variant B88 --out reports/dusty-B88",
            "  nebulith sequence --path my-path.csv --out reports/cooling-path",
            "      (path CSV header: T_K,P_bar; log-linear in P between rows, constant beyond)",
        })
public final class SequenceCommand extends RunCommand {

    /** Pressure used when neither --P-bar nor --path is given [bar]. */
    static final double DEFAULT_P_BAR = 1e-4;

    /** Most grid temperatures of one sequence (about a day of work at 10 ms a state). */
    static final int MAX_GRID_POINTS = 1_000_000;

    @Mixin
    private ChemistryOptions chemistry;

    @Option(names = "--P-bar", paramLabel = "P",
            description = "Constant total pressure [bar]. Default: 1e-4 (unless --path is given).")
    private Double pressureBar;

    @Option(names = "--path", paramLabel = "FILE",
            description = "P-T path CSV with the header T_K,P_bar (replaces --P-bar).")
    private Path pathFile;

    @Option(names = "--T-max-K", paramLabel = "T", defaultValue = "2000",
            description = "Starting (hottest) temperature [K]. Default: ${DEFAULT-VALUE}.")
    private double tMaxK;

    @Option(names = "--T-min-K", paramLabel = "T", defaultValue = "300",
            description = "Final temperature [K]. Default: ${DEFAULT-VALUE}.")
    private double tMinK;

    @Option(names = "--T-step-K", paramLabel = "DT", defaultValue = "1",
            description = "Grid step [K]; boundaries are bisected to 0.05 K anyway. Default: ${DEFAULT-VALUE}.")
    private double tStepK;

    @Option(names = "--isolation", paramLabel = "PHI", defaultValue = "0",
            description = "Fraction in [0, 1] of each step's new condensates removed from further reaction: "
                    + "0 = equilibrium condensation (default), 1 = fully fractional.")
    private double isolation;

    @Override
    protected int execute(final RunContext context) throws IOException {
        ElementAbundances comp = chemistry.composition(context);
        SystemSpec spec = chemistry.systemSpec(context);
        PressurePath path = pressurePath(context);
        SequenceSettings settings = settings(path);
        Set<Element> elements = ChemistryOptions.elementsOf(comp);
        Path folder;
        try (RunFolder run = context.openRunFolder("sequence")) {
            ChemicalSystem system = spec.build(elements);
            double[] totals = new double[system.elementCount()];
            for (int j = 0; j < totals.length; j++) {
                totals[j] = comp.moles(system.elements().get(j));
            }
            List<String> cautions = SequenceCautions.lines(spec.describe(),
                    SequenceCautions.gasesBelowDataRange(spec.species(), elements, tMinK));
            long t0 = System.nanoTime();
            CondensationSequence seq = run(system, totals, settings);
            double elapsed = (System.nanoTime() - t0) / 1e9;
            SequenceTables tables = new SequenceTables(seq);
            run.writeCsv(SequenceTables.SEQUENCE, tables.sequence());
            run.writeCsv(SequenceTables.FRACTIONS, tables.elementFractions());
            run.writeCsv(SequenceTables.TEMPERATURES, tables.condensationTemperatures());
            run.writeCsv(SequenceTables.APPEARANCE, tables.phaseAppearance());
            SequenceCharts.Charts charts = SequenceCharts.write(run, seq, tables, describe(path));
            String chartsNote = "Charts: " + String.join(", ", charts.files()) + "; report: report.html";
            run.writeText(SequenceNotes.FILE, SequenceNotes.text(seq, tables, new SequenceNotes.Context(
                    context.toolVersion(), context.started().toString(), elapsed, settingLines(context),
                    compositionLines(context), spec.describe(), describe(path), context.inputs(), cautions, chartsNote)));
            SequenceReport.write(run, seq, tables, charts, new SequenceReport.Meta(context.toolVersion(),
                    context.started(), chemistry.describeComposition(), spec.describe(), describe(path),
                    reportSettings(context), cautions, sources(context, spec, elements), context.inputs()));
            folder = run.commit();
            printCautions(context, cautions);
            context.info("sequence: " + seq.steps().size() + " states, " + seq.phaseEvents().size()
                    + " phase intervals, " + String.format(java.util.Locale.ROOT, "%.2f", elapsed) + " s; wrote "
                    + folder);
        }
        return ExitCodes.OK;
    }

    private static List<org.nebulith.report.html.Report.Setting> reportSettings(RunContext context) {
        List<org.nebulith.report.html.Report.Setting> out = new java.util.ArrayList<>();
        context.settings().forEach(s -> out.add(new org.nebulith.report.html.Report.Setting(s.key(), s.value(), s.origin())));
        return out;
    }

    private List<org.nebulith.report.html.Report.Citation> sources(RunContext context, SystemSpec spec,
                                                                   Set<Element> elements) {
        return org.nebulith.report.SourceList.of(chemistry.citeComposition(context), spec.species(), elements,
                org.nebulith.thermo.SpeciesDatabase.bundled().sources(), List.of());
    }

    private static CondensationSequence run(ChemicalSystem system, double[] totals, SequenceSettings settings) {
        try {
            return new SequenceRunner(new EquilibriumSolver()).run(system, totals, settings);
        } catch (ConvergenceException e) {
            throw new NumericalException(Messages.SEQUENCE_STOPPED, e, e.getMessage());
        }
    }

    private PressurePath pressurePath(final RunContext context) throws IOException {
        if (pathFile != null && pressureBar != null) {
            throw InputException.atOption("--path", pathFile, "given together with --P-bar", "either --P-bar or --path");
        }
        if (pathFile == null) {
            double p = pressureBar == null ? DEFAULT_P_BAR : pressureBar;
            if (!(p > 0) || Double.isInfinite(p)) {
                throw InputException.atOption("--P-bar", p, "not a positive pressure", "a finite number of bar > 0");
            }
            return PressurePath.constant(p);
        }
        Path f = context.input(pathFile, "P-T path");
        PressurePath path;
        try (Reader r = Files.newBufferedReader(f, StandardCharsets.UTF_8)) {
            path = PressurePathReader.read(r, pathFile.toString());
        }
        if (path.points() > 1 && (tMaxK > path.tableMaxK() || tMinK < path.tableMinK())) {
            context.warn("the temperature grid " + Decimal.format(tMaxK) + ".." + Decimal.format(tMinK)
                    + " K extends beyond the path " + Decimal.format(path.tableMaxK()) + ".."
                    + Decimal.format(path.tableMinK()) + " K; the end pressures are held constant there");
        }
        return path;
    }

    private SequenceSettings settings(final PressurePath path) {
        if (!(tMinK > 0) || !Double.isFinite(tMinK)) {
            throw InputException.atOption("--T-min-K", tMinK, "not a positive temperature", "a finite number of K > 0");
        }
        if (!(tMaxK > tMinK) || !Double.isFinite(tMaxK)) {
            throw InputException.atOption("--T-max-K", tMaxK, "not above --T-min-K " + Decimal.format(tMinK),
                    "a finite temperature [K] above --T-min-K");
        }
        if (!(tStepK > 0) || tStepK > tMaxK - tMinK) {
            throw InputException.atOption("--T-step-K", tStepK, "not a step inside the range",
                    "a number of K > 0 and at most T-max - T-min");
        }
        double steps = Math.floor((tMaxK - tMinK) / tStepK) + 1;
        if (steps > MAX_GRID_POINTS) {
            throw InputException.atOption("--T-step-K", tStepK, "gives " + (long) steps
                    + " grid temperatures, more than " + MAX_GRID_POINTS, "a step of at least "
                    + Decimal.format((tMaxK - tMinK) / (MAX_GRID_POINTS - 1)) + " K for this range"
                    + " (boundaries are refined to 0.05 K anyway)");
        }
        if (!(isolation >= 0 && isolation <= 1)) {
            throw InputException.atOption("--isolation", isolation, "outside [0, 1]",
                    "0 (equilibrium) to 1 (fully fractional)");
        }
        return new SequenceSettings(path, tMaxK, tMinK, tStepK, isolation, 0.05);
    }

    private String describe(final PressurePath path) {
        if (pathFile == null) {
            return "constant " + Decimal.shortest(path.pressureBar(tMaxK)) + " bar";
        }
        return "P-T path " + pathFile + " (" + path.points() + " points, " + Decimal.format(path.tableMinK()) + " to "
                + Decimal.format(path.tableMaxK()) + " K; log-linear in P between points, held constant beyond)";
    }

    private List<String> compositionLines(final RunContext context) {
        List<String> lines = new ArrayList<>();
        lines.add(chemistry.describeComposition());
        lines.addAll(chemistry.baseComposition(context).provenance());
        return lines;
    }

    private static List<String> settingLines(final RunContext context) {
        List<String> lines = new ArrayList<>();
        context.settings().forEach(s -> lines.add(s.key() + " = " + s.value() + " (" + s.origin() + ")"));
        return lines;
    }

    private static void printCautions(final RunContext context, final List<String> cautions) {
        context.info("Cautions (details in run-notes.md):");
        context.info("  - equilibrium with ideal solutions, no kinetics; silicate liquids not modelled");
        context.info("  - results depend on the thermodynamic data: try --variant TAG for sensitivity");
        context.info("  - no phosphide or Mn-silicate data: P and Mn condense late");
        if (cautions.size() > 4) {
            context.info("  - some gas species are used below their data range (listed in run-notes.md)");
        }
    }
}
