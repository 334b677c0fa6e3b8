/**
 * Tolerance studies of a machine model: any numeric attribute of the machine as a parameter (addressed by an
 * {@link org.tracewell.model.paths.AttributePath}), any result of the analysis pipeline as a metric (requirement
 * values, contour figures, loop figures), evaluated per variant on a copy of the machine by the pipeline's own
 * pieces and run by the engine's sweep and Monte-Carlo runners (parallel, seeded, cancellable, primitive arrays).
 * <p>
 * A study is defined in the model ({@link org.tracewell.model.VariationStudy}) or on the command line
 * ({@link org.tracewell.core.variation.StudyDefinition}) and never runs as part of a plain analysis.
 */
package org.tracewell.core.variation;
