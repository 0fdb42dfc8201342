package dev.coilwise.report.html;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.image.BufferedImage;
import java.io.File;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.TimeUnit;
import javax.imageio.ImageIO;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Loads the report in headless Chromium from a file URL, with every flag that keeps the browser off the network,
 * and checks that the page renders (a screenshot of the window size, neither blank nor one colour), that its script
 * runs and sorts the table, and that the console stays silent. Skipped only where no Chromium binary can be found;
 * {@code .ci/run} installs Debian's {@code chromium} when it is missing.
 */
class ReportBrowserTest {
    static final int WIDTH = 1280;
    static final int HEIGHT = 2000;
    /** Longest a Chromium run may take before it is stopped and the test fails, s. */
    static final long TIMEOUT_S = 120;

    private static Path chromium;

    @TempDir
    Path tmp;

    @BeforeAll
    static void findChromium() {
        Optional<Path> found = locate();
        Assumptions.assumeTrue(found.isPresent(), "no Chromium binary found (looked for $COILWISE_CHROMIUM and for"
                + " chromium, chromium-browser, google-chrome on PATH); the browser rendering check is skipped."
                + " Install it with: apt-get install -y chromium");
        chromium = found.get();
    }

    static Optional<Path> locate() {
        String env = System.getenv("COILWISE_CHROMIUM");
        if (env != null && Files.isExecutable(Path.of(env))) {
            return Optional.of(Path.of(env));
        }
        String path = System.getenv().getOrDefault("PATH", "");
        for (String name : List.of("chromium", "chromium-browser", "google-chrome", "google-chrome-stable")) {
            for (String dir : path.split(File.pathSeparator)) {
                if (!dir.isEmpty() && Files.isExecutable(Path.of(dir, name))) {
                    return Optional.of(Path.of(dir, name));
                }
            }
        }
        return Optional.empty();
    }

    /** Output and log of one Chromium run. */
    record Run(String stdout, String stderr) {
        /** Lines where the page wrote to the console (errors, uncaught exceptions, failed loads). */
        List<String> consoleLines() {
            return stderr.lines().filter(l -> l.contains(":CONSOLE") || l.contains("Uncaught")).toList();
        }
    }

