package org.tracewell.engine.variation;

import java.util.List;

/**
 * Evaluates a model over a 1-D or 2-D grid of parameter values, all other parameters held at a base vector.
 * Runs on the same block engine as the Monte-Carlo runner: parallel, cancellable, with progress.
 */
public final class SweepRunner {

    private SweepRunner() {
    }

    /** A 1-D sweep along {@code axis}. */
    public static SweepResult sweep(VariantModel model, double[] base, SweepAxis axis, RunControl control) {
        return run(model, base, List.of(axis), control);
    }

    /** A 2-D sweep over {@code first} × {@code second}; point (i, j) at flat index i·n₂ + j. */
    public static SweepResult sweep(VariantModel model, double[] base, SweepAxis first, SweepAxis second,
                                    RunControl control) {
        if (first.parameter() == second.parameter()) {
            throw new IllegalArgumentException("a 2-D sweep needs two different parameters, got parameter "
                    + first.parameter() + " twice");
        }
        return run(model, base, List.of(first, second), control);
    }

    private static SweepResult run(VariantModel model, double[] base, List<SweepAxis> axes, RunControl control) {
        int p = model.parameterCount();
        if (base == null || base.length != p) {
            throw new IllegalArgumentException("the base vector needs " + p + " values " + model.parameters().stream()
                    .map(Quantity::name).toList() + ", got " + (base == null ? "none" : base.length));
        }
        for (SweepAxis a : axes) {
            if (a.parameter() >= p) {
                throw new IllegalArgumentException("swept parameter index " + a.parameter() + " outside 0.." + (p - 1));
            }
        }
        long points = 1;
        for (SweepAxis a : axes) {
            points *= a.size();
        }
        if (points > MonteCarloPlan.MAX_VARIANTS) {
            throw new IllegalArgumentException("sweep grid of " + points + " points exceeds " + MonteCarloPlan.MAX_VARIANTS);
        }
        int n = (int) points;
        int n2 = axes.size() == 2 ? axes.get(1).size() : 1;
        double[] baseCopy = base.clone();
        double[] parameters = new double[n * p];
        double[][] metrics = new double[model.metricCount()][n];
        VariantBatch.BlockFiller grid = (block, flat) -> {
            int from = block * VariantStreams.BLOCK_SIZE;
            int to = Math.min(from + VariantStreams.BLOCK_SIZE, n);
            for (int k = from; k < to; k++) {
                System.arraycopy(baseCopy, 0, flat, k * p, p);
                flat[k * p + axes.get(0).parameter()] = axes.get(0).value(k / n2);
                if (axes.size() == 2) {
                    flat[k * p + axes.get(1).parameter()] = axes.get(1).value(k % n2);
                }
            }
        };
        VariantBatch.Outcome outcome = VariantBatch.run(model, n, grid, parameters, metrics, control);
        return new SweepResult(model.parameters(), model.metrics(), baseCopy, axes, metrics, outcome.evaluated(),
                outcome.completed(), outcome.cancelled());
    }
}
