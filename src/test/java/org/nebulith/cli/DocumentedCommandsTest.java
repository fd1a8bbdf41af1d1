package org.nebulith.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;

import picocli.CommandLine;

/**
 * Every {@code nebulith ...} command line printed in README.md and in the examples of every
 * {@code --help} parses: the command exists, every option exists and every value has the option's
 * type. (Whether each runs as printed is checked by hand before a release; see DEVELOPERS.md.)
 */
class DocumentedCommandsTest {

    private static CommandLine fresh() {
        PrintStream sink = new PrintStream(new ByteArrayOutputStream(), true, StandardCharsets.UTF_8);
        return Main.commandLine(sink, sink, new PrintWriter(sink));
    }

    /** @return the command lines of indented code lines starting with "nebulith ", continuations joined */
    static List<String> commandLines(List<String> lines, String indent) {
        List<String> out = new ArrayList<>();
        StringBuilder pending = null;
        for (String raw : lines) {
            String line = raw.startsWith(indent) ? raw.substring(indent.length()).strip() : null;
            if (pending != null && line != null) {
                pending.append(' ').append(line.replaceFirst("\\\\$", "").strip());
                if (!line.endsWith("\\")) {
                    out.add(pending.toString());
                    pending = null;
                }
                continue;
            }
            pending = null;
            if (line != null && line.startsWith("nebulith ") && !line.contains("[")) {
                String text = line.replaceFirst("\\s{2,}\\S.*$", "");
                if (line.endsWith("\\")) {
                    pending = new StringBuilder(line.replaceFirst("\\\\$", "").strip());
                } else {
                    out.add(text.strip());
                }
            }
        }
        return out;
    }

    private static void assertParses(String commandLine, String where) {
        String args = commandLine.replaceFirst("^nebulith\\s+", "").replaceFirst("\\s+(>|\\||&&).*$", "");
        String[] words = args.split("\\s+");
        try {
            fresh().parseArgs(words);
        } catch (CommandLine.ParameterException e) {
            throw new AssertionError(where + ": '" + commandLine + "': " + e.getMessage(), e);
        }
    }

    @Test
    void everyCommandOfTheReadmeParses() throws IOException {
        List<String> commands = commandLines(Files.readAllLines(Path.of("README.md")), "    ");
        assertTrue(commands.size() >= 8, commands.toString());
        for (String c : commands) {
            if (!c.contains("NAME") && !c.contains("FILE")) {
                assertParses(c, "README.md");
            }
        }
    }

    @Test
    void everyExampleOfTheHelpParses() {
        int checked = 0;
        for (Map.Entry<String, CommandLine> e : fresh().getSubcommands().entrySet()) {
            List<String> footer = List.of(e.getValue().getCommandSpec().usageMessage().footer());
            for (String c : commandLines(footer, "  ")) {
                if (!c.contains("NAME") && !c.contains("CATALOGUE.csv") && !c.startsWith("nebulith help")) {
                    assertParses(c, e.getKey() + " --help");
                    checked++;
                }
            }
        }
        assertTrue(checked >= 15, "examples checked: " + checked);
    }

    @Test
    void theJoinerKeepsContinuationLinesAndDropsComments() {
        assertEquals(List.of("nebulith point --T-K 1200 --P-bar 1e-3", "nebulith planet"),
                commandLines(List.of("  nebulith point \\", "      --T-K 1200 --P-bar 1e-3",
                        "  nebulith planet              demo scenario (about a minute)"), "  "));
    }
}
