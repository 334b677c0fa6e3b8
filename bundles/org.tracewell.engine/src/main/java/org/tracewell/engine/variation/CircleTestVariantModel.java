package org.tracewell.engine.variation;

import java.util.ArrayList;
import java.util.List;
import org.tracewell.engine.contour.CircleFit;
import org.tracewell.engine.contour.CircleTest;
import org.tracewell.engine.contour.CircleTestResult;
import org.tracewell.engine.contour.CircleTestSetup;
import org.tracewell.engine.contour.FittedCircle;
import org.tracewell.engine.path.ContourPlane;
import org.tracewell.engine.sim.AxisLoop;
import org.tracewell.engine.sim.AxisStepper;
import org.tracewell.engine.trajectory.AxisLimits;
import org.tracewell.engine.trajectory.FeedPlanner;
import org.tracewell.engine.trajectory.FeedProfile;
import org.tracewell.engine.trajectory.PathLimits;
import org.tracewell.engine.trajectory.ProfileShape;
import org.tracewell.engine.trajectory.Trajectory;

/**
 * The standard variant model: a circle test (ISO 230-4 set-up: plane, centre, radius, feed, direction,
 * overshoot arcs) run by two axes, each a position loop around a first-order velocity lag
 * ({@link AxisLoop#withVelocityLag}). Parameters Kv_x, Kv_y (1/s) and T_x, T_y (s), optionally the velocity
 * and acceleration feedforward fractions vff_x, vff_y, aff_x, aff_y; metrics circular deviation G, radial
 * deviation F and the largest contour error of the whole run, all in metres.
 * <p>
 * Per variant the model simulates both loops sample by sample ({@link AxisStepper}, the same zero-order-hold
 * kernel as {@code TrackingSimulator}) against one reference trajectory planned once and shared by all
 * threads, into two per-thread buffers. The evaluation then follows {@link CircleTest} without its copies:
 * <ul>
 *   <li>max contour error = max |ρ − R| about the nominal centre over all samples: the shortest distance
 *       to a path that covers the full circle;</li>
 *   <li>the evaluated 360° is selected by the angle travelled from the run start, as {@code CircleTest}
 *       does. When the motion advances monotonically about the centre (checked for every sample pair by
 *       the sign of the cross product, steps back below 1e-12 rad taken as rounding) the selection is one
 *       contiguous index range, found by bisection
 *       with the travelled angle of sample k taken as s_k/R + wrap(θ_k − θ_ref,k) (s_k the reference arc
 *       length); otherwise the model falls back to {@code CircleTest.evaluate} itself;</li>
 *   <li>G about the least-squares centre ({@link CircleFit#geometric}), F about the nominal centre.</li>
 * </ul>
 * The figures agree with {@code TrackingSimulator} + {@code CircleTest} / {@code ContourErrorAnalysis} to
 * rounding.
 */
public final class CircleTestVariantModel implements VariantModel {

    public static final String KV_X = "Kv_x";
    public static final String KV_Y = "Kv_y";
    public static final String LAG_X = "T_x";
    public static final String LAG_Y = "T_y";
    public static final String VFF_X = "vff_x";
    public static final String VFF_Y = "vff_y";
    public static final String AFF_X = "aff_x";
    public static final String AFF_Y = "aff_y";
    public static final String CIRCULAR_DEVIATION = "G";
    public static final String RADIAL_DEVIATION = "F";
    public static final String MAX_CONTOUR_ERROR = "maxContourError";

    private static final List<Quantity> METRICS = List.of(
            new Quantity(CIRCULAR_DEVIATION, "m", "circular deviation G about the least-squares centre (ISO 230-4)"),
            new Quantity(RADIAL_DEVIATION, "m", "radial deviation F from the nominal circle, largest magnitude"),
            new Quantity(MAX_CONTOUR_ERROR, "m", "largest contour error of the whole run, overshoot arcs included"));

    /** Largest step against the run direction taken as rounding, radians (sin Δθ ≈ cross/dot). */
    private static final double BACKWARD_TOLERANCE = 1e-12;

    private final CircleTestSetup setup;
    private final boolean withFeedforward;
    private final List<Quantity> parameters;
    private final double samplePeriod;
    private final int sampleCount;
    private final double[][] position;
    private final double[][] velocity;
    private final double[][] acceleration;
    private final double[] travelledReference;

