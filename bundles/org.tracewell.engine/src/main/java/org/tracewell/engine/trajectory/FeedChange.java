package org.tracewell.engine.trajectory;

/**
 * A change of feed from v0 to v1 starting and ending at zero acceleration, with acceleration limit A
 * and jerk limit J (J = ∞ gives a trapezoidal change). The jerk-limited change is the symmetric
 * "double S" velocity transition (Biagiotti &amp; Melchiorri, Trajectory Planning for Automatic
 * Machines and Robots, Springer 2008, §3.4): its speed curve is point-symmetric about its midpoint,
 * so the distance covered is the mean speed times the duration.
 */
final class FeedChange {

    private static final int BISECTION_STEPS = 200;

    private FeedChange() {
    }

    static double duration(double dv, double accel, double jerk) {
        if (dv <= 0) {
            return 0;
        }
        if (Double.isInfinite(jerk)) {
            return dv / accel;
        }
        if (dv * jerk >= accel * accel) {
            return dv / accel + accel / jerk; // reaches the acceleration limit
        }
        return 2 * Math.sqrt(dv / jerk); // triangular acceleration
    }

    static double distance(double v0, double v1, double accel, double jerk) {
        return 0.5 * (v0 + v1) * duration(Math.abs(v1 - v0), accel, jerk);
    }

    /** Largest v1 in [v0, cap] reachable from v0 within distance L. */
    static double maxReachable(double v0, double length, double accel, double jerk, double cap) {
        if (cap <= v0) {
            return cap;
        }
        if (distance(v0, cap, accel, jerk) <= length) {
            return cap;
        }
        double lo = v0;
        double hi = cap;
        for (int i = 0; i < BISECTION_STEPS && hi - lo > 1e-15 * hi; i++) {
            double mid = 0.5 * (lo + hi);
            if (distance(v0, mid, accel, jerk) <= length) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return lo;
    }

    /** Largest peak feed in [max(v0, v1), vmax] such that v0 → peak → v1 fits in distance L. */
    static double peakFeed(double v0, double v1, double length, double vmax, double accel, double jerk) {
        double lo = Math.max(v0, v1);
        if (distance(v0, vmax, accel, jerk) + distance(vmax, v1, accel, jerk) <= length) {
            return vmax;
        }
        double hi = vmax;
        for (int i = 0; i < BISECTION_STEPS && hi - lo > 1e-15 * hi; i++) {
            double mid = 0.5 * (lo + hi);
            if (distance(v0, mid, accel, jerk) + distance(mid, v1, accel, jerk) <= length) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return lo;
    }

    /**
     * Appends the pieces of the change v0 → v1 starting at path position s0; returns the distance covered.
     */
    static double append(FeedProfile.Builder out, double s0, double v0, double v1, double accel, double jerk) {
        double dv = Math.abs(v1 - v0);
        if (dv == 0) {
            return 0;
        }
        double sign = v1 > v0 ? 1 : -1;
        if (Double.isInfinite(jerk)) {
            out.add(dv / accel, s0, v0, sign * accel, 0);
            return distance(v0, v1, accel, jerk);
        }
        double s = s0;
        double v = v0;
        if (dv * jerk >= accel * accel) {
            double tj = accel / jerk;
            double tc = dv / accel - tj;
            double j = sign * jerk;
            double a = sign * accel;
            out.add(tj, s, v, 0, j);
            s += v * tj + j * tj * tj * tj / 6;
            v += j * tj * tj / 2;
            out.add(tc, s, v, a, 0);
            s += v * tc + a * tc * tc / 2;
            v += a * tc;
            out.add(tj, s, v, a, -j);
        } else {
            double tj = Math.sqrt(dv / jerk);
            double j = sign * jerk;
            out.add(tj, s, v, 0, j);
            s += v * tj + j * tj * tj * tj / 6;
            v += j * tj * tj / 2;
            out.add(tj, s, v, j * tj, -j);
        }
        return distance(v0, v1, accel, jerk);
    }
}
