package org.nebulith.spark;

import java.io.File;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/** Class paths for the standalone-cluster test, read from the test JVM's own class path. */
final class ClusterClasspath {

    private ClusterClasspath() {
    }

    /** @return the jars of Spark and its dependencies: every jar on the test class path except Nebulith's own (the core and this module) */
    static List<Path> sparkJars() {
        List<Path> jars = new ArrayList<>();
        for (String entry : System.getProperty("java.class.path").split(File.pathSeparator)) {
            Path jar = Path.of(entry);
            if (entry.endsWith(".jar") && !jar.getFileName().toString().startsWith("nebulith")) {
                jars.add(jar);
            }
        }
        return jars;
    }

    /** @return the module's shaded jar built in the package phase ({@code target/nebulith-spark.jar}) */
    static Path moduleJar() {
        return Path.of("target", "nebulith-spark.jar").toAbsolutePath();
    }
}
