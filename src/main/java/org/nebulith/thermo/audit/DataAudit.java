package org.nebulith.thermo.audit;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;

import org.nebulith.thermo.DataSet;
import org.nebulith.thermo.Element;
import org.nebulith.thermo.Formula;
import org.nebulith.thermo.Nasa9Model;
import org.nebulith.thermo.Species;
import org.nebulith.thermo.SpeciesDatabase;

/**
 * Audit of every species of a database (the union of all data sets), looking for data errors that an
 * equilibrium calculation would reproduce faithfully:
 * <ul>
 * <li>{@value #VAPOUR}: a gas whose vapour pressure over a solid of the same composition exceeds 1 bar
 *     inside the solid's range (a solid must be more stable than its own vapour at 1 bar below its
 *     melting point, hence below its boiling point; at 298.15 K for solids at room temperature);</li>
 * <li>{@value #GAS_HF}: the enthalpy of formation of each gas from its polynomial at 298.15 K against the
 *     value printed in the source record, and against a second published value where one is held
 *     ({@code gas-formation-reference.csv});</li>
 * <li>{@value #JUMP}: jumps of h/RT, s/R and g/RT at the boundaries between polynomial pieces of one
 *     species (published fits are meant to be continuous);</li>
 * <li>{@value #FAMILY}: for each composition present in two source families, the difference in G of
 *     the most stable row of each family at 500, 1000 and 1500 K (per mole of atoms);</li>
 * <li>{@value #OXIDE}: Gibbs energies of formation from the oxides at 1500 K against published
 *     measurements ({@link OxideReferences}).</li>
 * </ul>
 * Every value above its threshold is a {@link Finding}; {@link AcceptedFindings} says which were
 * examined and why they stand.
 */
public final class DataAudit {
    /** Check name: vapour pressure over the own solid. */
    public static final String VAPOUR = "vapour-pressure";
    /** Check name: gas enthalpy of formation. */
    public static final String GAS_HF = "gas-formation-enthalpy";
    /** Check name: piece-boundary jumps. */
    public static final String JUMP = "piece-jump";
    /** Check name: difference between source families. */
    public static final String FAMILY = "family-difference";
    /** Check name: formation from the oxides. */
    public static final String OXIDE = "oxide-formation";

    /** Jumps above this are findings [-]. */
    public static final double JUMP_THRESHOLD = 1e-6;
    /** Polynomial against printed enthalpy of formation [J/mol]. */
    public static final double HF_POLYNOMIAL_THRESHOLD = 10;
    /** Against a second source [J/mol]. */
    public static final double HF_SECOND_SOURCE_THRESHOLD = 4000;
    /** Difference between families [kJ per mole of atoms]. */
    public static final double FAMILY_THRESHOLD_KJ = 1.0;
    /** Formation from the oxides against a measurement [kJ/mol]. */
    public static final double OXIDE_THRESHOLD_KJ = 5.0;
    /** Temperatures of the family comparison [K]. */
    public static final double[] FAMILY_T_K = {500, 1000, 1500};

    private static final double T_REF = 298.15;

    private DataAudit() {
    }

    /**
     * @param db             the database
     * @param printedHf      enthalpy of formation printed in each NASA record [J/mol] by NASA name (as
     *                       published, before corrections), or empty to skip that comparison
     * @param secondSource   published gas enthalpies of formation
     * @return every finding, in check order
     */
    public static List<Finding> run(SpeciesDatabase db, Map<String, Double> printedHf, GasReferences secondSource) {
        List<Finding> out = new ArrayList<>();
        out.addAll(vapourPressure(db));
        out.addAll(gasFormation(db, printedHf, secondSource));
        out.addAll(pieceJumps(db));
        out.addAll(familyDifferences(db));
        out.addAll(oxideFormation(db));
        return out;
    }

    static String compositionKey(Formula f) {
        StringBuilder b = new StringBuilder();
        double atoms = f.atoms();
        new TreeMap<>(f.counts()).forEach((e, n) -> b.append(e.symbol()).append(':')
                .append(Math.round(n / atoms * 1e9)).append(' '));
        return b.toString();
    }

