package org.nebulith.disk;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.Reader;
import java.io.StringReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Collectors;

import org.nebulith.errors.InputException;

/**
 * Resolves a disk argument: a preset name (files in the repository folder {@code presets/},
 * shipped on the classpath under {@code presets/}) or a file, either a parameter file
 * ({@link DiskParameterReader}) or a table ({@link TabulatedDiskReader}), told apart by the header.
 */
public final class DiskPresets {
    /** Minimum-mass solar nebula, Hayashi 1981. */
    public static final String MMSN_HAYASHI1981 = "mmsn-hayashi1981";
    /** A hot early disk of our own design (invented, for demos). */
    public static final String HOT_EARLY_DISK = "hot-early-disk";
    /** A steady viscous, irradiated disk around a solar-type star (parameters chosen by us). */
    public static final String STEADY_VISCOUS_DEFAULT = "steady-viscous-default";
    /** All disk presets. */
    public static final List<String> NAMES = List.of(MMSN_HAYASHI1981, HOT_EARLY_DISK, STEADY_VISCOUS_DEFAULT);

    private DiskPresets() {
    }

    /**
     * @param name a name from {@link #NAMES}
     * @return the disk
     */
    public static DiskModel preset(String name) {
        InputStream in = NAMES.contains(name) ? DiskPresets.class.getResourceAsStream("/presets/" + name + ".csv") : null;
        if (in == null) {
            throw new IllegalArgumentException("unknown disk preset '" + name + "'; accepted: " + NAMES + " or a disk file");
        }
        try (Reader r = new InputStreamReader(in, StandardCharsets.UTF_8)) {
            return read(r, name);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read disk preset " + name, e);
        }
    }

    /**
     * @param arg a preset name or a file path
     * @return the disk
     * @throws IOException if the file cannot be read
     */
    public static DiskModel resolve(String arg) throws IOException {
        if (NAMES.contains(arg)) {
            return preset(arg);
        }
        Path p = Path.of(arg);
        if (!Files.isRegularFile(p)) {
            throw new IllegalArgumentException("disk '" + arg + "' is neither a preset " + NAMES + " nor an existing file");
        }
        try (Reader r = Files.newBufferedReader(p, StandardCharsets.UTF_8)) {
            return read(r, p.toString());
        }
    }

    /**
     * @param in   a disk file of either kind (closed here)
     * @param name its name for messages
     * @return the disk
     * @throws IOException on read failure
     */
    public static DiskModel read(Reader in, String name) throws IOException {
        String text;
        try (BufferedReader br = new BufferedReader(org.nebulith.format.TextInput.withoutBom(in))) {
            text = br.lines().collect(Collectors.joining("\n", "", "\n"));
        }
        List<String> lines = text.lines().map(String::strip).toList();
        int headerLine = 0;
        while (headerLine < lines.size() && (lines.get(headerLine).isEmpty() || lines.get(headerLine).startsWith("#"))) {
            headerLine++;
        }
        String header = headerLine < lines.size() ? lines.get(headerLine) : "";
        if (header.equals(TabulatedDiskReader.HEADER)) {
            return TabulatedDiskReader.read(new StringReader(text), name);
        }
        if (header.equals(DiskParameterReader.HEADER)) {
            return DiskParameterReader.read(new StringReader(text), name);
        }
        throw InputException.atField(name, headerLine + 1, "header", header, "not a disk header",
                TabulatedDiskReader.HEADER + " (table) or " + DiskParameterReader.HEADER + " (parameters)");
    }
}
