package dev.coilwise.report;

import dev.coilwise.dynamics.TimeHistory;
import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.util.List;
import java.util.Locale;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;

/**
 * Writes a simulated time history as CSV: one header row naming each column with its SI unit, one row per sample.
 * Comment lines starting with {@code #} carry the caution and the sign conventions.
 */
public final class TimeHistoryCsvWriter {
    /** Column names, each ending in its SI unit. */
    public static final List<String> HEADER = List.of("time_s", "load_position_m", "load_speed_m_per_s",
            "top_force_N", "peak_element_stress_Pa");
    /** The comment marker of the header comments. */
    public static final char COMMENT = '#';

    private static final CSVFormat FORMAT = CSVFormat.DEFAULT.builder()
            .setHeader(HEADER.toArray(String[]::new))
            .setCommentMarker(COMMENT)
            .setHeaderComments("coilwise simulated time history",
                    Caution.TEXT,
                    "time from first contact (arrest) or release (launch); load position towards the base from the "
                            + "spring's free-length top; load speed positive towards the base; top force between "
                            + "spring and load; peak element stress: largest corrected shear stress of any element")
            .setRecordSeparator("\n")
            .get();

    private TimeHistoryCsvWriter() {
    }

    /** Writes {@code history} to {@code out} (not closed). */
    public static void write(TimeHistory history, Writer out) throws IOException {
        CSVPrinter p = new CSVPrinter(out, FORMAT);
        double[][] cols = {history.time(), history.loadPosition(), history.loadSpeed(), history.topForce(),
                history.peakElementStress()};
        for (int i = 0; i < history.size(); i++) {
            for (double[] col : cols) {
                p.print(String.format(Locale.ROOT, "%.9g", col[i]));
            }
            p.println();
        }
        p.flush();
    }

    /** The CSV text of {@code history}. */
    public static String toCsv(TimeHistory history) {
        StringWriter w = new StringWriter();
        try {
            write(history, w);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return w.toString();
    }
}
