package org.tracewell.engine.axis;

import org.tracewell.engine.sim.ContinuousStateSpace;
import org.tracewell.engine.sim.DiscreteStateSpace;
import org.tracewell.engine.tf.StateSpace;
import org.tracewell.engine.tf.TransferFunction;
import org.tracewell.engine.trajectory.Trajectory;

/**
 * Fixed-step simulation of one axis with the nonlinear terms the linear loops leave out: Coulomb
 * friction (with a stick band, after Karnopp), torque and velocity-command saturation, and encoder
 * quantisation of the measured position.
 * <p>
 * The controllers run as sampled loops: the position loop every T_p, the velocity loop every T_v
 * (T_p an integer multiple of T_v), each applying its output one sample after it read its inputs
 * (zero-order hold plus one sample of computation — what the linear model approximates as 1.5·T of
 * dead time). The filter chain is discretised exactly for its held input. The mechanics and the
 * current lag are integrated between velocity samples with {@code substeps} semi-implicit Euler steps.
 * The velocity feedback is the sampled motor velocity (a resolver-grade estimate), the position
 * feedback the quantised position at the chosen sensor. The loop over samples runs on primitive
 * arrays and allocates nothing.
 * <p>
 * Supported plants: the rigid drives and {@link TwoMassScrewDrive}; an explicit transfer-function
 * plant has no physical states to put friction on and is refused.
 */
public final class NonlinearAxisSimulator {

    /**
     * Nonlinear limits.
     *
     * @param torqueLimit |torque command| limit, N·m (N for a linear motor); +∞ for none
     * @param velocityCommandLimit |motor velocity command| limit, rad/s (m/s); +∞ for none
     * @param encoderResolution position quantum at the sensor, m (rad on a rotary table); 0 for ideal
     */
    public record Limits(double torqueLimit, double velocityCommandLimit, double encoderResolution) {
        public Limits {
            Checks.positiveOrInfinite("torque limit", torqueLimit, "N·m");
            Checks.positiveOrInfinite("velocity command limit", velocityCommandLimit, "rad/s");
            Checks.nonNegative("encoder resolution", encoderResolution, "m");
        }

        /** No saturation, ideal encoder. */
        public static final Limits NONE = new Limits(Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, 0);
    }

    /** Half-width of the stick band as a fraction of a velocity scale (1e-6 m/s at the load). */
    private static final double STICK_VELOCITY = 1e-6;

    private final AxisModel axis;
    private final Limits limits;
    private final int substeps;
    private final int velocityStepsPerPositionStep;
    private final boolean compliant;
    // mechanics in the motor-side frame
    private final double jm;
    private final double jl;
    private final double k;
    private final double c;
    private final double bl;
    private final double coulomb;
    private final double rho;
    private final double currentBandwidth;
    // filter chain, discretised at T_v, flat row-major
    private final int nf;
    private final double[] fPhi;
    private final double[] fGamma;
    private final double[] fC;
    private final double fD;

