package org.nebulith.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code nebulith measured} and {@code nebulith interior} through the command line. */
@Tag("slow")
class MeasuredCommandTest {
    private static final String HEADER = "planet,star,mass_Mearth,mass_err_Mearth,radius_Rearth,radius_err_Rearth\n";

    @TempDir
    Path dir;

    private final CliRun cli = new CliRun();

    private int run(final String... args) {
        return cli.run(args);
    }

    private String err() {
        return cli.err();
    }

    @Test
    void demoPlanetsRunEndToEnd() throws Exception {
        Path o = dir.resolve("demo");
        assertEquals(0, run("measured", "--planets", "presets/demo-planets.csv", "--catalogue",
                "presets/demo-catalogue.csv", "--draws", "200", "--planet-draws", "1500", "--out", o.toString()), err());
        List<String> lines = Files.readAllLines(o.resolve("planets.csv"));
        assertEquals("planet,star,quantity,median,p16,p84,unit", lines.get(0));
        assertTrue(lines.stream().anyMatch(l -> l.startsWith("NDC Kapok b,NDC Kapok,core_mass_fraction_measured,")));
        String html = Files.readString(o.resolve("report.html"));
        assertTrue(html.contains("mass-radius") && html.contains("core-fraction-comparison"), "both charts in the report");
        assertTrue(Files.size(o.resolve("mass-radius.png")) > 1000 && Files.size(o.resolve("core-fraction-comparison.png")) > 1000);
        String text = cli.out();
        assertTrue(text.contains("NDC Alder b (NDC Alder)"), text);
    }

    @Test
    void badPlanetsExitTwoWithOneLineAndWriteNothing() throws Exception {
        String[][] cases = {
            {"b,NDC Alder,-1,0.1,1,0.05", "mass_Mearth"},
            {"b,NDC Alder,0,0.1,1,0.05", "mass_Mearth"},
            {"b,NDC Alder,1,0,1,0.05", "mass_err_Mearth"},
            {"b,NDC Alder,1,0.1,1,-0.05", "radius_err_Rearth"},
            {"b,NDC Alder,1,0.1,4.0,0.05", "larger than any rocky body"},
            {"b,No Such Star,1,0.1,1,0.05", "value \"No Such Star\": unknown star"},
        };
        for (String[] c : cases) {
            Path f = Files.writeString(dir.resolve("p.csv"), HEADER + c[0] + "\n");
            Path o = dir.resolve("never");
            assertEquals(2, run("measured", "--planets", f.toString(), "--catalogue", "presets/demo-catalogue.csv",
                    "--out", o.toString()), c[0] + ": " + err());
            String e = err().strip();
            assertTrue(e.contains(c[1]) && e.contains(f + ": line 2"), e);
            assertEquals(1, e.lines().count(), "one line: " + e);
            assertFalse(Files.exists(o), "nothing written");
        }
    }

    @Test
    void interiorGivesTheEarthRadius() throws Exception {
        Path o = dir.resolve("earth");
        assertEquals(0, run("interior", "--mass-Mearth", "1", "--core-mass-fraction", "0.325", "--out", o.toString()),
                err());
        List<String> profile = Files.readAllLines(o.resolve("interior-profile.csv"));
        assertEquals("r_km,m_Mearth,P_GPa,rho_kg_m3,g_m_s2,layer", profile.get(0));
        double radius = 0;
        for (String l : Files.readAllLines(o.resolve("interior-structure.csv"))) {
            if (l.startsWith("radius_km,")) {
                radius = Double.parseDouble(l.split(",")[1]);
            }
        }
        // PREM (Dziewonski & Anderson 1981): 6371 km
        assertEquals(6371, radius, 0.02 * 6371);
        assertTrue(Files.size(o.resolve("interior-profile.png")) > 1000);
    }

    @Test
    void interiorReadsAZoneOfAPlanetRun() throws Exception {
        Path bulk = Files.writeString(dir.resolve("bulk-composition.csv"), "zone,quantity,value,unit\n"
                + "z,core_mass_fraction,0.28,mass fraction of rock\nz,mantle_Mg_number,90,100 Mg/(Mg+Fe) molar\n"
                + "z,water_mass_fraction,0.05,mass fraction of solids\nz,mantle_SiO2_wt_pct,45,wt_pct\n"
                + "z,mantle_MgO_wt_pct,38,wt_pct\nother,core_mass_fraction,0.9,mass fraction of rock\n");
        assertEquals(0, run("interior", "--mass-Mearth", "2", "--bulk", bulk.toString(), "--zone", "z", "--out",
                dir.resolve("a").toString()), err());
        double mgSi = (38 / 40.304) / (45 / 60.084);
        assertEquals(0, run("interior", "--mass-Mearth", "2", "--core-mass-fraction", "0.28", "--mantle-Mg-number", "90",
                "--water-mass-fraction", "0.05", "--mantle-Mg-Si", Double.toString(mgSi), "--out",
                dir.resolve("b").toString()), err());
        assertEquals(Files.readString(dir.resolve("a/interior-structure.csv")),
                Files.readString(dir.resolve("b/interior-structure.csv")));
        assertEquals(2, run("interior", "--mass-Mearth", "2", "--bulk", bulk.toString(), "--zone", "nope", "--out",
                dir.resolve("c").toString()));
        assertFalse(Files.exists(dir.resolve("c")));
    }

    @Test
    void interiorRefusesBadFractions() {
        assertEquals(2, run("interior", "--mass-Mearth", "1", "--core-mass-fraction", "1.2", "--out",
                dir.resolve("x").toString()));
        assertTrue(err().contains("--core-mass-fraction"), err());
        assertEquals(2, run("interior", "--mass-Mearth", "-1", "--out", dir.resolve("x").toString()));
        assertFalse(Files.exists(dir.resolve("x")));
    }
}
