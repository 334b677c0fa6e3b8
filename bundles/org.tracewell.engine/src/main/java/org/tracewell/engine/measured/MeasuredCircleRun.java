package org.tracewell.engine.measured;

import org.tracewell.engine.path.ArcDirection;

/**
 * One measured run of a circular test: the sampled positions in plane coordinates (metres, in time order) and the
 * direction the machine travelled. Immutable; array accessors copy.
 */
public final class MeasuredCircleRun {

    private final ArcDirection direction;
    private final double[] u;
    private final double[] v;
    private final int firstLine;

    MeasuredCircleRun(ArcDirection direction, double[] u, double[] v, int firstLine) {
        this.direction = direction;
        this.u = u;
        this.v = v;
        this.firstLine = firstLine;
    }

    public ArcDirection direction() {
        return direction;
    }

    public int sampleCount() {
        return u.length;
    }

    /** First plane coordinate of sample k, metres. */
    public double u(int k) {
        return u[k];
    }

    /** Second plane coordinate of sample k, metres. */
    public double v(int k) {
        return v[k];
    }

    public double[] us() {
        return u.clone();
    }

    public double[] vs() {
        return v.clone();
    }

    /** File line of the run's first sample (0 for runs not read from a file). */
    public int firstLine() {
        return firstLine;
    }

    /** Polar angle of every sample about {@code (cu, cv)}, rad. */
    public double[] angles(double cu, double cv) {
        double[] a = new double[u.length];
        for (int k = 0; k < a.length; k++) {
            a[k] = Math.atan2(v[k] - cv, u[k] - cu);
        }
        return a;
    }

    /** Radial deviation ρ − R of every sample about {@code (cu, cv)}, metres. */
    public double[] radialDeviations(double cu, double cv, double radius) {
        double[] d = new double[u.length];
        for (int k = 0; k < d.length; k++) {
            d[k] = Math.hypot(u[k] - cu, v[k] - cv) - radius;
        }
        return d;
    }
}
