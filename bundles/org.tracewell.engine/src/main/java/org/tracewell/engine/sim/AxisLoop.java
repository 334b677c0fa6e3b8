package org.tracewell.engine.sim;

import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.MatrixUtils;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.SingularMatrixException;

/**
 * The closed position loop of one axis as a continuous linear system from the reference to the
 * actual position. Its three inputs are the reference position r, velocity ṙ and acceleration r̈
 * (metres, m/s, m/s²); the output is the actual position y (metres).
 * <p>
 * Loops built by {@link #closePositionLoop} have this structure (P the plant from velocity command
 * to position, with its velocity loop inside):
 * <pre>
 *                       k_vff·ṙ + k_aff·T_a·r̈
 *                                 │
 *   r ──►(+)── Kv ──────────────►(+)── u_v ──► P(s) ──┬──► y
 *         ▲ −                                          │
 *         └────────────────────────────────────────────┘
 * </pre>
 * The feedforward is injected as a velocity command: k_vff = 1 cancels the velocity demand, and
 * k_aff = 1 with T_a equal to the velocity loop's lag time constant cancels its lag, so for
 * P = 1/(s(T s + 1)) full feedforward (1, 1, T_a = T) tracks any reference exactly.
 */
public final class AxisLoop {

    private final String name;
    private final ContinuousStateSpace system;

    private AxisLoop(String name, ContinuousStateSpace system) {
        this.name = name;
        this.system = system;
    }

