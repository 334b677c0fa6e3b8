package org.tracewell.engine.variation;

import java.util.Arrays;
import java.util.Locale;
import java.util.concurrent.ConcurrentLinkedQueue;
import java.util.concurrent.RecursiveAction;
import java.util.concurrent.atomic.AtomicReference;

/**
 * The one execution engine of sweeps and Monte-Carlo runs: evaluates variants 0..N−1 block by block, in the
 * calling thread or as a ForkJoin divide-and-conquer over block ranges. Each block first writes its
 * parameter vectors (row-major, into one flat array), then evaluates them, writing each metric straight into
 * its primitive array. Evaluators are pooled, so each worker thread reuses one evaluator and its buffers.
 */
final class VariantBatch {

    /** Writes the parameter vectors of one block into the flat parameter array. */
    @FunctionalInterface
    interface BlockFiller {
        void fill(int block, double[] flatParameters);
    }

    /** What a run did: which variants were evaluated, how many, and whether it was cancelled. */
    record Outcome(boolean[] evaluated, int completed, boolean cancelled) {
    }

    private final VariantModel model;
    private final int count;
    private final int parameterCount;
    private final int blockCount;
    private final BlockFiller filler;
    private final double[] parameters;
    private final double[][] metrics;
    private final RunControl control;
    private final boolean[] evaluated;
    private final ConcurrentLinkedQueue<VariantEvaluator> idleEvaluators = new ConcurrentLinkedQueue<>();
    private final AtomicReference<RuntimeException> failure = new AtomicReference<>();
    private final Object progressLock = new Object();
    private volatile boolean stopped;
    private int done; // guarded by progressLock

    private VariantBatch(VariantModel model, int count, BlockFiller filler, double[] parameters, double[][] metrics,
                         RunControl control) {
        this.model = model;
        this.count = count;
        this.parameterCount = model.parameterCount();
        this.blockCount = (count + VariantStreams.BLOCK_SIZE - 1) / VariantStreams.BLOCK_SIZE;
        this.filler = filler;
        this.parameters = parameters;
        this.metrics = metrics;
        this.control = control;
        this.evaluated = new boolean[count];
    }

    /**
     * Evaluates {@code count} variants.
     *
     * @param parameters receives the parameter vectors, length count·P
     * @param metrics    one array of length count per model metric; unevaluated entries stay NaN
     * @throws VariantEvaluationException when the model fails on a variant (the run stops)
     */
    static Outcome run(VariantModel model, int count, BlockFiller filler, double[] parameters, double[][] metrics,
                       RunControl control) {
        if (parameters.length != (long) count * model.parameterCount() || metrics.length != model.metricCount()) {
            throw new IllegalArgumentException("result arrays do not fit " + count + " variants of " + model);
        }
        for (double[] m : metrics) {
            Arrays.fill(m, Double.NaN);
        }
        VariantBatch batch = new VariantBatch(model, count, filler, parameters, metrics, control);
        return batch.execute();
    }

    private Outcome execute() {
        if (control.pool() == null) {
            for (int b = 0; b < blockCount && !stopped; b++) {
                runBlock(b);
            }
        } else {
            try {
                control.pool().invoke(new BlockRange(0, blockCount));
            } catch (RuntimeException e) {
                // a failure recorded below is the original; ForkJoin may rethrow a copy
                failure.compareAndSet(null, e);
            }
        }
        RuntimeException e = failure.get();
        if (e != null) {
            throw e;
        }
        int completed;
        synchronized (progressLock) {
            completed = done;
        }
        return new Outcome(evaluated, completed, completed < count);
    }

    private final class BlockRange extends RecursiveAction {
        private static final long serialVersionUID = 1L;
        private final int from;
        private final int to;

        BlockRange(int from, int to) {
            this.from = from;
            this.to = to;
        }

        @Override
        protected void compute() {
            if (to - from == 1) {
                runBlock(from);
                return;
            }
            int mid = (from + to) >>> 1;
            invokeAll(new BlockRange(from, mid), new BlockRange(mid, to));
        }
    }

    private void runBlock(int block) {
        if (stopped || control.cancellation().getAsBoolean()) {
            stopped = true;
            return;
        }
        VariantEvaluator evaluator = idleEvaluators.poll();
        if (evaluator == null) {
            evaluator = model.newEvaluator();
        }
        int from = block * VariantStreams.BLOCK_SIZE;
        int to = Math.min(from + VariantStreams.BLOCK_SIZE, count);
        int finished = 0;
        try {
            filler.fill(block, parameters);
            double[] in = new double[parameterCount];
            double[] out = new double[metrics.length];
            for (int v = from; v < to; v++) {
                if (v > from && (stopped || control.cancellation().getAsBoolean())) {
                    stopped = true;
                    break;
                }
                System.arraycopy(parameters, v * parameterCount, in, 0, parameterCount);
                Arrays.fill(out, Double.NaN);
                try {
                    evaluator.evaluate(in, out);
                } catch (RuntimeException e) {
                    stopped = true;
                    failure.compareAndSet(null, new VariantEvaluationException(describe(v), e));
                    break;
                }
                for (int m = 0; m < out.length; m++) {
                    metrics[m][v] = out[m];
                }
                evaluated[v] = true;
                finished++;
            }
        } finally {
            idleEvaluators.add(evaluator);
            report(finished);
        }
    }

    private void report(int finished) {
        if (finished == 0) {
            return;
        }
        synchronized (progressLock) {
            done += finished;
            control.progress().progress(done, count);
        }
    }

    private String describe(int variant) {
        StringBuilder text = new StringBuilder("variant ").append(variant).append(" (");
        for (int j = 0; j < parameterCount; j++) {
            Quantity q = model.parameters().get(j);
            text.append(j == 0 ? "" : ", ").append(q.name()).append(" = ")
                    .append(String.format(Locale.ROOT, "%.9g", parameters[variant * parameterCount + j]))
                    .append(' ').append(q.unit());
        }
        return text.append(") could not be evaluated").toString();
    }
}
