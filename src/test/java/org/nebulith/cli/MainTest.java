package org.nebulith.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;
import org.nebulith.errors.InputException;
import org.nebulith.errors.NumericalException;
import org.nebulith.files.RunFolder;

import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** The command-line plumbing, driven through {@link Main#run} with a probe sub-command. */
class MainTest {

    @TempDir
    Path dir;

    /** A minimal real sub-command: shows what the plumbing hands to a command. */
    @Command(name = "probe", description = "test probe")
    static final class Probe extends RunCommand {
        @Option(names = "--T-K")
        double temperatureK = 1000;
        @Option(names = "--P-bar")
        double pressureBar = 1e-4;
        @Option(names = "--fail")
        String fail = "none";
        RunContext seen;
        @picocli.CommandLine.Mixin
        RunOptions output;

        @Override
        protected OutputTarget outputTarget() {
            return output;
        }

        @Override
        protected int execute(final RunContext context) {
            seen = context;
            switch (fail) {
                case "input": throw InputException.atField("zones.csv", 3, "shape", "box", "unknown shape",
                        "tophat, gaussian");
                case "numerical": throw NumericalException.noConvergence(1400, 1e-4, "H=1,O=5e-4", 100, 1e-3);
                case "illegal": throw new IllegalArgumentException("bad thing in a reader");
                case "bug": throw new IllegalStateException("cannot happen");
                default: break;
            }
            try (RunFolder run = context.openRunFolder("probe-run")) {
                run.writeText("result.txt", "T_K=" + temperatureK + "\n");
                run.commit();
            }
            context.out().println("T_K=" + temperatureK + " P_bar=" + pressureBar);
            return ExitCodes.OK;
        }
    }

    private Probe probe;
    private final CliRun cli = new CliRun(() -> {
        probe = new Probe();
        return List.of(probe);
    });

    private int run(final String... args) {
        return cli.run(args);
    }

    private String out() {
        return cli.out();
    }

    private String err() {
        return cli.err();
    }

    @ParameterizedTest
    @CsvSource({"input,2", "numerical,3", "illegal,1", "bug,1"})
    void failuresMapToExitCodesWithOneLineAndNoStackTrace(final String kind, final int code) {
        assertEquals(code, run("probe", "--fail", kind, "--out", dir.resolve("o").toString()));
        String[] lines = err().strip().split("\n");
        assertEquals(1, lines.length, err());
        assertTrue(lines[0].startsWith("nebulith: "), err());
        assertFalse(Files.exists(dir.resolve("o")));
    }

    @Test
    void messagesNameTheState() {
        run("probe", "--fail", "numerical", "--out", dir.resolve("o").toString());
        assertTrue(err().contains("T = 1400 K, P = 0.0001 bar, composition H=1,O=5e-4"), err());
        run("probe", "--fail", "input", "--out", dir.resolve("o").toString());
        assertTrue(err().contains("zones.csv: line 3: field \"shape\""), err());
    }

    @Test
    void verboseAddsTheStackTraceBeforeOrAfterTheCommand() {
        assertEquals(2, run("--verbose", "probe", "--fail", "input", "--out", dir.resolve("o").toString()));
        assertTrue(err().contains("\tat org.nebulith.cli.MainTest$Probe.execute"), err());
        assertEquals(3, run("probe", "-v", "--fail", "numerical", "--out", dir.resolve("o").toString()));
        assertTrue(err().contains("\tat "), err());
    }

    @Test
    void badOptionsAreInputErrors() {
        assertEquals(2, run("probe", "--T-K", "hot"));
        assertTrue(err().contains("--T-K"), err());
        assertFalse(err().contains("\tat "), err());
        assertEquals(2, run("probe", "--no-such-option"));
        assertEquals(2, run("--quiet", "probe", "--verbose"));
        assertEquals(2, run());
    }

    @Test
    void versionAndHelp() {
        assertEquals(0, run("--version"));
        assertTrue(out().startsWith("nebulith dev\n"), out()); // classes, not the jar: no manifest version
        for (String command : List.of("point", "sequence", "planet", "survey", "completion", "presets")) {
            assertEquals(0, run(command, "--help"), command);
            assertTrue(out().contains("Usage: nebulith " + command), out());
        }
        assertEquals(0, run("--help"));
        assertTrue(out().contains("Exit codes:") && out().contains("3   numerical failure"), out());
    }

    @Test
    void completionScriptCoversTheCommands() {
        assertEquals(0, run("completion"));
        assertTrue(out().contains("complete -F") && out().contains("sequence") && out().contains("--run-name"),
                "generated bash completion");
    }

    @Test
    void presetSuppliesDefaultsAndTheCommandLineOverrides() throws Exception {
        Path preset = Files.writeString(dir.resolve("warm.settings"),
                "# test preset\ndescription = warm disk\ncommand = probe\nT-K = 1500\nP-bar = 0.001\n");
        Path outDir = dir.resolve("run");
        assertEquals(0, run("probe", "--preset", preset.toString(), "--T-K", "1200", "--out", outDir.toString()),
                err());
        assertEquals("T_K=1200.0 P_bar=0.001", out().strip());
        RunContext.Setting t = setting("T-K");
        RunContext.Setting p = setting("P-bar");
        assertEquals("command line", t.origin());
        assertEquals("preset " + preset + ":5", p.origin());
        assertEquals(1, probe.seen.inputs().files().size(), "the preset is a checksummed input");
        assertEquals(64, probe.seen.inputs().files().get(0).sha256().length());
    }

    @Test
    void presetErrorsNameFileLineAndField() throws Exception {
        Path unknown = Files.writeString(dir.resolve("a.settings"), "T-K = 1500\nzones = z.csv\n");
        assertEquals(2, run("probe", "--preset", unknown.toString(), "--out", dir.resolve("o").toString()));
        assertTrue(err().contains(unknown + ": line 2: field \"zones\": value \"z.csv\": not a setting of the 'probe' command"),
                err());
        Path badValue = Files.writeString(dir.resolve("b.settings"), "\nT-K = hot\n");
        assertEquals(2, run("probe", "--preset", badValue.toString()));
        assertTrue(err().contains(badValue + ": line 2: field \"T-K\""), err());
        Path other = Files.writeString(dir.resolve("c.settings"), "command = survey\n");
        assertEquals(2, run("probe", "--preset", other.toString()));
        assertTrue(err().contains("this preset is for the 'survey' command"), err());
        assertEquals(2, run("probe", "--preset", "no-such-preset"));
        assertTrue(err().contains("preset \"no-such-preset\" not found"), err());
        Path noEquals = Files.writeString(dir.resolve("d.settings"), "T-K 1500\n");
        assertEquals(2, run("probe", "--preset", noEquals.toString()));
        assertTrue(err().contains(noEquals + ": line 1:"), err());
    }

    @Test
    void runFolderIsNotOverwrittenWithoutForceAndNeverOntoAnInput() throws Exception {
        Path outDir = dir.resolve("run");
        assertEquals(0, run("probe", "--out", outDir.toString()));
        assertEquals(2, run("probe", "--out", outDir.toString(), "--T-K", "900"));
        assertTrue(err().contains("already exists; use --force"), err());
        assertEquals("T_K=1000.0\n", Files.readString(outDir.resolve("result.txt")));
        assertEquals(0, run("probe", "--out", outDir.toString(), "--T-K", "900", "--force"));
        assertEquals("T_K=900.0\n", Files.readString(outDir.resolve("result.txt")));

        Path preset = Files.writeString(outDir.resolve("mine.settings"), "T-K = 800\n");
        assertEquals(2, run("probe", "--preset", preset.toString(), "--out", outDir.toString(), "--force"));
        assertTrue(err().contains("would overwrite the input file"), err());
        assertTrue(Files.exists(preset));
    }

    @Test
    void runNameMustBePlain() {
        assertEquals(2, run("probe", "--run-name", "../escape"));
        assertTrue(err().contains("is not allowed"), err());
    }

    private RunContext.Setting setting(final String key) {
        return probe.seen.settings().stream().filter(s -> s.key().equals(key)).findFirst().orElseThrow();
    }
}
