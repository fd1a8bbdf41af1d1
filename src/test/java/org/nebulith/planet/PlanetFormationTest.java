package org.nebulith.planet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.nebulith.composition.AbundancePresets;
import org.nebulith.composition.ElementAbundances;
import org.nebulith.disk.DiskModel;
import org.nebulith.disk.DiskPresets;
import org.nebulith.disk.PowerLawDisk;
import org.nebulith.equilibrium.EquilibriumSolver;
import org.nebulith.zones.FeedingZone;
import org.nebulith.zones.KernelShape;
import org.nebulith.zones.RadialIntegrator;
import org.nebulith.zones.ZoneCondensation;

/** Checks of the disk-to-planet pipeline. */
@Tag("slow")
class PlanetFormationTest {
    private static final ElementAbundances PROTOSOLAR =
            AbundancePresets.preset(AbundancePresets.PROTOSOLAR_LODDERS2003).abundances();
    private static final PlanetFormation FORMATION =
            new PlanetFormation(FormationSettings.defaults(), new EquilibriumSolver());

    /** An isothermal, isobaric test disk: every radius has the same (T, P); invented for the test. */
    private static DiskModel flat(double tK, double pBar) {
        return new PowerLawDisk(tK, 0, pBar, 0, 1000, 1.5, 0.2, 5, "isothermal test disk (invented)");
    }

    private static ZonePlanet one(DiskModel disk, FeedingZone zone) {
        return FORMATION.run(PROTOSOLAR, disk, List.of(zone)).planets().get(0);
    }

    @Test
    void coldZoneKeepsTheRefractoryRatiosOfTheGas() {
        // Mass balance (an identity): where Mg, Si, Fe, Ca, Al are fully condensed, the planet has the
        // gas ratios. MMSN (Hayashi 1981) at 2.5-3.5 AU lies below 300 K, where all of them are condensed.
        ZonePlanet zp = one(DiskPresets.preset(DiskPresets.MMSN_HAYASHI1981),
                new FeedingZone("cold", KernelShape.TOPHAT, 3.0, 0.5, OptionalDouble.empty()));
        Map<String, Double> planet = zp.planet().require().molarRatios();
        Map<String, Double> gas = MolarRatios.of(PROTOSOLAR);
        for (String q : List.of("Mg_Si_molar", "Fe_Si_molar", "Ca_Si_molar", "Al_Si_molar")) {
            assertEquals(gas.get(q), planet.get(q), 0.005 * gas.get(q), q);
        }
    }

    @Test
    void coldZoneKeepsAllTheIron() {
        // Mass balance: with FeCl3 gas at its Chase 1998 enthalpy (corrections.csv) no Fe stays in the gas
        // below 300 K; with the published 4.184-times value 0.21 % stayed as FeCl3 and Fe/Si was 0.2 % low
        ZonePlanet zp = one(DiskPresets.preset(DiskPresets.MMSN_HAYASHI1981),
                new FeedingZone("cold", KernelShape.TOPHAT, 3.0, 0.5, OptionalDouble.empty()));
        double gas = MolarRatios.of(PROTOSOLAR).get("Fe_Si_molar");
        assertEquals(gas, zp.planet().require().molarRatios().get("Fe_Si_molar"), 1e-4 * gas);
    }

    @Test
    void coldZoneMantleHoldsTheManganeseAndPotassiumOfTheGas() {
        // Mass balance: Mn (in olivine as tephroite) and K (in feldspar as sanidine) are fully condensed
        // in a zone below 300 K (MMSN, Hayashi 1981, 2.5-3.5 AU), so the mantle has the gas Mn/Si and K/Si;
        // Lodders 2003 Table 8 via nhmc/Barak: Mn hosted by forsterite + enstatite, K by feldspar
        ZonePlanet zp = one(DiskPresets.preset(DiskPresets.MMSN_HAYASHI1981),
                new FeedingZone("cold", KernelShape.TOPHAT, 3.0, 0.5, OptionalDouble.empty()));
        PlanetComposition c = zp.planet().require();
        for (org.nebulith.thermo.Element e : List.of(org.nebulith.thermo.Element.Mn, org.nebulith.thermo.Element.K)) {
            double gas = PROTOSOLAR.moles(e) / PROTOSOLAR.moles(org.nebulith.thermo.Element.Si);
            double mantle = c.mantle().moles(e) / c.bulk().moles(org.nebulith.thermo.Element.Si);
            assertEquals(gas, mantle, 0.005 * gas, e + " in the mantle per bulk Si");
        }
    }

