package dev.coilwise.testing;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Reads a published table stored verbatim as a test resource: '#' lines are the citation and header, every other
 * line is one printed row with cells separated by '|'. A row whose leading cells are empty continues the row above
 * (a further band of the same material), so those cells are carried down.
 */
public final class PublishedTable {
    private PublishedTable() {
    }

    /** The rows of the table, each as its list of trimmed cells, with leading empty cells carried down. */
    public static List<List<String>> rows(String resource) {
        List<List<String>> rows = new ArrayList<>();
        List<String> previous = null;
        for (String line : text(resource).split("\n")) {
            if (line.isBlank() || line.startsWith("#")) {
                continue;
            }
            List<String> cells = new ArrayList<>(Arrays.stream(line.split("\\|", -1)).map(String::strip).toList());
            for (int i = 0; previous != null && i < cells.size() && cells.get(i).isEmpty() && i < 2; i++) {
                cells.set(i, previous.get(i));
            }
            rows.add(List.copyOf(cells));
            previous = cells;
        }
        return rows;
    }

    /** Lower end of a printed range such as "0.10-6.5". */
    public static double low(String range) {
        return Double.parseDouble(range.split("-")[0]);
    }

    /** Upper end of a printed range such as "0.10-6.5". */
    public static double high(String range) {
        String[] parts = range.split("-");
        return Double.parseDouble(parts[parts.length - 1]);
    }

    private static String text(String resource) {
        try (InputStream in = PublishedTable.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new IllegalArgumentException("test resource missing: " + resource);
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
