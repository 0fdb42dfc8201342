package dev.coilwise.requirement;

import dev.coilwise.error.BadInputException;
import dev.coilwise.error.InternalFaultException;
import dev.coilwise.error.Message;
import dev.coilwise.model.Gravity;
import dev.coilwise.model.UnitSystem;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Collectors;
import javax.measure.IncommensurableException;
import javax.measure.UnconvertibleException;
import javax.measure.Unit;
import javax.measure.quantity.Length;
import javax.measure.quantity.Mass;
import tech.units.indriya.format.SimpleUnitFormat;
import tech.units.indriya.unit.Units;

/**
 * Parses quantities written with their unit ("45 mm", "12 kN", "140 lbf/in") to SI doubles, checking the dimension.
 *
 * <p>Units are parsed by Indriya (JSR 385) with its SI symbols and prefixes (mm, kN, MPa, GPa, g, kg, %, rad, m/s,
 * N/mm ...) plus the customary units of the trade registered here. The inch-pound definitions are exact:
 * 1 in = 0.0254 m and 1 lb = 0.45359237 kg (international yard and pound agreement, 1959; NIST SP 811, 2008 ed.,
 * App. B), gn = 9.80665 m/s² (CGPM 1901), so 1 lbf = 0.45359237 kg × gn = 4.4482216152605 N exactly and
 * 1 psi = 1 lbf/in²; the tonne, t = 1000 kg (SI Brochure, 9th ed., Table 8).
 *
 * <p>Of all the units Indriya understands, only those listed by {@link QuantityKind#units()} are accepted, written
 * exactly so; the requirement schema's quantity patterns are built from the same lists.
 */
public final class Quantities {
    /** 1 in, m (exact). */
    static final double INCH = 0.0254;
    /** 1 ft, m (exact). */
    static final double FOOT = 0.3048;
    /** 1 lb (avoirdupois pound), kg (exact). */
    static final double POUND = 0.45359237;
    /** 1 lbf, N: pound times standard gravity (exact). */
    static final double POUND_FORCE = POUND * Gravity.STANDARD;
    /** 1 psi, Pa: lbf per square inch. */
    static final double PSI = POUND_FORCE / (INCH * INCH);

    /** Unit symbols that mark a quantity as written in US customary units. */
    private static final Set<String> CUSTOMARY = Set.of("in", "ft", "lb", "lbf", "psi", "kpsi");
    private static final Pattern NOT_FINITE = Pattern.compile("[+-]?(?:nan|\\.nan|inf|\\.inf|infinity)\\b.*",
            Pattern.CASE_INSENSITIVE | Pattern.DOTALL);
    private static final SimpleUnitFormat FORMAT = unitFormat();
    /** Longest unit text handed to the unit parser; every accepted unit is far shorter. */
    private static final int MAX_UNIT_CHARS = 16;

    private Quantities() {
    }

    /**
     * A parsed quantity.
     *
     * @param value  SI value
     * @param kind   the kind it was read as
     * @param system the unit system its unit belongs to; null for neither (deg, %, gn)
     */
    record Measured(double value, QuantityKind kind, UnitSystem system) {
    }

    /**
     * Parses {@code text} as a quantity of {@code kind} and returns it in SI.
     *
     * @param key the key or name to put in front of the message on bad input
     * @throws BadInputException naming the key, the text and what would do
     */
    public static double parse(String text, QuantityKind kind, String key) {
        try {
            return measure(text, kind).value();
        } catch (BadInputException e) {
            throw new BadInputException(key + ": " + e.getMessage(), e);
        }
    }

