package org.nebulith.planet.interior;

import java.util.ArrayList;
import java.util.List;

/**
 * The iron core with optional light elements, as the planet command's core options give them:
 * Si is carried as FeSi and O as FeO, mixed with iron by ideal volume mixing. Ni and S are
 * counted as iron (caution: S lowers the density more than this allows).
 *
 * @param siWtPct Si in the core [wt%]
 * @param oWtPct  O in the core [wt%]
 */
public record CoreComposition(double siWtPct, double oWtPct) {
    public CoreComposition {
        if (!(siWtPct >= 0) || !(oWtPct >= 0) || fraction(siWtPct, Materials.M_FESI / Materials.M_SI)
                + fraction(oWtPct, Materials.M_FEO / Materials.M_O) > 1) {
            throw new IllegalArgumentException("core Si and O must be >= 0 wt% and leave some metallic iron (FeSi + FeO"
                    + " <= 100 wt%), got Si " + siWtPct + ", O " + oWtPct);
        }
    }

    /** @return pure iron */
    public static CoreComposition pureIron() {
        return new CoreComposition(0, 0);
    }

    private static double fraction(final double wtPct, final double carrierPerElement) {
        return wtPct / 100 * carrierPerElement;
    }

    /** @return the core's equation of state */
    public EquationOfState equationOfState() {
        double feSi = fraction(siWtPct, Materials.M_FESI / Materials.M_SI);
        double feO = fraction(oWtPct, Materials.M_FEO / Materials.M_O);
        if (feSi == 0 && feO == 0) {
            return Materials.IRON;
        }
        List<IdealVolumeMix.Component> parts = new ArrayList<>();
        if (1 - feSi - feO > 0) {
            parts.add(new IdealVolumeMix.Component(1 - feSi - feO, Materials.IRON));
        }
        if (feSi > 0) {
            parts.add(new IdealVolumeMix.Component(feSi, Materials.IRON_SILICIDE));
        }
        if (feO > 0) {
            parts.add(new IdealVolumeMix.Component(feO, Materials.WUESTITE));
        }
        return new IdealVolumeMix("Fe core (" + siWtPct + " wt% Si, " + oWtPct + " wt% O)", parts);
    }
}
