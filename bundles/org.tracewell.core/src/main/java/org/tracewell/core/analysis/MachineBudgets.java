package org.tracewell.core.analysis;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import java.util.function.Function;

import org.tracewell.engine.budget.BudgetLine;
import org.tracewell.engine.budget.BudgetTarget;
import org.tracewell.engine.budget.CombinationMethod;
import org.tracewell.engine.budget.Distribution;
import org.tracewell.engine.budget.ErrorBudget;
import org.tracewell.engine.budget.ErrorClass;
import org.tracewell.engine.budget.ServoErrorFormulas;
import org.tracewell.engine.budget.SourceKind;
import org.tracewell.engine.budget.ValueOrigin;
import org.tracewell.model.Axis;
import org.tracewell.model.BudgetSource;
import org.tracewell.model.Contour;
import org.tracewell.model.ContourMetric;
import org.tracewell.model.LimitBound;
import org.tracewell.model.Machine;
import org.tracewell.model.Requirement;
import org.tracewell.model.RequirementKind;

/**
 * Builds the error budget of a machine from its analysis and its entered lines, and evaluates it for every
 * machine-level contour-deviation requirement (combination {@link #DEFAULT_METHOD}; the model has no per-requirement
 * method yet).
 * <p>
 * Computed lines per contour (systematic unless said): servo lag = the simulated figure of the requirement's metric
 * less the mismatch part; gain mismatch = the closed-form Kv-mismatch figure (G ≈ F·|1/Kx − 1/Ky| on circles,
 * (V/2)·sin2θ·|1/Kx − 1/Ky| on lines), so the two add up to the simulated figure; corner error V/(e·Kv) where the
 * path has a sharp corner; quantisation q per axis of the plane (random, q/√12). Friction reversal and resonance are
 * not in the linear tracking simulation: they come from the model's entered lines.
 */
public final class MachineBudgets {

    /** Used when a requirement names no method (DOMAIN.md §6: Σ|systematic| + √(Σ random²)). */
    public static final CombinationMethod DEFAULT_METHOD = CombinationMethod.SYSTEMATIC_PLUS_RSS;

    static final String COMPUTED_PREFIX = "computed:";

    /** Id of a computed line of a requirement's budget, e.g. ("lm3020-r1", "mismatch"). */
    public static String computedLineId(String requirementId, String kind) {
        return COMPUTED_PREFIX + requirementId + ":" + kind;
    }

    private MachineBudgets() {
    }

    public static MachineBudget build(Machine machine, MachineAnalysis analysis) {
        return build(machine, id -> analysis.contour(id).map(ContourFigures::of),
                id -> analysis.axis(id).map(AxisFacts::of));
    }

    /**
     * As {@link #build(Machine, MachineAnalysis)} from figures rather than a full analysis.
     *
     * @param contours the figures of a contour by model id; empty when it was not analysed
     * @param axes     the facts of an axis by model id
     */
    public static MachineBudget build(Machine machine, Function<String, Optional<ContourFigures>> contours,
            Function<String, Optional<AxisFacts>> axes) {
        List<BudgetLine> entered = new ArrayList<>();
        for (org.tracewell.model.BudgetLine line : machine.getBudgetLines()) {
            entered.add(entered(line));
        }
        List<BudgetLine> allComputed = new ArrayList<>();
        List<SupersededLine> superseded = new ArrayList<>();
        List<RequirementBudget> budgets = new ArrayList<>();
        for (Requirement requirement : machine.getRequirements()) {
            Optional<Budgeted> budgeted = budget(machine, requirement, contours, axes);
            if (budgeted.isEmpty()) {
                continue;
            }
            for (BudgetLine line : budgeted.get().computed()) {
                if (allComputed.stream().noneMatch(l -> l.id().equals(line.id()))) {
                    allComputed.add(line);
                }
            }
            for (SupersededLine line : budgeted.get().superseded()) {
                if (superseded.stream().noneMatch(s -> s.stored().id().equals(line.stored().id()))) {
                    superseded.add(line);
                }
            }
            budgets.add(budgeted.get().budget());
        }
        List<BudgetLine> keptEntered = entered.stream()
                .filter(e -> superseded.stream().noneMatch(s -> s.stored().id().equals(e.id()))).toList();
        return new MachineBudget(allComputed, keptEntered, superseded, budgets);
    }

