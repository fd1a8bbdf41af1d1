package org.nebulith.cli;

import java.io.PrintStream;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicLong;

import org.nebulith.errors.InputException;
import org.nebulith.progress.Progress;
import org.nebulith.stress.StressOutcome;
import org.nebulith.stress.StressSolve;
import org.nebulith.stress.StressState;
import org.nebulith.stress.StressStates;
import org.nebulith.survey.Percentiles;

import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/**
 * {@code nebulith bench-robust}: the stress benchmark of the equilibrium engine. N seeded random
 * states ({@link StressStates}) are solved with the default data set in two modes (all solutions,
 * pure phases), each from a cold start and, for a random neighbour of the state, from a warm start
 * at the state's result. Prints the count converged per mode and start, every failure as a runnable
 * {@code point} command line, and the median and 99th-percentile time and Newton iterations. Exit 3
 * if any solve failed.
 */
@Command(name = "bench-robust",
        description = {
            "Stress benchmark of the equilibrium engine: N seeded random states",
            "(T 200-2500 K, P 1e-10-1 bar, every element x 10^U(-0.7,0.7), C/O 0.1-2,",
            "dust enrichment 1-1000), with all solutions and with pure phases, each",
            "solved cold and warm. Prints converged counts, every failure as a point",
            "command, median and 99th-percentile time and Newton iterations.",
            "Exit 3 if any state failed.",
        },
        footerHeading = "%nExamples:%n",
        footer = {
            "  nebulith bench-robust --states 1000 --seed 1",
            "  nebulith bench-robust --states 100000 --seed 1 --threads 2",
            "  nebulith bench-robust --seed 1 --only 4711   (rerun one state)",
        })
public final class BenchRobustCommand extends RunCommand {

    @Option(names = "--states", paramLabel = "N", defaultValue = "1000", description = "Random states. Default: ${DEFAULT-VALUE}.")
    private long states;

    @Option(names = "--seed", paramLabel = "S", defaultValue = "1", description = "Seed of the series. Default: ${DEFAULT-VALUE}.")
    private long seed;

    @Option(names = "--only", paramLabel = "I", description = "Solve only state I (0-based) of the series.")
    private Long only;

    @Option(names = "--threads", paramLabel = "N", defaultValue = "1", description = "Worker threads. Default: ${DEFAULT-VALUE}.")
    private int threads;

    /** One of the four series: a mode and a start. */
    private record Series(String name, boolean pure, boolean warm) {
    }

    private static final Series[] SERIES = {
        new Series("all solutions, cold", false, false), new Series("all solutions, warm", false, true),
        new Series("pure phases, cold", true, false), new Series("pure phases, warm", true, true),
    };

    @Override
    protected int execute(final RunContext context) throws Exception {
        check();
        long first = only == null ? 0 : only;
        int n = (int) (only == null ? states : 1);
        StressStates gen = new StressStates(seed);
        StressOutcome[][] out = new StressOutcome[SERIES.length][n];
        String[][] failures = new String[SERIES.length][n];
        PrintStream ps = context.out();
        ps.printf(Locale.ROOT, "bench-robust: %d states from seed %d (%s), default data set, %d thread(s)%n", n, seed,
                only == null ? "states 0 to " + (n - 1) : "state " + first, threads);
        long t0 = System.nanoTime();
        try (Progress bar = context.progress("bench-robust", n)) {
            run(gen, first, n, out, failures, bar, ps);
        }
        report(ps, out, failures, (System.nanoTime() - t0) / 1e9);
        for (String[] f : failures) {
            for (String s : f) {
                if (s != null) {
                    return ExitCodes.NUMERICAL;
                }
            }
        }
        return ExitCodes.OK;
    }

    private void check() {
        if (states < 1 || states > Integer.MAX_VALUE) {
            throw InputException.atOption("--states", states, "out of range", "an integer from 1 to " + Integer.MAX_VALUE);
        }
        if (only != null && only < 0) {
            throw InputException.atOption("--only", only, "negative", "an integer >= 0");
        }
        if (threads < 1 || threads > 256) {
            throw InputException.atOption("--threads", threads, "out of range", "an integer from 1 to 256");
        }
    }

