package org.nebulith.condensation;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.atomic.AtomicBoolean;

import org.nebulith.equilibrium.ChemicalSystem;
import org.nebulith.equilibrium.EquilibriumProblem;
import org.nebulith.equilibrium.EquilibriumResult;
import org.nebulith.equilibrium.EquilibriumSolver;
import org.nebulith.equilibrium.WarmStart;
import org.nebulith.progress.Alongside;
import org.nebulith.progress.DeferredProgress;
import org.nebulith.progress.Progress;

/**
 * Runs a condensation sequence on cooling: equilibrium at each grid temperature, warm-started by
 * extrapolation from the two previous steps. With an removal fraction &gt; 0, after each
 * step a fraction phi of the solids that condensed during that step (the increase of every
 * condensed member over what stayed reacting) is removed from the reacting system; withdrawn
 * solids no longer react. Phase boundaries and 50% points are then bisected
 * ({@link SequenceRefiner}).
 */
public final class SequenceRunner {
    /** Smallest reacting total kept in withdrawal mode, relative to the element's input total. */
    public static final double REACTING_FLOOR = 1e-14;

    /**
     * Equilibrium runs of at least this many grid states solve the cooler half of the grid on a second
     * thread, from a cold start at its hottest state (the fixed split keeps results independent of the
     * number of cores; they differ from one unbroken warm-started path by the solver's tolerance).
     */
    static final int SPLIT_MIN_POINTS = 400;
    private final EquilibriumSolver solver;
    private final int splitMinPoints;
    /** The stop flag of work that is never abandoned. */
    private static final AtomicBoolean NEVER = new AtomicBoolean();

    /** @param solver the equilibrium solver */
    public SequenceRunner(EquilibriumSolver solver) {
        this(solver, SPLIT_MIN_POINTS);
    }

    /**
     * @param solver         the equilibrium solver
     * @param splitMinPoints grid states from which an equilibrium run is split in two halves
     *                       ({@link Integer#MAX_VALUE}: never, one warm-started path)
     */
    SequenceRunner(EquilibriumSolver solver, int splitMinPoints) {
        this.solver = solver;
        this.splitMinPoints = splitMinPoints;
    }

    /**
     * @param system   the chemical system
     * @param totals   input element totals [mol], in the system's element order
     * @param settings grid, pressure and removal fraction
     * @return the sequence
     */
    public CondensationSequence run(ChemicalSystem system, double[] totals, SequenceSettings settings) {
        return run(system, totals, settings, Progress.none());
    }

    /**
     * @param settings grid settings
     * @return the number of grid states a run solves before refinement (one progress step each)
     */
    public static int gridSize(SequenceSettings settings) {
        return grid(settings).length;
    }

    /**
     * @param system   the chemical system
     * @param totals   input element totals [mol], in the system's element order
     * @param settings grid, pressure and removal fraction
     * @param progress advanced by one per grid state ({@link #gridSize}) and one for the refinement
     * @return the sequence
     */
    public CondensationSequence run(ChemicalSystem system, double[] totals, SequenceSettings settings,
                                    Progress progress) {
        try (Begun run = begin(system, totals, settings)) {
            return run.finish(progress, null);
        }
    }

    /**
     * Begins a run: the cooler half of a split equilibrium grid starts on its own thread at once, so
     * that it is solved while the caller does other work (checks the start) before {@link Begun#finish}.
     *
     * @param system   the chemical system
     * @param totals   input element totals [mol], in the system's element order
     * @param settings grid, pressure and removal fraction
     * @return the begun run; close it to abandon it if it is not finished
     */
    public Begun begin(ChemicalSystem system, double[] totals, SequenceSettings settings) {
        return new Begun(system, totals.clone(), settings);
    }

    /** A run begun by {@link #begin}; thread-confined to its caller apart from its own cooler half. */
    public final class Begun implements AutoCloseable {
        private final ChemicalSystem system;
        private final double[] totals;
        private final SequenceSettings settings;
        private final double[] grid;
        private final Stoichiometry stoich;
        private final DeferredProgress coolerProgress = new DeferredProgress();
        private final AtomicBoolean abandoned = new AtomicBoolean();
        private final Alongside<List<SequenceStep>> cooler;
        private boolean finished;

