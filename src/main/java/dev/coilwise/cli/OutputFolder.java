package dev.coilwise.cli;

import dev.coilwise.error.BadInputException;
import java.io.IOException;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Pattern;
import java.util.stream.Stream;

/**
 * Writes a set of output files as one step, or not at all.
 *
 * <p>Every file is rendered in memory by the caller first. {@link #commit()} then refuses any name that is not a
 * plain file name, any output that would replace an input (also through a symbolic link or another spelling of the
 * same path) and any output over a folder; writes each file to a temporary file in the target folder and flushes it
 * to disk; moves the files they replace aside; and moves the new files into place. If any step fails, the files
 * already moved are taken back out and the old ones restored, so the folder is left as it was, and the failure is
 * reported as bad input (exit 2) naming the folder and the reason.
 *
 * <p>A command whose set of files varies from run to run (a spec sheet per design) names the pattern of its own
 * variable file names with {@link #replacing(Pattern)}: plain files in the folder whose names match it and that this
 * run does not write are left over from an earlier run, and are removed in the same step (moved aside with the
 * replaced files, put back if the step fails). Files of any other name, links, folders and inputs are never touched.
 */
final class OutputFolder {
    /** Moves a file over another; a seam for the tests that make a move fail half-way. */
    interface Mover {
        void move(Path from, Path to) throws IOException;
    }

    private final Path dir;
    private final List<Path> inputs;
    private final Mover mover;
    private final Map<String, byte[]> files = new LinkedHashMap<>();
    private Optional<Pattern> own = Optional.empty();
    private final List<String> removed = new ArrayList<>();

    OutputFolder(Path dir, List<Path> inputs) {
        this(dir, inputs, OutputFolder::move);
    }

    OutputFolder(Path dir, List<Path> inputs, Mover mover) {
        this.dir = dir;
        this.inputs = List.copyOf(inputs);
        this.mover = mover;
    }

    void add(String name, String text) {
        add(name, text.getBytes(StandardCharsets.UTF_8));
    }

    void add(String name, byte[] bytes) {
        if (name.isEmpty() || name.contains("/") || name.contains("\\") || name.equals(".") || name.equals("..")) {
            throw new IllegalArgumentException("not a plain output file name: " + name);
        }
        files.put(name, bytes.clone());
    }

    /** Names matching {@code pattern} that this run does not write are removed on {@link #commit()}. */
    OutputFolder replacing(Pattern pattern) {
        own = Optional.of(pattern);
        return this;
    }

    /** Names of the files of an earlier run that the last {@link #commit()} removed, sorted. */
    List<String> removed() {
        return List.copyOf(removed);
    }

    /** Writes every file; returns the paths written, in the order added. */
    List<Path> commit() {
        check();
        List<Path> stale = stale();
        try {
            Files.createDirectories(dir);
        } catch (IOException e) {
            throw failed("cannot create the folder", e);
        }
        Map<String, Path> staged = new LinkedHashMap<>();
        Map<Path, Path> asides = new LinkedHashMap<>();
        List<Path> placed = new ArrayList<>();
        try {
            for (Map.Entry<String, byte[]> f : files.entrySet()) {
                Path tmp = Files.createTempFile(dir, "." + f.getKey() + ".", ".tmp");
                staged.put(f.getKey(), tmp);
                write(tmp, f.getValue());
                readableByAll(tmp);
            }
            for (String name : files.keySet()) {
                Path target = dir.resolve(name);
                if (Files.exists(target, LinkOption.NOFOLLOW_LINKS)) {
                    moveAside(target, asides);
                }
                mover.move(staged.get(name), target);
                placed.add(target);
            }
            for (Path old : stale) {
                moveAside(old, asides);
            }
        } catch (IOException | RuntimeException e) {
            rollBack(placed, asides);
            throw failed("cannot write the output files", e);
        } finally {
            for (Path tmp : staged.values()) {
                deleteQuietly(tmp);
            }
        }
        asides.values().forEach(OutputFolder::deleteQuietly);
        removed.clear();
        stale.forEach(p -> removed.add(p.getFileName().toString()));
        return List.copyOf(placed);
    }

    /** Moves {@code target} to a hidden temporary name beside it and records where; leaves no stray file on failure. */
    private void moveAside(Path target, Map<Path, Path> asides) throws IOException {
        Path aside = Files.createTempFile(dir, "." + target.getFileName() + ".", ".old");
        try {
            mover.move(target, aside);
        } catch (IOException | RuntimeException e) {
            deleteQuietly(aside);
            throw e;
        }
        asides.put(target, aside);
    }

