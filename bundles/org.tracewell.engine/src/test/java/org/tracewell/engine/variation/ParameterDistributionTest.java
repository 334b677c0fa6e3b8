package org.tracewell.engine.variation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.random.RandomGenerator;
import org.apache.commons.math3.random.Well19937c;
import org.junit.jupiter.api.Test;

class ParameterDistributionTest {

    private static final int N = 100_000;

    /** Sample mean and standard deviation of N draws. */
    private static double[] moments(ParameterDistribution d, long seed) {
        RandomGenerator random = new Well19937c(seed);
        double sum = 0;
        double sumSq = 0;
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < N; i++) {
            double x = d.sample(random);
            sum += x;
            sumSq += x * x;
            min = Math.min(min, x);
            max = Math.max(max, x);
        }
        double mean = sum / N;
        return new double[] {mean, Math.sqrt((sumSq - N * mean * mean) / (N - 1)), min, max};
    }

    /**
     * Sampling-error bounds at 4 standard errors: SE(mean) = σ/√N; SE(s) ≈ σ·√((κ − 1)/(4N)) with κ the kurtosis
     * (normal 3, uniform 1.8, triangular 2.4) — large-sample variance of the sample standard deviation (from memory).
     */
    private static void assertMoments(ParameterDistribution d, double mean, double sigma, double kurtosis, long seed) {
        double[] m = moments(d, seed);
        assertEquals(mean, m[0], 4 * sigma / Math.sqrt(N), "sample mean");
        assertEquals(sigma, m[1], 4 * sigma * Math.sqrt((kurtosis - 1) / (4.0 * N)), "sample standard deviation");
    }

    @Test
    void untruncatedNormalHasItsMeanAndSigma() {
        ParameterDistribution d = ParameterDistribution.normal(50, 2.5, Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY);
        // normal: mean μ, standard deviation σ, kurtosis 3 (definition)
        assertMoments(d, 50, 2.5, 3, 11);
        assertEquals(2.5, d.untruncatedStandardDeviation(), 0);
    }

    @Test
    void uniformHasSigmaHalfWidthOverRootThree() {
        ParameterDistribution d = ParameterDistribution.uniform(3e-3, 0.3e-3, 0, 1);
        // uniform ±a: σ = a/√3 (GUM, JCGM 100:2008, 4.3.7 — from memory); kurtosis 9/5
        assertMoments(d, 3e-3, 0.3e-3 / Math.sqrt(3), 1.8, 12);
        assertEquals(0.3e-3 / Math.sqrt(3), d.untruncatedStandardDeviation(), 1e-18);
    }

    @Test
    void triangularHasTheTextbookMeanAndVariance() {
        double a = 10;
        double c = 12;
        double b = 20;
        ParameterDistribution d = ParameterDistribution.triangular(a, c, b, 0, 100);
        // mean (a + b + c)/3, variance (a² + b² + c² − ab − ac − bc)/18 (Evans, Hastings & Peacock — from memory);
        // kurtosis 12/5
        double variance = (a * a + b * b + c * c - a * b - a * c - b * c) / 18;
        assertEquals(Math.sqrt(variance), d.untruncatedStandardDeviation(), 1e-12);
        assertEquals(14, d.untruncatedMean(), 1e-12);
        assertMoments(d, 14, Math.sqrt(variance), 2.4, 13);
    }

    @Test
    void truncationRespectsTheBoundsForEveryShape() {
        ParameterDistribution[] all = {
                ParameterDistribution.normal(50, 5, 45, 52),
                ParameterDistribution.uniform(50, 5, 47, 60),
                ParameterDistribution.triangular(40, 50, 60, 44, 53)};
        double[][] bounds = {{45, 52}, {47, 55}, {44, 53}};
        for (int i = 0; i < all.length; i++) {
            double[] m = moments(all[i], 20 + i);
            assertTrue(m[2] >= bounds[i][0] && m[3] <= bounds[i][1], all[i] + " sampled outside " + bounds[i][0] + ".."
                    + bounds[i][1] + ": " + m[2] + ".." + m[3]);
            // the draws reach close to both ends (1e5 draws; the density at the ends is not small)
            assertEquals(bounds[i][0], m[2], 0.01 * (bounds[i][1] - bounds[i][0]));
            assertEquals(bounds[i][1], m[3], 0.01 * (bounds[i][1] - bounds[i][0]));
            assertEquals(bounds[i][0], all[i].quantile(0), 1e-12);
            assertEquals(bounds[i][1], all[i].quantile(1), 1e-12);
        }
    }

    @Test
    void truncatedNormalMeanMatchesTheClosedForm() {
        TruncatedNormal d = new TruncatedNormal(50, 5, 48, 60);
        // μ + σ(φ(α) − φ(β))/(Φ(β) − Φ(α)) (Johnson, Kotz & Balakrishnan vol. 1, ch. 13 — from memory), evaluated here
        // with Commons Math's NormalDistribution as independent numerics
        NormalDistribution z = new NormalDistribution(null, 0, 1);
        double alpha = -0.4;
        double beta = 2;
        double expected = 50 + 5 * (z.density(alpha) - z.density(beta))
                / (z.cumulativeProbability(beta) - z.cumulativeProbability(alpha));
        assertEquals(expected, d.truncatedMean(), 1e-12);
        // sampling error: σ of the truncated distribution is below 5, so 4·5/√N bounds 4 standard errors
        assertEquals(expected, moments(d, 31)[0], 4 * 5 / Math.sqrt(N));
    }

    @Test
    void quantileInvertsTheCdfIncludingFarTails() {
        ParameterDistribution[] all = {
                ParameterDistribution.normal(0, 1, Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY),
                ParameterDistribution.normal(0, 1, -0.5, 9), // ends deep in the tails
                ParameterDistribution.normal(0, 1, -12, 0.1),
                ParameterDistribution.uniform(1, 0.5, 0.8, 2),
                ParameterDistribution.triangular(0, 1, 4, 0.5, 3)};
        for (ParameterDistribution d : all) {
            for (double p : new double[] {1e-12, 1e-6, 0.01, 0.3, 0.5, 0.77, 0.99, 1 - 1e-9}) {
                double x = d.quantile(p);
                // round trip; 1e-9 allows the conditioning of the tail ranges
                assertEquals(p, d.cdf(x), 1e-9 * Math.max(p, 1e-3), d + " at p = " + p);
            }
        }
        // the standard normal quantile against Commons Math (independent numerics)
        NormalDistribution z = new NormalDistribution(null, 0, 1);
        for (double p : new double[] {0.001, 0.025, 0.5, 0.975}) {
            assertEquals(z.inverseCumulativeProbability(p), all[0].quantile(p), 1e-9);
        }
        // in the far tail Commons Math's erfInv start is off by ~1e-8; the Newton step restores it: Φ⁻¹(1e-10) =
        // −6.361340902404056 from Wichura's AS 241 (Appl. Statist. 37(3), 1988), as Python's
        // statistics.NormalDist.inv_cdf computes it (independent numerics, value pasted from that run)
        assertEquals(-6.361340902404056, all[0].quantile(1e-10), 1e-13);
        // a deep lower tail Newton-refined: Φ(−8) = 6.22096e-16 (standard tables, from memory)
        assertEquals(-8, TruncatedNormal.standardQuantile(TruncatedNormal.phi(-8)), 1e-10);
        assertEquals(6.22096e-16, TruncatedNormal.phi(-8), 1e-20);
    }

    @Test
    void badDistributionsAreRefusedWithTheValue() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> ParameterDistribution.normal(50, -1, 0, 100));
        assertTrue(e.getMessage().contains("-1"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> ParameterDistribution.uniform(50, 5, 60, 70));
        assertTrue(e.getMessage().contains("outside the physical range"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> ParameterDistribution.triangular(0, 5, 4, -1, 10));
        assertTrue(e.getMessage().contains("mode 5"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> ParameterDistribution.normal(0, 1, 40, 41));
        assertTrue(e.getMessage().contains("outside") || e.getMessage().contains("no usable"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> ParameterDistribution.fixed(Double.NaN));
    }
}
