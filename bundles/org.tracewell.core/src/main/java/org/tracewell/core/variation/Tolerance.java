package org.tracewell.core.variation;

import org.tracewell.engine.variation.ParameterDistribution;
import org.tracewell.model.ToleranceShape;

/**
 * How one attribute spreads in a Monte-Carlo study, all in the attribute's SI unit: normal with σ = width, uniform
 * over nominal ± width, or triangular over nominal ± width with its peak at the nominal; truncated to the physical
 * range [minimum, maximum].
 *
 * @param path    the attribute, e.g. {@code axis[X1].plant.loadMass}
 * @param shape   normal, uniform or triangular
 * @param width   σ (normal) or half-width a (uniform, triangular), &gt; 0
 * @param minimum lower end of the physical range; NaN for the default (0 for a positive nominal, else −∞)
 * @param maximum upper end; NaN for the default (+∞)
 */
public record Tolerance(String path, ToleranceShape shape, double width, double minimum, double maximum) {

    public Tolerance {
        if (path == null || path.isBlank()) {
            throw new IllegalArgumentException("a tolerance needs the path of the attribute it varies");
        }
        if (shape == null) {
            throw new IllegalArgumentException("tolerance of " + path + " needs a shape: normal, uniform or triangular");
        }
        if (!(width > 0) || !Double.isFinite(width)) {
            throw new IllegalArgumentException("tolerance of " + path + ": " + (shape == ToleranceShape.NORMAL
                    ? "σ" : "half-width") + " must be finite and > 0, got " + width);
        }
    }

    /** The lower end actually used for a nominal value. */
    public double lowerFor(double nominal) {
        return !Double.isNaN(minimum) ? minimum : nominal > 0 ? 0.0 : Double.NEGATIVE_INFINITY;
    }

    /** The upper end actually used. */
    public double upperFor() {
        return Double.isNaN(maximum) ? Double.POSITIVE_INFINITY : maximum;
    }

    /**
     * The engine distribution about {@code nominal}.
     *
     * @throws IllegalArgumentException naming the path when the nominal lies outside the range or nothing is left
     */
    public ParameterDistribution distribution(double nominal) {
        double lower = lowerFor(nominal);
        double upper = upperFor();
        try {
            return switch (shape) {
                case NORMAL -> ParameterDistribution.normal(nominal, width, lower, upper);
                case UNIFORM -> ParameterDistribution.uniform(nominal, width, lower, upper);
                case TRIANGULAR -> ParameterDistribution.triangular(nominal - width, nominal, nominal + width, lower,
                        upper);
            };
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("tolerance of " + path + " about its nominal " + nominal + ": "
                    + e.getMessage(), e);
        }
    }

    /** E.g. {@code normal:0.08} or {@code uniform:30,150,270}: the command line's spelling. */
    public String spec() {
        String text = shape.getLiteral() + ":" + width;
        if (!Double.isNaN(minimum) || !Double.isNaN(maximum)) {
            text += "," + (Double.isNaN(minimum) ? "" : minimum) + "," + (Double.isNaN(maximum) ? "" : maximum);
        }
        return text;
    }
}
