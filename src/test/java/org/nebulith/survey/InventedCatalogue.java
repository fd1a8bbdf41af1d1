package org.nebulith.survey;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.SplittableRandom;

/**
 * Writes an invented catalogue of near-solar host stars for survey stress runs: each star's [X/H]
 * of Fe, Mg, Si, Ca, Al, Ti, Ni, Na and Cr is drawn from a normal distribution around 0 dex whose
 * scatter is itself drawn uniformly in 0.1-0.3 dex per star; every error is 0.05 dex. The stars and
 * their names are invented. Usage: {@code java InventedCatalogue.java OUT.csv [STARS] [SEED]}.
 */
public final class InventedCatalogue {
    private static final String[] ELEMENTS = {"Fe", "Mg", "Si", "Ca", "Al", "Ti", "Ni", "Na", "Cr"};

    private InventedCatalogue() {
    }

    /**
     * @param stars number of stars
     * @param seed  the seed
     * @return the catalogue text
     */
    public static String text(int stars, long seed) {
        StringBuilder sb = new StringBuilder();
        sb.append("# Invented near-solar catalogue for survey stress runs (not real stars): [X/H] ~ N(0, s),\n");
        sb.append("# s uniform in 0.1-0.3 dex per star, errors 0.05 dex; seed ").append(seed).append('\n');
        sb.append("star");
        for (String e : ELEMENTS) {
            sb.append(',').append(e).append("_H,").append(e).append("_H_err");
        }
        sb.append('\n');
        SplittableRandom r = new SplittableRandom(seed);
        for (int i = 1; i <= stars; i++) {
            double s = 0.1 + 0.2 * r.nextDouble();
            sb.append(String.format(Locale.ROOT, "NSC %04d", i));
            for (int k = 0; k < ELEMENTS.length; k++) {
                sb.append(String.format(Locale.ROOT, ",%.3f,0.05", s * gaussian(r)));
            }
            sb.append('\n');
        }
        return sb.toString();
    }

    private static double gaussian(SplittableRandom r) {
        double u = 1 - r.nextDouble();
        double v = r.nextDouble();
        return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * v);
    }

    /** @param args OUT.csv [STARS] [SEED] @throws IOException if the file cannot be written */
    public static void main(String[] args) throws IOException {
        int stars = args.length > 1 ? Integer.parseInt(args[1]) : 2000;
        long seed = args.length > 2 ? Long.parseLong(args[2]) : 1;
        try (PrintWriter w = new PrintWriter(Files.newBufferedWriter(Path.of(args[0]), StandardCharsets.UTF_8))) {
            w.print(text(stars, seed));
        }
    }
}