        private Begun(ChemicalSystem system, double[] totals, SequenceSettings settings) {
            this.system = system;
            this.totals = totals;
            this.settings = settings;
            this.grid = grid(settings);
            this.stoich = new Stoichiometry(system);
            int half = grid.length / 2;
            this.cooler = !settings.isFractional() && grid.length >= splitMinPoints
                    ? Alongside.start("sequence, cooler half", () -> equilibriumSteps(system, totals, settings, grid,
                            half, grid.length, stoich, coolerProgress, null, abandoned))
                    : null;
        }

        /**
         * Solves the rest and refines the boundaries.
         *
         * @param progress advanced by one per grid state ({@link #gridSize}) and one for the refinement
         * @param atStart  the equilibrium at the first grid state if the caller has it already (it must
         *                 be the solver's cold solution of exactly that state; used only if T, P and the
         *                 totals match), or null
         * @return the sequence
         */
        public CondensationSequence finish(Progress progress, EquilibriumResult atStart) {
            if (finished) {
                throw new IllegalStateException("this run is finished already");
            }
            finished = true;
            EquilibriumResult first = atStart != null && isFirstState(atStart) ? atStart : null;
            if (settings.isFractional()) {
                return fractional(system, totals, settings, grid, stoich, progress, first);
            }
            List<SequenceStep> steps = new ArrayList<>();
            if (cooler != null) {
                coolerProgress.attach(progress);
                steps.addAll(cooler.joinAfter(() -> steps.addAll(equilibriumSteps(system, totals, settings, grid, 0,
                        grid.length / 2, stoich, progress, first, NEVER))));
            } else {
                steps.addAll(equilibriumSteps(system, totals, settings, grid, 0, grid.length, stoich, progress, first,
                        NEVER));
            }
            return refined(system, totals, settings, steps, null, totals.clone(), new double[totals.length], progress);
        }

        private boolean isFirstState(EquilibriumResult r) {
            EquilibriumProblem p = r.problem();
            return r.system() == system && p.temperatureK() == grid[0]
                    && p.pressureBar() == settings.path().pressureBar(grid[0]) && Arrays.equals(p.totals(), totals);
        }

        /** Stops the cooler half (if any) at its next state, unless the run is finished. */
        @Override
        public void close() {
            if (!finished) {
                abandoned.set(true);
            }
        }
    }

    private CondensationSequence fractional(ChemicalSystem system, double[] totals, SequenceSettings settings,
                                            double[] grid, Stoichiometry stoich, Progress progress,
                                            EquilibriumResult first) {
        List<SequenceStep> steps = new ArrayList<>();
        double[] b = totals.clone();
        double[][] kept = zeros(system);
        double[][] withdrawn = zeros(system);
        double[] floorAdded = new double[totals.length];
        EquilibriumResult last = null;
        EquilibriumResult prev = null;
        for (double t : grid) {
            EquilibriumProblem pr = new EquilibriumProblem(system, t, settings.path().pressureBar(t), b);
            EquilibriumResult r = solveStep(pr, last, prev, first);
            steps.add(new SequenceStep(r, copy(withdrawn), totals, stoich));
            b = withdraw(r, stoich, settings.removalFraction(), kept, withdrawn);
            floorReacting(b, totals, floorAdded);
            prev = last;
            last = r;
            progress.step();
        }
        return refined(system, totals, settings, steps, withdrawn, b, floorAdded, progress);
    }

    private CondensationSequence refined(ChemicalSystem system, double[] totals, SequenceSettings settings,
                                         List<SequenceStep> steps, double[][] withdrawn, double[] b, double[] floorAdded,
                                         Progress progress) {
        SequenceRefiner.Refined refined = new SequenceRefiner(solver, settings).refine(steps);
        progress.step();
        return new CondensationSequence(system, totals, settings, steps, refined.events(), refined.temperatures(),
                withdrawn, b, floorAdded);
    }

