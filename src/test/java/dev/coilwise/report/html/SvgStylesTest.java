package dev.coilwise.report.html;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.coilwise.report.ShortlistJson;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Attribute;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.jsoup.parser.Parser;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** The compacted charts say exactly what JFreeSVG drew: same elements, same text, same style on every element. */
class SvgStylesTest {
    private static final Pattern RULE = Pattern.compile("svg\\.chart \\.(s\\d+)\\{([^}]*)\\}");

    private static Map<String, String> rules(String page) {
        Map<String, String> out = new HashMap<>();
        Matcher m = RULE.matcher(page);
        while (m.find()) {
            assertThat(out.put(m.group(1), m.group(2))).as("class %s defined once", m.group(1)).isNull();
        }
        return out;
    }

    @ParameterizedTest
    @ValueSource(strings = {"arrest-small", "launch-small"})
    void everyChartElementKeepsItsStyleTextAndGeometry(String name) {
        ReportData data = ReportData.of(ReportFixtures.sized(name));
        String before = HtmlReportWriter.page(data);
        String after = HtmlReportWriter.write(data);
        Map<String, String> rules = rules(after);
        List<Element> was = Jsoup.parse(before).select("svg.chart");
        List<Element> now = Jsoup.parse(after).select("svg.chart");
        assertThat(now).hasSameSizeAs(was).isNotEmpty();
        int clipsDropped = 0;
        for (int c = 0; c < was.size(); c++) {
            List<Element> a = was.get(c).select("*");
            List<Element> b = now.get(c).select("*");
            assertThat(b).hasSameSizeAs(a);
            String canvasClip = "url(#" + was.get(c).id() + "-clip-0)";
            for (int i = 0; i < a.size(); i++) {
                Element x = a.get(i);
                Element y = b.get(i);
                assertThat(y.tagName()).isEqualTo(x.tagName());
                assertThat(y.ownText()).isEqualTo(x.ownText());
                for (Attribute at : x.attributes()) {
                    switch (at.getKey()) {
                        case "style" -> assertThat(rules.get(y.attr("class"))).as("style of %s", x).isEqualTo(at.getValue());
                        case "clip-path" -> {
                            if (y.hasAttr("clip-path")) {
                                assertThat(y.attr("clip-path")).isEqualTo(at.getValue());
                            } else {
                                assertThat(at.getValue()).as("only the whole-canvas clip is dropped").isEqualTo(canvasClip);
                                assertThat(x.parents().stream().noneMatch(p -> p.hasAttr("transform"))
                                        && !x.hasAttr("transform")).as("and only where nothing is transformed").isTrue();
                                clipsDropped++;
                            }
                        }
                        default -> assertThat(y.attr(at.getKey())).as("%s of %s", at.getKey(), x.tagName())
                                .isEqualTo(at.getValue());
                    }
                }
                if (!x.hasAttr("style") && !x.hasAttr("class")) {
                    assertThat(y.hasAttr("class")).isFalse();
                }
            }
        }
        assertThat(clipsDropped).isPositive();
        assertThat(after.length()).as("the page shrinks by at least a third").isLessThan(before.length() * 2 / 3);
    }

    /** The canvas clip stays on what is drawn in rotated coordinates, where it would clip another region. */
    @Test
    void aClipUnderATransformIsKept() {
        String svg = "<svg role=\"img\" class=\"chart\" id='c' viewBox='0 0 10 20'><defs><clipPath id='c-clip-0'>"
                + "<path d='M0,0L10,0L10,20L0,20L0,0Z'/></clipPath><clipPath id='c-clip-1'><path d='M1,1L9,1L9,9L1,9L1,1Z'/>"
                + "</clipPath></defs><line x1='0' y1='0' x2='5' y2='5' clip-path='url(#c-clip-0)'/>"
                + "<g transform='matrix(0,-1,1,0,0,0)'><g><text x='1' y='2' clip-path='url(#c-clip-0)'>a</text></g></g>"
                + "<text x='1' y='2' transform='rotate(90)' clip-path='url(#c-clip-0)'>b</text>"
                + "<line x1='0' y1='0' x2='5' y2='5' clip-path='url(#c-clip-1)'/></svg>";
        String out = SvgStyles.withoutCanvasClip(svg);
        Document d = Jsoup.parse(out, "", Parser.xmlParser());
        assertThat(d.select("line").get(0).hasAttr("clip-path")).isFalse();
        assertThat(d.select("text").eachAttr("clip-path")).containsExactly("url(#c-clip-0)", "url(#c-clip-0)");
        assertThat(d.select("line").get(1).attr("clip-path")).isEqualTo("url(#c-clip-1)");
    }

    @Test
    void textThatLooksLikeAStyleAttributeIsNotTouched() {
        ObjectNode tree = ShortlistJson.tree(ReportFixtures.sized("arrest-small"));
        ((ObjectNode) tree.get("requirement")).put("title", "x style='fill:red' y");
        Document doc = Jsoup.parse(HtmlReportWriter.write(ReportData.fromJson(tree)));
        assertThat(doc.selectFirst("h1").text()).isEqualTo("x style='fill:red' y");
    }

    @Test
    void aPageWithoutChartsIsUnchanged() {
        String page = HtmlReportWriter.page(ReportData.of(ReportFixtures.sized("arrest-infeasible")));
        assertThat(SvgStyles.compact(page)).isEqualTo(page);
    }
}
