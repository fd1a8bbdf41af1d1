package org.nebulith.cli;

import java.io.PrintStream;
import java.util.Arrays;
import java.util.Locale;

import org.nebulith.composition.AbundancePresets;
import org.nebulith.composition.ElementAbundances;
import org.nebulith.condensation.PressurePath;
import org.nebulith.condensation.SequenceRunner;
import org.nebulith.condensation.SequenceSettings;
import org.nebulith.equilibrium.ChemicalSystem;
import org.nebulith.equilibrium.EquilibriumProblem;
import org.nebulith.equilibrium.EquilibriumResult;
import org.nebulith.equilibrium.EquilibriumSolver;
import org.nebulith.equilibrium.SystemSpec;
import org.nebulith.equilibrium.WarmStart;
import org.nebulith.errors.InputException;
import org.nebulith.survey.Percentiles;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/**
 * {@code nebulith bench}: the performance figures of the equilibrium engine and of the
 * condensation sequence, printed with their targets. (a) Engine: the default data set (all its
 * gases and condensed species, all solutions) with the 20 elements of the proto-solar preset
 * (Lodders 2003), a 1 K-step cooling sequence with warm starts; after warm-up sequences, each
 * state's time is the median over the timed repeats, and the median over states is reported with
 * the mean Newton iterations per state (targets 200 us, 3 iterations). (b) The full sequence with
 * refinement ({@link SequenceRunner#run}): median wall time over the timed repeats (target 0.5 s).
 * Single-threaded; the figures depend on the machine and its load.
 */
@Command(name = "bench",
        description = {
            "Benchmark of the equilibrium engine and of the condensation sequence.",
            "Prints the median microseconds and mean Newton iterations per warm-started",
            "state of a 1 K-step sequence, and the median wall time of the full sequence,",
            "with their targets. Writes no files. Takes a minute or two.",
        },
        footerHeading = "%nExamples:%n",
        footer = {
            "  nebulith bench",
            "  nebulith bench --warmup 1 --repeats 3 --T-min-K 1000   (quicker, less steady)",
        })
public final class BenchCommand extends RunCommand {
    /** Target of the engine benchmark [us per state] (on one core of this machine). */
    static final double TARGET_US_PER_STATE = 200;
    /** Target of the engine benchmark [Newton iterations per state]. */
    static final double TARGET_ITERATIONS = 3;
    /** Target of the sequence benchmark [s]. */
    static final double TARGET_SEQUENCE_S = 0.5;

    @Mixin
    private PresetOption preset;

    @Option(names = "--P-bar", paramLabel = "P", defaultValue = "1e-4", description = "Pressure [bar]. Default: ${DEFAULT-VALUE}.")
    private double pressureBar;

    @Option(names = "--T-max-K", paramLabel = "T", defaultValue = "2000", description = "Hottest state [K]. Default: ${DEFAULT-VALUE}.")
    private double tMaxK;

    @Option(names = "--T-min-K", paramLabel = "T", defaultValue = "300", description = "Coolest state [K]. Default: ${DEFAULT-VALUE}.")
    private double tMinK;

    @Option(names = "--warmup", paramLabel = "N", defaultValue = "3", description = "Untimed warm-up runs. Default: ${DEFAULT-VALUE}.")
    private int warmup;

    @Option(names = "--repeats", paramLabel = "N", defaultValue = "5", description = "Timed runs. Default: ${DEFAULT-VALUE}.")
    private int repeats;

    @Option(names = "--commands", description = "Also time the default 'sequence' and 'planet' commands end to end, "
            + "each in fresh JVMs (--repeats runs each).")
    private boolean commands;

    @Override
    protected int execute(final RunContext context) {
        check();
        ElementAbundances comp = AbundancePresets.preset(AbundancePresets.PROTOSOLAR_LODDERS2003).abundances().perH();
        ChemicalSystem system = SystemSpec.defaults().build(comp.elements());
        double[] totals = new double[system.elementCount()];
        for (int j = 0; j < totals.length; j++) {
            totals[j] = comp.moles(system.elements().get(j));
        }
        PrintStream out = context.out();
        out.printf(Locale.ROOT, "bench: %s; %d elements (%s), %d phases, %s bar, %s to %s K; %d warm-up and %d timed runs%n",
                SystemSpec.defaults().describe(), system.elementCount(), AbundancePresets.PROTOSOLAR_LODDERS2003,
                system.phaseCount(), fmt(pressureBar), fmt(tMaxK), fmt(tMinK), warmup, repeats);
        engine(context, system, totals);
        sequence(context, system, totals);
        if (commands) {
            CommandTimer.run(out, repeats);
        }
        out.println("note: wall-clock figures; the engine runs on one thread, the full sequence solves the two halves of its grid on two; other load on the machine slows them");
        return ExitCodes.OK;
    }

