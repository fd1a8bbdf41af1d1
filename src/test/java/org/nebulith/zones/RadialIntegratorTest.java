package org.nebulith.zones;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.OptionalDouble;
import java.util.function.DoubleFunction;

import org.apache.commons.math3.special.Erf;
import org.junit.jupiter.api.Test;
import org.nebulith.disk.DiskConstants;
import org.nebulith.disk.DiskModel;
import org.nebulith.disk.PowerLawDisk;
import org.nebulith.errors.NumericalException;

/**
 * Convergence against analytic integrals. The test disk has Sigma = 1000 g cm^-2 (r/AU)^-1, so
 * Sigma x 2 pi r dr = 2 pi 1000 AU^2 dr is constant in r and the integrals are elementary.
 */
class RadialIntegratorTest {
    private static final double C = 2 * Math.PI * 1000 * DiskConstants.AU_CM * DiskConstants.AU_CM;
    private final DiskModel disk = new PowerLawDisk(300, 0.5, 1e-5, 3, 1000, 1.0, 0.1, 10, "test disk (invented)");
    private final FeedingZone tophat = new FeedingZone("t", KernelShape.TOPHAT, 1.0, 0.4, OptionalDouble.empty());
    private final FeedingZone gauss = new FeedingZone("g", KernelShape.GAUSSIAN, 2.0, 0.3, OptionalDouble.empty());
    private static final double STEP_R = 1.137;

    /** f = (step at STEP_R, r^2, 0). */
    private final RadialIntegrand f = new RadialIntegrand() {
        @Override
        public int dimension() {
            return 3;
        }

        @Override
        public void evaluate(org.nebulith.disk.DiskState s, double[] out) {
            out[0] = s.rAU() < STEP_R ? 1.0 : 0.0;
            out[1] = s.rAU() * s.rAU();
            out[2] = 0.0;
        }
    };

    private static double rel(double a, double b) {
        return Math.abs(a - b) / Math.abs(b);
    }

    @Test
    void tophatStepAndSmoothAgreeWithAnalyticAndUnderDoubling() {
        double stepExact = C * (STEP_R - 0.6);
        double smoothExact = C * (Math.pow(1.4, 3) - Math.pow(0.6, 3)) / 3;
        for (List<Double> breaks : List.of(List.of(STEP_R), List.<Double>of())) {
            ZoneIntegral one = new RadialIntegrator(1e-9, 8, 1, 200_000).integrate(tophat, disk, f, breaks);
            ZoneIntegral two = new RadialIntegrator(1e-9, 8, 2, 200_000).integrate(tophat, disk, f, breaks);
            for (int i = 0; i < 2; i++) {
                assertTrue(rel(one.total(i), two.total(i)) < 1e-6, "doubling changed component " + i);
            }
            assertTrue(rel(two.total(0), stepExact) < 1e-8, "step, breaks " + breaks + ": " + rel(two.total(0), stepExact));
            assertTrue(rel(two.total(1), smoothExact) < 1e-12);
            assertEquals(0.0, two.total(2), 0.0);
            assertEquals(C * 0.8, two.gasMassG(), 1e-12 * C);
        }
    }

    @Test
    void announcedFrontsAreCheapAndExact() {
        ZoneIntegral withBreak = RadialIntegrator.defaults().integrate(tophat, disk, f, List.of(STEP_R, 5.0, -1.0));
        ZoneIntegral without = RadialIntegrator.defaults().integrate(tophat, disk, f, List.of());
        assertEquals(List.of(0.6, STEP_R, 1.4), withBreak.segmentEdges().stream().map(d -> Math.rint(d * 1e12) / 1e12).toList());
        assertTrue(withBreak.evaluations() < without.evaluations() / 3,
                withBreak.evaluations() + " vs " + without.evaluations());
        assertTrue(rel(withBreak.total(0), C * (STEP_R - 0.6)) < 1e-13);
    }

    /** Truncated Gaussian: integral of exp(-x^2/2 sigma^2) over +-3 sigma = sigma sqrt(2 pi) erf(3/sqrt 2). */
    @Test
    void gaussianKernelMatchesTheErrorFunction() {
        double exact = C * 0.3 * Math.sqrt(2 * Math.PI) * Erf.erf(3 / Math.sqrt(2));
        ZoneIntegral one = new RadialIntegrator(1e-9, 8, 1, 200_000).integrate(gauss, disk, f, List.of());
        ZoneIntegral two = new RadialIntegrator(1e-9, 8, 2, 200_000).integrate(gauss, disk, f, List.of());
        assertTrue(rel(one.gasMassG(), two.gasMassG()) < 1e-6);
        assertTrue(rel(two.gasMassG(), exact) < 1e-10, "" + rel(two.gasMassG(), exact));
        assertEquals(1.1, gauss.rInnerAU(), 1e-12);
        assertEquals(2.9, gauss.rOuterAU(), 1e-12);
    }

    @Test
    void nonFiniteIntegrandAndExhaustedBudgetAreErrors() {
        RadialIntegrand bad = new RadialIntegrand() {
            @Override
            public int dimension() {
                return 1;
            }

            @Override
            public void evaluate(org.nebulith.disk.DiskState s, double[] out) {
                out[0] = s.rAU() > 1.2 ? Double.NaN : 1;
            }
        };
        String m = assertThrows(NumericalException.class,
                () -> RadialIntegrator.defaults().integrate(tophat, disk, bad, List.of())).getMessage();
        assertTrue(m.contains("T = ") && m.contains("not finite"), m);
        m = assertThrows(NumericalException.class,
                () -> new RadialIntegrator(1e-9, 8, 1, 50).integrate(tophat, disk, f, List.of())).getMessage();
        assertTrue(m.contains("zone \"t\"") && m.contains("r = ") && m.contains("T = ") && m.contains("P = "), m);
    }

