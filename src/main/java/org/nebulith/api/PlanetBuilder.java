package org.nebulith.api;

import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.nebulith.composition.AbundancePresets;
import org.nebulith.composition.ElementAbundances;
import org.nebulith.disk.DiskModel;
import org.nebulith.disk.DiskPresets;
import org.nebulith.equilibrium.EquilibriumSolver;
import org.nebulith.planet.CoreOptions;
import org.nebulith.planet.FormationSettings;
import org.nebulith.planet.PlanetFormation;
import org.nebulith.zones.FeedingZone;
import org.nebulith.zones.ZoneCondensation;
import org.nebulith.zones.ZoneFileReader;

/**
 * The planets of a disk: the gas composition condensed at every radius and integrated over each
 * feeding zone. Defaults, as on the command line: the invented demo star {@code star-tessaly}, the
 * {@code steady-viscous-default} disk, the demo zones {@code feeding-zones/demo-system.csv}, the
 * bundled data, a 300 K floor, sulfides in the core.
 */
public final class PlanetBuilder {
    /** The demo zones, on the classpath. */
    public static final String DEMO_ZONES = "feeding-zones/demo-system.csv";

    private ElementAbundances composition = Compositions.resolve(AbundancePresets.DEMO_STAR);
    private DiskModel disk = DiskPresets.preset(DiskPresets.STEADY_VISCOUS_DEFAULT);
    private List<FeedingZone> zones;
    private Path zoneFile;
    private ThermoData data = ThermoData.bundled();
    private double floorK = FormationSettings.DEFAULT_FLOOR_K;
    private CoreOptions core = CoreOptions.defaults();

    PlanetBuilder() {
    }

    /** @param preset a preset name, an abundance file or inline {@code H=1,O=4.9e-4} @return this */
    public PlanetBuilder composition(String preset) {
        this.composition = Compositions.resolve(preset);
        return this;
    }

    /** @param c the gas element amounts [mol] @return this */
    public PlanetBuilder composition(ElementAbundances c) {
        this.composition = c;
        return this;
    }

    /** @param presetOrFile a disk preset ({@link DiskPresets#NAMES}) or a disk file @return this */
    public PlanetBuilder disk(String presetOrFile) {
        try {
            this.disk = DiskPresets.resolve(presetOrFile);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return this;
    }

    /** @param d a disk model @return this */
    public PlanetBuilder disk(DiskModel d) {
        this.disk = d;
        return this;
    }

    /** @param file a feeding-zone file ({@code zone,shape,r_center_AU,half_width_AU}) @return this */
    public PlanetBuilder zones(Path file) {
        this.zoneFile = file;
        this.zones = null;
        return this;
    }

    /** @param z feeding zones inside the disk's range @return this */
    public PlanetBuilder zones(List<FeedingZone> z) {
        this.zones = List.copyOf(z);
        this.zoneFile = null;
        return this;
    }

    /** @param d the thermodynamic data @return this */
    public PlanetBuilder data(ThermoData d) {
        this.data = d;
        return this;
    }

    /** @param k lowest equilibrium temperature [K], at least 200 @return this */
    public PlanetBuilder floorK(double k) {
        this.floorK = k;
        return this;
    }

    /** @param c core-formation options @return this */
    public PlanetBuilder core(CoreOptions c) {
        this.core = c;
        return this;
    }

    /** @return the planets, in zone order */
    public Planets run() {
        FormationSettings settings = new FormationSettings(data.spec(), ZoneCondensation.defaults(), floorK, core);
        PlanetFormation formation = new PlanetFormation(settings, new EquilibriumSolver());
        return new Planets(formation.run(composition, disk, zones()).planets());
    }

    private List<FeedingZone> zones() {
        if (zones != null) {
            return zones;
        }
        try (Reader r = zoneFile != null ? Files.newBufferedReader(zoneFile, StandardCharsets.UTF_8) : demoZones()) {
            return ZoneFileReader.read(r, zoneFile != null ? zoneFile.toString() : DEMO_ZONES, disk);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static Reader demoZones() throws IOException {
        InputStream in = PlanetBuilder.class.getResourceAsStream("/" + DEMO_ZONES);
        if (in == null) {
            throw new IOException("demo zones missing from the classpath: " + DEMO_ZONES);
        }
        return new InputStreamReader(in, StandardCharsets.UTF_8);
    }
}
