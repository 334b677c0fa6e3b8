package org.tracewell.core.variation;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.util.EcoreUtil;
import org.tracewell.core.analysis.AxisFacts;
import org.tracewell.core.analysis.ContourEstimate;
import org.tracewell.core.analysis.ContourFigures;
import org.tracewell.core.analysis.MachineAnalyzer;
import org.tracewell.core.analysis.MachineBudgets;
import org.tracewell.core.analysis.RequirementBudget;
import org.tracewell.core.analysis.RunDirection;
import org.tracewell.core.analysis.RunFigures;
import org.tracewell.core.mapping.EngineMapping;
import org.tracewell.core.mapping.MachineInputs;
import org.tracewell.core.mapping.MappedAxis;
import org.tracewell.core.mapping.MappedContour;
import org.tracewell.core.mapping.MappingException;
import org.tracewell.engine.axis.AxisLoopFigures;
import org.tracewell.engine.contour.CircleTestSetup;
import org.tracewell.engine.contour.ContourErrorAnalysis;
import org.tracewell.engine.contour.ContourErrorResult;
import org.tracewell.engine.path.ArcDirection;
import org.tracewell.engine.path.Path;
import org.tracewell.engine.sim.AxisLoop;
import org.tracewell.engine.sim.TrackingResult;
import org.tracewell.engine.sim.TrackingSimulator;
import org.tracewell.engine.trajectory.PathLimits;
import org.tracewell.engine.trajectory.Trajectory;
import org.tracewell.engine.variation.CircleRunKernel;
import org.tracewell.engine.variation.Quantity;
import org.tracewell.engine.variation.VariantEvaluator;
import org.tracewell.engine.variation.VariantModel;
import org.tracewell.model.Axis;
import org.tracewell.model.Contour;
import org.tracewell.model.Machine;
import org.tracewell.model.Requirement;
import org.tracewell.model.paths.AttributePath;
import org.tracewell.model.paths.AttributeTarget;

/**
 * A machine as an engine {@link VariantModel}: parameters are numeric attributes of the machine (SI, addressed by
 * {@link AttributePath}), metrics are {@link StudyMetric}s. Each worker thread evaluates on its own copy of the
 * machine (library axes copied too, so a variant never writes a shared axis file's elements): it stores the
 * variant's values, maps the axes the metrics need ({@link EngineMapping}) and runs only the analyses they need:
 * <ul>
 * <li>contour runs with the analysis pipeline's own set-up and reference ({@link MachineAnalyzer#circleSetup},
 * {@link MachineAnalyzer#reference}): full circles through the engine's {@link CircleRunKernel}, other contours
 * through {@code TrackingSimulator} and the exact contour-error search; a run whose reference cannot change with the
 * parameters is planned once for the whole study, and identical runs (a CCW circle run reversed and the same circle
 * programmed CW) are simulated once;</li>
 * <li>loop figures through {@link AxisLoopFigures} (the axis analysis's definitions, each figure on demand);</li>
 * <li>requirement values as the design review takes them, the error budget re-evaluated per variant with
 * {@link MachineBudgets#forRequirement} (so a varied budget line counts too).</li>
 * </ul>
 * A variant whose axes cannot be mapped (the engine refuses a value) or whose loops are unstable gets NaN for what it
 * cannot compute, which counts as failing every limit.
 * <p>
 * The machine is copied when the model is built: later edits of it do not reach a running study.
 */
public final class MachineVariantModel implements VariantModel {

    private final Machine snapshot;
    private final String machineName;
    private final List<AttributePath> paths;
    private final List<Quantity> parameters;
    private final List<String> parameterDisplayUnits;
    private final double[] nominal;
    private final List<StudyMetric> metrics;
    private final List<Quantity> metricQuantities;
    private final List<String> axisIds;
    private final Map<String, AxisFacts> nominalFacts;
    private final List<RunSpec> runs;
    private final Map<String, List<Integer>> contourRuns;
    private final Map<String, MappedContour> nominalContours;
    private final Object copyLock = new Object();

