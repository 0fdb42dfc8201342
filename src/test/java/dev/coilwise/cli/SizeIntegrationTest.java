package dev.coilwise.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** What `size` adds after the search: stock parts, scatter, simulation, specification sheets. */
class SizeIntegrationTest {
    static final Path EXAMPLE = Path.of("requirements/arrest-tool-carrier-drop.yaml");

    private static JsonNode json(Path out) throws IOException {
        return new ObjectMapper().readTree(out.resolve("shortlist.json").toFile());
    }

    @Test
    void stockFirstPutsAFeasibleCataloguePartAtRankOneWithItsPartNumber(@TempDir Path out) throws IOException {
        CliRunner r = CliRunner.run("size", EXAMPLE.toString(), "--out", out.toString(), "--samples", "0", "--masses", "0");
        assertThat(r.code()).as(r.err()).isZero();
        JsonNode first = json(out).path("designs").get(0);
        assertThat(first.path("source").asText()).isEqualTo("stock");
        assertThat(first.path("part_number").asText()).isNotBlank();
        assertThat(first.path("supplier").asText()).isNotBlank();
        assertThat(first.path("unit_price").asDouble()).isPositive();
        assertThat(r.out()).contains("1S = stock part " + first.path("part_number").asText());
        String csv = Files.readString(out.resolve("shortlist.csv"));
        assertThat(csv).contains(first.path("part_number").asText());
        assertThat(out.resolve("spec-1.pdf")).as("no specification sheet for a stock part").doesNotExist();
    }

    @Test
    void everyCustomDesignGetsASpecificationSheetWhosePdfNamesTheOrderingFields(@TempDir Path out) throws IOException {
        CliRunner r = CliRunner.run("size", EXAMPLE.toString(), "--out", out.toString(), "--samples", "0", "--masses", "0",
                "--top", "3");
        assertThat(r.code()).as(r.err()).isZero();
        JsonNode designs = json(out).path("designs");
        for (JsonNode d : designs) {
            int rank = d.path("rank").asInt();
            boolean custom = "custom".equals(d.path("source").asText());
            assertThat(Files.exists(out.resolve("spec-" + rank + ".pdf"))).isEqualTo(custom);
            assertThat(Files.exists(out.resolve("spec-" + rank + ".html"))).isEqualTo(custom);
            if (custom) {
                try (PDDocument doc = Loader.loadPDF(out.resolve("spec-" + rank + ".pdf").toFile())) {
                    String text = new PDFTextStripper().getText(doc).replaceAll("\\s+", " ");
                    assertThat(text).contains(d.path("material_standard").asText()).contains("F1").contains("F2")
                            .contains("EN 15800");
                }
            }
            assertThat(d.path("test_loads")).hasSize(2);
        }
    }

    @Test
    void aShorterShortlistIntoTheSameFolderRemovesTheSheetsOfTheEarlierRunAndKeepsTheUsersFiles(@TempDir Path out)
            throws IOException {
        CliRunner first = CliRunner.run("size", EXAMPLE.toString(), "--out", out.toString(), "--samples", "0",
                "--masses", "0", "--top", "11");
        assertThat(first.code()).as(first.err()).isZero();
        assertThat(out.resolve("spec-11.pdf")).exists();
        Files.writeString(out.resolve("my-notes.txt"), "the designer's own file");
        // rank 1 of this example is a stock part, which gets no sheet: the second run writes none at all
        CliRunner second = CliRunner.run("size", EXAMPLE.toString(), "--out", out.toString(), "--samples", "0",
                "--masses", "0", "--top", "1");
        assertThat(second.code()).as(second.err()).isZero();
        try (java.util.stream.Stream<Path> files = Files.list(out)) {
            assertThat(files.map(p -> p.getFileName().toString())).containsExactlyInAnyOrder("shortlist.json",
                    "shortlist.csv", "report.html", "my-notes.txt");
        }
        String removed = String.join(", ", java.util.stream.IntStream.rangeClosed(2, 11)
                .mapToObj(n -> "spec-" + n + ".html, spec-" + n + ".pdf").toList());
        assertThat(second.out()).contains("Removed " + removed + " from " + out + ": specification sheets of an"
                + " earlier run");
        assertThat(json(out).path("designs")).hasSize(1);
    }

