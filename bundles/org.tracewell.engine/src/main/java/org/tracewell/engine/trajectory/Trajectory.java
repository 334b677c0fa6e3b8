package org.tracewell.engine.trajectory;

import org.tracewell.engine.path.Path;

/**
 * Time-stamped reference motion of each axis along a path, sampled every {@code samplePeriod}:
 * sample k is at time k·T. The last sample lies exactly at the path end (its time stamp is the first
 * sample time at or after the profile duration; the motion is held there).
 * <p>
 * Stored as primitive arrays, (3·axes + 1) doubles per sample; the arrays are never exposed, read them
 * by index or copy them.
 */
public final class Trajectory {

    /**
     * Largest sample count held in memory: (3·axes + 1)·8 bytes per sample, 0.8 GB for three axes.
     * Longer runs stream through {@link TrajectorySampler}.
     */
    public static final int MAX_SAMPLES = 10_000_000;

    private final Path path;
    private final FeedProfile profile;
    private final double samplePeriod;
    private final double[] pathPosition;
    private final double[][] position;
    private final double[][] velocity;
    private final double[][] acceleration;

    private Trajectory(Path path, FeedProfile profile, double samplePeriod, double[] pathPosition, double[][] position,
                       double[][] velocity, double[][] acceleration) {
        this.path = path;
        this.profile = profile;
        this.samplePeriod = samplePeriod;
        this.pathPosition = pathPosition;
        this.position = position;
        this.velocity = velocity;
        this.acceleration = acceleration;
    }

    /**
     * Samples {@code profile} along {@code path}. Axis velocity is the feed times the tangent; axis
     * acceleration adds the centripetal part feed²·κ along the left normal (κ signed curvature).
     *
     * @param samplePeriod seconds, &gt; 0
     */
    public static Trajectory sample(Path path, FeedProfile profile, double samplePeriod) {
        TrajectorySampler sampler = new TrajectorySampler(path, profile, samplePeriod);
        if (sampler.sampleCount() > MAX_SAMPLES) {
            throw new IllegalArgumentException("duration " + profile.duration() + " s at sample period " + samplePeriod
                    + " s needs " + sampler.sampleCount() + " samples; at most " + MAX_SAMPLES
                    + " are held in memory (stream longer runs through TrajectorySampler)");
        }
        int count = (int) sampler.sampleCount();
        int axes = path.plane().axisCount();
        double[] sArr = new double[count];
        double[][] pos = new double[axes][count];
        double[][] vel = new double[axes][count];
        double[][] acc = new double[axes][count];
        double[] p = new double[axes];
        double[] v = new double[axes];
        double[] a = new double[axes];
        for (int k = 0; k < count; k++) {
            sampler.sample(k, p, v, a);
            sArr[k] = sampler.pathPosition();
            for (int i = 0; i < axes; i++) {
                pos[i][k] = p[i];
                vel[i][k] = v[i];
                acc[i][k] = a[i];
            }
        }
        return new Trajectory(path, profile, samplePeriod, sArr, pos, vel, acc);
    }

    public Path path() {
        return path;
    }

    public FeedProfile profile() {
        return profile;
    }

    public double samplePeriod() {
        return samplePeriod;
    }

    public int sampleCount() {
        return pathPosition.length;
    }

    public int axisCount() {
        return position.length;
    }

    public double time(int k) {
        return k * samplePeriod;
    }

    /** Arc length of the reference at sample k, metres. */
    public double pathPosition(int k) {
        return pathPosition[k];
    }

    public double position(int axis, int k) {
        return position[axis][k];
    }

    public double velocity(int axis, int k) {
        return velocity[axis][k];
    }

    public double acceleration(int axis, int k) {
        return acceleration[axis][k];
    }

    /** Copies {@code length} reference positions of one axis from sample {@code from} into {@code target}. */
    public void readPositions(int axis, int from, double[] target, int length) {
        System.arraycopy(position[axis], from, target, 0, length);
    }

    /** Copies {@code length} reference velocities of one axis from sample {@code from} into {@code target}. */
    public void readVelocities(int axis, int from, double[] target, int length) {
        System.arraycopy(velocity[axis], from, target, 0, length);
    }

    /** Copies {@code length} reference accelerations of one axis from sample {@code from} into {@code target}. */
    public void readAccelerations(int axis, int from, double[] target, int length) {
        System.arraycopy(acceleration[axis], from, target, 0, length);
    }

    public double[] positions(int axis) {
        return position[axis].clone();
    }

    public double[] velocities(int axis) {
        return velocity[axis].clone();
    }

    public double[] accelerations(int axis) {
        return acceleration[axis].clone();
    }

    public double[] pathPositions() {
        return pathPosition.clone();
    }

    /** Largest |velocity| of one axis over all samples, m/s. */
    public double peakVelocity(int axis) {
        return peakAbs(velocity[axis]);
    }

    /** Largest |acceleration| of one axis over all samples, m/s². */
    public double peakAcceleration(int axis) {
        return peakAbs(acceleration[axis]);
    }

    private static double peakAbs(double[] values) {
        double max = 0;
        for (double x : values) {
            max = Math.max(max, Math.abs(x));
        }
        return max;
    }

    @Override
    public String toString() {
        return "Trajectory[" + sampleCount() + " samples × " + axisCount() + " axes, T=" + samplePeriod
                + " s, path " + path.length() + " m, " + profile.duration() + " s]";
    }
}
