package org.nebulith.disk;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class PowerLawDiskTest {
    private final DiskModel mmsn = PowerLawDisk.mmsnHayashi1981();

    /** Hayashi 1981, Prog. Theor. Phys. Suppl. 70, 35: Sigma = 1700 (r/AU)^-3/2, T = 280 (r/AU)^-1/2. */
    @Test
    void mmsnFollowsHayashi1981() {
        assertEquals(280.0, mmsn.temperatureK(1.0), 1e-12);
        assertEquals(1700.0, mmsn.sigmaGasGcm2(1.0), 1e-9);
        assertEquals(140.0, mmsn.temperatureK(4.0), 1e-9);
        assertEquals(1700.0 / 8, mmsn.sigmaGasGcm2(4.0), 1e-9);
    }

    /**
     * Midplane density rho = Sigma / (sqrt(2 pi) H) with H = c_s / Omega and its exponent -11/4 (exact
     * identities; Hayashi 1981's 1.4e-9 g cm^-3 at 1 AU is printed beside it, report only, as the value is
     * recalled); and the pressure exponent 13/4 of P = Sigma c_s Omega / sqrt(2 pi) (exact identity).
     */
    @Test
    void mmsnMidplaneDensityAndPressureFromHydrostaticBalance() {
        double rho1 = Hydrostatic.midplaneDensity(1700, 280, 2.34, 1.0, 1.0);
        // report only: Hayashi's 1.4e-9 g cm^-3 is recalled, not read from a stored copy of the paper
        System.out.printf("MMSN midplane density at 1 AU: %.3g g cm^-3 (Hayashi 1981, from memory: 1.4e-9)%n", rho1);
        double h = Math.sqrt(1.380649e-16 * 280 / (2.34 * 1.6735575e-24)) / Math.sqrt(1.3271244e26 / Math.pow(1.495978707e13, 3));
        assertEquals(1700 / (Math.sqrt(2 * Math.PI) * h), rho1, 1e-12 * rho1, "rho = Sigma / (sqrt(2 pi) H) (exact identity)");
        double rho3 = Hydrostatic.midplaneDensity(mmsn.sigmaGasGcm2(3.0), mmsn.temperatureK(3.0), 2.34, 3.0, 1.0);
        assertEquals(Math.pow(3.0, -11.0 / 4), rho3 / rho1, 1e-12);
        // independent evaluation of P = Sigma c_s Omega / sqrt(2 pi), cgs constants written out (CODATA 2018, IAU 2015)
        for (double r : new double[] {0.3, 1.0, 7.0}) {
            double t = mmsn.temperatureK(r);
            double cs = Math.sqrt(1.380649e-16 * t / (2.34 * 1.6735575e-24));
            double rc = r * 1.495978707e13;
            double omega = Math.sqrt(1.3271244e26 / (rc * rc * rc));
            double p = mmsn.sigmaGasGcm2(r) * cs * omega / Math.sqrt(2 * Math.PI) / 1e6;
            assertEquals(p, mmsn.pressureBar(r), 1e-12 * p);
        }
        assertEquals(3.25, ((PowerLawDisk) mmsn).pressureExponent(), 1e-15);
        assertEquals(1.34e-5, mmsn.pressureBar(1.0), 0.01e-5);
    }

    @Test
    void presetFileEqualsTheCodedMmsnAndHotDiskIsHot() {
        DiskModel file = DiskPresets.preset(DiskPresets.MMSN_HAYASHI1981);
        for (double r : new double[] {0.1, 0.7, 1, 5.5, 40}) {
            DiskState a = file.stateAt(r);
            DiskState b = mmsn.stateAt(r);
            assertEquals(b.temperatureK(), a.temperatureK(), 1e-12 * b.temperatureK());
            assertEquals(b.pressureBar(), a.pressureBar(), 1e-12 * b.pressureBar());
            assertEquals(b.sigmaGasGcm2(), a.sigmaGasGcm2(), 1e-12 * b.sigmaGasGcm2());
        }
        DiskModel hot = DiskPresets.preset(DiskPresets.HOT_EARLY_DISK);
        assertTrue(hot.temperatureK(hot.rMinAU()) > 1500, "inner hot disk must exceed 1500 K");
        assertTrue(hot.description().contains("invented"));
    }

    @Test
    void outsideTheRangeIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> mmsn.temperatureK(0.05));
        assertThrows(IllegalArgumentException.class, () -> mmsn.stateAt(41));
        assertThrows(IllegalArgumentException.class,
                () -> new PowerLawDisk(-1, 0.5, 1, 1, 1, 1, 0.1, 1, "bad"));
    }
}
