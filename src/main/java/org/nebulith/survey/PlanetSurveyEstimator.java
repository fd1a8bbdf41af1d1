package org.nebulith.survey;

import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.NavigableMap;
import java.util.concurrent.atomic.AtomicLong;

import org.nebulith.composition.ElementAbundances;
import org.nebulith.composition.SolarReference;
import org.nebulith.disk.DiskModel;
import org.nebulith.disk.DiskPresets;
import org.nebulith.equilibrium.EquilibriumSolver;
import org.nebulith.planet.FormationSettings;
import org.nebulith.planet.PlanetComposition;
import org.nebulith.planet.PlanetFormation;
import org.nebulith.planet.Quantity;
import org.nebulith.planet.ZonePlanet;
import org.nebulith.zones.FeedingZone;
import org.nebulith.zones.LocalCondensation;
import org.nebulith.zones.ZoneCondensation;
import org.nebulith.zones.ZoneFileReader;

/**
 * The planet estimate of one survey draw: the same pipeline as {@code nebulith planet} (equilibrium
 * condensation across each feeding zone, core-mantle split) with integration settings suited to
 * Monte Carlo ({@link ZoneCondensation#fast()}). Every draw is warm-started from fixed reference
 * states of the solar composition at the zone radii, never from an earlier draw, so a draw's result
 * is a pure function of its composition whatever thread computes it.
 */
public final class PlanetSurveyEstimator implements PlanetEstimator {
    /** Default disk of surveys. */
    public static final String DEFAULT_DISK = DiskPresets.STEADY_VISCOUS_DEFAULT;
    /** Default zone file of surveys (classpath copy of the top-level folder). */
    public static final String DEFAULT_ZONES = "feeding-zones/survey-default.csv";
    /**
     * Quantities reported per zone, in this order; one that does not apply (no solids, no rock for a
     * core mass fraction, no Si for a ratio to Si, no Mg and Fe in the mantle for Mg#, no mantle for
     * its oxides) is marked {@link Quantity#notApplicable}, never 0. An oxide absent from a mantle
     * that exists is a true 0.
     */
    public static final List<String> QUANTITIES = List.of("Mg_Si_molar", "Fe_Si_molar", "Ca_Si_molar",
            "Al_Si_molar", "Ti_Si_molar", "Ni_Fe_molar", "S_Si_molar", "O_Si_molar", "core_mass_fraction",
            "mantle_Mg_number", "ice_mass_fraction", "mantle_SiO2_wt_pct", "mantle_MgO_wt_pct", "mantle_FeO_wt_pct",
            "mantle_Al2O3_wt_pct", "mantle_CaO_wt_pct");

    private final PlanetFormation formation;
    private final DiskModel disk;
    private final List<FeedingZone> zones;
    private final NavigableMap<Double, LocalCondensation.Local> reference;
    private final Counters counters;

    /** Benchmark counters shared by the estimator and the per-star estimators made from it. */
    private static final class Counters {
        final AtomicLong equilibria = new AtomicLong();
        final AtomicLong estimateNanos = new AtomicLong();
        final AtomicLong firstNanos = new AtomicLong();
    }

    private PlanetSurveyEstimator(PlanetFormation formation, DiskModel disk, List<FeedingZone> zones,
                                  ElementAbundances nominal, NavigableMap<Double, LocalCondensation.Local> start,
                                  Counters counters) {
        this.formation = formation;
        this.disk = disk;
        this.zones = zones;
        this.counters = counters;
        LocalCondensation ref = formation.localCondensation(nominal, start);
        for (FeedingZone z : zones) {
            formation.zonePlanet(z, disk, ref);
        }
        counters.equilibria.addAndGet(ref.equilibriaSolved());
        this.reference = ref.snapshot();
    }

    /**
     * The estimator for one star: reference states of the star's nominal composition (reached by
     * warm starts from the solar references), from which its draws start.
     */
    @Override
    public PlanetEstimator near(ElementAbundances nominal) {
        return new PlanetSurveyEstimator(formation, disk, zones, nominal, reference, counters);
    }

    /**
     * @param settings the survey settings (disk and zones, null for the defaults; solar reference; planet
     *                 options: data set, variants, species, solutions, floor temperature, core)
     * @return the estimator
     * @throws IOException if a disk or zone file cannot be read
     */
    public static PlanetSurveyEstimator create(SurveySettings settings) throws IOException {
        DiskModel d = DiskPresets.resolve(settings.disk() == null ? DEFAULT_DISK : settings.disk());
        List<FeedingZone> z = readZones(settings.zones(), d);
        FormationSettings fs = settings.planet().settings(ZoneCondensation.fast());
        checkDomain(settings.disk() == null ? DEFAULT_DISK : settings.disk(), d, z, fs);
        PlanetFormation f = new PlanetFormation(fs, new EquilibriumSolver());
        return new PlanetSurveyEstimator(f, d, z, settings.solar().abundances(),
                java.util.Collections.emptyNavigableMap(), new Counters());
    }

