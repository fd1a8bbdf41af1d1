package org.nebulith.thermo;

import java.util.ArrayList;
import java.util.List;

/**
 * Where the NASA-9 pieces of a species meet with a jump: at every inner interval bound, the
 * difference of G/RT between the polynomial below and the one above. The published fits are
 * continuous only to their printed digits (McBride, Zehe &amp; Gordon 2002 fit each interval
 * separately with continuity constraints), so the jumps are small but not zero; they bound how
 * smooth anything computed from the data can be in T. Polymorphs (separate species) are not
 * compared: their change is a real transition.
 */
public final class PieceJumps {

    /**
     * One inner bound of a species' NASA-9 intervals.
     *
     * @param species  the species id
     * @param tK       the bound [K]
     * @param jump     G/RT of the upper piece minus G/RT of the lower piece, at the bound
     */
    public record Jump(String species, double tK, double jump) {
    }

    private PieceJumps() {
    }

    /**
     * @param species any species (those without NASA-9 data or with one interval give nothing)
     * @return its inner bounds, lowest first
     */
    public static List<Jump> of(Species species) {
        List<Jump> out = new ArrayList<>();
        if (!(species.thermo() instanceof Nasa9Model m)) {
            return out;
        }
        List<Nasa9Model.Interval> iv = m.intervals();
        for (int i = 0; i + 1 < iv.size(); i++) {
            double t = iv.get(i).tHighK();
            double below = Nasa9Model.gOverRT(iv.get(i), t);
            double above = Nasa9Model.gOverRT(iv.get(i + 1), t);
            out.add(new Jump(species.id(), t, above - below));
        }
        return out;
    }

    /**
     * @param species species
     * @return every inner bound of theirs, in the order given
     */
    public static List<Jump> of(List<Species> species) {
        List<Jump> out = new ArrayList<>();
        for (Species s : species) {
            out.addAll(of(s));
        }
        return out;
    }

    /**
     * @param species species
     * @param tMinK   lowest temperature of interest [K] (bounds below it are ignored)
     * @return the largest |jump| of G/RT at any inner bound of theirs at or above tMinK (0 if none)
     */
    public static double largest(List<Species> species, double tMinK) {
        double worst = 0;
        for (Jump j : of(species)) {
            if (j.tK() >= tMinK) {
                worst = Math.max(worst, Math.abs(j.jump()));
            }
        }
        return worst;
    }
}