    private CircleTestVariantModel(CircleTestSetup setup, Trajectory reference, boolean withFeedforward) {
        this.setup = setup;
        this.withFeedforward = withFeedforward;
        List<Quantity> p = new ArrayList<>(List.of(
                new Quantity(KV_X, "1/s", "position gain of the first axis"),
                new Quantity(KV_Y, "1/s", "position gain of the second axis"),
                new Quantity(LAG_X, "s", "velocity-loop lag time constant of the first axis"),
                new Quantity(LAG_Y, "s", "velocity-loop lag time constant of the second axis")));
        if (withFeedforward) {
            p.add(new Quantity(VFF_X, "1", "velocity feedforward fraction, first axis"));
            p.add(new Quantity(VFF_Y, "1", "velocity feedforward fraction, second axis"));
            p.add(new Quantity(AFF_X, "1", "acceleration feedforward fraction, first axis"));
            p.add(new Quantity(AFF_Y, "1", "acceleration feedforward fraction, second axis"));
        }
        this.parameters = List.copyOf(p);
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
     * The model over a reference already sampled along {@code setup.path()}.
     *
     * @param withFeedforward whether the four feedforward fractions are parameters (otherwise they are 0)
     */
    public static CircleTestVariantModel of(CircleTestSetup setup, Trajectory reference, boolean withFeedforward) {
        if (setup.plane().axisCount() != 2) {
            throw new IllegalArgumentException("the circle-test model runs two axes; the set-up plane has "
                    + setup.plane().axisCount());
        }
        double length = setup.path().length();
        if (reference.axisCount() != 2 || Math.abs(reference.path().length() - length) > 1e-9 * Math.max(1, length)) {
            throw new IllegalArgumentException("the reference must be sampled along the circle test path (" + length
                    + " m, 2 axes), got " + reference.path().length() + " m, " + reference.axisCount() + " axes");
        }
        return new CircleTestVariantModel(setup, reference, withFeedforward);
    }

    /** Plans and samples the reference (FeedPlanner) and builds the model. */
    public static CircleTestVariantModel planned(CircleTestSetup setup, PathLimits pathLimits, AxisLimits axisLimits,
                                                 ProfileShape shape, double samplePeriod, boolean withFeedforward) {
        org.tracewell.engine.path.Path path = setup.path();
        FeedProfile profile = FeedPlanner.plan(path, pathLimits, List.of(axisLimits, axisLimits), shape);
        return of(setup, Trajectory.sample(path, profile, samplePeriod), withFeedforward);
    }

    public CircleTestSetup setup() {
        return setup;
    }

    public boolean withFeedforward() {
        return withFeedforward;
    }

    public int sampleCount() {
        return sampleCount;
    }

    public double samplePeriod() {
        return samplePeriod;
    }

    @Override
    public List<Quantity> parameters() {
        return parameters;
    }

    @Override
    public List<Quantity> metrics() {
        return METRICS;
    }

    /** A parameter vector in this model's order; feedforward values are ignored without feedforward. */
    public double[] parameterVector(double kvX, double kvY, double lagX, double lagY, double vffX, double vffY,
                                    double affX, double affY) {
        return withFeedforward ? new double[] {kvX, kvY, lagX, lagY, vffX, vffY, affX, affY}
                : new double[] {kvX, kvY, lagX, lagY};
    }

    /** The two axis loops of a parameter vector. */
    public List<AxisLoop> loops(double[] parameters) {
        double vffX = withFeedforward ? parameters[4] : 0;
        double vffY = withFeedforward ? parameters[5] : 0;
        double affX = withFeedforward ? parameters[6] : 0;
        double affY = withFeedforward ? parameters[7] : 0;
        return List.of(AxisLoop.withVelocityLag("X", parameters[0], parameters[2], vffX, affX),
                AxisLoop.withVelocityLag("Y", parameters[1], parameters[3], vffY, affY));
    }

    @Override
    public VariantEvaluator newEvaluator() {
        return new Evaluator(false);
    }

    /** An evaluator that always takes the {@code CircleTest.evaluate} path, for checking the fast one. */
    VariantEvaluator newCircleTestEvaluator() {
        return new Evaluator(true);
    }

    /** Per-thread buffers: the actual motion in plane coordinates. */
    private final class Evaluator implements VariantEvaluator {

        private final double[] u = new double[sampleCount];
        private final double[] v = new double[sampleCount];
        private final boolean alwaysCircleTest;

        Evaluator(boolean alwaysCircleTest) {
            this.alwaysCircleTest = alwaysCircleTest;
        }

        @Override
        public void evaluate(double[] p, double[] metrics) {
            List<AxisLoop> loops = loops(p);
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
            // simulation first, in a loop of its own: it stays small enough for the JIT to keep tight
            for (int k = 0; k < sampleCount; k++) {
                double rx = x.step(px[k], wx[k], ax[k]) - ox;
                double ry = y.step(py[k], wy[k], ay[k]) - oy;
                u[k] = rx * ux + ry * uy;
                v[k] = rx * vx + ry * vy;
            }
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
            metrics[2] = Math.max(Math.abs(Math.sqrt(maxSquare) - radius), Math.abs(Math.sqrt(minSquare) - radius));
            int from = monotone ? firstAtLeast(setup.overshootAngle()) : 0;
            int to = monotone ? firstAbove(setup.overshootAngle() + 2 * Math.PI) : 0;
            if (!monotone || to - from < 3) {
                CircleTestResult r = CircleTest.evaluate(setup, u, v);
                metrics[0] = r.circularDeviation();
                metrics[1] = r.radialDeviation();
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
            metrics[0] = Math.sqrt(maxFit) - Math.sqrt(minFit);
            metrics[1] = Math.max(Math.abs(Math.sqrt(maxNominal) - radius), Math.abs(Math.sqrt(minNominal) - radius));
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
        return "CircleTestVariantModel[R " + setup.radius() + " m, feed " + setup.feed() + " m/s, " + setup.direction()
                + ", " + sampleCount + " samples, parameters " + parameters.stream().map(Quantity::name).toList() + "]";
    }
}
