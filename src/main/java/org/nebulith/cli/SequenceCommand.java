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
import org.nebulith.condensation.AllGasStart;
import org.nebulith.condensation.CondensationSequence;
import org.nebulith.condensation.PressurePath;
import org.nebulith.condensation.PressurePathReader;
import org.nebulith.condensation.SequenceRunner;
import org.nebulith.condensation.SequenceSettings;
import org.nebulith.progress.Alongside;
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
import org.nebulith.progress.Progress;
import org.nebulith.files.RunFolder;
import org.nebulith.thermo.Element;
import org.nebulith.thermo.PhaseNames;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/**
 * {@code nebulith sequence}: the condensation sequence of a gas cooling at constant pressure or
 * along a P-T path, in equilibrium (default) or with a fraction of each step's new condensate
 * withdrawn from further reaction. Writes the four tables, two charts, the run notes and the report
 * into the run folder; the terminal gets one line pointing to the cautions.
 */
@Command(name = "sequence",
        description = {
            "Condensation sequence: what condenses, and when, as a gas cools.",
            "At fixed pressure or along a P-T path: phases against T, the fraction of each",
            "element condensed, 50%% condensation temperatures, phase appearance.",
            "The start is raised above the first condensate if phases are stable at 2000 K",
            "(strong dust enrichment); the run notes say so.",
            "Writes into --out (default reports/sequence-<yyyyMMdd-HHmmss>/):",
            "  sequence.csv, element-fractions.csv, condensation-temperatures.csv,",
            "  phase-appearance.csv, condensation-curves and phase-assemblage charts",
            "  (.png/.svg/.pdf), run-notes.md, report.html and summary.md.",
        },
        footerHeading = "%nExamples (each a few seconds to a minute):%n",
        footer = {
            "  nebulith sequence --composition protosolar-lodders2003 --P-bar 1e-4",
            "  nebulith sequence --P-bar 1e-3 --T-max-K 1800 --T-min-K 400 --T-step-K 2",
            "  nebulith sequence --removal-fraction 1 --run-name fractional",
            "  nebulith sequence --dust-enrichment 10 --variant B88 --run-name dusty-B88",
            "  nebulith sequence --preset dusty-sequence",
            "  nebulith sequence --path my-path.csv --run-name cooling-path",
            "      (path CSV header: T_K,P_bar; log-linear in P between rows,",
            "      held constant beyond)",
        })
public final class SequenceCommand extends RunCommand {

    /** Pressure used when neither --P-bar nor --path is given [bar]. */
    static final double DEFAULT_P_BAR = 1e-4;

    /** Most grid temperatures of one sequence (about a day of work at 10 ms a state). */
    static final int MAX_GRID_POINTS = 1_000_000;

    @Mixin
    private RunOptions output;

    @Override
    protected OutputTarget outputTarget() {
        return output;
    }

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

    @Option(names = "--removal-fraction", paramLabel = "F", defaultValue = "0",
            description = "Fraction of each step's new condensate withdrawn from further reaction; "
                    + "0 = equilibrium (default), 1 = fractional.")
    private double removalFraction;

    @Override
    protected int execute(final RunContext context) throws IOException {
        ElementAbundances comp = chemistry.composition(context);
        SystemSpec spec = chemistry.systemSpec(context);
        PressurePath path = pressurePath(context);
        settings(path);
        checkDomain(spec, path);
        Set<Element> elements = comp.elements();
        ChemicalSystem system = spec.build(elements);
        double[] totals = new double[system.elementCount()];
        for (int j = 0; j < totals.length; j++) {
            totals[j] = comp.moles(system.elements().get(j));
        }
        Path folder;
        CondensationSequence seq;
        double elapsed;
        List<String> cautions = new ArrayList<>();
        SequenceRunner runner = new SequenceRunner(new EquilibriumSolver());
        try (RunFolder run = context.openRunFolder(context.defaultRunName());
             SequenceRunner.Begun begun = runner.begin(system, totals, settings(path))) {
            // the cooler half of the grid is solved meanwhile, unless the start has to be raised
            org.nebulith.report.chart.ChartRenderer.warmUpInBackground();
            long t0 = System.nanoTime();
            AllGasStart.Result start = allGasStart(context, system, totals, path, cautions);
            SequenceSettings settings = settings(path);
            cautions.addAll(SequenceCautions.lines(spec.describe(),
                    SequenceCautions.gasesBelowDataRange(spec.species(), elements, tMinK)));
            if (!start.allGasAtStart()) {
                begun.close(); // its grid started at the old start: stop its cooler half now
            }
            try (Progress progress = context.progress("sequence", SequenceRunner.gridSize(settings) + 2L);
                 SequenceRunner.Begun raised = start.allGasAtStart() ? null : runner.begin(system, totals, settings)) {
                seq = finish(raised == null ? begun : raised, progress, start.startState().orElse(null));
                elapsed = (System.nanoTime() - t0) / 1e9;
                folder = write(run, context, spec, path, seq, cautions, elapsed);
                progress.step();
            }
        }
        context.info(cautionsPointer(cautions.size(), folder));
        context.info("sequence: " + seq.steps().size() + " states, " + seq.phaseEvents().size()
                + " phase intervals, " + String.format(java.util.Locale.ROOT, "%.2f", elapsed) + " s; wrote " + folder);
        return ExitCodes.OK;
    }

