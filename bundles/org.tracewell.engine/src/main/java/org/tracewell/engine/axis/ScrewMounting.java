package org.tracewell.engine.axis;

/** How the ball screw is held axially. */
public enum ScrewMounting {
    /** One axially fixed bearing, the other end free or floating: k = E·A/a, a from the fixed bearing. */
    FIXED_FREE,
    /** Both ends axially fixed: k = E·A·L/(a·(L − a)), lowest (4·E·A/L) at mid-span. */
    FIXED_FIXED
}
