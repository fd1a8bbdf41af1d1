package org.nebulith.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.nebulith.equilibrium.EquilibriumResult;
import org.nebulith.errors.InputException;

/** The library surface: lookups by name agree with the indexed results, data from the caller's files. */
class LibraryApiTest {

    @TempDir
    Path dir;

    @Test
    void lookupsByNameAgreeWithTheIndexedResult() {
        State s = Nebulith.state().temperatureK(1300).solve();
        EquilibriumResult r = s.result();
        for (int p : r.presentCondensedPhases()) {
            assertEquals(r.phaseMoles(p), s.moles(r.system().phaseName(p)), 0.0, r.system().phaseName(p));
        }
        assertTrue(s.moles("forsterite") > 0 && s.moles("forsterite") < s.moles("olivine"), s.toString());
        assertEquals(0.0, s.moles("no-such-phase"));
        assertTrue(s.condensedFraction("Al") > 0.9, "Al condensed at 1300 K, 1e-4 bar (common practice)");
        assertThrows(IllegalArgumentException.class, () -> s.condensedFraction("Xx"));
    }

    @Test
    void thermoDataTakesTheCallersSpeciesFileAndChecksVariants() throws Exception {
        Path mine = Files.writeString(dir.resolve("mine.csv"), "# source MINE: an invented calibration\n"
                + "id,state,formula,source,source_row,role,variant,form,T_min_K,T_max_K,params\n"
                + "mine-periclase,solid,Mg:1 O:1,MINE,t:1,primary,,hp,298.15,,"
                + "H_f_298=-600000;S_298=27;a=60;b=0;c=0;d=0\n");
        ThermoData data = ThermoData.bundled().plus(mine);
        assertTrue(data.toString().contains("mine.csv"), data.toString());
        assertTrue(data.spec().species().stream().anyMatch(sp -> sp.id().equals("mine-periclase")));
        assertThrows(IllegalArgumentException.class, () -> ThermoData.bundled().withVariant("NOPE"));
        assertTrue(ThermoData.bundled().availableVariants().contains("B88"));
        assertThrows(InputException.class, () -> ThermoData.bundled().plus(Files.writeString(dir.resolve("bad.csv"),
                "id,state\n")));
    }
}
