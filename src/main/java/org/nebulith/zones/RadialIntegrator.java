package org.nebulith.zones;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.PriorityQueue;
import java.util.TreeSet;

import org.apache.commons.math3.analysis.integration.gauss.GaussIntegrator;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory;
import org.nebulith.disk.DiskConstants;
import org.nebulith.disk.DiskModel;
import org.nebulith.disk.DiskState;

/**
 * Integrates Sigma_gas(r) x f(r) x kernel(r) x 2 pi r dr over a feeding zone, for vector-valued f.
 *
 * <p>The zone's support is cut at the caller's break radii (condensation fronts, where f jumps)
 * into segments, so no panel straddles a front. Each segment starts with a few panels; each panel
 * is integrated with an n-point Gauss-Legendre rule as a whole and as two halves, and the
 * difference is its error estimate (common practice). Globally adaptive: the panel with the largest
 * error (relative to each component's tolerance) is split until the summed error of every component
 * is below relTol x the integral of its magnitude. Components whose integral is zero stay exact.
 * A jump that the caller does not announce is still resolved by bisection, only more slowly.
 */
public final class RadialIntegrator {
    /** Default relative tolerance (report grade; the one default of the zone integration). */
    public static final double DEFAULT_REL_TOL = 1e-7;
    /** Default Gauss-Legendre points per panel. */
    public static final int DEFAULT_POINTS = 8;
    /**
     * Components below this fraction of the largest integrand component (the last component, the
     * gas mass, excepted) are resolved to relTol of that floor rather than of themselves: trace
     * phases need not drive the refinement.
     */
    static final double TRACE_FLOOR = 1e-6;
    private static final double AREA_FACTOR = 2 * Math.PI * DiskConstants.AU_CM * DiskConstants.AU_CM;

    private final double relTol;
    private final int initialPanelsPerSegment;
    private final int maxEvaluations;
    private final double[] nodes;
    private final double[] weights;

    /**
     * @param relTol                  relative tolerance per component, in (0, 0.1]
     * @param gaussPoints             Gauss-Legendre points per panel, 2..32
     * @param initialPanelsPerSegment panels per segment before refinement, &gt;= 1
     * @param maxEvaluations          evaluation budget; exceeding it is an error
     */
    public RadialIntegrator(double relTol, int gaussPoints, int initialPanelsPerSegment, int maxEvaluations) {
        if (!(relTol > 0 && relTol <= 0.1) || gaussPoints < 2 || gaussPoints > 32 || initialPanelsPerSegment < 1
                || maxEvaluations < 1) {
            throw new IllegalArgumentException("integrator settings out of range");
        }
        this.relTol = relTol;
        this.initialPanelsPerSegment = initialPanelsPerSegment;
        this.maxEvaluations = maxEvaluations;
        GaussIntegrator g = new GaussIntegratorFactory().legendre(gaussPoints);
        this.nodes = new double[gaussPoints];
        this.weights = new double[gaussPoints];
        for (int i = 0; i < gaussPoints; i++) {
            nodes[i] = g.getPoint(i);
            weights[i] = g.getWeight(i);
        }
    }

    /** Default evaluation budget of one adaptive integration. */
    public static final int DEFAULT_MAX_EVALUATIONS = 200_000;

    /** @return an integrator with the defaults (1e-7, 8 points, 2 initial panels, 200000 evaluations) */
    public static RadialIntegrator defaults() {
        return new RadialIntegrator(DEFAULT_REL_TOL, DEFAULT_POINTS, 2, DEFAULT_MAX_EVALUATIONS);
    }

    /**
     * @param points Gauss-Legendre points per panel
     * @return an integrator for {@link #integrateFixed} (its adaptive settings are the defaults)
     */
    public static RadialIntegrator gaussRule(int points) {
        return new RadialIntegrator(DEFAULT_REL_TOL, points, 2, DEFAULT_MAX_EVALUATIONS);
    }

