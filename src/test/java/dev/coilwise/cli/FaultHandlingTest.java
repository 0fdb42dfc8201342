package dev.coilwise.cli;

import static org.assertj.core.api.Assertions.assertThat;

import dev.coilwise.error.BadInputException;
import java.io.PrintWriter;
import java.io.StringWriter;
import org.junit.jupiter.api.Test;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/** Exit codes and messages of faults: one line without --debug, the stack trace only with it. */
class FaultHandlingTest {

    @Command(name = "faulty")
    static final class Faulty extends BaseCommand {
        Throwable fault;

        @Override
        int execute() {
            if (fault instanceof RuntimeException r) {
                throw r;
            }
            throw (Error) fault;
        }
    }

    record Run(int code, String err) {
    }

    static Run run(Throwable fault, String... args) {
        Faulty cmd = new Faulty();
        cmd.fault = fault;
        CommandLine cl = new CommandLine(cmd);
        StringWriter err = new StringWriter();
        cl.setErr(new PrintWriter(err, true));
        cl.setOut(new PrintWriter(new StringWriter(), true));
        return new Run(cl.execute(args), err.toString());
    }

    @Test
    void anInternalFaultPrintsOneLineAndExitsOne() {
        Run r = run(new IllegalStateException("broken\ninvariant"));
        assertThat(r.code()).isEqualTo(1);
        assertThat(r.err().lines()).containsExactly("internal fault: IllegalStateException: broken invariant (a bug in"
                + " coilwise; run again with --debug for the details)");
    }

    @Test
    void withDebugTheStackTraceFollows() {
        Run r = run(new IllegalStateException("broken"), "--debug");
        assertThat(r.code()).isEqualTo(1);
        assertThat(r.err()).startsWith("internal fault: IllegalStateException: broken\n").contains("\tat ");
    }

    @Test
    void runningOutOfStackIsAnInternalFaultOnOneLine() {
        Run r = run(new StackOverflowError());
        assertThat(r.code()).isEqualTo(1);
        assertThat(r.err().lines()).hasSize(1).first().asString().startsWith("internal fault: ran out of stack space");
    }

    @Test
    void badInputExitsTwoWithoutAStackTrace() {
        Run r = run(new BadInputException("limits.stroke: must be greater than zero"));
        assertThat(r.code()).isEqualTo(2);
        assertThat(r.err()).isEqualTo("error: limits.stroke: must be greater than zero\n").doesNotContain("\tat ");
    }

    @Test
    void theHelpListsEveryExitCode() {
        String help = CliRunner.run("size", "--help").out();
        assertThat(help).contains("0   Success.", "1   Internal fault", "2   Bad input", "3   Valid input, but no design");
    }
}
