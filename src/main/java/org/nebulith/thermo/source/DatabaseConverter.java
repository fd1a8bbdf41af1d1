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
import org.nebulith.thermo.ThermoModel;
import org.nebulith.thermo.source.MineralTableReader.MineralRow;

/**
 * Regenerates the bundled species file ({@code species.csv}) from the source folder
 * {@code src/data/thermo-sources}. The output is a pure function of the input bytes, so the committed
 * resource can be audited by running
 * <pre>java org.nebulith.thermo.source.DatabaseConverter src/data/thermo-sources species.csv</pre>
 * and comparing. Selection: every neutral NASA gas and every NASA condensed entry made only of the
 * {@link Element}s Nebulith tracks, then every row of the mineral table and of the table of published
 * rows added by this project. The corrections table is applied on the way ({@link Corrections}); the
 * source files themselves stay as published.
 */
public final class DatabaseConverter {
    /** The NASA Glenn file in the source folder. */
    public static final String NASA_FILE = "nasa_glenn_thermo.inp";
    /** The mineral table copied unchanged from the shared thermodynamic sources. */
    public static final String MINERAL_FILE = "minerals.csv";
    /** Published rows added by this project, same columns as the mineral table. */
    public static final String ADDED_MINERAL_FILE = "minerals-added.csv";

    private static final String CORRECTED = " corrected by " + Corrections.FILE + ":";

    private DatabaseConverter() {
    }

