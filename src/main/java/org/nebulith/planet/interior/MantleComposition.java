package org.nebulith.planet.interior;

import java.util.ArrayList;
import java.util.List;

/**
 * The silicate mantle as the interior model sees it: its Mg# and its (Mg+Fe)/Si molar ratio. Fe
 * replaces Mg at the same molar volume in every phase (density scaled by the molar mass, common
 * practice for a first estimate; K0 and K0' of the Mg end-member), with the same Mg# in every phase
 * (no Fe-Mg partitioning). Ca, Al, Na and Ti are left out (a few wt% in Earth's mantle).
 *
 * <p>Phases per mole of Si, R = (Mg+Fe)/Si: above 23 GPa bridgmanite MSiO3 with (R - 1) MO
 * ferropericlase (R &ge; 1) or with (1 - R) SiO2 (R &lt; 1); at lower pressure olivine M2SiO4 and
 * pyroxene MSiO3 (1 &le; R &le; 2), olivine and MO (R &gt; 2), or pyroxene and SiO2 (R &lt; 1).
 * Above 125 GPa post-bridgmanite replaces bridgmanite.
 *
 * @param mgNumber    100 Mg/(Mg+Fe) molar, in (0, 100]
 * @param cationsPerSi (Mg+Fe)/Si molar, in [0.5, 4]
 */
public record MantleComposition(double mgNumber, double cationsPerSi) {
    public MantleComposition {
        if (!(mgNumber > 0 && mgNumber <= 100)) {
            throw new IllegalArgumentException("mantle Mg# must be in (0, 100], got " + mgNumber);
        }
        if (!(cationsPerSi >= 0.5 && cationsPerSi <= 4)) {
            throw new IllegalArgumentException("mantle (Mg+Fe)/Si must be in [0.5, 4], got " + cationsPerSi);
        }
    }

    /** @return pure MgSiO3 (Mg# 100, (Mg+Fe)/Si = 1), the convention of the published mass-radius curves */
    public static MantleComposition magnesiumSilicate() {
        return new MantleComposition(100, 1);
    }

    /**
     * @param mgOverSiMolar the mantle's molar Mg/Si
     * @param mgNumber      its Mg#
     * @return the mantle, with (Mg+Fe)/Si = (Mg/Si) / (Mg#/100), clamped into the accepted range
     */
    public static MantleComposition of(final double mgOverSiMolar, final double mgNumber) {
        double r = mgOverSiMolar / (mgNumber / 100);
        return new MantleComposition(mgNumber, Math.max(0.5, Math.min(4, r)));
    }

    private double iron() {
        return 1 - mgNumber / 100;
    }

    /** @param pressurePa pressure [Pa] @return the mantle phase region at that pressure */
    public static LayerKind regionAt(final double pressurePa) {
        if (pressurePa >= Materials.POST_BRIDGMANITE_PA) {
            return LayerKind.MANTLE_POST_BRIDGMANITE;
        }
        return pressurePa >= Materials.UPPER_TO_LOWER_MANTLE_PA ? LayerKind.MANTLE_BRIDGMANITE
                : LayerKind.MANTLE_OLIVINE_PYROXENE;
    }

    /** @param region a mantle region @return its assemblage's equation of state */
    public EquationOfState equationOfState(final LayerKind region) {
        double r = cationsPerSi;
        List<double[]> amounts = new ArrayList<>(); // {moles, Mg-end-member molar mass, cations per formula}
        List<BirchMurnaghan3> eos = new ArrayList<>();
        switch (region) {
            case MANTLE_POST_BRIDGMANITE:
            case MANTLE_BRIDGMANITE: {
                BirchMurnaghan3 perovskite = region == LayerKind.MANTLE_BRIDGMANITE ? Materials.BRIDGMANITE
                        : Materials.POST_BRIDGMANITE;
                add(amounts, eos, Math.min(r, 1), Materials.M_MGSIO3, 1, perovskite);
                add(amounts, eos, r - 1, Materials.M_MGO, 1, Materials.PERICLASE);
                add(amounts, eos, 1 - r, Materials.M_SIO2, 0, Materials.STISHOVITE);
                break;
            }
            case MANTLE_OLIVINE_PYROXENE: {
                if (r >= 2) {
                    add(amounts, eos, 1, Materials.M_MG2SIO4, 2, Materials.FORSTERITE);
                    add(amounts, eos, r - 2, Materials.M_MGO, 1, Materials.PERICLASE);
                } else if (r >= 1) {
                    add(amounts, eos, r - 1, Materials.M_MG2SIO4, 2, Materials.FORSTERITE);
                    add(amounts, eos, 2 - r, Materials.M_MGSIO3, 1, Materials.ENSTATITE);
                } else {
                    add(amounts, eos, r, Materials.M_MGSIO3, 1, Materials.ENSTATITE);
                    add(amounts, eos, 1 - r, Materials.M_SIO2, 0, Materials.STISHOVITE);
                }
                break;
            }
            default:
                throw new IllegalArgumentException("not a mantle region: " + region);
        }
        return mix(region, amounts, eos);
    }

    private static void add(List<double[]> amounts, List<BirchMurnaghan3> eos, double moles, double molarMass,
                            double cations, BirchMurnaghan3 e) {
        if (moles > 1e-12) {
            amounts.add(new double[] {moles, molarMass, cations});
            eos.add(e);
        }
    }

    private EquationOfState mix(LayerKind region, List<double[]> amounts, List<BirchMurnaghan3> eos) {
        double x = iron();
        double total = 0;
        double[] mass = new double[amounts.size()];
        for (int i = 0; i < mass.length; i++) {
            double[] a = amounts.get(i);
            mass[i] = a[0] * (a[1] + a[2] * x * Materials.DM_FE_MG);
            total += mass[i];
        }
        List<IdealVolumeMix.Component> parts = new ArrayList<>();
        for (int i = 0; i < mass.length; i++) {
            double[] a = amounts.get(i);
            double factor = (a[1] + a[2] * x * Materials.DM_FE_MG) / a[1];
            parts.add(new IdealVolumeMix.Component(mass[i] / total, factor == 1 ? eos.get(i)
                    : eos.get(i).scaled(eos.get(i).name() + " (Mg# " + mgNumber + ")", factor)));
        }
        return parts.size() == 1 ? parts.get(0).eos() : new IdealVolumeMix(region.label(), parts);
    }
}