    /** One distinct contour run the metrics need. */
    private record RunSpec(String contourId, RunDirection direction, String firstAxisId, String secondAxisId,
            boolean reversed, boolean replanned, Optional<CircleRunKernel> kernel, Optional<Trajectory> reference,
            int sameAs) {
    }

    /** What makes two circle runs the same simulation. */
    private record CircleKey(String first, String second, CircleTestSetup setup, PathLimits limits,
            double samplePeriod) {
    }

    /**
     * @param machine        the machine (copied now); its library axes must be loaded
     * @param parameterPaths attribute paths, parameter order
     * @param metricNames    metric names ({@link StudyMetrics}); empty = every requirement
     * @throws MappingException         when the nominal machine does not map to engine inputs
     * @throws IllegalArgumentException naming the path or metric that is not valid
     */
    public MachineVariantModel(Machine machine, List<String> parameterPaths, List<String> metricNames)
            throws MappingException {
        this.snapshot = copy(machine);
        this.machineName = machine.getName();
        if (parameterPaths.isEmpty()) {
            throw new IllegalArgumentException("a study of " + machineName + " needs at least one varied attribute");
        }
        this.paths = parameterPaths.stream().map(AttributePath::parse).toList();
        List<Quantity> p = new ArrayList<>();
        List<String> displayUnits = new ArrayList<>();
        List<AttributeTarget> nominalTargets = new ArrayList<>();
        for (AttributePath path : paths) {
            AttributeTarget target = path.resolve(snapshot);
            nominalTargets.add(target);
            displayUnits.add(target.displayUnit());
            p.add(new Quantity(target.path(), target.siUnit(), target.attribute().getName() + " of "
                    + EcoreUtil.getID(target.owner()) + ", shown in " + target.displayUnit()));
        }
        this.parameters = List.copyOf(p);
        this.parameterDisplayUnits = List.copyOf(displayUnits);
        this.nominal = nominalTargets.stream().mapToDouble(AttributeTarget::get).toArray();
        this.metrics = List.copyOf(StudyMetrics.parseAll(metricNames, snapshot));
        if (metrics.isEmpty()) {
            throw new IllegalArgumentException("machine " + machineName + " has no requirements; name the metrics to"
                    + " collect, e.g. " + StudyMetrics.available(snapshot).stream().limit(3).toList());
        }
        this.metricQuantities = metrics.stream().map(m -> new Quantity(m.name(), m.siUnit(), m.description()))
                .toList();
        MachineInputs inputs = EngineMapping.map(snapshot);
        this.nominalFacts = new HashMap<>();
        for (MappedAxis a : inputs.axes()) {
            nominalFacts.put(a.id(), AxisFacts.of(a));
        }
        this.nominalContours = new HashMap<>();
        for (MappedContour c : inputs.contours()) {
            nominalContours.put(c.id(), c);
        }
        // which contours need which runs, and which axes must be mapped per variant
        Map<String, Boolean> contourBothWays = new LinkedHashMap<>();
        Set<String> axes = new LinkedHashSet<>();
        for (StudyMetric m : metrics) {
            switch (m) {
                case ContourValue c -> contourBothWays.merge(c.contourId(), false, Boolean::logicalOr);
                case AxisValue a -> axes.add(a.axisId());
                case RequirementValue r -> {
                    r.axisId().ifPresent(axes::add);
                    for (String id : r.contourIds()) {
                        contourBothWays.merge(id, true, Boolean::logicalOr);
                    }
                }
            }
        }
        this.runs = new ArrayList<>();
        this.contourRuns = new LinkedHashMap<>();
        Map<CircleKey, Integer> distinct = new HashMap<>();
        for (Map.Entry<String, Boolean> e : contourBothWays.entrySet()) {
            MappedContour contour = nominalContours.get(e.getKey());
            MappedAxis first = inputs.axis(contour.firstAxisId()).orElseThrow(() -> new IllegalArgumentException(
                    "contour '" + contour.name() + "' names axis " + contour.firstAxisId() + ", which " + machineName
                            + " does not have"));
            MappedAxis second = inputs.axis(contour.secondAxisId()).orElseThrow(() -> new IllegalArgumentException(
                    "contour '" + contour.name() + "' names axis " + contour.secondAxisId() + ", which " + machineName
                            + " does not have"));
            axes.add(first.id());
            axes.add(second.id());
            boolean replanned = referenceVaries(nominalTargets, e.getKey(), first.id(), second.id());
            Optional<CircleTestSetup> setup = MachineAnalyzer.circleSetup(contour);
            List<Integer> indices = new ArrayList<>();
            for (boolean reversed : setup.isPresent() && e.getValue() ? List.of(false, true) : List.of(false)) {
                indices.add(addRun(contour, first, second, setup, reversed, replanned, distinct));
            }
            contourRuns.put(contour.id(), List.copyOf(indices));
        }
        this.axisIds = List.copyOf(axes);
    }

