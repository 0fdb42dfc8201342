package dev.coilwise.cli;

import dev.coilwise.requirement.RequirementTemplates;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;

@Command(name = "new", header = "Print a commented requirement template to start from.",
        description = "Redirect it to a file, edit the values, then run: coilwise size FILE")
final class NewCommand extends BaseCommand {
    enum Kind { arrest, launch }

    @Parameters(paramLabel = "JOB", description = "arrest (a buffer or end stop) or launch (a thrower or ejector).")
    Kind kind;

    @Override
    int execute() {
        out().print(kind == Kind.arrest ? RequirementTemplates.arrest() : RequirementTemplates.launch());
        return ExitCode.OK;
    }
}