    /** Gas over a solid of the same composition: ln p = -(g_gas - n g_solid)/RT must stay below ln 1 bar. */
    static List<Finding> vapourPressure(SpeciesDatabase db) {
        Map<String, List<Species>> gases = new LinkedHashMap<>();
        for (Species s : db.species()) {
            if (s.isGas()) {
                gases.computeIfAbsent(compositionKey(s.formula()), k -> new ArrayList<>()).add(s);
            }
        }
        List<Finding> out = new ArrayList<>();
        for (Species c : db.species()) {
            if (c.state() != Species.State.SOLID) {
                continue;
            }
            for (Species g : gases.getOrDefault(compositionKey(c.formula()), List.of())) {
                double n = g.formula().atoms() / c.formula().atoms();
                double lo = Math.max(Math.max(c.thermo().usableMinK(), g.thermo().tMinK()), 200);
                double hi = Math.min(c.thermo().usableMaxK(), g.thermo().tMaxK()) - 1;
                double worst = Double.NEGATIVE_INFINITY;
                double worstT = lo;
                for (double t = lo; t <= hi; t = t + 10 > hi && t < hi ? hi : t + 10) {
                    double lnP = -(g.thermo().gOverRT(t) - n * c.thermo().gOverRT(t));
                    if (lnP > worst) {
                        worst = lnP;
                        worstT = t;
                    }
                    if (t == hi) {
                        break;
                    }
                }
                double log10 = worst / Math.log(10);
                if (log10 > 0) {
                    out.add(new Finding(VAPOUR, g.id() + "|" + c.id(), log10, 0, "log10(p/bar)", String.format(
                            java.util.Locale.ROOT, "vapour pressure of %s over %s reaches 10^%.2f bar at %.0f K, inside "
                            + "the solid's range (%.2f-%.2f K)", g.id(), c.id(), log10, worstT, c.thermo().usableMinK(),
                            c.thermo().usableMaxK())));
                }
            }
        }
        return out;
    }

    static List<Finding> gasFormation(SpeciesDatabase db, Map<String, Double> printedHf, GasReferences refs) {
        List<Finding> out = new ArrayList<>();
        for (Species g : db.species()) {
            if (!g.isGas() || !(g.thermo() instanceof Nasa9Model) || g.thermo().tMinK() > T_REF) {
                continue;
            }
            double h = g.thermo().hJPerMol(T_REF);
            Double printed = printedHf.get(g.id());
            boolean corrected = g.sourceRow().contains(" corrected by ");
            if (printed != null && !corrected && Math.abs(h - printed) > HF_POLYNOMIAL_THRESHOLD) {
                out.add(new Finding(GAS_HF, g.id() + " polynomial", Math.abs(h - printed), HF_POLYNOMIAL_THRESHOLD,
                        "J/mol", String.format(java.util.Locale.ROOT, "H(298.15 K) from the polynomial %.1f J/mol, "
                        + "printed in the record %.1f J/mol", h, printed)));
            }
            Optional<GasReferences.Reference> ref = refs.find(g.id());
            if (ref.isPresent() && Math.abs(h - ref.get().hfJPerMol()) > HF_SECOND_SOURCE_THRESHOLD) {
                out.add(new Finding(GAS_HF, g.id() + " second source", Math.abs(h - ref.get().hfJPerMol()),
                        HF_SECOND_SOURCE_THRESHOLD, "J/mol", String.format(java.util.Locale.ROOT,
                        "H(298.15 K) %.1f kJ/mol in the data, %.1f kJ/mol in %s", h / 1000,
                        ref.get().hfJPerMol() / 1000, ref.get().source())));
            }
        }
        return out;
    }

    static List<Finding> pieceJumps(SpeciesDatabase db) {
        List<Finding> out = new ArrayList<>();
        for (Species s : db.species()) {
            if (!(s.thermo() instanceof Nasa9Model m)) {
                continue;
            }
            List<Nasa9Model.Interval> ivs = m.intervals();
            for (int i = 0; i + 1 < ivs.size(); i++) {
                double t = ivs.get(i).tHighK();
                double[] lo = ivs.get(i).coefficients();
                double[] hi = ivs.get(i + 1).coefficients();
                double dh = NasaPieces.hOverRT(hi, t) - NasaPieces.hOverRT(lo, t);
                double ds = NasaPieces.sOverR(hi, t) - NasaPieces.sOverR(lo, t);
                String[] names = {"h/RT", "s/R", "g/RT"};
                double[] d = {dh, ds, dh - ds};
                for (int k = 0; k < 3; k++) {
                    if (Math.abs(d[k]) > JUMP_THRESHOLD) {
                        out.add(new Finding(JUMP, s.id() + " " + names[k] + " at " + fmt(t) + " K", Math.abs(d[k]),
                                JUMP_THRESHOLD, "-", String.format(java.util.Locale.ROOT,
                                "%s of %s jumps by %.3g at the piece boundary %s K%s", names[k], s.id(), d[k], fmt(t),
                                ivs.get(i).tHighK() != ivs.get(i + 1).tLowK() ? " (pieces do not meet)" : "")));
                    }
                }
            }
        }
        return out;
    }

