package dev.coilwise.catalog;

import dev.coilwise.error.Message;
import dev.coilwise.model.EndType;
import dev.coilwise.requirement.Suggest;
import java.util.Arrays;
import java.util.Collection;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.TreeSet;

/**
 * Messages for a word in a catalogue or mapping file that is not one of a fixed set (a material or end-type key, a
 * field, a unit, a mapping key, a column name): the value found, the nearest allowed word when it is a likely slip
 * (the same hint as in requirement files, {@link Suggest}), and every allowed word.
 */
final class Choices {
    private Choices() {
    }

    /** "unknown {what} '{value}' (did you mean '…'?); allowed: a, b, c". */
    static String unknown(String what, String value, Collection<String> allowed) {
        return unknown(what, value, allowed, String.join(", ", allowed));
    }

    /** As {@link #unknown(String, String, Collection)}, with the allowed words described in {@code allowedText}. */
    static String unknown(String what, String value, Collection<String> allowed, String allowedText) {
        return Message.UNKNOWN_CHOICE.format(what, value, Suggest.hint(value, allowed), allowedText);
    }

    /**
     * "unknown {what} '{value}' (did you mean '…'?); allowed: a, b, c" for a unit: a unit named in full ("inches")
     * is pointed to its symbol ("in"), anything else gets the nearest symbol by spelling.
     */
    static String unknownUnit(String what, String value, CatalogUnit.Kind kind, List<String> allowed) {
        String hint = CatalogUnit.byName(value, kind).map(u -> " (did you mean '" + u.symbol() + "'?)")
                .orElse(Suggest.hint(value, allowed));
        return Message.UNKNOWN_CHOICE.format(what, value, hint, String.join(", ", allowed));
    }

    /** The end-type keys, in the model's order. */
    static List<String> endKeys() {
        return Arrays.stream(EndType.values()).map(EndType::key).toList();
    }

    /**
     * The words a key cell may hold: the file's own names from the mapping (sorted), then our keys. Message text
     * and candidates for the hint.
     */
    static String namesOrKeys(String section, Collection<String> names, Collection<String> keys) {
        return names.isEmpty() ? String.join(", ", keys) : "a name of the mapping's " + section + " ("
                + String.join(", ", new TreeSet<>(names)) + ") or a key: " + String.join(", ", keys);
    }

    /** "unknown material '{value}' (did you mean '…'?); known materials: a, b, c", as in requirement files. */
    static String unknownMaterial(String value, Collection<String> keys) {
        return Message.MATERIAL_NOT_IN_TABLE.format(value, Suggest.hint(value, keys), String.join(", ", keys));
    }

    /** The words of both lists, in order, each once. */
    static List<String> both(Collection<String> first, Collection<String> second) {
        LinkedHashSet<String> all = new LinkedHashSet<>(first);
        all.addAll(second);
        return List.copyOf(all);
    }
}
