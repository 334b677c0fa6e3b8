/**
 * The design-review report: {@link org.tracewell.report.ReportWriter} turns the review results (analysis,
 * budget, requirements, provenance) into one HTML page, {@code index.html}, with its chart images.
 *
 * <p>Images: by default PNG files in {@code charts/} beside the page, linked relatively
 * ({@link org.tracewell.report.ImageMode#ALONGSIDE}); {@link org.tracewell.report.ImageMode#EMBEDDED} puts them
 * into the page as {@code data:} URIs instead. Either way the page has no script and loads nothing from
 * elsewhere, every model string is escaped by {@link org.tracewell.report.Html#escape}, and the same input gives
 * the same bytes (the only date is the analysis date of the provenance). Numbers are converted to trade units
 * through {@code TradeUnits}.
 */
package org.tracewell.report;
