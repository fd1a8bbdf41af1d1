package org.nebulith.report.html;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Opens a report in headless Chromium and reports how many images it has, how many failed to
 * decode, how many errors the page raised and what reached the console. Used by the report tests
 * of every command.
 */
public final class ChromiumProbe {
    private static final Pattern PROBE = Pattern.compile(
            "data-probe=\"images=(\\d+);bad=(\\d+);errors=(\\d+);overflow=(-?\\d+)\"");
    private static final String PROBE_SCRIPT = "<script>var probeErrors=0;"
            + "window.addEventListener('error',function(){probeErrors++;},true);"
            + "window.addEventListener('load',function(){var im=document.images,bad=0;"
            + "for(var i=0;i<im.length;i++){if(!(im[i].complete&&im[i].naturalWidth>0)){bad++;}}"
            + "var de=document.documentElement;"
            + "document.body.setAttribute('data-probe','images='+im.length+';bad='+bad+';errors='+probeErrors"
            + "+';overflow='+(de.scrollWidth-de.clientWidth));"
            + "});</script>";

    /**
     * @param images   images in the page
     * @param bad      images not decoded
     * @param errors   errors raised while loading
     * @param console  console lines Chromium logged
     * @param overflow {@code document.documentElement.scrollWidth - clientWidth} [CSS px]: &gt; 0 means the
     *                 page scrolls sideways
     */
    public record Result(int images, int bad, int errors, List<String> console, int overflow) {
    }

    private ChromiumProbe() {
    }

    /** @return the Chromium binary on the PATH, if any */
    public static Optional<Path> chromium() {
        return HtmlReportChromiumTest.findChromium();
    }

    /**
     * @param report   the report.html to open (a probing copy is written into work)
     * @param work     a scratch folder
     * @return what the page did
     */
    public static Result open(Path report, Path work) throws IOException, InterruptedException {
        Path chromium = chromium().orElseThrow();
        String html = Files.readString(report, StandardCharsets.UTF_8);
        // the probe's own script needs 'unsafe-inline', which a hash source would disable: replace the policy's
        // script source (the page's own script then runs as well)
        String probe = html.replace("<head>", "<head>\n" + PROBE_SCRIPT)
                .replaceAll("script-src '[^']*'", "script-src 'unsafe-inline'");
        if (!probe.contains("script-src")) {
            probe = probe.replace("default-src 'none';", "default-src 'none'; script-src 'unsafe-inline';");
        }
        Path page = Files.writeString(work.resolve("probe-" + System.nanoTime() + ".html"), probe);
        Path profile = Files.createTempDirectory(work, "profile");
        Path dom = work.resolve(page.getFileName() + ".dom");
        Path log = work.resolve(page.getFileName() + ".log");
        Process p = new ProcessBuilder(chromium.toString(), "--headless", "--no-sandbox", "--disable-gpu",
                "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update",
                "--disable-sync", "--disable-extensions", "--user-data-dir=" + profile, "--enable-logging=stderr",
                "--v=0", "--window-size=1024,768", "--virtual-time-budget=5000", "--dump-dom", page.toUri().toString())
                .redirectOutput(dom.toFile()).redirectError(log.toFile()).start();
        try {
            assertTrue(p.waitFor(90, TimeUnit.SECONDS), "chromium finished");
        } finally {
            p.destroyForcibly();
        }
        String logText = Files.readString(log, StandardCharsets.UTF_8);
        Matcher m = PROBE.matcher(Files.readString(dom, StandardCharsets.UTF_8));
        assertTrue(m.find(), "probe ran; chromium stderr:\n" + logText);
        List<String> console = new ArrayList<>();
        for (String line : logText.split("\n")) {
            if (line.contains(":CONSOLE")) {
                console.add(line);
            }
        }
        return new Result(Integer.parseInt(m.group(1)), Integer.parseInt(m.group(2)), Integer.parseInt(m.group(3)),
                console, Integer.parseInt(m.group(4)));
    }
}
