package org.tracewell.engine.variation;

import java.util.List;
import org.tracewell.engine.contour.CircleFit;
import org.tracewell.engine.contour.CircleTest;
import org.tracewell.engine.contour.CircleTestResult;
import org.tracewell.engine.contour.CircleTestSetup;
import org.tracewell.engine.contour.FittedCircle;
import org.tracewell.engine.path.ContourPlane;
import org.tracewell.engine.sim.AxisLoop;
import org.tracewell.engine.sim.AxisStepper;
import org.tracewell.engine.trajectory.Trajectory;

/**
 * One circle test (ISO 230-4 set-up) run by two axis loops of any order against a reference planned once: the fast
 * evaluation behind {@link CircleTestVariantModel} and the model-level variant models, shared so both give the same
 * figures. Immutable and thread-safe; each thread takes its own {@link Run} (two sample buffers).
 * <p>
 * Per run the loops are simulated sample by sample ({@link AxisStepper}, the same zero-order-hold kernel as
 * {@code TrackingSimulator}); the evaluation then follows {@link CircleTest} without its copies:
 * <ul>
 *   <li>max contour error = max |ρ − R| about the nominal centre over all samples: the shortest distance
 *       to a path that covers the full circle;</li>
 *   <li>the evaluated 360° is selected by the angle travelled from the run start, as {@code CircleTest}
 *       does. When the motion advances monotonically about the centre (checked for every sample pair by
 *       the sign of the cross product, steps back below 1e-12 rad taken as rounding) the selection is one
 *       contiguous index range, found by bisection
 *       with the travelled angle of sample k taken as s_k/R + wrap(θ_k − θ_ref,k) (s_k the reference arc
 *       length); otherwise the kernel falls back to {@code CircleTest.evaluate} itself;</li>
 *   <li>G about the least-squares centre ({@link CircleFit#geometric}), F about the nominal centre;</li>
 *   <li>the peak following error |r − y| of each axis over all samples, as {@code TrackingResult} has it.</li>
 * </ul>
 * The figures agree with {@code TrackingSimulator} + {@code CircleTest} / {@code ContourErrorAnalysis} to
 * rounding.
 */
public final class CircleRunKernel {

    /** Index of circular deviation G in the figures array, m. */
    public static final int G = 0;
    /** Index of radial deviation F, m. */
    public static final int F = 1;
    /** Index of the largest contour error of the whole run, m. */
    public static final int MAX_CONTOUR_ERROR = 2;
    /** Index of the peak following error of the first axis, m. */
    public static final int PEAK_FOLLOWING_ERROR_FIRST = 3;
    /** Index of the peak following error of the second axis, m. */
    public static final int PEAK_FOLLOWING_ERROR_SECOND = 4;
    /** Length of the figures array. */
    public static final int FIGURE_COUNT = 5;

    /** Largest step against the run direction taken as rounding, radians (sin Δθ ≈ cross/dot). */
    private static final double BACKWARD_TOLERANCE = 1e-12;

    private final CircleTestSetup setup;
    private final double samplePeriod;
    private final int sampleCount;
    private final double[][] position;
    private final double[][] velocity;
    private final double[][] acceleration;
    private final double[] travelledReference;

    private CircleRunKernel(CircleTestSetup setup, Trajectory reference) {
        this.setup = setup;
        this.samplePeriod = reference.samplePeriod();
        this.sampleCount = reference.sampleCount();
        this.position = new double[][] {reference.positions(0), reference.positions(1)};
        this.velocity = new double[][] {reference.velocities(0), reference.velocities(1)};
        this.acceleration = new double[][] {reference.accelerations(0), reference.accelerations(1)};
        this.travelledReference = reference.pathPositions();
        for (int k = 0; k < sampleCount; k++) {
            travelledReference[k] /= setup.radius();
        }
    }