    /**
     * Grid states from index {@code from} (cold start) to {@code to} (exclusive) of an equilibrium
     * run, each warm-started from the two before it. Equilibrium states depend only on T, P and the
     * totals, not on the path to them, so two halves of the grid can be solved at once.
     */
    private List<SequenceStep> equilibriumSteps(ChemicalSystem system, double[] totals, SequenceSettings settings,
                                                double[] grid, int from, int to, Stoichiometry stoich,
                                                Progress progress, EquilibriumResult first, AtomicBoolean stop) {
        List<SequenceStep> steps = new ArrayList<>(to - from);
        double[] b = totals.clone();
        EquilibriumResult last = null;
        EquilibriumResult prev = null;
        for (int i = from; i < to && !stop.get(); i++) {
            double t = grid[i];
            EquilibriumProblem pr = new EquilibriumProblem(system, t, settings.path().pressureBar(t), b);
            EquilibriumResult r = solveStep(pr, last, prev, first);
            steps.add(new SequenceStep(r, null, totals, stoich));
            prev = last;
            last = r;
            progress.step();
        }
        return steps;
    }

    /**
     * @param first the caller's state at the first grid temperature (used when there is no last), or null
     * @return the state of pr: the first state, a cold solve, or a start extrapolated from the two before
     */
    private EquilibriumResult solveStep(EquilibriumProblem pr, EquilibriumResult last, EquilibriumResult prev,
                                        EquilibriumResult first) {
        if (last == null) {
            return first != null ? first : solver.solve(pr);
        }
        return solver.solve(pr, WarmStart.extrapolate(last, prev, pr.temperatureK()));
    }

    /**
     * Keeps every reacting total at least {@link #REACTING_FLOOR} of its input, so that the solver never
     * sees totals spread over more orders of magnitude than double precision can balance; the moles
     * added are recorded (at most steps x 1e-14 of the input: 2e-11 for 1700 steps, below the 1e-10 balance target).
     */
    private static void floorReacting(double[] b, double[] totals, double[] added) {
        for (int j = 0; j < b.length; j++) {
            double floor = REACTING_FLOOR * totals[j];
            if (b[j] < floor) {
                added[j] += floor - b[j];
                b[j] = floor;
            }
        }
    }

    /** @return the grid from T-max down to T-min, both included */
    static double[] grid(SequenceSettings s) {
        int n = (int) Math.floor((s.tMaxK() - s.tMinK()) / s.tStepK() + 1e-9);
        boolean exact = Math.abs(s.tMaxK() - n * s.tStepK() - s.tMinK()) < 1e-9;
        double[] g = new double[n + (exact ? 1 : 2)];
        for (int i = 0; i <= n; i++) {
            g[i] = s.tMaxK() - i * s.tStepK();
        }
        g[g.length - 1] = s.tMinK();
        return g;
    }

    /**
     * Removes phi of each member's increase; returns the new reacting totals, summed from the gas
     * and the solids kept (not as a difference, which would cancel for elements that are almost
     * entirely condensed).
     */
    private static double[] withdraw(EquilibriumResult r, Stoichiometry stoich, double phi, double[][] kept,
                                    double[][] withdrawn) {
        ChemicalSystem sys = r.system();
        double[] nb = new double[sys.elementCount()];
        addMembers(stoich, 0, r, null, nb);
        for (int p = 1; p < sys.phaseCount(); p++) {
            for (int k = 0; k < kept[p].length; k++) {
                double n = r.memberMoles(p, k);
                double increase = n - kept[p][k];
                double removed = increase > 0 ? phi * increase : 0;
                kept[p][k] = n - removed;
                withdrawn[p][k] += removed;
            }
            addMembers(stoich, p, r, kept[p], nb);
        }
        return nb;
    }

    private static void addMembers(Stoichiometry stoich, int p, EquilibriumResult r, double[] amounts, double[] nb) {
        int nk = stoich.members(p);
        for (int k = 0; k < nk; k++) {
            double n = amounts == null ? r.memberMoles(p, k) : amounts[k];
            if (n > 0) {
                double[] a = stoich.of(p, k);
                for (int j = 0; j < nb.length; j++) {
                    nb[j] += n * a[j];
                }
            }
        }
    }

    private static double[][] zeros(ChemicalSystem sys) {
        double[][] z = new double[sys.phaseCount()][];
        for (int p = 0; p < z.length; p++) {
            z[p] = new double[sys.memberNames(p).size()];
        }
        return z;
    }

    private static double[][] copy(double[][] a) {
        double[][] c = new double[a.length][];
        for (int i = 0; i < a.length; i++) {
            c[i] = a[i].clone();
        }
        return c;
    }
}
