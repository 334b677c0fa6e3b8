package org.tracewell.engine.variation;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.ForkJoinPool;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicInteger;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.stat.descriptive.rank.Percentile;
import org.apache.commons.math3.stat.descriptive.rank.Percentile.EstimationType;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.tracewell.engine.budget.LimitBound;

class MonteCarloRunnerTest {

    /** LM-3020 circle test feed, 3 m/min, and the nominal position gain of both axes (invented demo values). */
    private static final double FEED = 0.05;
    private static final double KV = 50;

    private static ForkJoinPool twoThreads;
    private static ForkJoinPool threeThreads;

    @BeforeAll
    static void pools() {
        twoThreads = new ForkJoinPool(2);
        threeThreads = new ForkJoinPool(3);
    }

    @AfterAll
    static void shutdown() {
        twoThreads.shutdown();
        threeThreads.shutdown();
    }

    /**
     * G of a Kv mismatch as a formula: G = F·|1/Kx − 1/Ky| (Kakino, Ihara &amp; Shinohara 1993, DOMAIN.md §4 — from
     * memory). Parameters Kx (1/s) and q = 1/Ky (s).
     */
    private static VariantModel mismatchFormula() {
        return VariantModel.of(List.of(Quantity.of("Kv_x", "1/s"), Quantity.of("inverseKv_y", "s")),
                List.of(Quantity.of("G", "m"), Quantity.of("signedMismatch", "s")),
                (p, m) -> {
                    m[0] = FEED * Math.abs(1 / p[0] - p[1]);
                    m[1] = 1 / p[0] - p[1];
                });
    }

    private static MonteCarloPlan mismatchPlan(int n, long seed, double sigmaInverse) {
        return new MonteCarloPlan(List.of(ParameterDistribution.fixed(KV),
                ParameterDistribution.normal(1 / KV, sigmaInverse, 0, 1)), n, seed);
    }

    @Test
    void yieldOfAKvMismatchIsTheFoldedNormal() {
        double sigma = 2e-4; // σ of 1/Ky, s: 1 % of Kv at 50 1/s
        MonteCarloResult r = MonteCarloRunner.run(mismatchFormula(), mismatchPlan(20_000, 2024, sigma),
                RunControl.on(twoThreads));
        NormalDistribution z = new NormalDistribution(null, 0, 1);
        for (double g : new double[] {2e-6, 10e-6, 25e-6}) {
            YieldEstimate y = r.yield(0, LimitBound.AT_MOST, g);
            // G = F·|Δ| with Δ ~ N(0, σ): folded normal, P(G ≤ g) = 2Φ(g/(F·σ)) − 1 (definition of the folded normal)
            double exact = 2 * z.cumulativeProbability(g / (FEED * sigma)) - 1;
            assertEquals(exact, y.fraction(), 3 * y.standardError(), "yield at G ≤ " + g + " m");
            assertEquals(Math.sqrt(exact * (1 - exact) / 20_000), y.standardError(), 0.01 * y.standardError() + 1e-4);
        }
        // the mean of a folded normal is σ_G·√(2/π) (definition); 4 standard errors
        MetricSummary s = r.summary(0);
        double sigmaG = FEED * sigma;
        assertEquals(sigmaG * Math.sqrt(2 / Math.PI), s.mean(), 4 * sigmaG / Math.sqrt(20_000));
        // the signed mismatch is the normal itself: median 0 and 95th percentile 1.645σ within sampling error
        MetricSummary d = r.summary(1);
        assertEquals(0, d.p50(), 4 * 1.2533 * sigma / Math.sqrt(20_000));
        // SE of the 95th percentile √(p(1−p)/n)/f = 0.015σ here; 4 standard errors
        assertEquals(1.644854 * sigma, d.p95(), 0.06 * sigma);
        // AT_LEAST yield is the complement for a continuous metric
        assertEquals(1 - r.yield(0, LimitBound.AT_MOST, 10e-6).fraction(), r.yield(0, LimitBound.AT_LEAST, 10e-6).fraction(),
                1e-12);
    }

