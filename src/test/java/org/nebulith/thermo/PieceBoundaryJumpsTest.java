package org.nebulith.thermo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.nebulith.zones.RadialIntegrator;

/**
 * The continuity assumption made visible: every inner bound of the NASA-9 pieces of a bundled
 * species where G/RT jumps by more than 1e-6, with the jump (printed as a table). The fits of
 * McBride, Zehe &amp; Gordon (2002, NASA TP-2002-211556) are continuous only to their printed digits.
 * The jumps are recomputed here from the text of species.csv with the NASA-9 formula written out
 * independently (the same published equations, eqs. 2-3 of that report), and the radial
 * integrator's acceptance of stalled panels assumes the largest of them stays small.
 */
class PieceBoundaryJumpsTest {
    private static final double LISTED = 1e-6;
    /** The planet command's default floor: no equilibrium is computed below it. */
    private static final double FLOOR_K = 300;

    /** G/RT from the nine NASA-9 coefficients at T (H/RT - S/R, written out term by term). */
    private static double gOverRT(double[] a, double t) {
        double h = -a[0] / (t * t) + a[1] * Math.log(t) / t + a[2] + a[3] * t / 2 + a[4] * t * t / 3
                + a[5] * t * t * t / 4 + a[6] * t * t * t * t / 5 + a[7] / t;
        double s = -a[0] / (2 * t * t) - a[1] / t + a[2] * Math.log(t) + a[3] * t + a[4] * t * t / 2
                + a[5] * t * t * t / 3 + a[6] * t * t * t * t / 4 + a[8];
        return h - s;
    }

    /** Jumps recomputed from the raw rows: species id + " @ " + T to the jump. */
    private static Map<String, Double> fromTheFileText() throws Exception {
        Map<String, Double> out = new LinkedHashMap<>();
        String lastId = null;
        double lastHigh = 0;
        double[] lastCoef = null;
        try (BufferedReader in = new BufferedReader(new InputStreamReader(
                PieceBoundaryJumpsTest.class.getResourceAsStream(SpeciesDatabase.BUNDLED_RESOURCE), StandardCharsets.UTF_8))) {
            for (String line = in.readLine(); line != null; line = in.readLine()) {
                if (line.startsWith("#")) {
                    continue;
                }
                String[] c = org.apache.commons.csv.CSVFormat.DEFAULT.parse(new java.io.StringReader(line)).getRecords()
                        .get(0).values();
                if (c.length < 11 || !c[7].equals("nasa9")) {
                    continue;
                }
                double low = Double.parseDouble(c[8]);
                String[] p = c[10].trim().split("\\s+");
                double[] coef = new double[9];
                for (int i = 0; i < 9; i++) {
                    coef[i] = Double.parseDouble(p[i]);
                }
                if (c[0].equals(lastId) && Math.abs(low - lastHigh) < 1e-6) {
                    double jump = gOverRT(coef, lastHigh) - gOverRT(lastCoef, lastHigh);
                    out.put(c[0] + " @ " + lastHigh, jump);
                }
                lastId = c[0];
                lastHigh = Double.parseDouble(c[9]);
                lastCoef = coef;
            }
        }
        return out;
    }

    @Test
    void everyPieceBoundaryWithAJumpAbove1e6IsListedAndSmall() throws Exception {
        List<PieceJumps.Jump> all = PieceJumps.of(SpeciesDatabase.bundled().species());
        Map<String, Double> independent = fromTheFileText();
        assertEquals(independent.size(), all.size(), "every inner bound of every NASA-9 species");
        List<PieceJumps.Jump> listed = new ArrayList<>();
        double largest = 0;
        for (PieceJumps.Jump j : all) {
            Double raw = independent.get(j.species() + " @ " + j.tK());
            assertTrue(raw != null, "bound " + j.species() + " @ " + j.tK() + " K in the file");
            assertEquals(raw, j.jump(), 1e-7, j.species() + " @ " + j.tK()); // rounding of large coefficients
            if (Math.abs(j.jump()) > LISTED) {
                listed.add(j);
            }
            if (j.tK() >= FLOOR_K) {
                largest = Math.max(largest, Math.abs(j.jump()));
            }
        }
        StringBuilder table = new StringBuilder("NASA-9 piece bounds with |jump of G/RT| > 1e-6 (" + listed.size()
                + " of " + all.size() + "):\nspecies,T_K,jump_G_RT\n");
        for (PieceJumps.Jump j : listed) {
            table.append(String.format(Locale.ROOT, "%s,%.1f,%.3e%n", j.species(), j.tK(), j.jump()));
        }
        System.out.print(table);
        // Ni(cr): the jumps of the flat-disk failure, as measured in its diagnosis (this data, not an outside value)
        Map<Double, Double> ni = Map.of(400.0, 2.8e-5, 631.0, 8.3e-5, 1200.0, 3.9e-5);
        ni.forEach((t, jump) -> assertEquals(jump, Math.abs(independent.get("Ni(cr) @ " + t)), 0.05e-5, "Ni(cr) @ " + t));
        assertTrue(listed.stream().anyMatch(j -> j.species().equals("Ni(cr)") && j.tK() == 631.0), table.toString());
        // The integrator accepts stalled panels within CONTINUITY_FACTOR x the largest jump at or above the
        // floor (NaCN's pieces below 300 K jump by up to 3e-2 and are not used): that must remain a small
        // relative error (below 1 %), or the acceptance would hide real failures.
        assertEquals(largest, PieceJumps.largest(SpeciesDatabase.bundled().species(), FLOOR_K), 0.0);
        assertTrue(RadialIntegrator.CONTINUITY_FACTOR * largest < 0.01, "largest jump " + largest + "\n" + table);
    }
}
