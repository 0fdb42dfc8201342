package dev.coilwise.requirement;

import dev.coilwise.error.BadInputException;
import dev.coilwise.error.Message;
import dev.coilwise.mechanics.ArrestBalance;
import dev.coilwise.model.Arrest;
import dev.coilwise.model.Gravity;
import dev.coilwise.model.Job;
import dev.coilwise.model.Launch;
import dev.coilwise.requirement.Section.Sign;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

/** Reads {@code load} and the event ({@code motion} for an arrest, {@code launch} for a launch) into a {@link Job}. */
final class JobReader {
    static final String ARREST = "arrest";
    static final String LAUNCH = "launch";
    static final List<String> LOAD_KEYS = List.of("mass", "weight");
    static final List<String> MOTION_KEYS = List.of("drop_height", "speed", "direction", "drive_force");
    static final List<String> LAUNCH_KEYS = List.of("height", "direction", "losses");
    /** Largest share of stored energy that may be declared lost; beyond it the launcher is mostly friction. */
    static final double MAX_LOSSES = 0.95;
    /** Angles within this of ±90° are taken as exactly vertical, rad (deg-to-rad rounding). */
    private static final double VERTICAL_TOLERANCE = 1e-12;
    private static final Map<String, Double> ARREST_WORDS = Map.of("down", Math.PI / 2, "horizontal", 0.0, "up", -Math.PI / 2);

    private JobReader() {
    }

    /** Reads the job; {@code job} is the validated job word, or empty when missing or wrong (sections are still checked). */
    static Optional<Job> read(Section top, Optional<String> job) {
        OptionalDouble mass = mass(top);
        Optional<Section> motion = top.section("motion", MOTION_KEYS);
        Optional<Section> launch = top.section(LAUNCH, LAUNCH_KEYS);
        if (job.isPresent() && job.get().equals(ARREST) && top.has(LAUNCH)) {
            top.problems().add(top.keyAt(LAUNCH), LAUNCH,
                    Message.NOT_FOR_JOB.format(LAUNCH, ARREST, "; an arrest is described under 'motion'"));
        }
        if (job.isPresent() && job.get().equals(LAUNCH) && top.has("motion")) {
            top.problems().add(top.keyAt("motion"), "motion",
                    Message.NOT_FOR_JOB.format(ARREST, LAUNCH, "; a launch is described under 'launch'"));
        }
        Optional<Job> arrest = motion.flatMap(m -> arrest(m, mass));
        Optional<Job> thrown = launch.flatMap(l -> launch(l, mass));
        if (job.isEmpty()) {
            return Optional.empty();
        }
        if (job.get().equals(ARREST)) {
            if (!top.has("motion")) {
                top.missing("motion", "the motion to arrest: motion.drop_height or motion.speed, and motion.direction");
            }
            return arrest;
        }
        if (!top.has(LAUNCH)) {
            top.missing(LAUNCH, "the launch: launch.height and launch.direction");
        }
        return thrown;
    }

    private static OptionalDouble mass(Section top) {
        if (!top.has("load")) {
            top.missing("load", "load.mass (e.g. '18 kg') or load.weight (e.g. '40 lbf')");
            return OptionalDouble.empty();
        }
        Optional<Section> load = top.section("load", LOAD_KEYS);
        if (load.isEmpty()) {
            return OptionalDouble.empty();
        }
        Section l = load.get();
        OptionalDouble mass = swapped(l, "mass", QuantityKind.FORCE, "load.weight", QuantityKind.MASS) ? OptionalDouble.empty()
                : l.quantity("mass", QuantityKind.MASS, Sign.POSITIVE);
        OptionalDouble weight = swapped(l, "weight", QuantityKind.MASS, "load.mass", QuantityKind.FORCE) ? OptionalDouble.empty()
                : l.quantity("weight", QuantityKind.FORCE, Sign.POSITIVE);
        if (l.has("mass") && l.has("weight")) {
            l.problem("weight", Message.BOTH_GIVEN.format("load.mass", "load.weight"));
            return OptionalDouble.empty();
        }
        if (!l.has("mass") && !l.has("weight")) {
            l.problems().add(l.where(), "load", Message.ONE_OF_TWO_MISSING.format("load.mass", "load.weight"));
            return OptionalDouble.empty();
        }
        if (weight.isPresent()) {
            return OptionalDouble.of(weight.getAsDouble() / Gravity.STANDARD); // weight in standard gravity
        }
        return mass;
    }

    /** A mass written under weight or a weight under mass: reported with the key it belongs under. */
    private static boolean swapped(Section l, String name, QuantityKind other, String otherKey, QuantityKind own) {
        Optional<YamlNode> n = l.node(name);
        if (n.isEmpty() || !(n.get() instanceof YamlNode.Scalar s)) {
            return false;
        }
        try {
            Quantities.measure(s.text(), other);
        } catch (BadInputException e) {
            return false;
        }
        l.problem(name, Message.UNDER_OTHER_KEY.format(Shown.value(s.text()), other.description(), otherKey,
                own.description() + " such as " + own.examples()));
        return true;
    }