    /**
     * The budget of one requirement alone, as {@link #build} makes it: what a variant of a tolerance study needs,
     * whose figures change from variant to variant. Empty for a requirement without a budget (not a machine-level
     * contour-deviation limit, or none of its contours analysed).
     */
    public static Optional<RequirementBudget> forRequirement(Machine machine, Requirement requirement,
            Function<String, Optional<ContourFigures>> contours, Function<String, Optional<AxisFacts>> axes) {
        return budget(machine, requirement, contours, axes).map(Budgeted::budget);
    }

    /** True when {@link #build} gives the requirement a budget of its own (given its contours are analysed). */
    public static boolean hasBudget(Requirement requirement) {
        return requirement.getParent() == null && requirement.getKind() == RequirementKind.CONTOUR_DEVIATION
                && requirement.getBound() != LimitBound.AT_LEAST && requirement.getLimit() > 0;
    }

    private record Budgeted(RequirementBudget budget, List<BudgetLine> computed, List<SupersededLine> superseded) {
    }

    private static Optional<Budgeted> budget(Machine machine, Requirement requirement,
            Function<String, Optional<ContourFigures>> contourFigures, Function<String, Optional<AxisFacts>> axes) {
        if (!hasBudget(requirement)) {
            return Optional.empty();
        }
        List<ContourFigures> contours = requirement.getContours().stream().map(Contour::getId)
                .map(contourFigures).flatMap(Optional::stream).toList();
        if (contours.isEmpty()) {
            return Optional.empty();
        }
        Set<String> planeAxes = new LinkedHashSet<>();
        for (ContourFigures c : contours) {
            planeAxes.add(c.firstAxisId());
            planeAxes.add(c.secondAxisId());
        }
        List<BudgetLine> computed = computedLines(requirement, contours, planeAxes, axes);
        List<BudgetLine> lines = new ArrayList<>(computed);
        List<SupersededLine> superseded = new ArrayList<>();
        for (org.tracewell.model.BudgetLine modelLine : machine.getBudgetLines()) {
            BudgetLine line = entered(modelLine);
            if (!appliesToPlane(modelLine, planeAxes, axes)) {
                continue;
            }
            Optional<BudgetLine> replacement = modelLine.getOrigin() == org.tracewell.model.ValueOrigin.COMPUTED
                    ? computed.stream().filter(c -> c.source() == line.source() && line.axis() != null
                            && line.axis().equals(c.axis())).findFirst()
                    : Optional.empty();
            if (replacement.isPresent()) {
                superseded.add(new SupersededLine(line, replacement.get().id()));
                continue;
            }
            lines.add(line);
        }
        ErrorBudget budget = ErrorBudget.of(requirement.getId(), DEFAULT_METHOD, lines);
        RequirementBudget result = new RequirementBudget(requirement.getId(), metricName(requirement.getMetric()),
                contours.stream().map(ContourFigures::contourId).toList(), budget,
                budget.evaluate(new BudgetTarget(requirement.getLimit(), MachineBudget.RESERVE_FRACTION)));
        return Optional.of(new Budgeted(result, computed, superseded));
    }

    /** The simulated figure of a contour-deviation metric on one run; empty when the metric needs a circle. */
    public static OptionalDouble metricValue(ContourMetric metric, ContourRun run) {
        return RunFigures.of(run).value(metric);
    }

    public static String metricName(ContourMetric metric) {
        return metric.getLiteral();
    }