    /** The disk must stay inside the data's temperatures and the model's pressures where equilibria are computed. */
    private static void checkDomain(String diskName, DiskModel d, List<FeedingZone> zones, FormationSettings fs) {
        if (zones.isEmpty()) {
            return;
        }
        double lo = Double.POSITIVE_INFINITY;
        double hi = 0;
        for (FeedingZone zone : zones) {
            lo = Math.min(lo, zone.rInnerAU());
            hi = Math.max(hi, zone.rOuterAU());
        }
        List<org.nebulith.thermo.Species> species = fs.system().species();
        String problem = org.nebulith.zones.DiskDomain.problem(d, lo, hi, fs.floorK(), species);
        if (problem != null) {
            throw org.nebulith.errors.InputException.atOption("--disk", diskName, problem, "a disk whose T stays within "
                    + org.nebulith.equilibrium.StateDomain.temperatureRange(
                            org.nebulith.equilibrium.StateDomain.minTemperatureK(species),
                            org.nebulith.equilibrium.StateDomain.maxTemperatureK(species))
                    + " and P within " + org.nebulith.equilibrium.StateDomain.pressureRange() + " above the floor temperature");
        }
    }

    /**
     * @param disk  the disk, already read
     * @param zones the feeding zones, already read
     * @param solar the solar reference (warm-start composition)
     * @return an estimator for exactly this disk and these zones
     */
    public static PlanetSurveyEstimator of(DiskModel disk, List<FeedingZone> zones, SolarReference solar) {
        PlanetFormation f = new PlanetFormation(FormationSettings.defaults().withIntegration(ZoneCondensation.fast()),
                new EquilibriumSolver());
        return new PlanetSurveyEstimator(f, disk, List.copyOf(zones), solar.abundances(),
                java.util.Collections.emptyNavigableMap(), new Counters());
    }

    /**
     * @param settings the survey settings (disk, null for the default; solar reference; planet options; its
     *                 zones are not read)
     * @param zones    the zones to estimate
     * @return the estimator
     */
    public static PlanetSurveyEstimator create(SurveySettings settings, List<FeedingZone> zones) throws IOException {
        DiskModel d = DiskPresets.resolve(settings.disk() == null ? DEFAULT_DISK : settings.disk());
        FormationSettings fs = settings.planet().settings(ZoneCondensation.fast());
        checkDomain(settings.disk() == null ? DEFAULT_DISK : settings.disk(), d, zones, fs);
        PlanetFormation f = new PlanetFormation(fs, new EquilibriumSolver());
        return new PlanetSurveyEstimator(f, d, List.copyOf(zones), settings.solar().abundances(),
                java.util.Collections.emptyNavigableMap(), new Counters());
    }

    private static List<FeedingZone> readZones(String file, DiskModel d) throws IOException {
        if (file != null) {
            try (Reader r = Files.newBufferedReader(Path.of(file), StandardCharsets.UTF_8)) {
                return ZoneFileReader.read(r, file, d);
            }
        }
        InputStream in = PlanetSurveyEstimator.class.getResourceAsStream("/" + DEFAULT_ZONES);
        if (in == null) {
            throw new UncheckedIOException(new IOException("default survey zones missing: " + DEFAULT_ZONES));
        }
        try (Reader r = new InputStreamReader(in, StandardCharsets.UTF_8)) {
            return ZoneFileReader.read(r, DEFAULT_ZONES, d);
        }
    }

    @Override
    public LinkedHashMap<String, List<Quantity>> estimate(ElementAbundances gas) {
        long start = System.nanoTime();
        LocalCondensation local = formation.localCondensation(gas, reference);
        LinkedHashMap<String, List<Quantity>> out = new LinkedHashMap<>();
        for (FeedingZone z : zones) {
            out.put(z.name(), quantities(formation.zonePlanet(z, disk, local)));
        }
        counters.equilibria.addAndGet(local.equilibriaSolved());
        counters.firstNanos.addAndGet(local.firstSolveNanos());
        counters.estimateNanos.addAndGet(System.nanoTime() - start);
        return out;
    }

    /** @param zp a zone planet @return the fixed list of quantities (marked where one does not apply) */
    static List<Quantity> quantities(ZonePlanet zp) {
        Map<String, Quantity> have = new LinkedHashMap<>();
        boolean mantle = false;
        if (zp.planet().hasSolids()) {
            PlanetComposition c = zp.planet().require();
            for (Quantity q : c.quantities()) {
                have.put(q.name(), q);
                mantle |= q.name().startsWith("mantle_") && q.name().endsWith("_wt_pct");
            }
        }
        List<Quantity> out = new ArrayList<>();
        for (String name : QUANTITIES) {
            Quantity q = have.get(name);
            if (q != null) {
                out.add(q);
            } else if (mantle && name.startsWith("mantle_") && name.endsWith("_wt_pct")) {
                out.add(new Quantity(name, 0.0, unitOf(name)));
            } else {
                out.add(Quantity.notApplicable(name, unitOf(name)));
            }
        }
        return out;
    }

    private static String unitOf(String name) {
        if (name.endsWith("_molar")) {
            return "mol/mol";
        }
        if (name.endsWith("_wt_pct")) {
            return "wt_pct";
        }
        switch (name) {
            case "core_mass_fraction":
                return "mass fraction of rock";
            case "mantle_Mg_number":
                return "100 Mg/(Mg+Fe) molar";
            default:
                return "mass fraction of solids";
        }
    }

    @Override
    public long equilibria() {
        return counters.equilibria.get();
    }

    @Override
    public long estimateNanos() {
        return counters.estimateNanos.get();
    }

    @Override
    public long firstEquilibriumNanos() {
        return counters.firstNanos.get();
    }

    /** @return the zones */
    public List<FeedingZone> zones() {
        return zones;
    }
}
