package dev.coilwise.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import dev.coilwise.error.BadInputException;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Output files are written all together or not at all, and never over an input. */
class OutputFolderTest {

    private static List<String> listing(Path dir) throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    @Test
    void writesEveryFileAndLeavesNoTemporaryFile(@TempDir Path dir) throws IOException {
        Path out = dir.resolve("out");
        OutputFolder f = new OutputFolder(out, List.of(dir.resolve("req.yaml")));
        f.add("a.json", "{}\n");
        f.add("b.csv", "x\n");
        assertThat(f.commit()).containsExactly(out.resolve("a.json"), out.resolve("b.csv"));
        assertThat(listing(out)).containsExactly("a.json", "b.csv");
        assertThat(Files.readString(out.resolve("b.csv"))).isEqualTo("x\n");
    }

    @Test
    void aMoveThatFailsHalfWayLeavesTheFolderAsItWas(@TempDir Path dir) throws IOException {
        Path out = Files.createDirectories(dir.resolve("out"));
        Files.writeString(out.resolve("a.json"), "old a");
        Files.writeString(out.resolve("b.csv"), "old b");
        Files.writeString(out.resolve("keep.txt"), "the user's own file");
        AtomicInteger moves = new AtomicInteger();
        OutputFolder f = new OutputFolder(out, List.of(), (from, to) -> {
            if (moves.incrementAndGet() == 4) { // a.json aside, a.json in, b.csv aside, then b.csv in fails
                throw new IOException("No space left on device");
            }
            Files.move(from, to, StandardCopyOption.REPLACE_EXISTING);
        });
        f.add("a.json", "new a");
        f.add("b.csv", "new b");
        f.add("c.html", "new c");
        assertThatThrownBy(f::commit).isInstanceOf(BadInputException.class)
                .hasMessage("--out " + out + ": cannot write the output files (No space left on device); the folder was"
                        + " left as it was");
        assertThat(listing(out)).containsExactly("a.json", "b.csv", "keep.txt");
        assertThat(Files.readString(out.resolve("a.json"))).isEqualTo("old a");
        assertThat(Files.readString(out.resolve("b.csv"))).isEqualTo("old b");
    }

    @Test
    void anInputIsNeverReplacedEvenThroughALinkedFolder(@TempDir Path dir) throws IOException {
        Path inputs = Files.createDirectories(dir.resolve("inputs"));
        Path req = Files.writeString(inputs.resolve("shortlist.json"), "job: arrest\n");
        Path link = Files.createSymbolicLink(dir.resolve("link"), inputs);
        OutputFolder f = new OutputFolder(link, List.of(req));
        f.add("shortlist.json", "{}");
        assertThatThrownBy(f::commit).isInstanceOf(BadInputException.class).hasMessageContaining("would overwrite the input");
        OutputFolder g = new OutputFolder(dir.resolve("inputs/../inputs"), List.of(Path.of(dir + "/inputs/./shortlist.json")));
        g.add("shortlist.json", "{}");
        assertThatThrownBy(g::commit).hasMessageContaining("would overwrite the input");
        assertThat(Files.readString(req)).isEqualTo("job: arrest\n");
    }

    @Test
    void aFolderWhereAFileGoesOrAFileWhereTheFolderGoesIsBadInput(@TempDir Path dir) throws IOException {
        Path out = Files.createDirectories(dir.resolve("out"));
        Files.createDirectories(out.resolve("shortlist.csv"));
        OutputFolder f = new OutputFolder(out, List.of());
        f.add("shortlist.csv", "x");
        assertThatThrownBy(f::commit).hasMessageContaining("holds a folder named shortlist.csv");
        Path file = Files.writeString(dir.resolve("plain"), "x");
        OutputFolder g = new OutputFolder(file, List.of());
        g.add("a.csv", "x");
        assertThatThrownBy(g::commit).hasMessage("--out " + file + " exists and is not a folder; choose a folder");
    }

    @Test
    void filesOfAnEarlierRunNamedLikeTheOwnPatternAreRemovedAndNothingElse(@TempDir Path dir) throws IOException {
        Path out = Files.createDirectories(dir.resolve("out"));
        for (String name : new String[] {"spec-1.pdf", "spec-2.pdf", "spec-3.pdf", "spec-3.html", "notes.txt",
            "spec-3.pdf.bak"}) {
            Files.writeString(out.resolve(name), "old " + name);
        }
        Files.createDirectories(out.resolve("spec-4.pdf"));
        Path input = Files.writeString(out.resolve("spec-5.html"), "an input that happens to match");
        Path elsewhere = Files.writeString(dir.resolve("target.pdf"), "a file outside the folder");
        Files.createSymbolicLink(out.resolve("spec-6.pdf"), elsewhere);
        OutputFolder f = new OutputFolder(out, List.of(input)).replacing(Pattern.compile("spec-[0-9]+\\.(pdf|html)"));
        f.add("spec-1.pdf", "new 1");
        assertThat(f.commit()).containsExactly(out.resolve("spec-1.pdf"));
        assertThat(f.removed()).containsExactly("spec-2.pdf", "spec-3.html", "spec-3.pdf");
        assertThat(listing(out)).containsExactly("notes.txt", "spec-1.pdf", "spec-3.pdf.bak", "spec-4.pdf",
                "spec-5.html", "spec-6.pdf");
        assertThat(Files.readString(out.resolve("spec-1.pdf"))).isEqualTo("new 1");
        assertThat(Files.readString(elsewhere)).isEqualTo("a file outside the folder");
    }

    @Test
    void aFailureAfterRemovingFilesOfAnEarlierRunPutsThemBack(@TempDir Path dir) throws IOException {
        Path out = Files.createDirectories(dir.resolve("out"));
        Files.writeString(out.resolve("spec-1.pdf"), "old 1");
        Files.writeString(out.resolve("spec-2.pdf"), "old 2");
        Files.writeString(out.resolve("spec-3.pdf"), "old 3");
        AtomicInteger moves = new AtomicInteger();
        OutputFolder f = new OutputFolder(out, List.of(), (from, to) -> {
            if (moves.incrementAndGet() == 4) { // spec-1 aside, spec-1 in, spec-2 aside, then spec-3 aside fails
                throw new IOException("Input/output error");
            }
            Files.move(from, to, StandardCopyOption.REPLACE_EXISTING);
        }).replacing(Pattern.compile("spec-[0-9]+\\.pdf"));
        f.add("spec-1.pdf", "new 1");
        assertThatThrownBy(f::commit).isInstanceOf(BadInputException.class).hasMessageContaining("left as it was");
        assertThat(listing(out)).containsExactly("spec-1.pdf", "spec-2.pdf", "spec-3.pdf");
        assertThat(Files.readString(out.resolve("spec-1.pdf"))).isEqualTo("old 1");
        assertThat(Files.readString(out.resolve("spec-2.pdf"))).isEqualTo("old 2");
        assertThat(f.removed()).isEmpty();
    }

    @Test
    void namesThatAreNotPlainFileNamesAreAProgrammingError() {
        OutputFolder f = new OutputFolder(Path.of("out"), List.of());
        assertThatThrownBy(() -> f.add("../x.csv", "x")).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> f.add("..", "x")).isInstanceOf(IllegalArgumentException.class);
    }
}