    private static List<BudgetLine> computedLines(Requirement requirement, List<ContourFigures> contours,
            Set<String> planeAxes, Function<String, Optional<AxisFacts>> axes) {
        List<BudgetLine> lines = new ArrayList<>();
        ContourMetric metric = requirement.getMetric();
        // The worst run over all the requirement's contours governs, as the requirement must hold on each.
        ContourFigures worstContour = null;
        RunFigures worstRun = null;
        double worst = -1;
        for (ContourFigures c : contours) {
            for (RunFigures run : c.runs()) {
                OptionalDouble v = run.value(metric);
                if (v.isPresent() && v.getAsDouble() > worst) {
                    worst = v.getAsDouble();
                    worstContour = c;
                    worstRun = run;
                }
            }
        }
        if (worstRun == null) {
            return lines;
        }
        ContourEstimate estimate = worstContour.estimate();
        double mismatch = metric == ContourMetric.CIRCULAR_DEVIATION
                ? estimate.circularDeviationMismatch().orElse(0)
                : estimate.lineMismatchError().orElse(0);
        mismatch = Math.min(mismatch, worst);
        String where = "contour '" + worstContour.contourName() + "' " + worstRun.direction().label();
        String pair = worstContour.firstAxisName() + "/" + worstContour.secondAxisName();
        String id = requirement.getId();
        lines.add(BudgetLine.systematic(computedLineId(id, "servo-lag"), "servo lag " + pair, null,
                SourceKind.SERVO_LAG, worst - mismatch, "tracking simulation, " + where + ": " + metricName(metric) + " "
                        + micro(worst) + " µm less the Kv-mismatch part"));
        lines.add(BudgetLine.systematic(computedLineId(id, "mismatch"), "Kv mismatch " + pair, null,
                SourceKind.GAIN_MISMATCH, mismatch, "Kx = " + estimate.firstAxisKv() + " 1/s, Ky = " + estimate.secondAxisKv()
                        + " 1/s at the programmed feed; " + ServoErrorFormulas.KAKINO_1993));
        if (estimate.cornerError().isPresent()) {
            lines.add(BudgetLine.systematic(computedLineId(id, "corner"), "corner " + pair, null,
                    SourceKind.CORNER, estimate.cornerError().getAsDouble(), "V/(e·Kv) at the programmed feed (derived,"
                            + " DOMAIN.md §4); the planner's deceleration makes it an upper bound"));
        }
        for (String axisId : planeAxes) {
            AxisFacts axis = axes.apply(axisId).orElseThrow(() -> new IllegalArgumentException("axis " + axisId
                    + " of the budget's contours was not analysed"));
            if (axis.positionResolution() > 0) {
                lines.add(new BudgetLine(COMPUTED_PREFIX + axisId + ":quantisation", "encoder step", axis.axisName(),
                        SourceKind.QUANTISATION, axis.positionResolution(), ValueOrigin.COMPUTED, ErrorClass.RANDOM,
                        Distribution.QUANTISATION, Distribution.DEFAULT_COVERAGE_FACTOR, 1.0,
                        "encoder step at the load q = " + axis.positionResolution() + " m, u = q/√12; "
                                + ServoErrorFormulas.GUM_QUANTISATION));
            }
        }
        return lines;
    }

    /** An entered line counts for a plane when its axis (or its gantry partner) is one of the plane's, or it has none. */
    private static boolean appliesToPlane(org.tracewell.model.BudgetLine line, Set<String> planeAxes,
            Function<String, Optional<AxisFacts>> axes) {
        Axis axis = line.getAxis();
        if (axis == null) {
            return true;
        }
        if (planeAxes.contains(axis.getId())) {
            return true;
        }
        return axes.apply(axis.getId()).flatMap(AxisFacts::gantryPartnerId).map(planeAxes::contains)
                .orElse(false);
    }

    static BudgetLine entered(org.tracewell.model.BudgetLine line) {
        String axis = line.getAxis() == null ? null : line.getAxis().getName();
        String name = line.getName() == null || line.getName().isBlank() ? line.getId() : line.getName();
        return new BudgetLine(line.getId(), name, axis, source(line.getSource()),
                line.getValue(), line.getOrigin() == org.tracewell.model.ValueOrigin.COMPUTED ? ValueOrigin.COMPUTED
                        : ValueOrigin.ENTERED,
                line.getErrorClass() == org.tracewell.model.ErrorClass.RANDOM ? ErrorClass.RANDOM
                        : ErrorClass.SYSTEMATIC,
                distribution(line.getDistribution()), Distribution.DEFAULT_COVERAGE_FACTOR, line.getSensitivity(),
                line.getEvidence() == null ? "" : line.getEvidence());
    }

    private static SourceKind source(BudgetSource source) {
        return switch (source) {
            case SERVO_LAG -> SourceKind.SERVO_LAG;
            case GAIN_MISMATCH -> SourceKind.GAIN_MISMATCH;
            case QUANTISATION -> SourceKind.QUANTISATION;
            case RESONANCE -> SourceKind.RESONANCE;
            case FRICTION_REVERSAL -> SourceKind.FRICTION_REVERSAL;
            case THERMAL -> SourceKind.THERMAL;
            case GEOMETRIC -> SourceKind.GEOMETRIC;
            case USER_ENTERED -> SourceKind.USER_ENTERED;
        };
    }

    private static Distribution distribution(org.tracewell.model.Distribution d) {
        return switch (d) {
            case NORMAL -> Distribution.NORMAL;
            case UNIFORM -> Distribution.UNIFORM;
            case USHAPED -> Distribution.U_SHAPED;
            case QUANTISATION -> Distribution.QUANTISATION;
        };
    }

    private static String micro(double metres) {
        return String.format(java.util.Locale.ROOT, "%.3f", metres * 1e6);
    }
}
