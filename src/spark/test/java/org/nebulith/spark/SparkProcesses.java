package org.nebulith.spark;

import java.io.File;
import java.io.IOException;
import java.net.ServerSocket;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;

/**
 * Starts Spark's own entry points (master, worker, {@code SparkSubmit}) as separate JVM processes,
 * as a Spark distribution's scripts would: {@code SPARK_HOME} is a folder whose {@code jars/} holds
 * links to the Spark jars of the build, {@code SPARK_SCALA_VERSION} is set as the distribution's
 * {@code load-spark-env.sh} sets it, and everything stays on loopback. Each process logs to
 * {@code NAME.log} in the work folder.
 */
final class SparkProcesses {

    private final Path dir;
    private final Path sparkHome;

    SparkProcesses(final Path dir) throws IOException {
        this.dir = dir;
        this.sparkHome = dir.resolve("spark-home");
        Path jars = Files.createDirectories(sparkHome.resolve("jars"));
        int i = 0;
        for (Path jar : ClusterClasspath.sparkJars()) {
            Path link = jars.resolve(jar.getFileName());
            Files.createSymbolicLink(Files.exists(link) ? jars.resolve(i + "-" + jar.getFileName()) : link, jar);
            i++;
        }
    }

    /** @return a TCP port free on loopback at the time of the call */
    static int freePort() throws IOException {
        try (ServerSocket s = new ServerSocket(0)) {
            return s.getLocalPort();
        }
    }

    /**
     * @param name      log name
     * @param mainClass Spark entry point
     * @param args      its arguments
     * @return the started process
     */
    Process start(final String name, final String mainClass, final String... args) throws IOException {
        List<String> command = new ArrayList<>();
        command.add(Path.of(System.getProperty("java.home"), "bin", "java").toString());
        for (String flag : System.getProperty("spark.jvm.flags", "").split("\\s+")) {
            if (!flag.isEmpty()) {
                command.add(flag);
            }
        }
        command.addAll(List.of("-Xmx768m", "-cp", sparkHome.resolve("jars") + File.separator + "*", mainClass));
        command.addAll(List.of(args));
        ProcessBuilder pb = new ProcessBuilder(command).redirectErrorStream(true).redirectOutput(logFile(name).toFile());
        pb.environment().put("SPARK_HOME", sparkHome.toString());
        pb.environment().put("SPARK_SCALA_VERSION", "2.13");
        pb.environment().put("SPARK_LOCAL_IP", "127.0.0.1");
        pb.environment().put("SPARK_LOG_DIR", dir.toString());
        pb.directory(dir.toFile());
        return pb.start();
    }

    /** Waits until the named log holds a line, failing if it does not within the time. */
    void awaitLog(final String name, final String text, final int seconds) throws IOException, InterruptedException {
        long end = System.nanoTime() + TimeUnit.SECONDS.toNanos(seconds);
        while (System.nanoTime() < end) {
            if (log(name).contains(text)) {
                return;
            }
            Thread.sleep(200);
        }
        throw new AssertionError(name + " did not log '" + text + "' within " + seconds + " s:\n" + log(name));
    }

    /** @return the exit code of a process that must end within the time */
    int await(final Process p, final int seconds) throws InterruptedException {
        if (!p.waitFor(seconds, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            throw new AssertionError("process did not end within " + seconds + " s");
        }
        return p.exitValue();
    }

    /** @return the log written so far by the named process */
    String log(final String name) throws IOException {
        Path f = logFile(name);
        return Files.exists(f) ? Files.readString(f, StandardCharsets.UTF_8) : "";
    }

    private Path logFile(final String name) {
        return dir.resolve(name + ".log");
    }
}
