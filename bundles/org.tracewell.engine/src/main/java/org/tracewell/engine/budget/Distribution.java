package org.tracewell.engine.budget;

/**
 * Probability distribution assumed for a budget line's value, with the GUM conversion of that value to a
 * standard uncertainty (JCGM 100:2008 §4.3; arcsine from EA-4/02).
 *
 * <p>The meaning of the stated value depends on the distribution: an expanded uncertainty {@code k·σ} for
 * {@link #NORMAL}, a half-width {@code a} for {@link #UNIFORM}, {@link #U_SHAPED} and {@link #TRIANGULAR}, the
 * step {@code q} (full width) for {@link #QUANTISATION}.
 */
public enum Distribution {
    /** Normal; the value is an expanded uncertainty k·σ at a stated coverage factor k (2 when not stated). */
    NORMAL("normal", "value = k·σ", "u = value / k") {
        @Override
        double divisor(double statedCoverageFactor) {
            return statedCoverageFactor;
        }
    },
    /** Rectangular over ±a. */
    UNIFORM("uniform ±a", "value = a", "u = a / √3") {
        @Override
        double divisor(double statedCoverageFactor) {
            return SQRT_3;
        }
    },
    /** Arcsine over ±a: a sinusoidal error sampled at random phase. */
    U_SHAPED("U-shaped (arcsine) ±a", "value = a", "u = a / √2") {
        @Override
        double divisor(double statedCoverageFactor) {
            return SQRT_2;
        }
    },
    /** Rounding to a step q: rectangular over ±q/2. */
    QUANTISATION("quantisation step q", "value = q", "u = q / √12") {
        @Override
        double divisor(double statedCoverageFactor) {
            return SQRT_12;
        }
    },
    /** Symmetric triangular over ±a. */
    TRIANGULAR("triangular ±a", "value = a", "u = a / √6") {
        @Override
        double divisor(double statedCoverageFactor) {
            return SQRT_6;
        }
    };

    private static final double SQRT_2 = Math.sqrt(2.0);
    private static final double SQRT_3 = Math.sqrt(3.0);
    private static final double SQRT_6 = Math.sqrt(6.0);
    private static final double SQRT_12 = Math.sqrt(12.0);

    /** Coverage factor assumed for a normal value when none is stated (JCGM 100:2008, ISO/TR 230-9). */
    public static final double DEFAULT_COVERAGE_FACTOR = 2.0;

    private final String displayName;
    private final String valueMeaning;
    private final String conversion;

    Distribution(String displayName, String valueMeaning, String conversion) {
        this.displayName = displayName;
        this.valueMeaning = valueMeaning;
        this.conversion = conversion;
    }

    abstract double divisor(double statedCoverageFactor);

    /**
     * Standard uncertainty of a stated value.
     *
     * @param value                stated value (its meaning per distribution, see the class comment); the sign
     *                             is ignored
     * @param statedCoverageFactor k of a {@link #NORMAL} value; must be finite and &gt; 0 for every distribution
     *                             so that a line may switch distribution without losing validity, but only
     *                             {@link #NORMAL} uses it
     * @return the standard uncertainty u, in the unit of {@code value}
     */
    public double standardUncertainty(double value, double statedCoverageFactor) {
        BudgetChecks.requireFinite("value", value, "");
        BudgetChecks.requirePositive("stated coverage factor k", statedCoverageFactor, "");
        return Math.abs(value) / divisor(statedCoverageFactor);
    }

    /** Name for tables and reports. */
    public String displayName() {
        return displayName;
    }

    /** What the stated value of a line with this distribution means, e.g. {@code "value = a"}. */
    public String valueMeaning() {
        return valueMeaning;
    }

    /** The GUM conversion as text, e.g. {@code "u = a / √3"}. */
    public String conversion() {
        return conversion;
    }
}
