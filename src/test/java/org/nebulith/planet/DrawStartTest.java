package org.nebulith.planet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.nebulith.composition.AbundancePresets;
import org.nebulith.composition.ElementAbundances;
import org.nebulith.disk.DiskState;
import org.nebulith.equilibrium.EquilibriumResult;
import org.nebulith.equilibrium.EquilibriumSolver;
import org.nebulith.equilibrium.ResultChecks;
import org.nebulith.thermo.Element;
import org.nebulith.zones.LocalCondensation;

/**
 * A survey draw solved along its star's reference states (first radius from the reference at the same
 * T and P, the second carried along the reference path, later ones extrapolated and corrected by the
 * reference) reaches the same equilibria as the same composition solved on its own from a cold start:
 * the starts change the path, never the answer.
 */
class DrawStartTest {

    /** Radii [AU], midplane temperatures [K] and pressures [bar] like a survey zone's nodes (invented disk). */
    private static final List<DiskState> NODES = List.of(new DiskState(0.90, 801, 2e-4, 100),
            new DiskState(0.93, 784, 1.8e-4, 100), new DiskState(0.95, 768, 1.6e-4, 100),
            new DiskState(0.97, 752, 1.4e-4, 100), new DiskState(0.99, 737, 1.2e-4, 100));

    @Test
    void referenceStartsGiveTheEquilibriaOfAnIndependentSolve() {
        PlanetFormation f = new PlanetFormation(FormationSettings.defaults(), new EquilibriumSolver());
        ElementAbundances nominal = AbundancePresets.preset(AbundancePresets.PROTOSOLAR_LODDERS2003).abundances();
        LocalCondensation reference = f.localCondensation(nominal);
        NODES.forEach(reference::at);
        // a Ca-Al-rich, Si-poor draw (invented), whose assemblage differs from the nominal one
        ElementAbundances draw = nominal.with(Element.Al, 1.35 * nominal.moles(Element.Al))
                .with(Element.Ca, 1.35 * nominal.moles(Element.Ca)).with(Element.Si, 0.8 * nominal.moles(Element.Si))
                .with(Element.Na, 1.2 * nominal.moles(Element.Na));
        LocalCondensation along = f.localCondensation(draw, reference.snapshot());
        LocalCondensation alone = f.localCondensation(draw);
        // the premise: the draw leaves the nominal assemblage (orthopyroxene and rutile give way to
        // nepheline and titanite), so its first radius takes the path of a changed assemblage
        assertNotEquals(reference.at(NODES.get(0)).result().presentPhaseNames(),
                along.at(NODES.get(0)).result().presentPhaseNames(), "the draw changes assemblage");
        for (DiskState s : NODES) {
            EquilibriumResult a = along.at(s).result();
            EquilibriumResult b = alone.at(s).result();
            assertNull(ResultChecks.check(a), "checks at " + s.temperatureK() + " K");
            assertEquals(b.presentPhaseNames(), a.presentPhaseNames(), "assemblage at " + s.temperatureK() + " K");
            for (Element e : List.of(Element.Mg, Element.Si, Element.Fe, Element.Ca, Element.Al, Element.Na,
                    Element.Ti, Element.Cr, Element.O)) {
                // the solver's tolerances (balances 1e-12, potentials 1e-10 RT) bound the difference
                // between two converged solves of one state far below 1e-8
                assertEquals(b.condensedMoles(e), a.condensedMoles(e), 1e-8 * Math.abs(b.condensedMoles(e)) + 1e-300,
                        e + " condensed at " + s.temperatureK() + " K");
            }
        }
    }
}
