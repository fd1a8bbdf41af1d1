package org.nebulith.equilibrium;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.QRDecomposition;
import org.apache.commons.math3.linear.RealVector;
import org.nebulith.thermo.Element;
import org.nebulith.thermo.Species;

/**
 * A check of an equilibrium written apart from the solver: it uses only the reported amounts, the
 * species the result names for each member, and the thermodynamic data (G/RT of each species from
 * its own model), never the solver's potentials, residuals or stoichiometry matrix.
 * <ol>
 * <li>Element balance: the reported moles times each species' formula, summed, against the
 *     problem's totals (relative error, limit {@value #BALANCE_LIMIT}).</li>
 * <li>Element potentials refitted by least squares (QR) to the chemical potentials of the present
 *     species, mu/RT = G/RT + ln(P/1 bar) + ln x for gases, G/RT + m ln x for solution end-members
 *     (m sites), G/RT for pure phases; the largest residual |a.lambda - mu| must be at most
 *     {@value #RESIDUAL_LIMIT} (Gibbs' equilibrium condition, common practice).</li>
 * <li>With those potentials, the affinity per atom of every condensed species of the data that is
 *     valid at T and not present, (G/RT - a.lambda)/atoms, and the driving force of every absent
 *     solution, ln sum_k exp((a_k.lambda - G_k/RT)/m_k) per atom, must show no supersaturation
 *     beyond {@value #AFFINITY_LIMIT} RT per atom.</li>
 * </ol>
 * It also returns the total Gibbs energy G/RT of the reported state, computed from the same data.
 */
public final class IndependentCheck {
    static final double BALANCE_LIMIT = 1e-10;
    static final double RESIDUAL_LIMIT = 1e-6;
    static final double AFFINITY_LIMIT = -1e-6;
    /** Members below this mole fraction carry no usable ln x in double precision. */
    private static final double SMALLEST_FRACTION = 1e-280;

    /**
     * What the check found.
     *
     * @param balance          largest relative element-balance error
     * @param residual         largest |a.lambda - mu| of a present species [RT]
     * @param worstSpecies     the species with that residual
     * @param minAffinity      smallest affinity per atom of an absent species or solution [RT]
     * @param minAffinityPhase where it occurs
     * @param gibbs            total G/RT of the reported state [mol]
     * @param lambda           the refitted element potentials
     */
    public record Report(double balance, double residual, String worstSpecies, double minAffinity, String minAffinityPhase,
                  double gibbs, double[] lambda) {
        /** @return null if every check passes, else what failed */
        public String failure() {
            if (!(balance <= BALANCE_LIMIT)) {
                return String.format(Locale.ROOT, "element balance error %.3g > %.1g", balance, BALANCE_LIMIT);
            }
            if (!(residual <= RESIDUAL_LIMIT)) {
                return String.format(Locale.ROOT, "equilibrium residual %.3g RT of %s > %.1g", residual, worstSpecies,
                        RESIDUAL_LIMIT);
            }
            if (!(minAffinity >= AFFINITY_LIMIT)) {
                return String.format(Locale.ROOT, "absent %s supersaturated: affinity %.3g RT per atom", minAffinityPhase,
                        minAffinity);
            }
            return null;
        }
    }

    private final SystemSpec spec;
    private final Map<String, Species> byId = new HashMap<>();

    /** @param spec the species selection and solutions the result was computed with */
    public IndependentCheck(SystemSpec spec) {
        this.spec = spec;
        for (Species s : spec.species()) {
            byId.put(s.id(), s);
        }
    }

