package org.nebulith.api;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;

import org.nebulith.planet.ZonePlanet;

/** The planets of one run, in zone order, found by zone name: {@code get("Aster")}. */
public final class Planets {
    private final List<Planet> planets;

    Planets(List<ZonePlanet> zonePlanets) {
        List<Planet> p = new ArrayList<>();
        zonePlanets.forEach(z -> p.add(new Planet(z)));
        this.planets = List.copyOf(p);
    }

    /** @return every planet, in zone order */
    public List<Planet> list() {
        return planets;
    }

    /**
     * @param zone a zone name
     * @return its planet
     * @throws IllegalArgumentException if no zone has that name
     */
    public Planet get(String zone) {
        for (Planet p : planets) {
            if (p.zone().equals(zone)) {
                return p;
            }
        }
        throw new IllegalArgumentException("no zone '" + zone + "'; zones: "
                + planets.stream().map(Planet::zone).toList());
    }

    /** @return the summary line of each planet */
    @Override
    public String toString() {
        return planets.stream().map(Planet::summary).collect(Collectors.joining("\n"));
    }
}