    private NonlinearAxisSimulator(AxisModel axis, Limits limits, int substeps) {
        this.axis = axis;
        this.limits = limits;
        this.substeps = substeps;
        CascadeController ctl = axis.controller();
        double tp = ctl.positionSamplePeriod();
        double tv = ctl.velocitySamplePeriod();
        Checks.positive("position-loop sample period (the nonlinear simulation needs sampled loops)", tp, "s");
        Checks.positive("velocity-loop sample period (the nonlinear simulation needs sampled loops)", tv, "s");
        long ratio = Math.round(tp / tv);
        if (ratio < 1 || Math.abs(ratio * tv - tp) > 1e-9 * tp) {
            throw new IllegalArgumentException("position-loop period " + tp + " s must be an integer multiple of the"
                    + " velocity-loop period " + tv + " s");
        }
        this.velocityStepsPerPositionStep = (int) ratio;
        AxisPlant plant = axis.plant();
        DriveMechanics mech = plant.mechanics();
        this.rho = mech.ratio();
        this.coulomb = plant.coulombFrictionTorque();
        this.currentBandwidth = plant.currentLoopBandwidth();
        if (plant instanceof TwoMassScrewDrive two) {
            compliant = true;
            jm = two.motorSideInertia();
            jl = two.loadSideInertia();
            k = two.reflectedStiffness();
            c = two.axialDamping() * rho * rho;
            bl = two.viscousFriction() * rho * rho;
        } else if (plant instanceof TransferFunctionPlant) {
            throw new IllegalArgumentException("axis '" + axis.name() + "': the nonlinear simulation needs a physical"
                    + " plant (rigid or two-mass drive), not an explicit transfer function");
        } else {
            compliant = false;
            jm = plant.equivalentInertia();
            jl = 0;
            k = 0;
            c = 0;
            bl = mech.q().coefficient(0); // rigid: Q = J·s + b, all friction on the one mass
        }
        TransferFunction filters = ctl.filterChain();
        if (filters.denominator().degree() == 0) {
            nf = 0;
            fPhi = new double[0];
            fGamma = new double[0];
            fC = new double[0];
            fD = filters.dcGain();
        } else {
            StateSpace ss = StateSpace.controllableCanonical(filters);
            nf = ss.order();
            ContinuousStateSpace css = new ContinuousStateSpace(ss.a().getData(), ss.b().getData(), ss.c().getRow(0),
                    new double[] {ss.d()});
            DiscreteStateSpace dss = DiscreteStateSpace.zeroOrderHold(css, tv);
            fPhi = new double[nf * nf];
            fGamma = new double[nf];
            fC = css.c();
            fD = ss.d();
            for (int i = 0; i < nf; i++) {
                for (int j = 0; j < nf; j++) {
                    fPhi[i * nf + j] = dss.phi(i, j);
                }
                fGamma[i] = dss.gamma(i, 0);
            }
        }
    }

    /**
     * @param substeps integration steps per velocity sample, ≥ 1; choose h = T_v/substeps well below the
     *        period of the fastest mode (current loop, resonance)
     */
    public static NonlinearAxisSimulator of(AxisModel axis, Limits limits, int substeps) {
        if (substeps < 1) {
            throw new IllegalArgumentException("substeps per velocity sample must be >= 1, got " + substeps);
        }
        return new NonlinearAxisSimulator(axis, limits, substeps);
    }

    /**
     * Simulates one axis of a sampled trajectory, whose sample period must equal the position-loop period.
     */
    public NonlinearTrackingResult simulate(Trajectory trajectory, int axisIndex) {
        double tp = axis.controller().positionSamplePeriod();
        if (Math.abs(trajectory.samplePeriod() - tp) > 1e-12 * tp) {
            throw new IllegalArgumentException("trajectory sample period " + trajectory.samplePeriod()
                    + " s must equal the position-loop period " + tp + " s of axis '" + axis.name() + "'");
        }
        int n = trajectory.sampleCount();
        double[] r = new double[n];
        double[] rd = new double[n];
        double[] rdd = new double[n];
        trajectory.readPositions(axisIndex, 0, r, n);
        trajectory.readVelocities(axisIndex, 0, rd, n);
        trajectory.readAccelerations(axisIndex, 0, rdd, n);
        return simulate(r, rd, rdd);
    }

