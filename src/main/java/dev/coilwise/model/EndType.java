package dev.coilwise.model;

import dev.coilwise.error.BadInputException;
import dev.coilwise.error.Message;
import java.util.Arrays;
import java.util.stream.Collectors;

/**
 * End treatment of a compression spring, with the trade's usual relations between active coils Na, total coils Nt
 * and solid length Ls (Shigley's MED 9th ed., Table 10-1, from memory; the same relations appear in most spring handbooks).
 */
public enum EndType {
    /** Plain ends: Nt = Na, Ls = d(Nt + 1). */
    PLAIN("plain", 0, 1),
    /** Plain and ground: Nt = Na + 1, Ls = d·Nt. */
    PLAIN_GROUND("plain-ground", 1, 0),
    /** Closed (squared), not ground: Nt = Na + 2, Ls = d(Nt + 1). */
    CLOSED("closed", 2, 1),
    /** Closed (squared) and ground: Nt = Na + 2, Ls = d·Nt. */
    CLOSED_GROUND("closed-ground", 2, 0);

    private final String key;
    private final int inactiveCoils;
    private final int extraSolidWires;

    EndType(String key, int inactiveCoils, int extraSolidWires) {
        this.key = key;
        this.inactiveCoils = inactiveCoils;
        this.extraSolidWires = extraSolidWires;
    }

    /** The key used in requirement files and outputs. */
    public String key() {
        return key;
    }

    /** Nt − Na. */
    public int inactiveCoils() {
        return inactiveCoils;
    }

    public double totalCoils(double activeCoils) {
        return activeCoils + inactiveCoils;
    }

    /** Solid length, m, for wire diameter {@code d} (m) and total coils {@code nt}. */
    public double solidLength(double d, double nt) {
        return d * (nt + extraSolidWires);
    }

    /** Whether the ends are ground (a spring maker quotes grinding separately). */
    public boolean ground() {
        return this == PLAIN_GROUND || this == CLOSED_GROUND;
    }

    public static EndType fromKey(String key) {
        for (EndType e : values()) {
            if (e.key.equals(key)) {
                return e;
            }
        }
        throw BadInputException.of(Message.UNKNOWN_KEY, "end type", key,
                Arrays.stream(values()).map(EndType::key).collect(Collectors.joining(", ")));
    }
}
