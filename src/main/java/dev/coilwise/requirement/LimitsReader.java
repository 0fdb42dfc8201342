package dev.coilwise.requirement;

import dev.coilwise.error.Message;
import dev.coilwise.model.Clearance;
import dev.coilwise.model.Envelope;
import dev.coilwise.model.Limits;
import dev.coilwise.requirement.Section.Sign;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

/** Reads {@code limits} and {@code envelope}, and checks them against each other and against the job. */
final class LimitsReader {
    static final List<String> LIMIT_KEYS = List.of("stroke", "peak_force", "deceleration");
    static final List<String> ENVELOPE_KEYS = List.of("bore", "rod", "clearance", "max_free_length", "pocket_length");
    /** Largest diametral clearance accepted as a fraction of the guide diameter (the model's bound). */
    static final double MAX_CLEARANCE_FRACTION = 0.5;

    private LimitsReader() {
    }

    static Optional<Limits> limits(Section top, Optional<String> job) {
        if (!top.has("limits")) {
            top.missing("limits", "limits.stroke, the most compression allowed, e.g. '45 mm'");
            return Optional.empty();
        }
        Optional<Section> section = top.section("limits", LIMIT_KEYS);
        if (section.isEmpty()) {
            return Optional.empty();
        }
        Section s = section.get();
        OptionalDouble stroke = s.quantity("stroke", QuantityKind.LENGTH, Sign.POSITIVE);
        if (!s.has("stroke")) {
            s.missing("stroke", "the most compression allowed, a length such as '45 mm'");
        }
        OptionalDouble peak = optional(s, "peak_force", QuantityKind.FORCE);
        OptionalDouble decel = optional(s, "deceleration", QuantityKind.ACCELERATION);
        if (job.isPresent() && job.get().equals(JobReader.LAUNCH) && s.has("deceleration")) {
            s.problems().add(s.keyAt("deceleration"), s.key("deceleration"),
                    Message.NOT_FOR_JOB.format(JobReader.ARREST, JobReader.LAUNCH, ""));
            return Optional.empty();
        }
        if (stroke.isEmpty() || s.has("peak_force") && peak.isEmpty() || s.has("deceleration") && decel.isEmpty()) {
            return Optional.empty();
        }
        return s.build("", () -> new Limits(stroke.getAsDouble(), peak, decel));
    }

    static Optional<Envelope> envelope(Section top, Optional<String> job) {
        if (!top.has("envelope")) {
            return Optional.of(Envelope.open());
        }
        Optional<Section> section = top.section("envelope", ENVELOPE_KEYS);
        if (section.isEmpty()) {
            return Optional.empty();
        }
        Section s = section.get();
        OptionalDouble bore = optional(s, "bore", QuantityKind.LENGTH);
        OptionalDouble rod = optional(s, "rod", QuantityKind.LENGTH);
        Optional<Clearance> clearance = clearance(s);
        OptionalDouble free = optional(s, "max_free_length", QuantityKind.LENGTH);
        OptionalDouble pocket = optional(s, "pocket_length", QuantityKind.LENGTH);
        boolean ok = clearance.isPresent() && (!s.has("bore") || bore.isPresent()) && (!s.has("rod") || rod.isPresent())
                && (!s.has("max_free_length") || free.isPresent()) && (!s.has("pocket_length") || pocket.isPresent());
        if (job.isPresent() && job.get().equals(JobReader.LAUNCH) && s.has("pocket_length")) {
            s.problems().add(s.keyAt("pocket_length"), s.key("pocket_length"), Message.NOT_FOR_JOB.format(JobReader.ARREST,
                    JobReader.LAUNCH, "; a launcher is cocked from its free length"));
            ok = false;
        }
        if (bore.isPresent() && rod.isPresent() && clearance.isPresent()) {
            ok &= room(s, bore.getAsDouble(), rod.getAsDouble(), clearance.get());
        } else if (bore.isPresent() && clearance.isPresent() && bore.getAsDouble() - clearance.get().of(bore.getAsDouble()) <= 0) {
            s.problem("clearance", Message.NO_ROOM_IN_BORE.format(s.raw("clearance"), s.raw("bore")));
            ok = false;
        }
        if (free.isPresent() && pocket.isPresent() && pocket.getAsDouble() > free.getAsDouble()) {
            s.problem("pocket_length", Message.MUST_NOT_EXCEED.format(s.raw("pocket_length"), "envelope.max_free_length",
                    s.raw("max_free_length"), "the free length must be at least the pocket length"));
            ok = false;
        }
        if (!ok) {
            return Optional.empty();
        }
        return s.build("", () -> new Envelope(bore, rod, clearance.get(), free, pocket));
    }

    /** Rod below bore, and room for a wire once both clearances are taken off. */
    private static boolean room(Section s, double bore, double rod, Clearance c) {
        if (rod >= bore) {
            s.problem("rod", Message.ROD_NOT_BELOW_BORE.format(s.raw("rod"), s.raw("bore")));
            return false;
        }
        if (bore - c.of(bore) <= rod + c.of(rod)) {
            String shown = s.has("clearance") ? s.raw("clearance") : "5 % by default";
            s.problem(s.has("clearance") ? "clearance" : "rod", Message.NO_ROOM_FOR_WIRE.format(shown, s.raw("rod"), s.raw("bore")));
            return false;
        }
        return true;
    }

    /** A percentage of the guide diameter, or a length. */
    private static Optional<Clearance> clearance(Section s) {
        if (!s.has("clearance")) {
            return Optional.of(Clearance.DEFAULT);
        }
        Optional<Quantities.Measured> m = s.measured("clearance", Sign.NON_NEGATIVE, QuantityKind.FRACTION, QuantityKind.LENGTH);
        if (m.isEmpty()) {
            return Optional.empty();
        }
        if (m.get().kind() == QuantityKind.LENGTH) {
            return Optional.of(Clearance.ofLength(m.get().value()));
        }
        if (m.get().value() > MAX_CLEARANCE_FRACTION) {
            s.problem("clearance", Message.NOT_IN_RANGE.format("0 %", "50 %", s.raw("clearance")));
            return Optional.empty();
        }
        return Optional.of(Clearance.ofFraction(m.get().value()));
    }

    private static OptionalDouble optional(Section s, String name, QuantityKind kind) {
        return s.has(name) ? s.quantity(name, kind, Sign.POSITIVE) : OptionalDouble.empty();
    }

    /** Stroke against the free-length limit and, for an arrest, against the pocket. */
    static void crossCheck(Section top, Limits limits, Envelope envelope) {
        if (envelope.maxFreeLength().isEmpty() && envelope.pocketLength().isEmpty()) {
            return;
        }
        Section lim = top.section("limits", LIMIT_KEYS).orElseThrow();
        Section env = top.section("envelope", ENVELOPE_KEYS).orElseThrow();
        envelope.maxFreeLength().ifPresent(free -> {
            if (limits.stroke() >= free) {
                lim.problem("stroke", Message.TOO_LONG_FOR.format(lim.raw("stroke"), "envelope.max_free_length",
                        env.raw("max_free_length"), "a spring cannot compress by its whole free length"));
            }
        });
        envelope.pocketLength().ifPresent(pocket -> {
            if (limits.stroke() >= pocket) {
                lim.problem("stroke", Message.TOO_LONG_FOR.format(lim.raw("stroke"), "envelope.pocket_length",
                        env.raw("pocket_length"), "the spring is installed at the pocket length and cannot compress by all of it"));
            }
        });
    }
}