    private static String fmt(double t) {
        return t == Math.rint(t) ? Long.toString((long) t) : Double.toString(t);
    }

    /** The family of a row: its source key (NASA rows built into minerals count as NASA). */
    static String family(Species s) {
        return s.source();
    }

    static List<Finding> familyDifferences(SpeciesDatabase db) {
        Map<String, Map<String, List<Species>>> byComposition = new TreeMap<>();
        for (Species s : db.species()) {
            if (s.state() != Species.State.SOLID
                    || (DataSet.isMineralRow(s) && s.thermo() instanceof Nasa9Model)) {
                continue;
            }
            byComposition.computeIfAbsent(compositionKey(s.formula()), k -> new TreeMap<>())
                    .computeIfAbsent(family(s), k -> new ArrayList<>()).add(s);
        }
        List<Finding> out = new ArrayList<>();
        for (Map<String, List<Species>> fams : byComposition.values()) {
            if (fams.size() < 2) {
                continue;
            }
            List<String> names = new ArrayList<>(fams.keySet());
            for (int i = 0; i < names.size(); i++) {
                for (int j = i + 1; j < names.size(); j++) {
                    compareFamilies(names.get(i), fams.get(names.get(i)), names.get(j), fams.get(names.get(j)), out);
                }
            }
        }
        return out;
    }

    private static void compareFamilies(String fa, List<Species> a, String fb, List<Species> b, List<Finding> out) {
        for (double t : FAMILY_T_K) {
            Species sa = mostStable(a, t);
            Species sb = mostStable(b, t);
            if (sa == null || sb == null) {
                continue;
            }
            double ga = sa.thermo().gJPerMol(t) / sa.formula().atoms();
            double gb = sb.thermo().gJPerMol(t) / sb.formula().atoms();
            double diffKj = (ga - gb) / 1000;
            if (Math.abs(diffKj) > FAMILY_THRESHOLD_KJ) {
                out.add(new Finding(FAMILY, sa.id() + "|" + sb.id() + " at " + fmt(t) + " K", Math.abs(diffKj),
                        FAMILY_THRESHOLD_KJ, "kJ/mol-atoms", String.format(java.util.Locale.ROOT,
                        "G(%s, %s) - G(%s, %s) = %+.2f kJ per mole of atoms (%+.2f kJ per %s)", sa.id(), fa, sb.id(),
                        fb, diffKj, diffKj * sa.formula().atoms(), sa.formula().notation())));
            }
        }
    }

    private static Species mostStable(List<Species> rows, double t) {
        Species best = null;
        for (Species s : rows) {
            if (s.isValidAt(t) && (best == null
                    || s.thermo().gJPerMol(t) / s.formula().atoms() < best.thermo().gJPerMol(t) / best.formula().atoms())) {
                best = s;
            }
        }
        return best;
    }

    static List<Finding> oxideFormation(SpeciesDatabase db) {
        List<Finding> out = new ArrayList<>();
        for (OxideReferences.Reference r : OxideReferences.ALL) {
            Map<Element, Species> oxides = new LinkedHashMap<>();
            for (Map.Entry<Element, String> o : r.oxideIds().entrySet()) {
                oxides.put(o.getKey(), db.get(o.getValue()));
            }
            for (Species s : db.species()) {
                if (s.isCondensed() && s.formula().equals(Formula.parse(r.formula())) && !s.isGas()) {
                    double g = s.thermo().gJPerMol(r.tK());
                    for (Map.Entry<Element, Species> o : oxides.entrySet()) {
                        Species ox = o.getValue();
                        g -= s.formula().count(o.getKey()) / ox.formula().count(o.getKey()) * ox.thermo().gJPerMol(r.tK());
                    }
                    double diff = g / 1000 - r.dGkJPerMol();
                    if (Math.abs(diff) > OXIDE_THRESHOLD_KJ) {
                        out.add(new Finding(OXIDE, s.id() + " at " + fmt(r.tK()) + " K", Math.abs(diff), OXIDE_THRESHOLD_KJ,
                                "kJ/mol", String.format(java.util.Locale.ROOT, "dG from %s = %.1f kJ/mol against %.1f "
                                + "kJ/mol measured (%s)", String.join(" + ", r.oxideIds().values()), g / 1000,
                                r.dGkJPerMol(), r.source())));
                    }
                }
            }
        }
        return out;
    }
}
