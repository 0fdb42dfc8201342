package dev.coilwise.requirement;

import dev.coilwise.error.Message;
import dev.coilwise.materials.Material;
import dev.coilwise.materials.MaterialTable;
import dev.coilwise.model.EndType;
import dev.coilwise.model.Spring;
import dev.coilwise.requirement.Section.Sign;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * Reads a spring file: one spring as it would be ordered, for checking it against a requirement. Keys:
 * {@code material, ends, wire_diameter, mean_diameter | outer_diameter, active_coils | total_coils, free_length};
 * lengths with units, coil counts as plain numbers. Problems are collected and thrown like {@link RequirementReader}'s.
 */
public final class SpringFileReader {
    static final List<String> KEYS = List.of("material", "ends", "wire_diameter", "mean_diameter", "outer_diameter",
            "active_coils", "total_coils", "free_length");
    static final String NEEDED = "material, ends, wire_diameter, mean_diameter or outer_diameter, active_coils or total_coils"
            + " and free_length";
    /** Largest coil count read (the model's bound on active coils). */
    static final double MAX_COILS = 200;
    /**
     * Heaviest spring checked, kg: 100 kg. coilwise's own bound, not a published figure: a cold-coiled spring of the
     * thickest wire in the material table (12.7 mm) at index 12 with 100 active coils weighs about 50 kg; a heavier one is a
     * slip of a diameter, a coil count or a unit (hot-coiled bar springs are outside the material table).
     */
    static final double MAX_SPRING_MASS = 100;

    public Spring read(Path file, MaterialTable materials) {
        Problems problems = new Problems(file.toString());
        Optional<String> text = FileText.read(file, problems);
        problems.throwIfAny();
        return parse(text.orElseThrow(), problems, materials);
    }

    public Spring parse(String yaml, String fileName, MaterialTable materials) {
        return parse(yaml, new Problems(fileName), materials);
    }

    private Spring parse(String yaml, Problems problems, MaterialTable table) {
        Optional<YamlNode.Mapping> root = YamlTreeReader.read(yaml, problems, NEEDED);
        problems.throwIfAny();
        Section s = new Section("", root.orElseThrow(), new YamlNode.Position(1, 1), problems, KEYS);
        Optional<Material> material = required(s, "material", "a material key such as 'music-wire'")
                ? s.text("material").flatMap(k -> material(s, k, table)) : Optional.empty();
        List<String> endKeys = Arrays.stream(EndType.values()).map(EndType::key).toList();
        Optional<EndType> ends = required(s, "ends", "the end type: " + String.join(", ", endKeys))
                ? s.choice("ends", endKeys).map(EndType::fromKey) : Optional.empty();
        OptionalDouble d = required(s, "wire_diameter", "a length such as '3.2 mm'")
                ? s.quantity("wire_diameter", QuantityKind.LENGTH, Sign.POSITIVE) : OptionalDouble.empty();
        OptionalDouble dm = diameter(s, d);
        OptionalDouble na = coils(s, ends);
        OptionalDouble l0 = required(s, "free_length", "a length such as '60 mm'")
                ? s.quantity("free_length", QuantityKind.LENGTH, Sign.POSITIVE) : OptionalDouble.empty();
        if (material.isPresent() && d.isPresent() && !material.get().covers(d.getAsDouble())) {
            Material m = material.get();
            s.problem("wire_diameter", Message.WIRE_OUT_OF_MATERIAL_RANGE.format(d.getAsDouble() * 1e3, m.key(),
                    m.minDiameter() * 1e3, m.maxDiameter() * 1e3));
        }
        if (d.isPresent() && dm.isPresent() && dm.getAsDouble() <= 0.75 * d.getAsDouble()) {
            String key = s.has("mean_diameter") ? "mean_diameter" : "outer_diameter";
            s.problem(key, Message.INDEX_TOO_LOW.format(dm.getAsDouble() / d.getAsDouble()));
        } else if (ends.isPresent() && d.isPresent() && na.isPresent() && l0.isPresent()) {
            double ls = ends.get().solidLength(d.getAsDouble(), ends.get().totalCoils(na.getAsDouble()));
            if (l0.getAsDouble() <= ls) {
                s.problem("free_length", Message.SOLID_EXCEEDS_FREE.format(l0.getAsDouble() * 1e3, ls * 1e3));
            }
        }
        problems.throwIfAny();
        Optional<Spring> spring = s.build("", () -> new Spring(material.orElseThrow(), ends.orElseThrow(), d.getAsDouble(),
                dm.getAsDouble(), na.getAsDouble(), l0.getAsDouble()));
        if (spring.isPresent() && spring.get().mass() > MAX_SPRING_MASS) {
            problems.add(s.where(), "", Message.SPRING_TOO_HEAVY.format(Section.plain(Math.round(spring.get().mass())),
                    Section.plain(MAX_SPRING_MASS)));
        }
        problems.throwIfAny();
        return spring.orElseThrow();
    }

