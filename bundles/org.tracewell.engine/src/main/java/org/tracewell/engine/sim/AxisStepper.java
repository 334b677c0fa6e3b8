package org.tracewell.engine.sim;

/**
 * Steps one axis loop sample by sample, for streaming runs that do not hold the reference: the
 * zero-order-hold discretisation of the loop, started at rest at a given position. Mutable and not
 * thread-safe; {@link #step} allocates nothing.
 */
public final class AxisStepper {

    private final AxisLoop loop;
    private final DiscreteStateSpace discrete;
    private final SampledLoop kernel;
    private double[] x;
    private double[] next;

    /**
     * @param samplePeriod    seconds, &gt; 0
     * @param initialPosition the axis rests here before the first sample, metres
     */
    public AxisStepper(AxisLoop loop, double samplePeriod, double initialPosition) {
        this.loop = loop;
        this.discrete = DiscreteStateSpace.zeroOrderHold(loop.system(), samplePeriod);
        this.kernel = SampledLoop.of(discrete);
        this.x = kernel.toInternal(loop.restState(initialPosition));
        this.next = new double[kernel.stateCount()];
    }

    public AxisLoop loop() {
        return loop;
    }

    public DiscreteStateSpace discrete() {
        return discrete;
    }

    /**
     * Applies the reference sample (position, velocity, acceleration) held over the coming period:
     * returns the actual position at this sample instant and advances the state by one period.
     */
    public double step(double position, double velocity, double acceleration) {
        double y = kernel.step(x, next, position, velocity, acceleration);
        double[] swap = x;
        x = next;
        next = swap;
        return y;
    }
}
