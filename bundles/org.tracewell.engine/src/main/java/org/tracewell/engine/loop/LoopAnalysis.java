package org.tracewell.engine.loop;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

import org.apache.commons.math3.complex.Complex;
import org.tracewell.engine.tf.TransferFunction;

/**
 * Everything Tracewell reports about one feedback loop Y = G·(R − H·Y); produced by
 * {@link LoopAnalyzer}, read unchanged by the command line, the report and the views.
 * <p>
 * Frequency-domain figures use the dead time exactly. Closed-loop poles, stability, the step
 * response and the gain range need a rational loop: with dead time they use the diagonal
 * Padé approximant of order {@link #padeOrder()} (0 means no dead time, all exact).
 * Figures that only make sense for a stable closed loop — steady-state errors, sensitivity
 * peak, bandwidth, step response — are empty when it is not stable.
 *
 * @param forward G(s), dead time included
 * @param feedback H(s) ({@link TransferFunction#ONE} for unity feedback)
 * @param loop L = G·H
 * @param padeOrder order of the Padé approximant replacing the dead time, 0 without dead time
 * @param closedLoop T = G/(1 + G·H), rational (common factors kept: hidden modes count)
 * @param closedLoopPoles roots of the characteristic polynomial, least stable first
 * @param closedLoopZeros zeros of T
 * @param stable all closed-loop poles in the open left half plane
 * @param routh Routh array of the characteristic polynomial
 * @param loopType number of poles of L at s = 0
 * @param steadyState type, Kp/Kv/Ka and errors of E = R − Y (see {@link SteadyState})
 * @param margins gain, phase and delay margins of L with every crossing
 * @param sensitivityPeak Ms; empty when not stable
 * @param bandwidthRadPerSec −3 dB bandwidth of T; empty when not stable or T(0) = 0; +∞ if
 *        |T| never drops 3 dB
 * @param step unit-step response and its figures; empty when not stable
 * @param gainRange stable range of a multiplier k on L (k = 1 is the loop as given)
 * @param disturbance error from a disturbance at the plant input; present only when the
 *        loop was given as controller and plant and is stable
 */
public record LoopAnalysis(TransferFunction forward, TransferFunction feedback, TransferFunction loop,
        int padeOrder, TransferFunction closedLoop, List<Complex> closedLoopPoles, List<Complex> closedLoopZeros,
        boolean stable, RouthArray routh, int loopType, SteadyState steadyState, Margins margins,
        Optional<SensitivityPeak> sensitivityPeak, OptionalDouble bandwidthRadPerSec, Optional<StepResponse> step,
        StableGainRange gainRange, Optional<DisturbanceErrors> disturbance) {

    public LoopAnalysis {
        closedLoopPoles = List.copyOf(closedLoopPoles);
        closedLoopZeros = List.copyOf(closedLoopZeros);
    }

    /** True for unity feedback. */
    public boolean unityFeedback() {
        return feedback.equals(TransferFunction.ONE);
    }

    /** Steady-state errors for unit references; empty when the closed loop is not stable. */
    public Optional<SteadyStateErrors> steadyStateErrors() {
        return steadyState.errors();
    }

    /** Delay margin in seconds; empty when the closed loop is not stable. */
    public OptionalDouble delayMarginSeconds() {
        return stable ? OptionalDouble.of(margins.delayMarginSeconds()) : OptionalDouble.empty();
    }
}
