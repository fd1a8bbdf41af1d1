package org.nebulith.zones;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.function.DoubleFunction;

/**
 * Locates condensation fronts: the radii where a caller-defined signature of the local state
 * changes (for example the set of condensed phases present at T(r), P(r)). Samples the signature
 * on a logarithmic grid and bisects every interval whose ends differ, to a given width. A front
 * pair closer than one grid step is missed unless the grid is fine enough (say 200 points).
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
                fronts.add(bisect(a, b, sa, signature, tolAU));
            }
            a = b;
            sa = sb;
        }
        return fronts;
    }

    private static double bisect(double a, double b, Object sa, DoubleFunction<Object> signature, double tol) {
        double lo = a;
        double hi = b;
        while (hi - lo > tol) {
            double mid = 0.5 * (lo + hi);
            if (Objects.equals(signature.apply(mid), sa)) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return 0.5 * (lo + hi);
    }
}
