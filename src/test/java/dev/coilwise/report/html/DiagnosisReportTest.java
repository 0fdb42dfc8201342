package dev.coilwise.report.html;

import static org.assertj.core.api.Assertions.assertThat;

import dev.coilwise.search.Diagnosis;
import dev.coilwise.search.NearMiss;
import dev.coilwise.search.SizingResult;
import java.util.List;
import java.util.Map;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.select.Elements;
import org.junit.jupiter.api.Test;

/** An infeasible sizing renders its diagnosis: the limits that removed candidates and the nearest misses. */
class DiagnosisReportTest {
    private final SizingResult result = ReportFixtures.sized("arrest-infeasible");
    private final Document doc = Jsoup.parse(HtmlReportWriter.write(ReportData.of(result)));

    @Test
    void theCaseHasNoFeasibleDesign() {
        assertThat(result.feasible()).isFalse();
        assertThat(result.diagnosis()).isPresent();
    }

    @Test
    void everyLimitThatRemovedCandidatesIsListedWithItsCount() {
        Diagnosis d = result.diagnosis().orElseThrow();
        Elements rows = doc.select("#diagnosis table.removed tbody tr");
        assertThat(rows).hasSize(d.removedBy().size());
        int i = 0;
        for (Map.Entry<String, Long> e : d.removedBy().entrySet()) {
            assertThat(rows.get(i).child(0).text()).isEqualTo(LimitNames.of(e.getKey(), true));
            assertThat(rows.get(i).child(1).text()).isEqualTo(String.valueOf(e.getValue()));
            i++;
        }
        assertThat(doc.select("#diagnosis p").eachText()).anyMatch(t -> t.contains("sampled " + d.sampled()
                + " candidates"));
    }

    @Test
    void eachNearMissSaysWhatToRelax() {
        List<NearMiss> misses = result.diagnosis().orElseThrow().nearest();
        assertThat(misses).as("the demo case has near misses").isNotEmpty();
        Elements rows = doc.select("#diagnosis table.misses tbody tr");
        assertThat(rows).hasSize(misses.size());
        for (int i = 0; i < misses.size(); i++) {
            assertThat(rows.get(i).child(0).text()).isEqualTo(misses.get(i).evaluation().spring().material().key());
            assertThat(rows.get(i).child(6).text()).isEqualTo(LimitNames.of(misses.get(i).violated().key(), true));
            assertThat(rows.get(i).child(8).text()).startsWith("allow ").contains("(limits.stroke)");
        }
    }

    @Test
    void noShortlistTradeOffOrDesignSectionIsShown() {
        assertThat(doc.select("#shortlist, #trade-off, section.design, svg")).isEmpty();
        assertThat(doc.selectFirst("header .verdict").text()).startsWith("No design meets every limit.");
    }

    @Test
    void aForceLimitNoSpringCanMeetIsExplainedWithWhatToChange() {
        SizingResult conflict = ReportFixtures.sized("arrest-force-conflict");
        Diagnosis d = conflict.diagnosis().orElseThrow();
        assertThat(d.conflicts()).as("the demo case's force limit is below the work-energy bound").isNotEmpty();
        Document page = Jsoup.parse(HtmlReportWriter.write(ReportData.of(conflict)));
        List<String> shown = page.select("#diagnosis ul.conflicts li").eachText();
        assertThat(shown).hasSize(d.conflicts().size());
        assertThat(shown.get(0)).startsWith("limits.peak_force 100 N is below ").contains("raise limits.peak_force");
        assertThat(doc.select("#diagnosis ul.conflicts li")).as("the stroke-limited case has its own conflicts")
                .hasSize(result.diagnosis().orElseThrow().conflicts().size());
    }

    @Test
    void withoutAForceLimitTheWorkEnergyBoundSaysWhatStrokeOrBoreWouldLeaveRoom() {
        SizingResult weak = ReportFixtures.sized("arrest-too-weak");
        assertThat(weak.diagnosis().orElseThrow().strength()).hasValueSatisfying(b -> assertThat(b.beyondCapacity())
                .isTrue());
        Document page = Jsoup.parse(HtmlReportWriter.write(ReportData.of(weak)));
        assertThat(page.select("#diagnosis p").eachText()).contains(
                "No spring in the design space is strong enough (work-energy balance and wire strength):");
        assertThat(page.select("#diagnosis ul.strength li").eachText()).singleElement().asString()
                .startsWith("Stopping the load within limits.stroke 10.0 mm takes a peak force of at least 800 N")
                .contains("allow limits.stroke at least 11.3 mm (5.62 mm with preload", "envelope.bore at least 21.1 mm");
    }

    // arrest-force-conflict: E = ½ × 4 × 1.2² = 2.88 J within 25 mm needs 2E/s = 230.4 N, which the springs of its
    // bore take: its force limit (100 N, in the conflict above) says what is wrong, so the strength line is left out.
    // arrest-infeasible: within 3 mm it needs 1920 N, more than any spring of its bore takes: shown beside the
    // conflict, since raising the force limit alone would not do.
    @Test
    void withAForceLimitTheBoundIsShownOnlyWhenNoSpringIsStrongEnough() {
        SizingResult conflict = ReportFixtures.sized("arrest-force-conflict");
        assertThat(conflict.diagnosis().orElseThrow().strength()).hasValueSatisfying(b -> {
            assertThat(b.leastForce()).isCloseTo(230.4, org.assertj.core.api.Assertions.within(1e-9));
            assertThat(b.beyondCapacity()).isFalse();
        });
        assertThat(Jsoup.parse(HtmlReportWriter.write(ReportData.of(conflict))).select("#diagnosis ul.strength")).isEmpty();
        assertThat(doc.select("#diagnosis ul.strength li").eachText()).singleElement().asString()
                .startsWith("Stopping the load within limits.stroke 3.0 mm takes a peak force of at least 1920 N");
    }

    // Rendering only: the words are the sizer's own (SizerStrictDynamicsTest checks them); here they must reach the page.
    @Test
    void designsThatARankingRuleRemovedAreListedWithTheReasonEachLeft() {
        List<String> why = List.of("left the shortlist under ranking.dynamics: strict: design a: simulated peak force"
                + " 572.3 N exceeds limits.peak_force 560 N by 2.2 %", "left the shortlist under ranking.dynamics:"
                + " strict: design b: simulated peak force 607.5 N exceeds limits.peak_force 560 N by 8.5 %");
        SizingResult removed = new SizingResult(result.requirement(), result.search(), List.of(),
                java.util.Optional.of(new Diagnosis(2, Map.of("dynamics", 2L), List.of())), why);
        Document page = Jsoup.parse(HtmlReportWriter.write(ReportData.of(removed)));
        assertThat(page.select("#diagnosis table.removed tbody tr td").first().text())
                .isEqualTo("simulated figures over a limit (ranking.dynamics: strict)");
        assertThat(page.select("#diagnosis ul.left li").eachText()).isEqualTo(why);
        assertThat(doc.select("#diagnosis ul.left")).as("limits, not ranking rules, emptied the demo case").isEmpty();
    }
}
