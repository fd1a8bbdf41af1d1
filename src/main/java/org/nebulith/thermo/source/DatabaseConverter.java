package org.nebulith.thermo.source;

import java.io.IOException;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.nebulith.errors.InputException;
import org.nebulith.thermo.Element;
import org.nebulith.thermo.Formula;
import org.nebulith.thermo.Nasa9Model;
import org.nebulith.thermo.source.MineralTableReader.MineralRow;

/**
 * Regenerates the bundled species file ({@code species.csv}) from the NASA Glenn file and the
 * mineral table kept in {@code src/data/thermo-sources}. The output is a pure function of the input
 * bytes, so the committed resource can be audited by running
 * <pre>java org.nebulith.thermo.source.DatabaseConverter nasa_glenn_thermo.inp minerals.csv species.csv</pre>
 * and comparing. Selection: every neutral NASA gas and every NASA condensed entry made only of the
 * {@link Element}s Nebulith tracks, then every row of the mineral table.
 */
public final class DatabaseConverter {
    private DatabaseConverter() {
    }

    /**
     * @param args NASA file, mineral table, output species file
     * @throws IOException on read or write failure
     */
    public static void main(String[] args) throws IOException {
        if (args.length != 3) {
            System.err.println("usage: DatabaseConverter <nasa_glenn_thermo.inp> <minerals.csv> <species.csv>");
            System.exit(2);
        }
        Path nasa = Path.of(args[0]);
        Path minerals = Path.of(args[1]);
        Path out = Path.of(args[2]);
        if (Files.exists(out) && (Files.isSameFile(out, nasa) || Files.isSameFile(out, minerals))) {
            System.err.println(out + ": refusing to overwrite an input file");
            System.exit(2);
        }
        try {
            String csv = convert(Files.readAllBytes(nasa), nasa.getFileName().toString(),
                    Files.readAllBytes(minerals), minerals.getFileName().toString());
            Path dir = out.toAbsolutePath().getParent();
            Path tmp = Files.createTempFile(dir, "species", ".tmp");
            Files.writeString(tmp, csv, StandardCharsets.UTF_8);
            Files.move(tmp, out, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        } catch (InputException ex) {
            System.err.println(ex.getMessage());
            System.exit(2);
        } catch (IOException ex) {
            System.err.println("cannot convert: " + ex);
            System.exit(2);
        }
    }

    /**
     * @param nasaBytes     the NASA Glenn file
     * @param nasaName      its file name
     * @param mineralBytes  the mineral table
     * @param mineralName   its file name
     * @return the species file text
     * @throws IOException on read failure
     */
    public static String convert(byte[] nasaBytes, String nasaName, byte[] mineralBytes, String mineralName)
            throws IOException {
        List<NasaGlennReader.Entry> nasa;
        try {
            nasa = NasaGlennReader.read(new StringReader(new String(nasaBytes, StandardCharsets.US_ASCII)), nasaName);
        } catch (IllegalArgumentException ex) {
            throw InputException.atField(nasaName, 0, "record", "", ex.getMessage(), "the NASA TP-2002-211556 record layout");
        }
        List<MineralRow> minerals = MineralTableReader.read(
                new StringReader(new String(mineralBytes, StandardCharsets.UTF_8)), mineralName);
        SpeciesFileWriter w = new SpeciesFileWriter();
        w.header(sha256(nasaBytes), nasaName, sha256(mineralBytes), mineralName);
        List<NasaGlennReader.Entry> gases = new ArrayList<>();
        List<NasaGlennReader.Entry> condensed = new ArrayList<>();
        for (NasaGlennReader.Entry e : nasa) {
            if (formula(e) == null || (!e.condensed() && e.isIon())) {
                continue;
            }
            (e.condensed() ? condensed : gases).add(e);
        }
        Map<String, NasaGlennReader.Entry> byName = new LinkedHashMap<>();
        for (NasaGlennReader.Entry e : nasa) {
            byName.put(e.name(), e);
        }
        for (NasaGlennReader.Entry e : gases) {
            writeNasa(w, e, e.name(), "gas", "primary", "", nasaName, null);
        }
        for (NasaGlennReader.Entry e : condensed) {
            writeNasa(w, e, e.name(), isLiquid(e) ? "liquid" : "solid", "primary", "", nasaName, null);
        }
        for (MineralRow m : minerals) {
            if (m.form().equals("nasa9")) {
                writeNasaComposite(w, m, byName, nasaName, mineralName);
            } else {
                w.row(m.id(), "solid", m.formula().notation(), m.sourceKey(), mineralName + ":" + m.line(), m.role(),
                        m.variant(), m.form(), m.tMin(), m.tMax(), m.params());
            }
        }
        return w.text();
    }

    /** @return the formula if every element is tracked and it is not an ion, else null */
    static Formula formula(NasaGlennReader.Entry e) {
        if (e.isIon()) {
            return null;
        }
        Map<Element, Double> m = new LinkedHashMap<>();
        for (Map.Entry<String, Double> el : e.elements().entrySet()) {
            Element x = Element.fromSymbol(el.getKey());
            if (x == null) {
                return null;
            }
            m.merge(x, el.getValue(), Double::sum);
        }
        return m.isEmpty() ? null : Formula.of(m);
    }

    /** A NASA condensed entry is liquid if its name ends in (L) or its description says so. */
    static boolean isLiquid(NasaGlennReader.Entry e) {
        return e.name().endsWith("(L)") || e.comment().startsWith("Liquid");
    }

    private static void writeNasa(SpeciesFileWriter w, NasaGlennReader.Entry e, String id, String state, String role,
                                  String variant, String nasaName, String via) {
        Formula f = formula(e);
        for (int i = 0; i < e.intervals().size(); i++) {
            Nasa9Model.Interval iv = e.intervals().get(i);
            StringBuilder p = new StringBuilder();
            for (double c : iv.coefficients()) {
                p.append(p.length() == 0 ? "" : " ").append(c);
            }
            String row = nasaName + ":" + e.intervalLines().get(i) + (via == null ? "" : " " + e.name() + " via " + via);
            w.row(id, state, f.notation(), "NASA-Glenn-2002", row, role, variant, "nasa9",
                    Double.toString(iv.tLowK()), Double.toString(iv.tHighK()), p.toString());
        }
    }

    private static void writeNasaComposite(SpeciesFileWriter w, MineralRow m, Map<String, NasaGlennReader.Entry> byName,
                                           String nasaName, String mineralName) {
        for (String n : m.nasaEntries()) {
            NasaGlennReader.Entry e = byName.get(n);
            if (e == null || !e.condensed() || !m.formula().equals(formula(e))) {
                throw InputException.atField(mineralName, m.line(), "source_table_or_file", n,
                        "NASA species missing or of another composition", "names of NASA condensed entries of formula "
                        + m.formula().notation());
            }
            writeNasa(w, e, m.id(), "solid", m.role(), m.variant(), nasaName, mineralName + ":" + m.line());
        }
    }

    private static String sha256(byte[] b) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(b));
        } catch (NoSuchAlgorithmException ex) {
            throw new IllegalStateException("SHA-256 not available", ex);
        }
    }
}
