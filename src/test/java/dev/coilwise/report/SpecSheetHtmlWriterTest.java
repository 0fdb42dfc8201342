package dev.coilwise.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.StringWriter;
import java.util.List;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.Test;

/** The HTML page parsed with jsoup: the same fields as the sheet, self-contained, with the diagram as SVG. */
class SpecSheetHtmlWriterTest {

    private static Document html(SpecSheet sheet) throws IOException {
        StringWriter w = new StringWriter();
        SpecSheetHtmlWriter.write(sheet, w);
        return Jsoup.parse(w.toString());
    }

    @Test
    void everyFieldIsARowWithItsLabelAndValue() throws IOException {
        for (SpecSheet sheet : List.of(SpecSheets.bufferSheet(), SpecSheets.launcherSheet())) {
            Document doc = html(sheet);
            assertThat(doc.title()).isEqualTo(sheet.title());
            assertThat(doc.selectFirst("h1").text()).isEqualTo(sheet.title());
            for (SpecField f : sheet.fields()) {
                Element row = doc.selectFirst("tr[data-key=" + f.key() + "]");
                assertThat(row).as(f.key()).isNotNull();
                assertThat(row.selectFirst("th").text()).isEqualTo(f.label());
                assertThat(row.selectFirst("td").text()).isEqualTo(f.value());
            }
            for (String key : SpecSheet.REQUIRED_KEYS) {
                assertThat(doc.select("tr[data-key=" + key + "]")).as(key).hasSize(1);
            }
            assertThat(doc.select("ul.notes li").eachText()).containsExactlyElementsOf(sheet.notes());
            assertThat(doc.selectFirst("p.caution").text()).isEqualTo(Caution.TEXT);
        }
    }

    @Test
    void thePageIsSelfContainedAndPrintable() throws IOException {
        Document doc = html(SpecSheets.bufferSheet());
        assertThat(doc.select("script, link, img, iframe")).isEmpty();
        assertThat(doc.select("[src]")).isEmpty();
        assertThat(doc.selectFirst("style").data()).contains("@page").contains("A4");
        Element svg = doc.selectFirst("figure svg");
        assertThat(svg).isNotNull();
        assertThat(svg.select("text").eachText()).contains("Deflection (mm)", "Force (N)", "solid", "F1", "F2");
        // the spring line plus grid, axes and tolerance bars
        assertThat(svg.select("line").size()).isGreaterThan(10);
        assertThat(svg.select("circle")).hasSize(2);
    }

    @Test
    void textIsEscaped() {
        assertThat(SpecSheetHtmlWriter.esc("<b>&\"'")).isEqualTo("&lt;b&gt;&amp;&quot;&#39;");
    }
}
