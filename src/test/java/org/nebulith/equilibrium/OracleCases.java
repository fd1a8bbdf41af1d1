package org.nebulith.equilibrium;

import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.nebulith.thermo.DataSet;
import org.nebulith.thermo.Element;

/**
 * The CEA oracle of the test resources ({@code /oracle}, see its README: NASA CEA, Gordon &amp;
 * McBride 1994, as packaged in Debian rocketcea 1.1.18, with the NASA Glenn data): 30 fixed-T,P
 * cases with their species lists and the polished mole numbers of every species.
 */
public final class OracleCases {
    /** Resource folder of the oracle. */
    public static final String FOLDER = "/oracle/";

    /**
     * One expected amount.
     *
     * @param species      species id (NASA name)
     * @param gas          true for a gas
     * @param moles        the polished CEA amount [mol, input basis]
     * @param moleFraction the gas mole fraction (NaN for condensed)
     */
    public record Expected(String species, boolean gas, double moles, double moleFraction) {
    }

    /**
     * One case.
     *
     * @param id            case id
     * @param gasList       resource path of its gas list
     * @param condensedList resource path of its condensed list
     * @param tK            temperature [K]
     * @param pBar          pressure [bar]
     * @param amounts       element amounts [mol]
     * @param present       condensed phases present in CEA's answer
     * @param expected      every species of the lists with its amount
     */
    public record Case(String id, String gasList, String condensedList, double tK, double pBar,
                       Map<Element, Double> amounts, Set<String> present, List<Expected> expected) {
        @Override
        public String toString() {
            return id;
        }

        /** @return the system specification: data set nasa, the case's lists, no solutions */
        public SystemSpec spec() {
            return new SystemSpec(DataSet.NASA, List.of(), Optional.empty(), Optional.of(ids(gasList)),
                    Optional.of(ids(condensedList)), List.of());
        }

        /** @return the case's inline composition, e.g. {@code H=1,He=0.085,...} */
        public String inlineElements() {
            List<String> parts = new ArrayList<>();
            amounts.forEach((e, v) -> parts.add(e.symbol() + "=" + v));
            return String.join(",", parts);
        }
    }

    private static List<Case> cases;

    private OracleCases() {
    }

    /** @return all cases, in file order */
    public static synchronized List<Case> all() {
        if (cases == null) {
            cases = load();
        }
        return cases;
    }

    /** @param id a case id @return the case */
    public static Case byId(String id) {
        return all().stream().filter(c -> c.id().equals(id)).findFirst().orElseThrow();
    }

    /** @param resource a list under {@link #FOLDER} @return its ids (comments and blanks skipped) */
    public static Set<String> ids(String resource) {
        Set<String> ids = new LinkedHashSet<>();
        for (String line : text(resource).split("\n")) {
            String s = line.trim();
            if (!s.isEmpty() && !s.startsWith("#")) {
                ids.add(s);
            }
        }
        return ids;
    }

    private static List<Case> load() {
        Map<String, List<Expected>> byCase = new LinkedHashMap<>();
        for (CSVRecord r : records("results.csv")) {
            boolean gas = r.get("phase").equals("gas");
            String xf = r.get("gas_mole_fraction");
            byCase.computeIfAbsent(r.get("case_id"), k -> new ArrayList<>()).add(new Expected(r.get("species"), gas,
                    Double.parseDouble(r.get("moles_polished")), xf.isEmpty() ? Double.NaN : Double.parseDouble(xf)));
        }
        List<Case> out = new ArrayList<>();
        for (CSVRecord r : records("cases.csv")) {
            Map<Element, Double> b = new EnumMap<>(Element.class);
            for (String col : r.getParser().getHeaderNames()) {
                if (col.startsWith("b_")) {
                    b.put(Element.fromSymbol(col.substring(2)), Double.parseDouble(r.get(col)));
                }
            }
            Set<String> present = new TreeSet<>();
            for (String p : r.get("condensed_present").trim().split("\\s+")) {
                if (!p.isEmpty()) {
                    present.add(p);
                }
            }
            String id = r.get("case_id");
            out.add(new Case(id, r.get("gas_list"), r.get("condensed_list"), Double.parseDouble(r.get("T_K")),
                    Double.parseDouble(r.get("P_bar")), b, present, List.copyOf(byCase.get(id))));
        }
        return List.copyOf(out);
    }

    private static List<CSVRecord> records(String name) {
        try (Reader in = reader(name)) {
            return CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get().parse(in).getRecords();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static Reader reader(String name) {
        InputStream s = OracleCases.class.getResourceAsStream(FOLDER + name);
        if (s == null) {
            throw new IllegalStateException("missing test resource " + FOLDER + name);
        }
        return new InputStreamReader(s, StandardCharsets.UTF_8);
    }

    private static String text(String name) {
        try (InputStream s = OracleCases.class.getResourceAsStream(FOLDER + name)) {
            if (s == null) {
                throw new IllegalStateException("missing test resource " + FOLDER + name);
            }
            return new String(s.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
