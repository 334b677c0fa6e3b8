package org.tracewell.engine.variation;

import java.util.ArrayList;
import java.util.List;
import org.tracewell.engine.contour.CircleTestSetup;
import org.tracewell.engine.sim.AxisLoop;
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
 * Per variant the model builds both loops and runs them through a {@link CircleRunKernel} over one reference
 * trajectory planned once and shared by all threads (two per-thread buffers). The figures agree with
 * {@code TrackingSimulator} + {@code CircleTest} / {@code ContourErrorAnalysis} to rounding.
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

    private final CircleRunKernel kernel;
    private final boolean withFeedforward;
    private final List<Quantity> parameters;

    private CircleTestVariantModel(CircleRunKernel kernel, boolean withFeedforward) {
        this.kernel = kernel;
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
    }

    /**
     * The model over a reference already sampled along {@code setup.path()}.
     *
     * @param withFeedforward whether the four feedforward fractions are parameters (otherwise they are 0)
     */
    public static CircleTestVariantModel of(CircleTestSetup setup, Trajectory reference, boolean withFeedforward) {
        return new CircleTestVariantModel(CircleRunKernel.of(setup, reference), withFeedforward);
    }

    /** Plans and samples the reference (FeedPlanner) and builds the model. */
    public static CircleTestVariantModel planned(CircleTestSetup setup, PathLimits pathLimits, AxisLimits axisLimits,
                                                 ProfileShape shape, double samplePeriod, boolean withFeedforward) {
        org.tracewell.engine.path.Path path = setup.path();
        FeedProfile profile = FeedPlanner.plan(path, pathLimits, List.of(axisLimits, axisLimits), shape);
        return of(setup, Trajectory.sample(path, profile, samplePeriod), withFeedforward);
    }

    public CircleTestSetup setup() {
        return kernel.setup();
    }

    public boolean withFeedforward() {
        return withFeedforward;
    }

    public int sampleCount() {
        return kernel.sampleCount();
    }

    public double samplePeriod() {
        return kernel.samplePeriod();
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
        return evaluator(kernel.newRun());
    }

    /** An evaluator that always takes the {@code CircleTest.evaluate} path, for checking the fast one. */
    VariantEvaluator newCircleTestEvaluator() {
        return evaluator(kernel.newCircleTestRun());
    }

    private VariantEvaluator evaluator(CircleRunKernel.Run run) {
        double[] figures = new double[CircleRunKernel.FIGURE_COUNT];
        return (p, metrics) -> {
            run.evaluate(loops(p), figures);
            metrics[0] = figures[CircleRunKernel.G];
            metrics[1] = figures[CircleRunKernel.F];
            metrics[2] = figures[CircleRunKernel.MAX_CONTOUR_ERROR];
        };
    }

    @Override
    public String toString() {
        CircleTestSetup setup = kernel.setup();
        return "CircleTestVariantModel[R " + setup.radius() + " m, feed " + setup.feed() + " m/s, " + setup.direction()
                + ", " + kernel.sampleCount() + " samples, parameters " + parameters.stream().map(Quantity::name).toList() + "]";
    }
}
