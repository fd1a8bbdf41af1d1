package org.nebulith.disk;

import java.io.IOException;
import java.io.Reader;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.nebulith.errors.InputException;
import org.nebulith.format.HeaderedLines;

/**
 * Reads a parametric disk file: {@code #} comment lines (provenance), the header
 * {@code parameter,value} exactly, then one {@code key,value} row per parameter, units in the key.
 *
 * <p>{@code model,power-law}: {@code T1_K, q, sigma1_g_cm2, s, r_min_AU, r_max_AU}, and either
 * {@code P1_bar, p} or {@code pressure,hydrostatic} with {@code M_star_Msun, mu}.
 * <br>{@code model,viscous-irradiated}: {@code M_star_Msun, L_star_Lsun, Mdot_Msun_per_yr, alpha, mu,
 * kappa0_cm2_g, kappa_T_exponent, r_min_AU, r_max_AU}, optionally {@code T_irr_ref_K,
 * L_irr_ref_Lsun, M_irr_ref_Msun} (default: Chiang &amp; Goldreich 1997, see {@link FlaringIrradiation}).
 * <br>Optional in both: {@code label}. Unknown or repeated keys, missing keys and bad numbers are
 * {@link InputException}s naming file, line and key.
 */
public final class DiskParameterReader {
    /** The exact header. */
    public static final String HEADER = "parameter,value";
    private static final Set<String> POWER_LAW = Set.of("model", "label", "T1_K", "q", "sigma1_g_cm2", "s",
            "P1_bar", "p", "pressure", "M_star_Msun", "mu", "r_min_AU", "r_max_AU");
    private static final Set<String> VISCOUS = Set.of("model", "label", "M_star_Msun", "L_star_Lsun",
            "Mdot_Msun_per_yr", "alpha", "mu", "kappa0_cm2_g", "kappa_T_exponent", "r_min_AU", "r_max_AU",
            "T_irr_ref_K", "L_irr_ref_Lsun", "M_irr_ref_Msun");

    private record Entry(String value, int line) {
    }

    private final String name;
    private final Map<String, Entry> entries = new LinkedHashMap<>();
    private final List<String> comments = new ArrayList<>();

    private DiskParameterReader(String name) {
        this.name = name;
    }

    /**
     * @param in   the file contents (closed here)
     * @param name the file or preset name for messages
     * @return the disk
     * @throws IOException on read failure
     * @throws InputException on bad content
     */
    public static DiskModel read(Reader in, String name) throws IOException {
        DiskParameterReader r = new DiskParameterReader(name);
        r.load(in);
        return r.build();
    }

    private void load(Reader in) throws IOException {
        boolean header = HeaderedLines.read(in, HEADER, comments,
                (line, lineNo) -> InputException.atField(name, lineNo, "header", line, "not the header", "exactly " + HEADER),
                this::addEntry);
        if (!header) {
            throw InputException.atField(name, 0, "header", "", "no header line", HEADER + " then key,value rows");
        }
    }

    private void addEntry(String line, int lineNo) {
        int comma = line.indexOf(',');
        if (comma <= 0) {
            throw InputException.atField(name, lineNo, "parameter", line, "no key before a comma", "key,value");
        }
        String key = line.substring(0, comma).strip();
        if (entries.put(key, new Entry(line.substring(comma + 1).strip(), lineNo)) != null) {
            throw InputException.atField(name, lineNo, key, line.substring(comma + 1).strip(), "given twice", "each parameter once");
        }
    }

    private DiskModel build() {
        String model = text("model");
        String label = entries.containsKey("label") ? text("label") : name;
        if (model.equals("power-law")) {
            checkKeys(POWER_LAW);
            return powerLaw(label);
        }
        if (model.equals("viscous-irradiated")) {
            checkKeys(VISCOUS);
            return viscous(label);
        }
        throw InputException.atField(name, entries.get("model").line(), "model", model, "unknown model",
                "power-law, viscous-irradiated");
    }

    private DiskModel powerLaw(String label) {
        double t1 = number("T1_K");
        double q = number("q");
        double sigma1 = number("sigma1_g_cm2");
        double s = number("s");
        double rMin = number("r_min_AU");
        double rMax = number("r_max_AU");
        return guard(() -> {
            if (entries.containsKey("pressure")) {
                if (!text("pressure").equals("hydrostatic")) {
                    throw InputException.atField(name, entries.get("pressure").line(), "pressure",
                            text("pressure"), "unknown pressure law", "hydrostatic (or give P1_bar and p instead)");
                }
                return PowerLawDisk.hydrostatic(t1, q, sigma1, s, number("M_star_Msun"), number("mu"), rMin, rMax, label);
            }
            return new PowerLawDisk(t1, q, number("P1_bar"), number("p"), sigma1, s, rMin, rMax, label);
        });
    }

    private DiskModel viscous(String label) {
        FlaringIrradiation irr = entries.containsKey("T_irr_ref_K")
                ? new FlaringIrradiation(number("T_irr_ref_K"), number("L_irr_ref_Lsun"), number("M_irr_ref_Msun"))
                : FlaringIrradiation.chiangGoldreich1997();
        double k0 = number("kappa0_cm2_g");
        double kb = number("kappa_T_exponent");
        return guard(() -> new ViscousIrradiatedDisk(number("M_star_Msun"), number("L_star_Lsun"),
                number("Mdot_Msun_per_yr"), number("alpha"), number("mu"), new PowerLawOpacity(k0, kb), irr,
                number("r_min_AU"), number("r_max_AU"), label));
    }

    private DiskModel guard(java.util.function.Supplier<DiskModel> make) {
        try {
            return make.get();
        } catch (IllegalArgumentException e) {
            throw InputException.atField(name, 0, "parameters", "", e.getMessage(), "physically meaningful values");
        }
    }

    private void checkKeys(Set<String> allowed) {
        for (Map.Entry<String, Entry> e : entries.entrySet()) {
            if (!allowed.contains(e.getKey())) {
                throw InputException.atField(name, e.getValue().line(), e.getKey(), e.getValue().value(),
                        "unknown parameter for model '" + text("model") + "'", String.join(", ", new java.util.TreeSet<>(allowed)));
            }
        }
    }

    private String text(String key) {
        Entry e = entries.get(key);
        if (e == null) {
            throw InputException.atField(name, 0, key, "", "missing", "a row '" + key + ",<value>'");
        }
        return e.value();
    }

    private double number(String key) {
        String v = text(key);
        try {
            double d = Double.parseDouble(v);
            if (Double.isFinite(d)) {
                return d;
            }
        } catch (NumberFormatException ignored) {
            // reported below
        }
        throw InputException.atField(name, entries.get(key).line(), key, v, "not a finite number",
                "a finite number");
    }
}
