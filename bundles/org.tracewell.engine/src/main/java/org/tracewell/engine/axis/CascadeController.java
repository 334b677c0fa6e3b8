package org.tracewell.engine.axis;

import java.util.List;

import org.tracewell.engine.poly.Polynomial;
import org.tracewell.engine.tf.TransferFunction;

/**
 * Cascade axis controller: a proportional position loop (gain Kv) commanding a PI velocity loop,
 * whose torque command passes the filter stages and the plant's current loop.
 * <pre>
 *   ω_cmd = D_p·[Kv·(r − x_m) + k_vff·ṙ] / ρ
 *   T_cmd = D_v·[F(s)·K_p·(1 + 1/(T_i·s))·(ω_cmd − ω_M) + D_p·k_aff·J·r̈/ρ]
 * </pre>
 * D_p and D_v are the dead times of the sampled loops, {@value #ZOH_PLUS_COMPUTATION_SAMPLES}
 * sample periods each (zero-order hold plus one sample of computation, common practice); a sample
 * period of 0 is a continuous loop. The acceleration feedforward injects the torque the equivalent
 * inertia J needs, past the filters (they shape the feedback, not the planned torque).
 *
 * @param positionGain Kv, 1/s
 * @param velocityGain K_p, N·m·s/rad (N·s/m for a linear motor)
 * @param velocityIntegralTime T_i, s; +∞ for a proportional velocity loop
 * @param filters filter stages in series, in order
 * @param velocityFeedforward k_vff, 0..1
 * @param accelerationFeedforward k_aff, 0..1
 * @param positionSamplePeriod s, ≥ 0
 * @param velocitySamplePeriod s, ≥ 0
 */
public record CascadeController(double positionGain, double velocityGain, double velocityIntegralTime,
        List<FilterStage> filters, double velocityFeedforward, double accelerationFeedforward,
        double positionSamplePeriod, double velocitySamplePeriod) {

    /** Dead time of a zero-order hold plus one sample of computation, in sample periods (common practice). */
    public static final double ZOH_PLUS_COMPUTATION_SAMPLES = 1.5;

    public CascadeController {
        Checks.positive("position gain Kv", positionGain, "1/s");
        Checks.positive("velocity gain", velocityGain, "N·m·s/rad");
        Checks.positiveOrInfinite("velocity integral time", velocityIntegralTime, "s");
        filters = List.copyOf(filters);
        Checks.fraction("velocity feedforward", velocityFeedforward);
        Checks.fraction("acceleration feedforward", accelerationFeedforward);
        Checks.nonNegative("position-loop sample period", positionSamplePeriod, "s");
        Checks.nonNegative("velocity-loop sample period", velocitySamplePeriod, "s");
    }

    /** Continuous cascade without filters and feedforward. */
    public static CascadeController continuous(double positionGain, double velocityGain, double velocityIntegralTime) {
        return new CascadeController(positionGain, velocityGain, velocityIntegralTime, List.of(), 0, 0, 0, 0);
    }

    public CascadeController withFeedforward(double velocity, double acceleration) {
        return new CascadeController(positionGain, velocityGain, velocityIntegralTime, filters, velocity, acceleration,
                positionSamplePeriod, velocitySamplePeriod);
    }

    public CascadeController withSamplePeriods(double position, double velocity) {
        return new CascadeController(positionGain, velocityGain, velocityIntegralTime, filters, velocityFeedforward,
                accelerationFeedforward, position, velocity);
    }

    public CascadeController withFilters(List<FilterStage> stages) {
        return new CascadeController(positionGain, velocityGain, velocityIntegralTime, stages, velocityFeedforward,
                accelerationFeedforward, positionSamplePeriod, velocitySamplePeriod);
    }

    public CascadeController withPositionGain(double kv) {
        return new CascadeController(kv, velocityGain, velocityIntegralTime, filters, velocityFeedforward,
                accelerationFeedforward, positionSamplePeriod, velocitySamplePeriod);
    }

    /** Dead time of the position loop, s. */
    public double positionDeadTime() {
        return ZOH_PLUS_COMPUTATION_SAMPLES * positionSamplePeriod;
    }

    /** Dead time of the velocity loop, s. */
    public double velocityDeadTime() {
        return ZOH_PLUS_COMPUTATION_SAMPLES * velocitySamplePeriod;
    }

    /** K_p·(T_i·s + 1)/(T_i·s), or K_p without integral action. */
    public TransferFunction velocityPi() {
        if (Double.isInfinite(velocityIntegralTime)) {
            return TransferFunction.gain(velocityGain);
        }
        return TransferFunction.of(Polynomial.ofAscending(velocityGain, velocityGain * velocityIntegralTime),
                Polynomial.ofAscending(0, velocityIntegralTime));
    }

    /** The filter stages in series (1 without filters). */
    public TransferFunction filterChain() {
        TransferFunction f = TransferFunction.ONE;
        for (FilterStage stage : filters) {
            f = f.series(stage.transferFunction());
        }
        return f;
    }

    /** Velocity controller C_v = F·PI, delay-free, N·m per rad/s. */
    public TransferFunction velocityController() {
        return filterChain().series(velocityPi());
    }
}
