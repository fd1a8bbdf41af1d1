package org.nebulith.golden;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Tag;
import org.nebulith.api.Nebulith;
import org.nebulith.api.Planet;
import org.nebulith.thermo.Element;

/**
 * The demo planets (star-tessaly, steady-viscous-default disk, demo zones, bundled data, 300 K floor):
 * bulk element wt%, molar ratios and core mass fraction of each zone, to 1e-6 relative.
 */
@Tag("slow")
class DemoPlanetGoldenTest extends GoldenFileTest {

    @Override
    protected String fileName() {
        return "demo-planet-bulk.csv";
    }

    @Override
    protected List<String> header() {
        return List.of("source: nebulith planet with its defaults (composition star-tessaly, disk"
                        + " steady-viscous-default, zones feeding-zones/demo-system.csv, data set default, floor 300 K)",
                "validated against: the bulk Earth and CI chondrite comparison (ReferenceComparisonTest) and"
                        + " the element mass balance of the zones (PlanetFormationTest) when frozen",
                "units: bulk_wt_pct_<zone>_<element> [wt%], <ratio>_<zone> [mol/mol], core_mass_fraction_<zone>;"
                        + " tolerance 1e-6 relative (1e-9 wt% absolute floor)");
    }

    @Override
    protected Map<String, Double> compute() {
        Map<String, Double> out = new LinkedHashMap<>();
        for (Planet p : Nebulith.planet().run().list()) {
            if (!p.hasSolids()) {
                continue;
            }
            for (Element e : Element.values()) {
                double w = p.bulkWtPct(e.symbol());
                if (w > 0) {
                    out.put("bulk_wt_pct_" + p.zone() + "_" + e.symbol(), w);
                }
            }
            p.molarRatios().forEach((k, v) -> out.put(k + "_" + p.zone(), v));
            out.put("core_mass_fraction_" + p.zone(), p.coreMassFraction());
        }
        return out;
    }

    @Override
    protected double tolerance(String key, double expected) {
        return Math.max(1e-6 * Math.abs(expected), 1e-9);
    }
}