    private static Optional<Job> arrest(Section m, OptionalDouble mass) {
        OptionalDouble drop = m.quantity("drop_height", QuantityKind.LENGTH, Sign.POSITIVE);
        OptionalDouble speed = m.quantity("speed", QuantityKind.SPEED, Sign.POSITIVE);
        OptionalDouble drive = m.has("drive_force") ? m.quantity("drive_force", QuantityKind.FORCE, Sign.NON_NEGATIVE)
                : OptionalDouble.of(0);
        OptionalDouble angle = m.has("direction") ? direction(m, ARREST_WORDS, -Math.PI / 2, "-90 deg",
                "down, horizontal, up, or an angle below the horizontal such as '30 deg'") : OptionalDouble.of(Math.PI / 2);
        boolean bothGiven = m.has("drop_height") && m.has("speed");
        if (bothGiven) {
            m.problem("speed", Message.BOTH_GIVEN.format("motion.drop_height", "motion.speed"));
        } else if (!m.has("drop_height") && !m.has("speed")) {
            m.problems().add(m.where(), "motion", Message.ONE_OF_TWO_MISSING.format("motion.drop_height", "motion.speed"));
        }
        if (m.has("drop_height") && angle.isPresent() && angle.getAsDouble() != Math.PI / 2) {
            m.problem("drop_height", Message.DROP_NEEDS_FALL.format(m.raw("direction")));
            return Optional.empty();
        }
        if (bothGiven || mass.isEmpty() || drive.isEmpty() || angle.isEmpty() || drop.isEmpty() && speed.isEmpty()) {
            return Optional.empty();
        }
        double v = drop.isPresent() ? ArrestBalance.dropSpeed(drop.getAsDouble()) : speed.getAsDouble();
        double h = drop.isPresent() ? drop.getAsDouble() : Double.NaN;
        return m.build("", () -> new Arrest(mass.getAsDouble(), v, angle.getAsDouble(), drive.getAsDouble(), h));
    }

    private static Optional<Job> launch(Section l, OptionalDouble mass) {
        OptionalDouble height = l.quantity("height", QuantityKind.LENGTH, Sign.POSITIVE);
        if (!l.has("height")) {
            l.missing("height", "the apex rise above the muzzle, a length such as '1.8 m'");
        }
        OptionalDouble angle = l.has("direction") ? direction(l, Map.of("up", Math.PI / 2), 0, "0 deg",
                "up, or an angle above the horizontal such as '60 deg'") : OptionalDouble.of(Math.PI / 2);
        if (angle.isPresent() && angle.getAsDouble() <= 0) {
            l.problem("direction", Message.NOT_IN_RANGE.format("0 deg (exclusive)", "90 deg", l.raw("direction")));
            angle = OptionalDouble.empty();
        }
        OptionalDouble losses = l.has("losses") ? l.fraction("losses", 0, MAX_LOSSES) : OptionalDouble.of(0);
        if (mass.isEmpty() || height.isEmpty() || angle.isEmpty() || losses.isEmpty()) {
            return Optional.empty();
        }
        double a = angle.getAsDouble();
        return l.build("", () -> new Launch(mass.getAsDouble(), height.getAsDouble(), a, losses.getAsDouble()));
    }

    /** A direction word or an angle in [low, 90°]; angles within rounding of ±90° become exactly ±π/2. */
    private static OptionalDouble direction(Section s, Map<String, Double> words, double low, String lowText, String allowed) {
        Optional<YamlNode.Scalar> node = s.scalar("direction", allowed);
        if (node.isEmpty()) {
            return OptionalDouble.empty();
        }
        String text = node.get().text();
        if (words.containsKey(text)) {
            return OptionalDouble.of(words.get(text));
        }
        String trimmed = Grammar.trim(text);
        if (!trimmed.isEmpty() && Character.isLetter(trimmed.charAt(0))) {
            s.problem("direction", Message.NOT_A_CHOICE.format(Shown.value(text), Suggest.hint(text, words.keySet()), allowed));
            return OptionalDouble.empty();
        }
        OptionalDouble a = s.quantityOf(node.get(), s.key("direction"), QuantityKind.ANGLE, Sign.ANY);
        if (a.isEmpty()) {
            return a;
        }
        double v = a.getAsDouble();
        if (Math.abs(v - Math.PI / 2) < VERTICAL_TOLERANCE) {
            return OptionalDouble.of(Math.PI / 2);
        }
        if (Math.abs(v + Math.PI / 2) < VERTICAL_TOLERANCE) {
            return OptionalDouble.of(-Math.PI / 2);
        }
        if (v < low || v > Math.PI / 2) {
            s.problem("direction", Message.NOT_IN_RANGE.format(lowText, "90 deg", Shown.value(text)));
            return OptionalDouble.empty();
        }
        return a;
    }
}
