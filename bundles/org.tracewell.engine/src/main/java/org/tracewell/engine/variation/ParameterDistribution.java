package org.tracewell.engine.variation;

import org.apache.commons.math3.random.RandomGenerator;

/**
 * The spread of one model parameter: a distribution with a nominal value, truncated to the parameter's
 * physical range [lower, upper] (a gain stays positive, a fraction inside 0..1). Immutable.
 * <p>
 * Sampling is by the inverse CDF on the truncated range: a uniform u in [0, 1) maps to
 * F⁻¹(F(lower') + u·(F(upper') − F(lower'))), where lower', upper' is the intersection of the range with the
 * distribution's support. Unlike rejection, this draws exactly one uniform per parameter per variant, so the
 * random stream of a variant never depends on how many draws a truncation rejected.
 */
public sealed interface ParameterDistribution
        permits TruncatedNormal, TruncatedUniform, TruncatedTriangular, FixedParameter {

    /** The nominal (design) value. */
    double nominal();

    /** Lower end of the physical range the samples are truncated to (may be −∞). */
    double lower();

    /** Upper end of the physical range (may be +∞). */
    double upper();

    /** Cumulative probability of the truncated distribution at x. */
    double cdf(double x);

    /** Quantile of the truncated distribution, p in [0, 1]. */
    double quantile(double p);

    /** Mean of the distribution before truncation. */
    double untruncatedMean();

    /** Standard deviation of the distribution before truncation. */
    double untruncatedStandardDeviation();

    /** One sample: exactly one uniform from {@code random}. */
    default double sample(RandomGenerator random) {
        return quantile(random.nextDouble());
    }

    /** Normal with mean {@code nominal} and standard deviation {@code sigma}, truncated to [lower, upper]. */
    static ParameterDistribution normal(double nominal, double sigma, double lower, double upper) {
        return new TruncatedNormal(nominal, sigma, lower, upper);
    }

    /** Uniform on nominal ± halfWidth, truncated to [lower, upper]. */
    static ParameterDistribution uniform(double nominal, double halfWidth, double lower, double upper) {
        return new TruncatedUniform(nominal, halfWidth, lower, upper);
    }

    /** Triangular on [min, max] with its mode (the nominal) at {@code mode}, truncated to [lower, upper]. */
    static ParameterDistribution triangular(double min, double mode, double max, double lower, double upper) {
        return new TruncatedTriangular(min, mode, max, lower, upper);
    }

    /** A parameter held at its nominal value. */
    static ParameterDistribution fixed(double value) {
        return new FixedParameter(value);
    }

    /** Checks the shared range rules; {@code what} names the distribution in messages. */
    static void checkRange(String what, double nominal, double lower, double upper) {
        if (!Double.isFinite(nominal)) {
            throw new IllegalArgumentException(what + ": nominal value must be finite, got " + nominal);
        }
        if (Double.isNaN(lower) || Double.isNaN(upper) || !(lower < upper)) {
            throw new IllegalArgumentException(what + ": physical range needs lower < upper, got [" + lower + ", "
                    + upper + "]");
        }
        if (nominal < lower || nominal > upper) {
            throw new IllegalArgumentException(what + ": nominal " + nominal + " lies outside the physical range ["
                    + lower + ", " + upper + "]");
        }
    }

    /** Clamps p to [0, 1] after checking it is a probability. */
    static double checkProbability(double p) {
        if (!(p >= 0 && p <= 1)) {
            throw new IllegalArgumentException("quantile needs a probability in 0..1, got " + p);
        }
        return p;
    }
}
