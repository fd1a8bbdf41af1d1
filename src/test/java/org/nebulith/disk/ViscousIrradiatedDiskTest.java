package org.nebulith.disk;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;

import org.nebulith.errors.InputException;

import org.junit.jupiter.api.Test;

class ViscousIrradiatedDiskTest {

    private static ViscousIrradiatedDisk disk(double kappaExponent, FlaringIrradiation irr) {
        return new ViscousIrradiatedDisk(1.0, 1.0, 1e-7, 0.01, 2.34, new PowerLawOpacity(0.1, kappaExponent), irr,
                0.1, 30, "test");
    }

    /**
     * Pure viscous heating with constant opacity has a closed form (Pringle 1981 with
     * T^4 = (3/4) tau T_eff^4): T^5 = (3/8) kappa Mdot Omega mu m_H T_eff^4 / (3 pi alpha k).
     */
    @Test
    void viscousLimitMatchesTheClosedForm() {
        ViscousIrradiatedDisk d = disk(0.0, new FlaringIrradiation(1e-3, 1, 1));
        for (double r : new double[] {0.3, 1, 4}) {
            double mdot = 1e-7 * DiskConstants.M_SUN_G / DiskConstants.YEAR_S;
            double omega = Hydrostatic.omegaKepler(r, 1.0);
            double t5 = 0.375 * 0.1 * mdot * omega * 2.34 * DiskConstants.M_H * d.viscousEffectiveTemperature4(r)
                    / (3 * Math.PI * 0.01 * DiskConstants.K_B);
            double expected = Math.pow(t5, 0.2);
            assertEquals(expected, d.temperatureK(r), 1e-9 * expected, "r = " + r);
        }
    }

    @Test
    void solutionSatisfiesTheEnergyBalanceAndTendsToIrradiationOutside() {
        ViscousIrradiatedDisk d = disk(0.5, FlaringIrradiation.chiangGoldreich1997());
        for (double r : new double[] {0.1, 0.5, 1, 3, 10, 30}) {
            DiskState s = d.stateAt(r);
            double tau = 0.1 * Math.sqrt(s.temperatureK()) * s.sigmaGasGcm2() / 2;
            double rhs = 0.75 * tau * d.viscousEffectiveTemperature4(r) + Math.pow(d.irradiationTemperatureK(r), 4);
            assertEquals(1.0, Math.pow(s.temperatureK(), 4) / rhs, 1e-10, "r = " + r);
            assertTrue(s.temperatureK() >= d.irradiationTemperatureK(r));
            assertEquals(s.pressureBar(), Hydrostatic.midplanePressureBar(s.sigmaGasGcm2(), s.temperatureK(), 2.34, r, 1.0),
                    1e-12 * s.pressureBar());
        }
        // inner disk hot (viscous), outer disk within 20 % of the irradiation temperature
        assertTrue(d.temperatureK(0.3) > 1500);
        assertTrue(d.temperatureK(30) < 1.2 * d.irradiationTemperatureK(30));
    }

    /** Chiang & Goldreich 1997: T ~ 150 K (r/AU)^-3/7 for their fiducial star; L^(2/7) M^(-1/7) scaling. */
    @Test
    void irradiationFollowsChiangGoldreich1997() {
        FlaringIrradiation cg = FlaringIrradiation.chiangGoldreich1997();
        double l0 = FlaringIrradiation.CG97_L_REF_LSUN;
        double m0 = FlaringIrradiation.CG97_M_REF_MSUN;
        assertEquals(150.0, cg.temperatureK(1, l0, m0), 1e-12);
        assertEquals(150.0 * Math.pow(8, -3.0 / 7), cg.temperatureK(8, l0, m0), 1e-12);
        assertEquals(Math.pow(2, 2.0 / 7), cg.temperatureK(1, 2 * l0, m0) / 150.0, 1e-14);
        assertEquals(Math.pow(2, -1.0 / 7), cg.temperatureK(1, l0, 2 * m0) / 150.0, 1e-14);
    }

    @Test
    void presetAndParameterFileErrors() throws Exception {
        DiskModel d = DiskPresets.preset(DiskPresets.STEADY_VISCOUS_DEFAULT);
        assertTrue(d.temperatureK(1) > 300 && d.temperatureK(1) < 2000);
        String base = "parameter,value\nmodel,power-law\nT1_K,280\nq,0.5\nsigma1_g_cm2,1700\ns,1.5\n"
                + "r_min_AU,0.1\nr_max_AU,40\n";
        String m = assertThrows(InputException.class,
                () -> DiskPresets.read(new StringReader(base + "pressure,hydrostatic\nM_star_Msun,1\n"), "d.csv")).getMessage();
        assertTrue(m.startsWith("d.csv: line 0: field \"mu\": value \"\": missing"), m);
        m = assertThrows(InputException.class,
                () -> DiskPresets.read(new StringReader(base + "P1_bar,1e-5\np,3\ncolour,red\n"), "d.csv")).getMessage();
        assertTrue(m.startsWith("d.csv: line 11: field \"colour\""), m);
        m = assertThrows(InputException.class,
                () -> DiskPresets.read(new StringReader(base + "P1_bar,x\np,3\n"), "d.csv")).getMessage();
        assertTrue(m.startsWith("d.csv: line 9: field \"P1_bar\""), m);
        m = assertThrows(InputException.class,
                () -> DiskPresets.read(new StringReader("parameter,value\nmodel,spiral\n"), "d.csv")).getMessage();
        assertTrue(m.contains("power-law, viscous-irradiated"), m);
        m = assertThrows(InputException.class,
                () -> DiskPresets.read(new StringReader(base.replace("T1_K,280", "T1_K,-280") + "P1_bar,1\np,3\n"), "d.csv"))
                .getMessage();
        assertTrue(m.contains("T1_K"), m);
    }
}
