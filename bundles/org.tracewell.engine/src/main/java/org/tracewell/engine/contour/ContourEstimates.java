package org.tracewell.engine.contour;

/**
 * Closed-form estimates shown beside simulated figures, for equal or mismatched first-order position
 * loops Kv/(s + Kv) in steady state. SI units: m, m/s, 1/s, rad.
 */
public final class ContourEstimates {

    private ContourEstimates() {
    }

    /** Following error of a type-1 loop at constant velocity: e = v/Kv (trade rule, exact in steady state). */
    public static double followingError(double velocity, double kv) {
        requirePositive("Kv", kv);
        return velocity / kv;
    }

    /**
     * Radius loss of a circle of radius R at feed F with equal first-order loops, exact steady state:
     * ΔR = R·(1 − 1/√(1 + (ω/Kv)²)), ω = F/R (the loop's gain |Kv/(jω + Kv)| at the circle frequency).
     */
    public static double circleRadiusLossExact(double radius, double feed, double kv) {
        requirePositive("radius", radius);
        requirePositive("Kv", kv);
        double w = feed / radius / kv;
        return radius * (1 - 1 / Math.sqrt(1 + w * w));
    }

    /** Small-lag approximation of the radius loss: ΔR ≈ F²/(2·R·Kv²) = a_c/(2Kv²). */
    public static double circleRadiusLossApprox(double radius, double feed, double kv) {
        requirePositive("radius", radius);
        requirePositive("Kv", kv);
        return feed * feed / (2 * radius * kv * kv);
    }

    /**
     * Circular deviation from a gain mismatch on a circle: G ≈ F·|1/Kx − 1/Ky|, an ellipse on the
     * diagonals whose major axis flips with the direction.
     */
    public static double circleMismatchDeviation(double feed, double kx, double ky) {
        requirePositive("Kx", kx);
        requirePositive("Ky", ky);
        return feed * Math.abs(1 / kx - 1 / ky);
    }

    /**
     * Steady contour error on a straight line at angle θ to the first axis with gains Kx, Ky
     * (Koren 1980): ε = (V/2)·sin 2θ·(1/Kx − 1/Ky), positive to the left of travel.
     */
    public static double lineMismatchError(double velocity, double angle, double kx, double ky) {
        requirePositive("Kx", kx);
        requirePositive("Ky", ky);
        return velocity / 2 * Math.sin(2 * angle) * (1 / kx - 1 / ky);
    }

    /**
     * Largest contour error at a 90° corner passed at speed V without slowing, equal first-order loops:
     * V/(e·Kv) ≈ 0.368·V/Kv, cutting inside the corner, reached 1/Kv after the corner.
     */
    public static double cornerMaxError(double velocity, double kv) {
        requirePositive("Kv", kv);
        return velocity / (Math.E * kv);
    }

    private static void requirePositive(String what, double value) {
        if (!(value > 0) || !Double.isFinite(value)) {
            throw new IllegalArgumentException(what + " must be finite and > 0, got " + value);
        }
    }
}
