package org.nebulith.architecture;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;

/**
 * The package order of the contributors' guide ("Architecture"), read from the sources: every
 * reference of a main class to another Nebulith package (an import or a qualified name in code,
 * comments left out) goes to a package of a lower layer or of its own layer. A sub-package belongs to
 * its parent's layer unless it is a layer of its own. No exceptions are listed. Also: the library
 * (every layer below {@code report}) uses neither the command-line, chart nor progress-bar libraries.
 */
class LayeringTest {

    /** Lowest first: each layer may use only the layers before it (and itself). */
    static final List<String> LAYERS = List.of(
            "format", "errors", "progress", "files",
            "thermo", "equilibrium", "composition", "stress", "condensation", "disk", "zones", "planet", "survey", "measured",
            "api",
            "report", "progress.terminal", "cli");

    /** Third-party packages the library must not use (kept out of the library jar's dependencies). */
    static final List<String> NOT_IN_LIBRARY = List.of("picocli.", "org.knowm.", "me.tongfei.",
            "de.erichseifert.", "de.rototor.", "org.apache.pdfbox.");

    private static final Path SOURCES = Path.of("src/main/java");
    private static final Pattern NEBULITH_REF = Pattern.compile("\\borg\\.nebulith\\.((?:[a-z][a-z0-9]*\\.)*)[A-Z]");
    private static final Pattern IMPORT = Pattern.compile("(?m)^import\\s+(?:static\\s+)?([\\w.]+)");
    private static final Pattern PACKAGE = Pattern.compile("(?m)^package\\s+org\\.nebulith\\.([\\w.]+);");

    /** @param pkg a package below org.nebulith, e.g. {@code report.html} @return its layer index */
    static int layer(String pkg) {
        String p = pkg;
        while (true) {
            int i = LAYERS.indexOf(p);
            if (i >= 0) {
                return i;
            }
            int dot = p.lastIndexOf('.');
            if (dot < 0) {
                return -1;
            }
            p = p.substring(0, dot);
        }
    }

    @Test
    void everyPackageUsesOnlyLowerLayers() throws IOException {
        List<String> violations = new ArrayList<>();
        Set<String> unplaced = new TreeSet<>();
        for (Path f : sources()) {
            String text = Files.readString(f, StandardCharsets.UTF_8);
            String pkg = packageOf(text);
            int own = layer(pkg);
            if (own < 0) {
                unplaced.add(pkg);
                continue;
            }
            for (String used : referencedPackages(withoutComments(text))) {
                int theirs = layer(used);
                if (theirs < 0) {
                    unplaced.add(used);
                } else if (theirs > own) {
                    violations.add(SOURCES.relativize(f) + " (" + pkg + ") uses " + used);
                }
            }
        }
        assertEquals(Set.of(), unplaced, "packages missing from the layer list");
        assertEquals(List.of(), violations, "references against the package order");
    }

    @Test
    void theLibraryUsesNoCommandLineChartOrProgressBarLibrary() throws IOException {
        List<String> violations = new ArrayList<>();
        int report = LAYERS.indexOf("report");
        for (Path f : sources()) {
            String text = Files.readString(f, StandardCharsets.UTF_8);
            if (layer(packageOf(text)) >= report) {
                continue;
            }
            Matcher m = IMPORT.matcher(text);
            while (m.find()) {
                for (String banned : NOT_IN_LIBRARY) {
                    if (m.group(1).startsWith(banned)) {
                        violations.add(SOURCES.relativize(f) + " imports " + m.group(1));
                    }
                }
            }
        }
        assertEquals(List.of(), violations);
    }

    @Test
    void theLayerRuleCanFail() {
        assertTrue(layer("cli") > layer("report.planet"));
        assertTrue(layer("report.survey") > layer("survey"));
        assertTrue(layer("thermo.mineral") == layer("thermo"));
        assertEquals(-1, layer("nowhere"));
    }

    private static List<Path> sources() throws IOException {
        try (Stream<Path> s = Files.walk(SOURCES)) {
            return s.filter(p -> p.toString().endsWith(".java")).sorted().toList();
        }
    }

    private static String packageOf(String text) {
        Matcher m = PACKAGE.matcher(text);
        return m.find() ? m.group(1) : "";
    }

    private static Set<String> referencedPackages(String code) {
        Set<String> out = new TreeSet<>();
        Matcher m = NEBULITH_REF.matcher(code);
        while (m.find()) {
            String p = m.group(1);
            if (!p.isEmpty()) {
                out.add(p.substring(0, p.length() - 1));
            }
        }
        return out;
    }

    /** Drops block and line comments (javadoc links are no dependency); string literals are kept. */
    static String withoutComments(String text) {
        return text.replaceAll("(?s)/\\*.*?\\*/", " ").replaceAll("(?m)//.*$", " ");
    }
}
