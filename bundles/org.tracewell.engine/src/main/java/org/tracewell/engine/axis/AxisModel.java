package org.tracewell.engine.axis;

import java.util.Optional;
import java.util.OptionalDouble;

import org.tracewell.engine.loop.LoopAnalysis;
import org.tracewell.engine.loop.LoopAnalyzer;
import org.tracewell.engine.loop.LoopFrequencyAnalysis;
import org.tracewell.engine.loop.Margins;
import org.tracewell.engine.loop.SteadyState;
import org.tracewell.engine.poly.Polynomial;
import org.tracewell.engine.sim.AxisLoop;
import org.tracewell.engine.sim.ContinuousStateSpace;
import org.tracewell.engine.tf.PadeDelay;
import org.tracewell.engine.tf.TransferFunction;

/**
 * One servo axis: plant, cascade controller and position sensor, and every loop derived from them.
 * <p>
 * Loops are built from polynomials in closed form (see the algebra in {@link DriveMechanics} and
 * {@link CascadeController}) so that the mechanical denominator Q and the controller denominators
 * cancel exactly rather than by root finding. With Q, A_L, K, A_M the mechanics, C_v = n_c/d_c the
 * velocity controller, D_v = n_v/d_v and D_p = n_p/d_p the loop delays, 1/d_i the current lag,
 * n = n_c·n_v, d = d_c·d_v·d_i and N_m the sensor numerator (A_L for the motor encoder, K for a load
 * scale):
 * <pre>
 *   Φ_v = d·Q + n·A_L                          velocity-loop characteristic polynomial
 *   Φ_p = d_p·s·Φ_v + Kv·n_p·N_m·n             position-loop characteristic polynomial
 *   M   = n_c·(Kv + k_vff·s) + d_c·k_aff·J·s²  reference numerator with feedforward
 *   x_L/r = K·n_p·n_v·M / Φ_p
 *   x_L/F = ρ²·[(A_M·d + n·E)·d_p + χ·Kv·n·n_p] / Φ_p,   E = (A_M·A_L − K²)/Q,
 *           χ = 1 for a motor encoder on a compliant drive, else 0
 * </pre>
 * Open loops keep their own dead time exact (frequency response, margins); wherever a delay sits
 * inside a closed loop it is replaced by its diagonal Padé approximant of order {@link #padeOrder()}.
 * All positions are load positions in metres (radians for a rotary table); the following error is
 * reference minus load position.
 *
 * @param name axis name (X, Y, Z, A, C, X2…)
 * @param plant drive plant
 * @param controller cascade controller
 * @param sensor position-loop sensor
 * @param padeOrder Padé order for delays inside closed loops, 1..{@value PadeDelay#MAX_ORDER}
 */
