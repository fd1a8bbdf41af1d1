package org.nebulith.planet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.Reader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.function.DoubleFunction;

import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.nebulith.composition.AbundancePresets;
import org.nebulith.disk.DiskModel;
import org.nebulith.disk.DiskPresets;
import org.nebulith.equilibrium.EquilibriumSolver;
import org.nebulith.zones.FeedingZone;
import org.nebulith.zones.FrontFinder;
import org.nebulith.zones.LocalCondensation;
import org.nebulith.zones.ZoneCondensation;
import org.nebulith.zones.ZoneFileReader;

/**
 * The condensation fronts of the innermost demo zone, found with the report settings (48 samples,
 * fronts bisected to 1e-7 of the zone width), form an unbroken chain: just outside each front the
 * assemblage is the one found just inside the next, and the zone's two edges close the chain (an
 * identity of a complete front list). Between 0.45 and 0.56 AU the demo disk has eight pairs of fronts
 * closer than one search step (4e-5 to 6e-4 AU apart: a phase appears and another vanishes); a missed
 * one leaves a gap in the chain, and a narrow interval with its own assemblage that the radial
 * quadrature may never sample (it moved the zone's Ca/Si by 1.7e-5).
 */
@Tag("slow")
class FrontCompletenessTest {

    @Test
    void frontsOfTheInnermostDemoZoneFormAnUnbrokenChain() throws IOException {
        DiskModel disk = DiskPresets.preset(DiskPresets.STEADY_VISCOUS_DEFAULT);
        FeedingZone zone;
        try (Reader in = Files.newBufferedReader(Path.of("feeding-zones/demo-system.csv"))) {
            zone = ZoneFileReader.read(in, "demo-system.csv", disk).get(0);
        }
        LocalCondensation local = new PlanetFormation(FormationSettings.defaults(), new EquilibriumSolver())
                .localCondensation(AbundancePresets.preset(AbundancePresets.DEMO_STAR).abundances());
        DoubleFunction<Object> signature = r -> LocalCondensation.signature(local.at(disk.stateAt(r)));
        double lo = zone.rInnerAU();
        double hi = zone.rOuterAU();
        double tol = 1e-7 * (hi - lo);
        List<Double> fronts = FrontFinder.find(lo, hi, ZoneCondensation.DEFAULT_FRONT_SAMPLES, signature, tol);
        assertTrue(fronts.size() >= 12, "fronts " + fronts);
        Object before = signature.apply(lo);
        for (double f : fronts) {
            assertEquals(before, signature.apply(f - tol), "assemblage just inside the front at " + f + " AU");
            before = signature.apply(f + tol);
        }
        assertEquals(before, signature.apply(hi), "assemblage at the outer edge " + hi + " AU");
    }
}
