package dev.coilwise.requirement;

import dev.coilwise.error.BadInputException;
import java.nio.file.Path;
import java.util.Optional;

/** Reads a requirement or spring file ({@link InputFiles}, at most {@link YamlTreeReader#MAX_BYTES}), reporting why not. */
final class FileText {
    private FileText() {
    }

    static Optional<String> read(Path file, Problems problems) {
        try {
            return Optional.of(InputFiles.readUtf8(file, YamlTreeReader.MAX_BYTES));
        } catch (BadInputException e) {
            problems.add(YamlNode.Position.FILE, "", e.getMessage());
            return Optional.empty();
        }
    }

    /** Text without a leading byte-order mark (U+FEFF). */
    static String stripBom(String text) {
        return InputFiles.stripBom(text);
    }

    /** The folder a file's relative paths are resolved against. */
    static Path folderOf(Path file) {
        Path parent = file.toAbsolutePath().getParent();
        return parent == null ? Path.of("").toAbsolutePath() : parent;
    }
}
