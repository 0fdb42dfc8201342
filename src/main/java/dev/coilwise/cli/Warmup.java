package dev.coilwise.cli;

import dev.coilwise.materials.MaterialTable;
import dev.coilwise.requirement.Quantities;
import dev.coilwise.requirement.QuantityKind;
import dev.coilwise.requirement.RequirementSchema;
import java.util.Set;

/**
 * Start-up work done ahead on two more threads. A command that reads a requirement file spends much of a short run
 * setting up libraries: compiling the requirement schema (the JSON-Schema validator and Jackson's object mapper),
 * reading the bundled material table and setting up the unit parser (Indriya's unit format). Each is read-only and
 * made once per run behind a class holder, so these threads can make them while the main thread parses the command
 * line and reads the file; the main thread waits for whatever is not ready when it needs it, and nothing is made
 * twice. Results do not depend on which thread got there first.
 *
 * <p>Errors here are left to the main thread, which meets the same error in its own words when it asks for the part.
 */
final class Warmup {
    /** Commands that read a requirement file. */
    private static final Set<String> READERS = Set.of("size", "check", "simulate", "sweep");

    private Warmup() {
    }

    /** Starts the thread when the command reads a requirement file; returns at once. */
    static void start(String... args) {
        if (args.length == 0 || !READERS.contains(args[0])) {
            return;
        }
        // The schema takes longest and is needed last (it is checked after the reader's own checks); the table and
        // the unit parser are needed first.
        daemon("coilwise-warmup-schema", RequirementSchema::prepare);
        daemon("coilwise-warmup-reader", () -> {
            MaterialTable.loadDefault();
            Quantities.parse("1 mm", QuantityKind.LENGTH, "warm-up");
        });
    }

    private static void daemon(String name, Runnable work) {
        Thread t = new Thread(() -> {
            try {
                work.run();
            } catch (RuntimeException | LinkageError e) {
                // The main thread reports it when it needs the part.
            }
        }, name);
        t.setDaemon(true);
        t.start();
    }
}
