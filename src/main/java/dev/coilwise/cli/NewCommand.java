package dev.coilwise.cli;

import dev.coilwise.report.Caution;
import dev.coilwise.requirement.RequirementTemplates;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;

@Command(name = "new", header = "Print a commented requirement template to start from.",
        description = "Redirect it to a file, edit the values, then run: coilwise size FILE")
final class NewCommand extends BaseCommand {
    /** Width of the caution's comment lines, like the template's own comments. */
    static final int COMMENT_WIDTH = 118;

    enum Kind { arrest, launch }

    @Parameters(paramLabel = "JOB", description = "arrest (a buffer or end stop) or launch (a thrower or ejector).")
    Kind kind;

    @Override
    int execute() {
        out().print(withCaution(kind == Kind.arrest ? RequirementTemplates.arrest() : RequirementTemplates.launch()));
        return ExitCode.OK;
    }

    /** The template with the caution as comment lines after its first line (what the file is for). */
    static String withCaution(String template) {
        int firstLineEnd = template.indexOf('\n') + 1;
        String caution = String.join("\n", Caution.lines("# ", COMMENT_WIDTH)) + "\n";
        return template.substring(0, firstLineEnd) + caution + template.substring(firstLineEnd);
    }
}
