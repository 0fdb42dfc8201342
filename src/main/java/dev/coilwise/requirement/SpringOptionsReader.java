package dev.coilwise.requirement;

import dev.coilwise.error.Message;
import dev.coilwise.materials.MaterialTable;
import dev.coilwise.model.EndType;
import dev.coilwise.model.Seating;
import dev.coilwise.model.SpringOptions;
import dev.coilwise.model.WireSeries;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * Reads the {@code spring} section (design space and design rules); every key is optional and falls back to
 * {@link SpringOptions#defaults()}. An absent {@code materials} stays empty, which the search reads as "every steel of
 * the material table".
 */
final class SpringOptionsReader {
    static final List<String> KEYS = List.of("materials", "ends", "index", "active_coils", "clash_allowance", "solid_safe",
            "set_removed", "seating", "wire_series", "cycles", "shot_peened", "fatigue_margin", "tolerance_grade");
    /** Bounds the model accepts for the index range and the active-coil range. */
    static final double INDEX_LOW = 2, INDEX_HIGH = 30, COILS_LOW = 1, COILS_HIGH = 200;
    /** Bounds on the clash allowance (fraction), cycles, fatigue margin: those of {@link SpringOptions}. */
    static final double CLASH_MAX = 2, CYCLES_MIN = 1, CYCLES_MAX = 1e10, MARGIN_MIN = 0.5, MARGIN_MAX = 5;

    private static final List<String> END_TYPES = Arrays.stream(EndType.values()).map(EndType::key).toList();
    private static final List<String> SEATINGS = Arrays.stream(Seating.values()).map(Seating::key).toList();

    private SpringOptionsReader() {
    }

    static Optional<SpringOptions> read(Section top, MaterialTable table) {
        SpringOptions d = SpringOptions.defaults();
        if (!top.has("spring")) {
            return Optional.of(d);
        }
        Optional<Section> section = top.section("spring", KEYS);
        if (section.isEmpty()) {
            return Optional.empty();
        }
        Section s = section.get();
        int before = s.problems().list().size();
        List<String> materials = s.has("materials") ? materials(s, table) : d.materials();
        List<EndType> ends = s.has("ends") ? ends(s) : d.ends();
        double[] usualIndex = {d.indexMin(), d.indexMax()};
        double[] usualCoils = {d.coilsMin(), d.coilsMax()};
        double[] index = s.has("index") ? pair(s, "index", INDEX_LOW, INDEX_HIGH, usualIndex) : usualIndex;
        double[] coils = s.has("active_coils") ? pair(s, "active_coils", COILS_LOW, COILS_HIGH, usualCoils) : usualCoils;
        double clash = s.has("clash_allowance") ? s.fraction("clash_allowance", 0, CLASH_MAX).orElse(Double.NaN) : d.clashAllowance();
        boolean solidSafe = s.has("solid_safe") ? s.flag("solid_safe").orElse(true) : d.solidSafe();
        boolean setRemoved = s.has("set_removed") ? s.flag("set_removed").orElse(false) : d.setRemoved();
        Seating seating = s.has("seating") ? s.choice("seating", SEATINGS).map(Seating::fromKey).orElse(null)
                : d.seating();
        Optional<WireSeries> series = s.has("wire_series")
                ? s.choice("wire_series", List.of("metric", "inch")).map(w -> WireSeries.valueOf(w.toUpperCase(Locale.ROOT)))
                : d.wireSeries();
        OptionalDouble cycles = s.has("cycles") ? s.number("cycles", CYCLES_MIN, CYCLES_MAX) : d.cycles();
        boolean peened = s.has("shot_peened") ? s.flag("shot_peened").orElse(false) : d.shotPeened();
        double margin = s.has("fatigue_margin") ? s.number("fatigue_margin", MARGIN_MIN, MARGIN_MAX).orElse(Double.NaN)
                : d.fatigueMargin();
        int grade = s.has("tolerance_grade") ? s.integer("tolerance_grade", 1, 3).orElse(0) : d.toleranceGrade();
        if (s.problems().list().size() > before) {
            return Optional.empty();
        }
        return s.build("", () -> new SpringOptions(materials, ends, index[0], index[1], coils[0], coils[1], clash, solidSafe,
                setRemoved, seating, series, cycles, peened, margin, grade));
    }

    private static List<String> materials(Section s, MaterialTable table) {
        List<String> keys = new ArrayList<>();
        s.items("materials", "a list of material keys such as [music-wire, chrome-silicon]").ifPresent(items -> {
            for (YamlNode n : items) {
                s.scalarOf(n, s.key("materials"), "a material key").map(YamlNode.Scalar::text).ifPresent(k -> {
                    if (table.contains(k)) {
                        if (!keys.contains(k)) {
                            keys.add(k);
                        }
                    } else {
                        s.problems().add(n.position(), s.key("materials"), Message.MATERIAL_NOT_IN_TABLE.format(Shown.value(k),
                                Suggest.hint(k, table.keys()), String.join(", ", table.keys())));
                    }
                });
            }
            if (items.isEmpty()) {
                s.problem("materials", Message.LIST_EMPTY.format("material"));
            }
        });
        return keys;
    }

    private static List<EndType> ends(Section s) {
        List<String> allowed = END_TYPES;
        List<EndType> ends = new ArrayList<>();
        s.items("ends", "a list of end types such as [closed-ground, closed]").ifPresent(items -> {
            for (YamlNode n : items) {
                s.scalarOf(n, s.key("ends"), "an end type").flatMap(e -> s.choiceOf(e, s.key("ends"), allowed))
                        .map(EndType::fromKey).filter(e -> !ends.contains(e)).ifPresent(ends::add);
            }
            if (items.isEmpty()) {
                s.problem("ends", Message.LIST_EMPTY.format("end type"));
            }
        });
        return ends;
    }

    /** A {@code [low, high]} pair of plain numbers within [min, max]; NaNs when it is wrong (reported). */
    private static double[] pair(Section s, String name, double min, double max, double[] usual) {
        double[] nan = {Double.NaN, Double.NaN};
        YamlNode n = s.node(name).orElseThrow();
        String example = "[" + Section.plain(usual[0]) + ", " + Section.plain(usual[1]) + "]";
        if (!(n instanceof YamlNode.Sequence seq) || seq.items().size() != 2) {
            s.problem(name, Message.EXPECTED.format("a list of two numbers [low, high] such as " + example, describe(n)));
            return nan;
        }
        OptionalDouble lo = s.scalarOf(seq.items().get(0), s.key(name), "a number")
                .map(v -> s.numberOf(v, s.key(name), min, max)).orElse(OptionalDouble.empty());
        OptionalDouble hi = s.scalarOf(seq.items().get(1), s.key(name), "a number")
                .map(v -> s.numberOf(v, s.key(name), min, max)).orElse(OptionalDouble.empty());
        if (lo.isEmpty() || hi.isEmpty()) {
            return nan;
        }
        if (lo.getAsDouble() > hi.getAsDouble()) {
            s.problem(name, Message.LOW_ABOVE_HIGH.format(Section.plain(lo.getAsDouble()), Section.plain(hi.getAsDouble())));
            return nan;
        }
        return new double[] {lo.getAsDouble(), hi.getAsDouble()};
    }

    private static String describe(YamlNode n) {
        return n instanceof YamlNode.Sequence seq ? "a list of " + seq.items().size() : n.describe();
    }

}
