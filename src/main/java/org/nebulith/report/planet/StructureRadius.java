package org.nebulith.report.planet;

import java.util.Map;

import org.nebulith.errors.Messages;
import org.nebulith.errors.NumericalException;
import org.nebulith.planet.PlanetComposition;
import org.nebulith.planet.interior.CoreComposition;
import org.nebulith.planet.interior.InteriorModel;
import org.nebulith.planet.interior.MantleComposition;
import org.nebulith.planet.interior.StructureException;
import org.nebulith.planet.interior.StructureSolver;

/** The interior-structure radius of a predicted planet, reported beside the Zeng et al. 2016 value. */
final class StructureRadius {
    private static final double MGO = 40.304;
    private static final double SIO2 = 60.084;

    private StructureRadius() {
    }

    /**
     * @param c          the planet's composition (core mass fraction, mantle oxides and Mg#, water, core options)
     * @param massMearth its mass [M_earth]
     * @return the radius of its cold layered structure [R_earth]
     */
    static double of(final PlanetComposition c, final double massMearth) {
        double mg = c.oxides() != null && c.oxides().hasMgNumber() && c.oxides().mgNumber() > 0 ? c.oxides().mgNumber() : 100;
        double mgSi = mg / 100;
        if (c.oxides() != null) {
            Map<String, Double> wt = c.oxides().oxideWtPct();
            if (wt.getOrDefault("MgO", 0.0) > 0 && wt.getOrDefault("SiO2", 0.0) > 0) {
                mgSi = (wt.get("MgO") / MGO) / (wt.get("SiO2") / SIO2);
            }
        }
        double water = Math.min(0.95, c.waterMassFraction());
        InteriorModel model = new InteriorModel(Math.max(InteriorModel.MASS_MIN, Math.min(InteriorModel.MASS_MAX,
                massMearth)), c.coreMassFraction(), water, MantleComposition.of(mgSi, mg),
                new CoreComposition(c.options().coreSiWtPct(), c.options().coreOWtPct()));
        try {
            return new StructureSolver().solve(model).radiusRearth();
        } catch (StructureException e) {
            throw new NumericalException(Messages.STRUCTURE_FAILURE, e, e.getMessage());
        }
    }
}