    /** Plain files named like this command's own outputs that this run does not write; never an input. */
    private List<Path> stale() {
        if (own.isEmpty() || !Files.isDirectory(dir)) {
            return List.of();
        }
        List<Path> in = inputs.stream().map(OutputFolder::canonical).toList();
        try (Stream<Path> entries = Files.list(dir)) {
            return entries.filter(p -> own.get().matcher(p.getFileName().toString()).matches())
                    .filter(p -> !files.containsKey(p.getFileName().toString()))
                    .filter(p -> Files.isRegularFile(p, LinkOption.NOFOLLOW_LINKS))
                    .filter(p -> !in.contains(canonical(p)) && !isSameFileAsAnInput(p))
                    .sorted()
                    .toList();
        } catch (IOException e) {
            throw failed("cannot list the folder", e);
        }
    }

    /** Refuses outputs that are folders or inputs, before anything is written. */
    private void check() {
        if (Files.exists(dir) && !Files.isDirectory(dir)) {
            throw new BadInputException("--out " + dir + " exists and is not a folder; choose a folder");
        }
        List<Path> in = inputs.stream().map(OutputFolder::canonical).toList();
        for (String name : files.keySet()) {
            Path target = dir.resolve(name);
            if (in.contains(canonical(target)) || isSameFileAsAnInput(target)) {
                throw new BadInputException("--out " + dir + " would overwrite the input file " + target
                        + "; write the output elsewhere");
            }
            if (Files.isDirectory(target, LinkOption.NOFOLLOW_LINKS)) {
                throw new BadInputException("--out " + dir + " holds a folder named " + name
                        + " where coilwise writes a file; remove it or choose another output folder");
            }
        }
    }

    private boolean isSameFileAsAnInput(Path target) {
        if (!Files.exists(target)) {
            return false;
        }
        for (Path input : inputs) {
            try {
                if (Files.exists(input) && Files.isSameFile(input, target)) {
                    return true;
                }
            } catch (IOException e) {
                return true; // cannot tell: refuse rather than risk an input
            }
        }
        return false;
    }

    /** The real path where it exists (links and folder links followed), else the absolute normal path. */
    private static Path canonical(Path p) {
        Path abs = p.toAbsolutePath().normalize();
        Optional<Path> realParent = Optional.ofNullable(abs.getParent()).flatMap(OutputFolder::real);
        return real(abs).orElse(realParent.map(rp -> rp.resolve(abs.getFileName())).orElse(abs));
    }

    private static Optional<Path> real(Path p) {
        try {
            return Optional.of(p.toRealPath());
        } catch (IOException e) {
            return Optional.empty();
        }
    }

    private static void write(Path tmp, byte[] bytes) throws IOException {
        try (FileChannel ch = FileChannel.open(tmp, StandardOpenOption.WRITE, StandardOpenOption.TRUNCATE_EXISTING)) {
            java.nio.ByteBuffer buf = java.nio.ByteBuffer.wrap(bytes);
            while (buf.hasRemaining()) {
                ch.write(buf);
            }
            ch.force(true);
        }
    }

    /** Takes out the new files already in place and puts the old ones back. */
    private static void rollBack(List<Path> placed, Map<Path, Path> asides) {
        for (Path p : placed) {
            deleteQuietly(p);
        }
        asides.forEach((target, aside) -> {
            try {
                move(aside, target);
            } catch (IOException e) {
                // the old file stays under its temporary name beside the target; nothing more can be done here
            }
        });
    }

    private BadInputException failed(String what, Exception e) {
        String reason = e instanceof FileSystemException fse && fse.getReason() != null ? fse.getReason()
                : e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
        return new BadInputException("--out " + dir + ": " + what + " (" + reason + "); the folder was left as it was");
    }

    /** Temporary files are created owner-only; outputs are ordinary files (rw-r--r--) like any a user writes. */
    private static void readableByAll(Path p) throws IOException {
        if (p.getFileSystem().supportedFileAttributeViews().contains("posix")) {
            Files.setPosixFilePermissions(p, java.nio.file.attribute.PosixFilePermissions.fromString("rw-r--r--"));
        }
    }

    private static void move(Path from, Path to) throws IOException {
        try {
            Files.move(from, to, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(from, to, StandardCopyOption.REPLACE_EXISTING);
        }
    }

    private static void deleteQuietly(Path p) {
        try {
            Files.deleteIfExists(p);
        } catch (IOException e) {
            // a leftover temporary file (hidden, ending .tmp or .old) is harmless
        }
    }
}