    @Test
    void zoneHotterThanTheFirstCondensateGivesANoticeNotNaN() {
        ZonePlanet zp = one(flat(2500, 1e-4), new FeedingZone("hot", KernelShape.TOPHAT, 1.0, 0.2, OptionalDouble.empty()));
        assertFalse(zp.planet().hasSolids());
        assertTrue(zp.planet().notice().startsWith("no solids"), zp.planet().notice());
        assertFalse(zp.inventory().hasSolids());
    }

    @Test
    void protosolarMetalWithoutTroiliteGivesAnEarthLikeCoreMassFraction() {
        // Proto-solar gas (Lodders 2003) at 1000 K, 1e-4 bar: Fe, Mg, Si condensed, troilite not yet stable
        // (it forms near 670 K). Bulk Earth: core mass fraction 0.325 (McDonough 2003); accepted
        // here: 0.30-0.36.
        ZonePlanet zp = one(flat(1000, 1e-4), new FeedingZone("warm", KernelShape.TOPHAT, 1.0, 0.2, OptionalDouble.empty()));
        PlanetComposition c = zp.planet().require();
        assertEquals(0.0, c.molarRatios().get("S_Si_molar"), 1e-6);
        double cmf = c.coreMassFraction();
        assertTrue(cmf > 0.30 && cmf < 0.36, "core mass fraction " + cmf);
    }

    @Test
    void doublingTheResolutionChangesMgSiAndFeSiByLessThan1e4() {
        // A zone that straddles the silicate and metal condensation fronts of the default demo disk.
        DiskModel disk = DiskPresets.preset(DiskPresets.STEADY_VISCOUS_DEFAULT);
        FeedingZone zone = new FeedingZone("fronts", KernelShape.GAUSSIAN, 0.6, 0.05, OptionalDouble.empty());
        PlanetFormation fine = new PlanetFormation(FormationSettings.defaults().withIntegration(
                new ZoneCondensation(new RadialIntegrator(1e-9, 8, 4, 400_000), 96, 1e-9)), new EquilibriumSolver());
        Map<String, Double> a = FORMATION.run(PROTOSOLAR, disk, List.of(zone)).planets().get(0).planet().require().molarRatios();
        Map<String, Double> b = fine.run(PROTOSOLAR, disk, List.of(zone)).planets().get(0).planet().require().molarRatios();
        for (String q : List.of("Mg_Si_molar", "Fe_Si_molar")) {
            assertEquals(b.get(q), a.get(q), 1e-4 * b.get(q), q);
        }
    }

    @Test
    void elementBudgetOfAZoneEqualsThePhaseSums() {
        // Identity: the planet's element amounts are the sums over its phases.
        ZonePlanet zp = one(flat(1000, 1e-4), new FeedingZone("warm", KernelShape.TOPHAT, 1.0, 0.2, OptionalDouble.empty()));
        PlanetComposition c = zp.planet().require();
        ElementAbundances sum = ElementAbundances.empty();
        for (CondensedPhase p : PlanetFormation.condensedPhases(zp.inventory())) {
            sum = sum.plus(ElementAbundances.of(scaled(p)));
        }
        for (var e : c.bulk().elements()) {
            assertEquals(sum.moles(e), c.bulk().moles(e), 1e-12 * c.bulk().moles(e), e.symbol());
        }
    }

    private static Map<org.nebulith.thermo.Element, Double> scaled(CondensedPhase p) {
        Map<org.nebulith.thermo.Element, Double> m = new java.util.EnumMap<>(org.nebulith.thermo.Element.class);
        p.formula().counts().forEach((e, n) -> m.put(e, n * p.moles()));
        return m;
    }
}
