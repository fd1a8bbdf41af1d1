package org.nebulith.thermo;

import java.util.List;

/**
 * NASA Glenn 9-coefficient polynomials over one or more temperature intervals
 * (McBride, Zehe &amp; Gordon 2002, NASA TP-2002-211556, eqs. 1-3):
 * <pre>
 * Cp/R = a1 T^-2 + a2 T^-1 + a3 + a4 T + a5 T^2 + a6 T^3 + a7 T^4
 * H/RT = -a1 T^-2 + a2 ln(T)/T + a3 + a4 T/2 + a5 T^2/3 + a6 T^3/4 + a7 T^4/5 + b1/T
 * S/R  = -a1 T^-2/2 - a2/T + a3 ln(T) + a4 T + a5 T^2/2 + a6 T^3/3 + a7 T^4/4 + b2
 * </pre>
 * The interval is chosen by T as NASA CEA does: the first interval whose upper bound is at or
 * above T (so a boundary belongs to the lower interval).
 */
public final class Nasa9Model implements ThermoModel {
    /** One temperature interval: bounds [K] and the coefficients a1..a7, b1, b2. */
    public record Interval(double tLowK, double tHighK, double[] coefficients) {
        public Interval {
            if (coefficients.length != 9) {
                throw new IllegalArgumentException("NASA-9 interval needs 9 coefficients, got " + coefficients.length);
            }
            if (!(tHighK > tLowK)) {
                throw new IllegalArgumentException("interval upper bound " + tHighK + " K not above lower " + tLowK + " K");
            }
            coefficients = coefficients.clone();
        }
    }

    private final Interval[] intervals;

    /** @param intervals contiguous intervals in increasing temperature */
    public Nasa9Model(List<Interval> intervals) {
        if (intervals.isEmpty()) {
            throw new IllegalArgumentException("NASA-9 model needs at least one interval");
        }
        this.intervals = intervals.toArray(new Interval[0]);
        for (int i = 1; i < this.intervals.length; i++) {
            if (Math.abs(this.intervals[i].tLowK() - this.intervals[i - 1].tHighK()) > 1e-6) {
                throw new IllegalArgumentException("NASA-9 intervals not contiguous at " + this.intervals[i].tLowK() + " K");
            }
        }
    }

    /** @return the intervals, lowest first */
    public List<Interval> intervals() {
        return List.of(intervals);
    }

    @Override
    public double tMinK() {
        return intervals[0].tLowK();
    }

    @Override
    public double tMaxK() {
        return intervals[intervals.length - 1].tHighK();
    }

    private double[] coef(double t) {
        for (Interval iv : intervals) {
            if (t <= iv.tHighK()) {
                return iv.coefficients;
            }
        }
        return intervals[intervals.length - 1].coefficients;
    }

    @Override
    public double cpOverR(double t) {
        double[] a = coef(t);
        return a[0] / (t * t) + a[1] / t + a[2] + t * (a[3] + t * (a[4] + t * (a[5] + t * a[6])));
    }

    @Override
    public double hOverRT(double t) {
        double[] a = coef(t);
        return -a[0] / (t * t) + a[1] * Math.log(t) / t + a[2]
                + t * (a[3] / 2 + t * (a[4] / 3 + t * (a[5] / 4 + t * a[6] / 5))) + a[7] / t;
    }

    @Override
    public double sOverR(double t) {
        double[] a = coef(t);
        return -a[0] / (2 * t * t) - a[1] / t + a[2] * Math.log(t)
                + t * (a[3] + t * (a[4] / 2 + t * (a[5] / 3 + t * a[6] / 4))) + a[8];
    }

    @Override
    public double gOverRT(double t) {
        return gOverRT(coef(t), t);
    }

    /**
     * G/RT of one interval's polynomial, evaluated at any T (also outside that interval: used to
     * measure how well neighbouring intervals meet at their common bound).
     *
     * @param interval an interval
     * @param t        temperature [K]
     * @return G/RT from that interval's coefficients
     */
    public static double gOverRT(Interval interval, double t) {
        return gOverRT(interval.coefficients, t);
    }

    private static double gOverRT(double[] a, double t) {
        double lnT = Math.log(t);
        double h = -a[0] / (t * t) + a[1] * lnT / t + a[2]
                + t * (a[3] / 2 + t * (a[4] / 3 + t * (a[5] / 4 + t * a[6] / 5))) + a[7] / t;
        double s = -a[0] / (2 * t * t) - a[1] / t + a[2] * lnT
                + t * (a[3] + t * (a[4] / 2 + t * (a[5] / 3 + t * a[6] / 4))) + a[8];
        return h - s;
    }
}
