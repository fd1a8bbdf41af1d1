package org.nebulith.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;

import org.junit.jupiter.api.Test;

import picocli.CommandLine;
import picocli.CommandLine.Model.OptionSpec;

/**
 * The help as a user sees it on an 80-column terminal: no line of a description or example is
 * wrapped by the renderer, no value (e.g. {@code O=4.9e-4}) is broken across lines, and the options
 * each command lists are the ones it uses.
 */
class HelpTextTest {
    private static final int WIDTH = 80;

    private static Map<String, CommandLine> commands() {
        PrintStream sink = new PrintStream(new ByteArrayOutputStream(), true, StandardCharsets.UTF_8);
        CommandLine cli = Main.commandLine(sink, sink, new PrintWriter(sink));
        return cli.getSubcommands();
    }

    private static String help(CommandLine c) {
        c.setUsageHelpWidth(WIDTH);
        c.setUsageHelpAutoWidth(false);
        return c.getUsageMessage(CommandLine.Help.Ansi.OFF);
    }

    @Test
    void descriptionAndExampleLinesFitWithoutWrapping() {
        List<String> problems = new ArrayList<>();
        for (Map.Entry<String, CommandLine> e : commands().entrySet()) {
            CommandLine.Model.UsageMessageSpec u = e.getValue().getCommandSpec().usageMessage();
            List<String> lines = new ArrayList<>(List.of(u.description()));
            lines.addAll(List.of(u.footer()));
            for (String line : lines) {
                String shown = String.format(line.replace("%n", ""));
                if (shown.length() > WIDTH) {
                    problems.add(e.getKey() + ": line longer than " + WIDTH + ": " + shown);
                }
            }
        }
        assertEquals(List.of(), problems);
    }

    @Test
    void noValueIsBrokenAcrossLines() {
        List<String> problems = new ArrayList<>();
        for (Map.Entry<String, CommandLine> e : commands().entrySet()) {
            String text = help(e.getValue());
            for (OptionSpec o : e.getValue().getCommandSpec().options()) {
                for (String word : String.join(" ", o.description()).split("\\s+")) {
                    String w = word.replaceAll("[.,;:)]+$", "").replaceAll("^[(]", "");
                    if (w.matches(".*[=0-9].*") && !w.contains("${")) {
                        if (!text.contains(w)) {
                            problems.add(e.getKey() + " " + o.longestName() + ": '" + w + "' broken");
                        }
                    }
                }
            }
        }
        assertEquals(List.of(), problems);
    }

    @Test
    void benchListsOnlyOptionsThatActThereAndBenchSurveyHasQuietAndVerbose() {
        Map<String, CommandLine> c = commands();
        List<String> bench = names(c.get("bench"));
        for (String inert : List.of("--out", "--force", "--run-name")) {
            assertFalse(bench.contains(inert), "bench lists " + inert);
        }
        List<String> benchSurvey = names(c.get("bench-survey"));
        assertTrue(benchSurvey.containsAll(List.of("--quiet", "--verbose")), benchSurvey.toString());
        List<String> point = names(c.get("point"));
        assertFalse(point.contains("--run-name"), "point writes no folder");
        OptionSpec out = c.get("point").getCommandSpec().findOption("--out");
        assertFalse(String.join(" ", out.description()).contains("reports/"), "point --out claims a default folder");
    }

    @Test
    void removalFractionIsDocumentedAndTheOldNameIsGone() {
        CommandLine seq = commands().get("sequence");
        assertEquals("F", seq.getCommandSpec().findOption("--removal-fraction").paramLabel());
        assertFalse(help(seq).contains("isolat"), help(seq));
    }

    private static List<String> names(CommandLine c) {
        return c.getCommandSpec().options().stream().flatMap(o -> List.of(o.names()).stream()).collect(Collectors.toList());
    }
}
