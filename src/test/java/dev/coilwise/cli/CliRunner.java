package dev.coilwise.cli;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;

/** Runs the command line in-process and captures what it prints. */
record CliRunner(int code, String out, String err) {
    static CliRunner run(String... args) {
        ByteArrayOutputStream o = new ByteArrayOutputStream();
        ByteArrayOutputStream e = new ByteArrayOutputStream();
        int code = Main.run(new PrintStream(o, true, StandardCharsets.UTF_8), new PrintStream(e, true, StandardCharsets.UTF_8), args);
        return new CliRunner(code, o.toString(StandardCharsets.UTF_8), e.toString(StandardCharsets.UTF_8));
    }
}
