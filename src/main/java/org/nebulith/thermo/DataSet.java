package org.nebulith.thermo;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.function.Predicate;

import org.nebulith.errors.InputException;

/**
 * A named selection of species from a {@link SpeciesDatabase}, the input of an equilibrium
 * calculation. Selections (the reasons are in {@code DATASETS.md} beside the bundled database):
 * <ul>
 * <li>{@value #NASA}: every NASA Glenn entry (gases and condensed);</li>
 * <li>{@value #DEFAULT}: NASA gases; NASA Fe, Ni, Co metal (all phases and liquids) and FeS entries;
 *     the primary mineral-table rows (ds62 and ds62-anchored, plus the single-source rows) and the
 *     ds62 polymorph and extra rows; the NASA condensed entries of every other composition, except
 *     liquids containing oxygen (silicate and oxide melts are not modelled);</li>
 * <li>{@value #REFERENCE_PURE}: the 47 condensed species of the pure-phase reference sequence
 *     (resource {@code reference-pure.txt}) plus every gas.</li>
 * </ul>
 * {@link #withVariant(String)} swaps rows for the alternative rows of one source family, or applies one of
 * the {@link SensitivityVariants}.
 * Instances are immutable.
 */
public final class DataSet {
    /** All NASA Glenn entries. */
    public static final String NASA = "nasa";
    /** The recommended selection. */
    public static final String DEFAULT = "default";
    /** The species of the pure-phase reference sequence. */
    public static final String REFERENCE_PURE = "reference-pure";
    /** The selection names. */
    public static final List<String> NAMES = List.of(NASA, DEFAULT, REFERENCE_PURE);

    private static final List<String> MINERAL_TABLES = List.of("minerals.csv:", "minerals-added.csv:");
    private static final Set<String> DEFAULT_POLYMORPHS = Set.of("protoenstatite", "clinoenstatite", "pseudowollastonite");
    private static final Set<String> NOT_IN_DEFAULT = Set.of("troilite", "high albite");

    private final String name;
    private final SpeciesDatabase database;
    private final List<Species> species;

    private DataSet(String name, SpeciesDatabase database, List<Species> species) {
        this.name = name;
        this.database = database;
        this.species = List.copyOf(species);
    }

    /** @param name a selection name @return the selection from the bundled database */
    public static DataSet named(String name) {
        return named(name, SpeciesDatabase.bundled());
    }

    /**
     * @param name     one of {@link #NAMES}
     * @param database the database to select from (the bundled one or an extension of it)
     * @return the selection
     * @throws IllegalArgumentException for an unknown name
     */
    public static DataSet named(String name, SpeciesDatabase database) {
        List<Species> all = database.species();
        switch (name) {
            case NASA:
                return new DataSet(name, database, filter(all, DataSet::isNasaEntry));
            case DEFAULT:
                return new DataSet(name, database, defaults(all));
            case REFERENCE_PURE:
                Set<String> ids = ReferenceList.condensedIds();
                List<Species> sel = filter(all, s -> (s.isGas() && isNasaEntry(s)) || ids.contains(s.id()));
                if (sel.stream().filter(Species::isCondensed).count() != ids.size()) {
                    throw new IllegalStateException("database lacks some reference species: " + ids);
                }
                return new DataSet(name, database, sel);
            default:
                throw new IllegalArgumentException("unknown data set '" + name + "'; known: " + String.join(", ", NAMES));
        }
    }

    private static List<Species> defaults(List<Species> all) {
        List<Species> minerals = filter(all, s -> isMineralRow(s) && !isNasaForm(s) && !NOT_IN_DEFAULT.contains(s.id())
                && s.variant().isEmpty() && (!s.role().equals("alternative") || DEFAULT_POLYMORPHS.contains(s.id())));
        Set<String> covered = new LinkedHashSet<>();
        minerals.forEach(m -> covered.add(compositionKey(m.formula())));
        List<Species> out = new ArrayList<>();
        for (Species s : all) {
            if (!isNasaEntry(s)) {
                continue;
            }
            if (s.isGas() || isMetal(s) || s.formula().equals(Formula.parse("Fe:1 S:1"))) {
                out.add(s);
            } else if (!(s.state() == Species.State.LIQUID && s.formula().count(Element.O) > 0)
                    && !covered.contains(compositionKey(s.formula()))) {
                out.add(s);
            }
        }
        out.addAll(minerals);
        return out;
    }

    private static boolean isMetal(Species s) {
        Map<Element, Double> c = s.formula().counts();
        return c.size() == 1 && (c.containsKey(Element.Fe) || c.containsKey(Element.Ni) || c.containsKey(Element.Co));
    }

    /** @return true for rows taken from the mineral table (including its NASA-coefficient metal rows) */
    public static boolean isMineralRow(Species s) {
        return MINERAL_TABLES.stream().anyMatch(t -> s.sourceRow().startsWith(t) || s.sourceRow().contains(" via " + t));
    }

    /** @return true for NASA Glenn entries under their NASA names */
    public static boolean isNasaEntry(Species s) {
        return s.source().equals(org.nebulith.thermo.source.SourceKeys.NASA) && !isMineralRow(s);
    }

    private static boolean isNasaForm(Species s) {
        return s.thermo() instanceof Nasa9Model;
    }

    /** @return a key equal for formulas of the same element proportions (MgSiO3 and Mg2Si2O6) */
    static String compositionKey(Formula f) {
        StringBuilder b = new StringBuilder();
        double atoms = f.atoms();
        f.counts().forEach((e, n) -> b.append(e.symbol()).append(':').append(Math.round(n / atoms * 1e9)).append(' '));
        return b.toString();
    }

