package dev.coilwise.mechanics;

import dev.coilwise.error.Check;

/**
 * One measured fatigue-strength point of spring wire in torsion: the stress amplitude S_sa the wire survives for the
 * stated life at mean stress S_sm. SI.
 *
 * @param amplitude S_sa, Pa
 * @param mean      S_sm, Pa
 * @param key       short name used in {@link FatigueCheck#criterion()}, e.g. {@code zimmerli}
 */
public record FatigueStrength(double amplitude, double mean, String key) {

    /** One kpsi in Pa: 1000 lbf/in² = 6.894757293168 MPa (exact from the inch and the pound-force). */
    public static final double KPSI = 6.894757293168e6;

    /**
     * Zimmerli's infinite-life data for unpeened spring steels under 10 mm wire: S_sa = 35 kpsi, S_sm = 55 kpsi
     * (printed in SI as 241 and 379 MPa). Budynas &amp; Nisbett, Shigley's Mechanical Engineering Design, 9th ed.,
     * Sec. 10-9 (from memory). Kept as the exact conversion of the kpsi figures, the data's own units.
     */
    public static final FatigueStrength ZIMMERLI_UNPEENED = new FatigueStrength(35 * KPSI, 55 * KPSI, "zimmerli");

    /**
     * Zimmerli's infinite-life data for shot-peened spring steels: S_sa = 57.5 kpsi, S_sm = 77.5 kpsi (printed as 398
     * and 534 MPa; 57.5 kpsi is in fact 396.4 MPa); same source and conversion.
     */
    public static final FatigueStrength ZIMMERLI_PEENED = new FatigueStrength(57.5 * KPSI, 77.5 * KPSI, "zimmerli");

    /**
     * Largest wire diameter for which Zimmerli found size, material and tensile strength to have no effect on the
     * infinite-life strength of spring steels: 3/8 in, taken as 10 mm (Shigley's MED 9th ed., Sec. 10-9, from memory).
     */
    public static final double ZIMMERLI_MAX_WIRE = 10e-3;

    public FatigueStrength {
        Check.positive("fatigue strength amplitude", amplitude, "Pa");
        Check.nonNegative("fatigue strength mean", mean, "Pa");
        Check.notNull("fatigue strength key", key);
    }

    /** Zimmerli's point for peened or unpeened wire. */
    public static FatigueStrength zimmerli(boolean peened) {
        return peened ? ZIMMERLI_PEENED : ZIMMERLI_UNPEENED;
    }

    /**
     * The point for a zero-to-maximum cycle (stress ratio R = 0) whose largest allowable stress is {@code maxStress}:
     * S_sa = S_sm = maxStress/2, as Shigley's MED 9th ed., Sec. 10-12 converts R = 0 table data (from memory).
     */
    public static FatigueStrength repeated(double maxStress, String key) {
        return new FatigueStrength(maxStress / 2, maxStress / 2, key);
    }
}
