package org.tracewell.charts;

/**
 * Magnification factors for drawing micrometre errors on millimetre paths: the factor is picked from the
 * 1–2–5 series so that the largest error draws at about a stated fraction of the figure, and is printed on
 * every chart that uses it (a magnified error without its factor misleads).
 */
public final class Magnification {

    /** Default share of the path extent (or circle radius) that the largest magnified error should take. */
    public static final double DEFAULT_FRACTION = 0.12;

    private Magnification() {
    }

    /**
     * The largest 1–2–5 factor (at least 1) with {@code factor · maxDeviation ≤ fraction · lengthScale}.
     *
     * @param lengthScaleM path extent or circle radius, metres, &gt; 0
     * @param maxDeviationM largest |error| to be drawn, metres, ≥ 0 (0 gives 1)
     * @param fraction wanted share of the length scale, in (0, 1]
     */
    public static double suggest(double lengthScaleM, double maxDeviationM, double fraction) {
        if (!(lengthScaleM > 0) || !Double.isFinite(lengthScaleM)) {
            throw new IllegalArgumentException("length scale must be finite and > 0 m, got " + lengthScaleM);
        }
        if (!(maxDeviationM >= 0) || !Double.isFinite(maxDeviationM)) {
            throw new IllegalArgumentException("largest deviation must be finite and ≥ 0 m, got " + maxDeviationM);
        }
        if (!(fraction > 0 && fraction <= 1)) {
            throw new IllegalArgumentException("fraction must lie in (0, 1], got " + fraction);
        }
        if (maxDeviationM == 0) {
            return 1;
        }
        return Math.max(1, floorOneTwoFive(fraction * lengthScaleM / maxDeviationM));
    }

    /** The largest value of the 1–2–5 series (…, 0.5, 1, 2, 5, 10, …) not above {@code value} (&gt; 0). */
    static double floorOneTwoFive(double value) {
        double decade = Math.pow(10, Math.floor(Math.log10(value)));
        double mantissa = value / decade;
        // 1e-9 absorbs log10 rounding for exact powers of ten and their 2× and 5× multiples.
        double step = mantissa >= 5 - 1e-9 ? 5 : mantissa >= 2 - 1e-9 ? 2 : 1;
        return step * decade;
    }

    /** "×500", "×2000": the factor as printed on charts (whole numbers; factors are ≥ 1). */
    public static String label(double factor) {
        return "×" + (factor == Math.rint(factor) && Math.abs(factor) < 1e15
                ? Long.toString((long) factor) : Units.format3(factor));
    }

    static void requireFactor(double factor) {
        if (!(factor > 0) || !Double.isFinite(factor)) {
            throw new IllegalArgumentException("magnification must be finite and > 0, got " + factor);
        }
    }
}
