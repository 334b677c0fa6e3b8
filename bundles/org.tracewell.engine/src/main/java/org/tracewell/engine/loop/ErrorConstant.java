package org.tracewell.engine.loop;

/** Static error constant named after the reference it governs (Nise, ch. 7). */
public enum ErrorConstant {
    /** Position constant, type-0 loops, step reference. */
    KP(0),
    /** Velocity constant, type-1 loops, ramp reference. */
    KV(1),
    /** Acceleration constant, type-2 loops, parabola reference a·t²/2. */
    KA(2);

    private final int systemType;

    ErrorConstant(int systemType) {
        this.systemType = systemType;
    }

    /** The system type for which this constant is finite and non-zero. */
    public int systemType() {
        return systemType;
    }

    /** The constant of {@code s}. */
    public double of(SteadyState s) {
        return switch (this) {
            case KP -> s.kp();
            case KV -> s.kv();
            case KA -> s.ka();
        };
    }
}
