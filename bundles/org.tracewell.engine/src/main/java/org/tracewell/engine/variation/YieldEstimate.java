package org.tracewell.engine.variation;

import org.tracewell.engine.budget.LimitBound;

/**
 * The fraction of evaluated variants meeting a limit on one metric, with its binomial standard error
 * √(p(1 − p)/n). A variant whose metric is NaN (not computable) counts as failing.
 *
 * @param metric        the metric
 * @param bound         which side of the limit passes
 * @param limit         the limit, metric unit
 * @param passCount     variants meeting it
 * @param sampleCount   evaluated variants n
 * @param fraction      passCount / sampleCount
 * @param standardError binomial standard error of the fraction
 */
public record YieldEstimate(Quantity metric, LimitBound bound, double limit, int passCount, int sampleCount,
                            double fraction, double standardError) {

    static YieldEstimate of(Quantity metric, LimitBound bound, double limit, int pass, int n) {
        double p = n == 0 ? Double.NaN : (double) pass / n;
        double se = n == 0 ? Double.NaN : Math.sqrt(p * (1 - p) / n);
        return new YieldEstimate(metric, bound, limit, pass, n, p, se);
    }
}
