package dev.coilwise.requirement;

import dev.coilwise.error.BadInputException;
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
 * Reads an input file (requirement, spring, catalogue, column mapping) as UTF-8 text, safely: never more than its
 * size limit plus one byte is read, so a huge file, a device or a pipe that never ends is refused without filling
 * memory; a UTF-8 byte-order mark is dropped; UTF-16 and UTF-32 files, other encodings and binary files are named as
 * such. Every failure is a {@link BadInputException} whose message says what is wrong with the file and what to do.
 */
public final class InputFiles {
    private InputFiles() {
    }

    /**
     * The file's text.
     *
     * @param maxBytes largest size read
     * @throws BadInputException saying why the file cannot be read (without its name: the caller adds it)
     */
    public static String readUtf8(Path file, int maxBytes) {
        if (Files.isDirectory(file)) {
            throw BadInputException.of(Message.FILE_UNREADABLE, "it is a folder, not a file");
        }
        byte[] bytes;
        try (InputStream in = Files.newInputStream(file)) {
            bytes = in.readNBytes(maxBytes + 1);
            if (bytes.length > maxBytes) {
                String size = Files.isRegularFile(file) ? "has " + Files.size(file) : "has more than " + maxBytes;
                throw BadInputException.of(Message.FILE_TOO_LARGE, size, maxBytes, maxBytes >> 20);
            }
        } catch (NoSuchFileException e) {
            throw BadInputException.of(Message.FILE_UNREADABLE, "no such file");
        } catch (AccessDeniedException e) {
            throw BadInputException.of(Message.FILE_UNREADABLE, "permission denied");
        } catch (IOException e) {
            throw BadInputException.of(Message.FILE_UNREADABLE, e.getMessage() == null ? e.getClass().getSimpleName()
                    : e.getMessage());
        }
        return decode(bytes);
    }

    /** UTF-8 text of {@code bytes}, without a leading byte-order mark. */
    static String decode(byte[] bytes) {
        Optional<String> wide = wideEncoding(bytes);
        if (wide.isPresent()) {
            throw BadInputException.of(Message.FILE_UNREADABLE, "it is " + wide.get() + " text; save it as UTF-8");
        }
        String text;
        try {
            text = StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT).decode(ByteBuffer.wrap(bytes)).toString();
        } catch (CharacterCodingException e) {
            throw BadInputException.of(Message.FILE_UNREADABLE, "it is not UTF-8 text (line " + lineOfBadByte(bytes)
                    + " holds a byte that is not UTF-8); save it as UTF-8");
        }
        int nul = text.indexOf('\0');
        if (nul >= 0) {
            throw BadInputException.of(Message.FILE_UNREADABLE, "it holds a NUL character (line "
                    + (text.substring(0, nul).chars().filter(c -> c == '\n').count() + 1) + "); it is not a text file");
        }
        return stripBom(text);
    }

    /** Text without a leading byte-order mark (U+FEFF). */
    static String stripBom(String text) {
        return text.startsWith("\uFEFF") ? text.substring(1) : text;
    }

    /** A UTF-16 or UTF-32 byte-order mark, or ASCII text written two bytes a character. */
    private static Optional<String> wideEncoding(byte[] b) {
        if (b.length >= 4 && (b[0] == 0 && b[1] == 0 && (b[2] & 0xff) == 0xfe && (b[3] & 0xff) == 0xff
                || (b[0] & 0xff) == 0xff && (b[1] & 0xff) == 0xfe && b[2] == 0 && b[3] == 0)) {
            return Optional.of("UTF-32");
        }
        if (b.length >= 2 && ((b[0] & 0xff) == 0xfe && (b[1] & 0xff) == 0xff || (b[0] & 0xff) == 0xff && (b[1] & 0xff) == 0xfe)) {
            return Optional.of("UTF-16");
        }
        if (b.length >= 4 && (b[0] > 0 && b[1] == 0 && b[2] > 0 && b[3] == 0 || b[0] == 0 && b[1] > 0 && b[2] == 0 && b[3] > 0)) {
            return Optional.of("UTF-16");
        }
        return Optional.empty();
    }

    /** 1-based line of the first byte sequence that is not UTF-8. */
    private static long lineOfBadByte(byte[] bytes) {
        var decoder = StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        ByteBuffer in = ByteBuffer.wrap(bytes);
        java.nio.CharBuffer out = java.nio.CharBuffer.allocate(bytes.length + 1);
        decoder.decode(in, out, true);
        out.flip();
        return out.chars().filter(c -> c == '\n').count() + 1;
    }
}
