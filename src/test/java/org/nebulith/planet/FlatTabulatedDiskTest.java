package org.nebulith.planet;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.function.DoubleUnaryOperator;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.nebulith.composition.AbundancePresets;
import org.nebulith.composition.ElementAbundances;
import org.nebulith.disk.TabulatedDisk;
import org.nebulith.equilibrium.EquilibriumSolver;
import org.nebulith.zones.FeedingZone;
import org.nebulith.zones.KernelShape;

/**
 * Tabulated disks held at one temperature where the thermodynamic data change piece or polymorph
 * (Ni(cr) pieces meet at 400 K, FeS polymorphs change at 411 and 598 K, Co(b) and Fe(a) pieces at
 * 800 and 1042 K in the NASA Glenn data): every radius of the zone has the same state, so the zone
 * collects what the gas condenses there, and at these temperatures (1e-5 bar) Mg, Si, Fe, Ca and Al
 * are condensed; the planet then has the gas's ratios. Invented test disks (our own scenario).
 */
class FlatTabulatedDiskTest {
    private static final ElementAbundances PROTOSOLAR =
            AbundancePresets.preset(AbundancePresets.PROTOSOLAR_LODDERS2003).abundances();
    private static final PlanetFormation FORMATION =
            new PlanetFormation(FormationSettings.defaults(), new EquilibriumSolver());
    /**
     * Proto-solar (recommended solar-system) abundances, atoms per 1e6 Si: Lodders 2003, ApJ 591, 1220,
     * Table 2: Mg 1.020e6, Fe 8.38e5, Ca 6.287e4, Al 8.41e4.
     */
    private static final Map<String, Double> LODDERS2003_TABLE2 = Map.of("Mg_Si_molar", 1.020, "Fe_Si_molar", 0.838,
            "Ca_Si_molar", 0.06287, "Al_Si_molar", 0.0841);

    /** The reproduction's disk: r_AU 0.3 to 5 in 5 % steps, P 1e-5 bar, Sigma = 1700 r^-1.5 g cm^-2. */
    static TabulatedDisk table(DoubleUnaryOperator tOfR) {
        List<Double> r = new ArrayList<>();
        for (double x = 0.3; x < 5.0; x *= 1.05) {
            r.add(x);
        }
        r.add(5.0);
        int n = r.size();
        double[] rr = new double[n];
        double[] t = new double[n];
        double[] p = new double[n];
        double[] s = new double[n];
        for (int i = 0; i < n; i++) {
            rr[i] = r.get(i);
            t[i] = tOfR.applyAsDouble(rr[i]);
            p[i] = 1e-5;
            s[i] = 1700 * Math.pow(rr[i], -1.5);
        }
        return new TabulatedDisk(rr, t, p, s, "flat test disk (invented)");
    }

    private static void assertProtosolarRatios(TabulatedDisk disk) {
        FeedingZone zone = new FeedingZone("bar-zone", KernelShape.TOPHAT, 1.0, 0.3, OptionalDouble.empty());
        ZonePlanet zp = FORMATION.run(PROTOSOLAR, disk, List.of(zone)).planets().get(0);
        Map<String, Double> planet = zp.planet().require().molarRatios();
        for (Map.Entry<String, Double> e : LODDERS2003_TABLE2.entrySet()) {
            // within 0.5 % of Lodders 2003, Table 2 (values above)
            assertEquals(e.getValue(), planet.get(e.getKey()), 0.005 * e.getValue(), e.getKey());
        }
    }

    @ParameterizedTest
    @ValueSource(doubles = {400, 411, 598, 800, 1042})
    void flatDiskAtADataBoundaryGivesTheProtosolarRatios(double tK) {
        assertProtosolarRatios(table(r -> tK));
    }

    @Test
    void plateauAt400KGivesTheProtosolarRatios() {
        // T falls as r^-1/2 to 400 K at 0.8 AU, stays at 400 K to 1.25 AU, then falls again: the zone
        // (0.7-1.3 AU) crosses both ends of the plateau.
        assertProtosolarRatios(table(r -> r < 0.8 ? 400 * Math.pow(r / 0.8, -0.5)
                : r <= 1.25 ? 400 : 400 * Math.pow(r / 1.25, -0.5)));
    }
}
