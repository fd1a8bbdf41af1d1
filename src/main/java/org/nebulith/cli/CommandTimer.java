package org.nebulith.cli;

import java.io.File;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.stream.Stream;

/**
 * Times whole commands as a user runs them: each run is a fresh JVM ({@code java -cp <this classpath>
 * org.nebulith.cli.Main COMMAND --quiet --out <scratch>}, with the launcher's quick-start flags and class
 * archive), so start-up, computing, charts, report and file writing are all counted. The scratch
 * folders are deleted afterwards.
 */
final class CommandTimer {

    /** Target wall time of the default {@code sequence} [s]. */
    static final double TARGET_SEQUENCE_S = 1.5;
    /** Target wall time of the default {@code planet} [s]. */
    static final double TARGET_PLANET_S = 2.0;

    private CommandTimer() {
    }

    /**
     * @param out     where the figures go
     * @param repeats runs per command (the median is printed)
     */
    static void run(final PrintStream out, final int repeats) {
        Optional<QuickStart.Archive> archive = archive();
        out.println("command: " + archive.map(a -> "with the class archive made for " + a.jar())
                .orElse("without a class archive (none beside the jar, or made for another jar or java)"));
        time(out, "sequence", TARGET_SEQUENCE_S, repeats, archive);
        time(out, "planet", TARGET_PLANET_S, repeats, archive);
    }

    /** @return the class archive as the launcher maps it, when this runs from the built jar beside it */
    private static Optional<QuickStart.Archive> archive() {
        String classPath = System.getProperty("java.class.path");
        return classPath.endsWith(".jar") && !classPath.contains(File.pathSeparator)
                ? QuickStart.classArchive(Path.of(classPath), javaExecutable()) : Optional.empty();
    }

    private static Path javaExecutable() {
        return Path.of(System.getProperty("java.home"), "bin", "java");
    }

    private static void time(final PrintStream out, final String command, final double target, final int repeats,
                             final Optional<QuickStart.Archive> archive) {
        double[] seconds = new double[repeats];
        for (int i = 0; i < repeats; i++) {
            seconds[i] = once(command, archive);
        }
        Arrays.sort(seconds);
        double median = repeats % 2 == 1 ? seconds[repeats / 2] : (seconds[repeats / 2 - 1] + seconds[repeats / 2]) / 2;
        out.printf(Locale.ROOT, "command: default '%s' end to end in a fresh JVM, median %.2f s of %d (min %.2f, max %.2f; "
                + "target %.1f s: %s)%n", command, median, repeats, seconds[0], seconds[repeats - 1], target,
                median <= target ? "met" : "not met");
    }

    private static double once(final String command, final Optional<QuickStart.Archive> archive) {
        Path scratch = null;
        try {
            scratch = Files.createTempDirectory("nebulith-bench-");
            Path folder = scratch.resolve("run");
            List<String> cmd = new ArrayList<>(List.of(javaExecutable().toString()));
            cmd.addAll(QuickStart.jvmFlags(command, System.getenv()));
            archive.ifPresent(a -> cmd.add(a.flag()));
            String classPath = archive.map(a -> a.jar().toString()).orElse(System.getProperty("java.class.path"));
            cmd.addAll(List.of("-Djava.awt.headless=true", "-cp", classPath, Main.class.getName(), "--quiet", command,
                    "--out", folder.toString()));
            long t0 = System.nanoTime();
            Process p = new ProcessBuilder(cmd).redirectErrorStream(true).redirectOutput(scratch.resolve("log")
                    .toFile()).start();
            int code = p.waitFor();
            double s = (System.nanoTime() - t0) / 1e9;
            if (code != 0) {
                throw new IllegalStateException("bench: '" + command + "' exited " + code + ": "
                        + Files.readString(scratch.resolve("log")));
            }
            return s;
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("bench interrupted", e);
        } finally {
            delete(scratch);
        }
    }

    private static void delete(final Path dir) {
        if (dir == null) {
            return;
        }
        try (Stream<Path> walk = Files.walk(dir)) {
            walk.sorted((a, b) -> b.getNameCount() - a.getNameCount()).map(Path::toFile).forEach(File::delete);
        } catch (IOException e) {
            // scratch left behind in the temporary folder: harmless
        }
    }
}
