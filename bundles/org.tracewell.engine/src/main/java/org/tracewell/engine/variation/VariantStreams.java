package org.tracewell.engine.variation;

import org.apache.commons.math3.random.RandomGenerator;
import org.apache.commons.math3.random.Well19937c;

/**
 * The random streams of a Monte-Carlo run, split so that the values of a variant depend only on the run seed
 * and the variant index, never on threads or scheduling.
 * <p>
 * Variants are grouped in fixed blocks of {@link #BLOCK_SIZE} (a constant, not a function of the number of
 * threads). Block b draws from its own Commons Math {@link Well19937c}, seeded with eight 32-bit words taken
 * from the SplitMix64 sequence (Steele, Lea &amp; Flood, "Fast splittable pseudorandom number generators",
 * OOPSLA 2014 — from memory) started at mix64(seed + (b + 1)·γ), γ = 0x9E3779B97F4A7C15. Inside a block the
 * variants draw in index order, one uniform per parameter in parameter order. Whichever thread evaluates a
 * block, it draws the same numbers, so serial and parallel runs agree bit for bit.
 */
public final class VariantStreams {

    /** Variants per block: the unit of random streams, of parallel work and of cancellation checks. */
    public static final int BLOCK_SIZE = 64;

    /** Golden-ratio increment of SplitMix64. */
    private static final long GAMMA = 0x9E3779B97F4A7C15L;

    private VariantStreams() {
    }

    /** The generator of block {@code blockIndex} of a run seeded with {@code seed}. */
    public static RandomGenerator blockGenerator(long seed, long blockIndex) {
        if (blockIndex < 0) {
            throw new IllegalArgumentException("block index must be >= 0, got " + blockIndex);
        }
        long state = mix64(seed + (blockIndex + 1) * GAMMA);
        int[] words = new int[8];
        for (int i = 0; i < words.length; i += 2) {
            state += GAMMA;
            long z = mix64(state);
            words[i] = (int) z;
            words[i + 1] = (int) (z >>> 32);
        }
        return new Well19937c(words);
    }

    /** The SplitMix64 output function (variant "Mix13" of Stafford's finaliser). */
    static long mix64(long z) {
        z = (z ^ (z >>> 30)) * 0xBF58476D1CE4E5B9L;
        z = (z ^ (z >>> 27)) * 0x94D049BB133111EBL;
        return z ^ (z >>> 31);
    }

    /** Index of the block holding variant {@code variant}. */
    public static int blockOf(int variant) {
        return variant / BLOCK_SIZE;
    }
}
