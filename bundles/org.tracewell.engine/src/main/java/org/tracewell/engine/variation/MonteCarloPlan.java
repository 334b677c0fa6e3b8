package org.tracewell.engine.variation;

import java.util.List;
import org.apache.commons.math3.random.RandomGenerator;

/**
 * What a Monte-Carlo run samples: one distribution per model parameter (in the model's parameter order), the
 * number of variants and the seed. Immutable; the parameter values of every variant follow from it (see
 * {@link VariantStreams}), so {@link #sampleVariant} can replay any variant without running the others.
 *
 * @param distributions one per model parameter
 * @param variantCount  N, 1 ≤ N ≤ {@link #MAX_VARIANTS}
 * @param seed          run seed
 */
public record MonteCarloPlan(List<ParameterDistribution> distributions, int variantCount, long seed) {

    /** Largest run held in memory: N·(parameters + metrics) doubles. */
    public static final int MAX_VARIANTS = 2_000_000;

    public MonteCarloPlan {
        if (distributions == null || distributions.isEmpty()) {
            throw new IllegalArgumentException("a Monte-Carlo plan needs one distribution per parameter, got none");
        }
        for (int i = 0; i < distributions.size(); i++) {
            if (distributions.get(i) == null) {
                throw new IllegalArgumentException("distribution of parameter " + i + " is missing");
            }
        }
        distributions = List.copyOf(distributions);
        if (variantCount < 1 || variantCount > MAX_VARIANTS) {
            throw new IllegalArgumentException("variant count must lie in 1.." + MAX_VARIANTS + ", got " + variantCount);
        }
    }

    public int parameterCount() {
        return distributions.size();
    }

    public int blockCount() {
        return (variantCount + VariantStreams.BLOCK_SIZE - 1) / VariantStreams.BLOCK_SIZE;
    }

    /** The nominal parameter vector. */
    public double[] nominal() {
        double[] out = new double[distributions.size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = distributions.get(i).nominal();
        }
        return out;
    }

    /**
     * Writes the parameters of the variants of block {@code block} into {@code flat} (row-major, variant v at
     * offset v·P), drawing from the block's own stream.
     */
    void sampleBlock(int block, double[] flat) {
        RandomGenerator random = VariantStreams.blockGenerator(seed, block);
        int from = block * VariantStreams.BLOCK_SIZE;
        int to = Math.min(from + VariantStreams.BLOCK_SIZE, variantCount);
        int p = distributions.size();
        for (int v = from; v < to; v++) {
            for (int j = 0; j < p; j++) {
                flat[v * p + j] = distributions.get(j).sample(random);
            }
        }
    }

    /** The parameter values of variant {@code index}, as any run of this plan samples them. */
    public double[] sampleVariant(int index) {
        if (index < 0 || index >= variantCount) {
            throw new IndexOutOfBoundsException("variant " + index + " outside 0.." + (variantCount - 1));
        }
        int block = VariantStreams.blockOf(index);
        RandomGenerator random = VariantStreams.blockGenerator(seed, block);
        int p = distributions.size();
        double[] out = new double[p];
        for (int v = block * VariantStreams.BLOCK_SIZE; v <= index; v++) {
            for (int j = 0; j < p; j++) {
                out[j] = distributions.get(j).sample(random);
            }
        }
        return out;
    }

    /** Checks that this plan fits {@code model}. */
    void checkFits(VariantModel model) {
        if (model.parameterCount() != distributions.size()) {
            throw new IllegalArgumentException("the plan has " + distributions.size() + " distributions but the model"
                    + " takes " + model.parameterCount() + " parameters " + model.parameters().stream()
                    .map(Quantity::name).toList());
        }
    }
}