    private void run(final StressStates gen, final long first, final int n, final StressOutcome[][] out,
                     final String[][] failures, final Progress bar, final PrintStream ps) throws Exception {
        ExecutorService pool = Executors.newFixedThreadPool(threads);
        AtomicLong next = new AtomicLong();
        AtomicLong done = new AtomicLong();
        try {
            List<Future<?>> jobs = new ArrayList<>();
            for (int w = 0; w < threads; w++) {
                jobs.add(pool.submit(() -> {
                    StressSolve[] solves = {new StressSolve(false), new StressSolve(true)};
                    for (long i = next.getAndIncrement(); i < n; i = next.getAndIncrement()) {
                        solveOne(gen, (int) i, first + i, solves, out, failures);
                        synchronized (bar) {
                            bar.step();
                            live(ps, (int) i, failures, done.incrementAndGet(), n);
                        }
                    }
                    return null;
                }));
            }
            for (Future<?> f : jobs) {
                f.get();
            }
        } finally {
            pool.shutdownNow();
        }
    }

    /** Prints failures as they happen and a count every 1000 states, so that a long run can be read while it goes. */
    private static void live(final PrintStream ps, final int slot, final String[][] failures, final long done, final int n) {
        for (int k = 0; k < SERIES.length; k++) {
            if (failures[k][slot] != null) {
                ps.println("failed (" + SERIES[k].name() + "): " + failures[k][slot]);
            }
        }
        if (done % 1000 == 0 && done < n) {
            ps.printf(Locale.ROOT, "... %d of %d states done%n", done, n);
            ps.flush();
        }
    }

    private static void solveOne(final StressStates gen, final int slot, final long index, final StressSolve[] solves,
                                 final StressOutcome[][] out, final String[][] failures) {
        StressState s = gen.state(index);
        StressState nb = gen.neighbour(s);
        for (int mode = 0; mode < 2; mode++) {
            StressSolve solve = solves[mode];
            int cold = 2 * mode;
            StressOutcome c = solve.cold(s);
            out[cold][slot] = c;
            if (!c.converged()) {
                failures[cold][slot] = s.pointCommand(solve.pureOnly()) + "\n      (" + c.failure() + ")";
                failures[cold + 1][slot] = nb.pointCommand(solve.pureOnly()) + "\n      (not run: its start "
                        + s + " failed cold)";
                continue;
            }
            StressOutcome w = solve.warm(nb, solve.lastCold());
            out[cold + 1][slot] = w;
            if (!w.converged()) {
                failures[cold + 1][slot] = nb.pointCommand(solve.pureOnly()) + "\n      warm from: "
                        + s.pointCommand(solve.pureOnly()) + "\n      (" + w.failure() + ")";
            }
        }
    }

    private static void report(final PrintStream ps, final StressOutcome[][] out, final String[][] failures,
                               final double seconds) {
        int n = out[0].length;
        for (int k = 0; k < SERIES.length; k++) {
            double[] ms = new double[n];
            double[] it = new double[n];
            int ok = 0;
            for (StressOutcome o : out[k]) {
                if (o != null && o.converged()) {
                    ms[ok] = o.nanos() / 1e6;
                    it[ok++] = o.newtonIterations();
                }
            }
            ms = Arrays.copyOf(ms, ok);
            it = Arrays.copyOf(it, ok);
            if (ok == 0) {
                ps.printf(Locale.ROOT, "%-20s converged 0 of %d%n", SERIES[k].name() + ":", n);
                continue;
            }
            ps.printf(Locale.ROOT, "%-20s converged %d of %d; time median %.3f ms, 99th percentile %.3f ms; "
                            + "Newton iterations median %.0f, 99th percentile %.0f%n", SERIES[k].name() + ":", ok, n,
                    pct(ms, 0.5), pct(ms, 0.99), pct(it, 0.5), pct(it, 0.99));
        }
        int bad = 0;
        for (int k = 0; k < SERIES.length; k++) {
            for (int i = 0; i < n; i++) {
                if (failures[k][i] != null) {
                    if (bad++ == 0) {
                        ps.println("failures (each a runnable command; warm failures name their start):");
                    }
                    ps.println("  " + SERIES[k].name() + ": " + failures[k][i]);
                }
            }
        }
        ps.printf(Locale.ROOT, "%s; %.1f s wall%n", bad == 0 ? "every state converged" : bad + " failure(s)", seconds);
        ps.println("note: wall-clock figures on a shared machine; cold starts include the continuation from 4500 K");
    }

    /** @param v at least one value, any order @param q probability @return the percentile ({@link Percentiles}) */
    private static double pct(final double[] v, final double q) {
        double[] s = v.clone();
        Arrays.sort(s);
        return Percentiles.ofSorted(s, q);
    }
}
