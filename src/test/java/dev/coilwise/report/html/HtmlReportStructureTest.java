package dev.coilwise.report.html;

import static org.assertj.core.api.Assertions.assertThat;

import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.model.Spring;
import dev.coilwise.report.Caution;
import dev.coilwise.search.ShortlistEntry;
import dev.coilwise.search.SizingResult;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Attribute;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.jsoup.select.Elements;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** The report page parsed with jsoup: its parts are all there, in order, and it reaches for nothing outside itself. */
class HtmlReportStructureTest {

    private static Document page(String name) {
        return Jsoup.parse(HtmlReportWriter.write(ReportData.of(ReportFixtures.sized(name))));
    }

    private static List<String> texts(Element svg) {
        return svg.select("text").eachText();
    }

    @ParameterizedTest
    @ValueSource(strings = {"arrest-small", "launch-small"})
    void everyChartIsPresentWithItsAxisTitlesAndUnits(String name) {
        SizingResult r = ReportFixtures.sized(name);
        Document doc = page(name);
        boolean arrest = r.requirement().isArrest();

        Element trade = doc.selectFirst("section#trade-off svg.chart");
        assertThat(trade).as("trade-off chart").isNotNull();
        assertThat(texts(trade)).anyMatch(t -> t.startsWith((arrest ? "peak force" : "cocking force") + " F (N)"))
                .anyMatch(t -> t.startsWith("spring mass (g)"));
        for (ShortlistEntry e : r.shortlist()) {
            Element fd = doc.getElementById("design-" + e.rank() + "-fd");
            Element margins = doc.getElementById("design-" + e.rank() + "-margins");
            assertThat(fd).as("force-deflection chart of design %d", e.rank()).isNotNull();
            assertThat(margins).as("margin chart of design %d", e.rank()).isNotNull();
            assertThat(texts(fd)).contains("deflection from free length x (mm)", "spring force F (N)",
                    "spring length L = L0 - x (mm)");
            assertThat(texts(margins)).contains("margin to the limit (% of the limit; below 0: exceeded)");
            String binding = LimitNames.of(e.evaluation().binding().orElseThrow().key(), arrest);
            assertThat(texts(margins)).as("the binding limit is named on its bar")
                    .anyMatch(t -> t.startsWith(binding + " ") && t.endsWith("(binding)"));
        }
        for (Element fig : doc.select("figure")) {
            Element caption = fig.selectFirst("figcaption");
            assertThat(caption).as("every figure has a caption").isNotNull();
            assertThat(caption.text()).as("the caption names the units").containsPattern("\\b(N|mm|g)\\b|%");
            assertThat(fig.select("svg.chart")).hasSize(1);
        }
        assertThat(doc.select("section.design")).hasSize(r.shortlist().size());
    }

    @ParameterizedTest
    @ValueSource(strings = {"arrest-small", "launch-small"})
    void theTableRowsAreTheShortlist(String name) {
        SizingResult r = ReportFixtures.sized(name);
        Elements rows = page(name).select("table.shortlist tbody tr");
        assertThat(rows).hasSize(r.shortlist().size());
        for (int i = 0; i < rows.size(); i++) {
            Evaluation e = r.shortlist().get(i).evaluation();
            Spring s = e.spring();
            Elements cells = rows.get(i).select("td");
            assertThat(cells.get(0).text()).isEqualTo(String.valueOf(i + 1));
            assertThat(cells.get(0).selectFirst("a").attr("href")).isEqualTo("#design-" + (i + 1));
            assertThat(cells.get(1).text()).isEqualTo(s.material().key());
            assertThat(cells.get(2).text()).isEqualTo(s.ends().key());
            assertThat(Double.parseDouble(cells.get(3).attr("data-v"))).as("wire diameter, mm")
                    .isCloseTo(s.wireDiameter() * 1e3, org.assertj.core.data.Percentage.withPercentage(1e-3));
            assertThat(Double.parseDouble(cells.get(6).attr("data-v"))).as("free length, mm")
                    .isCloseTo(s.freeLength() * 1e3, org.assertj.core.data.Percentage.withPercentage(1e-3));
            assertThat(Double.parseDouble(cells.get(10).attr("data-v"))).as("peak or cocking force, N")
                    .isCloseTo(e.peakForce(), org.assertj.core.data.Percentage.withPercentage(1e-3));
        }
        assertThat(page(name).select("table.shortlist thead th")).hasSize(rows.get(0).select("td").size());
    }

    @ParameterizedTest
    @ValueSource(strings = {"arrest-small", "launch-small", "arrest-infeasible"})
    void nothingOutsideThePageIsReferenced(String name) {
        String html = HtmlReportWriter.write(ReportData.of(ReportFixtures.sized(name)));
        Document doc = Jsoup.parse(html);
        for (Element el : doc.getAllElements()) {
            for (Attribute a : el.attributes()) {
                String key = a.getKey().toLowerCase(Locale.ROOT);
                if (key.equals("src") || key.endsWith("href") || key.equals("action") || key.equals("poster")
                        || key.equals("data")) {
                    assertThat(a.getValue()).as("<%s %s>", el.tagName(), key).startsWith("#");
                }
            }
        }
        assertThat(doc.select("link, img, iframe, object, embed, audio, source, base")).isEmpty();
        assertThat(doc.select("script[src]")).isEmpty();
        assertThat(html).doesNotContainIgnoringCase("@import").doesNotContainIgnoringCase("@font-face");
        Matcher url = Pattern.compile("url\\(\\s*['\"]?([^)'\"]*)").matcher(html);
        while (url.find()) {
            assertThat(url.group(1)).as("url() reference").startsWith("#");
        }
        assertThat(doc.select("script")).hasSize(1);
        assertThat(doc.select("style")).hasSize(1);
    }

