package org.tracewell.engine.variation;

import org.apache.commons.math3.special.Erf;

/**
 * Normal with mean {@code nominal} and standard deviation σ, truncated to the physical range [lower, upper]
 * (either end may be infinite). The truncated mean is μ + σ·(φ(α) − φ(β))/(Φ(β) − Φ(α)) with α, β the
 * standardised ends (Johnson, Kotz &amp; Balakrishnan, Continuous Univariate Distributions vol. 1, ch. 13 — from
 * memory); {@link #truncatedMean()} gives it for checks.
 * <p>
 * Numerics: Φ(z) = erfc(−z/√2)/2 keeps full relative precision in the lower tail, and every tail mass is
 * taken from the side where it is small, so ranges far out in a tail keep their precision. The quantile
 * starts from Commons Math's erfInv; for tail probabilities below 10⁻³ Newton steps against that Φ restore
 * the precision erfInv(2p − 1) loses for small p.
 * <p>
 * Immutable; a class rather than a record so that the tail masses are computed once, not per sample.
 */
public final class TruncatedNormal implements ParameterDistribution {

    /** Ranges holding less probability than this cannot be sampled to double precision. */
    private static final double MIN_MASS = 1e-250;
    /** Below this tail probability the erfInv start needs Newton refinement (its error grows like 1e-16/q). */
    private static final double REFINE_BELOW = 1e-3;

    private final double nominal;
    private final double sigma;
    private final double lower;
    private final double upper;
    // Φ(α), the mass in [α, β] and 1 − Φ(β), each from its small side: fixed per distribution, used per sample
    private final double lowerTail;
    private final double mass;
    private final double upperTail;

    public TruncatedNormal(double nominal, double sigma, double lower, double upper) {
        if (!(sigma > 0) || !Double.isFinite(sigma)) {
            throw new IllegalArgumentException("normal distribution needs a finite σ > 0, got " + sigma);
        }
        ParameterDistribution.checkRange("normal " + nominal + " (σ " + sigma + ")", nominal, lower, upper);
        this.nominal = nominal;
        this.sigma = sigma;
        this.lower = lower;
        this.upper = upper;
        double alpha = alpha();
        double beta = beta();
        this.lowerTail = phi(alpha);
        this.mass = mass(alpha, beta);
        this.upperTail = phi(-beta);
        if (!(mass > MIN_MASS)) {
            throw new IllegalArgumentException("normal " + nominal + " (σ " + sigma + ") holds no usable probability in"
                    + " the physical range [" + lower + ", " + upper + "]");
        }
    }

    @Override
    public double nominal() {
        return nominal;
    }

    public double sigma() {
        return sigma;
    }

    @Override
    public double lower() {
        return lower;
    }

    @Override
    public double upper() {
        return upper;
    }

    private double alpha() {
        return (lower - nominal) / sigma;
    }

    private double beta() {
        return (upper - nominal) / sigma;
    }

    @Override
    public double cdf(double x) {
        if (x <= lower) {
            return 0;
        }
        if (x >= upper) {
            return 1;
        }
        return mass(alpha(), (x - nominal) / sigma) / mass;
    }

    @Override
    public double quantile(double p) {
        ParameterDistribution.checkProbability(p);
        double below = lowerTail + p * mass; // Φ(z) of the wanted z
        double above = upperTail + (1 - p) * mass; // 1 − Φ(z), from the small side
        double z = below <= 0.5 ? standardQuantile(below) : -standardQuantile(above);
        double x = nominal + sigma * z;
        return Math.min(Math.max(x, lower), upper);
    }

    @Override
    public double untruncatedMean() {
        return nominal;
    }

    @Override
    public double untruncatedStandardDeviation() {
        return sigma;
    }

    /** Mean after truncation (closed form, see the class comment). */
    public double truncatedMean() {
        double alpha = alpha();
        double beta = beta();
        return nominal + sigma * (density(alpha) - density(beta)) / mass;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof TruncatedNormal t && Double.compare(t.nominal, nominal) == 0
                && Double.compare(t.sigma, sigma) == 0 && Double.compare(t.lower, lower) == 0
                && Double.compare(t.upper, upper) == 0;
    }

    @Override
    public int hashCode() {
        return java.util.Objects.hash(nominal, sigma, lower, upper);
    }

    @Override
    public String toString() {
        return "TruncatedNormal[nominal " + nominal + ", σ " + sigma + ", range " + lower + ".." + upper + "]";
    }

    /** Standard normal Φ(z), accurate in the lower tail. */
    static double phi(double z) {
        if (z == Double.NEGATIVE_INFINITY) {
            return 0;
        }
        if (z == Double.POSITIVE_INFINITY) {
            return 1;
        }
        return 0.5 * Erf.erfc(-z / Math.sqrt(2));
    }

    /** Standard normal density. */
    static double density(double z) {
        return Double.isInfinite(z) ? 0 : Math.exp(-0.5 * z * z) / Math.sqrt(2 * Math.PI);
    }

    /** P(α &lt; Z ≤ β) for a standard normal Z, taken from the side where the tails are small. */
    static double mass(double alpha, double beta) {
        if (beta <= 0) {
            return phi(beta) - phi(alpha);
        }
        if (alpha >= 0) {
            return phi(-alpha) - phi(-beta);
        }
        return 1 - phi(alpha) - phi(-beta);
    }

    /** Φ⁻¹(q) for 0 ≤ q ≤ 0.5: erfInv start, Newton steps against the tail-accurate Φ until converged. */
    static double standardQuantile(double q) {
        if (q <= 0) {
            return Double.NEGATIVE_INFINITY;
        }
        double z = Math.sqrt(2) * Erf.erfInv(2 * q - 1);
        if (q >= REFINE_BELOW) {
            return z; // relative error below 1e-13 here: 2q − 1 loses at most 1e-16/q of q
        }
        int steps = 8; // one or two as a rule; the far tail starts coarser
        if (Double.isInfinite(z)) {
            // erfInv(−1) for q below 2⁻⁵³: start from the tail asymptote −√(−2 ln q) and let Newton converge
            z = -Math.sqrt(-2 * Math.log(q));
            steps = 60;
        }
        for (int i = 0; i < steps; i++) {
            double f = density(z);
            if (!(f > 0)) {
                break;
            }
            double step = (phi(z) - q) / f;
            z -= step;
            if (Math.abs(step) <= 1e-14 * Math.abs(z)) {
                break;
            }
        }
        return z;
    }
}
