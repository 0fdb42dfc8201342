package dev.coilwise.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

/** Two saved shortlists made once per test run by {@code size --out}: one with designs, one with a diagnosis. */
final class SavedShortlists {
    private static List<String> texts;

    private SavedShortlists() {
    }

    static synchronized List<String> texts() {
        if (texts == null) {
            try {
                Path dir = Files.createTempDirectory("coilwise-saved");
                String feasible = saved(dir, Path.of("requirements", CliMutationPropertiesTest.TOOL_CARRIER), "a");
                Path impossible = Files.writeString(dir.resolve("impossible.yaml"), "title: no spring can\njob: arrest\n"
                        + "load:\n  mass: 6 kg\nmotion:\n  speed: 2 m/s\nlimits:\n  stroke: 30 mm\n  peak_force: 300 N\n");
                texts = List.of(feasible, saved(dir, impossible, "b"));
            } catch (IOException e) {
                throw new IllegalStateException(e);
            }
        }
        return texts;
    }

    private static String saved(Path dir, Path requirement, String name) throws IOException {
        Path out = dir.resolve(name);
        CliRunner.run("size", requirement.toString(), "--samples", "100", "--masses", "2", "--top", "3", "--out",
                out.toString());
        return Files.readString(out.resolve("shortlist.json"));
    }
}
