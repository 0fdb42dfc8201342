package dev.coilwise.requirement;

import dev.coilwise.error.Message;
import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.Optional;

/** Reads an input file as UTF-8 text, refusing files over {@link YamlTreeReader#MAX_BYTES} before reading them. */
final class FileText {
    private FileText() {
    }

    static Optional<String> read(Path file, Problems problems) {
        try {
            long size = Files.size(file);
            if (size > YamlTreeReader.MAX_BYTES) {
                problems.add(YamlNode.Position.FILE, "", Message.FILE_TOO_LARGE.format(size, YamlTreeReader.MAX_BYTES));
                return Optional.empty();
            }
            byte[] bytes = Files.readAllBytes(file);
            return Optional.of(StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT).decode(ByteBuffer.wrap(bytes)).toString());
        } catch (NoSuchFileException e) {
            problems.add(YamlNode.Position.FILE, "", Message.FILE_UNREADABLE.format("no such file"));
        } catch (CharacterCodingException e) {
            problems.add(YamlNode.Position.FILE, "", Message.FILE_UNREADABLE.format("it is not UTF-8 text"));
        } catch (IOException e) {
            problems.add(YamlNode.Position.FILE, "", Message.FILE_UNREADABLE.format(e.toString()));
        }
        return Optional.empty();
    }

    /** The folder a file's relative paths are resolved against. */
    static Path folderOf(Path file) {
        Path parent = file.toAbsolutePath().getParent();
        return parent == null ? Path.of("").toAbsolutePath() : parent;
    }
}