    private int addRun(MappedContour contour, MappedAxis first, MappedAxis second, Optional<CircleTestSetup> setup,
            boolean reversed, boolean replanned, Map<CircleKey, Integer> distinct) {
        Optional<CircleTestSetup> run = setup.map(s -> reversed ? s.reversed() : s);
        RunDirection direction = run.map(s -> s.direction() == ArcDirection.CW ? RunDirection.CW : RunDirection.CCW)
                .orElse(RunDirection.PROGRAMMED);
        int index = runs.size();
        if (replanned) {
            runs.add(new RunSpec(contour.id(), direction, first.id(), second.id(), reversed, true, Optional.empty(),
                    Optional.empty(), -1));
            return index;
        }
        Path path = run.map(CircleTestSetup::path).orElse(contour.path());
        Trajectory reference = MachineAnalyzer.reference(contour, path, first, second);
        int sameAs = -1;
        if (run.isPresent()) {
            CircleKey key = new CircleKey(first.id(), second.id(), run.get(), contour.limits(), contour.samplePeriod());
            sameAs = distinct.getOrDefault(key, -1);
            if (sameAs < 0) {
                distinct.put(key, index);
            }
        }
        Optional<CircleRunKernel> kernel = sameAs < 0 ? run.map(s -> CircleRunKernel.of(s, reference))
                : Optional.empty();
        runs.add(new RunSpec(contour.id(), direction, first.id(), second.id(), reversed, false, kernel,
                Optional.of(reference), sameAs));
        return index;
    }

    /**
     * A parameter changes a contour's reference when it sits in the contour (feed, geometry, sample period) or is an
     * attribute of one of its two axes themselves (the velocity, acceleration and jerk limits the planner obeys).
     */
    private boolean referenceVaries(List<AttributeTarget> targets, String contourId, String firstAxisId,
            String secondAxisId) {
        EObject contour = snapshot.getContours().stream().filter(c -> c.getId().equals(contourId)).findFirst()
                .orElseThrow();
        for (AttributeTarget t : targets) {
            if (EcoreUtil.isAncestor(contour, t.owner()) || t.owner() instanceof Axis a
                    && (a.getId().equals(firstAxisId) || a.getId().equals(secondAxisId))) {
                return true;
            }
        }
        return false;
    }

    /** The machine with its library axes, all copied together so references between them follow the copy. */
    static Machine copy(Machine machine) {
        EcoreUtil.Copier copier = new EcoreUtil.Copier();
        Machine copy = (Machine) copier.copy(machine);
        copier.copyAll(machine.getLibraryAxes());
        copier.copyReferences();
        return copy;
    }

    public String machineName() {
        return machineName;
    }

    /** The nominal value of every parameter, SI. */
    public double[] nominal() {
        return nominal.clone();
    }

    /** The trade unit each parameter is shown in, parameter order. */
    public List<String> parameterDisplayUnits() {
        return parameterDisplayUnits;
    }

    /** The metrics, model order. */
    public List<StudyMetric> studyMetrics() {
        return metrics;
    }

    /** Contour runs simulated per variant (identical runs counted once). */
    public int simulatedRunCount() {
        return (int) runs.stream().filter(r -> r.sameAs() < 0).count();
    }

    @Override
    public List<Quantity> parameters() {
        return parameters;
    }

    @Override
    public List<Quantity> metrics() {
        return metricQuantities;
    }

    @Override
    public VariantEvaluator newEvaluator() {
        Machine own;
        synchronized (copyLock) { // EMF objects are read by one copier at a time
            own = copy(snapshot);
        }
        return new Evaluator(own);
    }