    @Test
    void scatterAndSimulationAppearInJsonCsvAndTableAndAreReproducible(@TempDir Path dir) throws IOException {
        Path a = dir.resolve("a");
        Path b = dir.resolve("b");
        CliRunner r1 = CliRunner.run("size", EXAMPLE.toString(), "--out", a.toString(), "--samples", "2000", "--top", "3");
        CliRunner r2 = CliRunner.run("size", EXAMPLE.toString(), "--out", b.toString(), "--samples", "2000", "--top", "3");
        assertThat(r1.code()).as(r1.err()).isZero();
        assertThat(Files.readString(a.resolve("shortlist.json"))).isEqualTo(Files.readString(b.resolve("shortlist.json")));
        assertThat(Files.readString(a.resolve("shortlist.csv"))).isEqualTo(Files.readString(b.resolve("shortlist.csv")));
        for (JsonNode d : json(a).path("designs")) {
            JsonNode sc = d.path("scatter");
            assertThat(sc.path("samples").asInt()).isEqualTo(2000);
            assertThat(sc.path("probability_ok").asDouble()).isBetween(0.0, 1.0);
            assertThat(sc.path("p01").path("peak_force_N").asDouble())
                    .isLessThanOrEqualTo(sc.path("p99").path("peak_force_N").asDouble());
            JsonNode sim = d.path("simulation");
            assertThat(sim.path("masses").asInt()).isEqualTo(20);
            assertThat(sim.path("peak_force_N").asDouble()).isPositive();
            assertThat(sim.has("stop_time_ms")).isTrue();
        }
        assertThat(r1.out()).contains("P ok", "sim dev");
    }

    @Test
    void robustnessRankingOrdersByTheProbabilityThatEveryLimitHolds(@TempDir Path dir) throws IOException {
        Path req = dir.resolve("robust.yaml");
        Files.writeString(req, Files.readString(EXAMPLE).replace("by: mass", "by: robustness")
                .replace("stock: [../spring-catalogs/demo-metric.csv]", ""));
        Path out = dir.resolve("out");
        CliRunner r = CliRunner.run("size", req.toString(), "--out", out.toString(), "--samples", "1000", "--masses", "0",
                "--top", "4");
        assertThat(r.code()).as(r.err()).isZero();
        double previous = 2;
        for (JsonNode d : json(out).path("designs")) {
            double p = d.path("scatter").path("probability_ok").asDouble();
            assertThat(p).isLessThanOrEqualTo(previous);
            previous = p;
        }
    }

    // The example is an impact: its designs' simulated peak forces lie more than 5 % above the energy balance (the
    // stress wave along the coils, docs/dynamics.md section 4) but far inside its 2 kN limit, so strict keeps them.
    @Test
    void strictDynamicsKeepsDesignsWhoseSimulatedFiguresMeetTheLimitsThoughTheyDifferFromTheBalance(@TempDir Path dir)
            throws IOException {
        Path req = dir.resolve("strict.yaml");
        Files.writeString(req, Files.readString(EXAMPLE).replace("shortlist: 10", "shortlist: 3\n  dynamics: strict")
                .replace("stock: [../spring-catalogs/demo-metric.csv]", ""));
        CliRunner r = CliRunner.run("size", req.toString(), "--format", "json", "--samples", "0");
        assertThat(r.code()).as(r.err()).isZero();
        JsonNode root = new ObjectMapper().readTree(r.out());
        assertThat(root.path("requirement").path("ranking").path("dynamics").asText()).isEqualTo("strict");
        assertThat(root.path("designs")).hasSize(3);
        for (JsonNode d : root.path("designs")) {
            assertThat(d.path("simulation").path("deviation_pct").asDouble()).isGreaterThan(5);
            assertThat(d.path("simulation").path("peak_force_N").asDouble()).isLessThanOrEqualTo(2000);
        }
        assertThat(root.path("warnings").toString()).doesNotContain("ranking.dynamics: strict");
    }

