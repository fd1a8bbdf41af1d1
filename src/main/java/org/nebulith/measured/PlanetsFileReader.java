package org.nebulith.measured;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import java.util.Set;

import org.nebulith.errors.InputException;
import org.nebulith.planet.interior.InteriorModel;

/**
 * Reads a planets file: CSV with the header {@value #HEADER} and an optional last column
 * {@code a_AU}; lines starting with {@code #} and blank lines are ignored. Masses, radii and their
 * errors must be finite and &gt; 0, masses within the interior model's range; planet names unique.
 */
public final class PlanetsFileReader {
    /** The required columns. */
    public static final String HEADER = "planet,star,mass_Mearth,mass_err_Mearth,radius_Rearth,radius_err_Rearth";
    /** The optional column. */
    public static final String DISTANCE = "a_AU";

    private PlanetsFileReader() {
    }

    /**
     * @param in   the file's text
     * @param name the file as the user named it (for messages)
     * @return the planets in file order
     * @throws IOException    if reading fails
     * @throws InputException for the first bad line or field
     */
    public static List<MeasuredPlanet> read(final Reader in, final String name) throws IOException {
        BufferedReader r = new BufferedReader(org.nebulith.format.TextInput.withoutBom(in));
        List<MeasuredPlanet> out = new ArrayList<>();
        Set<String> seen = new HashSet<>();
        boolean withDistance = false;
        boolean header = false;
        String text;
        long line = 0;
        while ((text = r.readLine()) != null) {
            line++;
            String t = text.strip();
            if (t.isEmpty() || t.startsWith("#")) {
                continue;
            }
            if (!header) {
                if (t.equals(HEADER + "," + DISTANCE)) {
                    withDistance = true;
                } else if (!t.equals(HEADER)) {
                    throw InputException.atField(name, line, "(header)", t, "unexpected header",
                            HEADER + " with an optional ," + DISTANCE);
                }
                header = true;
                continue;
            }
            MeasuredPlanet p = row(t.split(",", -1), withDistance, name, line);
            if (!seen.add(p.planet())) {
                throw InputException.atField(name, line, "planet", p.planet(), "appears twice",
                        "one row per planet");
            }
            out.add(p);
        }
        if (!header) {
            throw InputException.inFile(name, "no header row", HEADER);
        }
        if (out.isEmpty()) {
            throw InputException.inFile(name, "no planet rows", "at least one planet after the header");
        }
        return out;
    }

    private static MeasuredPlanet row(final String[] f, final boolean withDistance, final String name, final long line) {
        int n = withDistance ? 7 : 6;
        if (f.length != n) {
            throw InputException.atField(name, line, "(row)", String.join(",", f), f.length + " fields", n + " fields as in the header");
        }
        String planet = f[0].strip();
        String star = f[1].strip();
        if (planet.isEmpty()) {
            throw InputException.atField(name, line, "planet", f[0], "empty name", "a non-empty name");
        }
        if (star.isEmpty()) {
            throw InputException.atField(name, line, "star", star, "empty name", "a star of the catalogue");
        }
        double mass = positive(f[2], "mass_Mearth", name, line);
        if (mass < InteriorModel.MASS_MIN || mass > InteriorModel.MASS_MAX) {
            throw InputException.atField(name, line, "mass_Mearth", f[2], "outside the interior model's range", InteriorModel.MASS_MIN + " to " + InteriorModel.MASS_MAX + " M_earth");
        }
        double massErr = positive(f[3], "mass_err_Mearth", name, line);
        double radius = positive(f[4], "radius_Rearth", name, line);
        double radiusErr = positive(f[5], "radius_err_Rearth", name, line);
        OptionalDouble a = withDistance && !f[6].isBlank() ? OptionalDouble.of(positive(f[6], DISTANCE, name, line))
                : OptionalDouble.empty();
        return new MeasuredPlanet(planet, star, mass, massErr, radius, radiusErr, a, line);
    }

    private static double positive(final String cell, final String field, final String name, final long line) {
        double v;
        try {
            v = Double.parseDouble(cell.strip());
        } catch (NumberFormatException e) {
            throw InputException.atField(name, line, field, cell, "not a number",
                    "a finite number > 0");
        }
        if (!Double.isFinite(v) || !(v > 0)) {
            throw InputException.atField(name, line, field, cell, "not > 0",
                    "a finite number > 0");
        }
        return v;
    }
}
