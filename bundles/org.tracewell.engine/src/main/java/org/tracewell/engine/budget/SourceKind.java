package org.tracewell.engine.budget;

/** The physical origin of a budget line. */
public enum SourceKind {
    /** Contour error from the following error of the loops on a contour. */
    SERVO_LAG("servo lag", ValueOrigin.COMPUTED),
    /** Contour error from unequal gains or dynamics of interpolating axes. */
    GAIN_MISMATCH("gain/dynamics mismatch", ValueOrigin.COMPUTED),
    /** Encoder or interpolation quantisation. */
    QUANTISATION("quantisation", ValueOrigin.COMPUTED),
    /** Vibration of a lightly damped mechanical mode excited by the path. */
    RESONANCE("resonance", ValueOrigin.COMPUTED),
    /** Spikes at velocity reversals caused by friction (quadrant glitches). */
    FRICTION_REVERSAL("friction reversal", ValueOrigin.COMPUTED),
    /** Path cut at a corner driven without deceleration. */
    CORNER("corner", ValueOrigin.COMPUTED),
    /** Geometric errors of the structure and guideways (straightness, squareness, scale). */
    GEOMETRIC("geometric", ValueOrigin.ENTERED),
    /** Thermal growth and drift. */
    THERMAL("thermal", ValueOrigin.ENTERED),
    /** A value measured on a machine (circular test, laser, ball bar). */
    MEASURED("measured", ValueOrigin.ENTERED),
    /** Any other value the user states. */
    USER_ENTERED("user-entered", ValueOrigin.ENTERED);

    private final String displayName;
    private final ValueOrigin usualOrigin;

    SourceKind(String displayName, ValueOrigin usualOrigin) {
        this.displayName = displayName;
        this.usualOrigin = usualOrigin;
    }

    /** Lower-case name for tables and reports. */
    public String displayName() {
        return displayName;
    }

    /** Whether lines of this kind are normally computed by an analysis or entered by the user. */
    public ValueOrigin usualOrigin() {
        return usualOrigin;
    }
}
