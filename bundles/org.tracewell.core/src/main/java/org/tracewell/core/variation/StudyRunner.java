package org.tracewell.core.variation;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.tracewell.core.mapping.MappingException;
import org.tracewell.engine.variation.MonteCarloPlan;
import org.tracewell.engine.variation.MonteCarloResult;
import org.tracewell.engine.variation.MonteCarloRunner;
import org.tracewell.engine.variation.ParameterDistribution;
import org.tracewell.engine.variation.RunControl;
import org.tracewell.engine.variation.SensitivityAnalysis;
import org.tracewell.engine.variation.SweepResult;
import org.tracewell.engine.variation.SweepRunner;
import org.tracewell.model.Machine;
import org.tracewell.model.StudyKind;
import org.tracewell.model.VariationStudy;

/**
 * Runs a study of a machine: builds the {@link MachineVariantModel}, runs the engine's Monte-Carlo or sweep runner
 * under the caller's {@link RunControl} (pool, progress, cancellation), then the yields against every requirement
 * collected and the normalised sensitivities at the nominal point (central differences, relative step
 * {@link #SENSITIVITY_STEP}: 2P + 1 more evaluations).
 */
public final class StudyRunner {

    /** Relative step of the sensitivities: small against tolerances, large against the simulation's rounding. */
    public static final double SENSITIVITY_STEP = 1e-3;

    private StudyRunner() {
    }

    /**
     * @throws MappingException         when the nominal machine does not map to engine inputs
     * @throws IllegalArgumentException naming the path, metric or value that is not valid
     * @throws org.tracewell.engine.variation.VariantEvaluationException when a variant fails unexpectedly
     */
    public static StudyResult run(Machine machine, StudyDefinition definition, RunControl control)
            throws MappingException {
        long start = System.nanoTime();
        MachineVariantModel model = new MachineVariantModel(machine, definition.paths(), definition.metrics());
        double[] nominal = model.nominal();
        Optional<MonteCarloResult> monteCarlo = Optional.empty();
        Optional<SweepResult> sweep = Optional.empty();
        if (definition.kind() == StudyKind.MONTE_CARLO) {
            List<ParameterDistribution> distributions = new ArrayList<>();
            for (int j = 0; j < nominal.length; j++) {
                distributions.add(definition.tolerances().get(j).distribution(nominal[j]));
            }
            MonteCarloPlan plan = new MonteCarloPlan(distributions, definition.variantCount(), definition.seed());
            monteCarlo = Optional.of(MonteCarloRunner.run(model, plan, control));
        } else {
            List<SweepRange> ranges = definition.ranges();
            sweep = Optional.of(ranges.size() == 1
                    ? SweepRunner.sweep(model, nominal, ranges.get(0).axis(0), control)
                    : SweepRunner.sweep(model, nominal, ranges.get(0).axis(0), ranges.get(1).axis(1), control));
        }
        boolean cancelled = monteCarlo.isPresent() ? monteCarlo.get().cancelled() : sweep.get().cancelled();
        Optional<SensitivityAnalysis> sensitivities = cancelled ? Optional.empty()
                : Optional.of(SensitivityAnalysis.at(model, nominal, SENSITIVITY_STEP));
        double[] nominalMetrics = sensitivities.map(SensitivityAnalysis::nominalMetrics)
                .orElseGet(() -> model.evaluate(nominal));
        List<RequirementYield> yields = new ArrayList<>();
        if (monteCarlo.isPresent()) {
            for (int m = 0; m < model.studyMetrics().size(); m++) {
                if (model.studyMetrics().get(m) instanceof RequirementValue r) {
                    yields.add(new RequirementYield(r, m, nominalMetrics[m],
                            monteCarlo.get().yield(m, r.bound(), r.limit())));
                }
            }
        }
        int threads = control.pool() == null ? 1 : control.pool().getParallelism();
        return new StudyResult(definition, model.machineName(), model.parameters(), model.parameterDisplayUnits(),
                model.studyMetrics(), nominal,
                nominalMetrics, monteCarlo, sweep, yields, sensitivities, threads, (System.nanoTime() - start) / 1e9);
    }

    /**
     * A copy of the machine with its library axes, for a study to run on while the original stays editable: take it
     * where the machine is edited (the UI thread), then run on it anywhere.
     */
    public static Machine snapshot(Machine machine) {
        return MachineVariantModel.copy(machine);
    }

    /**
     * The machine's study called {@code nameOrId}.
     *
     * @throws IllegalArgumentException listing the machine's studies when there is none of that name
     */
    public static VariationStudy study(Machine machine, String nameOrId) {
        return machine.getStudies().stream()
                .filter(s -> nameOrId.equals(s.getName()) || nameOrId.equals(s.getId())).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("machine " + machine.getName() + " has no study '"
                        + nameOrId + "'; " + (machine.getStudies().isEmpty() ? "it asks for none"
                                : "its studies: " + machine.getStudies().stream().map(VariationStudy::getName)
                                        .toList())));
    }
}
