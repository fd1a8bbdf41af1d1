package org.nebulith.disk;

import static org.nebulith.disk.DiskConstants.AU_CM;
import static org.nebulith.disk.DiskConstants.BAR_DYN_CM2;
import static org.nebulith.disk.DiskConstants.GM_SUN;
import static org.nebulith.disk.DiskConstants.K_B;
import static org.nebulith.disk.DiskConstants.M_H;

/**
 * Vertical hydrostatic balance of a thin, vertically isothermal disk (common practice; e.g.
 * Hayashi 1981, Prog. Theor. Phys. Suppl. 70, 35):
 * c_s^2 = k T / (mu m_H), Omega = sqrt(G M / r^3), H = c_s / Omega,
 * rho_0 = Sigma / (sqrt(2 pi) H), P_0 = rho_0 c_s^2.
 */
public final class Hydrostatic {
    private static final double SQRT_2PI = Math.sqrt(2 * Math.PI);

    private Hydrostatic() {
    }

    /** @return isothermal sound speed squared [cm^2 s^-2] at temperature tK for molecular weight mu */
    public static double soundSpeed2(double tK, double mu) {
        return K_B * tK / (mu * M_H);
    }

    /** @return Keplerian angular velocity [s^-1] at rAU around a star of mStarMsun solar masses */
    public static double omegaKepler(double rAU, double mStarMsun) {
        double r = rAU * AU_CM;
        return Math.sqrt(GM_SUN * mStarMsun / (r * r * r));
    }

    /** @return pressure scale height H = c_s / Omega [cm] */
    public static double scaleHeightCm(double tK, double mu, double rAU, double mStarMsun) {
        return Math.sqrt(soundSpeed2(tK, mu)) / omegaKepler(rAU, mStarMsun);
    }

    /** @return midplane gas density rho_0 = Sigma / (sqrt(2 pi) H) [g cm^-3] */
    public static double midplaneDensity(double sigmaGcm2, double tK, double mu, double rAU, double mStarMsun) {
        return sigmaGcm2 / (SQRT_2PI * scaleHeightCm(tK, mu, rAU, mStarMsun));
    }

    /** @return midplane pressure P_0 = rho_0 c_s^2 [bar] */
    public static double midplanePressureBar(double sigmaGcm2, double tK, double mu, double rAU, double mStarMsun) {
        return midplaneDensity(sigmaGcm2, tK, mu, rAU, mStarMsun) * soundSpeed2(tK, mu) / BAR_DYN_CM2;
    }
}