    /**
     * @param count  number of cautions written to the report
     * @param folder the run folder
     * @return the one terminal line that points to them
     */
    static String cautionsPointer(int count, Path folder) {
        return "cautions: " + count + " on model assumptions and data limits, in " + folder.resolve("report.html")
                + " (and summary.md)";
    }

    private Path write(RunFolder run, RunContext context, SystemSpec spec, PressurePath path, CondensationSequence seq,
                       List<String> cautions, double elapsed) {
        SequenceTables tables = new SequenceTables(seq);
        // the charts (on two threads of their own) and the tables are independent: the second core draws
        Alongside<SequenceCharts.Charts> drawing = Alongside.start("sequence charts",
                () -> SequenceCharts.write(run, seq, tables, describe(path)));
        SequenceCharts.Charts charts = drawing.joinAfter(() -> {
            run.writeCsv(SequenceTables.SEQUENCE, tables.sequence());
            run.writeCsv(SequenceTables.FRACTIONS, tables.elementFractions());
            run.writeCsv(SequenceTables.TEMPERATURES, tables.condensationTemperatures());
            run.writeCsv(SequenceTables.APPEARANCE, tables.phaseAppearance());
        });
        String chartsNote = "Charts: " + String.join(", ", charts.files()) + "; report: report.html";
        run.writeText(SequenceNotes.FILE, SequenceNotes.text(seq, tables, new SequenceNotes.Context(
                context.toolVersion(), context.started().toString(), elapsed, settingLines(context),
                compositionLines(context), spec.describe(), describe(path), context.inputs(), cautions, chartsNote)));
        SequenceReport.write(run, seq, tables, charts, new SequenceReport.Meta(context.toolVersion(),
                context.started(), chemistry.describeComposition(), spec.describe(), describe(path),
                reportSettings(context), cautions, sources(context, spec, java.util.EnumSet.copyOf(seq.system().elements())), context.inputs()));
        return run.commit();
    }

    /**
     * Makes the sequence start with gas only: if phases are stable at the start, a default start is
     * raised (in steps of {@link AllGasStart#STEP_K}) up to the gas data's limit; a start given on the
     * command line or in a preset is refused.
     *
     * @param cautions the run's cautions, which get the note when the start was raised
     * @return what was found (with the all-gas state at the start, which the sequence solves first)
     */
    private AllGasStart.Result allGasStart(RunContext context, ChemicalSystem system, double[] totals, PressurePath path,
                                           List<String> cautions) {
        AllGasStart.Result r;
        try {
            r = AllGasStart.find(new EquilibriumSolver(), system, totals, path, tMaxK);
        } catch (ConvergenceException e) {
            throw new NumericalException(Messages.SEQUENCE_STOPPED, e, e.getMessage());
        }
        if (r.allGasAtStart()) {
            return r;
        }
        String stable = r.stableAtStart().stream().map(PhaseNames::display).distinct()
                .collect(java.util.stream.Collectors.joining(", "));
        boolean explicit = context.settings().stream()
                .anyMatch(s -> s.key().equals("T-max-K") && !s.origin().equals("default"));
        if (explicit || r.startK().isEmpty()) {
            String accepted = r.startK().isPresent()
                    ? "a start where the gas is all vapour, e.g. --T-max-K " + Decimal.format(r.startK().get())
                            + ", or no --T-max-K to raise the start automatically"
                    : "a composition or pressure with an all-gas state below " + Decimal.format(r.limitK())
                            + " K (the upper limit of the gas data)";
            throw InputException.atOption("--T-max-K", Decimal.format(tMaxK), "condensed phases are already stable "
                    + "there (" + stable + ")", accepted);
        }
        String note = "start raised from " + Decimal.format(tMaxK) + " K to " + Decimal.format(r.startK().get())
                + " K, the first all-gas temperature in " + Decimal.format(AllGasStart.STEP_K) + " K steps: " + stable
                + " already stable at " + Decimal.format(tMaxK) + " K with this composition";
        tMaxK = r.startK().get();
        context.info("sequence: " + note);
        cautions.add(note);
        return r;
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

    private static CondensationSequence finish(SequenceRunner.Begun run, Progress progress,
                                               org.nebulith.equilibrium.EquilibriumResult atStart) {
        try {
            return run.finish(progress, atStart);
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
        if (!(removalFraction >= 0 && removalFraction <= 1)) {
            throw InputException.atOption("--removal-fraction", removalFraction, "outside [0, 1]",
                    "0 (equilibrium) to 1 (fully fractional)");
        }
        return new SequenceSettings(path, tMaxK, tMinK, tStepK, removalFraction, 0.05);
    }

    /** The grid's temperatures and the path's pressures over the grid lie inside what the data cover. */
    private void checkDomain(final SystemSpec spec, final PressurePath path) {
        List<org.nebulith.thermo.Species> species = spec.species();
        DomainChecks.temperature("--T-max-K", tMaxK, species);
        DomainChecks.temperature("--T-min-K", tMinK, species);
        int n = 2000;
        for (int i = 0; i <= n; i++) {
            double t = tMaxK - (tMaxK - tMinK) * i / n;
            double p = path.pressureBar(t);
            if (!org.nebulith.equilibrium.StateDomain.coversPressure(p)) {
                DomainChecks.pressure(pathFile == null ? "--P-bar" : "--path", p);
            }
        }
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
}
