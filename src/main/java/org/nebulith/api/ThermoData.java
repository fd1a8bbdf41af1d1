package org.nebulith.api;

import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.nebulith.equilibrium.SolutionModel;
import org.nebulith.equilibrium.SolutionModels;
import org.nebulith.equilibrium.SystemSpec;
import org.nebulith.thermo.DataSet;
import org.nebulith.thermo.SpeciesDatabase;

/**
 * The thermodynamic data of a calculation: a bundled data set ({@link DataSet#NAMES}), optionally
 * with alternative mineral rows (tags of the data set, {@link #availableVariants()}), species from
 * the caller's own files (the project's species format, see {@code src/main/resources} and the
 * contributors' guide) and a choice of ideal solutions. Immutable; each {@code with..}/{@code plus}
 * returns a new object.
 *
 * <pre>{@code
 * ThermoData data = ThermoData.bundled().plus(Path.of("my-minerals.csv")).withSolutions("metal", "olivine");
 * }</pre>
 */
public final class ThermoData {
    private final String dataSet;
    private final List<String> variants;
    private final SpeciesDatabase user;
    private final List<SolutionModel> solutions;

    private ThermoData(String dataSet, List<String> variants, SpeciesDatabase user, List<SolutionModel> solutions) {
        this.dataSet = dataSet;
        this.variants = List.copyOf(variants);
        this.user = user;
        this.solutions = List.copyOf(solutions);
    }

    /** @return the default data set with every ideal solution (what the command line uses) */
    public static ThermoData bundled() {
        return named(DataSet.DEFAULT);
    }

    /**
     * @param name a bundled data set: {@code default}, {@code nasa} or {@code reference-pure}
     * @return it, with every solution for {@code default} and pure phases otherwise
     * @throws IllegalArgumentException for an unknown name
     */
    public static ThermoData named(String name) {
        if (!DataSet.NAMES.contains(name)) {
            throw new IllegalArgumentException("unknown data set '" + name + "'; known: " + DataSet.NAMES);
        }
        return new ThermoData(name, List.of(), null,
                DataSet.DEFAULT.equals(name) ? SolutionModels.all() : List.of());
    }

    /**
     * @param speciesFile a species file of the caller (same columns as the bundled species.csv)
     * @return this data plus every species of the file
     * @throws org.nebulith.errors.InputException naming file, line and field for a malformed file
     * @throws UncheckedIOException if the file cannot be read
     */
    public ThermoData plus(Path speciesFile) {
        SpeciesDatabase more = SpeciesDatabase.load(speciesFile.toString(), () -> Files.newInputStream(speciesFile));
        SpeciesDatabase merged = user == null ? more : user.plus(more);
        DataSet.named(dataSet).plus(merged);
        return new ThermoData(dataSet, variants, merged, solutions);
    }

    /**
     * @param tag an alternative-row tag of this data set ({@link #availableVariants()})
     * @return this data with those rows in place of the primary ones
     * @throws IllegalArgumentException for a tag the data set does not have
     */
    public ThermoData withVariant(String tag) {
        if (!availableVariants().contains(tag)) {
            throw new IllegalArgumentException("no variant '" + tag + "' in data set " + dataSet + "; known: "
                    + availableVariants());
        }
        List<String> v = new ArrayList<>(variants);
        v.add(tag);
        return new ThermoData(dataSet, v, user, solutions);
    }

    /**
     * @param names solution names ({@code metal, olivine, orthopyroxene, melilite, plagioclase,
     *              spinel-hercynite}); none gives pure phases only
     * @return this data with exactly those solutions
     */
    public ThermoData withSolutions(String... names) {
        List<SolutionModel> s = new ArrayList<>();
        for (String n : names) {
            s.add(SolutionModels.byName(n));
        }
        return new ThermoData(dataSet, variants, user, s);
    }

    /** @return the alternative-row tags the data set offers, as read from its rows */
    public List<String> availableVariants() {
        return List.copyOf(DataSet.named(dataSet).variants());
    }

    /** @return the specification the solvers use */
    public SystemSpec spec() {
        return new SystemSpec(dataSet, variants, Optional.ofNullable(user), Optional.empty(), Optional.empty(),
                solutions);
    }

    /** @return e.g. {@code default+B88 + my-minerals.csv, solutions [metal, olivine]} */
    @Override
    public String toString() {
        StringBuilder b = new StringBuilder(dataSet);
        variants.forEach(v -> b.append('+').append(v));
        if (user != null) {
            b.append(" + ").append(user.name());
        }
        b.append(", solutions ").append(solutions.stream().map(SolutionModel::name).toList());
        return b.toString();
    }
}
