package dev.coilwise.report;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import dev.coilwise.dynamics.TimeHistory;
import java.io.IOException;
import java.io.StringReader;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;

class TimeHistoryCsvWriterTest {
    private static CSVParser parse(String csv) throws IOException {
        return CSVParser.parse(new StringReader(csv), CSVFormat.DEFAULT.builder().setCommentMarker('#')
                .setHeader().setSkipHeaderRecord(true).get());
    }

    @Test
    void headerNamesEveryColumnWithItsSiUnitAndThereIsOneRowPerSample() throws IOException {
        TimeHistory h = HistorySamples.halfCycle(57);
        try (CSVParser p = parse(TimeHistoryCsvWriter.toCsv(h))) {
            assertThat(p.getHeaderNames()).containsExactly("time_s", "load_position_m", "load_speed_m_per_s",
                    "top_force_N", "peak_element_stress_Pa");
            List<CSVRecord> rows = p.getRecords();
            assertThat(rows).hasSize(57);
            assertThat(Double.parseDouble(rows.get(28).get("load_position_m")))
                    .isCloseTo(h.loadPosition()[28], within(1e-9 * Math.abs(h.loadPosition()[28])));
            assertThat(Double.parseDouble(rows.get(56).get("time_s")))
                    .isCloseTo(h.time()[56], within(1e-9 * h.time()[56]));
        }
    }

    @Test
    void carriesTheCautionAsAComment() {
        String csv = TimeHistoryCsvWriter.toCsv(HistorySamples.halfCycle(3));
        assertThat(csv.lines().filter(l -> l.startsWith("#"))).anyMatch(l -> l.equals("# " + Caution.TEXT));
    }

    @Test
    void emptyHistoryGivesHeaderOnly() throws IOException {
        try (CSVParser p = parse(TimeHistoryCsvWriter.toCsv(TimeHistory.empty()))) {
            assertThat(p.getRecords()).isEmpty();
            assertThat(p.getHeaderNames()).hasSize(5);
        }
    }
}