    @ParameterizedTest
    @ValueSource(strings = {"arrest-small", "arrest-infeasible"})
    void theCautionComesFirstAndAgainAtTheEnd(String name) {
        Document doc = page(name);
        Element caution = doc.getElementById("caution");
        assertThat(caution).isNotNull();
        assertThat(caution.text()).isEqualTo(Caution.TEXT);
        assertThat(caution.parent().tagName()).isEqualTo("header");
        Element h1 = doc.selectFirst("h1");
        Element asked = doc.getElementById("requirement");
        List<Element> order = doc.getAllElements();
        assertThat(order.indexOf(caution)).as("caution right after the title, before the requirement")
                .isGreaterThan(order.indexOf(h1)).isLessThan(order.indexOf(asked));
        assertThat(doc.select("footer .caution").text()).isEqualTo(Caution.TEXT);
    }

    @ParameterizedTest
    @ValueSource(strings = {"arrest-small", "launch-small", "arrest-infeasible"})
    void idsAreUniqueSoTheChartsClipPathsDoNotClash(String name) {
        Set<String> seen = new HashSet<>();
        for (Element el : page(name).select("[id]")) {
            assertThat(seen.add(el.id())).as("id %s is unique", el.id()).isTrue();
        }
    }

    @ParameterizedTest
    @ValueSource(strings = {"arrest-small", "launch-small"})
    void theRequirementIsRestatedWithUnits(String name) {
        Elements items = page(name).select("#requirement ul.asked li");
        assertThat(items).hasSizeGreaterThanOrEqualTo(4);
        String first = items.get(0).text();
        if (name.startsWith("arrest")) {
            assertThat(first).contains("4.00 kg", "1.20 m/s", "moving horizontally", "25.0 mm");
        } else {
            assertThat(first).contains("0.150 kg", "1000.0 mm above the muzzle", "straight up", "40.0 mm");
        }
    }

    @ParameterizedTest
    @ValueSource(strings = {"arrest-small"})
    void printStartsEachDesignOnANewPageAndKeepsChartsWhole(String name) {
        String css = page(name).selectFirst("style").data();
        String print = css.substring(css.indexOf("@media print"));
        assertThat(print).contains("section.design { break-before: page;")
                .containsPattern("figure[^{]*\\{ break-inside: avoid;");
    }

    @ParameterizedTest
    @ValueSource(strings = {"arrest-small", "launch-small"})
    void aSimulatedDesignHasItsTimeHistoryChart(String name) {
        SizingResult r = ReportFixtures.sized(name);
        Document doc = page(name);
        assertThat(r.shortlist()).as("the fixture keeps the simulation's history")
                .allMatch(e -> e.simulation().isPresent() && e.history().size() > 1);
        for (ShortlistEntry e : r.shortlist()) {
            Element chart = doc.getElementById("design-" + e.rank() + "-history");
            assertThat(chart).as("time-history chart of design %d", e.rank()).isNotNull();
            assertThat(texts(chart)).contains(r.requirement().isArrest() ? "time from first contact t (ms)"
                    : "time from release t (ms)", "load position x (mm)", "force on the load F (N)");
            assertThat(chart.parent().selectFirst("figcaption").text()).contains(
                    e.simulation().orElseThrow().masses() + " lumped masses");
        }
    }

    @ParameterizedTest
    @ValueSource(strings = {"arrest-stock+stock"})
    void stockPartsAreNamedInTheTableAndInTheirSection(String name) {
        SizingResult r = ReportFixtures.sized(name);
        List<ShortlistEntry> stock = r.shortlist().stream().filter(e -> e.candidate().isStock()).toList();
        assertThat(stock).as("the fixture shortlists a stock part").isNotEmpty();
        Document doc = page(name);
        assertThat(doc.select("table.shortlist thead th").first().nextElementSibling().text()).isEqualTo("Source");
        for (ShortlistEntry e : r.shortlist()) {
            Element row = doc.getElementById("row-" + e.rank());
            String pn = e.candidate().stock().map(p -> "stock " + p.partNumber()).orElse("custom");
            assertThat(row.child(1).text()).isEqualTo(pn);
            if (e.candidate().isStock()) {
                assertThat(doc.selectFirst("#design-" + e.rank() + " h2").text())
                        .contains("stock part " + e.candidate().stock().orElseThrow().partNumber());
            }
        }
        assertThat(texts(doc.selectFirst("#trade-off svg"))).contains("shortlisted stock part");
    }

    @org.junit.jupiter.api.Test
    void textFromASavedShortlistIsEscapedInTheTextAndInTheCharts() {
        com.fasterxml.jackson.databind.node.ObjectNode tree = dev.coilwise.report.ShortlistJson.tree(
                ReportFixtures.sized("arrest-small"));
        ((com.fasterxml.jackson.databind.node.ObjectNode) tree.get("requirement")).put("title", "<b id=\"t\">x</b>");
        com.fasterxml.jackson.databind.JsonNode margins = tree.get("designs").get(0).get("margins");
        ((com.fasterxml.jackson.databind.node.ObjectNode) margins.get(0)).put("limit", "<i id=\"m\">y</i>");
        Document doc = Jsoup.parse(HtmlReportWriter.write(ReportData.fromJson(tree)));
        assertThat(doc.getElementById("t")).isNull();
        assertThat(doc.getElementById("m")).isNull();
        assertThat(doc.selectFirst("h1").text()).isEqualTo("<b id=\"t\">x</b>");
        assertThat(texts(doc.getElementById("design-1-margins"))).anyMatch(t -> t.startsWith("<i id=\"m\">y</i>"));
    }
}