    private static List<Species> filter(List<Species> all, Predicate<Species> p) {
        List<Species> out = new ArrayList<>();
        for (Species s : all) {
            if (p.test(s)) {
                out.add(s);
            }
        }
        return out;
    }

    /**
     * Replaces every selected row that has an alternative {@code id/variant} by that alternative. A
     * mineral whose default representation is a set of NASA entries (iron, nickel, cobalt: their
     * crystalline NASA phases) has those entries replaced whose temperature range overlaps the usable
     * range of the alternative (RH95 hcp cobalt, valid to 700 K, replaces Co(a) but not Co(b)). Other selected mineral rows of a composition
     * the variant provides, but which have no row of that variant, are dropped (for example ds62
     * tridymite with {@code B88}), so that one composition is not described by two calibrations.
     * Phases the variant does not cover keep their rows: {@code B88} still contains ds62 rows for
     * nepheline, larnite and others, which the caller should report.
     *
     * @param variant a variant tag present in the database ({@link #variants()})
     * @return the new selection
     * @throws IllegalArgumentException for an unknown tag
     */
    public DataSet withVariant(String variant) {
        if (SensitivityVariants.NAMES.contains(variant)) {
            return new DataSet(name + "+" + variant, database, SensitivityVariants.apply(species, database, variant));
        }
        List<Species> alts = filter(database.species(), s -> s.variant().equals(variant) && !variant.isEmpty());
        if (alts.isEmpty()) {
            throw new IllegalArgumentException("no variant '" + variant + "'; known: " + variants());
        }
        Map<String, Species> sel = new LinkedHashMap<>();
        species.forEach(s -> sel.put(s.id(), s));
        Set<String> compositions = new LinkedHashSet<>();
        Set<String> replaced = new LinkedHashSet<>();
        for (Species alt : alts) {
            String base = alt.id().substring(0, alt.id().lastIndexOf('/'));
            Species primary = database.find(base).orElse(null);
            boolean applies = sel.containsKey(base);
            if (!applies && primary != null && isNasaForm(primary) && isMineralRow(primary)) {
                List<String> nasa = new ArrayList<>();
                sel.values().forEach(s -> {
                    if (isNasaEntry(s) && s.state() == Species.State.SOLID && s.formula().equals(primary.formula())
                            && s.thermo().tMinK() < alt.thermo().usableMaxK()
                            && s.thermo().tMaxK() > alt.thermo().usableMinK()) {
                        nasa.add(s.id());
                    }
                });
                nasa.forEach(sel::remove);
                applies = !nasa.isEmpty();
            }
            if (applies) {
                sel.remove(base);
                sel.put(alt.id(), alt);
                replaced.add(base);
                compositions.add(compositionKey(alt.formula()));
            }
        }
        sel.values().removeIf(s -> isMineralRow(s) && !s.variant().equals(variant) && !replaced.contains(s.id())
                && compositions.contains(compositionKey(s.formula()))
                && database.find(s.id() + "/" + variant).isEmpty());
        return new DataSet(name + "+" + variant, database, new ArrayList<>(sel.values()));
    }

    /**
     * @param ids species ids of the database to add
     * @return the selection with them
     * @throws IllegalArgumentException for an unknown id
     */
    public DataSet withSpecies(String... ids) {
        Map<String, Species> sel = new LinkedHashMap<>();
        species.forEach(s -> sel.put(s.id(), s));
        for (String id : ids) {
            sel.put(id, database.get(id));
        }
        return new DataSet(name + "+" + String.join("+", ids), database, new ArrayList<>(sel.values()));
    }

    /**
     * @param ids species ids to leave out
     * @return the selection without them
     * @throws IllegalArgumentException if an id is not in the selection
     */
    public DataSet withoutSpecies(String... ids) {
        Set<String> drop = new LinkedHashSet<>(Arrays.asList(ids));
        for (String id : drop) {
            if (species.stream().noneMatch(s -> s.id().equals(id))) {
                throw new IllegalArgumentException("species '" + id + "' is not in data set " + name);
            }
        }
        return new DataSet(name + "-" + String.join("-", ids), database, filter(species, s -> !drop.contains(s.id())));
    }

    /**
     * @param user species read from a user file (same format as the bundled file)
     * @return this selection plus every species of the user file
     * @throws InputException if a user id is already in the database
     */
    public DataSet plus(SpeciesDatabase user) {
        SpeciesDatabase merged = database.plus(user);
        List<Species> sel = new ArrayList<>(species);
        sel.addAll(user.species());
        return new DataSet(name + "+" + user.name(), merged, sel);
    }

    /** @return the variant tags available in the database, and the {@link SensitivityVariants} */
    public Set<String> variants() {
        Set<String> v = new TreeSet<>(SensitivityVariants.NAMES);
        database.species().forEach(s -> {
            if (!s.variant().isEmpty()) {
                v.add(s.variant());
            }
        });
        return v;
    }

    /** @return a description of the selection, e.g. {@code default+B88} */
    public String name() {
        return name;
    }

    /** @return the database the species come from */
    public SpeciesDatabase database() {
        return database;
    }

    /** @return the selected species, unmodifiable */
    public List<Species> species() {
        return species;
    }

    /** @return the selected gases */
    public List<Species> gases() {
        return filter(species, Species::isGas);
    }

    /** @return the selected condensed species */
    public List<Species> condensed() {
        return filter(species, Species::isCondensed);
    }
}
