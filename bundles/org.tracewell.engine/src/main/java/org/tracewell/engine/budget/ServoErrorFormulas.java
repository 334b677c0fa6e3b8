package org.tracewell.engine.budget;

/**
 * Forward steady-state relations between axis parameters and contour error that {@link InverseDesign} inverts.
 * They are the closed-form estimates of DOMAIN.md §4, used to size allocations and to check an inverse by
 * substitution; the contour engine computes the exact errors of a simulated path. SI units throughout.
 */
public final class ServoErrorFormulas {

    /** Source of the circular-deviation relation. */
    public static final String KAKINO_1993 = "Kakino, Ihara & Shinohara, Accuracy Inspection of NC Machine "
            + "Tools by Double Ball Bar Method, 1993 (from memory)";
    /** Source of the straight-line relation. */
    public static final String KOREN_1980 = "Koren, ASME J. Dyn. Sys. Meas. Control 102(4), 1980 (from memory)";
    /** The radius-loss and corner relations follow from first-order loops Kv/(s + Kv). */
    public static final String FIRST_ORDER_LOOPS = "derived for equal first-order loops Kv/(s + Kv) "
            + "(DOMAIN.md §4, [der])";
    /** Quantisation conversion. */
    public static final String GUM_QUANTISATION = "JCGM 100:2008, rounding to step q: u = q/√12 (from memory)";

    private ServoErrorFormulas() {
    }

    /** |1/Kx − 1/Ky|, s, for position gains in 1/s. */
    public static double gainMismatch(double kx, double ky) {
        BudgetChecks.requirePositive("position gain Kx", kx, "1/s");
        BudgetChecks.requirePositive("position gain Ky", ky, "1/s");
        return Math.abs(1.0 / kx - 1.0 / ky);
    }

    /** Circular deviation G ≈ F·|1/Kx − 1/Ky| of a circle at feed F (m/s), metres. */
    public static double circularDeviationFromMismatch(double feed, double mismatch) {
        BudgetChecks.requirePositive("feed F", feed, "m/s");
        BudgetChecks.requireNonNegative("mismatch |1/Kx − 1/Ky|", mismatch, "s");
        return feed * mismatch;
    }

    /**
     * Magnitude of the steady-state contour error on a straight line at angle θ (radians from the x axis) and
     * speed V (m/s): ε = (V/2)·|sin 2θ|·|1/Kx − 1/Ky|, metres.
     */
    public static double lineContourErrorFromMismatch(double speed, double angle, double mismatch) {
        BudgetChecks.requirePositive("path speed V", speed, "m/s");
        BudgetChecks.requireFinite("line angle θ", angle, "rad");
        BudgetChecks.requireNonNegative("mismatch |1/Kx − 1/Ky|", mismatch, "s");
        return 0.5 * speed * Math.abs(Math.sin(2.0 * angle)) * mismatch;
    }

    /**
     * Radius loss of a circle of radius R (m) at feed F (m/s) with equal loops of gain Kv (1/s):
     * ΔR = R·(1 − 1/√(1 + (ω/Kv)²)), ω = F/R, metres; evaluated as R·x²/(√(1+x²)·(1+√(1+x²))) so that small
     * losses keep full precision.
     */
    public static double radiusLoss(double radius, double feed, double kv) {
        BudgetChecks.requirePositive("radius R", radius, "m");
        BudgetChecks.requirePositive("feed F", feed, "m/s");
        BudgetChecks.requirePositive("position gain Kv", kv, "1/s");
        double x = feed / radius / kv;
        double root = Math.sqrt(1.0 + x * x);
        return radius * x * x / (root * (1.0 + root));
    }

    /** Largest contour error at a 90° corner driven at speed V (m/s) without deceleration: V/(e·Kv), metres. */
    public static double cornerError(double speed, double kv) {
        BudgetChecks.requirePositive("path speed V", speed, "m/s");
        BudgetChecks.requirePositive("position gain Kv", kv, "1/s");
        return speed / (Math.E * kv);
    }

    /**
     * Budget contribution of encoder quantisation with step q (m) projected with {@code sensitivity}:
     * random (GUM) k·|s|·q/√12, or systematic (rounding bound) |s|·q/2, metres.
     */
    public static double quantisationContribution(double resolution, double sensitivity, ErrorClass treatment,
                                                  double budgetCoverageFactor) {
        BudgetChecks.requirePositive("encoder resolution q", resolution, "m");
        BudgetChecks.requireFinite("sensitivity", sensitivity, "");
        BudgetChecks.requireNonNull("quantisation treatment", treatment);
        BudgetChecks.requirePositive("budget coverage factor k", budgetCoverageFactor, "");
        return treatment == ErrorClass.RANDOM
                ? budgetCoverageFactor * Math.abs(sensitivity) * resolution / Math.sqrt(12.0)
                : Math.abs(sensitivity) * resolution / 2.0;
    }
}