    /** @param r a result @return the report */
    public Report check(EquilibriumResult r) {
        ChemicalSystem sys = r.system();
        List<Element> els = sys.elements();
        double tK = r.problem().temperatureK();
        double lnP = Math.log(r.problem().pressureBar());
        double[] b = r.problem().totals();
        double[] sum = new double[els.size()];
        List<double[]> rows = new ArrayList<>();
        List<Double> mus = new ArrayList<>();
        List<String> names = new ArrayList<>();
        double gibbs = 0;
        for (int p = 0; p < sys.phaseCount(); p++) {
            double np = r.phaseMoles(p);
            if (!(np > 0)) {
                continue;
            }
            PhaseKind kind = sys.phaseKind(p);
            List<String> members = sys.memberNames(p);
            for (int k = 0; k < members.size(); k++) {
                double n = r.memberMoles(p, k);
                if (!(n > 0)) {
                    continue;
                }
                Species s = byId.get(r.memberSpecies(p, k));
                if (s == null) {
                    throw new IllegalStateException("result names unknown species '" + r.memberSpecies(p, k) + "'");
                }
                double[] a = formula(s, els);
                for (int j = 0; j < a.length; j++) {
                    sum[j] += n * a[j];
                }
                double x = n / np;
                double mu = s.thermo().gOverRT(tK);
                if (kind == PhaseKind.GAS) {
                    mu += lnP + Math.log(x);
                } else if (kind == PhaseKind.SOLUTION) {
                    mu += sites(sys.phaseName(p), members.get(k)) * Math.log(x);
                }
                gibbs += n * mu;
                if (x >= SMALLEST_FRACTION) {
                    rows.add(a);
                    mus.add(mu);
                    names.add(sys.phaseName(p) + ":" + s.id());
                }
            }
        }
        double bal = 0;
        for (int j = 0; j < b.length; j++) {
            bal = Math.max(bal, Math.abs(sum[j] - b[j]) / b[j]);
        }
        double[] lambda = fit(rows, mus, els.size());
        double res = 0;
        String worst = "";
        for (int i = 0; i < rows.size(); i++) {
            double v = Math.abs(dot(rows.get(i), lambda) - mus.get(i));
            if (v > res) {
                res = v;
                worst = names.get(i);
            }
        }
        double[] minA = {Double.POSITIVE_INFINITY};
        String[] minP = {""};
        absentSpecies(r, els, lambda, tK, minA, minP);
        absentSolutions(r, els, lambda, tK, minA, minP);
        return new Report(bal, res, worst, minA[0] == Double.POSITIVE_INFINITY ? 0 : minA[0], minP[0], gibbs, lambda);
    }

    /**
     * Total G/RT of a state given as species amounts (gases ideal at pBar, condensed species pure),
     * from the same data, corrected to first order for its element-balance error against the
     * problem's totals with the given potentials: G - lambda.(A n - b), so that states with slightly
     * different totals compare fairly.
     *
     * @param r         the problem and element order
     * @param gas       gas species id to moles
     * @param condensed condensed species id to moles
     * @param lambda    element potentials [RT]
     * @return the corrected G/RT [mol]
     */
    double gibbs(EquilibriumResult r, Map<String, Double> gas, Map<String, Double> condensed, double[] lambda) {
        List<Element> els = r.system().elements();
        double tK = r.problem().temperatureK();
        double lnP = Math.log(r.problem().pressureBar());
        double nGas = gas.values().stream().mapToDouble(Double::doubleValue).sum();
        double[] sum = new double[els.size()];
        double g = 0;
        for (Map.Entry<String, Double> e : gas.entrySet()) {
            double n = e.getValue();
            if (n > 0) {
                Species s = byId.get(e.getKey());
                g += n * (s.thermo().gOverRT(tK) + lnP + Math.log(n / nGas));
                add(sum, formula(s, els), n);
            }
        }
        for (Map.Entry<String, Double> e : condensed.entrySet()) {
            double n = e.getValue();
            if (n > 0) {
                Species s = byId.get(e.getKey());
                g += n * s.thermo().gOverRT(tK);
                add(sum, formula(s, els), n);
            }
        }
        double[] b = r.problem().totals();
        for (int j = 0; j < b.length; j++) {
            g -= lambda[j] * (sum[j] - b[j]);
        }
        return g;
    }

    private static void add(double[] sum, double[] a, double n) {
        for (int j = 0; j < a.length; j++) {
            sum[j] += n * a[j];
        }
    }

