package dev.coilwise.cli;

import dev.coilwise.requirement.RequirementSchema;
import picocli.CommandLine.Command;

@Command(name = "schema", header = "Print the JSON Schema of requirement files, for editors that check YAML as it is typed.",
        description = {"Save it beside your requirement files and point the editor at it, e.g. with this first line in"
            + " a requirement file (read by editors that use the YAML language server):",
            "  # yaml-language-server: $schema=requirement.schema.json",
            "coilwise checks every requirement file against the same schema before its own checks."})
final class SchemaCommand extends BaseCommand {
    @Override
    int execute() {
        out().print(RequirementSchema.text());
        return ExitCode.OK;
    }
}
