/**
 * Variation of a design: parameter sweeps over 1-D and 2-D grids, normalised sensitivities, and seeded
 * Monte-Carlo tolerance analysis with per-metric summaries, yields against limits and the worst variants.
 * <p>
 * Everything evaluates a {@link org.tracewell.engine.variation.VariantModel}: named parameters in, named
 * metrics out, SI units declared once per quantity. Results are held in primitive arrays (one array per
 * metric, one flat array of parameter values), never as an object per sample, so 10⁵ variants cost a few
 * megabytes. Runs go through one engine that works in fixed blocks of
 * {@value org.tracewell.engine.variation.VariantStreams#BLOCK_SIZE} variants, in the calling thread or on a
 * {@link java.util.concurrent.ForkJoinPool}, cancellable and with progress
 * ({@link org.tracewell.engine.variation.RunControl}).
 * <p>
 * Reproducibility: the random values of variant i depend only on the seed and i (see
 * {@link org.tracewell.engine.variation.VariantStreams}), and every model evaluation is a pure function of its
 * parameters, so a serial and a parallel run of the same plan give bit-identical results, whatever the
 * number of threads.
 * <p>
 * {@link org.tracewell.engine.variation.CircleTestVariantModel} is the ready-made model of the standard case: an
 * XY circle test of two position loops with a first-order velocity lag, giving circular deviation G, radial
 * deviation F and the maximum contour error by simulation.
 */
package org.tracewell.engine.variation;
