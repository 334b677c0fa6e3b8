package org.tracewell.engine.variation;

/**
 * A parameter that does not vary: every sample is {@code value}. It still consumes its one uniform per
 * variant, so fixing a parameter does not shift the random values of the others.
 *
 * @param value the value, finite
 */
public record FixedParameter(double value) implements ParameterDistribution {

    public FixedParameter {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("fixed parameter value must be finite, got " + value);
        }
    }

    @Override
    public double nominal() {
        return value;
    }

    @Override
    public double lower() {
        return value;
    }

    @Override
    public double upper() {
        return value;
    }

    @Override
    public double cdf(double x) {
        return x >= value ? 1 : 0;
    }

    @Override
    public double quantile(double p) {
        ParameterDistribution.checkProbability(p);
        return value;
    }

    @Override
    public double untruncatedMean() {
        return value;
    }

    @Override
    public double untruncatedStandardDeviation() {
        return 0;
    }
}
