package org.tracewell.engine.axis;

import java.util.List;

import org.tracewell.engine.poly.Polynomial;
import org.tracewell.engine.tf.TransferFunction;

/**
 * Single-loop PID position controller commanding torque (no separate velocity loop):
 * <pre>
 *   T_cmd = D·[F(s)·K_p·(1 + 1/(T_i·s) + T_d·s/((T_d/N)·s + 1))·(r − x_m) + (k_vff·b·ṙ + k_aff·J·r̈)/ρ]
 * </pre>
 * with the derivative filtered by the time constant T_d/N, the filter stages F, the sampled-loop dead
 * time D of 1.5·T (zero-order hold plus one sample of computation, common practice), and feedforward of
 * the viscous (b, reflected) and inertial (J, equivalent) torque the planned motion needs.
 *
 * @param proportionalGain K_p, N·m per metre of position error (N/m for a linear motor)
 * @param integralTime T_i, s; +∞ for no integral action
 * @param derivativeTime T_d, s; 0 for no derivative action
 * @param derivativeFilterRatio N, &gt; 0 (typically 5–20): the derivative is filtered at N/T_d
 * @param filters filter stages in series
 * @param velocityFeedforward k_vff, 0..1 (of the viscous torque)
 * @param accelerationFeedforward k_aff, 0..1 (of the inertial torque)
 * @param samplePeriod s, ≥ 0 (0 = continuous)
 */
public record PidController(double proportionalGain, double integralTime, double derivativeTime,
        double derivativeFilterRatio, List<FilterStage> filters, double velocityFeedforward,
        double accelerationFeedforward, double samplePeriod) {

    public PidController {
        Checks.positive("PID proportional gain", proportionalGain, "N·m/m");
        Checks.positiveOrInfinite("PID integral time", integralTime, "s");
        Checks.nonNegative("PID derivative time", derivativeTime, "s");
        Checks.positive("PID derivative filter ratio N", derivativeFilterRatio, "");
        filters = List.copyOf(filters);
        Checks.fraction("velocity feedforward", velocityFeedforward);
        Checks.fraction("acceleration feedforward", accelerationFeedforward);
        Checks.nonNegative("sample period", samplePeriod, "s");
    }

    /** Continuous PID without filters and feedforward. */
    public static PidController continuous(double kp, double integralTime, double derivativeTime, double filterRatio) {
        return new PidController(kp, integralTime, derivativeTime, filterRatio, List.of(), 0, 0, 0);
    }

    public PidController withFeedforward(double velocity, double acceleration) {
        return new PidController(proportionalGain, integralTime, derivativeTime, derivativeFilterRatio, filters,
                velocity, acceleration, samplePeriod);
    }

    public PidController withSamplePeriod(double period) {
        return new PidController(proportionalGain, integralTime, derivativeTime, derivativeFilterRatio, filters,
                velocityFeedforward, accelerationFeedforward, period);
    }

    /** Loop dead time 1.5·T, s. */
    public double deadTime() {
        return CascadeController.ZOH_PLUS_COMPUTATION_SAMPLES * samplePeriod;
    }

    /** K_p·(1 + 1/(T_i·s) + T_d·s/((T_d/N)·s + 1)) over one common denominator. */
    public TransferFunction pid() {
        double tf = derivativeTime / derivativeFilterRatio;
        Polynomial filterDen = Polynomial.ofAscending(1, tf);
        // P + D over (T_f·s + 1): (T_f·s + 1) + T_d·s
        Polynomial pd = filterDen.add(Polynomial.ofAscending(0, derivativeTime));
        if (Double.isInfinite(integralTime)) {
            return TransferFunction.of(pd.scale(proportionalGain), filterDen);
        }
        Polynomial ti = Polynomial.ofAscending(0, integralTime);
        Polynomial num = pd.multiply(ti).add(filterDen).scale(proportionalGain);
        return TransferFunction.of(num, ti.multiply(filterDen));
    }

    /** PID times the filter stages. */
    public TransferFunction controller() {
        TransferFunction c = pid();
        for (FilterStage stage : filters) {
            c = c.series(stage.transferFunction());
        }
        return c;
    }
}
