package dev.coilwise.requirement;

import dev.coilwise.error.Message;
import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.Optional;

/**
 * Reads an input file as UTF-8 text. Never reads more than {@link YamlTreeReader#MAX_BYTES} + 1 bytes, so a huge
 * file, a device or a pipe that never ends is refused without filling memory; a UTF-8 byte-order mark is dropped,
 * and a UTF-16 or UTF-32 file is named as such.
 */
final class FileText {
    private FileText() {
    }

    static Optional<String> read(Path file, Problems problems) {
        if (Files.isDirectory(file)) {
            problems.add(YamlNode.Position.FILE, "", Message.FILE_UNREADABLE.format("it is a folder, not a file"));
            return Optional.empty();
        }
        try (InputStream in = Files.newInputStream(file)) {
            byte[] bytes = in.readNBytes(YamlTreeReader.MAX_BYTES + 1);
            if (bytes.length > YamlTreeReader.MAX_BYTES) {
                String size = Files.isRegularFile(file) ? "has " + Files.size(file) : "has more than " + YamlTreeReader.MAX_BYTES;
                problems.add(YamlNode.Position.FILE, "", Message.FILE_TOO_LARGE.format(size, YamlTreeReader.MAX_BYTES));
                return Optional.empty();
            }
            Optional<String> wide = wideEncoding(bytes);
            if (wide.isPresent()) {
                problems.add(YamlNode.Position.FILE, "", Message.FILE_UNREADABLE.format(
                        "it is " + wide.get() + " text; save it as UTF-8"));
                return Optional.empty();
            }
            return Optional.of(stripBom(decode(bytes)));
        } catch (NoSuchFileException e) {
            problems.add(YamlNode.Position.FILE, "", Message.FILE_UNREADABLE.format("no such file"));
        } catch (AccessDeniedException e) {
            problems.add(YamlNode.Position.FILE, "", Message.FILE_UNREADABLE.format("permission denied"));
        } catch (CharacterCodingException e) {
            problems.add(YamlNode.Position.FILE, "", Message.FILE_UNREADABLE.format("it is not UTF-8 text; save it as UTF-8"));
        } catch (IOException e) {
            problems.add(YamlNode.Position.FILE, "", Message.FILE_UNREADABLE.format(
                    e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage()));
        }
        return Optional.empty();
    }

    private static String decode(byte[] bytes) throws CharacterCodingException {
        return StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT).decode(ByteBuffer.wrap(bytes)).toString();
    }

    /** A UTF-16 or UTF-32 byte-order mark, or ASCII text written two or four bytes a character. */
    private static Optional<String> wideEncoding(byte[] b) {
        if (b.length >= 4 && (b[0] == 0 && b[1] == 0 && (b[2] & 0xff) == 0xfe && (b[3] & 0xff) == 0xff
                || (b[0] & 0xff) == 0xff && (b[1] & 0xff) == 0xfe && b[2] == 0 && b[3] == 0)) {
            return Optional.of("UTF-32");
        }
        if (b.length >= 2 && ((b[0] & 0xff) == 0xfe && (b[1] & 0xff) == 0xff || (b[0] & 0xff) == 0xff && (b[1] & 0xff) == 0xfe)) {
            return Optional.of("UTF-16");
        }
        if (b.length >= 4 && b[0] != 0 && b[1] == 0 && b[2] != 0 && b[3] == 0
                || b.length >= 4 && b[0] == 0 && b[1] != 0 && b[2] == 0 && b[3] != 0) {
            return Optional.of("UTF-16");
        }
        return Optional.empty();
    }

    /** Text without a leading byte-order mark (U+FEFF). */
    static String stripBom(String text) {
        return text.startsWith("\uFEFF") ? text.substring(1) : text;
    }

    /** The folder a file's relative paths are resolved against. */
    static Path folderOf(Path file) {
        Path parent = file.toAbsolutePath().getParent();
        return parent == null ? Path.of("").toAbsolutePath() : parent;
    }
}