    @Override
    public String toString() {
        return "MachineVariantModel[" + machineName + ", parameters " + paths + ", metrics "
                + metrics.stream().map(StudyMetric::name).toList() + "]";
    }

    // ------------------------------------------------------------------------------------------------ evaluation

    /** One thread's machine copy, its resolved attributes and scratch buffers. */
    private final class Evaluator implements VariantEvaluator {

        private final Machine machine;
        private final AttributeTarget[] targets;
        private final Map<String, Axis> axes = new HashMap<>();
        private final Map<String, Contour> contours = new HashMap<>();
        private final Map<String, Requirement> requirements = new HashMap<>();
        private final CircleRunKernel.Run[] circleRuns;
        private final double[] figures = new double[CircleRunKernel.FIGURE_COUNT];
        // per variant
        private final Map<String, MappedAxis> mapped = new HashMap<>();
        private final Map<String, AxisLoopFigures> loopFigures = new HashMap<>();
        private final Map<String, AxisLoop> loops = new HashMap<>();
        private final RunFigures[] runFigures = new RunFigures[runs.size()];
        private final Trajectory[] references = new Trajectory[runs.size()];
        private final MappedContour[] runContours = new MappedContour[runs.size()];

        Evaluator(Machine machine) {
            this.machine = machine;
            this.targets = paths.stream().map(p -> p.resolve(machine)).toArray(AttributeTarget[]::new);
            StudyMetrics.axes(machine).forEach(a -> axes.put(a.getId(), a));
            machine.getContours().forEach(c -> contours.put(c.getId(), c));
            machine.getRequirements().forEach(r -> requirements.put(r.getId(), r));
            circleRuns = new CircleRunKernel.Run[runs.size()];
            for (int i = 0; i < runs.size(); i++) {
                circleRuns[i] = runs.get(i).kernel().map(CircleRunKernel::newRun).orElse(null);
            }
        }

        @Override
        public void evaluate(double[] p, double[] out) {
            for (int j = 0; j < targets.length; j++) {
                targets[j].set(p[j]);
            }
            mapped.clear();
            loopFigures.clear();
            loops.clear();
            try {
                for (String id : axisIds) {
                    mapped.put(id, EngineMapping.mapAxis(axes.get(id)));
                }
            } catch (MappingException refused) {
                java.util.Arrays.fill(out, Double.NaN); // the engine refuses this variant: nothing computable
                return;
            }
            for (int i = 0; i < runs.size(); i++) {
                RunSpec run = runs.get(i);
                runFigures[i] = run.sameAs() >= 0 ? withDirection(runFigures[run.sameAs()], run.direction())
                        : simulate(i, run);
            }
            for (int m = 0; m < metrics.size(); m++) {
                out[m] = value(metrics.get(m));
            }
        }

        private AxisLoopFigures figures(String axisId) {
            return loopFigures.computeIfAbsent(axisId, id -> AxisLoopFigures.of(mapped.get(id).model()));
        }

