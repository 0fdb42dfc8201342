package dev.coilwise.report;

import java.util.ArrayList;
import java.util.List;

/**
 * The safety caution, the one text every user-facing output carries: the terminal output of each command, the CSV
 * and JSON files, the HTML report, the specification sheets, the time-history files, the requirement templates and
 * the help. README.md quotes it word for word (tested).
 */
public final class Caution {
    /** One paragraph, plain text; starts with "CAUTION" so that it stands out in a terminal. */
    public static final String TEXT = "CAUTION: springs store energy, and launched payloads and failing buffers can"
            + " hurt people. These results are a design aid, to be confirmed by test; local codes, standards and"
            + " licensed engineering practice govern.";

    private Caution() {
    }

    /**
     * The caution broken into lines of at most {@code width} characters (words are never split), each starting
     * with {@code prefix}: for comment lines in YAML or CSV files.
     */
    public static List<String> lines(String prefix, int width) {
        if (width <= prefix.length()) {
            throw new IllegalArgumentException("width " + width + " leaves no room after the prefix '" + prefix + "'");
        }
        List<String> lines = new ArrayList<>();
        StringBuilder line = new StringBuilder(prefix);
        for (String word : TEXT.split(" ")) {
            boolean empty = line.length() == prefix.length();
            if (!empty && line.length() + 1 + word.length() > width) {
                lines.add(line.toString());
                line = new StringBuilder(prefix);
                empty = true;
            }
            line.append(empty ? "" : " ").append(word);
        }
        lines.add(line.toString());
        return List.copyOf(lines);
    }
}
