package org.nebulith.survey;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.nebulith.composition.ElementAbundances;
import org.nebulith.composition.SolarReference;
import org.nebulith.composition.StellarAbundances;
import org.nebulith.format.Decimal;
import org.nebulith.planet.MolarRatios;
import org.nebulith.planet.Quantity;
import org.nebulith.thermo.Element;

/**
 * The survey of one star: a static pure function of its row, the settings and the seed. The local
 * {@link SurveyRunner} and a distributed engine call this same function.
 *
 * <p>Method: the nominal estimate uses the catalogue values. Draws come in antithetic pairs
 * (Hammersley &amp; Morton 1956): draw d (0 &le; d &lt; N) uses the stream
 * {@link DrawRandom#forDraw}(seed, star, d - d mod 2) and the sign s = +1 for even d, -1 for odd d;
 * from the stream come first a common deviate z0, then one deviate z_X per measured element in
 * {@link Element} order, and [X/H] = value + s error (sqrt(rho) z0 + sqrt(1 - rho) z_X) with rho the
 * row's error correlation (0: independent errors). Each draw is still exactly Normal; the pairing
 * makes the medians converge much faster (the Normal is symmetric). Elements the star lacks follow
 * the drawn [Fe/H] ({@link StellarAbundances}, common practice). Every draw runs the estimator;
 * each quantity is summarised by its median and 16th/84th percentiles ({@link Percentiles}) over
 * the draws that converged and to which it applies. A draw whose estimate throws is recorded
 * ({@link DrawFailure}) and left out; its random stream is its own, so the other draws are unchanged.
 * All N draws are random (the nominal estimate is reported beside them, not mixed in), so a star
 * with zero errors gives median = p16 = p84 = nominal exactly.
 *
 * <p>Rows: zone {@code host} first (the star's own molar Mg/Si, Fe/Si, Ca/Si, Al/Si with their
 * spread), then the estimator's zones and quantities in its order.
 */
public final class StarJob {

    /** The reserved zone name of the star's own ratios. */
    public static final String HOST_ZONE = "host";
    /** Unit of the host ratios. */
    public static final String MOLAR = "mol/mol";
    private static final Element[][] HOST_RATIOS = {
        {Element.Mg, Element.Si}, {Element.Fe, Element.Si}, {Element.Ca, Element.Si}, {Element.Al, Element.Si}};
    private static final Map<SolarReference, ElementAbundances> SOLAR = new EnumMap<>(SolarReference.class);

    static {
        for (SolarReference r : SolarReference.values()) {
            SOLAR.put(r, r.abundances());
        }
    }

    private StarJob() {
    }

    /** Receives the wall time of each draw; called on the worker threads, so implementations are thread-safe. */
    @FunctionalInterface
    public interface DrawClock {
        /** Ignores the times. */
        DrawClock NONE = nanos -> { };

        /** @param nanos wall time of one draw's estimate, converged or failed [ns] */
        void draw(long nanos);
    }

    /** One output quantity: zone, name, unit. */
    private record Key(String zone, String name, String unit) {
    }

    /**
     * @param row       the star
     * @param settings  the run settings (draws, seed, solar reference are used here)
     * @param general   the planet estimate for {@code settings.forStar(row)}
     * @return the star's rows: host ratios, then every zone's quantities (draws that failed left out)
     * @throws StarJobException if the nominal estimate fails, or if an estimate's layout changes between draws
     */
    public static List<SurveyRow> run(StarRow row, SurveySettings settings, PlanetEstimator general) {
        StarResult r = survey(row, settings, general);
        if (r.failed()) {
            DrawFailure f = r.nominalFailure().get();
            throw new StarJobException(row.star(), row.line(), StarJobException.NOMINAL,
                    new IllegalStateException(describe(f)));
        }
        return r.rows();
    }

    /**
     * The fail-soft survey of one star: a draw whose estimate throws is recorded and left out of the
     * percentiles; a failing nominal estimate fails the star (no rows, one failure).
     *
     * @param row       the star
     * @param settings  the run settings (draws, seed, solar reference are used here)
     * @param general   the planet estimate for {@code settings.forStar(row)}
     * @return the star's rows and failures
     * @throws StarJobException if an estimate's layout changes between draws or uses the reserved zone
     *                          name (a defect of the estimator, not a numerical failure)
     */
    public static StarResult survey(StarRow row, SurveySettings settings, PlanetEstimator general) {
        return survey(row, settings, general, DrawClock.NONE);
    }

