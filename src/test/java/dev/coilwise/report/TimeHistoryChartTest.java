package dev.coilwise.report;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import dev.coilwise.dynamics.TimeHistory;
import dev.coilwise.model.UnitSystem;
import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Document;
import org.w3c.dom.NodeList;

class TimeHistoryChartTest {
    private static Document parse(String svg) throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        f.setFeature("http://apache.org/xml/features/nonvalidating/load-external-dtd", false);
        return f.newDocumentBuilder().parse(new ByteArrayInputStream(svg.getBytes(StandardCharsets.UTF_8)));
    }

    private static List<String> texts(Document d) {
        NodeList n = d.getElementsByTagNameNS("*", "text");
        List<String> out = new ArrayList<>();
        for (int i = 0; i < n.getLength(); i++) {
            out.add(n.item(i).getTextContent());
        }
        return out;
    }

    @Test
    void svgParsesAsXmlWithAxisTitlesCarryingUnits() throws Exception {
        Document d = parse(TimeHistoryChart.svg(HistorySamples.halfCycle(200), "Demo drop"));
        assertThat(d.getDocumentElement().getLocalName()).isEqualTo("svg");
        List<String> t = texts(d);
        assertThat(t).contains("Time (ms)", "Load position, spring compressed (mm)", "Force between spring and load (N)",
                "Demo drop");
        assertThat(String.join(" ", t).replaceAll("\\s+", " ")).contains(Caution.TEXT);
    }

    @Test
    void usUnitsLabelInchesAndPoundsForce() throws Exception {
        List<String> t = texts(parse(TimeHistoryChart.svg(HistorySamples.halfCycle(20), "Demo", UnitSystem.US)));
        assertThat(t).contains("Load position, spring compressed (in)", "Force between spring and load (lbf)");
    }

    @Test
    void emptyHistoryIsRefusedWithAReason() {
        assertThatThrownBy(() -> TimeHistoryChart.svg(TimeHistory.empty(), "x"))
                .hasMessageContaining("history kept");
    }
}