    /**
     * @param zone        the feeding zone (its support must lie inside the disk's range)
     * @param disk        the disk
     * @param f           the integrand per gram of gas
     * @param breakRadiiAU radii [AU] where f may jump (any order; those outside the zone are ignored)
     * @return the totals and the weighted gas mass
     * @throws IllegalStateException naming the zone and worst panel if the budget is exhausted
     */
    public ZoneIntegral integrate(FeedingZone zone, DiskModel disk, RadialIntegrand f, List<Double> breakRadiiAU) {
        disk.checkRange(zone.rInnerAU());
        disk.checkRange(zone.rOuterAU());
        Evaluator ev = new Evaluator(zone, disk, f);
        List<Double> edges = segmentEdges(zone, breakRadiiAU);
        List<Panel> panels = new ArrayList<>();
        for (int s = 0; s + 1 < edges.size(); s++) {
            double a = edges.get(s);
            double h = (edges.get(s + 1) - a) / initialPanelsPerSegment;
            for (int k = 0; k < initialPanelsPerSegment; k++) {
                double lo = a + k * h;
                double hi = k == initialPanelsPerSegment - 1 ? edges.get(s + 1) : lo + h;
                panels.add(new Panel(lo, hi, rule(ev, lo, hi), ev, this));
            }
        }
        refine(panels, ev, zone);
        panels.sort(Comparator.comparingDouble(p -> p.a));
        double[] sum = new double[ev.dim];
        for (Panel p : panels) {
            for (int i = 0; i < ev.dim; i++) {
                sum[i] += p.fine[i];
            }
        }
        double[] totals = java.util.Arrays.copyOf(sum, ev.dim - 1);
        return new ZoneIntegral(totals, sum[ev.dim - 1], edges, ev.count, panels.size());
    }

    /**
     * A fixed composite rule: the zone's support cut into equal panels, each integrated with this
     * integrator's Gauss-Legendre points, the nodes visited in increasing r (so that an integrand
     * that warm-starts from its previous radius walks outwards). No error control and no break
     * radii: for continuous integrands with kinks (element budgets across condensation fronts) the
     * error is second order in the panel width. Meant for Monte Carlo, where speed matters more.
     *
     * @param zone   the zone
     * @param disk   the disk
     * @param f      the integrand
     * @param panels number of panels, &gt;= 1
     * @return the totals and the weighted gas mass
     */
    public ZoneIntegral integrateFixed(FeedingZone zone, DiskModel disk, RadialIntegrand f, int panels) {
        if (panels < 1) {
            throw new IllegalArgumentException("need at least one panel, got " + panels);
        }
        disk.checkRange(zone.rInnerAU());
        disk.checkRange(zone.rOuterAU());
        Evaluator ev = new Evaluator(zone, disk, f);
        double lo = zone.rInnerAU();
        double h = (zone.rOuterAU() - lo) / panels;
        double[] sum = new double[ev.dim];
        double[] order = nodes.clone();
        java.util.Arrays.sort(order);
        for (int p = 0; p < panels; p++) {
            double mid = lo + (p + 0.5) * h;
            for (double x : order) {
                double[] v = ev.at(mid + 0.5 * h * x);
                double w = 0.5 * h * weightOf(x);
                for (int i = 0; i < ev.dim; i++) {
                    sum[i] += w * v[i];
                }
            }
        }
        List<Double> edges = new ArrayList<>();
        for (int p = 0; p <= panels; p++) {
            edges.add(lo + p * h);
        }
        return new ZoneIntegral(java.util.Arrays.copyOf(sum, ev.dim - 1), sum[ev.dim - 1], edges, ev.count, panels);
    }

    private double weightOf(double node) {
        for (int k = 0; k < nodes.length; k++) {
            if (nodes[k] == node) {
                return weights[k];
            }
        }
        throw new IllegalStateException("unknown Gauss node " + node);
    }

    private void refine(List<Panel> panels, Evaluator ev, FeedingZone zone) {
        while (true) {
            double[] tol = tolerances(panels, ev.dim);
            PriorityQueue<Panel> queue = new PriorityQueue<>(Comparator.comparingDouble((Panel p) -> -p.error(tol)));
            queue.addAll(panels);
            double total = 0;
            for (Panel p : panels) {
                total += p.error(tol);
            }
            if (total <= 1.0) {
                return;
            }
            while (total > 1.0) {
                if (ev.count > maxEvaluations) {
                    Panel w = queue.peek();
                    throw new IllegalStateException("zone '" + zone.name() + "': radial integration did not reach relative"
                            + " tolerance " + relTol + " within " + maxEvaluations + " evaluations; worst panel "
                            + w.a + "-" + w.b + " AU (supply the condensation fronts there as break radii)");
                }
                Panel worst = queue.poll();
                total -= worst.error(tol);
                panels.remove(worst);
                double mid = 0.5 * (worst.a + worst.b);
                for (Panel child : new Panel[] {new Panel(worst.a, mid, worst.left, ev, this),
                    new Panel(mid, worst.b, worst.right, ev, this)}) {
                    panels.add(child);
                    queue.add(child);
                    total += child.error(tol);
                }
            }
        }
    }

