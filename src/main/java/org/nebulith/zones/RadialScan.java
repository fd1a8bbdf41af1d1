package org.nebulith.zones;

import java.util.ArrayList;
import java.util.List;

import org.nebulith.disk.DiskModel;

/**
 * The local condensation sampled on a logarithmic radial grid, from the inner edge outwards so
 * that each radius is warm-started from the previous one.
 */
public final class RadialScan {
    private RadialScan() {
    }

    /**
     * @param disk    the disk
     * @param local   the local condensation
     * @param rMinAU  inner radius [AU], inside the disk
     * @param rMaxAU  outer radius [AU], inside the disk
     * @param points  number of radii, &gt;= 2
     * @return the local states, inner first
     */
    public static List<LocalCondensation.Local> scan(DiskModel disk, LocalCondensation local, double rMinAU,
                                                     double rMaxAU, int points) {
        if (points < 2 || !(rMinAU > 0) || !(rMaxAU > rMinAU)) {
            throw new IllegalArgumentException("radial scan needs 0 < r_min < r_max and >= 2 points");
        }
        disk.checkRange(rMinAU);
        disk.checkRange(rMaxAU);
        List<LocalCondensation.Local> out = new ArrayList<>();
        double ratio = Math.pow(rMaxAU / rMinAU, 1.0 / (points - 1));
        for (int i = 0; i < points; i++) {
            double r = i == points - 1 ? rMaxAU : rMinAU * Math.pow(ratio, i);
            out.add(local.at(disk.stateAt(r)));
        }
        return out;
    }
}
