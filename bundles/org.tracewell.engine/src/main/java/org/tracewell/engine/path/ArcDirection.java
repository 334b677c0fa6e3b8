package org.tracewell.engine.path;

/** Sense of travel on an arc, seen from the positive normal of the contour plane (u × v). */
public enum ArcDirection {
    /** Clockwise: the travel angle decreases. */
    CW(-1),
    /** Counter-clockwise: the travel angle increases. */
    CCW(+1);

    private final int sign;

    ArcDirection(int sign) {
        this.sign = sign;
    }

    /** +1 for CCW, −1 for CW: the sign of the swept angle. */
    public int sign() {
        return sign;
    }

    public ArcDirection reversed() {
        return this == CW ? CCW : CW;
    }
}