    private Run chromium(Path page, String... action) throws IOException, InterruptedException {
        Path profile = Files.createTempDirectory(tmp, "profile");
        List<String> cmd = new ArrayList<>(List.of(chromium.toString(), "--headless", "--no-sandbox", "--disable-gpu",
                "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update",
                "--disable-sync", "--user-data-dir=" + profile, "--enable-logging=stderr", "--v=0"));
        cmd.addAll(List.of(action));
        cmd.add(page.toUri().toString());
        Path stdout = tmp.resolve("stdout.txt");
        Path stderr = tmp.resolve("stderr.txt");
        Process p = new ProcessBuilder(cmd).redirectOutput(stdout.toFile()).redirectError(stderr.toFile())
                .redirectInput(ProcessBuilder.Redirect.from(new File("/dev/null"))).start();
        if (!p.waitFor(TIMEOUT_S, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            throw new AssertionError("Chromium did not finish within " + TIMEOUT_S + " s: " + cmd);
        }
        Run run = new Run(Files.readString(stdout, StandardCharsets.UTF_8), Files.readString(stderr,
                StandardCharsets.UTF_8));
        assertThat(p.exitValue()).as("Chromium exit code; its log:%n%s", run.stderr()).isZero();
        return run;
    }

    private Path report(String name) throws IOException {
        Path file = tmp.resolve(name + "-report.html");
        Files.writeString(file, HtmlReportWriter.write(ReportData.of(ReportFixtures.sized(name))));
        return file;
    }

    @Test
    void theReportRendersToANonBlankScreenshotWithASilentConsole() throws Exception {
        Path shot = tmp.resolve("report.png");
        Run run = chromium(report("arrest-small"), "--screenshot=" + shot, "--window-size=" + WIDTH + "," + HEIGHT);
        assertThat(run.consoleLines()).as("console output of the page").isEmpty();

        BufferedImage img = ImageIO.read(shot.toFile());
        assertThat(img).as("screenshot %s", shot).isNotNull();
        assertThat(img.getWidth()).isEqualTo(WIDTH);
        assertThat(img.getHeight()).isEqualTo(HEIGHT);
        Set<Integer> colours = new HashSet<>();
        long inked = 0;
        long accent = 0;
        long design = 0;
        for (int y = 0; y < img.getHeight(); y++) {
            for (int x = 0; x < img.getWidth(); x++) {
                int rgb = img.getRGB(x, y) & 0xFFFFFF;
                colours.add(rgb);
                int r = rgb >> 16;
                int g = (rgb >> 8) & 0xFF;
                int b = rgb & 0xFF;
                if (r < 235 || g < 235 || b < 235) {
                    inked++;
                }
                if (near(r, g, b, 0xD5, 0x5E, 0x00)) {
                    accent++;
                }
                if (near(r, g, b, 0x00, 0x72, 0xB2)) {
                    design++;
                }
            }
        }
        double share = (double) inked / ((long) WIDTH * HEIGHT);
        assertThat(share).as("share of the page that is not white").isBetween(0.03, 0.6);
        assertThat(colours.size()).as("distinct colours (text, lines, fills, anti-aliasing)").isGreaterThan(100);
        assertThat(accent).as("pixels of the caution's accent bar and the working points").isGreaterThan(500);
        assertThat(design).as("pixels of the design colour: rank links, chart lines and markers").isGreaterThan(500);
    }

    /**
     * The compacted page (chart styles as shared classes, whole-canvas clips dropped: {@link SvgStyles}) renders as
     * the page with the charts as JFreeSVG drew them, over a window tall enough to hold the shortlist, the trade-off
     * chart and the first designs' charts. The style classes alone give the same pixels; an element drawn without
     * its (empty) clip is anti-aliased a little differently at a few edge pixels. So: fewer than one pixel in 10 000
     * may differ, and none by more than 32 of 255 levels in any channel; a missing or moved line, marker or letter
     * (the lightest, a grid line, is 34 levels off white) fails.
     */
    @Test
    void theCompactedChartsRenderAsDrawn() throws Exception {
        ReportData data = ReportData.of(ReportFixtures.sized("arrest-small"));
        Path drawn = Files.writeString(tmp.resolve("drawn.html"), HtmlReportWriter.page(data));
        Path compact = Files.writeString(tmp.resolve("compact.html"), HtmlReportWriter.write(data));
        BufferedImage a = shot(drawn, "drawn.png");
        BufferedImage b = shot(compact, "compact.png");
        long differing = 0;
        long inked = 0;
        int worst = 0;
        for (int y = 0; y < a.getHeight(); y++) {
            for (int x = 0; x < a.getWidth(); x++) {
                int p = a.getRGB(x, y);
                int q = b.getRGB(x, y);
                inked += (p & 0xFFFFFF) == 0xFFFFFF ? 0 : 1;
                int d = 0;
                for (int shift = 0; shift < 24; shift += 8) {
                    d = Math.max(d, Math.abs(((p >> shift) & 0xFF) - ((q >> shift) & 0xFF)));
                }
                differing += d > 0 ? 1 : 0;
                worst = Math.max(worst, d);
            }
        }
        assertThat(inked).as("pixels drawn in the compared window").isGreaterThan(100_000);
        assertThat(differing).as("pixels that differ between the drawn and the compacted page")
                .isLessThan((long) a.getWidth() * a.getHeight() / 10_000);
        assertThat(worst).as("largest difference of a pixel, levels of 255").isLessThanOrEqualTo(32);
    }

    private BufferedImage shot(Path page, String name) throws Exception {
        Path png = tmp.resolve(name);
        chromium(page, "--screenshot=" + png, "--window-size=" + WIDTH + "," + 3 * HEIGHT, "--hide-scrollbars");
        return ImageIO.read(png.toFile());
    }

    private static boolean near(int r, int g, int b, int r0, int g0, int b0) {
        return Math.abs(r - r0) < 12 && Math.abs(g - g0) < 12 && Math.abs(b - b0) < 12;
    }

    @Test
    void theScriptRunsAndSortsTheShortlistByTheClickedColumn() throws Exception {
        Path page = report("arrest-small");
        String html = Files.readString(page);
        // Click the free-length heading (the rank order is not by free length) twice after the report's own script: ascending, then descending.
        String clicks = "<script>(function(){var th=document.querySelectorAll('table.shortlist thead th');"
                + "var i=Array.prototype.findIndex.call(th,function(h){return h.textContent.indexOf('Free length')===0;});"
                + "th[i].click();document.documentElement.setAttribute('data-first',"
                + "Array.prototype.map.call(document.querySelectorAll('table.shortlist tbody tr'),"
                + "function(r){return r.cells[i].getAttribute('data-v');}).join(' '));th[i].click();}());</script>";
        Path clicked = Files.writeString(tmp.resolve("clicked.html"), html.replace("</body>", clicks + "</body>"));

        Run run = chromium(clicked, "--dump-dom");
        assertThat(run.consoleLines()).as("console output of the page").isEmpty();
        Document dom = Jsoup.parse(run.stdout());
        assertThat(dom.selectFirst("html").attr("data-sortable-tables")).as("the report's script ran").isEqualTo("1");

        int col = dom.select("table.shortlist thead th").eachText().indexOf(
                dom.select("table.shortlist thead th").eachText().stream().filter(t -> t.startsWith("Free length"))
                        .findFirst().orElseThrow());
        List<Double> ascending = dom.selectFirst("html").attr("data-first").lines().findFirst().stream()
                .flatMap(s -> java.util.Arrays.stream(s.split(" "))).map(Double::valueOf).toList();
        List<Double> descending = dom.select("table.shortlist tbody tr").stream()
                .map(r -> Double.valueOf(r.child(col).attr("data-v"))).toList();
        assertThat(ascending).hasSize(ReportFixtures.sized("arrest-small").shortlist().size()).isSorted();
        List<Double> reversed = new ArrayList<>(ascending);
        java.util.Collections.reverse(reversed);
        assertThat(descending).containsExactlyElementsOf(reversed);
        assertThat(dom.select("table.shortlist thead th").get(col).attr("aria-sort")).isEqualTo("descending");
    }
}