    /**
     * Parses a quantity of any of {@code kinds} (tried in order, e.g. a clearance given as a percentage or a length),
     * without a key in the message: the reader adds key and position.
     */
    static Measured measure(String text, QuantityKind... kinds) {
        String what = Arrays.stream(kinds).map(QuantityKind::description).collect(Collectors.joining(" or "));
        String examples = Arrays.stream(kinds).map(QuantityKind::examples).collect(Collectors.joining(" or "));
        String t = text == null ? "" : Grammar.trim(text);
        String shown = Shown.value(t);
        if (t.isEmpty()) {
            throw BadInputException.of(Message.NO_VALUE, what, examples);
        }
        Matcher m = Grammar.NUMBER_THEN_UNIT.matcher(t);
        if (!m.matches()) {
            if (NOT_FINITE.matcher(t).matches()) {
                throw BadInputException.of(Message.NOT_A_FINITE_NUMBER, shown, what + " such as " + examples);
            }
            throw BadInputException.of(Message.NOT_A_NUMBER, shown, what, examples);
        }
        double number = Double.parseDouble(m.group(1));
        String unitText = m.group(2);
        if (unitText.isEmpty()) {
            throw BadInputException.of(Message.NO_UNIT, shown, what, examples);
        }
        if (!Double.isFinite(number)) {
            throw BadInputException.of(Message.NOT_A_FINITE_NUMBER, shown, what + " such as " + examples);
        }
        Unit<?> unit = unit(unitText, shown, kinds);
        for (QuantityKind kind : kinds) {
            if (fits(unit, kind)) {
                if (!kind.units().contains(unitText)) {
                    throw BadInputException.of(Message.UNIT_NOT_LISTED, shown, Shown.value(unitText), kind.noun(),
                            kind.usualUnits());
                }
                double si = toSi(unit, kind, number);
                if (!Double.isFinite(si)) {
                    throw BadInputException.of(Message.NOT_A_FINITE_NUMBER, shown, what + " such as " + examples);
                }
                return new Measured(si, kind, system(unitText, kind));
            }
        }
        throw BadInputException.of(Message.EXPECTED, what, "'" + shown + "'");
    }

    private static Unit<?> unit(String unitText, String whole, QuantityKind... kinds) {
        try {
            if (unitText.length() > MAX_UNIT_CHARS) {
                throw new IllegalArgumentException("longer than any unit coilwise reads");
            }
            return FORMAT.parse(unitText);
        } catch (RuntimeException e) { // MeasurementParseException, or IllegalArgumentException on odd input
            String nouns = Arrays.stream(kinds).map(QuantityKind::noun).collect(Collectors.joining(" or "));
            String usual = Arrays.stream(kinds).map(QuantityKind::usualUnits).collect(Collectors.joining(", "));
            List<String> candidates = Arrays.stream(kinds).flatMap(k -> k.units().stream()).toList();
            throw BadInputException.of(Message.UNKNOWN_UNIT, whole, Shown.value(unitText),
                    UnitWords.hint(unitText, candidates), nouns, usual);
        }
    }

    /** Same dimension; angles and fractions are both dimensionless, so they are told apart by their system unit. */
    private static boolean fits(Unit<?> unit, QuantityKind kind) {
        if (kind == QuantityKind.ANGLE || kind == QuantityKind.FRACTION) {
            return unit.getSystemUnit().equals(kind.siUnit().getSystemUnit());
        }
        return unit.isCompatible(kind.siUnit());
    }

    private static double toSi(Unit<?> unit, QuantityKind kind, double number) {
        try {
            return unit.getConverterToAny(kind.siUnit()).convert(number);
        } catch (IncommensurableException | UnconvertibleException e) {
            throw new InternalFaultException("unit " + unit + " passed the dimension check for " + kind + " but does not convert", e);
        }
    }

    private static UnitSystem system(String unitText, QuantityKind kind) {
        if (!kind.dimensional()) {
            return null;
        }
        for (String symbol : unitText.toLowerCase(Locale.ROOT).split("[^a-z]+")) {
            if (CUSTOMARY.contains(symbol)) {
                return UnitSystem.US;
            }
        }
        return unitText.equals("gn") ? null : UnitSystem.SI;
    }

    /** Indriya's SI symbols and prefixes, plus the customary units of the trade. A private instance: the shared one is left alone. */
    private static SimpleUnitFormat unitFormat() {
        SimpleUnitFormat f = SimpleUnitFormat.getNewInstance();
        Unit<Length> inch = Units.METRE.multiply(INCH);
        f.label(inch, "in");
        f.label(Units.METRE.multiply(FOOT), "ft");
        Unit<Mass> pound = Units.KILOGRAM.multiply(POUND);
        f.label(pound, "lb");
        f.label(Units.KILOGRAM.multiply(1000), "t");
        f.label(Units.NEWTON.multiply(POUND_FORCE), "lbf");
        f.label(Units.PASCAL.multiply(PSI), "psi");
        f.label(Units.PASCAL.multiply(PSI * 1000), "kpsi");
        f.label(Units.METRE_PER_SQUARE_SECOND.multiply(Gravity.STANDARD), "gn");
        Unit<?> degree = Units.RADIAN.multiply(Math.PI / 180);
        f.label(degree, "deg");
        f.alias(degree, "°");
        return f;
    }
}
