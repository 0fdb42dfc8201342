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
        System.exit(run(System.out, System.err, args));
    }

    /** Runs coilwise with the given streams; returns the exit code. */
    public static int run(PrintStream out, PrintStream err, String... args) {
        PrintWriter o = new PrintWriter(new java.io.OutputStreamWriter(out, StandardCharsets.UTF_8), true);
        PrintWriter e = new PrintWriter(new java.io.OutputStreamWriter(err, StandardCharsets.UTF_8), true);
        CommandLine cl = CoilwiseCommand.commandLine();
        cl.setOut(o);
        cl.setErr(e);
        int code = cl.execute(args);
        o.flush();
        e.flush();
        return code;
    }
}