    /**
     * A closed loop given directly as a state-space system with 1 to 3 inputs in the order r, ṙ, r̈;
     * missing inputs are taken as unused (zero columns).
     */
    public static AxisLoop of(String name, ContinuousStateSpace closedLoop) {
        int m = closedLoop.inputCount();
        if (m < 1 || m > 3) {
            throw new IllegalArgumentException("a closed axis loop has 1 to 3 inputs (r, ṙ, r̈), got " + m);
        }
        int n = closedLoop.stateCount();
        double[][] b = new double[n][3];
        double[] d = new double[3];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < m; j++) {
                b[i][j] = closedLoop.b(i, j);
            }
        }
        for (int j = 0; j < m; j++) {
            d[j] = closedLoop.d(j);
        }
        return new AxisLoop(name, new ContinuousStateSpace(closedLoop.a(), b, closedLoop.c(), d));
    }

    /**
     * Closes the position loop with gain Kv around {@code plant}, a single-input system from velocity
     * command (m/s) to position (m) with no feedthrough, and adds the reference feedforward
     * u_v = Kv·(r − y) + k_vff·ṙ + k_aff·T_a·r̈.
     *
     * @param kv                       position gain, 1/s, &gt; 0
     * @param velocityFeedforward      fraction k_vff, 0..1
     * @param accelerationFeedforward  fraction k_aff, 0..1
     * @param accelerationTimeConstant T_a in seconds, ≥ 0: the lag the acceleration feedforward cancels
     */
    public static AxisLoop closePositionLoop(String name, ContinuousStateSpace plant, double kv, double velocityFeedforward,
                                             double accelerationFeedforward, double accelerationTimeConstant) {
        if (plant.inputCount() != 1) {
            throw new IllegalArgumentException("the plant must have one input (velocity command), got " + plant.inputCount());
        }
        if (plant.d(0) != 0) {
            throw new IllegalArgumentException("the plant from velocity command to position must have no feedthrough, D = "
                    + plant.d(0));
        }
        checkGain(kv);
        checkFraction("velocity feedforward", velocityFeedforward);
        checkFraction("acceleration feedforward", accelerationFeedforward);
        if (!(accelerationTimeConstant >= 0) || !Double.isFinite(accelerationTimeConstant)) {
            throw new IllegalArgumentException("acceleration feedforward time constant must be finite and >= 0 s, got "
                    + accelerationTimeConstant);
        }
        int n = plant.stateCount();
        double[][] a = plant.a();
        double[][] b = new double[n][3];
        for (int i = 0; i < n; i++) {
            double bi = plant.b(i, 0);
            for (int j = 0; j < n; j++) {
                a[i][j] -= kv * bi * plant.c(j);
            }
            b[i][0] = bi * kv;
            b[i][1] = bi * velocityFeedforward;
            b[i][2] = bi * accelerationFeedforward * accelerationTimeConstant;
        }
        return new AxisLoop(name, new ContinuousStateSpace(a, b, plant.c(), new double[3]));
    }

    /**
     * The standard first-order position loop Kv/(s + Kv): position gain around an ideal velocity loop
     * (plant 1/s), with velocity feedforward k_vff (y' = Kv·(r − y) + k_vff·ṙ).
     */
    public static AxisLoop firstOrder(String name, double kv, double velocityFeedforward) {
        ContinuousStateSpace integrator = new ContinuousStateSpace(new double[][] {{0}}, new double[][] {{1}},
                new double[] {1}, new double[] {0});
        return closePositionLoop(name, integrator, kv, velocityFeedforward, 0, 0);
    }

    /** {@link #firstOrder(String, double, double)} without feedforward. */
    public static AxisLoop firstOrder(String name, double kv) {
        return firstOrder(name, kv, 0);
    }

    /**
     * The type-1 loop with open loop Kv/(s(T s + 1)) closed: position gain around a velocity loop
     * modelled as a first-order lag of time constant T. States: position, velocity. Acceleration
     * feedforward uses T_a = T.
     */
    public static AxisLoop withVelocityLag(String name, double kv, double lagTimeConstant, double velocityFeedforward,
                                           double accelerationFeedforward) {
        if (!(lagTimeConstant > 0) || !Double.isFinite(lagTimeConstant)) {
            throw new IllegalArgumentException("velocity lag time constant must be finite and > 0 s, got " + lagTimeConstant);
        }
        ContinuousStateSpace plant = new ContinuousStateSpace(
                new double[][] {{0, 1}, {0, -1 / lagTimeConstant}},
                new double[][] {{0}, {1 / lagTimeConstant}},
                new double[] {1, 0}, new double[] {0});
        return closePositionLoop(name, plant, kv, velocityFeedforward, accelerationFeedforward, lagTimeConstant);
    }

    public String name() {
        return name;
    }

    /** The closed loop, inputs (r, ṙ, r̈), output y. */
    public ContinuousStateSpace system() {
        return system;
    }

    public int stateCount() {
        return system.stateCount();
    }

    /**
     * The state at rest with the output at {@code position}: solves A x = −B·(r, 0, 0).
     *
     * @throws IllegalStateException when A is singular (the loop has no unique rest state)
     */
    public double[] restState(double position) {
        int n = system.stateCount();
        RealMatrix a = MatrixUtils.createRealMatrix(system.a());
        double[] rhs = new double[n];
        for (int i = 0; i < n; i++) {
            rhs[i] = -system.b(i, 0) * position;
        }
        try {
            return new LUDecomposition(a).getSolver().solve(MatrixUtils.createRealVector(rhs)).toArray();
        } catch (SingularMatrixException e) {
            throw new IllegalStateException("axis loop '" + name + "' has a singular A matrix, so it has no rest state; "
                    + "a closed, stable position loop is needed", e);
        }
    }

    private static void checkGain(double kv) {
        if (!(kv > 0) || !Double.isFinite(kv)) {
            throw new IllegalArgumentException("position gain Kv must be finite and > 0 1/s, got " + kv);
        }
    }

    private static void checkFraction(String what, double f) {
        if (!(f >= 0 && f <= 1)) {
            throw new IllegalArgumentException(what + " fraction must lie in 0..1, got " + f);
        }
    }

    @Override
    public String toString() {
        return "AxisLoop[" + name + ", " + system.stateCount() + " states]";
    }
}
