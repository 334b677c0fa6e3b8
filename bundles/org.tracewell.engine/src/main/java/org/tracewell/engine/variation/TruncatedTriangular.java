package org.tracewell.engine.variation;

/**
 * Triangular on [min, max] with mode c (the nominal), truncated to the physical range [lower, upper].
 * CDF (x − a)²/((b − a)(c − a)) for a ≤ x ≤ c and 1 − (b − x)²/((b − a)(b − c)) for c &lt; x ≤ b, inverted in
 * closed form. Before truncation: mean (a + b + c)/3, variance (a² + b² + c² − ab − ac − bc)/18 (Evans,
 * Hastings &amp; Peacock, Statistical Distributions — from memory).
 *
 * @param min   a, finite
 * @param mode  c, a ≤ c ≤ b; the nominal value
 * @param max   b &gt; a, finite
 * @param lower lower end of the physical range
 * @param upper upper end of the physical range
 */
public record TruncatedTriangular(double min, double mode, double max, double lower, double upper)
        implements ParameterDistribution {

    public TruncatedTriangular {
        if (!Double.isFinite(min) || !Double.isFinite(max) || !(min < max) || !(mode >= min && mode <= max)) {
            throw new IllegalArgumentException("triangular distribution needs finite min < max and min ≤ mode ≤ max, got"
                    + " min " + min + ", mode " + mode + ", max " + max);
        }
        ParameterDistribution.checkRange("triangular (" + min + ", " + mode + ", " + max + ")", mode, lower, upper);
        if (!(Math.min(max, upper) > Math.max(min, lower))) {
            throw new IllegalArgumentException("triangular (" + min + ", " + mode + ", " + max + ") has no probability"
                    + " left inside the physical range [" + lower + ", " + upper + "]");
        }
    }

    @Override
    public double nominal() {
        return mode;
    }

    private double from() {
        return Math.max(min, lower);
    }

    private double to() {
        return Math.min(max, upper);
    }

    /** CDF before truncation. */
    private double rawCdf(double x) {
        if (x <= min) {
            return 0;
        }
        if (x >= max) {
            return 1;
        }
        double width = max - min;
        if (x <= mode) {
            return (x - min) * (x - min) / (width * (mode - min));
        }
        return 1 - (max - x) * (max - x) / (width * (max - mode));
    }

    /** Quantile before truncation. */
    private double rawQuantile(double p) {
        double width = max - min;
        double atMode = (mode - min) / width;
        if (p <= atMode) {
            return min + Math.sqrt(p * width * (mode - min));
        }
        return max - Math.sqrt((1 - p) * width * (max - mode));
    }

    @Override
    public double cdf(double x) {
        double a = from();
        double b = to();
        if (x <= a) {
            return 0;
        }
        if (x >= b) {
            return 1;
        }
        double fa = rawCdf(a);
        return (rawCdf(x) - fa) / (rawCdf(b) - fa);
    }

    @Override
    public double quantile(double p) {
        ParameterDistribution.checkProbability(p);
        double a = from();
        double b = to();
        double fa = rawCdf(a);
        double x = rawQuantile(fa + p * (rawCdf(b) - fa));
        return Math.min(Math.max(x, a), b);
    }

    @Override
    public double untruncatedMean() {
        return (min + mode + max) / 3;
    }

    @Override
    public double untruncatedStandardDeviation() {
        double a = min;
        double b = max;
        double c = mode;
        return Math.sqrt((a * a + b * b + c * c - a * b - a * c - b * c) / 18);
    }
}