    private void check() {
        if (!(pressureBar > 0) || !Double.isFinite(pressureBar)) {
            throw InputException.atOption("--P-bar", pressureBar, "not a positive pressure", "a finite number of bar > 0");
        }
        if (!(tMinK > 0) || !(tMaxK - tMinK >= 2) || !Double.isFinite(tMaxK)) {
            throw InputException.atOption("--T-min-K", tMinK, "not a range of at least 2 K below --T-max-K "
                    + fmt(tMaxK), "0 < T-min-K <= T-max-K - 2");
        }
        if (warmup < 0 || repeats < 1) {
            throw InputException.atOption("--repeats", repeats, "need --repeats >= 1 and --warmup >= 0",
                    "whole numbers");
        }
    }

    /** (a): per-state times of the warm-started 1 K sequence. */
    private void engine(final RunContext context, final ChemicalSystem system, final double[] totals) {
        EquilibriumSolver solver = new EquilibriumSolver();
        int n = (int) Math.floor(tMaxK - tMinK) + 1;
        long[][] nanos = new long[repeats][n];
        long iterations = 0;
        long coldNanos = 0;
        for (int run = 0; run < warmup + repeats; run++) {
            boolean timed = run >= warmup;
            EquilibriumResult last = null;
            EquilibriumResult prev = null;
            for (int i = 0; i < n; i++) {
                double t = tMaxK - i;
                EquilibriumProblem pr = new EquilibriumProblem(system, t, pressureBar, totals);
                long t0 = System.nanoTime();
                EquilibriumResult r = last == null ? solver.solve(pr) : solver.solve(pr, WarmStart.extrapolate(last, prev, t));
                long dt = System.nanoTime() - t0;
                if (timed) {
                    nanos[run - warmup][i] = dt;
                    if (i == 0) {
                        coldNanos += dt;
                    } else {
                        iterations += r.diagnostics().newtonIterations();
                    }
                }
                prev = last;
                last = r;
            }
        }
        double[] perState = new double[n - 1];
        double[] column = new double[repeats];
        for (int i = 1; i < n; i++) {
            for (int k = 0; k < repeats; k++) {
                column[k] = nanos[k][i];
            }
            perState[i - 1] = median(column) / 1e3;
        }
        double medianUs = median(perState);
        double meanIterations = (double) iterations / ((double) repeats * (n - 1));
        PrintStream out = context.out();
        out.printf(Locale.ROOT, "engine: %d warm-started states per sequence (1 K steps), plus one cold start of %.1f ms%n",
                n - 1, coldNanos / 1e6 / repeats);
        out.printf(Locale.ROOT, "engine: median %.1f us per state (target %.0f us: %s)%n", medianUs, TARGET_US_PER_STATE,
                verdict(medianUs <= TARGET_US_PER_STATE));
        out.printf(Locale.ROOT, "engine: 90th percentile %.1f us, slowest %.1f us per state%n", percentile(perState, 0.9),
                Arrays.stream(perState).max().orElse(0));
        out.printf(Locale.ROOT, "engine: mean %.2f Newton iterations per state (target %.0f: %s)%n", meanIterations,
                TARGET_ITERATIONS, verdict(meanIterations <= TARGET_ITERATIONS));
    }

    /** (b): wall time of the full sequence with refinement. */
    private void sequence(final RunContext context, final ChemicalSystem system, final double[] totals) {
        SequenceSettings settings = new SequenceSettings(PressurePath.constant(pressureBar), tMaxK, tMinK, 1, 0, 0.05);
        SequenceRunner runner = new SequenceRunner(new EquilibriumSolver());
        double[] seconds = new double[repeats];
        for (int run = 0; run < warmup + repeats; run++) {
            long t0 = System.nanoTime();
            runner.run(system, totals, settings);
            double s = (System.nanoTime() - t0) / 1e9;
            if (run >= warmup) {
                seconds[run - warmup] = s;
            }
        }
        double med = median(seconds);
        context.out().printf(Locale.ROOT, "sequence: median %.3f s for %s to %s K, 1 K steps, refined to 0.05 K (target %.1f s: %s)%n",
                med, fmt(tMaxK), fmt(tMinK), TARGET_SEQUENCE_S, verdict(med <= TARGET_SEQUENCE_S));
    }

    private static String verdict(final boolean met) {
        return met ? "met" : "not met";
    }

    private static double median(final double[] v) {
        return percentile(v, 0.5);
    }

    private static double percentile(final double[] v, final double q) {
        double[] s = v.clone();
        Arrays.sort(s);
        return Percentiles.ofSorted(s, q);
    }

    private static String fmt(final double v) {
        return org.nebulith.format.Decimal.format(v);
    }
}
