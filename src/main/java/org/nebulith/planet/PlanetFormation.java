package org.nebulith.planet;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;

import org.nebulith.composition.ElementAbundances;
import org.nebulith.disk.DiskModel;
import org.nebulith.equilibrium.ChemicalSystem;
import org.nebulith.equilibrium.EquilibriumSolver;
import org.nebulith.progress.Progress;
import org.nebulith.thermo.Element;
import org.nebulith.thermo.Formula;
import org.nebulith.thermo.PieceJumps;
import org.nebulith.thermo.Species;
import org.nebulith.zones.FeedingZone;
import org.nebulith.zones.LocalCondensation;
import org.nebulith.zones.RadialScan;
import org.nebulith.zones.WaterIce;
import org.nebulith.zones.ZoneInventory;

/**
 * From a gas composition, a disk and feeding zones to planets: equilibrium condensation at every
 * radius of each zone, integration of the condensates over the zone, and the bulk planet with its
 * core-mantle split. Chemical systems are built once per set of elements and shared; each call of
 * {@link #run} is a pure function of its arguments and the settings, and is thread-safe.
 */
public final class PlanetFormation {
    private final FormationSettings settings;
    private final EquilibriumSolver solver;
    private final ConcurrentHashMap<Set<Element>, ChemicalSystem> systems = new ConcurrentHashMap<>();
    private final ConcurrentHashMap<ChemicalSystem, Double> continuity = new ConcurrentHashMap<>();

    /**
     * @param settings the settings
     * @param solver   the equilibrium solver
     */
    public PlanetFormation(FormationSettings settings, EquilibriumSolver solver) {
        this.settings = settings;
        this.solver = solver;
    }

    /** @return the settings */
    public FormationSettings settings() {
        return settings;
    }

    /**
     * @param gas   the gas composition (any normalisation)
     * @param disk  the disk
     * @param zones feeding zones inside the disk's range
     * @return the planets, in zone order, and the local condensation used (for radial profiles)
     */
    public Formation run(ElementAbundances gas, DiskModel disk, List<FeedingZone> zones) {
        return run(gas, disk, zones, 0, Progress.none());
    }

    /**
     * The planets and, if asked, the radial profile of the local solids across the zones (from half
     * the innermost zone's inner edge to twice the outermost zone's outer edge, inside the disk's range).
     *
     * @param gas           the gas composition (any normalisation)
     * @param disk          the disk
     * @param zones         feeding zones inside the disk's range
     * @param profilePoints radii of the profile (0 for none, else &gt;= 2)
     * @param progress      advanced once per zone and once for the profile ({@link #steps} in all)
     * @return the planets, in zone order, the profile and the local condensation used
     */
    public Formation run(ElementAbundances gas, DiskModel disk, List<FeedingZone> zones, int profilePoints,
                         Progress progress) {
        if (profilePoints == 1 || profilePoints < 0) {
            throw new IllegalArgumentException("profile points must be 0 or >= 2, got " + profilePoints);
        }
        LocalCondensation local = localCondensation(gas);
        List<ZonePlanet> planets = new ArrayList<>();
        for (FeedingZone z : zones) {
            planets.add(zonePlanet(z, disk, local));
            progress.step();
        }
        List<LocalCondensation.Local> profile = List.of();
        if (profilePoints > 0) {
            profile = RadialScan.scan(disk, local, profileMinAU(disk, zones), profileMaxAU(disk, zones), profilePoints);
            progress.step();
        }
        return new Formation(gas, planets, profile, local);
    }

    /**
     * @param zones         the zones
     * @param profilePoints radii of the profile (0 for none)
     * @return the progress steps of {@link #run(ElementAbundances, DiskModel, List, int, Progress)}
     */
    public static int steps(List<FeedingZone> zones, int profilePoints) {
        return zones.size() + (profilePoints > 0 ? 1 : 0);
    }

    /** @return inner end of the profile [AU]: half the innermost inner edge, inside the disk */
    public static double profileMinAU(DiskModel d, List<FeedingZone> zones) {
        double lo = Double.POSITIVE_INFINITY;
        for (FeedingZone z : zones) {
            lo = Math.min(lo, z.rInnerAU());
        }
        return Math.max(d.rMinAU(), lo / 2);
    }

    /** @return outer end of the profile [AU]: twice the outermost outer edge, inside the disk */
    public static double profileMaxAU(DiskModel d, List<FeedingZone> zones) {
        double hi = 0;
        for (FeedingZone z : zones) {
            hi = Math.max(hi, z.rOuterAU());
        }
        return Math.min(d.rMaxAU(), hi * 2);
    }

