package org.nebulith.disk;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;

import org.nebulith.errors.InputException;

import org.junit.jupiter.api.Test;

class TabulatedDiskTest {
    private static final String HEADER = "r_AU,T_K,P_bar,sigma_gas_g_cm2\n";

    private static DiskModel read(String body) throws Exception {
        return DiskPresets.read(new StringReader(body), "disk.csv");
    }

    private static String failure(String body) {
        return assertThrows(InputException.class, () -> read(body)).getMessage();
    }

    @Test
    void powerLawTablesAreReproducedExactlyInLogSpace() throws Exception {
        StringBuilder b = new StringBuilder("# sampled MMSN\n" + HEADER);
        DiskModel mmsn = PowerLawDisk.mmsnHayashi1981();
        for (double r : new double[] {0.2, 0.5, 1, 3, 10}) {
            DiskState s = mmsn.stateAt(r);
            b.append(r).append(',').append(s.temperatureK()).append(',').append(s.pressureBar()).append(',')
                    .append(s.sigmaGasGcm2()).append('\n');
        }
        DiskModel tab = read(b.toString());
        for (double r : new double[] {0.2, 0.33, 0.9, 2.2, 7.7, 10}) {
            assertEquals(mmsn.temperatureK(r), tab.temperatureK(r), 1e-9 * mmsn.temperatureK(r));
            assertEquals(mmsn.pressureBar(r), tab.pressureBar(r), 1e-9 * mmsn.pressureBar(r));
        }
        assertEquals(0.2, tab.rMinAU());
        assertEquals(10, tab.rMaxAU());
    }

    @Test
    void interpolationNeverOvershootsTheRows() throws Exception {
        DiskModel tab = read(HEADER + "0.1,2000,1e-3,1e4\n0.2,1990,1e-4,1e3\n1,300,1e-5,1e3\n2,290,1e-6,10\n");
        for (double r = 0.1; r <= 2; r *= 1.01) {
            double t = tab.temperatureK(r);
            assertTrue(t <= 2000 + 1e-9 && t >= 290 - 1e-9, "T = " + t + " at r = " + r);
            if (r > 0.2 && r < 1) {
                assertTrue(t <= 1990 && t >= 300, "T between rows at r = " + r);
            }
        }
    }

    @Test
    void badTablesNameFileLineAndField() {
        assertTrue(failure("r_AU,T,P_bar,sigma_gas_g_cm2\n1,2,3,4\n").startsWith("disk.csv: line 1: field \"header\""));
        String m = failure(HEADER + "1,300,1e-5,100\n0.5,400,1e-4,200\n");
        assertTrue(m.startsWith("disk.csv: line 3: field \"r_AU\""), m);
        m = failure(HEADER + "1,300,1e-5,100\n2,abc,1e-4,200\n");
        assertTrue(m.startsWith("disk.csv: line 3: field \"T_K\""), m);
        m = failure(HEADER + "1,300,-1e-5,100\n2,200,1e-4,200\n");
        assertTrue(m.startsWith("disk.csv: line 2: field \"P_bar\""), m);
        m = failure(HEADER + "1,300,1e-5\n");
        assertTrue(m.startsWith("disk.csv: line 2: field \"row\""), m);
        m = failure(HEADER + "1,300,1e-5,100\n");
        assertTrue(m.contains("at least 2 rows"), m);
        assertTrue(!m.contains("\n"));
    }

    @Test
    void monotoneCubicIsExactOnLines() {
        MonotoneCubic c = new MonotoneCubic(new double[] {0, 1, 3}, new double[] {1, 3, 7});
        assertEquals(2.0, c.value(0.5), 1e-15);
        assertEquals(6.0, c.value(2.5), 1e-15);
        assertThrows(IllegalArgumentException.class, () -> new MonotoneCubic(new double[] {0, 0}, new double[] {1, 2}));
    }

    @Test
    void flatSegmentsAndRowsGiveTheRowValueBitForBit() {
        // A table held at 400 K over 0.3-5 AU in 5 % steps (the reproduction of a flat disk):
        // every radius, on a row or between rows, must give exactly 400 K and 1e-5 bar, not a value
        // one rounding error away (exact identity of the interpolant on a constant).
        int n = 58;
        double[] r = new double[n];
        double[] t = new double[n];
        double[] p = new double[n];
        double[] s = new double[n];
        for (int i = 0; i < n; i++) {
            r[i] = 0.3 * Math.pow(1.05, i);
            t[i] = 400;
            p[i] = 1e-5;
            s[i] = 1700 * Math.pow(r[i], -1.5);
        }
        TabulatedDisk disk = new TabulatedDisk(r, t, p, s, "flat test disk (invented)");
        java.util.SplittableRandom rng = new java.util.SplittableRandom(3);
        for (int k = 0; k < 20_000; k++) {
            double x = r[0] + (r[n - 1] - r[0]) * rng.nextDouble();
            DiskState st = disk.stateAt(x);
            assertEquals(400.0, st.temperatureK(), 0.0, "T at r = " + x);
            assertEquals(1e-5, st.pressureBar(), 0.0, "P at r = " + x);
        }
        for (int i = 0; i < n; i++) {
            assertEquals(s[i], disk.stateAt(r[i]).sigmaGasGcm2(), 0.0, "Sigma on row " + i);
        }
    }

    @Test
    void monotoneCubicIsExactOnAFlatSegmentAndSmoothElsewhere() {
        MonotoneCubic m = new MonotoneCubic(new double[] {0, 1, 2, 3}, new double[] {5, Math.log(400), Math.log(400), 7});
        for (double x = 1; x <= 2; x += 1.0 / 1024) {
            assertEquals(Math.log(400), m.value(x), 0.0, "x = " + x);
            assertTrue(m.exactNode(x) >= 0);
        }
        assertEquals(-1, m.exactNode(2.5));
        double v = m.value(2.5);
        assertTrue(v > Math.log(400) && v < 7, "monotone between the rows: " + v);
    }
}
