package org.tracewell.engine.measured;

/** The plant structure fitted to a measured torque-command → motor-velocity response. */
public enum PlantFitModel {
    /**
     * Rigid drive ω_M/T = 1/(J·s + b): total inertia J seen by the motor and viscous damping b (its gain is 1/J
     * above the corner b/J).
     */
    RIGID("rigid inertia", "1/(J·s + b)"),
    /**
     * Two-mass drive: motor inertia J_M and load inertia J_L joined by a stiffness k with damping c, viscous damping
     * b at the load; fitted as total inertia, anti-resonance, resonance and the damping ratio of the anti-resonance.
     */
    TWO_MASS("two-mass resonance", "(J_L·s² + (b + c)·s + k) / (J_M·J_L·s³ + (J_M·(b + c) + J_L·c)·s² + (k·J + c·b)·s + k·b)");

    private final String displayName;
    private final String formula;

    PlantFitModel(String displayName, String formula) {
        this.displayName = displayName;
        this.formula = formula;
    }

    public String displayName() {
        return displayName;
    }

    /** ω_M/T of the model, mechanics only (the current-loop lag and any dead time multiply it). */
    public String formula() {
        return formula;
    }
}