        private RunFigures simulate(int index, RunSpec run) {
            references[index] = run.reference().orElse(null);
            runContours[index] = nominalContours.get(run.contourId());
            if (!figures(run.firstAxisId()).stable() || !figures(run.secondAxisId()).stable()) {
                return unstable(run.direction());
            }
            List<AxisLoop> pair = List.of(loops.computeIfAbsent(run.firstAxisId(), id -> mapped.get(id).model()
                    .toAxisLoop()), loops.computeIfAbsent(run.secondAxisId(), id -> mapped.get(id).model()
                            .toAxisLoop()));
            MappedContour contour;
            Optional<CircleTestSetup> setup;
            CircleRunKernel.Run circle = circleRuns[index];
            Trajectory reference;
            if (run.replanned()) {
                try {
                    contour = EngineMapping.mapContour(contours.get(run.contourId()));
                } catch (MappingException refused) {
                    return unstable(run.direction());
                }
                setup = MachineAnalyzer.circleSetup(contour).map(s -> run.reversed() ? s.reversed() : s);
                Path path = setup.map(CircleTestSetup::path).orElse(contour.path());
                reference = MachineAnalyzer.reference(contour, path, mapped.get(run.firstAxisId()),
                        mapped.get(run.secondAxisId()));
                if (setup.isPresent()) {
                    circle = CircleRunKernel.of(setup.get(), reference).newRun();
                }
            } else {
                contour = nominalContours.get(run.contourId());
                reference = run.reference().orElseThrow();
                setup = Optional.empty();
            }
            references[index] = reference;
            runContours[index] = contour;
            if (circle != null) {
                circle.evaluate(pair, figures);
                return new RunFigures(run.direction(), figures[CircleRunKernel.MAX_CONTOUR_ERROR],
                        OptionalDouble.of(figures[CircleRunKernel.G]), OptionalDouble.of(figures[CircleRunKernel.F]),
                        figures[CircleRunKernel.PEAK_FOLLOWING_ERROR_FIRST],
                        figures[CircleRunKernel.PEAK_FOLLOWING_ERROR_SECOND]);
            }
            TrackingResult tracking = TrackingSimulator.simulate(reference, pair);
            ContourErrorResult error = ContourErrorAnalysis.analyse(tracking, reference.path(),
                    ContourErrorAnalysis.DEFAULT_WINDOW);
            return new RunFigures(run.direction(), error.maxAbsError(), OptionalDouble.empty(), OptionalDouble.empty(),
                    tracking.peakFollowingError(0), tracking.peakFollowingError(1));
        }

        private RunFigures unstable(RunDirection direction) {
            return new RunFigures(direction, Double.NaN, OptionalDouble.of(Double.NaN), OptionalDouble.of(Double.NaN),
                    Double.NaN, Double.NaN);
        }

        private RunFigures withDirection(RunFigures f, RunDirection direction) {
            return new RunFigures(direction, f.maxContourError(), f.circularDeviationG(), f.radialDeviationF(),
                    f.peakFollowingErrorFirst(), f.peakFollowingErrorSecond());
        }

        private double value(StudyMetric metric) {
            return switch (metric) {
                case ContourValue c -> {
                    RunFigures programmed = runFigures[contourRuns.get(c.contourId()).get(0)];
                    yield switch (c.quantity()) {
                        case G -> programmed.circularDeviationG().orElse(Double.NaN);
                        case F -> programmed.radialDeviationF().orElse(Double.NaN);
                        case MAX_CONTOUR_ERROR -> programmed.maxContourError();
                    };
                }
                case AxisValue a -> axisValue(a.axisId(), a.quantity());
                case RequirementValue r -> requirementValue(r);
            };
        }

        private double axisValue(String axisId, AxisQuantity quantity) {
            AxisLoopFigures f = figures(axisId);
            return switch (quantity) {
                case KV -> f.positionGain();
                case PHASE_MARGIN -> finite(Math.toRadians(f.positionMargins().phaseMarginDeg()));
                case GAIN_MARGIN -> finite(f.positionMargins().gainMarginFactor());
                case BANDWIDTH -> f.positionBandwidthHz().orElse(Double.NaN);
                case VELOCITY_PHASE_MARGIN -> finite(Math.toRadians(f.velocityMargins().phaseMarginDeg()));
                case VELOCITY_GAIN_MARGIN -> finite(f.velocityMargins().gainMarginFactor());
                case VELOCITY_BANDWIDTH -> f.velocityBandwidthHz().orElse(Double.NaN);
                case FOLLOWING_ERROR -> f.followingError(mapped.get(axisId).limits().velocity()).orElse(Double.NaN);
                case SETTLING_TIME -> f.settlingTime().orElse(Double.NaN);
            };
        }

