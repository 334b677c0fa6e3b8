package org.tracewell.engine.sim;

import java.util.List;
import org.tracewell.engine.trajectory.Trajectory;

/**
 * Simulates each axis loop tracking its reference trajectory. Every loop is discretised exactly for a
 * zero-order-held reference (position, velocity and acceleration held over each sample period, as an
 * interpolator delivers them) and starts at rest at the first reference position. The sample loop
 * runs over primitive arrays in an upper-Hessenberg realisation of each loop and allocates nothing
 * per sample.
 */
public final class TrackingSimulator {

    /** Samples read from the trajectory at a time. */
    private static final int BLOCK = 4096;

    private TrackingSimulator() {
    }

    /**
     * @param loops one loop per trajectory axis, in axis order
     */
    public static TrackingResult simulate(Trajectory reference, List<AxisLoop> loops) {
        if (loops.size() != reference.axisCount()) {
            throw new IllegalArgumentException("need one axis loop per trajectory axis: " + reference.axisCount()
                    + " axes, got " + loops.size() + " loops");
        }
        int count = reference.sampleCount();
        double[][] actual = new double[loops.size()][count];
        for (int axis = 0; axis < loops.size(); axis++) {
            AxisLoop loop = loops.get(axis);
            DiscreteStateSpace dss = DiscreteStateSpace.zeroOrderHold(loop.system(), reference.samplePeriod());
            simulateAxis(dss, loop.restState(reference.position(axis, 0)), reference, axis, actual[axis]);
        }
        return new TrackingResult(reference, loops, actual);
    }

    private static void simulateAxis(DiscreteStateSpace dss, double[] initialState, Trajectory reference, int axis,
                                     double[] out) {
        SampledLoop kernel = SampledLoop.of(dss);
        double[] x = kernel.toInternal(initialState);
        double[] next = new double[kernel.stateCount()];
        double[] r = new double[BLOCK];
        double[] rd = new double[BLOCK];
        double[] rdd = new double[BLOCK];
        int count = out.length;
        for (int start = 0; start < count; start += BLOCK) {
            int len = Math.min(BLOCK, count - start);
            reference.readPositions(axis, start, r, len);
            reference.readVelocities(axis, start, rd, len);
            reference.readAccelerations(axis, start, rdd, len);
            double[] now = kernel.run(x, next, r, rd, rdd, out, start, len);
            next = now == x ? next : x;
            x = now;
        }
    }
}
