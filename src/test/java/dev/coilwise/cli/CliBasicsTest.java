package dev.coilwise.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class CliBasicsTest {

    @Test
    void bareCommandPrintsUsageListingTheSubcommands() {
        CliRunner r = CliRunner.run();
        assertThat(r.code()).isZero();
        assertThat(r.out()).contains("size").contains("check").contains("materials").contains("new").contains("Exit codes");
    }

    @Test
    void versionNamesTheTool() {
        assertThat(CliRunner.run("--version").out()).startsWith("coilwise");
    }

    @Test
    void unknownOptionIsBadInputWithExitTwo() {
        CliRunner r = CliRunner.run("size", "--no-such-option", "x.yaml");
        assertThat(r.code()).isEqualTo(2);
        assertThat(r.err()).contains("--no-such-option");
    }

    @Test
    void missingRequirementFileIsBadInputNamingTheFile() {
        CliRunner r = CliRunner.run("size", "does-not-exist.yaml");
        assertThat(r.code()).isEqualTo(2);
        assertThat(r.err()).contains("does-not-exist.yaml");
    }

    @Test
    void badRequirementWritesNothing(@TempDir Path dir) throws IOException {
        Path req = dir.resolve("bad.yaml");
        Files.writeString(req, "job: arrest\nload:\n  mass: 18\n");
        Path out = dir.resolve("out");
        CliRunner r = CliRunner.run("size", req.toString(), "--out", out.toString());
        assertThat(r.code()).isEqualTo(2);
        assertThat(r.err()).contains("load.mass");
        assertThat(out).doesNotExist();
    }

    @Test
    void templatesAreValidRequirementsThatSize(@TempDir Path dir) throws IOException {
        for (String job : new String[] {"arrest", "launch"}) {
            CliRunner t = CliRunner.run("new", job);
            assertThat(t.code()).isZero();
            Path f = dir.resolve(job + ".yaml");
            Files.writeString(f, t.out());
            CliRunner r = CliRunner.run("size", f.toString(), "--format", "json");
            assertThat(r.code()).as(r.err()).isIn(0, 3);
            assertThat(r.out()).contains("\"job\" : \"" + job + "\"");
        }
    }

    @Test
    void materialsListsEveryMaterialWithItsSource() {
        CliRunner r = CliRunner.run("materials");
        assertThat(r.code()).isZero();
        assertThat(r.out()).contains("music-wire", "ASTM A228", "phosphor-bronze", "Shigley");
    }

    @Test
    void impossibleRequirementExitsThreeWithADiagnosisAndStillWritesTheJson(@TempDir Path dir) throws IOException {
        Path req = dir.resolve("hard.yaml");
        Files.writeString(req, String.join("\n",
                "title: impossible on purpose",
                "job: arrest",
                "load:",
                "  mass: 50 kg",
                "motion:",
                "  drop_height: 500 mm",
                "limits:",
                "  stroke: 10 mm",
                "envelope:",
                "  bore: 20 mm",
                ""));
        Path out = dir.resolve("out");
        CliRunner r = CliRunner.run("size", req.toString(), "--out", out.toString());
        assertThat(r.code()).isEqualTo(3);
        assertThat(r.out()).contains("NO FEASIBLE DESIGN")
                .contains("No spring in the design space is strong enough (work-energy balance and wire strength)");
        String json = Files.readString(out.resolve("shortlist.json"));
        assertThat(json).contains("\"designs\" : [ ]").contains("\"diagnosis\"").contains("removed_by")
                .contains("\"strong_enough\" : false");
    }

    @Test
    void outputNeverReplacesTheInputFile(@TempDir Path dir) throws IOException {
        Path req = dir.resolve("shortlist.json");
        Files.writeString(req, CliRunner.run("new", "arrest").out());
        String before = Files.readString(req);
        CliRunner r = CliRunner.run("size", req.toString(), "--out", dir.toString());
        assertThat(r.code()).isEqualTo(2);
        assertThat(r.err()).contains("overwrite the input");
        assertThat(Files.readString(req)).isEqualTo(before);
    }
}
