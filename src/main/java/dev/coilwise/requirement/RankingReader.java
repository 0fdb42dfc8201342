package dev.coilwise.requirement;

import dev.coilwise.error.Message;
import dev.coilwise.model.Prefer;
import dev.coilwise.model.RankBy;
import dev.coilwise.model.Ranking;
import java.nio.file.Files;
import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;

/** Reads {@code ranking} (every key optional, defaults of {@link Ranking#defaults()}) and the {@code stock} list. */
final class RankingReader {
    static final List<String> KEYS = List.of("by", "shortlist", "prefer", "dynamics", "min_probability");
    /** Shortlist bounds of {@link Ranking}. */
    static final int SHORTLIST_MIN = 1, SHORTLIST_MAX = 100;

    private RankingReader() {
    }

    static Optional<Ranking> read(Section top) {
        Ranking d = Ranking.defaults();
        if (!top.has("ranking")) {
            return Optional.of(d);
        }
        Optional<Section> section = top.section("ranking", KEYS);
        if (section.isEmpty()) {
            return Optional.empty();
        }
        Section s = section.get();
        int before = s.problems().list().size();
        List<String> byKeys = Arrays.stream(RankBy.values()).map(RankBy::key).toList();
        RankBy by = s.has("by") ? s.choice("by", byKeys).map(RankBy::fromKey).orElse(null) : d.by();
        int shortlist = s.has("shortlist") ? s.integer("shortlist", SHORTLIST_MIN, SHORTLIST_MAX).orElse(0) : d.shortlist();
        Prefer prefer = s.has("prefer") ? s.choice("prefer", List.of("stock", "custom", "none"))
                .map(p -> Prefer.valueOf(p.toUpperCase(Locale.ROOT))).orElse(null) : d.prefer();
        boolean strict = s.has("dynamics") ? s.choice("dynamics", List.of("warn", "strict")).map("strict"::equals).orElse(false)
                : d.dynamicsStrict();
        OptionalDouble probability = d.minProbability();
        if (s.has("min_probability")) {
            probability = s.fraction("min_probability", 0, 1);
            if (probability.isPresent() && probability.getAsDouble() == 0) {
                s.problem("min_probability", Message.MUST_BE_POSITIVE.format(s.raw("min_probability")));
            }
        }
        if (s.problems().list().size() > before) {
            return Optional.empty();
        }
        OptionalDouble p = probability;
        return s.build("", () -> new Ranking(by, shortlist, prefer, strict, p));
    }

    /** Stock catalogue paths, resolved against {@code baseDir} (the requirement file's folder); each must exist. */
    static List<Path> stock(Section top, Path baseDir) {
        List<Path> paths = new ArrayList<>();
        if (!top.has("stock")) {
            return paths;
        }
        top.items("stock", "a list of catalogue files such as [../spring-catalogs/demo-metric.csv]").ifPresent(items -> {
            for (YamlNode n : items) {
                top.scalarOf(n, "stock", "a file path").ifPresent(s -> {
                    Optional<Path> p = resolve(baseDir, s.text().strip());
                    if (p.isEmpty()) {
                        top.problems().add(n.position(), "stock", Message.NOT_A_PATH.format(Shown.value(s.text())));
                    } else if (Files.isRegularFile(p.get())) {
                        paths.add(p.get());
                    } else {
                        top.problems().add(n.position(), "stock",
                                Message.STOCK_NOT_FOUND.format(Shown.escape(p.get().toString())));
                    }
                });
            }
        });
        return paths;
    }

    /** The path resolved against the base folder, or empty when the text cannot name a file on this system. */
    private static Optional<Path> resolve(Path baseDir, String text) {
        try {
            return Optional.of(baseDir.resolve(text).normalize());
        } catch (InvalidPathException e) {
            return Optional.empty();
        }
    }
}