public record AxisModel(String name, AxisPlant plant, CascadeController controller, PositionSensor sensor,
        int padeOrder) {

    /** Padé order used unless another is chosen: ample for delays below a quarter of the loop period. */
    public static final int DEFAULT_PADE_ORDER = 2;

    public AxisModel {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("axis name must not be blank, got '" + name + "'");
        }
        if (plant == null || controller == null || sensor == null) {
            throw new IllegalArgumentException("axis '" + name + "' needs a plant, a controller and a sensor, got "
                    + plant + ", " + controller + ", " + sensor);
        }
        if (padeOrder < 1 || padeOrder > PadeDelay.MAX_ORDER) {
            throw new IllegalArgumentException("Padé order of axis '" + name + "' must be 1.." + PadeDelay.MAX_ORDER
                    + ", got " + padeOrder);
        }
    }

    /** Axis with a motor encoder and the default Padé order. */
    public static AxisModel of(String name, AxisPlant plant, CascadeController controller) {
        return new AxisModel(name, plant, controller, PositionSensor.MOTOR, DEFAULT_PADE_ORDER);
    }

    public AxisModel withSensor(PositionSensor s) {
        return new AxisModel(name, plant, controller, s, padeOrder);
    }

    public AxisModel withController(CascadeController c) {
        return new AxisModel(name, plant, c, sensor, padeOrder);
    }

    public AxisModel withPadeOrder(int order) {
        return new AxisModel(name, plant, controller, sensor, order);
    }

    // ---- building blocks -------------------------------------------------------------------

    /** Numerator and denominator of one rational factor. */
    private record Fraction(Polynomial num, Polynomial den) {
        static Fraction of(TransferFunction tf) {
            return new Fraction(tf.numerator(), tf.denominator());
        }
    }

    private Fraction delay(double seconds) {
        if (seconds == 0) {
            return new Fraction(Polynomial.ONE, Polynomial.ONE);
        }
        return Fraction.of(PadeDelay.of(seconds, padeOrder));
    }

    /** All polynomials of the closed-form loop algebra, built once per call. */
    private final class Parts {
        final DriveMechanics mech = plant.mechanics();
        final Fraction c = Fraction.of(controller.velocityController());
        final Fraction dv = delay(controller.velocityDeadTime());
        final Fraction dp = delay(controller.positionDeadTime());
        final Polynomial di = plant.currentLoopLagDenominator();
        final Polynomial n = c.num.multiply(dv.num);
        final Polynomial d = c.den.multiply(dv.den).multiply(di);
        final Polynomial sensorNumerator = sensor == PositionSensor.MOTOR ? mech.motorTorqueNumerator() : mech.coupling();
        final Polynomial phiV = d.multiply(mech.q()).add(n.multiply(mech.motorTorqueNumerator()));
        final double kv = controller.positionGain();
        final Polynomial positionFeedback = sensorNumerator.multiply(n).multiply(dp.num).scale(kv);
        final Polynomial phiP = dp.den.multiply(phiV).multiplyByPowerOfS(1).add(positionFeedback);
        final Polynomial phiPBound = dp.den.abs().multiply(d.abs().multiply(mech.q().abs())
                .add(n.abs().multiply(mech.motorTorqueNumerator().abs()))).multiplyByPowerOfS(1)
                .add(positionFeedback.abs());
        final Polynomial outputCommon = mech.coupling().multiply(dp.num).multiply(dv.num);

        /** M(s) for the given feedforward fractions. */
        Polynomial referenceNumerator(double vff, double aff) {
            Polynomial m = c.num.multiply(Polynomial.ofAscending(kv, vff));
            if (aff != 0) {
                m = m.add(c.den.multiply(Polynomial.S.multiplyByPowerOfS(1)).scale(aff * plant.equivalentInertia()));
            }
            return m;
        }
    }

    // ---- loops -------------------------------------------------------------------------------

    /** Velocity open loop L_v = C_v·e^(−s·T_dv)·(current lag)·ω_M/T, dead time exact. */
    public TransferFunction velocityOpenLoop() {
        return controller.velocityController().withDelay(controller.velocityDeadTime())
                .series(plant.torqueCommandToMotorVelocity());
    }

    /** Closed velocity loop ω_cmd → ω_M, n·A_L/Φ_v (delay as Padé). */
    public TransferFunction velocityClosedLoop() {
        Parts p = new Parts();
        return TransferFunction.of(p.n.multiply(p.mech.motorTorqueNumerator()), p.phiV);
    }

    /**
     * Position open loop around the closed velocity loop, Kv·N_m·n/(s·Φ_v)·e^(−s·T_dp): measured position
     * per position error; the position dead time exact, the velocity delay inside as Padé.
     */
    public TransferFunction positionOpenLoop() {
        Parts p = new Parts();
        TransferFunction loop = TransferFunction.of(p.sensorNumerator.multiply(p.n).scale(p.kv),
                p.phiV.multiplyByPowerOfS(1));
        return loop.withDelay(controller.positionDeadTime());
    }

    /** Closed loop reference → load position with the controller's feedforward. */
    public TransferFunction referenceToPosition() {
        Parts p = new Parts();
        return TransferFunction.of(p.outputCommon.multiply(p.referenceNumerator(controller.velocityFeedforward(),
                controller.accelerationFeedforward())), p.phiP);
    }

    /**
     * Error transfer E/R = 1 − x_L/r with the controller's feedforward; empty when the error is
     * identically zero (full feedforward on a delay-free, frictionless rigid drive tracks exactly).
     */
    public Optional<TransferFunction> errorTransfer() {
        Parts p = new Parts();
        Polynomial tracked = p.outputCommon.multiply(p.referenceNumerator(controller.velocityFeedforward(),
                controller.accelerationFeedforward()));
        Polynomial e = cleanCancellation(p.phiP.subtract(tracked), p.phiPBound.add(tracked.abs()));
        return e.isZero() ? Optional.empty() : Optional.of(TransferFunction.of(e, p.phiP));
    }

    /** Low-order coefficients that are rounding noise of a cancellation set to exactly zero. */
    private static Polynomial cleanCancellation(Polynomial value, Polynomial bound) {
        double[] c = value.ascendingCoefficients();
        for (int k = 0; k < c.length; k++) {
            if (Math.abs(c[k]) <= 1e-10 * bound.coefficient(k)) {
                c[k] = 0.0;
            } else {
                break;
            }
        }
        return c.length == 0 ? Polynomial.ZERO : Polynomial.ofAscending(c);
    }

    /**
     * Type and constants of the load-position error E/R with the controller's feedforward (the effective type), as
     * {@link #analyze()} reports them in {@link AxisDynamics#tracking()}.
     *
     * @param closedLoopStable whether the position closed loop is stable (errors are given only then)
     */
    public SteadyState trackingSteadyState(boolean closedLoopStable) {
        return errorSteadyState(controller.velocityFeedforward(), controller.accelerationFeedforward(),
                closedLoopStable);
    }

    private SteadyState errorSteadyState(double vff, double aff, boolean stable) {
        Parts p = new Parts();
        Polynomial tracked = p.outputCommon.multiply(p.referenceNumerator(vff, aff));
        return SteadyState.ofErrorTransfer(p.phiP.subtract(tracked), p.phiPBound.add(tracked.abs()), p.phiP, stable);
    }

    /** Load force → load position (compliance), m/N (rad per N·m on a rotary table). */
    public TransferFunction compliance() {
        Parts p = new Parts();
        Polynomial z = p.mech.loadForceNumerator().multiply(p.d).add(p.n.multiply(p.mech.loadCompliance()))
                .multiply(p.dp.den);
        if (sensor == PositionSensor.MOTOR && p.mech.compliant()) {
            z = z.add(p.n.multiply(p.dp.num).scale(p.kv));
        }
        double rho = p.mech.ratio();
        return TransferFunction.of(z.scale(rho * rho), p.phiP);
    }

    /** Dynamic stiffness F/x_L = 1/compliance, N/m (improper: evaluate it, do not realise it). */
    public TransferFunction dynamicStiffness() {
        TransferFunction c = compliance();
        return TransferFunction.of(c.denominator(), c.numerator());
    }

    /**
     * Static stiffness against a constant load force, N/m: +∞ with an integrating velocity loop.
     */
    public double staticStiffness() {
        double dc = compliance().dcGain();
        return dc == 0 ? Double.POSITIVE_INFINITY : 1.0 / dc;
    }

    // ---- analysis ----------------------------------------------------------------------------

    /**
     * Kv of the position loop, 1/s: its velocity error constant, as {@link AxisDynamics#positionGain()} reports it
     * after {@link #analyze()}, from the coefficients alone (no roots, no frequency response), so a contour's
     * closed-form estimates need not wait for the whole analysis. The constant does not depend on stability.
     */
    public double positionLoopKv() {
        TransferFunction loop = positionOpenLoop().withPadeDelay(padeOrder);
        return SteadyState.ofUnityFeedback(TransferFunction.of(loop.numerator(), loop.denominator()), true).kv();
    }

    /** Analyses both loops and the reference tracking. */
    public AxisDynamics analyze() {
        // Both loops go to the analyzer with their dead time already as Padé of this model's order: its own
        // order-6 approximant (on top of the inner one, for the position loop) makes the root finding for the
        // gain range needlessly hard. The margins are recomputed with the dead times exact.
        TransferFunction velocityController = controller.velocityController().withDelay(controller.velocityDeadTime());
        LoopAnalysis velocity = LoopAnalyzer.analyzeWithPlant(velocityController.withPadeDelay(padeOrder),
                plant.torqueCommandToMotorVelocity(), null);
        Margins exactVelocityMargins = LoopFrequencyAnalysis.margins(velocityOpenLoop());
        TransferFunction positionLoop = positionOpenLoop();
        LoopAnalysis position = LoopAnalyzer.analyze(positionLoop.withPadeDelay(padeOrder), null);
        Margins exactPositionMargins = LoopFrequencyAnalysis.margins(positionLoop);
        // The position closed loop contains the velocity loop's poles, so its stability decides both.
        boolean stable = position.stable();
        SteadyState withFf = errorSteadyState(controller.velocityFeedforward(), controller.accelerationFeedforward(),
                stable);
        SteadyState withoutFf = errorSteadyState(0, 0, stable);
        Optional<Resonance> resonance = plant.resonance();
        OptionalDouble gainAtResonance = OptionalDouble.empty();
        if (resonance.isPresent()) {
            double[] v = new double[2];
            velocityOpenLoop().evaluateAtFrequency(resonance.get().resonanceRadPerSec(), v);
            gainAtResonance = OptionalDouble.of(20 * Math.log10(Math.hypot(v[0], v[1])));
        }
        return new AxisDynamics(name, velocity, exactVelocityMargins, position, exactPositionMargins, withFf, withoutFf, resonance,
                gainAtResonance, staticStiffness());
    }

    // ---- simulation bridge -------------------------------------------------------------------

    /**
     * The closed axis loop as a state-space system with inputs (r, ṙ, r̈) and output the load
     * position, for {@link org.tracewell.engine.sim.TrackingSimulator}. Realised in observable
     * canonical form over Φ_p with the states scaled by powers of |Φ_p(0)/Φ_p,lead|^(1/n), so that the
     * entries stay of the order of the loop's frequencies.
     */
    public ContinuousStateSpace closedLoopStateSpace() {
        Parts p = new Parts();
        Polynomial common = p.outputCommon;
        double vff = controller.velocityFeedforward();
        double aff = controller.accelerationFeedforward();
        Polynomial[] numerators = {
            common.multiply(p.c.num).scale(p.kv),
            common.multiply(p.c.num).scale(vff),
            common.multiply(p.c.den).scale(aff * plant.equivalentInertia())
        };
        return observableRealisation(p.phiP, numerators);
    }

    /** {@link #closedLoopStateSpace()} wrapped for the tracking simulator. */
    public AxisLoop toAxisLoop() {
        return AxisLoop.of(name, closedLoopStateSpace());
    }

    /**
     * Observable canonical realisation of b_j(s)/a(s), strictly proper, shared a: x1 = y,
     * x_i' = −a_{n−i}·x1 + x_{i+1} + b_{j,n−i}·u_j (monic a), then states scaled x_i = w^(i−1)·z_i.
     */
    static ContinuousStateSpace observableRealisation(Polynomial den, Polynomial[] numerators) {
        int n = den.degree();
        if (n < 1) {
            throw new IllegalArgumentException("a closed loop needs at least one state; denominator " + den);
        }
        double lead = den.leadingCoefficient();
        double w = Math.abs(den.coefficient(0) / lead);
        w = w > 0 ? Math.pow(w, 1.0 / n) : 1.0;
        double[][] a = new double[n][n];
        double[][] b = new double[n][numerators.length];
        double[] c = new double[n];
        c[0] = 1.0;
        for (int i = 1; i <= n; i++) {
            // row i−1: coefficient of s^(n−i); scaled by w^(1−i)
            double scale = Math.pow(w, 1 - i);
            a[i - 1][0] = -den.coefficient(n - i) / lead * scale;
            if (i < n) {
                a[i - 1][i] = w;
            }
            for (int j = 0; j < numerators.length; j++) {
                Polynomial num = numerators[j];
                if (!num.isZero() && num.degree() >= n) {
                    throw new IllegalArgumentException("closed-loop input " + j + " is not strictly proper: numerator"
                            + " degree " + num.degree() + " >= denominator degree " + n);
                }
                b[i - 1][j] = num.coefficient(n - i) / lead * scale;
            }
        }
        return new ContinuousStateSpace(a, b, c, new double[numerators.length]);
    }
}
