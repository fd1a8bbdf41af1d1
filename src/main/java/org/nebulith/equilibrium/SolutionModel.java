package org.nebulith.equilibrium;

import java.util.List;
import java.util.Objects;

/**
 * Definition of an ideal solid (or liquid) solution: a named phase whose end-members mix ideally
 * with a site multiplicity, so that the activity of end-member e is a_e = x_e^m_e.
 *
 * <p>An end-member may list several candidate species of identical composition (the polymorphs
 * or the liquid of a metal); at each temperature the one with the lowest Gibbs energy among those
 * valid at that temperature is used.
 *
 * @param name      phase name used in outputs ({@code metal}, {@code olivine}, ...)
 * @param endMembers the end-members
 */
public record SolutionModel(String name, List<EndMember> endMembers) {

    /**
     * @param name         end-member label ({@code forsterite}, {@code Fe})
     * @param multiplicity number of mixing sites m (activity a = x^m)
     * @param speciesIds   candidate species ids of identical formula, in order of preference
     */
    public record EndMember(String name, double multiplicity, List<String> speciesIds) {
        public EndMember {
            Objects.requireNonNull(name);
            if (!(multiplicity > 0)) {
                throw new IllegalArgumentException("site multiplicity must be > 0 for " + name);
            }
            speciesIds = List.copyOf(speciesIds);
        }
    }

    public SolutionModel {
        Objects.requireNonNull(name);
        endMembers = List.copyOf(endMembers);
        if (endMembers.size() < 2) {
            throw new IllegalArgumentException("a solution needs at least two end-members: " + name);
        }
    }
}
