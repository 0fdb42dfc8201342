/**
 * Report data and one writer per format. This package holds the purchasing package: a {@link
 * dev.coilwise.report.SpecSheet} built from a design, its evaluation, the requirement and an {@link
 * dev.coilwise.report.Order} (quantity, EN 15800 grade, helix, surface), written as a one-page PDF by {@link
 * dev.coilwise.report.SpecSheetPdfWriter} and as a self-contained printable HTML page by {@link
 * dev.coilwise.report.SpecSheetHtmlWriter}. {@link dev.coilwise.report.TestLoads} chooses the acceptance loads F1
 * at L1 and F2 at L2 (also for the shortlist). Writers only lay out what the sheet holds; every figure is computed
 * in the builder from the mechanics core and the tolerance package.
 */
package dev.coilwise.report;
