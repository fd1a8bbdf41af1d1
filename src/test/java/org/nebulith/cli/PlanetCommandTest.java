package org.nebulith.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.Reader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.nebulith.composition.AbundancePresets;
import org.nebulith.disk.DiskModel;
import org.nebulith.disk.DiskPresets;
import org.nebulith.equilibrium.EquilibriumSolver;
import org.nebulith.planet.FormationSettings;
import org.nebulith.planet.PlanetFormation;
import org.nebulith.planet.Quantity;
import org.nebulith.planet.ZonePlanet;
import org.nebulith.report.html.ChromiumProbe;
import org.nebulith.zones.ZoneFileReader;

/** {@code nebulith planet} in-process: outputs read back against the library's results, bad input. */
@Tag("slow")
class PlanetCommandTest {
    @TempDir
    Path dir;
    private final CliRun cli = new CliRun();

    private int run(String... args) {
        return cli.run(args);
    }

    private static List<CSVRecord> read(Path f) throws Exception {
        try (Reader r = Files.newBufferedReader(f)) {
            return CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get().parse(r).getRecords();
        }
    }

    @Test
    void bulkCompositionCsvMatchesTheLibraryResult() throws Exception {
        Path zones = dir.resolve("one.csv");
        Files.writeString(zones, "zone,shape,r_center_AU,half_width_AU\nwarm,tophat,1.5,0.1\n");
        Path outDir = dir.resolve("run");
        assertEquals(0, run("--quiet", "planet", "--composition", "protosolar-lodders2003", "--zones", zones.toString(),
                "--profile-points", "12", "--out", outDir.toString()), cli.err());
        for (String f : List.of("bulk-composition.csv", "comparison.csv", "zone-phases.csv", "radial-profile.csv",
                "report.html", "summary.md", "radial-map.png", "radial-map.svg", "radial-map.pdf",
                "planet-comparison.png")) {
            assertTrue(Files.size(outDir.resolve(f)) > 0, f);
        }
        Map<String, Double> csv = new HashMap<>();
        for (CSVRecord r : read(outDir.resolve("bulk-composition.csv"))) {
            assertEquals("warm", r.get("zone"));
            csv.put(r.get("quantity"), Double.parseDouble(r.get("value")));
        }
        DiskModel disk = DiskPresets.preset(DiskPresets.STEADY_VISCOUS_DEFAULT);
        ZonePlanet zp = new PlanetFormation(FormationSettings.defaults(), new EquilibriumSolver())
                .run(AbundancePresets.preset(AbundancePresets.PROTOSOLAR_LODDERS2003).abundances(), disk,
                        ZoneFileReader.read(Files.newBufferedReader(zones), zones.toString(), disk)).planets().get(0);
        for (Quantity q : zp.planet().require().quantities()) {
            // the CSV holds the shortest decimal that reads back to the same double
            assertEquals(q.value(), csv.get(q.name()), 0.0, q.name());
        }
        if (ChromiumProbe.chromium().isPresent()) {
            ChromiumProbe.Result page = ChromiumProbe.open(outDir.resolve("report.html"), dir);
            assertEquals(3, page.images(), "comparison, devolatilisation pattern and radial map");
            assertEquals(0, page.bad(), "images not decoded");
            assertEquals(0, page.errors(), "errors in the page");
            assertEquals(List.of(), page.console(), "console messages");
            assertTrue(page.overflow() <= 0, "no horizontal overflow: " + page.overflow() + " px");
        }
        List<CSVRecord> profile = read(outDir.resolve("radial-profile.csv"));
        assertEquals(12, profile.size());
        assertFalse(Files.readString(outDir.resolve("radial-profile.csv")).contains("NaN"));
    }

    @Test
    void zoneOutsideTheDiskIsBadInputAndWritesNothing() throws Exception {
        Path zones = dir.resolve("far.csv");
        Files.writeString(zones, "zone,shape,r_center_AU,half_width_AU\nfar,tophat,80,1\n");
        Path outDir = dir.resolve("run");
        assertEquals(2, run("planet", "--zones", zones.toString(), "--out", outDir.toString()));
        String e = cli.err();
        assertTrue(e.contains("far.csv: line 2") && e.contains("r_center_AU"), e);
        assertEquals(1, e.strip().lines().count(), e);
        assertFalse(Files.exists(outDir));
    }

    @Test
    void negativeWidthIsBadInput() throws Exception {
        Path zones = dir.resolve("neg.csv");
        Files.writeString(zones, "zone,shape,r_center_AU,half_width_AU\nneg,gaussian,1.0,-0.1\n");
        assertEquals(2, run("planet", "--zones", zones.toString(), "--out", dir.resolve("run").toString()));
        assertTrue(cli.err().contains("half_width_AU"), cli.err());
        assertFalse(Files.exists(dir.resolve("run")));
    }

