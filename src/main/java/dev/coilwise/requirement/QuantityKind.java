package dev.coilwise.requirement;

import java.util.List;
import javax.measure.Unit;
import tech.units.indriya.AbstractUnit;
import tech.units.indriya.unit.Units;

/**
 * The kinds of quantity a requirement or spring file holds, each with its SI unit, the unit symbols coilwise reads
 * and the words used in messages.
 */
public enum QuantityKind {
    /** Length, m. */
    LENGTH("a length", "length", "'45 mm' or '1.8 in'", Units.METRE, List.of("mm", "cm", "m", "km", "in", "ft"), true),
    /** Force, N. */
    FORCE("a force", "force", "'12 kN' or '250 lbf'", Units.NEWTON, List.of("N", "daN", "kN", "MN", "lbf"), true),
    /** Mass, kg. */
    MASS("a mass", "mass", "'18 kg' or '40 lb'", Units.KILOGRAM, List.of("g", "kg", "t", "lb"), true),
    /** Speed, m/s. */
    SPEED("a speed", "speed", "'2.2 m/s' or '7 ft/s'", Units.METRE_PER_SECOND, List.of("m/s", "mm/s", "km/h", "in/s", "ft/s"), true),
    /** Acceleration, m/s². */
    ACCELERATION("an acceleration", "acceleration", "'60 gn' or '600 m/s^2'", Units.METRE_PER_SQUARE_SECOND,
            List.of("gn", "m/s^2", "m/s²", "ft/s^2", "ft/s²"), true),
    /** Plane angle, rad. */
    ANGLE("an angle", "angle", "'30 deg'", Units.RADIAN, List.of("deg", "°", "rad"), false),
    /** Fraction, written in percent; result is a plain ratio (5 % gives 0.05). */
    FRACTION("a percentage", "fraction", "'5 %'", AbstractUnit.ONE, List.of("%"), false),
    /** Spring rate, N/m. */
    RATE("a spring rate", "rate", "'25 N/mm' or '140 lbf/in'", Units.NEWTON.divide(Units.METRE), List.of("N/mm", "N/m", "kN/m", "lbf/in"), true),
    /** Stress or pressure, Pa. */
    STRESS("a stress", "stress", "'800 MPa' or '120 kpsi'", Units.PASCAL, List.of("MPa", "GPa", "kPa", "Pa", "N/mm^2", "N/mm²", "psi", "kpsi"), true);

    private final String description;
    private final String noun;
    private final String examples;
    private final Unit<?> siUnit;
    private final List<String> units;
    private final boolean dimensional;

    QuantityKind(String description, String noun, String examples, Unit<?> siUnit, List<String> units, boolean dimensional) {
        this.description = description;
        this.noun = noun;
        this.examples = examples;
        this.siUnit = siUnit;
        this.units = units;
        this.dimensional = dimensional;
    }

    /** "a length", for "expected a length, got ..." */
    public String description() {
        return description;
    }

    /** "length", for "length units: ..." */
    public String noun() {
        return noun;
    }

    /** Example values for messages, e.g. {@code '45 mm' or '1.8 in'}. */
    public String examples() {
        return examples;
    }

    /** The SI unit results are given in. */
    public Unit<?> siUnit() {
        return siUnit;
    }

    /** The units of this kind, for messages and the documentation: "mm, cm, m, km, in, ft". */
    public String usualUnits() {
        return String.join(", ", units);
    }

    /**
     * Every unit symbol coilwise reads for this kind, exactly as it must be written. Indriya parses many more (any SI
     * prefix, any product of units); the reader accepts only these, so that the requirement schema's patterns
     * ({@code docs/requirement.schema.json}) and the reader accept the same text.
     */
    public List<String> units() {
        return units;
    }

    /** Whether the kind counts towards deciding the file's unit system (angles and percentages do not). */
    public boolean dimensional() {
        return dimensional;
    }
}
