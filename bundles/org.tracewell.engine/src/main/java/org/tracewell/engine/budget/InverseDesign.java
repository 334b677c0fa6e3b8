package org.tracewell.engine.budget;

/**
 * Closed-form inverses of {@link ServoErrorFormulas}: from an allowed error to the limit it puts on an axis
 * parameter. Each result names its quantity, bound, SI unit, formula and source so the requirements layer can
 * state it as a derived axis requirement. SI units throughout (m, s, m/s, 1/s).
 */
public final class InverseDesign {

    /** Below this |sin 2θ| a line is taken as axis-parallel: a gain mismatch then causes no contour error. */
    private static final double AXIS_PARALLEL_SIN = 1e-12;

    private InverseDesign() {
    }

    /**
     * The largest value the line {@code lineId} of {@code budget} may take while the budget's total (in its own
     * combination method and coverage factor) stays within {@code allowedTotal}, m, all other lines held: the
     * headroom a budget leaves for one contributor. The total never decreases as a line grows (each method is a
     * monotone function of |c_i|), so an upper bracket found by doubling and then bisection give it to 1e-12
     * relative. Returns 0 when the other lines alone already use up the allowed total, and +∞ when the line does
     * not count towards the total (sensitivity 0).
     */
    public static double headroomForLine(ErrorBudget budget, String lineId, double allowedTotal) {
        BudgetChecks.requireNonNull("budget", budget);
        BudgetChecks.requireNonNegative("allowed total", allowedTotal, "m");
        BudgetLine line = budget.lines().stream().filter(l -> l.id().equals(lineId)).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("budget " + budget.name() + " has no line with id \""
                        + lineId + "\"; known ids: " + budget.lines().stream().map(BudgetLine::id).toList()));
        if (totalWith(budget, line, 0) > allowedTotal) {
            return 0;
        }
        double high = Math.max(allowedTotal, 1e-12);
        while (totalWith(budget, line, high) <= allowedTotal) {
            high *= 2;
            if (high > 1e6) {
                return Double.POSITIVE_INFINITY;
            }
        }
        double low = 0;
        for (int i = 0; i < 200 && high - low > 1e-12 * high; i++) {
            double mid = 0.5 * (low + high);
            if (totalWith(budget, line, mid) <= allowedTotal) {
                low = mid;
            } else {
                high = mid;
            }
        }
        return low;
    }

    private static double totalWith(ErrorBudget budget, BudgetLine line, double value) {
        return budget.withReplacedLine(line.withValue(value)).evaluate().total();
    }

    /**
     * Largest |1/Kx − 1/Ky| that keeps the circular deviation from gain mismatch within {@code allowedDeviation}
     * (m, &gt;= 0) at feed {@code feed} (m/s): G/F.
     */
    public static DesignLimit maxGainMismatchForCircularDeviation(double allowedDeviation, double feed) {
        BudgetChecks.requireNonNegative("allowed circular deviation G", allowedDeviation, "m");
        BudgetChecks.requirePositive("feed F", feed, "m/s");
        return new DesignLimit("|1/Kx − 1/Ky|", LimitBound.AT_MOST, allowedDeviation / feed, "s",
                "|1/Kx − 1/Ky| ≤ G/F, from G ≈ F·|1/Kx − 1/Ky|", ServoErrorFormulas.KAKINO_1993);
    }

    /**
     * Largest |1/Kx − 1/Ky| that keeps the steady-state contour error on a line at {@code angle} (rad) and
     * {@code speed} (m/s) within {@code allowedError} (m, &gt;= 0): 2ε/(V·|sin 2θ|); unlimited (+∞) on a line
     * parallel to an axis.
     */
    public static DesignLimit maxGainMismatchForLine(double allowedError, double speed, double angle) {
        BudgetChecks.requireNonNegative("allowed contour error ε", allowedError, "m");
        BudgetChecks.requirePositive("path speed V", speed, "m/s");
        BudgetChecks.requireFinite("line angle θ", angle, "rad");
        double sin2 = Math.abs(Math.sin(2.0 * angle));
        double limit = sin2 < AXIS_PARALLEL_SIN ? Double.POSITIVE_INFINITY : 2.0 * allowedError / (speed * sin2);
        return new DesignLimit("|1/Kx − 1/Ky|", LimitBound.AT_MOST, limit, "s",
                "|1/Kx − 1/Ky| ≤ 2ε/(V·|sin 2θ|), from ε = (V/2)·sin 2θ·(1/Kx − 1/Ky)",
                ServoErrorFormulas.KOREN_1980);
    }

    /**
     * Smallest Kv (1/s) of equal first-order loops that keeps the radius loss of a circle of {@code radius} (m)
     * at {@code feed} (m/s) within {@code allowedLoss} (m, in (0, R)): with d = ΔR/R and ω = F/R,
     * Kv = ω·(1 − d)/√(d·(2 − d)), the exact inverse of ΔR = R·(1 − 1/√(1 + (ω/Kv)²)).
     */
    public static DesignLimit minPositionGainForRadiusLoss(double radius, double feed, double allowedLoss) {
        BudgetChecks.requirePositive("feed F", feed, "m/s");
        double d = relativeRadiusLoss(radius, allowedLoss);
        double omega = feed / radius;
        return new DesignLimit("Kv", LimitBound.AT_LEAST, omega * (1.0 - d) / Math.sqrt(d * (2.0 - d)), "1/s",
                "Kv ≥ ω·(1 − d)/√(d·(2 − d)), d = ΔR/R, ω = F/R; inverts ΔR = R·(1 − 1/√(1 + (ω/Kv)²))",
                ServoErrorFormulas.FIRST_ORDER_LOOPS);
    }

    /**
     * Highest feed (m/s) on a circle of {@code radius} (m) for equal loops of gain {@code kv} (1/s) with a
     * radius loss of at most {@code allowedLoss} (m, in (0, R)): F = R·Kv·√(d·(2 − d))/(1 − d), d = ΔR/R.
     */
    public static DesignLimit maxFeedForRadiusLoss(double radius, double kv, double allowedLoss) {
        BudgetChecks.requirePositive("position gain Kv", kv, "1/s");
        double d = relativeRadiusLoss(radius, allowedLoss);
        return new DesignLimit("F", LimitBound.AT_MOST, radius * kv * Math.sqrt(d * (2.0 - d)) / (1.0 - d), "m/s",
                "F ≤ R·Kv·√(d·(2 − d))/(1 − d), d = ΔR/R; inverts ΔR = R·(1 − 1/√(1 + (F/(R·Kv))²))",
                ServoErrorFormulas.FIRST_ORDER_LOOPS);
    }

    /**
     * Smallest Kv (1/s) that keeps the contour error at a 90° corner driven at {@code speed} (m/s) without
     * deceleration within {@code allowedError} (m, &gt; 0): Kv = V/(e·ε).
     */
    public static DesignLimit minPositionGainForCornerError(double speed, double allowedError) {
        BudgetChecks.requirePositive("path speed V", speed, "m/s");
        BudgetChecks.requirePositive("allowed corner error ε", allowedError, "m");
        return new DesignLimit("Kv", LimitBound.AT_LEAST, speed / (Math.E * allowedError), "1/s",
                "Kv ≥ V/(e·ε), from ε = V/(e·Kv) ≈ 0.368·V/Kv", ServoErrorFormulas.FIRST_ORDER_LOOPS);
    }

    /**
     * Largest encoder resolution q (m) whose quantisation contributes at most {@code allowedContribution} (m,
     * &gt; 0) to a budget: treated as random (GUM, the way a budget line with {@link Distribution#QUANTISATION}
     * enters) q = √12·c/(k·|s|); treated as systematic (rounding bound ±q/2) q = 2·c/|s|.
     *
     * @param sensitivity          projection of the axis error onto the path normal, non-zero
     * @param treatment            how the quantisation line is classed in the budget
     * @param budgetCoverageFactor k of the budget (used by the random treatment only)
     */
    public static DesignLimit maxEncoderResolution(double allowedContribution, double sensitivity,
                                                   ErrorClass treatment, double budgetCoverageFactor) {
        BudgetChecks.requirePositive("allowed quantisation contribution", allowedContribution, "m");
        BudgetChecks.requireFinite("sensitivity", sensitivity, "");
        if (sensitivity == 0.0) {
            throw new IllegalArgumentException("sensitivity = 0 puts no limit on the encoder resolution; "
                    + "give a non-zero projection factor");
        }
        BudgetChecks.requireNonNull("quantisation treatment", treatment);
        BudgetChecks.requirePositive("budget coverage factor k", budgetCoverageFactor, "");
        double s = Math.abs(sensitivity);
        return treatment == ErrorClass.RANDOM
                ? new DesignLimit("q", LimitBound.AT_MOST, Math.sqrt(12.0) * allowedContribution
                / (budgetCoverageFactor * s), "m", "q ≤ √12·c/(k·|s|), from c = k·|s|·q/√12",
                ServoErrorFormulas.GUM_QUANTISATION)
                : new DesignLimit("q", LimitBound.AT_MOST, 2.0 * allowedContribution / s, "m",
                "q ≤ 2·c/|s|, from the rounding bound c = |s|·q/2", "rounding quantiser, error within ±q/2");
    }

    /** ΔR/R after checking 0 &lt; ΔR &lt; R (ΔR → R only as Kv → 0, so larger losses constrain nothing). */
    private static double relativeRadiusLoss(double radius, double allowedLoss) {
        BudgetChecks.requirePositive("radius R", radius, "m");
        if (!(allowedLoss > 0.0 && allowedLoss < radius)) {
            throw new IllegalArgumentException("allowed radius loss ΔR = " + allowedLoss
                    + " m is outside the valid range (0, R) = (0, " + radius + ") m");
        }
        return allowedLoss / radius;
    }
}
