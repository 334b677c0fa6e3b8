package org.tracewell.core.variation;

/** The figures of one contour run a study can collect: as the circle test and the contour-error search give them. */
public enum ContourQuantity {
    G("G", "circular deviation G (ISO 230-4), programmed direction", true),
    F("F", "radial deviation F (ISO 230-4), programmed direction", true),
    MAX_CONTOUR_ERROR("maxContourError", "largest contour error of the run, programmed direction", false);

    private final String token;
    private final String description;
    private final boolean needsCircle;

    ContourQuantity(String token, String description, boolean needsCircle) {
        this.token = token;
        this.description = description;
        this.needsCircle = needsCircle;
    }

    /** How metric names spell it: {@code contour[NAME].G}. */
    public String token() {
        return token;
    }

    public String description() {
        return description;
    }

    /** True for the figures defined on full circles only. */
    public boolean needsCircle() {
        return needsCircle;
    }
}