    // The US example with its force limit cut to 58 lbf: its designs' balance peak forces lie just below it, their
    // simulated ones above it (the stress wave of an impact), so strict removes every leading design.
    @Test
    void strictDynamicsThatRemovesEveryDesignSaysWhyInTheRequirementsUnits(@TempDir Path dir) throws IOException {
        Path req = dir.resolve("strict-us.yaml");
        Files.writeString(req, Files.readString(Path.of("requirements/arrest-us-gate-stop.yaml"))
                .replace("shortlist: 10", "shortlist: 4\n  dynamics: strict").replace("peak_force: 300 lbf",
                        "peak_force: 58 lbf"));
        CliRunner r = CliRunner.run("size", req.toString(), "--samples", "0");
        assertThat(r.code()).as(r.err()).isEqualTo(3);
        assertThat(r.out()).contains("NO FEASIBLE DESIGN: the search found designs that meet every limit, but the"
                + " ranking rules removed all the leading ones.").containsPattern("dynamics +12 +break a limit");
        java.util.List<String> left = r.out().lines().filter(l -> l.contains("left the shortlist")).toList();
        assertThat(left).hasSize(12).allMatch(l -> l.matches(".* d 0\\.\\d{4} in D \\d\\.\\d{3} in Na .*: simulated peak"
                + " force [0-9.]+ lbf exceeds limits\\.peak_force 58 lbf by .*")).noneMatch(l -> l.contains(" mm"));
    }

    @Test
    void simulateWritesATimeHistoryAndAPlot(@TempDir Path out) throws IOException {
        CliRunner r = CliRunner.run("simulate", "requirements/launch-vertical-ball.yaml", "--design", "2", "--out",
                out.toString());
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(r.out()).contains("energy balance", "simulation", "exit speed", "CAUTION");
        assertThat(Files.readAllLines(out.resolve("time-history.csv")).stream().filter(l -> !l.startsWith("#")).count())
                .isGreaterThan(10);
        assertThat(Files.readString(out.resolve("time-history.svg"))).contains("<svg").contains("Time (ms)");
    }

    @Test
    void aUsCustomaryRequirementGetsItsSimulationFlagsInPoundsForceAndFeetPerSecond(@TempDir Path out)
            throws IOException {
        String us = "requirements/arrest-us-gate-stop.yaml";
        CliRunner r = CliRunner.run("size", us, "--out", out.toString(), "--samples", "0", "--top", "2");
        assertThat(r.code()).as(r.err()).isZero();
        java.util.List<String> words = new java.util.ArrayList<>();
        for (JsonNode d : json(out).path("designs")) {
            d.path("simulation").path("flags").forEach(f -> words.add(f.asText()));
            d.path("simulation").path("notes").forEach(f -> words.add(f.asText()));
        }
        assertThat(words).as("this example's designs deviate from the balance and rebound").isNotEmpty()
                .anyMatch(w -> w.contains(" lbf")).anyMatch(w -> w.contains(" ft/s"))
                .noneMatch(w -> w.contains(" N ") || w.contains(" N)") || w.contains(" mm") || w.contains(" m/s"));
        org.jsoup.nodes.Document page = org.jsoup.Jsoup.parse(Files.readString(out.resolve("report.html")));
        assertThat(page.select("section.design li").eachText()).anyMatch(t -> t.startsWith("Simulation warning:")
                && t.contains(" lbf"));
        CliRunner sim = CliRunner.run("simulate", us);
        assertThat(sim.out()).contains("WARNING: simulated peak force").contains(" lbf differs").doesNotContain(" N ");
    }

    @Test
    void simulateSaysWhetherTheSimulatedFiguresMeetTheLimits(@TempDir Path dir) throws IOException {
        CliRunner within = CliRunner.run("simulate", "requirements/arrest-us-gate-stop.yaml");
        assertThat(within.code()).as(within.err()).isZero();
        assertThat(within.out()).contains("With the simulated figures the design meets every limit").doesNotContain("LIMIT:");

        // The balance still admits designs under 58 lbf, but their simulated peak force exceeds it (as in the strict
        // dynamics test above).
        Path req = dir.resolve("tight.yaml");
        Files.writeString(req, Files.readString(Path.of("requirements/arrest-us-gate-stop.yaml"))
                .replace("peak_force: 300 lbf", "peak_force: 58 lbf"));
        CliRunner tight = CliRunner.run("simulate", req.toString());
        assertThat(tight.code()).as(tight.err()).isZero();
        assertThat(tight.out()).contains("(ranking.dynamics: strict would drop it)")
                .containsPattern("LIMIT: simulated peak force [0-9.]+ lbf exceeds limits\\.peak_force 58 lbf");
    }

    @Test
    void simulateRefusesARankOutsideTheShortlist() {
        CliRunner r = CliRunner.run("simulate", "requirements/launch-vertical-ball.yaml", "--design", "99");
        assertThat(r.code()).isEqualTo(2);
        assertThat(r.err()).contains("--design must be between 1 and");
    }
}
