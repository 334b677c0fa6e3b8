package org.tracewell.engine.trajectory;

import java.util.Arrays;

/**
 * Arc length along a path as a function of time, piecewise with constant jerk: each piece k starts at
 * time t_k with position s_k, feed v_k, acceleration a_k and keeps jerk j_k. Compact (a few pieces per
 * segment), so a path of any sample count is described without holding samples.
 */
public final class FeedProfile {

    private final double[] startTime;
    private final double[] startPosition;
    private final double[] startFeed;
    private final double[] startAcceleration;
    private final double[] jerk;
    private final double duration;
    private final double length;

    FeedProfile(double[] startTime, double[] startPosition, double[] startFeed, double[] startAcceleration,
                double[] jerk, double duration, double length) {
        this.startTime = startTime;
        this.startPosition = startPosition;
        this.startFeed = startFeed;
        this.startAcceleration = startAcceleration;
        this.jerk = jerk;
        this.duration = duration;
        this.length = length;
    }

    /** Total time from start to end of the path, seconds. */
    public double duration() {
        return duration;
    }

    /** Path length covered, metres. */
    public double length() {
        return length;
    }

    public int pieceCount() {
        return startTime.length;
    }

    /** State at time t (clamped to [0, duration]); allocates, for occasional queries. */
    public FeedState stateAt(double t) {
        Cursor c = cursor();
        c.seek(t);
        return new FeedState(c.time(), c.pathPosition(), c.feed(), c.acceleration(), c.jerk());
    }

    /** A reusable evaluator, fastest for increasing times; not thread-safe. */
    public Cursor cursor() {
        return new Cursor();
    }

    /** Largest feed reached, m/s (pieces are monotone in acceleration, so ends and zero-acceleration points suffice). */
    public double maxFeed() {
        double max = 0;
        for (int k = 0; k < startTime.length; k++) {
            max = Math.max(max, startFeed[k]);
            double tau = pieceDuration(k);
            max = Math.max(max, startFeed[k] + startAcceleration[k] * tau + jerk[k] * tau * tau / 2);
            if (jerk[k] != 0) {
                double tz = -startAcceleration[k] / jerk[k];
                if (tz > 0 && tz < tau) {
                    max = Math.max(max, startFeed[k] + startAcceleration[k] * tz + jerk[k] * tz * tz / 2);
                }
            }
        }
        return max;
    }

    private double pieceDuration(int k) {
        return (k + 1 < startTime.length ? startTime[k + 1] : duration) - startTime[k];
    }

    /** Evaluates the profile at successive times without allocating. */
    public final class Cursor {
        private int piece;
        private double time;
        private double s;
        private double v;
        private double a;
        private double j;

        private Cursor() {
        }

        /** Moves to time t (clamped to [0, duration]). */
        public void seek(double t) {
            double tc = t <= 0 ? 0 : Math.min(t, duration);
            if (tc < startTime[piece]) {
                piece = 0;
            }
            while (piece + 1 < startTime.length && startTime[piece + 1] <= tc) {
                piece++;
            }
            double tau = tc - startTime[piece];
            double a0 = startAcceleration[piece];
            double jk = jerk[piece];
            time = tc;
            s = startPosition[piece] + tau * (startFeed[piece] + tau * (a0 / 2 + tau * jk / 6));
            v = startFeed[piece] + tau * (a0 + tau * jk / 2);
            a = a0 + tau * jk;
            j = jk;
            if (s > length) {
                s = length; // rounding of the last piece must not overrun the path end
            }
        }

        public double time() {
            return time;
        }

        public double pathPosition() {
            return s;
        }

        public double feed() {
            return v;
        }

        public double acceleration() {
            return a;
        }

        public double jerk() {
            return j;
        }
    }

    /** Collects pieces while planning. */
    static final class Builder {
        private double[] t = new double[16];
        private double[] s = new double[16];
        private double[] v = new double[16];
        private double[] a = new double[16];
        private double[] jk = new double[16];
        private int size;
        private double clock;

        /** Appends a piece of the given duration; zero-length pieces are skipped. */
        void add(double duration, double s0, double v0, double a0, double jerk) {
            if (!(duration > 0)) {
                return;
            }
            if (size == t.length) {
                int n = size * 2;
                t = Arrays.copyOf(t, n);
                s = Arrays.copyOf(s, n);
                v = Arrays.copyOf(v, n);
                a = Arrays.copyOf(a, n);
                jk = Arrays.copyOf(jk, n);
            }
            t[size] = clock;
            s[size] = s0;
            v[size] = v0;
            a[size] = a0;
            jk[size] = jerk;
            size++;
            clock += duration;
        }

        FeedProfile build(double length) {
            if (size == 0) {
                throw new IllegalStateException("no motion was planned");
            }
            return new FeedProfile(Arrays.copyOf(t, size), Arrays.copyOf(s, size), Arrays.copyOf(v, size),
                    Arrays.copyOf(a, size), Arrays.copyOf(jk, size), clock, length);
        }
    }
}