    private double[] tolerances(List<Panel> panels, int dim) {
        double[] tol = new double[dim];
        for (Panel p : panels) {
            for (int i = 0; i < dim; i++) {
                tol[i] += Math.abs(p.fine[i]);
            }
        }
        double largest = 0;
        for (int i = 0; i < dim - 1; i++) {
            largest = Math.max(largest, tol[i]);
        }
        for (int i = 0; i < dim; i++) {
            double scale = i < dim - 1 ? Math.max(tol[i], TRACE_FLOOR * largest) : tol[i];
            tol[i] = relTol * scale;
        }
        return tol;
    }

    private static List<Double> segmentEdges(FeedingZone zone, List<Double> breaks) {
        double lo = zone.rInnerAU();
        double hi = zone.rOuterAU();
        TreeSet<Double> set = new TreeSet<>();
        set.add(lo);
        set.add(hi);
        double eps = 1e-12 * hi;
        for (double r : breaks) {
            if (!Double.isFinite(r)) {
                throw new IllegalArgumentException("break radius must be finite, got " + r);
            }
            if (r > lo + eps && r < hi - eps) {
                set.add(r);
            }
        }
        return new ArrayList<>(set);
    }

    /** Gauss-Legendre estimate of every component over [a, b]. */
    double[] rule(Evaluator ev, double a, double b) {
        double half = 0.5 * (b - a);
        double mid = 0.5 * (a + b);
        double[] acc = new double[ev.dim];
        for (int k = 0; k < nodes.length; k++) {
            double[] v = ev.at(mid + half * nodes[k]);
            for (int i = 0; i < ev.dim; i++) {
                acc[i] += weights[k] * half * v[i];
            }
        }
        return acc;
    }

    /** Integrand Sigma x f x w x 2 pi r (per AU of dr, r in cm), plus the gas component last. */
    static final class Evaluator {
        final FeedingZone zone;
        final DiskModel disk;
        final RadialIntegrand f;
        final int dim;
        final double[] fBuf;
        final double[] out;
        int count;

        Evaluator(FeedingZone zone, DiskModel disk, RadialIntegrand f) {
            this.zone = zone;
            this.disk = disk;
            this.f = f;
            this.dim = f.dimension() + 1;
            this.fBuf = new double[f.dimension()];
            this.out = new double[dim];
        }

        double[] at(double rAU) {
            count++;
            DiskState s = disk.stateAt(rAU);
            double g = s.sigmaGasGcm2() * zone.weight(rAU) * AREA_FACTOR * rAU;
            java.util.Arrays.fill(fBuf, 0.0);
            f.evaluate(s, fBuf);
            for (int i = 0; i < fBuf.length; i++) {
                if (!Double.isFinite(fBuf[i])) {
                    throw new IllegalStateException("integrand component " + i + " is not finite at r = " + rAU
                            + " AU (T = " + s.temperatureK() + " K, P = " + s.pressureBar() + " bar)");
                }
                out[i] = g * fBuf[i];
            }
            out[dim - 1] = g;
            return out;
        }
    }

    /** One panel: coarse (whole-panel) and fine (two halves) estimates. */
    static final class Panel {
        final double a;
        final double b;
        final double[] left;
        final double[] right;
        final double[] fine;
        final double[] diff;

        Panel(double a, double b, double[] coarse, Evaluator ev, RadialIntegrator in) {
            this.a = a;
            this.b = b;
            double mid = 0.5 * (a + b);
            this.left = in.rule(ev, a, mid);
            this.right = in.rule(ev, mid, b);
            this.fine = new double[ev.dim];
            this.diff = new double[ev.dim];
            for (int i = 0; i < ev.dim; i++) {
                fine[i] = left[i] + right[i];
                diff[i] = Math.abs(fine[i] - coarse[i]);
            }
        }

        double error(double[] tol) {
            double e = 0;
            for (int i = 0; i < diff.length; i++) {
                if (tol[i] > 0) {
                    e = Math.max(e, diff[i] / tol[i]);
                } else if (diff[i] > 0) {
                    e = 1e6; // a component that was zero on the coarse partition but not on the fine one
                }
            }
            return e;
        }
    }
}
