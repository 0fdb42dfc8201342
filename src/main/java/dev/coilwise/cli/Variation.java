package dev.coilwise.cli;

import dev.coilwise.error.BadInputException;
import dev.coilwise.error.Message;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * One {@code --vary KEY=FROM..TO:STEPS} of {@code coilwise sweep}: a requirement-file key and the values it takes,
 * STEPS values evenly spaced from FROM to TO, both included. FROM and TO carry the file's units ("100mm", "1.5 in",
 * "20 %") or none for plain numbers; TO may use another unit of the same kind, and is then written in FROM's unit.
 *
 * @param key   dotted key path, e.g. {@code motion.drop_height}
 * @param from  first value, in {@code unit}
 * @param to    last value, in {@code unit}
 * @param unit  unit text the values are written with ("" for plain numbers)
 * @param steps number of values, at least 1 (1: FROM only, which must then equal TO)
 */
record Variation(String key, double from, double to, String unit, int steps) {
    /** Most steps in one sweep. */
    static final int MAX_STEPS = 100_000;

    /** The keys a sweep may vary: every number of a requirement file. */
    static final List<String> KEYS = List.of("load.mass", "load.weight", "motion.drop_height", "motion.speed",
            "motion.direction", "motion.drive_force", "launch.height", "launch.direction", "launch.losses",
            "limits.stroke", "limits.peak_force", "limits.deceleration", "envelope.bore", "envelope.rod",
            "envelope.clearance", "envelope.max_free_length", "envelope.pocket_length", "spring.clash_allowance",
            "spring.cycles", "spring.fatigue_margin");

    static final String FORM = "KEY=FROM..TO:STEPS such as motion.drop_height=100mm..600mm:50";

    private static final Pattern WHOLE = Pattern.compile("([^=]*)=(.*)\\.\\.(.*):\\s*(\\S+)\\s*");
    private static final Pattern VALUE = Pattern.compile("\\s*([+-]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][+-]?\\d+)?)\\s*(.*?)\\s*");

    /** Parses the option text; bad text gets a message naming what was expected and what was received. */
    static Variation parse(String text, UnitScale scale) {
        Matcher m = WHOLE.matcher(text);
        if (!m.matches()) {
            throw new BadInputException("--vary: expected " + FORM + ", got '" + text + "'");
        }
        String key = m.group(1).strip();
        if (!KEYS.contains(key)) {
            throw BadInputException.of(Message.UNKNOWN_KEY, "--vary key", key, String.join(", ", KEYS));
        }
        Matcher from = value(m.group(2), text);
        Matcher to = value(m.group(3), text);
        int steps;
        try {
            steps = Integer.parseInt(m.group(4));
        } catch (NumberFormatException e) {
            throw new BadInputException("--vary: STEPS must be a whole number from 1 to " + MAX_STEPS + ", got '"
                    + m.group(4) + "' in '" + text + "'");
        }
        if (steps < 1 || steps > MAX_STEPS) {
            throw new BadInputException("--vary: STEPS must be a whole number from 1 to " + MAX_STEPS + ", got "
                    + steps + " in '" + text + "'");
        }
        double a = Double.parseDouble(from.group(1));
        double b = Double.parseDouble(to.group(1));
        String unit = from.group(2);
        if (!unit.equals(to.group(2))) {
            b = scale.convert(b, to.group(2), unit, key);
        }
        if (steps == 1 && a != b) {
            throw new BadInputException("--vary: one step needs FROM equal to TO, got '" + text + "'");
        }
        return new Variation(key, a, b, unit, steps);
    }

    private static Matcher value(String part, String whole) {
        Matcher v = VALUE.matcher(part);
        if (!v.matches() || !Double.isFinite(Double.parseDouble(v.group(1)))) {
            throw new BadInputException("--vary: FROM and TO must be numbers with their unit such as 100mm or 1.5 in,"
                    + " got '" + part.strip() + "' in '" + whole + "'");
        }
        return v;
    }

    /** The value of step {@code i} (0-based), as written into the file: the number rounded to 12 digits, then the unit. */
    String text(int i) {
        double v = steps == 1 ? from : from + (to - from) * i / (steps - 1);
        String n = new BigDecimal(v).round(new MathContext(12)).stripTrailingZeros().toPlainString();
        return unit.isEmpty() ? n : n + " " + unit;
    }

    /** Every step's value text. */
    List<String> texts() {
        List<String> out = new ArrayList<>(steps);
        for (int i = 0; i < steps; i++) {
            out.add(text(i));
        }
        return out;
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "%s=%s..%s:%d", key, text(0), text(steps - 1), steps);
    }

    /** Converts a number between two units of the same kind (the requirement package parses both). */
    interface UnitScale {
        double convert(double value, String fromUnit, String toUnit, String key);
    }
}
