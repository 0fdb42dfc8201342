package dev.coilwise.cli;

import dev.coilwise.error.BadInputException;
import java.io.PrintWriter;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * Shared behaviour of the subcommands: --debug, and turning exceptions into messages and exit codes. Bad input prints
 * "error: " and the message (every problem of a file, one per line) and exits 2; anything else is an internal fault:
 * one line naming it, exit 1, the stack trace only with --debug.
 */
@Command(mixinStandardHelpOptions = true, exitCodeListHeading = "%nExit codes:%n", exitCodeList = {
    "0:Success.",
    "1:Internal fault (a bug); run with --debug for the stack trace.",
    "2:Bad input: a file or option is wrong; nothing was written.",
    "3:Valid input, but no design meets every limit."})
abstract class BaseCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Option(names = "--debug", description = "Print stack traces of internal faults.")
    boolean debug;

    PrintWriter out() {
        return spec.commandLine().getOut();
    }

    PrintWriter err() {
        return spec.commandLine().getErr();
    }

    @Override
    public final Integer call() {
        try {
            return execute();
        } catch (BadInputException e) {
            err().println("error: " + e.getMessage());
            if (debug) {
                e.printStackTrace(err());
            }
            return ExitCode.BAD_INPUT;
        } catch (Exception | StackOverflowError | OutOfMemoryError | AssertionError | LinkageError e) {
            err().println(ExitCode.faultLine(e, debug));
            if (debug) {
                e.printStackTrace(err());
            }
            return ExitCode.INTERNAL;
        } finally {
            err().flush();
            out().flush();
        }
    }

    abstract int execute() throws java.io.IOException;
}
