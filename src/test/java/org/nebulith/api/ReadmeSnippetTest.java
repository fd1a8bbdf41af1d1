package org.nebulith.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import jdk.jshell.JShell;
import jdk.jshell.Snippet;
import jdk.jshell.SnippetEvent;
import jdk.jshell.SourceCodeAnalysis;

/**
 * The README's "Use from Java or JShell" block runs, snippet by snippet, through the JDK's
 * {@code jdk.jshell} API (in this JVM, on the test class path), so the documented library use
 * cannot rot.
 */
@Tag("slow")
class ReadmeSnippetTest {

    static String snippetBlock() throws IOException {
        String readme = Files.readString(Path.of("README.md"));
        int section = readme.indexOf("## Use from Java or JShell");
        assertTrue(section >= 0, "README section missing");
        int start = readme.indexOf("```java\n", section);
        int end = readme.indexOf("```", start + 8);
        return readme.substring(start + 8, end);
    }

    @Test
    void readmeLibrarySnippetRunsInJShell() throws IOException {
        try (JShell shell = JShell.builder().executionEngine("local").build()) {
            for (String entry : System.getProperty("java.class.path").split(java.io.File.pathSeparator)) {
                shell.addToClasspath(entry);
            }
            List<String> failures = new ArrayList<>();
            String rest = snippetBlock();
            while (!rest.isBlank()) {
                SourceCodeAnalysis.CompletionInfo info = shell.sourceCodeAnalysis().analyzeCompletion(rest);
                for (SnippetEvent e : shell.eval(info.source())) {
                    if (e.status() == Snippet.Status.REJECTED || e.exception() != null) {
                        failures.add(info.source().strip() + " -> " + e.status() + " "
                                + (e.exception() == null ? shell.diagnostics(e.snippet()).map(d -> d.getMessage(null))
                                .toList() : e.exception()));
                    }
                }
                rest = info.remaining();
            }
            assertEquals(List.of(), failures);
            assertFalse(shell.variables().findAny().isEmpty());
            String forsterite = shell.eval("forsterite > 0").get(0).value();
            assertEquals("true", forsterite, "forsterite condensed at 1300 K, 1e-4 bar");
            String summary = shell.eval("state.toString()").get(0).value();
            assertTrue(summary.startsWith("\"equilibrium at T = 1300 K, P = 0.0001 bar:"), summary);
            double t50 = Double.parseDouble(shell.eval("sequence.t50K(\"Al\").getAsDouble()").get(0).value());
            assertTrue(t50 > 1500 && t50 < 1800, "T50(Al) between 1500 and 1800 K at 1e-4 bar (common practice): " + t50);
            double mgSi = Double.parseDouble(shell.eval("planets.list().get(0).ratio(\"Mg\", \"Si\")").get(0).value());
            assertTrue(mgSi > 0.5 && mgSi < 2, "a rocky planet's Mg/Si (common practice): " + mgSi);
        }
    }
}
