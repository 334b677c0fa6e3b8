package org.tracewell.engine.axis;

import org.tracewell.engine.poly.Polynomial;
import org.tracewell.engine.tf.TransferFunction;

/**
 * Linear mechanics of a drive with two inputs — motor torque T (N·m, or N for a linear motor)
 * and an external force F on the load (N, or N·m on a rotary table, positive in the direction of
 * positive motion) — written over one common polynomial Q(s):
 * <pre>
 *   ω_M = (A_L·T + ρ·K·F) / Q            motor velocity, rad/s
 *   x_L = (ρ·K·T + ρ²·A_M·F) / (s·Q)     load position, m
 *   x_M = ρ·θ_M = ρ·(A_L·T + ρ·K·F)/(s·Q) motor position in load units, m
 * </pre>
 * For a two-mass drive A_M = J_M s² + (b_M + c)s + k, A_L = J_L s² + (b_L + c)s + k, K = c s + k and
 * A_M·A_L − K² = s·Q (all in the motor-side rotary frame). For a rigid drive A_M = A_L = K = 1 and
 * Q = J s + b. {@code loadCompliance} is (A_M·A_L − K²)/Q: s for a two-mass drive, 0 for a rigid one;
 * the derived closed loops use it to cancel Q exactly instead of by root finding.
 *
 * @param q common denominator Q(s)
 * @param motorTorqueNumerator A_L(s)
 * @param coupling K(s)
 * @param loadForceNumerator A_M(s)
 * @param loadCompliance (A_M·A_L − K²)/Q
 * @param ratio ρ, load displacement per motor radian (m/rad, or rad/rad)
 */
public record DriveMechanics(Polynomial q, Polynomial motorTorqueNumerator, Polynomial coupling,
        Polynomial loadForceNumerator, Polynomial loadCompliance, double ratio) {

    public DriveMechanics {
        if (q.isZero() || motorTorqueNumerator.isZero() || coupling.isZero() || loadForceNumerator.isZero()) {
            throw new IllegalArgumentException("drive mechanics need non-zero polynomials Q, A_L, K and A_M");
        }
        Checks.positive("transmission ratio (load displacement per motor radian)", ratio, "m/rad");
    }

    /** Rigid drive: J·ω' = T + ρ·F − b·ω, everything reflected to the motor. */
    static DriveMechanics rigid(double inertia, double viscous, double ratio) {
        Polynomial one = Polynomial.ONE;
        return new DriveMechanics(Polynomial.ofAscending(viscous, inertia), one, one, one, Polynomial.ZERO, ratio);
    }

    /**
     * Two-mass drive in the motor-side rotary frame.
     *
     * @param motorInertia J_M, kg·m²
     * @param loadInertia J_L, kg·m² (reflected)
     * @param stiffness k, N·m/rad (reflected)
     * @param damping c, N·m·s/rad across the spring (reflected)
     * @param motorViscous b_M, N·m·s/rad
     * @param loadViscous b_L, N·m·s/rad (reflected)
     */
    static DriveMechanics twoMass(double motorInertia, double loadInertia, double stiffness, double damping,
            double motorViscous, double loadViscous, double ratio) {
        double jm = motorInertia;
        double jl = loadInertia;
        double k = stiffness;
        double c = damping;
        Polynomial am = Polynomial.ofAscending(k, motorViscous + c, jm);
        Polynomial al = Polynomial.ofAscending(k, loadViscous + c, jl);
        Polynomial coupling = Polynomial.ofAscending(k, c);
        // Q = (A_M·A_L − K²)/s written out, so that no cancellation error enters.
        Polynomial q = Polynomial.ofAscending(k * (motorViscous + loadViscous),
                k * (jm + jl) + motorViscous * loadViscous + c * (motorViscous + loadViscous),
                jm * (loadViscous + c) + jl * (motorViscous + c), jm * jl);
        return new DriveMechanics(q, al, coupling, am, Polynomial.S, ratio);
    }

    /** A plant known only by its torque → motor velocity transfer function N/D; the load follows rigidly. */
    static DriveMechanics ofVelocityTransfer(TransferFunction torqueToMotorVelocity, double ratio) {
        Polynomial n = torqueToMotorVelocity.numerator();
        return new DriveMechanics(torqueToMotorVelocity.denominator(), n, n, n, Polynomial.ZERO, ratio);
    }

    /** True when the load is elastically coupled to the motor (two-mass), false when rigid. */
    public boolean compliant() {
        return !loadCompliance.isZero();
    }

    /** ω_M/T, rad/s per N·m. */
    public TransferFunction torqueToMotorVelocity() {
        return TransferFunction.of(motorTorqueNumerator, q);
    }

    /** x_L/T, m per N·m. */
    public TransferFunction torqueToLoadPosition() {
        return TransferFunction.of(coupling.scale(ratio), q.multiplyByPowerOfS(1));
    }

    /** x_M/T (motor angle times ρ), m per N·m. */
    public TransferFunction torqueToMotorPosition() {
        return TransferFunction.of(motorTorqueNumerator.scale(ratio), q.multiplyByPowerOfS(1));
    }

    /** x_L/F without control (motor torque zero), m per N. */
    public TransferFunction loadForceToLoadPosition() {
        return TransferFunction.of(loadForceNumerator.scale(ratio * ratio), q.multiplyByPowerOfS(1));
    }

    /** ω_M/F without control, rad/s per N. */
    public TransferFunction loadForceToMotorVelocity() {
        return TransferFunction.of(coupling.scale(ratio), q);
    }
}
