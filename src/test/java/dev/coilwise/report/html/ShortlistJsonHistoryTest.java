package dev.coilwise.report.html;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.coilwise.dynamics.TimeHistory;
import dev.coilwise.report.ShortlistJson;
import dev.coilwise.search.ShortlistEntry;
import dev.coilwise.search.SizingResult;
import java.util.Arrays;
import org.junit.jupiter.api.Test;

/** shortlist.json carries each simulated design's time history (thinned when long; see ShortlistJsonThinningTest). */
class ShortlistJsonHistoryTest {
    private final SizingResult result = ReportFixtures.sized("arrest-small");

    @Test
    void theSavedHistoryKeepsTheEndsAndThePeaksOfTheFullOne() {
        ObjectNode tree = ShortlistJson.tree(result);
        for (ShortlistEntry e : result.shortlist()) {
            TimeHistory full = e.history();
            assertThat(full.size()).as("the fixture keeps a history").isGreaterThan(1);
            JsonNode h = tree.get("designs").get(e.rank() - 1).get("simulation").get("history");
            double[] t = numbers(h.get("time_ms"));
            double[] x = numbers(h.get("load_position_mm"));
            double[] f = numbers(h.get("top_force_N"));
            assertThat(t).hasSameSizeAs(x).hasSameSizeAs(f);
            assertThat(t.length).isLessThanOrEqualTo(ShortlistJson.HISTORY_ROWS);
            for (int i = 1; i < t.length; i++) {
                assertThat(t[i]).as("time increases, row %d", i).isGreaterThan(t[i - 1]);
            }
            // six significant digits are saved: compare to 1e-5 of the figure
            assertThat(t[0]).isCloseTo(full.time()[0] * 1e3, within(1e-9));
            assertThat(t[t.length - 1]).isCloseTo(full.time()[full.size() - 1] * 1e3, within(1e-5 * t[t.length - 1]));
            double maxF = Arrays.stream(full.topForce()).max().orElseThrow();
            double maxX = Arrays.stream(full.loadPosition()).max().orElseThrow() * 1e3;
            assertThat(Arrays.stream(f).max().orElseThrow()).isCloseTo(maxF, within(1e-5 * maxF));
            assertThat(Arrays.stream(x).max().orElseThrow()).isCloseTo(maxX, within(1e-5 * maxX));
        }
    }

    @Test
    void theReportReadsTheSavedHistoryInSiUnits() {
        ReportData data = ReportData.of(result);
        for (ReportDesign d : data.designs()) {
            TimeSeries h = d.simulation().orElseThrow().history().orElseThrow();
            TimeHistory full = result.shortlist().get(d.rank() - 1).history();
            assertThat(h.time()[h.size() - 1]).isCloseTo(full.time()[full.size() - 1], within(1e-5));
            assertThat(Arrays.stream(h.travel()).max().orElseThrow()).as("largest travel, m")
                    .isCloseTo(Arrays.stream(full.loadPosition()).max().orElseThrow(), within(1e-7));
        }
    }

    private static double[] numbers(JsonNode arr) {
        double[] out = new double[arr.size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = arr.get(i).asDouble();
        }
        return out;
    }
}
