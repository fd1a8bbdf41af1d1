package org.nebulith.cli;

import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;

import org.nebulith.equilibrium.SolutionModel;
import org.nebulith.equilibrium.SolutionModels;
import org.nebulith.equilibrium.SystemSpec;
import org.nebulith.errors.InputException;
import org.nebulith.thermo.DataSet;
import org.nebulith.thermo.SpeciesDatabase;
import org.nebulith.thermo.SpeciesListReader;

import picocli.CommandLine.Option;

/**
 * The options that choose the chemical system: data set, alternative mineral rows (their tags are
 * read from the data set), user species, species restrictions and solutions. Each bad value is
 * reported against its option.
 */
public final class SystemOptions {

    @Option(names = "--data", paramLabel = "SET", defaultValue = DataSet.DEFAULT,
            description = "Thermodynamic data set: default, nasa, reference-pure. Default: ${DEFAULT-VALUE}.")
    private String dataSet;

    @Option(names = "--variant", paramLabel = "TAG",
            description = "Use alternative mineral rows for a sensitivity run: a variant tag of the data set (an "
                    + "unknown tag is refused with the list of the data set's tags); repeatable.")
    private List<String> variants = new ArrayList<>();

    @Option(names = "--species-file", paramLabel = "FILE",
            description = "Add species from a file in the project's species format.")
    private Path speciesFile;

    @Option(names = "--gases", paramLabel = "FILE", description = "Use only the gas ids listed in FILE, one per line.")
    private Path gasList;

    @Option(names = "--condensed", paramLabel = "FILE",
            description = "Use only the condensed ids listed in FILE, one per line.")
    private Path condensedList;

    @Option(names = "--solutions", paramLabel = "LIST",
            description = "Ideal solutions: 'all' (metal, olivine, orthopyroxene, melilite, plagioclase, spinel), "
                    + "'none' (pure phases) or a comma list of those and of the alternative forms olivine-fe-mg "
                    + "(without tephroite), orthopyroxene-mn (with Mn2Si2O6), plagioclase (anorthite-albite, "
                    + "sanidine pure), spinel-hercynite (without chromite). Default: all for the default "
                    + "data set, none otherwise.")
    private String solutions;

    /** The checked selection: data set, user species and id lists read. */
    record Selection(DataSet dataSet, Optional<SpeciesDatabase> user, Optional<Set<String>> gases,
                     Optional<Set<String>> condensed, List<String> solutionNames) {
    }

    /**
     * @param context the run (list and species files are registered as inputs)
     * @return the system specification
     * @throws IOException if a list or species file cannot be read
     */
    public SystemSpec systemSpec(RunContext context) throws IOException {
        Selection s = select(context);
        return new SystemSpec(dataSet, variants, s.user(), s.gases(), s.condensed(), models(s.solutionNames()));
    }

    /** @return the data set name */
    public String dataSet() {
        return dataSet;
    }

    /** @return the variant tags, in order */
    public List<String> variants() {
        return List.copyOf(variants);
    }

    /** @return the user species file, if any */
    public Optional<Path> speciesFile() {
        return Optional.ofNullable(speciesFile);
    }

    /**
     * Checks every option and reads the files they name.
     *
     * @param context the run
     * @return the selection
     * @throws IOException if a file cannot be read
     */
    Selection select(RunContext context) throws IOException {
        if (!DataSet.NAMES.contains(dataSet)) {
            throw InputException.atOption("--data", dataSet, "unknown data set", String.join(", ", DataSet.NAMES));
        }
        DataSet ds = DataSet.named(dataSet);
        for (String v : variants) {
            if (!ds.variants().contains(v)) {
                throw InputException.atOption("--variant", v, "not a variant of data set " + dataSet,
                        String.join(", ", ds.variants()));
            }
        }
        Optional<SpeciesDatabase> user = Optional.empty();
        if (speciesFile != null) {
            Path f = context.input(speciesFile, "species file");
            user = Optional.of(SpeciesDatabase.load(f.toString(), () -> Files.newInputStream(f)));
            ds = ds.plus(user.get());
        }
        Optional<Set<String>> gases = readList(context, gasList, ds, true);
        Optional<Set<String>> condensed = readList(context, condensedList, ds, false);
        return new Selection(ds, user, gases, condensed, solutionNames());
    }

    private static Optional<Set<String>> readList(RunContext context, Path file, DataSet ds, boolean gas)
            throws IOException {
        if (file == null) {
            return Optional.empty();
        }
        Path f = context.input(file, gas ? "gas list" : "condensed list");
        try (Reader r = Files.newBufferedReader(f, StandardCharsets.UTF_8)) {
            return Optional.of(SpeciesListReader.read(r, file.toString(), ds, gas));
        }
    }

    /** @return the solution names, or null for the data set's default */
    private List<String> solutionNames() {
        if (solutions == null) {
            return null;
        }
        if (solutions.equalsIgnoreCase("all")) {
            return SolutionModels.all().stream().map(SolutionModel::name).toList();
        }
        if (solutions.equalsIgnoreCase("none")) {
            return List.of();
        }
        List<String> out = new ArrayList<>();
        Set<String> members = new HashSet<>();
        for (String name : solutions.split(",")) {
            SolutionModel m;
            try {
                m = SolutionModels.byName(name.trim());
            } catch (IllegalArgumentException e) {
                throw InputException.atOption("--solutions", solutions, "unknown solution '" + name.trim() + "'",
                        "all, none, or a comma list of " + SolutionModels.offeredNames());
            }
            for (SolutionModel.EndMember em : m.endMembers()) {
                for (String id : em.speciesIds()) {
                    if (!members.add(id)) {
                        throw InputException.atOption("--solutions", solutions, "species '" + id
                                + "' would be in two solutions",
                                "at most one of the forms of each solution (e.g. olivine or olivine-fe-mg)");
                    }
                }
            }
            out.add(m.name());
        }
        return out;
    }

    private List<SolutionModel> models(List<String> names) {
        if (names == null) {
            return DataSet.DEFAULT.equals(dataSet) ? SolutionModels.all() : List.of();
        }
        return names.stream().map(SolutionModels::byName).toList();
    }
}
