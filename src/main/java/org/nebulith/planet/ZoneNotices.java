package org.nebulith.planet;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.nebulith.zones.IntegrationQuality;

/**
 * The cautions a zone's planet needs beside its numbers: solids that are mostly refractory oxides
 * (a zone inside the silicate front, whose "planet" is a Ca-Al-rich condensate, not a rock of the
 * usual kind), more solids than the planet mass the zone file states, and a radial integral whose
 * error stopped falling somewhere.
 */
public final class ZoneNotices {
    /** Mass fraction of refractory oxides (CaO, Al2O3, TiO2) in the solids above which a notice is given. */
    public static final double REFRACTORY_LIMIT = 0.5;
    /** Earth mass [g] (IAU 2015 nominal GM_earth / G, common practice). */
    public static final double EARTH_MASS_G = 5.9722e27;

    private ZoneNotices() {
    }

    /**
     * @param zp a zone planet
     * @return its notices, each one sentence, in a fixed order (empty if none)
     */
    public static List<String> of(ZonePlanet zp) {
        List<String> out = new ArrayList<>();
        String zone = zp.zoneName();
        if (zp.planet().hasSolids()) {
            PlanetComposition c = zp.planet().require();
            double refractory = c.refractoryOxideFraction();
            if (refractory > REFRACTORY_LIMIT) {
                out.add(String.format(Locale.ROOT, "zone '%s': its solids are %.0f %% refractory oxides (CaO, Al2O3,"
                        + " TiO2): a Ca-Al-rich condensate from gas hotter than the silicate and metal fronts, not a"
                        + " rocky planet of the usual kind; no mass-radius estimate", zone, 100 * refractory));
            }
            double solidsMearth = c.bulk().massGrams() / EARTH_MASS_G;
            zp.inventory().zone().planetMassMearth().ifPresent(m -> {
                if (solidsMearth > m) {
                    out.add(String.format(Locale.ROOT, "zone '%s': it collects %.3g Earth masses of solids, more than"
                            + " the planet mass of %s Earth masses in the zone file: the zone's width or the disk's"
                            + " surface density does not fit that planet (the composition does not depend on it)",
                            zone, solidsMearth, m));
                }
            });
        }
        IntegrationQuality q = zp.inventory().quality();
        if (q != null && q.acceptedPanels() > 0) {
            out.add(String.format(Locale.ROOT, "zone '%s': %d panel(s) of the radial integration were accepted where"
                    + " their error stopped falling when halved (the thermodynamic data's pieces meet with small"
                    + " jumps); worst panel %.6g-%.6g AU (r = %.6g AU), estimated error %.2g relative", zone,
                    q.acceptedPanels(), q.worstLoAU(), q.worstHiAU(), q.worstRadiusAU(), q.worstRelError()));
        }
        return out;
    }
}
