package dev.coilwise.cli;

import java.io.PrintStream;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import picocli.CommandLine;

/** Entry point: one System.exit, and a {@link #run} that tests call directly. */
public final class Main {
    private Main() {
    }

    public static void main(String[] args) {
        java.util.OptionalInt child = Relaunch.attempt(args);
        if (child.isPresent()) {
            System.exit(child.getAsInt());
        }
        Warmup.start(args);
        System.exit(run(System.out, System.err, args));
    }

    /** Runs coilwise with the given streams; returns the exit code. */
    public static int run(PrintStream out, PrintStream err, String... args) {
        PrintWriter o = new PrintWriter(new java.io.OutputStreamWriter(out, StandardCharsets.UTF_8), true);
        PrintWriter e = new PrintWriter(new java.io.OutputStreamWriter(err, StandardCharsets.UTF_8), true);
        try {
            CommandLine cl = CoilwiseCommand.commandLine();
            cl.setOut(o);
            cl.setErr(e);
            return cl.execute(args);
        } catch (Exception | StackOverflowError | OutOfMemoryError | AssertionError | LinkageError t) {
            boolean debug = java.util.Arrays.asList(args).contains("--debug");
            e.println(ExitCode.faultLine(t, debug));
            if (debug) {
                t.printStackTrace(e);
            }
            return ExitCode.INTERNAL;
        } finally {
            o.flush();
            e.flush();
        }
    }
}
