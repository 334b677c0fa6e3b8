package org.tracewell.core.variation;

import org.tracewell.engine.budget.LimitBound;

/** The loop figures of one axis a study can collect, with the definitions of the axis analysis. */
public enum AxisQuantity {
    KV("Kv", "1/s", "(m/min)/mm", "1/s", "position-loop gain Kv", LimitBound.AT_LEAST),
    PHASE_MARGIN("phaseMargin", "rad", "deg", "deg", "position-loop phase margin (dead time exact)", LimitBound.AT_LEAST),
    GAIN_MARGIN("gainMargin", "1", "dB", "dB", "position-loop gain margin (dead time exact)", LimitBound.AT_LEAST),
    BANDWIDTH("bandwidth", "Hz", "Hz", "Hz", "position-loop −3 dB bandwidth", LimitBound.AT_LEAST),
    VELOCITY_PHASE_MARGIN("velocityPhaseMargin", "rad", "deg", "deg", "velocity-loop phase margin (dead time exact)",
            LimitBound.AT_LEAST),
    VELOCITY_GAIN_MARGIN("velocityGainMargin", "1", "dB", "dB", "velocity-loop gain margin (dead time exact)",
            LimitBound.AT_LEAST),
    VELOCITY_BANDWIDTH("velocityBandwidth", "Hz", "Hz", "Hz", "velocity-loop −3 dB bandwidth", LimitBound.AT_LEAST),
    FOLLOWING_ERROR("followingError", "m", "mm", "deg", "steady following error v/Kv_eff at the axis max velocity",
            LimitBound.AT_MOST),
    SETTLING_TIME("settlingTime", "s", "ms", "ms", "2 % settling time of the position-loop step", LimitBound.AT_MOST);

    private final String token;
    private final String siUnit;
    private final String displayUnit;
    private final String rotaryDisplayUnit;
    private final String description;
    private final LimitBound good;

    AxisQuantity(String token, String siUnit, String displayUnit, String rotaryDisplayUnit, String description,
            LimitBound good) {
        this.token = token;
        this.siUnit = siUnit;
        this.displayUnit = displayUnit;
        this.rotaryDisplayUnit = rotaryDisplayUnit;
        this.description = description;
        this.good = good;
    }

    /** How metric names spell it: {@code axis[NAME].phaseMargin}. */
    public String token() {
        return token;
    }

    /** SI unit on a linear axis (a following error of a rotary axis is in rad). */
    public String siUnit(boolean rotary) {
        return rotary && this == FOLLOWING_ERROR ? "rad" : siUnit;
    }

    public String displayUnit(boolean rotary) {
        return rotary ? rotaryDisplayUnit : displayUnit;
    }

    public String description() {
        return description;
    }

    /** Which side of a limit is good: AT_MOST for errors and times, AT_LEAST for gains, margins and bandwidths. */
    public LimitBound goodSide() {
        return good;
    }
}
