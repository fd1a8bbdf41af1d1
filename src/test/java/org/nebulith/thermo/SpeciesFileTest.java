package org.nebulith.thermo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.nebulith.errors.InputException;
import org.nebulith.thermo.source.DatabaseConverter;

/** The species file: regeneration from the sources, user files, and one-line errors for bad input. */
class SpeciesFileTest {
    private static final String HEAD = "# source MINE: invented test data\n"
            + "id,state,formula,source,source_row,role,variant,form,T_min_K,T_max_K,params\n";
    private static final String GOOD = "mymineral,solid,Mg:1 O:1,MINE,test:1,primary,,hp,298.15,,"
            + "H_f_298=-600000;S_298=27;a=60;b=0;c=0;d=0\n";

    private static SpeciesDatabase load(String text) {
        return SpeciesDatabase.load("user.csv", () -> new ByteArrayInputStream(text.getBytes(StandardCharsets.UTF_8)));
    }

    @Test
    void regeneratingFromTheSourcesGivesTheCommittedFile() throws IOException {
        Path dir = Path.of("src", "data", "thermo-sources");
        String regenerated = DatabaseConverter.convert(dir);
        byte[] committed = getClass().getResourceAsStream("species.csv").readAllBytes();
        assertEquals(new String(committed, StandardCharsets.UTF_8), regenerated);
    }

    @Test
    void userFileAddsSpecies() {
        SpeciesDatabase user = load(HEAD + GOOD);
        DataSet d = DataSet.named(DataSet.DEFAULT).plus(user);
        Species s = d.database().get("mymineral");
        // Cp = 60 J/mol/K constant: H(1000) = H_f + 60 (1000 - 298.15), exact
        assertEquals(-600000 + 60 * (1000 - 298.15), s.thermo().hJPerMol(1000), 1e-6);
        assertTrue(d.species().contains(s));
        assertThrows(InputException.class, () -> DataSet.named(DataSet.DEFAULT).plus(load(HEAD
                + GOOD.replace("mymineral", "forsterite"))));
    }

    private static String error(String text) {
        return assertThrows(InputException.class, () -> load(text)).getMessage();
    }

    @Test
    void malformedRowsGiveOneLineNamingFileLineAndField() {
        String m = error(HEAD + GOOD.replace("298.15", "abc"));
        assertEquals("user.csv: line 3: field \"T_min_K\": value \"abc\": not a finite number; accepted: a temperature > 0 in K", m);
        assertTrue(error(HEAD + GOOD.replace("MINE", "OTHER")).startsWith("user.csv: line 3: field \"source\":"));
        assertTrue(error(HEAD + GOOD.replace("Mg:1", "Xq:1")).startsWith("user.csv: line 3: field \"formula\":"));
        assertTrue(error(HEAD + GOOD.replace(";d=0", ";d=0;zz=1")).startsWith("user.csv: line 3: field \"params\": value \"") && error(HEAD + GOOD.replace(";d=0", ";d=0;zz=1")).contains("unknown key zz"));
        assertTrue(error(HEAD + GOOD.replace(";d=0", "")).contains("missing key d"));
        assertTrue(error(HEAD + GOOD.replace(",solid,", ",plasma,")).startsWith("user.csv: line 3: field \"state\":"));
        assertTrue(error(HEAD + GOOD + GOOD).startsWith("user.csv: line 4: field \"id\": value \"mymineral\": already defined on line 3"));
        assertTrue(error(HEAD.replace("params", "parameters") + GOOD).startsWith("user.csv: line 2: field \"header\":"));
        assertTrue(error(HEAD + "x,gas,H:2,MINE,t,primary,,nasa9,200,1000,1 2 3\n")
                .startsWith("user.csv: line 3: field \"params\""));
        for (String msg : new String[] {m}) {
            assertTrue(!msg.contains("\n"), "one line");
        }
    }
}
