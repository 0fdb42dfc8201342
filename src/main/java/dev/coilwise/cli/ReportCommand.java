package dev.coilwise.cli;

import dev.coilwise.error.BadInputException;
import dev.coilwise.error.Message;
import dev.coilwise.report.html.HtmlReportWriter;
import dev.coilwise.report.html.ReportData;
import java.io.IOException;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

@Command(name = "report", header = "Render report.html again from a saved shortlist.json, without searching again.",
        description = "Reads FILE (the shortlist.json that 'size --out' writes) and writes report.html to DIR, by"
            + " default the folder FILE is in. Exit code 3 when the saved shortlist holds no design (the report then"
            + " shows the diagnosis).")
final class ReportCommand extends BaseCommand {
    /** Largest shortlist.json read, bytes: a full search of every family writes well under 2 MiB. */
    static final long MAX_BYTES = 16L << 20;

    @Parameters(paramLabel = "FILE", description = "The saved shortlist (shortlist.json).")
    Path file;

    @Option(names = "--out", paramLabel = "DIR", description = "Folder to write report.html into (default: FILE's folder).")
    Path out;

    @Override
    int execute() throws IOException {
        ReportData data = ReportData.parse(read(file));
        Path dir = out != null ? out : file.toAbsolutePath().getParent();
        OutputFolder folder = new OutputFolder(dir, List.of(file));
        folder.add("report.html", HtmlReportWriter.write(data));
        folder.commit();
        out().println("Wrote report.html to " + dir);
        return data.feasible() ? ExitCode.OK : ExitCode.NOTHING_FEASIBLE;
    }

    private static String read(Path file) {
        try {
            if (!Files.isRegularFile(file)) {
                throw BadInputException.of(Message.FILE_UNREADABLE, file + " is not a file");
            }
            long size = Files.size(file);
            if (size > MAX_BYTES) {
                throw BadInputException.of(Message.FILE_UNREADABLE, file + " has " + size
                        + " bytes; a saved shortlist is read up to " + MAX_BYTES + " bytes");
            }
            return StandardCharsets.UTF_8.newDecoder().decode(java.nio.ByteBuffer.wrap(Files.readAllBytes(file)))
                    .toString();
        } catch (CharacterCodingException e) {
            throw BadInputException.of(Message.FILE_UNREADABLE, file + " is not UTF-8 text");
        } catch (IOException e) {
            throw BadInputException.of(Message.FILE_UNREADABLE, file + ": " + e.getMessage());
        }
    }
}
