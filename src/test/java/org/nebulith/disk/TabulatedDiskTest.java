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
}
