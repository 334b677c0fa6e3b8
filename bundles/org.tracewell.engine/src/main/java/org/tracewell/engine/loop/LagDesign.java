package org.tracewell.engine.loop;

import org.tracewell.engine.poly.Polynomial;
import org.tracewell.engine.tf.TransferFunction;

/**
 * Lag compensator C(s) = (s + z)/(s + p), z &gt; p &gt; 0, designed to raise a static error
 * constant by the factor z/p while leaving the transient nearly unchanged (Nise, Control
 * Systems Engineering, ch. 9; Franklin, Powell &amp; Emami-Naeini, Feedback Control of Dynamic
 * Systems, §6.7). C(0) = z/p, C(∞) = 1.
 * <p>
 * Rule used: z/p = required constant / present constant; z one decade below the lowest gain
 * crossover of the uncompensated loop, where the lag costs about atan(0.1) − atan(0.1·p/z),
 * less than 5.8°, of phase margin.
 *
 * @param constant which constant is raised
 * @param required the required value
 * @param before the uncompensated value
 * @param after the compensated value (equals required up to rounding)
 * @param zeroRadPerSec z
 * @param poleRadPerSec p
 * @param compensator C(s)
 * @param compensatedLoop C(s)·L(s)
 * @param marginsBefore margins of L
 * @param marginsAfter margins of C·L
 */
public record LagDesign(ErrorConstant constant, double required, double before, double after, double zeroRadPerSec,
        double poleRadPerSec, TransferFunction compensator, TransferFunction compensatedLoop, Margins marginsBefore,
        Margins marginsAfter) {

    /** z/p, the factor applied to the error constant. */
    public double ratio() {
        return zeroRadPerSec / poleRadPerSec;
    }

    /**
     * Lag for a required error constant of a unity-feedback loop L.
     *
     * @throws IllegalArgumentException if the loop's type does not match the constant, the
     *         requirement is already met, or L has no gain crossover to place z against
     */
    public static LagDesign forRequiredConstant(TransferFunction loop, ErrorConstant constant, double required) {
        if (!(required > 0) || !Double.isFinite(required)) {
            throw new IllegalArgumentException("required " + constant + " must be a positive finite number, got "
                    + required);
        }
        SteadyState present = SteadyState.ofUnityFeedback(loop, true);
        if (present.systemType() != constant.systemType()) {
            throw new IllegalArgumentException("a lag scales " + constant + " only in a type-" + constant.systemType()
                    + " loop; this loop is type " + present.systemType() + " (" + constant + " = "
                    + constant.of(present) + "); change the number of integrators instead");
        }
        double before = constant.of(present);
        if (!(before > 0)) {
            throw new IllegalArgumentException("present " + constant + " is " + before
                    + "; a lag can only scale a positive constant (check the loop's sign)");
        }
        double ratio = required / before;
        if (ratio <= 1.0) {
            throw new IllegalArgumentException("the loop already has " + constant + " = " + before
                    + " >= required " + required + "; no lag is needed");
        }
        Margins marginsBefore = LoopFrequencyAnalysis.margins(loop);
        if (marginsBefore.gainCrossovers().isEmpty()) {
            throw new IllegalArgumentException("the loop has no gain crossover (|L| never crosses 1), so there is"
                    + " no frequency to place the lag zero below");
        }
        double lowestCrossover = marginsBefore.gainCrossovers().get(0).frequencyRadPerSec();
        double z = lowestCrossover / 10.0;
        double p = z / ratio;
        TransferFunction lag = TransferFunction.of(Polynomial.ofDescending(1.0, z), Polynomial.ofDescending(1.0, p));
        TransferFunction compensated = lag.series(loop);
        double after = constant.of(SteadyState.ofUnityFeedback(compensated, true));
        return new LagDesign(constant, required, before, after, z, p, lag, compensated, marginsBefore,
                LoopFrequencyAnalysis.margins(compensated));
    }

    /**
     * Lag for a maximum steady-state error of a unity-feedback loop L: step of height r0
     * (Kp = r0/e − 1), ramp of slope v (Kv = v/e) or parabola a·t²/2 (Ka = a/e).
     *
     * @param constant which reference: KP step, KV ramp, KA parabola
     * @param amplitude r0, v or a
     * @param maximumError allowed steady-state error, same unit as the reference
     */
    public static LagDesign forMaximumError(TransferFunction loop, ErrorConstant constant, double amplitude,
            double maximumError) {
        if (!(maximumError > 0) || !Double.isFinite(maximumError)) {
            throw new IllegalArgumentException("maximum steady-state error must be a positive finite number, got "
                    + maximumError);
        }
        if (!(amplitude > 0) || !Double.isFinite(amplitude)) {
            throw new IllegalArgumentException("reference amplitude must be a positive finite number, got "
                    + amplitude);
        }
        double required = constant == ErrorConstant.KP ? amplitude / maximumError - 1.0 : amplitude / maximumError;
        return forRequiredConstant(loop, constant, required);
    }
}