    private void absentSpecies(EquilibriumResult r, List<Element> els, double[] lambda, double tK, double[] minA,
                               String[] minP) {
        java.util.Set<String> present = new java.util.HashSet<>();
        ChemicalSystem sys = r.system();
        for (int p : r.presentCondensedPhases()) {
            for (int k = 0; k < sys.memberNames(p).size(); k++) {
                present.add(r.memberSpecies(p, k));
            }
        }
        java.util.Set<Element> elSet = java.util.EnumSet.copyOf(els);
        for (Species s : spec.species()) {
            if (s.isGas() || !s.formula().madeOnlyOf(elSet) || !s.isValidAt(tK) || present.contains(s.id())) {
                continue;
            }
            double[] a = formula(s, els);
            double atoms = 0;
            for (double v : a) {
                atoms += v;
            }
            double aff = (s.thermo().gOverRT(tK) - dot(a, lambda)) / atoms;
            if (aff < minA[0]) {
                minA[0] = aff;
                minP[0] = s.id();
            }
        }
    }

    private void absentSolutions(EquilibriumResult r, List<Element> els, double[] lambda, double tK, double[] minA,
                                 String[] minP) {
        java.util.Set<Element> elSet = java.util.EnumSet.copyOf(els);
        for (SolutionModel sm : spec.solutions()) {
            int p = r.system().phaseIndex(sm.name());
            if (p > 0 && r.phaseMoles(p) > 0) {
                continue;
            }
            double s = 0;
            double sites = 0;
            double atoms = 0;
            int members = 0;
            for (SolutionModel.EndMember em : sm.endMembers()) {
                Species best = null;
                for (String id : em.speciesIds()) {
                    Species c = byId.get(id);
                    if (c != null && !c.isGas() && c.formula().madeOnlyOf(elSet) && c.isValidAt(tK)
                            && (best == null || c.thermo().gOverRT(tK) < best.thermo().gOverRT(tK))) {
                        best = c;
                    }
                }
                if (best == null) {
                    continue;
                }
                double[] a = formula(best, els);
                s += Math.exp((dot(a, lambda) - best.thermo().gOverRT(tK)) / em.multiplicity());
                sites += em.multiplicity();
                for (double v : a) {
                    atoms += v;
                }
                members++;
            }
            if (members < 2) {
                continue; // not a solution in this system: its members were checked as pure species
            }
            double aff = -Math.log(s) * sites / atoms;
            if (aff < minA[0]) {
                minA[0] = aff;
                minP[0] = sm.name();
            }
        }
    }

    private double sites(String phase, String member) {
        for (SolutionModel sm : spec.solutions()) {
            if (sm.name().equals(phase)) {
                for (SolutionModel.EndMember em : sm.endMembers()) {
                    if (em.name().equals(member)) {
                        return em.multiplicity();
                    }
                }
            }
        }
        throw new IllegalStateException("no end-member " + member + " of " + phase + " in the specification");
    }

    static double[] formula(Species s, List<Element> els) {
        double[] a = new double[els.size()];
        for (int j = 0; j < a.length; j++) {
            a[j] = s.formula().count(els.get(j));
        }
        return a;
    }

    private static double[] fit(List<double[]> rows, List<Double> mus, int m) {
        double[][] a = rows.toArray(new double[0][]);
        double[] rhs = mus.stream().mapToDouble(Double::doubleValue).toArray();
        QRDecomposition qr = new QRDecomposition(new Array2DRowRealMatrix(a, false), 1e-14);
        RealVector x = qr.getSolver().solve(new ArrayRealVector(rhs, false));
        double[] lambda = new double[m];
        for (int j = 0; j < m; j++) {
            lambda[j] = x.getEntry(j);
        }
        return lambda;
    }

    private static double dot(double[] a, double[] l) {
        double s = 0;
        for (int j = 0; j < a.length; j++) {
            s += a[j] * l[j];
        }
        return s;
    }
}
