package org.tracewell.core;

/** The caution shown wherever gains computed here could reach a real machine. */
public final class SafetyCaution {

    public static final String TEXT = "Tracewell computes servo gains, margins and contour errors from models. "
            + "A wrong model or wrong gains can make a real axis oscillate or run away. "
            + "Verify every setting on the machine at reduced speed and reduced torque, "
            + "with the safety functions active (limits, emergency stop, safe torque off), "
            + "and defer to local codes, the machine's safety standards and qualified personnel.";

    /** One line for the foot of views. */
    public static final String SHORT = "computed gains are design estimates. Verify on the machine at reduced speed "
            + "and torque with safety functions active; defer to local codes and qualified personnel.";

    private SafetyCaution() {
    }
}
