package dev.coilwise.report.html;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.coilwise.error.BadInputException;
import dev.coilwise.model.Arrest;
import dev.coilwise.report.ShortlistJson;
import dev.coilwise.search.Candidate;
import dev.coilwise.search.ShortlistEntry;
import dev.coilwise.search.SizingResult;
import org.junit.jupiter.api.Test;

/** Report data is read from the shortlist JSON alone, the same way for a fresh sizing and a saved file. */
class ReportDataTest {
    private final SizingResult arrest = ReportFixtures.sized("arrest-small");

    @Test
    void theInMemoryTreeAndTheSavedTextGiveEqualData() {
        ReportData fromTree = ReportData.fromJson(ShortlistJson.tree(arrest));
        ReportData fromText = ReportData.parse(ShortlistJson.write(arrest));
        assertThat(fromTree).isEqualTo(fromText);
        assertThat(ReportData.of(arrest)).isEqualTo(fromText);
    }

    @Test
    void theSavedFeasibleFamiliesAreEveryFamilyBestAndMarkTheShortlistedOnes() {
        ReportData data = ReportData.of(arrest);
        assertThat(data.families()).hasSize(arrest.search().best().size());
        for (int i = 0; i < data.families().size(); i++) {
            FamilyPoint p = data.families().get(i);
            Candidate c = arrest.search().best().get(i);
            assertThat(p.searchRank()).isEqualTo(i + 1);
            assertThat(p.material()).isEqualTo(c.family().material().key());
            assertThat(p.ends()).isEqualTo(c.family().ends().key());
            assertThat(p.wireDiameter()).isCloseTo(c.family().wireDiameter(), within(1e-9));
            // saved to 6 significant digits: within 5e-6 of the figure
            assertThat(p.mass()).isCloseTo(c.evaluation().mass(), within(1e-5 * c.evaluation().mass()));
            assertThat(p.peakForce()).isCloseTo(c.evaluation().peakForce(), within(1e-5 * c.evaluation().peakForce()));
        }
        for (ShortlistEntry e : arrest.shortlist()) {
            FamilyPoint p = data.families().stream().filter(f -> f.shortlistRank() == e.rank()).findFirst()
                    .orElseThrow(() -> new AssertionError("no family marked with shortlist rank " + e.rank()));
            assertThat(p.material()).isEqualTo(e.evaluation().spring().material().key());
            assertThat(p.wireDiameter()).isCloseTo(e.evaluation().spring().wireDiameter(), within(1e-9));
        }
        assertThat(data.families().stream().filter(f -> f.shortlistRank() > 0)).hasSize(arrest.shortlist().size());
    }

    @Test
    void theShadedEnergyOfAHorizontalArrestIsTheKineticEnergyOfTheLoad() {
        // Conservation of energy for a load meeting a massless linear spring with no preload and no push along
        // its motion: the spring takes up (1/2) m v^2 at the largest compression (closed form, common practice).
        Arrest job = (Arrest) arrest.requirement().job();
        double kinetic = 0.5 * job.mass() * job.contactSpeed() * job.contactSpeed();
        for (ReportDesign d : ReportData.of(arrest).designs()) {
            // figures are saved to 6 significant digits, so the energy from k and x agrees to about 1e-5
            assertThat(d.workingEnergy()).as("design %d", d.rank()).isCloseTo(kinetic, within(1e-4 * kinetic));
        }
    }

    @Test
    void aMissingFigureIsNamedWithItsPlaceInTheFile() {
        ObjectNode tree = ShortlistJson.tree(arrest);
        ((ObjectNode) tree.withArray("designs").get(1)).remove("rate_N_per_mm");
        assertThatThrownBy(() -> ReportData.fromJson(tree)).isInstanceOf(BadInputException.class)
                .hasMessage("designs[1].rate_N_per_mm is missing; expected a number");
    }

    @Test
    void aFigureOfTheWrongKindIsNamedWithWhatWasFound() {
        ObjectNode tree = ShortlistJson.tree(arrest);
        ArrayNode margins = (ArrayNode) tree.withArray("designs").get(0).get("margins");
        ((ObjectNode) margins.get(2)).put("hard", "yes");
        assertThatThrownBy(() -> ReportData.fromJson(tree)).isInstanceOf(BadInputException.class)
                .hasMessage("designs[0].margins[2].hard is 'yes'; expected true or false");
    }

    @Test
    void anotherKindOfJsonFileIsRefused() {
        assertThatThrownBy(() -> ReportData.parse("{\"format\": \"something-else\"}"))
                .isInstanceOf(BadInputException.class).hasMessageStartingWith("not a coilwise shortlist (format is 'something-else')");
        assertThatThrownBy(() -> ReportData.parse("[1, 2]")).isInstanceOf(BadInputException.class)
                .hasMessage("the top level is a list [1,2]; expected a JSON object");
        assertThatThrownBy(() -> ReportData.parse("{\"format\": ")).isInstanceOf(BadInputException.class)
                .hasMessageStartingWith("not valid JSON: ");
    }

    @Test
    void aLaterFormatVersionIsRefusedWithTheVersionThisBuildReads() {
        ObjectNode tree = ShortlistJson.tree(arrest);
        tree.put("format_version", ShortlistJson.FORMAT + 1);
        assertThatThrownBy(() -> ReportData.fromJson(tree)).isInstanceOf(BadInputException.class)
                .hasMessage("shortlist format version " + (ShortlistJson.FORMAT + 1)
                        + " is not supported; this coilwise reads version " + ShortlistJson.FORMAT);
    }
}
