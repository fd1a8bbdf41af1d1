package org.nebulith.report.chart;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.EnumSet;
import java.util.Map;

import org.nebulith.files.AtomicOutput;
import org.nebulith.files.RunFolder;
import org.nebulith.files.RunInputs;

/** Manual probe: renders every sample chart into a folder and prints times and sizes. */
public final class ChartRenderProbe {

    private ChartRenderProbe() {
    }

    public static void main(final String[] args) throws Exception {
        System.setProperty("java.awt.headless", "true");
        Path target = Path.of(args[0]);
        try (RunFolder run = AtomicOutput.openRunFolder(target, true, new RunInputs())) {
            for (int pass = 0; pass < 2; pass++) {
                for (Map.Entry<String, Figure> e : ChartSamples.all().entrySet()) {
                    for (ChartFormat f : ChartFormat.values()) {
                        long t0 = System.nanoTime();
                        ChartRenderer.Rendered r = ChartRenderer.write(e.getValue(), run, e.getKey(), EnumSet.of(f));
                        long t1 = System.nanoTime();
                        System.out.printf("pass %d %-22s %s %7.1f ms %8d bytes%n", pass, e.getKey(), f,
                                (t1 - t0) / 1e6, Files.size(r.files().get(f)));
                    }
                }
            }
            run.commit();
        }
    }
}