    @Test
    void frontFinderLocatesASignatureChange() {
        List<Double> fronts = FrontFinder.find(0.1, 10, 50, r -> r < STEP_R, 1e-10);
        assertEquals(1, fronts.size());
        assertEquals(STEP_R, fronts.get(0), 1e-10);
        assertTrue(FrontFinder.find(0.1, 10, 50, r -> 1, 1e-10).isEmpty());
    }

    @Test
    void frontFinderLocatesSeveralChangesWithinOneGridStep() {
        // three signature changes 2e-4 AU apart, inside one step of a 10-point grid over 0.1-10 AU (a
        // phase appearing and another vanishing close together, as in the demo disk near 0.5634 AU)
        DoubleFunction<Object> sig = r -> r < 1.0 ? "A" : r < 1.0002 ? "B" : r < 1.0004 ? "C" : "D";
        List<Double> fronts = FrontFinder.find(0.1, 10, 10, sig, 1e-10);
        assertEquals(3, fronts.size(), fronts.toString());
        assertEquals(1.0, fronts.get(0), 1e-10);
        assertEquals(1.0002, fronts.get(1), 1e-10);
        assertEquals(1.0004, fronts.get(2), 1e-10);
    }

    @Test
    void frontFinderFollowsAFlickeringSignatureOnlySoFar() {
        // a signature that changes every 1e-9 AU (noise at the rounding level): at most
        // MAX_FRONTS_PER_STEP fronts from the one grid interval, found in a bounded number of probes
        int[] probes = {0};
        DoubleFunction<Object> sig = r -> {
            probes[0]++;
            return r < 1.0 ? -1L : (long) Math.floor((r - 1.0) / 1e-9);
        };
        List<Double> fronts = FrontFinder.find(0.5, 2, 2, sig, 1e-12);
        assertEquals(FrontFinder.MAX_FRONTS_PER_STEP, fronts.size());
        assertTrue(probes[0] < 50 * FrontFinder.MAX_FRONTS_PER_STEP, probes[0] + " probes");
    }

    /**
     * An integrand that jumps by a relative 3e-5 wherever it is sampled (as a flat disk on a data
     * piece boundary once did): 1 + 3e-5 sign(hash of r). Its integral is known to 3e-5; halving
     * never helps.
     */
    private static final RadialIntegrand NOISY = new RadialIntegrand() {
        @Override
        public int dimension() {
            return 1;
        }

        @Override
        public void evaluate(org.nebulith.disk.DiskState s, double[] out) {
            long bits = Double.doubleToLongBits(s.rAU()) * 0x9E3779B97F4A7C15L;
            out[0] = 1 + ((bits >>> 40 & 1) == 0 ? 3e-5 : -3e-5);
        }
    };

    @Test
    void noiseAtEveryScaleIsAcceptedWithinTheDataContinuityAndRecorded() {
        ErrorControl control = new ErrorControl(new int[] {0}, 1, 3e-5);
        ZoneIntegral zi = new RadialIntegrator(1e-9, 8, 2, 200_000).integrate(tophat, disk, NOISY, List.of(), control);
        assertEquals(C * 0.8, zi.total(0), 3e-5 * C * 0.8); // exact integral of the mean, 1 x C x width
        IntegrationQuality q = zi.quality();
        assertTrue(q.acceptedPanels() > 0, "stalled panels are recorded: " + q);
        assertTrue(q.worstLoAU() >= 0.6 && q.worstHiAU() <= 1.4 && q.worstLoAU() < q.worstHiAU(), q.toString());
        assertTrue(q.worstRelError() > 0 && q.totalRelError() < RadialIntegrator.CONTINUITY_FACTOR * 3e-5, q.toString());
        assertTrue(zi.evaluations() < 200_000, "finished well within the budget: " + zi.evaluations());
    }

    @Test
    void noiseAboveTheDataContinuityIsANumericalFailureNamingTheState() {
        ErrorControl tooSmooth = new ErrorControl(new int[] {0}, 1, 1e-8);
        String m = assertThrows(NumericalException.class, () -> new RadialIntegrator(1e-9, 8, 2, 20_000)
                .integrate(tophat, disk, NOISY, List.of(), tooSmooth)).getMessage();
        assertTrue(m.startsWith("zone \"t\", r = ") && m.contains(" AU, T = ") && m.contains(" K, P = "), m);
    }

    @Test
    void polymorphsControlledTogetherNeedNoRefinementAtTheirSwap() {
        // Two components that swap at 1.137 AU with a smooth sum: grouped, only the sum is controlled.
        RadialIntegrand swap = new RadialIntegrand() {
            @Override
            public int dimension() {
                return 2;
            }

            @Override
            public void evaluate(org.nebulith.disk.DiskState s, double[] out) {
                boolean low = s.rAU() < STEP_R;
                out[0] = low ? s.rAU() : 0;
                out[1] = low ? 0 : s.rAU();
            }
        };
        ZoneIntegral together = RadialIntegrator.defaults().integrate(tophat, disk, swap, List.of(),
                new ErrorControl(new int[] {0, 0}, 1, 0));
        ZoneIntegral apart = RadialIntegrator.defaults().integrate(tophat, disk, swap, List.of());
        double exact = C * (1.4 * 1.4 - 0.6 * 0.6) / 2;
        assertEquals(1.0, (together.total(0) + together.total(1)) / exact, 1e-12);
        assertTrue(together.evaluations() * 10 < apart.evaluations(),
                together.evaluations() + " evaluations grouped, " + apart.evaluations() + " apart");
    }
}