    /**
     * {@link #survey(StarRow, SurveySettings, PlanetEstimator)} that also reports the wall time of
     * every draw (benchmarks); the result is the same.
     *
     * @param row      the star
     * @param settings the run settings
     * @param general  the planet estimate for {@code settings.forStar(row)}
     * @param clock    receives the wall time of each draw's estimate [ns]
     * @return the star's rows and failures
     */
    public static StarResult survey(StarRow row, SurveySettings settings, PlanetEstimator general, DrawClock clock) {
        ElementAbundances solar = SOLAR.get(settings.solar());
        Map<Element, Double> nominalDex = new EnumMap<>(Element.class);
        row.abundances().forEach((el, m) -> nominalDex.put(el, m.dex()));
        List<Key> keys = new ArrayList<>();
        ElementAbundances nominalGas = compose(solar, nominalDex);
        int n = settings.draws();
        PlanetEstimator estimator;
        double[] nominal;
        try {
            estimator = general.near(nominalGas);
            nominal = evaluate(row, StarJobException.NOMINAL, nominalGas, estimator, keys);
        } catch (StarJobException e) {
            throw e;
        } catch (RuntimeException e) {
            return new StarResult(List.of(), List.of(DrawFailure.of(row.star(), StarJobException.NOMINAL, e)), n);
        }
        double[][] values = new double[nominal.length][n];
        boolean[] converged = new boolean[n];
        List<DrawFailure> failures = new ArrayList<>();
        double rho = row.errorCorrelation();
        double common = Math.sqrt(rho);
        double own = Math.sqrt(1.0 - rho);
        for (int d = 0; d < n; d++) {
            DrawRandom random = DrawRandom.forDraw(settings.seed(), row.star(), d - (d & 1));
            double sign = (d & 1) == 0 ? 1.0 : -1.0;
            double z0 = sign * random.nextGaussian();
            Map<Element, Double> dex = new EnumMap<>(Element.class);
            for (Map.Entry<Element, Measurement> e : row.abundances().entrySet()) {
                double z = sign * random.nextGaussian();
                Measurement m = e.getValue();
                dex.put(e.getKey(), m.dex() + m.error() * (common * z0 + own * z));
            }
            double[] v;
            ElementAbundances gas = compose(solar, dex);
            long start = System.nanoTime();
            try {
                v = evaluate(row, d, gas, estimator, keys);
            } catch (StarJobException e) {
                throw e;
            } catch (RuntimeException e) {
                failures.add(DrawFailure.of(row.star(), d, e));
                continue;
            } finally {
                clock.draw(System.nanoTime() - start);
            }
            converged[d] = true;
            for (int k = 0; k < v.length; k++) {
                values[k][d] = v[k];
            }
        }
        List<SurveyRow> rows = new ArrayList<>(keys.size());
        for (int k = 0; k < keys.size(); k++) {
            rows.add(summarise(row.star(), keys.get(k), values[k], converged, nominal[k], n));
        }
        return new StarResult(rows, failures, n);
    }

    /** Percentiles of the converged draws to which the quantity applies (NaN marks "does not apply"). */
    private static SurveyRow summarise(String star, Key key, double[] values, boolean[] converged, double nominal,
                                       int n) {
        double[] behind = new double[values.length];
        int count = 0;
        int notApplicable = 0;
        for (int d = 0; d < values.length; d++) {
            if (!converged[d]) {
                continue;
            }
            if (Double.isNaN(values[d])) {
                notApplicable++;
            } else {
                behind[count++] = values[d];
            }
        }
        double[] s = count == 0 ? new double[] {Double.NaN, Double.NaN, Double.NaN}
                : Percentiles.summary(java.util.Arrays.copyOf(behind, count));
        return new SurveyRow(star, key.zone(), key.name(), s[0], s[1], s[2], key.unit(), nominal, n, count,
                notApplicable);
    }

    /** @return a failure as one line: stage, zone, state and reason */
    static String describe(DrawFailure f) {
        StringBuilder b = new StringBuilder(f.stage().equals(DrawFailure.NOMINAL) ? "nominal estimate" : "draw " + f.draw());
        if (!f.zone().isEmpty()) {
            b.append(", zone '").append(f.zone()).append('\'');
        }
        if (!Double.isNaN(f.tK())) {
            b.append(", T = ").append(Decimal.format(f.tK())).append(" K, P = ").append(Decimal.format(f.pBar()))
                    .append(" bar");
        }
        return b.append(": ").append(f.reason()).toString();
    }

    /**
     * @param row   a star
     * @param solar the solar reference
     * @return the elements that follow [Fe/H] for this star (the reference's elements it lacks,
     *         except H and He)
     */
    public static Set<Element> followedFeH(StarRow row, SolarReference solar) {
        Map<Element, Double> dex = new EnumMap<>(Element.class);
        row.abundances().forEach((el, m) -> dex.put(el, m.dex()));
        return StellarAbundances.apply(SOLAR.get(solar), dex).followedFeH();
    }

    private static ElementAbundances compose(ElementAbundances solar, Map<Element, Double> dex) {
        return StellarAbundances.apply(solar, dex).abundances();
    }

    /** Runs one estimate; fills keys on the first call and checks them on later ones. */
    private static double[] evaluate(StarRow row, int draw, ElementAbundances gas, PlanetEstimator estimator,
                                     List<Key> keys) {
        LinkedHashMap<String, List<Quantity>> zones;
        zones = estimator.estimate(gas);
        List<Key> seen = new ArrayList<>();
        List<Double> values = new ArrayList<>();
        for (Element[] r : HOST_RATIOS) {
            seen.add(new Key(HOST_ZONE, MolarRatios.key(r[0], r[1]), MOLAR));
            values.add(gas.ratio(r[0], r[1]));
        }
        for (Map.Entry<String, List<Quantity>> zone : zones.entrySet()) {
            if (HOST_ZONE.equals(zone.getKey())) {
                throw new StarJobException(row.star(), row.line(), draw,
                        new IllegalStateException("the estimator used the reserved zone name '" + HOST_ZONE + "'"));
            }
            for (Quantity q : zone.getValue()) {
                seen.add(new Key(zone.getKey(), q.name(), q.unit()));
                values.add(q.applies() ? q.value() : Double.NaN);
            }
        }
        if (keys.isEmpty()) {
            keys.addAll(seen);
        } else if (!keys.equals(seen)) {
            throw new StarJobException(row.star(), row.line(), draw, new IllegalStateException(
                    "the estimate's zones and quantities differ from the nominal estimate's (" + keys.size()
                            + " quantities there, " + seen.size() + " here); a survey needs the same layout for every draw"));
        }
        double[] out = new double[values.size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = values.get(i);
        }
        return out;
    }
}
