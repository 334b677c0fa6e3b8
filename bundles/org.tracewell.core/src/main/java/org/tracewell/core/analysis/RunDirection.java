package org.tracewell.core.analysis;

/** Which way a contour run went: as programmed (lines, polylines), or one direction of a full-circle test. */
public enum RunDirection {
    PROGRAMMED("programmed"),
    CW("CW"),
    CCW("CCW");

    private final String label;

    RunDirection(String label) {
        this.label = label;
    }

    /** "programmed", "CW" or "CCW" (the JSON and CSV spelling). */
    public String label() {
        return label;
    }
}
