package org.nebulith.thermo.audit;

/** H/RT and S/R of one NASA 9-coefficient piece (McBride, Zehe &amp; Gordon 2002, eqs. 2-3), at any T. */
final class NasaPieces {
    private NasaPieces() {
    }

    static double hOverRT(double[] a, double t) {
        return -a[0] / (t * t) + a[1] * Math.log(t) / t + a[2] + a[3] * t / 2 + a[4] * t * t / 3
                + a[5] * t * t * t / 4 + a[6] * t * t * t * t / 5 + a[7] / t;
    }

    static double sOverR(double[] a, double t) {
        return -a[0] / (2 * t * t) - a[1] / t + a[2] * Math.log(t) + a[3] * t + a[4] * t * t / 2
                + a[5] * t * t * t / 3 + a[6] * t * t * t * t / 4 + a[8];
    }
}
