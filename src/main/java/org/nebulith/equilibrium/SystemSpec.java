package org.nebulith.equilibrium;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;

import org.nebulith.thermo.DataSet;
import org.nebulith.thermo.Element;
import org.nebulith.thermo.Species;
import org.nebulith.thermo.SpeciesDatabase;

/**
 * Which species and solutions make up a chemical system: a named data set, optional alternative
 * mineral rows, optional user species, optional restrictions of the gases and condensed species
 * to listed ids, and the ideal solutions to enable (none gives the pure-phase mode). Immutable;
 * {@link #build(Set)} makes the {@link ChemicalSystem} for a set of elements.
 *
 * @param dataSet         name of the data set ({@link DataSet#NAMES})
 * @param variants        alternative-row tags to apply, in order
 * @param userSpecies     extra species from a user file, if any
 * @param gasIds          if present, only these gas ids
 * @param condensedIds    if present, only these condensed ids
 * @param solutions       solutions to enable
 */
public record SystemSpec(String dataSet, List<String> variants, Optional<SpeciesDatabase> userSpecies,
                         Optional<Set<String>> gasIds, Optional<Set<String>> condensedIds,
                         List<SolutionModel> solutions) {

    public SystemSpec {
        variants = List.copyOf(variants);
        solutions = List.copyOf(solutions);
        gasIds = gasIds.map(Set::copyOf);
        condensedIds = condensedIds.map(Set::copyOf);
    }

    /** @return the default data set with every standard solution */
    public static SystemSpec defaults() {
        return new SystemSpec(DataSet.DEFAULT, List.of(), Optional.empty(), Optional.empty(), Optional.empty(),
                SolutionModels.all());
    }

    /** @param name data set name @return the data set in pure-phase mode, all species */
    public static SystemSpec pure(String name) {
        return new SystemSpec(name, List.of(), Optional.empty(), Optional.empty(), Optional.empty(), List.of());
    }

    /** @param s solutions to enable @return a copy with those solutions */
    public SystemSpec withSolutions(List<SolutionModel> s) {
        return new SystemSpec(dataSet, variants, userSpecies, gasIds, condensedIds, s);
    }

    /** @return the selected species, before restriction to the elements of a system */
    public List<Species> species() {
        DataSet ds = DataSet.named(dataSet);
        for (String v : variants) {
            ds = ds.withVariant(v);
        }
        if (userSpecies.isPresent()) {
            ds = ds.plus(userSpecies.get());
        }
        List<Species> out = new ArrayList<>();
        for (Species s : ds.species()) {
            Optional<Set<String>> only = s.isGas() ? gasIds : condensedIds;
            if (only.isEmpty() || only.get().contains(s.id())) {
                out.add(s);
            }
        }
        return out;
    }

    /**
     * @param elements elements of the system
     * @return the chemical system
     */
    public ChemicalSystem build(Set<Element> elements) {
        return ChemicalSystem.of(elements, species(), solutions);
    }

    /** @return one line describing the selection, for reports */
    public String describe() {
        Set<String> parts = new LinkedHashSet<>();
        parts.add("data set " + dataSet);
        variants.forEach(v -> parts.add("variant " + v));
        userSpecies.ifPresent(u -> parts.add("user species " + u.name()));
        gasIds.ifPresent(g -> parts.add(g.size() + " listed gases"));
        condensedIds.ifPresent(c -> parts.add(c.size() + " listed condensed species"));
        List<String> names = new ArrayList<>();
        solutions.forEach(s -> names.add(s.name()));
        parts.add(names.isEmpty() ? "pure phases only" : "solutions " + String.join(", ", names));
        return String.join("; ", parts);
    }
}
