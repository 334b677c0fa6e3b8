package org.tracewell.engine.variation;

/**
 * Uniform on nominal ± halfWidth, truncated to the physical range [lower, upper]; still uniform on the
 * intersection. Before truncation σ = a/√3 (GUM, JCGM 100:2008, 4.3.7 — from memory).
 *
 * @param nominal   centre, finite
 * @param halfWidth a &gt; 0
 * @param lower     lower end of the physical range
 * @param upper     upper end of the physical range
 */
public record TruncatedUniform(double nominal, double halfWidth, double lower, double upper)
        implements ParameterDistribution {

    public TruncatedUniform {
        if (!(halfWidth > 0) || !Double.isFinite(halfWidth)) {
            throw new IllegalArgumentException("uniform distribution needs a finite half-width a > 0, got " + halfWidth);
        }
        ParameterDistribution.checkRange("uniform " + nominal + " ± " + halfWidth, nominal, lower, upper);
    }

    /** Lower end of the sampled interval: the support cut by the range. */
    public double from() {
        return Math.max(nominal - halfWidth, lower);
    }

    /** Upper end of the sampled interval. */
    public double to() {
        return Math.min(nominal + halfWidth, upper);
    }

    @Override
    public double cdf(double x) {
        double a = from();
        double b = to();
        return x <= a ? 0 : x >= b ? 1 : (x - a) / (b - a);
    }

    @Override
    public double quantile(double p) {
        ParameterDistribution.checkProbability(p);
        double a = from();
        double b = to();
        return Math.min(a + p * (b - a), b);
    }

    @Override
    public double untruncatedMean() {
        return nominal;
    }

    @Override
    public double untruncatedStandardDeviation() {
        return halfWidth / Math.sqrt(3);
    }
}
