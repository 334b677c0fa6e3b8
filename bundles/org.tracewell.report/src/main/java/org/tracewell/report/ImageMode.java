package org.tracewell.report;

/** Where the report's chart images go. */
public enum ImageMode {
    /** PNG files in {@code charts/} beside {@code index.html}, linked by relative paths (the default). */
    ALONGSIDE,
    /** PNGs inside {@code index.html} as {@code data:} URIs: one file to mail, about a third larger. */
    EMBEDDED
}