    /**
     * @param zone  a feeding zone
     * @param disk  the disk
     * @param local the local condensation of the gas (shared between zones of one run)
     * @return the zone's planet
     */
    public ZonePlanet zonePlanet(FeedingZone zone, DiskModel disk, LocalCondensation local) {
        ZoneInventory inv = settings.integration().integrate(zone, disk, local, continuity(local.system()));
        return new ZonePlanet(inv, PlanetModel.build(condensedPhases(inv), settings.core()));
    }

    /**
     * @param sys a system built here
     * @return the largest jump of G/RT between the NASA-9 pieces of its species at or above the floor
     *         temperature (no equilibrium is computed below it; {@link PieceJumps})
     */
    public double continuity(ChemicalSystem sys) {
        return continuity.computeIfAbsent(sys, s -> {
            Set<Element> els = EnumSet.copyOf(s.elements());
            List<Species> mine = new ArrayList<>();
            for (Species sp : settings.system().species()) {
                if (sp.formula().madeOnlyOf(els)) {
                    mine.add(sp);
                }
            }
            return PieceJumps.largest(mine, settings.floorK());
        });
    }

    /**
     * @param gas the gas composition
     * @return a fresh local-condensation evaluator for one gram of this gas
     */
    public LocalCondensation localCondensation(ElementAbundances gas) {
        return localCondensation(gas, java.util.Collections.emptyNavigableMap());
    }

    /**
     * @param gas       the gas composition
     * @param reference warm-start states of another composition with the same elements
     * @return a fresh local-condensation evaluator for one gram of this gas
     */
    public LocalCondensation localCondensation(ElementAbundances gas,
                                               java.util.NavigableMap<Double, LocalCondensation.Local> reference) {
        Set<Element> els = EnumSet.noneOf(Element.class);
        els.addAll(gas.elements());
        ChemicalSystem sys = systems.computeIfAbsent(els, k -> settings.system().build(k));
        double mass = gas.massGrams();
        double[] b = new double[sys.elementCount()];
        for (int j = 0; j < b.length; j++) {
            b[j] = gas.moles(sys.elements().get(j)) / mass;
        }
        if (!reference.isEmpty() && reference.firstEntry().getValue().result().system() != sys) {
            throw new IllegalArgumentException("warm-start reference belongs to another chemical system");
        }
        return new LocalCondensation(sys, b, solver, settings.floorK(), reference);
    }

    /** @param inv a zone inventory @return its condensed phases for the planet model (solution members as "phase:member") */
    public static List<CondensedPhase> condensedPhases(ZoneInventory inv) {
        ChemicalSystem sys = inv.system();
        List<CondensedPhase> out = new ArrayList<>();
        for (int p = 1; p < sys.phaseCount(); p++) {
            for (int k = 0; k < inv.memberMoles()[p].length; k++) {
                double n = inv.memberMoles()[p][k];
                if (n > 0) {
                    Formula f = formulaOf(sys, p, k);
                    String name = sys.phaseName(p) + (sys.memberNames(p).size() > 1 ? ":" + sys.memberNames(p).get(k) : "");
                    out.add(new CondensedPhase(name, f, n, PhaseClassifier.classify(sys.phaseName(p), f)));
                }
            }
        }
        if (inv.iceMoles() > 0) {
            out.add(new CondensedPhase("water ice", WaterIce.FORMULA, inv.iceMoles(), PhaseKind.ICE));
        }
        return out;
    }

    private static Formula formulaOf(ChemicalSystem sys, int p, int k) {
        double[] a = sys.memberStoichiometry(p, k);
        java.util.Map<Element, Double> m = new java.util.EnumMap<>(Element.class);
        for (int j = 0; j < a.length; j++) {
            if (a[j] > 0) {
                m.put(sys.elements().get(j), a[j]);
            }
        }
        return Formula.of(m);
    }

    /**
     * The result of {@link #run}.
     *
     * @param gas     the gas composition used
     * @param planets one planet per zone
     * @param profile the local states across the zones, inner first (empty if none was asked)
     * @param local   the local condensation (its cache holds every radius solved)
     */
    public record Formation(ElementAbundances gas, List<ZonePlanet> planets, List<LocalCondensation.Local> profile,
                            LocalCondensation local) {
    }
}