        /** The requirement's value as the review takes it: the worst verifying result; NaN if one is missing. */
        private double requirementValue(RequirementValue r) {
            List<Double> values = new ArrayList<>();
            switch (r.kind()) {
                case CONTOUR_DEVIATION -> {
                    for (String id : r.contourIds()) {
                        for (int run : contourRuns.get(id)) {
                            values.add(runFigures[run].value(r.contourMetric()).orElse(Double.NaN));
                        }
                    }
                    if (r.budgeted()) {
                        values.add(budgetTotal(r));
                    }
                }
                case FOLLOWING_ERROR, STEADY_STATE_ERROR -> {
                    if (r.axisId().isEmpty()) {
                        return Double.NaN;
                    }
                    String axis = r.axisId().get();
                    for (String id : r.contourIds()) {
                        MappedContour c = nominalContours.get(id);
                        int index = c.firstAxisId().equals(axis) ? 0 : c.secondAxisId().equals(axis) ? 1 : -1;
                        if (index >= 0) {
                            for (int run : contourRuns.get(id)) {
                                values.add(runFigures[run].peakFollowingError(index));
                            }
                        }
                    }
                    if (values.isEmpty()) {
                        values.add(axisValue(axis, AxisQuantity.FOLLOWING_ERROR));
                    }
                }
                default -> {
                    if (r.axisId().isEmpty()) {
                        return Double.NaN;
                    }
                    values.add(axisValue(r.axisId().get(), switch (r.kind()) {
                        case PHASE_MARGIN -> r.velocityLoop() ? AxisQuantity.VELOCITY_PHASE_MARGIN
                                : AxisQuantity.PHASE_MARGIN;
                        case GAIN_MARGIN -> r.velocityLoop() ? AxisQuantity.VELOCITY_GAIN_MARGIN
                                : AxisQuantity.GAIN_MARGIN;
                        case BANDWIDTH -> r.velocityLoop() ? AxisQuantity.VELOCITY_BANDWIDTH : AxisQuantity.BANDWIDTH;
                        case SETTLING_TIME -> AxisQuantity.SETTLING_TIME;
                        default -> AxisQuantity.KV;
                    }));
                }
            }
            double worst = Double.NaN;
            for (double v : values) {
                if (Double.isNaN(v)) {
                    return Double.NaN;
                }
                worst = Double.isNaN(worst) ? v : r.bound() == org.tracewell.engine.budget.LimitBound.AT_LEAST
                        ? Math.min(worst, v) : Math.max(worst, v);
            }
            return worst;
        }

        /** The requirement's error budget with this variant's figures and budget lines. */
        private double budgetTotal(RequirementValue r) {
            Map<String, ContourFigures> figuresById = new HashMap<>();
            for (String id : r.contourIds()) {
                List<Integer> indices = contourRuns.get(id);
                List<RunFigures> contourFigures = indices.stream().map(i -> runFigures[i]).toList();
                if (contourFigures.stream().anyMatch(f -> Double.isNaN(f.maxContourError()))) {
                    return Double.NaN;
                }
                int programmed = indices.get(0);
                // a replanned contour is mapped per variant (its feed may vary); an identical run shares its reference
                MappedContour contour = runs.get(programmed).replanned() ? runContours[programmed]
                        : nominalContours.get(id);
                Trajectory reference = references[source(programmed)];
                double radius = MachineAnalyzer.circleSetup(contour).map(CircleTestSetup::radius).orElse(0.0);
                ContourEstimate estimate = MachineAnalyzer.estimate(contour, reference, radius,
                        figures(contour.firstAxisId()).positionGain(), figures(contour.secondAxisId()).positionGain());
                figuresById.put(id, new ContourFigures(id, contour.name(), contour.firstAxisId(),
                        contour.secondAxisId(), mapped.get(contour.firstAxisId()).name(),
                        mapped.get(contour.secondAxisId()).name(), contourFigures, estimate));
            }
            Optional<RequirementBudget> budget = MachineBudgets.forRequirement(machine,
                    requirements.get(r.requirementId()), id -> Optional.ofNullable(figuresById.get(id)),
                    id -> Optional.ofNullable(mapped.containsKey(id) ? AxisFacts.of(mapped.get(id))
                            : nominalFacts.get(id)));
            return budget.map(b -> b.evaluation().total()).orElse(Double.NaN);
        }

        /** The run that was simulated for run {@code index} (itself, or the identical run it repeats). */
        private int source(int index) {
            int same = runs.get(index).sameAs();
            return same >= 0 ? same : index;
        }

        private double finite(double v) {
            return Double.isFinite(v) ? v : Double.NaN;
        }
    }
}
