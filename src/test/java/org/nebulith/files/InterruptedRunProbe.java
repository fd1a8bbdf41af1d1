package org.nebulith.files;

import java.nio.file.Path;

/** Child process for {@link AtomicOutputTest}: starts a run folder (or reserves a file), writes, then waits to be stopped. */
public final class InterruptedRunProbe {

    private InterruptedRunProbe() {
    }

    public static void main(final String[] args) throws Exception {
        if (args.length > 1 && args[1].equals("file")) {
            AtomicOutput.reserveFile(Path.of(args[0]), false, new RunInputs(), "T_K", "point");
        } else {
            RunFolder run = AtomicOutput.openRunFolder(Path.of(args[0]), false, new RunInputs());
            run.writeText("half.csv", "T_K\n2000\n");
        }
        System.out.println("writing");
        System.out.flush();
        Thread.sleep(60_000);
    }
}
