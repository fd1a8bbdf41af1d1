package org.nebulith.planet;

import java.io.IOException;
import java.io.Serializable;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Set;

import org.nebulith.equilibrium.SolutionModel;
import org.nebulith.equilibrium.SolutionModels;
import org.nebulith.equilibrium.SystemSpec;
import org.nebulith.thermo.DataSet;
import org.nebulith.thermo.SpeciesDatabase;
import org.nebulith.zones.ZoneCondensation;

/**
 * Every option of a planet estimate as plain, serializable values (names, file paths, numbers), so
 * that a survey can carry them to each star, on this machine or on a cluster, and build the same
 * {@link FormationSettings} there ({@link #settings(ZoneCondensation)}).
 *
 * @param dataSet       data set name ({@link DataSet#NAMES})
 * @param variants      alternative-row tags, in order (read from the data set: {@link DataSet#variants()})
 * @param speciesFile   a user species file to add, or null
 * @param gasIds        only these gas ids, or null for all
 * @param condensedIds  only these condensed ids, or null for all
 * @param solutions     solution names ({@link SolutionModels#all()}), or null for the data set's default
 *                      (all for the default data set, none otherwise)
 * @param floorK        lowest equilibrium temperature [K], &gt;= 200
 * @param sulfideInCore whether sulfides join the core
 * @param coreSiWtPct   Si in the core [wt% of the core]
 * @param coreOWtPct    O in the core [wt% of the core]
 */
public record FormationOptions(String dataSet, List<String> variants, String speciesFile, List<String> gasIds,
                               List<String> condensedIds, List<String> solutions, double floorK,
                               boolean sulfideInCore, double coreSiWtPct, double coreOWtPct) implements Serializable {
    private static final long serialVersionUID = 1L;

    /** Checks the values (an {@link IllegalArgumentException} names the one at fault). */
    public FormationOptions {
        variants = List.copyOf(variants);
        gasIds = gasIds == null ? null : List.copyOf(gasIds);
        condensedIds = condensedIds == null ? null : List.copyOf(condensedIds);
        solutions = solutions == null ? null : List.copyOf(solutions);
        if (!DataSet.NAMES.contains(dataSet)) {
            throw new IllegalArgumentException("unknown data set '" + dataSet + "'; known: " + DataSet.NAMES);
        }
        new FormationSettings(SystemSpec.pure(dataSet), ZoneCondensation.defaults(), floorK,
                new CoreOptions(sulfideInCore, coreSiWtPct, coreOWtPct));
    }

    /** @return the default data set and solutions, 300 K floor, sulfides in the core, no Si or O in it */
    public static FormationOptions defaults() {
        CoreOptions core = CoreOptions.defaults();
        return new FormationOptions(DataSet.DEFAULT, List.of(), null, null, null, null,
                FormationSettings.DEFAULT_FLOOR_K, core.sulfideInCore(), core.coreSiWtPct(), core.coreOWtPct());
    }

    /** @param k floor temperature [K] @return a copy with it */
    public FormationOptions withFloorK(double k) {
        return new FormationOptions(dataSet, variants, speciesFile, gasIds, condensedIds, solutions, k,
                sulfideInCore, coreSiWtPct, coreOWtPct);
    }

    /** @return the solution models these options enable */
    public List<SolutionModel> solutionModels() {
        if (solutions == null) {
            return DataSet.DEFAULT.equals(dataSet) ? SolutionModels.all() : List.of();
        }
        List<SolutionModel> out = new ArrayList<>();
        for (String name : solutions) {
            out.add(SolutionModels.byName(name));
        }
        return out;
    }

    /**
     * @param integration the zone integration to use (e.g. {@link ZoneCondensation#fast()} for surveys)
     * @return the settings of a planet estimate
     * @throws IOException if the species file cannot be read
     */
    public FormationSettings settings(ZoneCondensation integration) throws IOException {
        Optional<SpeciesDatabase> user = Optional.empty();
        if (speciesFile != null) {
            Path f = Path.of(speciesFile);
            user = Optional.of(SpeciesDatabase.load(speciesFile, () -> Files.newInputStream(f)));
        }
        SystemSpec spec = new SystemSpec(dataSet, variants, user, Optional.ofNullable(gasIds).map(Set::copyOf),
                Optional.ofNullable(condensedIds).map(Set::copyOf), solutionModels());
        return new FormationSettings(spec, integration, floorK, new CoreOptions(sulfideInCore, coreSiWtPct,
                coreOWtPct));
    }
}