    @Test
    void badAbundanceErrorsAreBadInputBeforeAnyComputing() throws Exception {
        Path outDir = dir.resolve("err-run");
        assertEquals(2, run("planet", "--abundance-errors", "Fe=0.05,Xx=0.1", "--out", outDir.toString()));
        String e = cli.err();
        assertTrue(e.contains("--abundance-errors") && e.contains("Xx=0.1"), e);
        assertEquals(1, e.strip().lines().count(), e);
        assertFalse(Files.exists(outDir));
    }

    @Test
    void flatDiskAt400KFinishesWithTheProtosolarRatios() throws Exception {
        // The reproduction of the flat-disk failure: r_AU 0.3 to 5 in 5 % steps, T = 400 K, P = 1e-5 bar,
        // Sigma = 1700 r^-1.5 (an invented test disk), one tophat zone 1.0 +- 0.3 AU. It used to end in
        // "internal error" after 200000 evaluations; the issue asks for it to finish in seconds.
        StringBuilder disk = new StringBuilder("# flat test disk (invented)\nr_AU,T_K,P_bar,sigma_gas_g_cm2\n");
        for (double r = 0.3; r < 5.0; r *= 1.05) {
            disk.append(r).append(",400,1e-5,").append(1700 * Math.pow(r, -1.5)).append('\n');
        }
        disk.append("5,400,1e-5,").append(1700 * Math.pow(5, -1.5)).append('\n');
        Path diskFile = Files.writeString(dir.resolve("that.csv"), disk);
        Path zones = Files.writeString(dir.resolve("that-zones.csv"),
                "zone,shape,r_center_AU,half_width_AU\nbar-zone,tophat,1.0,0.3\n");
        Path outDir = dir.resolve("flat");
        assertEquals(0, run("--quiet", "planet", "--composition", "protosolar-lodders2003", "--disk", diskFile.toString(),
                "--zones", zones.toString(), "--profile-points", "12", "--out", outDir.toString()),
                cli.err());
        Map<String, Double> csv = new HashMap<>();
        for (CSVRecord r : read(outDir.resolve("bulk-composition.csv"))) {
            csv.put(r.get("quantity"), r.get("value").isEmpty() ? null : Double.parseDouble(r.get("value")));
        }
        // Lodders 2003, ApJ 591, 1220, Table 2 (atoms per 1e6 Si): Mg 1.020e6, Fe 8.38e5, Ca 6.287e4, Al 8.41e4
        Map<String, Double> lodders = Map.of("Mg_Si_molar", 1.020, "Fe_Si_molar", 0.838, "Ca_Si_molar", 0.06287,
                "Al_Si_molar", 0.0841);
        lodders.forEach((q, v) -> assertEquals(v, csv.get(q), 0.005 * v, q));
        String report = Files.readString(outDir.resolve("report.html"));
        assertTrue(report.contains("Radial integration") && report.contains("bar-zone: ")
                && report.contains("worst panel"), "run notes on the integral");
    }

    @Test
    void hotEarlyDiskGivesTheRefractoryNoticeAndNoRadiusOrMgNumberForTheCaAlZone() throws Exception {
        // Tessaly-b of the demo system (feeding-zones/demo-system.csv), alone
        Path zones = Files.writeString(dir.resolve("b.csv"),
                "zone,shape,r_center_AU,half_width_AU,planet_mass_Mearth\nTessaly-b,gaussian,0.45,0.05,0.6\n");
        Path outDir = dir.resolve("hot");
        assertEquals(0, run("planet", "--composition", "protosolar-lodders2003", "--disk", "hot-early-disk",
                "--zones", zones.toString(), "--profile-points", "12", "--out", outDir.toString()),
                cli.err());
        String e = cli.err();
        assertTrue(e.contains("notice: zone 'Tessaly-b': its solids are ") && e.contains("% refractory oxides"), e);
        Map<String, String> b = new HashMap<>();
        for (CSVRecord r : read(outDir.resolve("bulk-composition.csv"))) {
            if (r.get("zone").equals("Tessaly-b")) {
                b.put(r.get("quantity"), r.get("value") + " | " + r.get("unit"));
            }
        }
        assertTrue(b.get("radius_Rearth_Zeng2016").startsWith(" | R_earth (for 0.6 M_earth; not applicable: "),
                b.get("radius_Rearth_Zeng2016"));
        assertFalse(b.containsKey("mantle_Mg_number"), "no Mg# for a mantle of Ca-Al oxides: " + b);
        assertFalse(Files.readString(outDir.resolve("bulk-composition.csv")).contains("NaN"));
        assertTrue(Files.readString(outDir.resolve("report.html")).contains("Notice: zone &#39;Tessaly-b&#39;")
                || Files.readString(outDir.resolve("report.html")).contains("Notice: zone 'Tessaly-b'"));
    }
}
