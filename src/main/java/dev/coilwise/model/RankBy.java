package dev.coilwise.model;

import dev.coilwise.error.BadInputException;
import dev.coilwise.error.Message;
import java.util.Arrays;
import java.util.Locale;
import java.util.stream.Collectors;

/** What the shortlist is ranked by; every criterion is minimised except {@link #ROBUSTNESS}, which is maximised. */
public enum RankBy {
    MASS, COST, PEAK_FORCE, SOLID_LENGTH, OUTER_DIAMETER, FREE_LENGTH, ROBUSTNESS;

    public String key() {
        return name().toLowerCase(Locale.ROOT);
    }

    public static RankBy fromKey(String key) {
        for (RankBy r : values()) {
            if (r.key().equals(key)) {
                return r;
            }
        }
        throw BadInputException.of(Message.UNKNOWN_KEY, "ranking.by", key,
                Arrays.stream(values()).map(RankBy::key).collect(Collectors.joining(", ")));
    }
}