    /**
     * The kernel over a reference already sampled along {@code setup.path()}.
     *
     * @throws IllegalArgumentException when the set-up plane has not two axes or the reference is not sampled
     *                                  along the set-up's path
     */
    public static CircleRunKernel of(CircleTestSetup setup, Trajectory reference) {
        if (setup.plane().axisCount() != 2) {
            throw new IllegalArgumentException("a circle run takes two axes; the set-up plane has "
                    + setup.plane().axisCount());
        }
        double length = setup.path().length();
        if (reference.axisCount() != 2 || Math.abs(reference.path().length() - length) > 1e-9 * Math.max(1, length)) {
            throw new IllegalArgumentException("the reference must be sampled along the circle test path (" + length
                    + " m, 2 axes), got " + reference.path().length() + " m, " + reference.axisCount() + " axes");
        }
        return new CircleRunKernel(setup, reference);
    }

    public CircleTestSetup setup() {
        return setup;
    }

    public int sampleCount() {
        return sampleCount;
    }

    public double samplePeriod() {
        return samplePeriod;
    }

    /** Fresh buffers for one thread. */
    public Run newRun() {
        return new Run(false);
    }

    /** Buffers that always take the {@code CircleTest.evaluate} path, for checking the fast one. */
    Run newCircleTestRun() {
        return new Run(true);
    }

    /** Per-thread buffers: the actual motion in plane coordinates. Not thread-safe. */
    public final class Run {

        private final double[] u = new double[sampleCount];
        private final double[] v = new double[sampleCount];
        private final boolean alwaysCircleTest;

        private Run(boolean alwaysCircleTest) {
            this.alwaysCircleTest = alwaysCircleTest;
        }

