package org.nebulith.spark;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.nebulith.cli.Main;

/**
 * The survey on a real Spark standalone cluster: a master and a worker started as separate JVM
 * processes from the Spark jars that the build resolves, the job submitted through
 * {@code org.apache.spark.deploy.SparkSubmit} (what {@code spark-submit} runs) with the arguments of
 * the README's standalone recipe, and the executor launched by the worker in a process of its own.
 * The reference is the local survey of the command line ({@code nebulith survey}) on the same
 * catalogue, draws and seed: the two {@code survey.csv} files must be equal byte for byte.
 *
 * <p>Runs in the {@code integration-test} phase (failsafe), after the module's jar is built.
 */
@Tag("slow")
class StandaloneClusterIT {

    private static final String BEGIN = "<!-- standalone-recipe: begin -->";
    private static final String END = "<!-- standalone-recipe: end -->";
    private static final int DRAWS = 6;

    @TempDir
    Path dir;

    private final List<Process> daemons = new ArrayList<>();

    @AfterEach
    void stopDaemons() {
        for (Process p : daemons) {
            p.descendants().forEach(ProcessHandle::destroyForcibly);
            p.destroyForcibly();
        }
    }

    @Test
    void readmeRecipeOnAStandaloneClusterGivesTheLocalSurveyBytes() throws Exception {
        Path catalogue = Files.write(dir.resolve("hosts.csv"), DemoCatalogue.firstStars(3), StandardCharsets.UTF_8);
        Path clusterOut = dir.resolve("hosts-run1");
        SparkProcesses spark = new SparkProcesses(dir);

        int masterPort = SparkProcesses.freePort();
        Process master = spark.start("master", "org.apache.spark.deploy.master.Master",
                "--host", "127.0.0.1", "--port", String.valueOf(masterPort), "--webui-port", String.valueOf(SparkProcesses.freePort()));
        daemons.add(master);
        spark.awaitLog("master", "I have been elected leader", 90);
        String masterUrl = "spark://127.0.0.1:" + masterPort;
        Process worker = spark.start("worker", "org.apache.spark.deploy.worker.Worker", masterUrl,
                "--host", "127.0.0.1", "--cores", "2", "--memory", "1536m",
                "--webui-port", String.valueOf(SparkProcesses.freePort()), "--work-dir", dir.resolve("work").toString());
        daemons.add(worker);
        spark.awaitLog("worker", "Successfully registered with master", 90);

        List<String> submit = recipe(masterUrl, catalogue, clusterOut);
        Process job = spark.start("submit", "org.apache.spark.deploy.SparkSubmit", submit.toArray(new String[0]));
        int code = spark.await(job, 600);
        String submitLog = spark.log("submit");
        assertEquals(0, code, "spark-submit exit code; log tail:\n" + tail(submitLog));
        assertTrue(submitLog.contains("Connected to Spark cluster"), "the job ran on the standalone master");
        assertTrue(spark.log("worker").contains("Asked to launch executor"), "the worker launched an executor process");

        Path localOut = dir.resolve("local");
        int local = runLocalSurvey(catalogue, localOut);
        assertEquals(0, local, "local survey exit code");
        assertEquals(Files.readString(localOut.resolve("survey.csv")), Files.readString(clusterOut.resolve("survey.csv")),
                "survey.csv from the cluster equals the local survey's, byte for byte");
    }

    /** @return the README's spark-submit arguments with this run's master, jar, files and draws */
    private List<String> recipe(final String masterUrl, final Path catalogue, final Path out) throws IOException {
        String readme = Files.readString(Path.of("README.md"));
        int from = readme.indexOf(BEGIN);
        int to = readme.indexOf(END);
        assertTrue(from >= 0 && to > from, "README.md holds the standalone recipe between its markers");
        String command = readme.substring(from + BEGIN.length(), to).replace("\\\n", " ").trim();
        List<String> words = new ArrayList<>(List.of(command.split("\\s+")));
        assertEquals("spark-submit", words.remove(0), "the recipe is a spark-submit command");
        List<String> args = new ArrayList<>();
        for (String w : words) {
            args.add(switch (w) {
                case "spark://MASTER:7077" -> masterUrl;
                case "nebulith-spark.jar" -> ClusterClasspath.moduleJar().toString();
                case "hosts.csv" -> catalogue.toString();
                case "hosts-run1" -> out.toString();
                case "1000" -> String.valueOf(DRAWS);
                default -> w;
            });
        }
        // Small driver, no web UI; the executors take Spark from the worker's SPARK_HOME/jars and the
        // module jar travels with the job, as on a cluster.
        args.addAll(args.indexOf(ClusterClasspath.moduleJar().toString()),
                List.of("--conf", "spark.ui.enabled=false"));
        return args;
    }

    private static int runLocalSurvey(final Path catalogue, final Path out) {
        ByteArrayOutputStream sink = new ByteArrayOutputStream();
        PrintStream quiet = new PrintStream(sink, true, StandardCharsets.UTF_8);
        return Main.run(new String[] {"survey", "--catalogue", catalogue.toString(), "--draws", String.valueOf(DRAWS),
            "--seed", "7", "--threads", "2", "--out", out.toString(), "-q"}, quiet, quiet);
    }

    private static String tail(final String log) {
        String[] lines = log.split("\n");
        return String.join("\n", List.of(lines).subList(Math.max(0, lines.length - 40), lines.length));
    }

    /** The demo catalogue's comment and header lines and its first stars (invented stars). */
    static final class DemoCatalogue {
        private DemoCatalogue() {
        }

        static List<String> firstStars(final int n) throws IOException {
            try (InputStream in = StandaloneClusterIT.class.getResourceAsStream("/presets/demo-catalogue.csv")) {
                List<String> out = new ArrayList<>();
                int rows = 0;
                for (String line : new String(in.readAllBytes(), StandardCharsets.UTF_8).split("\n")) {
                    if (rows > n) {
                        break;
                    }
                    out.add(line);
                    rows += line.startsWith("#") ? 0 : 1;
                }
                return out;
            }
        }
    }
}