    /**
     * Simulates the axis starting at rest at {@code position[0]}.
     *
     * @param position reference position per position-loop sample, m
     * @param velocity reference velocity, m/s (for the velocity feedforward)
     * @param acceleration reference acceleration, m/s² (for the acceleration feedforward)
     */
    public NonlinearTrackingResult simulate(double[] position, double[] velocity, double[] acceleration) {
        int count = position.length;
        if (velocity.length != count || acceleration.length != count) {
            throw new IllegalArgumentException("reference position, velocity and acceleration need equal lengths, got "
                    + count + ", " + velocity.length + ", " + acceleration.length);
        }
        CascadeController ctl = axis.controller();
        double tv = ctl.velocitySamplePeriod();
        double h = tv / substeps;
        double kv = ctl.positionGain();
        double kp = ctl.velocityGain();
        double ti = ctl.velocityIntegralTime();
        double vff = ctl.velocityFeedforward();
        double aff = ctl.accelerationFeedforward();
        double jEq = axis.plant().equivalentInertia();
        double q = limits.encoderResolution();
        double tauLimit = limits.torqueLimit();
        double wLimit = limits.velocityCommandLimit();
        double lagFactor = Double.isInfinite(currentBandwidth) ? 1.0 : 1.0 - Math.exp(-currentBandwidth * h);
        boolean loadSensor = axis.sensor() == PositionSensor.LOAD;

        double[] load = new double[count];
        double[] torque = new double[count];
        double[] fx = new double[nf];
        double[] fNext = new double[nf];
        // states: motor angle/velocity, load angle/velocity (motor frame), actual torque, PI integral
        double thM = position[0] / rho;
        double thL = thM;
        double wM = 0;
        double wL = 0;
        double tau = 0;
        double integral = 0;
        // outputs held between samples (one sample of computation delay)
        double wCmdApplied = 0;
        double ffTorqueApplied = 0;
        double tauCmdApplied = 0;
        for (int kSample = 0; kSample < count; kSample++) {
            double xL = (compliant ? thL : thM) * rho;
            load[kSample] = xL;
            torque[kSample] = tauCmdApplied;
            // position controller reads now, its output applies from the next position sample
            double xm = (loadSensor && compliant ? thL : thM) * rho;
            if (q > 0) {
                xm = Math.rint(xm / q) * q;
            }
            double wCmdNew = (kv * (position[kSample] - xm) + vff * velocity[kSample]) / rho;
            if (wCmdNew > wLimit) {
                wCmdNew = wLimit;
            } else if (wCmdNew < -wLimit) {
                wCmdNew = -wLimit;
            }
            double ffTorqueNew = aff * jEq * acceleration[kSample] / rho;
            for (int v = 0; v < velocityStepsPerPositionStep; v++) {
                // velocity controller: PI on the sampled motor velocity, then the filter chain
                double e = wCmdApplied - wM;
                double piOut = kp * (e + (Double.isInfinite(ti) ? 0 : integral / ti));
                double filtered = fD * piOut;
                for (int i = 0; i < nf; i++) {
                    filtered += fC[i] * fx[i];
                }
                for (int i = 0; i < nf; i++) {
                    double sum = fGamma[i] * piOut;
                    for (int j = 0; j < nf; j++) {
                        sum += fPhi[i * nf + j] * fx[j];
                    }
                    fNext[i] = sum;
                }
                System.arraycopy(fNext, 0, fx, 0, nf);
                double cmd = filtered + ffTorqueApplied;
                boolean saturated = false;
                if (cmd > tauLimit) {
                    cmd = tauLimit;
                    saturated = true;
                } else if (cmd < -tauLimit) {
                    cmd = -tauLimit;
                    saturated = true;
                }
                // conditional integration: no wind-up while the torque is limited in the error's direction
                if (!saturated || Math.signum(e) != Math.signum(cmd)) {
                    integral += e * tv;
                }
                // integrate the mechanics over one velocity period with the previous command held
                for (int s = 0; s < substeps; s++) {
                    tau += (tauCmdApplied - tau) * lagFactor;
                    if (compliant) {
                        double spring = k * (thM - thL) + c * (wM - wL);
                        wM += h * (tau - spring) / jm;
                        double net = spring - bl * wL;
                        wL = frictionStep(wL, net, jl, h);
                        thM += h * wM;
                        thL += h * wL;
                    } else {
                        double net = tau - bl * wM;
                        wM = frictionStep(wM, net, jm, h);
                        thM += h * wM;
                    }
                }
                tauCmdApplied = cmd;
            }
            wCmdApplied = wCmdNew;
            ffTorqueApplied = ffTorqueNew;
        }
        return new NonlinearTrackingResult(axis.name(), ctl.positionSamplePeriod(), position.clone(), load, torque);
    }

    /**
     * One semi-implicit step of J·ω' = net − T_c·sign(ω) with a stick band: a mass at (near) rest stays
     * at rest while |net| ≤ T_c, and friction never reverses the velocity within a step.
     */
    private double frictionStep(double w, double net, double inertia, double h) {
        double stick = STICK_VELOCITY / rho;
        if (Math.abs(w) <= stick) {
            if (Math.abs(net) <= coulomb) {
                return 0.0;
            }
            return h * (net - Math.copySign(coulomb, net)) / inertia;
        }
        double next = w + h * (net - Math.copySign(coulomb, w)) / inertia;
        // Coulomb friction alone cannot carry the mass through zero velocity within one step
        if (Math.signum(next) != Math.signum(w) && Math.abs(net) <= coulomb) {
            return 0.0;
        }
        return next;
    }
}
