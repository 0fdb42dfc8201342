package dev.coilwise.cli;

import dev.coilwise.error.BadInputException;
import java.io.IOException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Writes a set of output files safely: everything is rendered in memory first, each file goes to a temporary file in
 * the target folder and is then moved over its name, and no output may replace an input file.
 */
final class OutputFolder {
    private final Path dir;
    private final List<Path> inputs;
    private final Map<String, byte[]> files = new LinkedHashMap<>();

    OutputFolder(Path dir, List<Path> inputs) {
        this.dir = dir;
        this.inputs = inputs.stream().map(p -> p.toAbsolutePath().normalize()).toList();
    }

    void add(String name, String text) {
        files.put(name, text.getBytes(java.nio.charset.StandardCharsets.UTF_8));
    }

    void add(String name, byte[] bytes) {
        files.put(name, bytes.clone());
    }

    /** Writes every file; returns the paths written. */
    List<Path> commit() throws IOException {
        if (Files.exists(dir) && !Files.isDirectory(dir)) {
            throw new BadInputException("--out " + dir + " exists and is not a folder");
        }
        for (String name : files.keySet()) {
            Path target = dir.resolve(name).toAbsolutePath().normalize();
            if (inputs.contains(target)) {
                throw new BadInputException("--out " + dir + " would overwrite the input file " + target
                        + "; choose another output folder");
            }
        }
        Files.createDirectories(dir);
        Map<Path, Path> staged = new LinkedHashMap<>();
        try {
            for (Map.Entry<String, byte[]> f : files.entrySet()) {
                Path tmp = Files.createTempFile(dir, "." + f.getKey() + ".", ".tmp");
                staged.put(tmp, dir.resolve(f.getKey()));
                Files.write(tmp, f.getValue());
            }
            for (Map.Entry<Path, Path> s : staged.entrySet()) {
                move(s.getKey(), s.getValue());
            }
        } finally {
            for (Path tmp : staged.keySet()) {
                Files.deleteIfExists(tmp);
            }
        }
        return List.copyOf(staged.values());
    }

    private static void move(Path from, Path to) throws IOException {
        try {
            Files.move(from, to, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(from, to, StandardCopyOption.REPLACE_EXISTING);
        }
    }
}