    /**
     * @param args source folder, output species file
     * @throws IOException on read or write failure
     */
    public static void main(String[] args) throws IOException {
        if (args.length != 2) {
            System.err.println("usage: DatabaseConverter <source folder> <species.csv>");
            System.exit(2);
        }
        Path dir = Path.of(args[0]);
        Path out = Path.of(args[1]).toAbsolutePath();
        if (Files.isSameFile(out.getParent(), dir)) {
            System.err.println(out + ": refusing to write into the source folder");
            System.exit(2);
        }
        try {
            String csv = convert(dir);
            Path tmp = Files.createTempFile(out.getParent(), "species", ".tmp");
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
     * @param dir the source folder holding {@value #NASA_FILE}, {@value #MINERAL_FILE},
     *            {@value #ADDED_MINERAL_FILE} and {@value Corrections#FILE}
     * @return the species file text
     * @throws IOException on read failure
     * @throws InputException naming file, line and field of anything not understood
     */
    public static String convert(Path dir) throws IOException {
        byte[] nasa = Files.readAllBytes(dir.resolve(NASA_FILE));
        byte[] minerals = Files.readAllBytes(dir.resolve(MINERAL_FILE));
        byte[] added = Files.readAllBytes(dir.resolve(ADDED_MINERAL_FILE));
        byte[] corr = Files.readAllBytes(dir.resolve(Corrections.FILE));
        Corrections corrections = Corrections.read(new StringReader(utf8(corr)), Corrections.FILE);
        List<MineralRow> rows = new ArrayList<>(MineralTableReader.read(new StringReader(utf8(minerals)), MINERAL_FILE));
        rows.addAll(MineralTableReader.read(new StringReader(utf8(added)), ADDED_MINERAL_FILE));
        List<String[]> inputs = List.of(new String[] {NASA_FILE, sha256(nasa)},
                new String[] {MINERAL_FILE, sha256(minerals)}, new String[] {ADDED_MINERAL_FILE, sha256(added)},
                new String[] {Corrections.FILE, sha256(corr)});
        return convert(nasa, rows, inputs, corrections);
    }

    private static String utf8(byte[] b) {
        return new String(b, StandardCharsets.UTF_8);
    }

    private static String convert(byte[] nasaBytes, List<MineralRow> minerals, List<String[]> inputs,
                                  Corrections corrections) throws IOException {
        List<NasaGlennReader.Entry> nasa;
        try {
            nasa = NasaGlennReader.read(new StringReader(new String(nasaBytes, StandardCharsets.US_ASCII)), NASA_FILE);
        } catch (IllegalArgumentException ex) {
            throw InputException.atField(NASA_FILE, 0, "record", "", ex.getMessage(), "the NASA TP-2002-211556 record layout");
        }
        SpeciesFileWriter w = new SpeciesFileWriter();
        w.header(inputs, corrections);
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
            writeNasa(w, e, e.name(), "gas", "primary", "", null, corrections);
        }
        for (NasaGlennReader.Entry e : condensed) {
            writeNasa(w, e, e.name(), isLiquid(e) ? "liquid" : "solid", "primary", "", null, corrections);
        }
        for (MineralRow m : minerals) {
            if (m.form().equals("nasa9")) {
                writeNasaComposite(w, m, byName, corrections);
            } else {
                String note = corrections.enthalpyOfFormation(m.id()).map(c -> CORRECTED + c.line()).orElse("");
                w.row(m.id(), "solid", m.formula().notation(), m.sourceKey(), m.file() + ":" + m.line() + note,
                        m.role(), m.variant(), m.form(), m.tMin(), m.tMax(), correctedParams(m, corrections));
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

    /**
     * @param e           a NASA entry as published
     * @param corrections the corrections table
     * @return the intervals with the enthalpy of formation corrected (b1 of every interval shifted by the
     *         change / R), or the published intervals
     */
    static List<Nasa9Model.Interval> correctedIntervals(NasaGlennReader.Entry e, Corrections corrections) {
        Corrections.Correction c = corrections.enthalpyOfFormation(e.name()).orElse(null);
        if (c == null) {
            return e.intervals();
        }
        Corrections.checkApplies(c, e.hf298(), Corrections.FILE);
        List<Nasa9Model.Interval> ivs = new ArrayList<>();
        for (Nasa9Model.Interval iv : e.intervals()) {
            double[] k = iv.coefficients().clone();
            k[7] += c.shift() / ThermoModel.R;
            ivs.add(new Nasa9Model.Interval(iv.tLowK(), iv.tHighK(), k));
        }
        return ivs;
    }

    private static String correctedParams(MineralRow m, Corrections corrections) {
        Corrections.Correction c = corrections.enthalpyOfFormation(m.id()).orElse(null);
        if (c == null) {
            return m.params();
        }
        String key = "H_f_298=";
        int at = m.params().indexOf(key) + key.length();
        int end = m.params().indexOf(';', at);
        Corrections.checkApplies(c, Double.parseDouble(m.params().substring(at, end)), Corrections.FILE);
        return m.params().substring(0, at) + c.correctedValue() + m.params().substring(end);
    }

    private static void writeNasa(SpeciesFileWriter w, NasaGlennReader.Entry e, String id, String state, String role,
                                  String variant, String via, Corrections corrections) {
        Formula f = formula(e);
        List<Nasa9Model.Interval> ivs = correctedIntervals(e, corrections);
        String note = corrections.enthalpyOfFormation(e.name()).map(c -> CORRECTED + c.line()).orElse("");
        for (int i = 0; i < ivs.size(); i++) {
            Nasa9Model.Interval iv = ivs.get(i);
            StringBuilder p = new StringBuilder();
            for (double c : iv.coefficients()) {
                p.append(p.length() == 0 ? "" : " ").append(c);
            }
            String row = NASA_FILE + ":" + e.intervalLines().get(i) + (via == null ? "" : " " + e.name() + " via " + via)
                    + note;
            w.row(id, state, f.notation(), SourceKeys.NASA, row, role, variant, "nasa9",
                    Double.toString(iv.tLowK()), Double.toString(iv.tHighK()), p.toString());
        }
    }

    private static void writeNasaComposite(SpeciesFileWriter w, MineralRow m, Map<String, NasaGlennReader.Entry> byName,
                                           Corrections corrections) {
        for (String n : m.nasaEntries()) {
            NasaGlennReader.Entry e = byName.get(n);
            if (e == null || !e.condensed() || !m.formula().equals(formula(e))) {
                throw InputException.atField(m.file(), m.line(), "source_table_or_file", n,
                        "NASA species missing or of another composition", "names of NASA condensed entries of formula "
                        + m.formula().notation());
            }
            writeNasa(w, e, m.id(), "solid", m.role(), m.variant(), m.file() + ":" + m.line(), corrections);
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
