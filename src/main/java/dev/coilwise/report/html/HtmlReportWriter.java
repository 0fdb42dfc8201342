package dev.coilwise.report.html;

import dev.coilwise.error.InternalFaultException;
import dev.coilwise.report.Caution;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.Locale;
import java.util.Properties;

/**
 * Writes {@code report.html}: one self-contained page (inline style, inline script, charts as inline SVG; nothing
 * fetched from anywhere) that restates the requirement, shows the caution, the sortable shortlist, the trade-off
 * across feasible families and one section per design, or the diagnosis when nothing is feasible. The page holds no
 * date or path, so the same shortlist always gives the same page. The charts' styles are shared classes
 * ({@link SvgStyles}), which roughly halves the page.
 */
public final class HtmlReportWriter {
    private static final String RESOURCES = "/dev/coilwise/report/html/";

    private HtmlReportWriter() {
    }

    public static String write(ReportData r) {
        return SvgStyles.compact(page(r));
    }

    /** The page with the charts as JFreeSVG draws them, before {@link SvgStyles#compact}. */
    static String page(ReportData r) {
        Html h = new Html();
        String title = r.title().isBlank() ? "(untitled requirement)" : r.title();
        h.raw("<!DOCTYPE html>\n<html lang=\"en\" data-units=\"" + r.units().name().toLowerCase(Locale.ROOT) + "\">\n");
        h.open("head");
        h.raw("<meta charset=\"utf-8\">\n<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n");
        h.el("title", "coilwise report: " + title);
        h.raw("<style>\n").raw(resource("report.css")).raw("</style>\n");
        h.close("head");
        h.open("body");
        h.open("header", "id=\"top\"");
        h.el("p", "class=\"kicker\"", "coilwise spring sizing report, " + (r.arrest() ? "arrest" : "launch"));
        h.el("h1", title);
        h.raw("<p class=\"caution\" role=\"note\" id=\"caution\">").text(Caution.TEXT).raw("</p>\n");
        h.el("p", "class=\"verdict\"", verdict(r));
        h.close("header");
        h.open("main");
        h.open("section", "id=\"requirement\"");
        h.el("h2", "What was asked");
        h.open("ul", "class=\"asked\"");
        r.asked().forEach(s -> h.el("li", s));
        h.close("ul");
        h.close("section");
        if (r.feasible()) {
            ShortlistSection.write(h, r);
            tradeOff(h, r);
            r.designs().forEach(d -> DesignSection.write(h, r, d));
        } else {
            DiagnosisSection.write(h, r);
        }
        search(h, r);
        h.close("main");
        h.open("footer");
        h.raw("<p class=\"caution small\">").text(Caution.TEXT).raw("</p>\n");
        h.el("p", "Made by " + version() + " from the saved shortlist; re-render it with"
                + " 'coilwise report shortlist.json'.");
        h.close("footer");
        h.raw("<script>\n").raw(resource("report.js")).raw("</script>\n");
        h.close("body");
        h.close("html");
        return h.toString();
    }

    static String verdict(ReportData r) {
        if (!r.feasible()) {
            return "No design meets every limit. The diagnosis below shows which limits removed the candidates and"
                    + " what to relax.";
        }
        int n = r.designs().size();
        return r.search().feasibleFamilies() + " of " + r.search().families() + " families have a design that meets"
                + " every limit; the best " + (n == 1 ? "one is" : n + " are") + " shortlisted below, ranked by "
                + r.rankedBy().replace('_', ' ') + ".";
    }

    private static void tradeOff(Html h, ReportData r) {
        h.open("section", "id=\"trade-off\"");
        h.el("h2", "Trade-off across feasible families");
        if (!TradeOffChart.drawable(r)) {
            h.el("p", "This shortlist does not hold the feasible families, so the trade-off cannot be drawn; size the"
                    + " requirement again to get it.");
        } else {
            h.figure("trade-off", TradeOffChart.svg(r, "trade-off-chart"), TradeOffChart.caption(r));
        }
        h.close("section");
    }

    private static void search(Html h, ReportData r) {
        ReportData.SearchCounts s = r.search();
        h.open("section", "id=\"search\"");
        h.el("h2", "What was searched");
        h.el("p", count(s.families(), "family", "families") + " (" + count(s.materials(), "material", "materials")
                + ", " + count(s.ends(), "end type", "end types") + ", " + count(s.wireSizes(), "wire size", "wire sizes")
                + "); " + count(s.evaluated(), "candidate", "candidates") + " evaluated in full; "
                + count(s.feasibleFamilies(), "family has", "families have") + " a feasible design. Each family is"
                + " searched over mean diameter, active coils and free length; the shortlist keeps one design per"
                + " family.");
        h.close("section");
    }

    private static String count(long n, String one, String many) {
        return n + " " + (n == 1 ? one : many);
    }

    static String resource(String name) {
        try (InputStream in = HtmlReportWriter.class.getResourceAsStream(RESOURCES + name)) {
            if (in == null) {
                throw new InternalFaultException("report resource " + name + " is missing from the build");
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    static String version() {
        Properties p = new Properties();
        try (InputStream in = HtmlReportWriter.class.getResourceAsStream("/dev/coilwise/version.properties")) {
            if (in != null) {
                p.load(in);
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return "coilwise " + p.getProperty("version", "development build");
    }
}