    @Test
    void sameSeedSameResultAndSerialEqualsParallel() {
        VariantModel model = mismatchFormula();
        MonteCarloPlan plan = mismatchPlan(5_000, 77, 3e-4);
        MonteCarloResult serial = MonteCarloRunner.run(model, plan, RunControl.serial());
        MonteCarloResult again = MonteCarloRunner.run(model, plan, RunControl.serial());
        MonteCarloResult two = MonteCarloRunner.run(model, plan, RunControl.on(twoThreads));
        MonteCarloResult three = MonteCarloRunner.run(model, plan, RunControl.on(threeThreads));
        for (MonteCarloResult other : List.of(again, two, three)) {
            for (int m = 0; m < 2; m++) {
                assertArrayEquals(serial.metricValues(m), other.metricValues(m)); // bit for bit
                assertEquals(serial.summary(m), other.summary(m));
            }
            assertArrayEquals(serial.parameterValues(1), other.parameterValues(1));
            assertEquals(serial.worst(0, 5, LimitBound.AT_MOST), other.worst(0, 5, LimitBound.AT_MOST));
        }
        // replaying one variant from the plan gives the values the run used
        assertArrayEquals(new double[] {serial.parameter(4321, 0), serial.parameter(4321, 1)}, plan.sampleVariant(4321));
        // another seed gives other values
        MonteCarloResult other = MonteCarloRunner.run(model, mismatchPlan(5_000, 78, 3e-4), RunControl.serial());
        assertNotEquals(serial.metric(0, 0), other.metric(0, 0));
        // a run of fewer variants is a prefix of the longer one: streams depend on (seed, index) only
        MonteCarloResult shorter = MonteCarloRunner.run(model, mismatchPlan(100, 77, 3e-4), RunControl.on(twoThreads));
        assertArrayEquals(Arrays.copyOf(serial.metricValues(0), 100), shorter.metricValues(0));
    }

    @Test
    void summaryPercentilesAndWorstVariantsAgreeWithIndependentNumerics() {
        MonteCarloResult r = MonteCarloRunner.run(mismatchFormula(), mismatchPlan(3_001, 5, 3e-4), RunControl.parallel());
        double[] g = r.metricValues(0);
        MetricSummary s = r.summary(0);
        // Commons Math Percentile with Hyndman & Fan definition 7 (independent implementation)
        Percentile reference = new Percentile().withEstimationType(EstimationType.R_7);
        reference.setData(g);
        assertEquals(reference.evaluate(1), s.p01(), 0);
        assertEquals(reference.evaluate(5), s.p05(), 0);
        assertEquals(reference.evaluate(50), s.p50(), 0);
        assertEquals(reference.evaluate(95), s.p95(), 0);
        assertEquals(reference.evaluate(99), s.p99(), 0);
        assertEquals(Arrays.stream(g).max().orElseThrow(), s.max(), 0);
        assertEquals(Arrays.stream(g).min().orElseThrow(), s.min(), 0);
        assertEquals(new org.apache.commons.math3.stat.descriptive.moment.StandardDeviation().evaluate(g),
                s.standardDeviation(), 1e-12 * s.standardDeviation());
        // the worst 7 are the 7 largest, worst first, each with its parameters
        List<WorstVariant> worst = r.worst(0, 7, LimitBound.AT_MOST);
        double[] sorted = g.clone();
        Arrays.sort(sorted);
        for (int i = 0; i < 7; i++) {
            assertEquals(sorted[sorted.length - 1 - i], worst.get(i).value(), 0);
            assertEquals(worst.get(i).value(), r.metric(0, worst.get(i).index()), 0);
            assertEquals(r.parameter(worst.get(i).index(), 1), worst.get(i).parameters()[1], 0);
        }
        // AT_LEAST ranks the smallest first
        assertEquals(sorted[0], r.worst(0, 1, LimitBound.AT_LEAST).get(0).value(), 0);
        // histogram counts every variant once
        assertEquals(3_001, Arrays.stream(r.histogram(0, 20).counts()).sum());
    }