        /**
         * Simulates the two loops from rest at the first reference sample and writes the figures.
         *
         * @param loops   the first and the second axis's closed loop
         * @param figures receives {@link #FIGURE_COUNT} values at the index constants of the kernel, SI
         */
        public void evaluate(List<AxisLoop> loops, double[] figures) {
            if (loops.size() != 2) {
                throw new IllegalArgumentException("a circle run takes two axis loops, got " + loops.size());
            }
            AxisStepper x = new AxisStepper(loops.get(0), samplePeriod, position[0][0]);
            AxisStepper y = new AxisStepper(loops.get(1), samplePeriod, position[1][0]);
            ContourPlane plane = setup.plane();
            double ox = plane.origin(0);
            double oy = plane.origin(1);
            double ux = plane.u(0);
            double uy = plane.u(1);
            double vx = plane.v(0);
            double vy = plane.v(1);
            double cu = setup.centre().u();
            double cv = setup.centre().v();
            double radius = setup.radius();
            int sign = setup.direction().sign();
            double[] px = position[0];
            double[] py = position[1];
            double[] wx = velocity[0];
            double[] wy = velocity[1];
            double[] ax = acceleration[0];
            double[] ay = acceleration[1];
            double peakX = 0;
            double peakY = 0;
            // simulation first, in a loop of its own: it stays small enough for the JIT to keep tight
            for (int k = 0; k < sampleCount; k++) {
                double xa = x.step(px[k], wx[k], ax[k]);
                double ya = y.step(py[k], wy[k], ay[k]);
                peakX = Math.max(peakX, Math.abs(px[k] - xa));
                peakY = Math.max(peakY, Math.abs(py[k] - ya));
                double rx = xa - ox;
                double ry = ya - oy;
                u[k] = rx * ux + ry * uy;
                v[k] = rx * vx + ry * vy;
            }
            figures[PEAK_FOLLOWING_ERROR_FIRST] = peakX;
            figures[PEAK_FOLLOWING_ERROR_SECOND] = peakY;
            // extremes of ρ² rather than ρ: √ is monotone and correctly rounded, so √(max ρ²) is max ρ exactly
            double minSquare = Double.POSITIVE_INFINITY;
            double maxSquare = 0;
            // monotone advance: every step less than 90° in the run direction, or none. A step back of less than
            // 1e-12 rad is rounding at rest (the first samples), not motion; it could only move a sample lying
            // within 1e-12 rad of a selection threshold, which is below the rounding of CircleTest's own sum
            int backward = 0;
            double previousDu = u[0] - cu;
            double previousDv = v[0] - cv;
            for (int k = 0; k < sampleCount; k++) {
                double du = u[k] - cu;
                double dv = v[k] - cv;
                double square = du * du + dv * dv;
                minSquare = Math.min(minSquare, square);
                maxSquare = Math.max(maxSquare, square);
                double cross = previousDu * dv - previousDv * du;
                double dot = previousDu * du + previousDv * dv;
                backward += (sign * cross < -BACKWARD_TOLERANCE * dot || !(dot > 0)) ? 1 : 0;
                previousDu = du;
                previousDv = dv;
            }
            boolean monotone = backward == 0 && !alwaysCircleTest;
            figures[MAX_CONTOUR_ERROR] = Math.max(Math.abs(Math.sqrt(maxSquare) - radius),
                    Math.abs(Math.sqrt(minSquare) - radius));
            int from = monotone ? firstAtLeast(setup.overshootAngle()) : 0;
            int to = monotone ? firstAbove(setup.overshootAngle() + 2 * Math.PI) : 0;
            if (!monotone || to - from < 3) {
                CircleTestResult r = CircleTest.evaluate(setup, u, v);
                figures[G] = r.circularDeviation();
                figures[F] = r.radialDeviation();
                return;
            }
            FittedCircle fit = CircleFit.geometric(u, v, from, to);
            double fu = fit.centreU();
            double fv = fit.centreV();
            double minFit = Double.POSITIVE_INFINITY;
            double maxFit = 0;
            double minNominal = Double.POSITIVE_INFINITY;
            double maxNominal = 0;
            for (int k = from; k < to; k++) {
                double du = u[k] - fu;
                double dv = v[k] - fv;
                double square = du * du + dv * dv;
                minFit = Math.min(minFit, square);
                maxFit = Math.max(maxFit, square);
                du = u[k] - cu;
                dv = v[k] - cv;
                square = du * du + dv * dv;
                minNominal = Math.min(minNominal, square);
                maxNominal = Math.max(maxNominal, square);
            }
            figures[G] = Math.sqrt(maxFit) - Math.sqrt(minFit);
            figures[F] = Math.max(Math.abs(Math.sqrt(maxNominal) - radius), Math.abs(Math.sqrt(minNominal) - radius));
        }

        /** Angle travelled from the run start at sample k, radians (valid while within π of the reference). */
        private double travelled(int k) {
            int sign = setup.direction().sign();
            double runStart = setup.startAngle() - sign * setup.overshootAngle();
            double reference = travelledReference[k];
            double angle = Math.atan2(v[k] - setup.centre().v(), u[k] - setup.centre().u());
            return reference + sign * Math.IEEEremainder(angle - (runStart + sign * reference), 2 * Math.PI);
        }

        /** First sample whose travelled angle is ≥ limit (sampleCount if none); travelled is non-decreasing. */
        private int firstAtLeast(double limit) {
            int lo = 0;
            int hi = sampleCount;
            while (lo < hi) {
                int mid = (lo + hi) >>> 1;
                if (travelled(mid) >= limit) {
                    hi = mid;
                } else {
                    lo = mid + 1;
                }
            }
            return lo;
        }

        /** First sample whose travelled angle is &gt; limit (sampleCount if none). */
        private int firstAbove(double limit) {
            int lo = 0;
            int hi = sampleCount;
            while (lo < hi) {
                int mid = (lo + hi) >>> 1;
                if (travelled(mid) > limit) {
                    hi = mid;
                } else {
                    lo = mid + 1;
                }
            }
            return lo;
        }
    }

    @Override
    public String toString() {
        return "CircleRunKernel[R " + setup.radius() + " m, feed " + setup.feed() + " m/s, " + setup.direction() + ", "
                + sampleCount + " samples]";
    }
}
