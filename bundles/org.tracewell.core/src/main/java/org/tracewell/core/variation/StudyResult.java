package org.tracewell.core.variation;

import java.util.List;
import java.util.Optional;

import org.tracewell.engine.variation.MetricSummary;
import org.tracewell.engine.variation.MonteCarloResult;
import org.tracewell.engine.variation.Quantity;
import org.tracewell.engine.variation.SensitivityAnalysis;
import org.tracewell.engine.variation.SweepResult;
import org.tracewell.engine.variation.WorstVariant;

/**
 * What a study of a machine found: the definition it ran, the nominal point, the Monte-Carlo result (primitive
 * arrays, one per metric) or the sweep result, the yield against every requirement collected, and the normalised
 * sensitivities at the nominal point. Immutable; arrays are copied on the way out.
 */
public final class StudyResult {

    private final StudyDefinition definition;
    private final String machineName;
    private final List<Quantity> parameters;
    private final List<String> parameterDisplayUnits;
    private final List<StudyMetric> metrics;
    private final double[] nominalParameters;
    private final double[] nominalMetrics;
    private final Optional<MonteCarloResult> monteCarlo;
    private final Optional<SweepResult> sweep;
    private final List<RequirementYield> yields;
    private final Optional<SensitivityAnalysis> sensitivities;
    private final int threads;
    private final double seconds;

    StudyResult(StudyDefinition definition, String machineName, List<Quantity> parameters,
            List<String> parameterDisplayUnits, List<StudyMetric> metrics,
            double[] nominalParameters, double[] nominalMetrics, Optional<MonteCarloResult> monteCarlo,
            Optional<SweepResult> sweep, List<RequirementYield> yields, Optional<SensitivityAnalysis> sensitivities,
            int threads, double seconds) {
        this.definition = definition;
        this.machineName = machineName;
        this.parameters = List.copyOf(parameters);
        this.parameterDisplayUnits = List.copyOf(parameterDisplayUnits);
        this.metrics = List.copyOf(metrics);
        this.nominalParameters = nominalParameters.clone();
        this.nominalMetrics = nominalMetrics.clone();
        this.monteCarlo = monteCarlo;
        this.sweep = sweep;
        this.yields = List.copyOf(yields);
        this.sensitivities = sensitivities;
        this.threads = threads;
        this.seconds = seconds;
    }

    public StudyDefinition definition() {
        return definition;
    }

    public String machineName() {
        return machineName;
    }

    /** The varied attributes, parameter order (name = path, SI unit). */
    public List<Quantity> parameters() {
        return parameters;
    }

    /** The trade unit each parameter is shown in, parameter order. */
    public List<String> parameterDisplayUnits() {
        return parameterDisplayUnits;
    }

    public List<StudyMetric> metrics() {
        return metrics;
    }

    public int metricIndex(String name) {
        for (int i = 0; i < metrics.size(); i++) {
            if (metrics.get(i).name().equals(name)) {
                return i;
            }
        }
        throw new IllegalArgumentException("study '" + definition.name() + "' collected no metric '" + name
                + "'; it collected " + metrics.stream().map(StudyMetric::name).toList());
    }

    public double[] nominalParameters() {
        return nominalParameters.clone();
    }

    /** The metrics of the nominal machine (NaN where not computable). */
    public double[] nominalMetrics() {
        return nominalMetrics.clone();
    }

    public Optional<MonteCarloResult> monteCarlo() {
        return monteCarlo;
    }

    public Optional<SweepResult> sweep() {
        return sweep;
    }

    /** One per requirement metric of a Monte-Carlo study (none for a sweep). */
    public List<RequirementYield> yields() {
        return yields;
    }

    public Optional<RequirementYield> yieldOf(int metricIndex) {
        return yields.stream().filter(y -> y.metricIndex() == metricIndex).findFirst();
    }

    /** Normalised sensitivities of every metric at the nominal point; empty when the run was cancelled. */
    public Optional<SensitivityAnalysis> sensitivities() {
        return sensitivities;
    }

    /** Worker threads the run used. */
    public int threads() {
        return threads;
    }

    /** Wall-clock time of the run, s (a measurement of this run, not a benchmark). */
    public double seconds() {
        return seconds;
    }

    public boolean cancelled() {
        return monteCarlo.map(MonteCarloResult::cancelled).orElseGet(() -> sweep.orElseThrow().cancelled());
    }

    /** Variants (or grid points) evaluated. */
    public int completedCount() {
        return monteCarlo.map(MonteCarloResult::completedCount)
                .orElseGet(() -> sweep.orElseThrow().completedCount());
    }

    /** Variants (or grid points) planned. */
    public int plannedCount() {
        return monteCarlo.map(MonteCarloResult::variantCount).orElseGet(() -> sweep.orElseThrow().pointCount());
    }

    /** Summary of one metric over a Monte-Carlo run. */
    public MetricSummary summary(int metric) {
        return monteCarlo.orElseThrow(() -> new IllegalStateException("study '" + definition.name()
                + "' is a sweep; it has no distribution summary")).summary(metric);
    }

    /** The worst variants of a Monte-Carlo run on one metric, worst first, as many as the study keeps. */
    public List<WorstVariant> worst(int metric) {
        return monteCarlo.map(r -> r.worst(metric, definition.worstKept(), metrics.get(metric).goodSide()))
                .orElse(List.of());
    }
}
