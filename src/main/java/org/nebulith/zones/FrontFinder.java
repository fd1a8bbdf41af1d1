package org.nebulith.zones;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.function.DoubleFunction;

/**
 * Locates condensation fronts: the radii where a caller-defined signature of the local state
 * changes (for example the set of condensed phases present at T(r), P(r)). Samples the signature
 * on a logarithmic grid and bisects every interval whose ends differ, to a given width. When the
 * state just outside the front found still differs from the interval's far end, a second front lies
 * between them and is bisected in turn (two phases changing within one grid step, such as one
 * appearing and another vanishing a few 1e-4 AU apart: left unannounced, the narrow interval behind
 * it may hold no quadrature point, which moved a demo zone's Ca/Si by 1.7e-5, and it costs the
 * adaptive integration hundreds of evaluations). A phase that appears and vanishes again between two
 * grid points leaves equal ends and is missed unless the grid is fine enough (say 200 points).
 * The radii found are what {@link RadialIntegrator#integrate} takes as break radii.
 */
public final class FrontFinder {
    private FrontFinder() {
    }

    /**
     * @param rMinAU    inner radius [AU], &gt; 0
     * @param rMaxAU    outer radius [AU], &gt; rMinAU
     * @param samples   grid points, &gt;= 2
     * @param signature any value with {@code equals}: the same value means no front in between
     * @param tolAU     bisection width [AU], &gt; 0
     * @return the front radii in increasing order
     */
    public static List<Double> find(double rMinAU, double rMaxAU, int samples, DoubleFunction<Object> signature,
                                    double tolAU) {
        if (!(rMinAU > 0 && rMaxAU > rMinAU && tolAU > 0) || samples < 2) {
            throw new IllegalArgumentException("front search needs 0 < r_min < r_max, tol > 0 and >= 2 samples");
        }
        List<Double> fronts = new ArrayList<>();
        double ratio = Math.pow(rMaxAU / rMinAU, 1.0 / (samples - 1));
        double a = rMinAU;
        Object sa = signature.apply(a);
        for (int i = 1; i < samples; i++) {
            double b = i == samples - 1 ? rMaxAU : rMinAU * Math.pow(ratio, i);
            Object sb = signature.apply(b);
            if (!Objects.equals(sa, sb)) {
                bisect(a, b, sa, sb, signature, tolAU, fronts);
            }
            a = b;
            sa = sb;
        }
        return fronts;
    }

    /**
     * Most fronts taken from one grid interval: a signature that flickers at the rounding level (a
     * trace phase present at one radius, absent at the next) would otherwise be followed front by
     * front across the whole interval; what lies beyond is left to the adaptive integration, as a
     * front between grid points always was before the search went on past the first.
     */
    static final int MAX_FRONTS_PER_STEP = 16;

    /** Adds the fronts between a and b (signatures sa and sb, which differ) in increasing order. */
    private static void bisect(double a, double b, Object sa, Object sb, DoubleFunction<Object> signature,
                               double tol, List<Double> fronts) {
        double from = a;
        Object sFrom = sa;
        for (int found = 0; found < MAX_FRONTS_PER_STEP; found++) {
            double lo = from;
            double hi = b;
            Object sHi = sb;
            while (hi - lo > tol) {
                double mid = 0.5 * (lo + hi);
                Object sMid = signature.apply(mid);
                if (Objects.equals(sMid, sFrom)) {
                    lo = mid;
                } else {
                    hi = mid;
                    sHi = sMid;
                }
            }
            fronts.add(0.5 * (lo + hi));
            if (Objects.equals(sHi, sb) || b - hi <= tol) {
                return;
            }
            from = hi;
            sFrom = sHi;
        }
    }
}
