/**
 * The HTML report: {@code report.html}, one self-contained page per sizing.
 *
 * <p>{@link dev.coilwise.report.html.ReportData} holds everything the page shows, in SI, and is built only from the
 * shortlist JSON ({@code ReportData.fromJson}); a fresh sizing goes through the same JSON text, so that
 * {@code coilwise size --out} and {@code coilwise report shortlist.json} render the same page.
 * {@link dev.coilwise.report.html.HtmlReportWriter} writes the page; each chart is one class that returns an inline
 * SVG string drawn with JFreeChart and JFreeSVG ({@code TradeOffChart}, {@code ForceDeflectionChart},
 * {@code MarginChart}, {@code HistoryChart}), sharing the look set in {@code ChartStyle}. docs/report.md describes the
 * page and its chart conventions.
 */
package dev.coilwise.report.html;
