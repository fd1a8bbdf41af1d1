package org.nebulith.thermo.mineral;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.StringJoiner;

/**
 * Builds a {@link MineralModel} from the {@code params} field of a species-file row:
 * {@code key=value} pairs separated by {@code ;}, numbers in J, mol, K.
 *
 * <p>Keys: {@code H_f_298}, {@code S_298}, the heat-capacity keys of the {@link MineralForm}, and
 * optionally complete groups of
 * <ul>
 * <li>{@code landau_Tc0, landau_Smax}: {@link LandauTerm} (Holland &amp; Powell 2011);</li>
 * <li>{@code bw_dH, bw_W, bw_n, bw_f}: {@link BraggWilliamsTerm} (Holland &amp; Powell 1996);</li>
 * <li>{@code lambda_l1, lambda_l2, lambda_Tref, lambda_Tlambda}: {@link BermanLambdaTerm};</li>
 * <li>{@code disorder_d0 .. disorder_d4, disorder_Tmin, disorder_Tmax}: {@link BermanDisorderTerm};</li>
 * <li>{@code trans_Tt, trans_dH}: {@link FirstOrderTransition}.</li>
 * </ul>
 * Terms are added in this order.
 */
public final class MineralParameters {
    /** The optional term groups and their keys. */
    public static final Map<String, List<String>> TERM_KEYS = termKeys();

    private MineralParameters() {
    }

    private static Map<String, List<String>> termKeys() {
        Map<String, List<String>> m = new LinkedHashMap<>();
        m.put("landau", List.of("landau_Tc0", "landau_Smax"));
        m.put("bw", List.of("bw_dH", "bw_W", "bw_n", "bw_f"));
        m.put("lambda", List.of("lambda_l1", "lambda_l2", "lambda_Tref", "lambda_Tlambda"));
        m.put("disorder", List.of("disorder_d0", "disorder_d1", "disorder_d2", "disorder_d3", "disorder_d4",
                "disorder_Tmin", "disorder_Tmax"));
        m.put("trans", List.of("trans_Tt", "trans_dH"));
        return java.util.Collections.unmodifiableMap(m);
    }

    /**
     * @param text the params field
     * @return the values by key, in the order written
     * @throws IllegalArgumentException naming the faulty pair
     */
    public static Map<String, Double> parse(String text) {
        Map<String, Double> m = new LinkedHashMap<>();
        for (String pair : text.split(";")) {
            int eq = pair.indexOf('=');
            if (eq <= 0) {
                throw new IllegalArgumentException("'" + pair + "' is not key=value");
            }
            String key = pair.substring(0, eq).trim();
            String value = pair.substring(eq + 1).trim();
            double v;
            try {
                v = Double.parseDouble(value);
            } catch (NumberFormatException ex) {
                throw new IllegalArgumentException("value of " + key + " '" + value + "' is not a number");
            }
            if (!Double.isFinite(v)) {
                throw new IllegalArgumentException("value of " + key + " is not finite");
            }
            if (m.put(key, v) != null) {
                throw new IllegalArgumentException("key " + key + " given twice");
            }
        }
        return m;
    }

    /** @return a one-line description of the accepted keys for a form (for error messages) */
    public static String acceptedKeys(MineralForm form) {
        StringJoiner j = new StringJoiner(", ");
        j.add("H_f_298").add("S_298");
        form.cpKeys().forEach(j::add);
        return j + " and optional complete groups " + TERM_KEYS.values();
    }

    /**
     * @param form   the heat-capacity form
     * @param params the parsed params
     * @param tMinK  source lower limit [K]
     * @param tMaxK  source upper limit [K] or NaN
     * @return the model
     * @throws IllegalArgumentException naming a missing, unknown or invalid key
     */
    public static MineralModel build(MineralForm form, Map<String, Double> params, double tMinK, double tMaxK) {
        Map<String, Double> rest = new LinkedHashMap<>(params);
        double hf = take(rest, "H_f_298");
        double s = take(rest, "S_298");
        Map<String, Double> cp = new LinkedHashMap<>();
        for (String k : form.cpKeys()) {
            cp.put(k, take(rest, k));
        }
        List<TransitionTerm> terms = new ArrayList<>();
        for (Map.Entry<String, List<String>> g : TERM_KEYS.entrySet()) {
            List<String> keys = g.getValue();
            if (keys.stream().noneMatch(rest::containsKey)) {
                continue;
            }
            double[] v = new double[keys.size()];
            for (int i = 0; i < v.length; i++) {
                v[i] = take(rest, keys.get(i));
            }
            terms.add(term(g.getKey(), v));
        }
        if (!rest.isEmpty()) {
            throw new IllegalArgumentException("unknown key " + rest.keySet().iterator().next() + " for form "
                    + form.code());
        }
        return new MineralModel(hf, s, form.heatCapacity(cp), terms, tMinK, tMaxK);
    }

    private static TransitionTerm term(String group, double[] v) {
        switch (group) {
            case "landau":
                return new LandauTerm(v[0], v[1]);
            case "bw":
                return new BraggWilliamsTerm(v[0], v[1], v[2], v[3]);
            case "lambda":
                return new BermanLambdaTerm(v[0], v[1], v[2], v[3]);
            case "disorder":
                return new BermanDisorderTerm(new double[] {v[0], v[1], v[2], v[3], v[4]}, v[5], v[6]);
            case "trans":
                return new FirstOrderTransition(v[0], v[1]);
            default:
                throw new IllegalStateException("unhandled term group " + group);
        }
    }

    private static double take(Map<String, Double> m, String key) {
        Double v = m.remove(key);
        if (v == null) {
            throw new IllegalArgumentException("missing key " + key);
        }
        return v;
    }
}
