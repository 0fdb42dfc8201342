package dev.coilwise.cli;

import dev.coilwise.report.Caution;
import java.io.IOException;
import java.io.InputStream;
import java.util.Properties;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.IVersionProvider;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/** The top command: lists the subcommands; run bare, prints its usage. */
@Command(name = "coilwise", mixinStandardHelpOptions = true, versionProvider = CoilwiseCommand.Version.class,
        header = "Sizes helical compression springs that arrest a moving load or launch a payload.",
        description = Caution.TEXT,
        subcommands = {SizeCommand.class, CheckCommand.class, SimulateCommand.class, ReportCommand.class,
            SweepCommand.class, MaterialsCommand.class, NewCommand.class, SchemaCommand.class,
            CommandLine.HelpCommand.class},
        exitCodeListHeading = "%nExit codes:%n", exitCodeList = {
            "0:Success.",
            "1:Internal fault (a bug); run with --debug for the stack trace.",
            "2:Bad input: a file or option is wrong; nothing was written.",
            "3:Valid input, but no design meets every limit."})
final class CoilwiseCommand implements Runnable {
    @Spec
    CommandSpec spec;

    static CommandLine commandLine() {
        CommandLine cl = new CommandLine(new CoilwiseCommand());
        cl.setCaseInsensitiveEnumValuesAllowed(true);
        cl.setExecutionExceptionHandler((ex, line, parsed) -> { // faults outside a command's own handling
            boolean debug = parsed.originalArgs().contains("--debug");
            line.getErr().println(ex instanceof dev.coilwise.error.BadInputException ? "error: " + ex.getMessage()
                    : ExitCode.faultLine(ex, debug));
            if (debug) {
                ex.printStackTrace(line.getErr());
            }
            return ExitCode.of(ex);
        });
        return cl;
    }

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    static final class Version implements IVersionProvider {
        @Override
        public String[] getVersion() throws IOException {
            Properties p = new Properties();
            try (InputStream in = CoilwiseCommand.class.getResourceAsStream("/dev/coilwise/version.properties")) {
                if (in != null) {
                    p.load(in);
                }
            }
            return new String[] {"coilwise " + p.getProperty("version", "development build")};
        }
    }
}
