package org.nebulith.thermo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** The sensitivity variants that keep documented alternatives of the data. */
class SensitivityVariantsTest {
    private static final DataSet DEFAULT = DataSet.named(DataSet.DEFAULT);

    private static Species find(DataSet d, String id, boolean gas) {
        return d.species().stream().filter(s -> s.id().equals(id) && s.isGas() == gas).findFirst().orElse(null);
    }

    @Test
    void troiliteReplacesTheNasaFeSEntries() {
        DataSet d = DEFAULT.withVariant(SensitivityVariants.TROILITE_DS62);
        for (String id : new String[] {"FeS(a)", "FeS(b)", "FeS(c)", "FeS(L)"}) {
            assertEquals(null, find(d, id, false), id);
        }
        Species tro = find(d, "troilite", false);
        // Holland & Powell 2011 ds62 'tro': H = -97760 J/mol (thermo-sources minerals.csv)
        assertEquals(-97760, tro.thermo().hJPerMol(298.15), 1e-6);
        assertTrue(DEFAULT.variants().contains(SensitivityVariants.TROILITE_DS62));
    }

    @Test
    void janafLikeAlohChangesOnlyTheEnthalpyOfFormation() {
        DataSet d = DEFAULT.withVariant(SensitivityVariants.ALOH_JANAF);
        Species nasa = find(DEFAULT, "ALOH", true);
        Species janaf = find(d, "ALOH", true);
        // thermo-sources README 9: about -180 kJ/mol (JANAF, from memory) against about -193 kJ/mol (NASA, Gurvich)
        assertEquals(-180000, janaf.thermo().hJPerMol(298.15), 1e-6);
        assertEquals(-193, nasa.thermo().hJPerMol(298.15) / 1000, 1);
        for (double t : new double[] {300, 1000, 1650}) {
            assertEquals(nasa.thermo().sOverR(t), janaf.thermo().sOverR(t), 0);
            assertEquals(nasa.thermo().cpOverR(t), janaf.thermo().cpOverR(t), 0);
            assertEquals(janaf.thermo().hJPerMol(t) - nasa.thermo().hJPerMol(t), -180000 - nasa.thermo().hJPerMol(298.15), 1e-6);
        }
        assertTrue(janaf.sourceRow().contains("variant AlOH-JANAF"));
        assertFalse(d.species().stream().anyMatch(s -> s == nasa));
    }

    @Test
    void aVariantThatDoesNotApplyIsRefused() {
        DataSet noFeS = DEFAULT.withoutSpecies("FeS(a)", "FeS(b)", "FeS(c)", "FeS(L)");
        assertThrows(IllegalArgumentException.class, () -> noFeS.withVariant(SensitivityVariants.TROILITE_DS62));
    }
}
