package dev.coilwise.cli;

import dev.coilwise.materials.MaterialTable;
import dev.coilwise.requirement.RequirementSchema;
import java.util.Set;

/**
 * Start-up work done ahead on a second thread. A command that reads a requirement file spends much of a short run
 * setting up libraries: compiling the requirement schema (the JSON-Schema validator and Jackson's object mapper) and
 * reading the bundled material table. Both are read-only and made once per run behind class holders, so this thread
 * can make them while the main thread parses the command line and reads the file; the main thread waits for whatever
 * is not ready when it needs it, and nothing is made twice. Results do not depend on which thread got there first.
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
        Thread t = new Thread(Warmup::run, "coilwise-warmup");
        t.setDaemon(true);
        t.start();
    }

    private static void run() {
        try {
            RequirementSchema.prepare();
            MaterialTable.loadDefault();
        } catch (RuntimeException | LinkageError e) {
            // The main thread reports it when it needs the part.
        }
    }
}
