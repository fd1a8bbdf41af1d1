package org.nebulith.zones;

import java.util.Map;
import java.util.NavigableMap;
import java.util.TreeMap;

import org.nebulith.disk.DiskState;
import org.nebulith.equilibrium.ChemicalSystem;
import org.nebulith.equilibrium.EquilibriumProblem;
import org.nebulith.equilibrium.EquilibriumResult;
import org.nebulith.equilibrium.EquilibriumSolver;
import org.nebulith.equilibrium.WarmStart;

/**
 * What condenses from one gram of disk gas at each radius: the equilibrium at the local midplane
 * T and P, cached by radius and warm-started from the nearest radius already solved.
 *
 * <p>Below {@link #floorK()} the rock assemblage is frozen at its equilibrium at the floor (the
 * species data and the rock-forming reactions are not followed to colder gas, where they would be
 * kinetically inhibited anyway — common practice) and water ice is added from the saturation
 * pressure of ice ({@link WaterIce}). Not thread-safe: use one instance per thread.
 */
public final class LocalCondensation {
    private final ChemicalSystem system;
    private final double[] totalsPerGram;
    private final EquilibriumSolver solver;
    private final double floorK;
    private final int waterIndex;
    private final TreeMap<Double, Local> cache = new TreeMap<>();
    private final NavigableMap<Double, Local> reference;
    private int solved;
    private long firstSolveNanos;

    /**
     * The local state at one radius.
     *
     * @param state        the disk state
     * @param equilibriumK temperature at which the equilibrium was computed [K]
     * @param result       the equilibrium of one gram of gas
     * @param iceMoles     moles of water ice per gram of gas
     */
    public record Local(DiskState state, double equilibriumK, EquilibriumResult result, double iceMoles) {
    }

    /**
     * @param system        the chemical system
     * @param totalsPerGram element totals of one gram of gas [mol/g], in the system's element order
     * @param solver        the solver
     * @param floorK        lowest equilibrium temperature [K]
     */
    public LocalCondensation(ChemicalSystem system, double[] totalsPerGram, EquilibriumSolver solver, double floorK) {
        this(system, totalsPerGram, solver, floorK, java.util.Collections.emptyNavigableMap());
    }

    /**
     * @param system        the chemical system
     * @param totalsPerGram element totals of one gram of gas [mol/g], in the system's element order
     * @param solver        the solver
     * @param floorK        lowest equilibrium temperature [K]
     * @param reference     states of another composition of the same system (see {@link #snapshot()}),
     *                      used as warm starts until this instance has solved a radius of its own;
     *                      results then do not depend on what was solved before on the same thread
     */
    public LocalCondensation(ChemicalSystem system, double[] totalsPerGram, EquilibriumSolver solver, double floorK,
                             NavigableMap<Double, Local> reference) {
        this.reference = reference;
        this.system = system;
        this.totalsPerGram = totalsPerGram.clone();
        this.solver = solver;
        this.floorK = floorK;
        this.waterIndex = system.memberNames(0).indexOf("H2O");
    }

    /** @return the system */
    public ChemicalSystem system() {
        return system;
    }

    /** @return the floor temperature [K] */
    public double floorK() {
        return floorK;
    }

    /** @return number of equilibria solved so far */
    public int equilibriaSolved() {
        return solved;
    }

    /** @return wall time of the first equilibrium this instance solved [ns] (0 before it) */
    public long firstSolveNanos() {
        return firstSolveNanos;
    }

    /**
     * @param s the disk state at r
     * @return the local condensation (cached by r for one disk: a state of another disk at a cached
     *         radius, with another temperature or pressure, starts a new cache)
     */
    public Local at(DiskState s) {
        Local hit = cache.get(s.rAU());
        if (hit != null) {
            if (sameConditions(hit.state(), s)) {
                return hit;
            }
            cache.clear();
        }
        double tEq = Math.max(s.temperatureK(), floorK);
        EquilibriumProblem pr = new EquilibriumProblem(system, tEq, s.pressureBar(), totalsPerGram);
        long start = solved == 0 ? System.nanoTime() : 0;
        EquilibriumResult r = solver.solve(pr, warmStart(s.rAU(), tEq));
        if (solved == 0) {
            firstSolveNanos = System.nanoTime() - start;
        }
        solved++;
        double ice = 0;
        if (s.temperatureK() < floorK && waterIndex >= 0) {
            ice = WaterIce.condensedMoles(r.memberMoles(0, waterIndex), r.gasMoles(), s.temperatureK(), s.pressureBar());
        }
        Local l = new Local(s, tEq, r, ice);
        cache.put(s.rAU(), l);
        return l;
    }