    @Test
    void cancellationStopsEarlyAndKeepsPartialCounts() {
        AtomicInteger evaluations = new AtomicInteger();
        AtomicBoolean cancel = new AtomicBoolean();
        VariantModel counting = VariantModel.of(List.of(Quantity.of("p", "1")), List.of(Quantity.of("m", "1")),
                (p, m) -> {
                    evaluations.incrementAndGet();
                    m[0] = p[0];
                });
        List<long[]> reports = new ArrayList<>();
        // The user presses cancel once 1000 variants have started. The flag is derived from the count itself, so
        // no thread can be descheduled between "1000 reached" and "flag set" while the other keeps evaluating.
        RunControl control = RunControl.on(twoThreads).withCancellation(() -> {
                    if (evaluations.get() >= 1_000) {
                        cancel.set(true);
                    }
                    return cancel.get();
                })
                .withProgress((done, total) -> reports.add(new long[] {done, total}));
        MonteCarloPlan plan = new MonteCarloPlan(List.of(ParameterDistribution.uniform(1, 0.5, 0, 2)), 100_000, 1);
        MonteCarloResult r = MonteCarloRunner.run(counting, plan, control);
        assertTrue(r.cancelled());
        int done = r.completedCount();
        // each worker may have passed its check just before the 1000th start: at most one more per worker thread
        // (two, plus two for spare threads the pool may add while a worker waits in a join)
        assertTrue(done >= 1_000 && done <= 1_004, "completed " + done);
        assertEquals(evaluations.get(), done);
        assertEquals(done, r.summary(0).count());
        assertEquals(done, r.yield(0, LimitBound.AT_MOST, 2).sampleCount());
        long evaluatedFlags = java.util.stream.IntStream.range(0, plan.variantCount()).filter(r::isEvaluated).count();
        assertEquals(done, evaluatedFlags);
        // progress: never decreasing, total N, last report = completed count
        long previous = 0;
        for (long[] report : reports) {
            assertTrue(report[0] >= previous);
            assertEquals(100_000, report[1]);
            previous = report[0];
        }
        assertEquals(done, previous);
        // an uncancelled run reports every variant
        List<Long> last = new ArrayList<>();
        MonteCarloResult full = MonteCarloRunner.run(counting, new MonteCarloPlan(plan.distributions(), 500, 1),
                RunControl.serial().withProgress((d, t) -> last.add(d)));
        assertFalse(full.cancelled());
        assertEquals(500, full.completedCount());
        assertEquals(500L, last.get(last.size() - 1));
    }

    @Test
    void aFailingVariantIsNamedWithItsParameters() {
        VariantModel failing = VariantModel.of(List.of(Quantity.of("Kv", "1/s")), List.of(Quantity.of("m", "1")),
                (p, m) -> {
                    if (p[0] > 55) {
                        throw new IllegalArgumentException("gain too high for this test");
                    }
                    m[0] = p[0];
                });
        MonteCarloPlan plan = new MonteCarloPlan(List.of(ParameterDistribution.uniform(50, 10, 0, 100)), 1_000, 3);
        VariantEvaluationException e = assertThrows(VariantEvaluationException.class,
                () -> MonteCarloRunner.run(failing, plan, RunControl.on(twoThreads)));
        assertTrue(e.getMessage().matches("variant \\d+ \\(Kv = 5[5-9]\\.\\d+ 1/s\\) could not be evaluated: gain too high.*"),
                e.getMessage());
        IllegalArgumentException mismatch = assertThrows(IllegalArgumentException.class,
                () -> MonteCarloRunner.run(mismatchFormula(), plan, RunControl.serial()));
        assertTrue(mismatch.getMessage().contains("takes 2 parameters"), mismatch.getMessage());
    }

    @Test
    void nanMetricsCountAsFailingAndRankWorst() {
        VariantModel sometimesUnstable = VariantModel.of(List.of(Quantity.of("Kv", "1/s")), List.of(Quantity.of("PM", "rad")),
                (p, m) -> m[0] = p[0] > 58 ? Double.NaN : 1 - p[0] / 100);
        MonteCarloPlan plan = new MonteCarloPlan(List.of(ParameterDistribution.uniform(50, 10, 0, 100)), 2_000, 9);
        MonteCarloResult r = MonteCarloRunner.run(sometimesUnstable, plan, RunControl.serial());
        MetricSummary s = r.summary(0);
        // uniform on 40..60: P(Kv > 58) = 0.1; 4 binomial standard errors
        assertEquals(0.1 * 2_000, s.invalidCount(), 4 * Math.sqrt(2_000 * 0.1 * 0.9));
        assertEquals(2_000, s.count() + s.invalidCount());
        YieldEstimate y = r.yield(0, LimitBound.AT_LEAST, 0);
        assertEquals(s.count(), y.passCount());
        assertTrue(Double.isNaN(r.worst(0, 1, LimitBound.AT_LEAST).get(0).value()));
    }
}
