package org.nebulith.zones;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.OptionalDouble;
import java.util.Set;

import org.nebulith.disk.DiskModel;
import org.nebulith.errors.InputException;

/**
 * Reads a feeding-zone file: {@code #} comment lines, then a header starting exactly
 * {@code zone,shape,r_center_AU,half_width_AU}, optionally followed by the column
 * {@code planet_mass_Mearth} (may be left empty per row); one row per planet, r_center increasing
 * strictly from row to row. Refused with one line naming file, line and field: missing or unknown
 * columns, unknown shapes, empty or repeated zone names, non-numeric, zero or negative widths,
 * non-increasing radii, and kernels reaching outside the disk's range of validity.
 */
public final class ZoneFileReader {
    /** The required leading columns, exactly. */
    public static final String HEADER = "zone,shape,r_center_AU,half_width_AU";
    /** The optional extra column. */
    public static final String PLANET_MASS = "planet_mass_Mearth";

    private ZoneFileReader() {
    }

    /**
     * @param in   the file contents (closed here)
     * @param name the file name for messages
     * @param disk the disk the zones must lie in
     * @return the zones in file order
     * @throws IOException on read failure
     * @throws InputException on bad content
     */
    public static List<FeedingZone> read(Reader in, String name, DiskModel disk) throws IOException {
        List<FeedingZone> zones = new ArrayList<>();
        Set<String> names = new HashSet<>();
        int columns = -1;
        try (BufferedReader br = new BufferedReader(org.nebulith.format.TextInput.withoutBom(in))) {
            int lineNo = 0;
            for (String raw = br.readLine(); raw != null; raw = br.readLine()) {
                lineNo++;
                String line = raw.strip();
                if (line.isEmpty() || line.startsWith("#")) {
                    continue;
                }
                if (columns < 0) {
                    columns = headerColumns(line, name, lineNo);
                    continue;
                }
                FeedingZone z = parseRow(line.split(",", -1), columns, name, lineNo);
                check(z, zones, names, disk, name, lineNo);
                zones.add(z);
                names.add(z.name());
            }
        }
        if (zones.isEmpty()) {
            throw InputException.atField(name, 0, "zone", "", "no zones", "header " + HEADER + " and one row per planet");
        }
        return List.copyOf(zones);
    }

    private static int headerColumns(String line, String name, int lineNo) {
        if (line.equals(HEADER)) {
            return 4;
        }
        if (line.equals(HEADER + "," + PLANET_MASS)) {
            return 5;
        }
        throw InputException.atField(name, lineNo, "header", line, "not the header",
                HEADER + " optionally followed by ," + PLANET_MASS);
    }

    private static FeedingZone parseRow(String[] f, int columns, String name, int lineNo) {
        if (f.length != columns) {
            throw InputException.atField(name, lineNo, "row", String.join(",", f), f.length + " fields", columns + " fields as in the header");
        }
        String zone = f[0].strip();
        if (zone.isEmpty()) {
            throw InputException.atField(name, lineNo, "zone", f[0], "empty name", "a zone (planet) name");
        }
        KernelShape shape = KernelShape.fromToken(f[1]);
        if (shape == null) {
            throw InputException.atField(name, lineNo, "shape", f[1], "unknown shape", "tophat, gaussian");
        }
        double rc = positive(f[2], "r_center_AU", name, lineNo);
        double hw = positive(f[3], "half_width_AU", name, lineNo);
        OptionalDouble mass = columns == 5 && !f[4].isBlank()
                ? OptionalDouble.of(positive(f[4], PLANET_MASS, name, lineNo)) : OptionalDouble.empty();
        if (rc - shape.supportInHalfWidths() * hw <= 0) {
            throw InputException.atField(name, lineNo, "half_width_AU", hw, "kernel reaches r <= 0",
                    "half_width_AU < r_center_AU / " + shape.supportInHalfWidths());
        }
        return new FeedingZone(zone, shape, rc, hw, mass);
    }

    private static double positive(String s, String field, String name, int lineNo) {
        double v;
        try {
            v = Double.parseDouble(s.strip());
        } catch (NumberFormatException e) {
            throw InputException.atField(name, lineNo, field, s, "not a number", "a finite number > 0");
        }
        if (!(v > 0) || Double.isInfinite(v)) {
            throw InputException.atField(name, lineNo, field, s, "out of range", "a finite number > 0");
        }
        return v;
    }

    private static void check(FeedingZone z, List<FeedingZone> previous, Set<String> names, DiskModel disk,
                              String name, int lineNo) {
        if (names.contains(z.name())) {
            throw InputException.atField(name, lineNo, "zone", z.name(), "name repeated", "unique zone names");
        }
        if (!previous.isEmpty() && !(z.rCenterAU() > previous.get(previous.size() - 1).rCenterAU())) {
            throw InputException.atField(name, lineNo, "r_center_AU", z.rCenterAU(), "does not increase on the previous row",
                    "one row per planet, r_center_AU increasing");
        }
        if (z.rInnerAU() < disk.rMinAU() || z.rOuterAU() > disk.rMaxAU()) {
            throw InputException.atField(name, lineNo, "r_center_AU", z.rCenterAU(), "zone spans " + z.rInnerAU() + "-" + z.rOuterAU()
                    + " AU (" + z.shape().token() + ")", "zones inside the disk's range " + disk.rMinAU() + "-"
                    + disk.rMaxAU() + " AU");
        }
    }

    /**
     * Zones whose kernels overlap draw on the same solids: each planet then counts them in full, so
     * the zones' masses are not independent. This is allowed (a modelling choice) but worth a notice.
     *
     * @param zones zones in order of increasing radius
     * @return one line per overlapping neighbour pair, empty if none overlap
     */
    public static List<String> overlaps(List<FeedingZone> zones) {
        List<String> lines = new java.util.ArrayList<>();
        for (int i = 1; i < zones.size(); i++) {
            FeedingZone a = zones.get(i - 1);
            FeedingZone b = zones.get(i);
            if (b.rInnerAU() < a.rOuterAU()) {
                lines.add("feeding zones '" + a.name() + "' (" + au(a.rInnerAU()) + "-"
                        + au(a.rOuterAU()) + " AU) and '" + b.name() + "' ("
                        + au(b.rInnerAU()) + "-"
                        + au(b.rOuterAU()) + " AU) overlap: the same solids feed both"
                        + " planets");
            }
        }
        return lines;
    }

    private static String au(double r) {
        return String.format(java.util.Locale.ROOT, "%.3g", r);
    }
}