    private static boolean required(Section s, String name, String what) {
        if (!s.has(name)) {
            s.missing(name, what);
        }
        return s.has(name);
    }

    private static Optional<Material> material(Section s, String key, MaterialTable table) {
        if (table.contains(key)) {
            return Optional.of(table.get(key));
        }
        s.problem("material", Message.MATERIAL_NOT_IN_TABLE.format(Shown.value(key), Suggest.hint(key, table.keys()),
                String.join(", ", table.keys())));
        return Optional.empty();
    }

    /** Mean diameter D, from mean_diameter or from outer_diameter − d; exactly one must be given. */
    private static OptionalDouble diameter(Section s, OptionalDouble d) {
        if (!exactlyOne(s, "mean_diameter", "outer_diameter")) {
            return OptionalDouble.empty();
        }
        if (s.has("mean_diameter")) {
            return s.quantity("mean_diameter", QuantityKind.LENGTH, Sign.POSITIVE);
        }
        OptionalDouble od = s.quantity("outer_diameter", QuantityKind.LENGTH, Sign.POSITIVE);
        return od.isPresent() && d.isPresent() ? OptionalDouble.of(od.getAsDouble() - d.getAsDouble()) : OptionalDouble.empty();
    }

    /** Active coils Na, from active_coils or from total_coils − inactive coils of the ends; exactly one must be given. */
    private static OptionalDouble coils(Section s, Optional<EndType> ends) {
        if (!exactlyOne(s, "active_coils", "total_coils")) {
            return OptionalDouble.empty();
        }
        if (s.has("active_coils")) {
            OptionalDouble na = s.number("active_coils", 0, MAX_COILS);
            if (na.isPresent() && na.getAsDouble() == 0) {
                s.problem("active_coils", Message.MUST_BE_POSITIVE.format(s.raw("active_coils")));
                return OptionalDouble.empty();
            }
            return na;
        }
        OptionalDouble nt = s.number("total_coils", 0, MAX_COILS);
        if (nt.isEmpty() || ends.isEmpty()) {
            return OptionalDouble.empty();
        }
        double na = nt.getAsDouble() - ends.get().inactiveCoils();
        if (na <= 0) {
            s.problem("total_coils", Message.NO_ACTIVE_COILS.format(s.raw("total_coils"), ends.get().key(),
                    ends.get().inactiveCoils()));
            return OptionalDouble.empty();
        }
        return OptionalDouble.of(na);
    }

    private static boolean exactlyOne(Section s, String a, String b) {
        if (s.has(a) && s.has(b)) {
            s.problem(b, Message.BOTH_GIVEN.format(a, b));
            return false;
        }
        if (!s.has(a) && !s.has(b)) {
            s.problems().add(s.where(), a, Message.ONE_OF_TWO_MISSING.format(a, b));
            return false;
        }
        return true;
    }
}