    private static boolean sameConditions(DiskState a, DiskState b) {
        return a.temperatureK() == b.temperatureK() && a.pressureBar() == b.pressureBar();
    }

    /** @return an unmodifiable copy of the states solved so far, by radius (a warm-start reference) */
    public NavigableMap<Double, Local> snapshot() {
        return java.util.Collections.unmodifiableNavigableMap(new TreeMap<>(cache));
    }

    /**
     * Interpolates between the cached radii on either side, or extrapolates from the two nearest on
     * one side, corrected by the same interpolation's error on the reference states where they are
     * at the same radii ({@link WarmStart#corrected}: about 6 % fewer Newton steps on survey draws);
     * the second radius is carried from the first along the reference ({@link #carried}); falls back
     * to the nearest state (own or reference); null (cold start) if none.
     */
    private WarmStart warmStart(double r, double tEq) {
        if (cache.size() == 1) {
            WarmStart carried = carried(cache.firstEntry().getValue(), r, tEq);
            if (carried != null) {
                return carried;
            }
        }
        if (cache.size() >= 2) {
            Map.Entry<Double, Local> lo = cache.lowerEntry(r);
            Map.Entry<Double, Local> hi = cache.higherEntry(r);
            Map.Entry<Double, Local> a;
            Map.Entry<Double, Local> b;
            if (lo != null && hi != null) {
                a = r - lo.getKey() <= hi.getKey() - r ? lo : hi;
                b = a == lo ? hi : lo;
            } else {
                a = lo != null ? lo : hi;
                b = lo != null ? cache.lowerEntry(lo.getKey()) : cache.higherEntry(hi.getKey());
            }
            if (b != null) {
                double w = (r - a.getKey()) / (a.getKey() - b.getKey());
                WarmStart own = WarmStart.linear(a.getValue().result(), b.getValue().result(), w, tEq);
                Local ra = sameState(a.getValue());
                Local rb = sameState(b.getValue());
                Local rt = reference.get(r);
                if (ra != null && rb != null && rt != null && rt.equilibriumK() == tEq) {
                    return WarmStart.corrected(own, WarmStart.linear(ra.result(), rb.result(), w, tEq), rt.result());
                }
                return own;
            }
        }
        Local near = nearest(r);
        return near == null ? null : WarmStart.of(near.result());
    }

    /**
     * The second radius of this composition, from its first: that state plus the change of the
     * reference composition between the two radii ({@link WarmStart#transported}), if the reference
     * holds both. Without it the start would be the first state as is, ten kelvin or more away,
     * which costs several times the Newton steps of the later radii.
     */
    private WarmStart carried(Local own, double r, double tEq) {
        Local refFrom = sameState(own);
        Local refTo = reference.get(r);
        if (refFrom == null || refTo == null || refTo.equilibriumK() != tEq) {
            return null;
        }
        return WarmStart.transported(own.result(), refFrom.result(), refTo.result());
    }

    /** @return the reference state at the radius, temperature and pressure of l, or null */
    private Local sameState(Local l) {
        Local ref = reference.get(l.state().rAU());
        return ref != null && ref.equilibriumK() == l.equilibriumK()
                && ref.state().pressureBar() == l.state().pressureBar() ? ref : null;
    }

    private Local nearest(double r) {
        NavigableMap<Double, Local> from = cache.isEmpty() ? reference : cache;
        Map.Entry<Double, Local> lo = from.floorEntry(r);
        Map.Entry<Double, Local> hi = from.ceilingEntry(r);
        if (lo == null) {
            return hi == null ? null : hi.getValue();
        }
        if (hi == null) {
            return lo.getValue();
        }
        return r - lo.getKey() <= hi.getKey() - r ? lo.getValue() : hi.getValue();
    }

    /**
     * @param l a local state
     * @return a value that changes exactly where a condensed phase (or ice) appears or vanishes
     */
    public static Object signature(Local l) {
        java.util.List<Integer> s = new java.util.ArrayList<>();
        for (int p : l.result().presentCondensedPhases()) {
            s.add(p);
        }
        s.add(l.iceMoles() > 0 ? -1 : -2);
        return s;
    }
}
