package org.tracewell.requirements;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

import org.tracewell.core.analysis.AxisResult;
import org.tracewell.core.analysis.ContourResult;
import org.tracewell.core.analysis.ContourRun;
import org.tracewell.core.analysis.MachineAnalysis;
import org.tracewell.core.analysis.MachineBudget;
import org.tracewell.core.analysis.MachineBudgets;
import org.tracewell.engine.budget.AllocationItem;
import org.tracewell.engine.budget.Apportionment;
import org.tracewell.engine.budget.BudgetTarget;
import org.tracewell.engine.budget.DesignLimit;
import org.tracewell.engine.budget.ErrorClass;
import org.tracewell.engine.budget.InverseDesign;
import org.tracewell.engine.budget.LineContribution;
import org.tracewell.engine.units.TradeUnits;
import org.tracewell.model.Axis;
import org.tracewell.model.Contour;
import org.tracewell.model.ContourMetric;
import org.tracewell.model.LimitBound;
import org.tracewell.model.Machine;
import org.tracewell.model.Requirement;
import org.tracewell.model.RequirementKind;

/**
 * Evaluates every requirement of a machine against its analysis and budget, and builds the trace around it.
 * <p>
 * Value per kind (worst over the verifying results): contour deviation — the metric on every run of the
 * requirement's contours (both directions of circles); following error — the peak simulated following error of the
 * allocated axis on the requirement's contours, or its nearest ancestor's, else v/Kv at the axis max velocity;
 * phase/gain margin — the position loop's (the velocity loop's when the statement says "velocity loop"); bandwidth —
 * the position loop's −3 dB bandwidth; settling time — 2 % settling of the position-loop step; steady-state error —
 * the following error at the axis max velocity; position gain — Kv.
 */
public final class RequirementEvaluator {

    private RequirementEvaluator() {
    }

    public static RequirementReport evaluate(Machine machine, MachineAnalysis analysis, MachineBudget budget) {
        List<RequirementResult> results = new ArrayList<>();
        for (Requirement r : machine.getRequirements()) {
            results.add(evaluate(r, machine, analysis, budget.forRequirement(r.getId())));
        }
        List<CoverageFinding> coverage = coverage(machine, results);
        List<RequirementApportionment> apportionments = new ArrayList<>();
        List<DerivedRequirement> derived = new ArrayList<>();
        for (Requirement r : machine.getRequirements()) {
            budget.forRequirement(r.getId()).ifPresent(b -> apportionments.add(apportion(r, b, machine)));
            derived.addAll(inverseDesign(r, analysis, budget.forRequirement(r.getId())));
        }
        return new RequirementReport(machine.getId(), results, coverage, apportionments, derived,
                matrix(machine, results));
    }

    // ------------------------------------------------------------------------------------------------ evaluation

    /**
     * A contour requirement with an error budget is verified by the simulated servo figure of every run AND by the
     * budget total, which rolls every contributor (servo, mismatch, geometric, thermal, quantisation…) up in the
     * budget's method: the worse of them is the requirement's value, so a budget that overruns the target can never
     * hide behind a small servo-only figure.
     */
    static RequirementResult evaluate(Requirement r, Machine machine, MachineAnalysis analysis,
            Optional<org.tracewell.core.analysis.RequirementBudget> budget) {
        String kind = r.getKind().getLiteral();
        String metric = r.getKind() == RequirementKind.CONTOUR_DEVIATION ? r.getMetric().getLiteral() : "";
        String siUnit = siUnit(r.getKind());
        Optional<Axis> axis = Optional.ofNullable(r.getAllocatedAxis());
        List<Verification> verifications = new ArrayList<>();
        String reason = null;
        switch (r.getKind()) {
            case CONTOUR_DEVIATION -> {
                List<Contour> contours = contoursOf(r);
                if (contours.isEmpty()) {
                    reason = "names no contour to evaluate " + metric + " on";
                }
                for (Contour c : contours) {
                    Optional<ContourResult> result = analysis.contour(c.getId());
                    if (result.isEmpty()) {
                        reason = "contour '" + c.getName() + "' was not analysed (left out with --contour?)";
                        continue;
                    }
                    for (ContourRun run : result.get().runs()) {
                        OptionalDouble v = MachineBudgets.metricValue(r.getMetric(), run);
                        if (v.isEmpty()) {
                            reason = "contour '" + c.getName() + "' is not a full circle, so " + metric
                                    + " is not defined";
                            continue;
                        }
                        verifications.add(new Verification("contour", c.getId(), c.getName(),
                                run.direction().label(), metricLabel(r.getMetric()), v));
                    }
                }
                budget.ifPresent(b -> verifications.add(new Verification("budget", b.requirementId(),
                        "error budget", "", "total, " + b.evaluation().method().displayName(),
                        OptionalDouble.of(b.evaluation().total()))));
            }
            case FOLLOWING_ERROR, STEADY_STATE_ERROR -> {
                if (axis.isEmpty()) {
                    reason = "no allocated axis";
                    break;
                }
                AxisResult a = analysis.axis(axis.get().getId()).orElse(null);
                if (a == null) {
                    reason = "axis " + axis.get().getName() + " was not analysed";
                    break;
                }
                List<Contour> contours = r.getKind() == RequirementKind.FOLLOWING_ERROR ? inheritedContours(r)
                        : List.of();
                for (Contour c : contours) {
                    analysis.contour(c.getId()).ifPresent(cr -> {
                        int index = cr.firstAxisId().equals(a.axisId()) ? 0
                                : cr.secondAxisId().equals(a.axisId()) ? 1 : -1;
                        if (index < 0) {
                            return;
                        }
                        for (ContourRun run : cr.runs()) {
                            verifications.add(new Verification("contour", c.getId(), c.getName(),
                                    run.direction().label(), "peak following error of " + a.axisName(),
                                    OptionalDouble.of(run.tracking().peakFollowingError(index))));
                        }
                    });
                }
                if (verifications.isEmpty()) {
                    OptionalDouble fe = a.atMaxVelocity().followingError();
                    if (fe.isEmpty()) {
                        reason = "the loop of axis " + a.axisName() + " is not stable";
                    } else {
                        verifications.add(new Verification("axis", a.axisId(), a.axisName(), "",
                                "following error v/Kv at max velocity", fe));
                    }
                }
            }
            case PHASE_MARGIN, GAIN_MARGIN, BANDWIDTH, SETTLING_TIME, POSITION_GAIN -> {
                if (axis.isEmpty()) {
                    reason = "no allocated axis";
                    break;
                }
                Optional<AxisResult> a = analysis.axis(axis.get().getId());
                if (a.isEmpty()) {
                    reason = "axis " + axis.get().getName() + " was not analysed";
                    break;
                }
                boolean velocityLoop = r.getStatement() != null
                        && r.getStatement().toLowerCase(java.util.Locale.ROOT).contains("velocity loop");
                Verification v = axisFigure(r.getKind(), a.get(), velocityLoop);
                if (v.value().isEmpty()) {
                    reason = v.resultName() + " of axis " + a.get().axisName() + " is not defined (unstable loop or"
                            + " no crossing)";
                } else {
                    verifications.add(v);
                }
            }
        }
        boolean atLeast = r.getBound() == LimitBound.AT_LEAST;
        verifications.sort((p, q) -> {
            double a = p.value().orElse(Double.NaN);
            double b = q.value().orElse(Double.NaN);
            return atLeast ? Double.compare(a, b) : Double.compare(b, a);
        });
        OptionalDouble value = OptionalDouble.empty();
        OptionalDouble margin = OptionalDouble.empty();
        OptionalDouble percent = OptionalDouble.empty();
        RequirementStatus status = RequirementStatus.NOT_EVALUATED;
        if (!verifications.isEmpty() && (reason == null || r.getKind() != RequirementKind.CONTOUR_DEVIATION)) {
            double v = verifications.get(0).value().getAsDouble();
            value = OptionalDouble.of(v);
            double m = margin(v, r.getLimit(), atLeast);
            margin = OptionalDouble.of(m);
            if (r.getLimit() != 0) {
                percent = OptionalDouble.of(100.0 * m / Math.abs(r.getLimit()));
            }
            status = m >= 0 ? RequirementStatus.MET : RequirementStatus.VIOLATED;
            reason = null;
        } else if (reason == null) {
            reason = "no computed result verifies it";
        }
        List<String> children = machine.getRequirements().stream().filter(c -> c.getParent() == r)
                .map(Requirement::getId).toList();
        return new RequirementResult(r.getId(), nz(r.getStatement()), kind, metric, r.getBound().getLiteral(),
                r.getLimit(), siUnit, nz(r.getDisplayUnit()), value, margin, percent, status,
                Optional.ofNullable(reason), Optional.ofNullable(r.getParent()).map(Requirement::getId), children,
                axis.map(Axis::getId), axis.map(Axis::getName), verifications, nz(r.getRationale()),
                r.getParent() == null);
    }

    /** Signed margin, positive = met with room: limit − value (at most), value − limit (at least). */
    public static double margin(double value, double limit, boolean atLeast) {
        return atLeast ? value - limit : limit - value;
    }

    private static Verification axisFigure(RequirementKind kind, AxisResult a, boolean velocityLoop) {
        String loop = velocityLoop ? "velocity-loop " : "position-loop ";
        return switch (kind) {
            case PHASE_MARGIN -> new Verification("axis", a.axisId(), a.axisName(), "", loop + "phase margin",
                    finite(velocityLoop ? a.velocityPhaseMargin() : a.positionPhaseMargin()));
            case GAIN_MARGIN -> new Verification("axis", a.axisId(), a.axisName(), "", loop + "gain margin",
                    finite(velocityLoop ? a.velocityGainMargin() : a.positionGainMargin()));
            case BANDWIDTH -> new Verification("axis", a.axisId(), a.axisName(), "", loop + "bandwidth",
                    velocityLoop ? a.dynamics().velocityBandwidthHz() : a.dynamics().positionBandwidthHz());
            case SETTLING_TIME -> new Verification("axis", a.axisId(), a.axisName(), "",
                    "position-loop 2 % settling time", a.dynamics().positionLoop().step()
                            .map(s -> s.metrics().settlingTimeSeconds()).orElse(OptionalDouble.empty()));
            default -> new Verification("axis", a.axisId(), a.axisName(), "", "position gain Kv",
                    OptionalDouble.of(a.positionGain()));
        };
    }

    private static OptionalDouble finite(double v) {
        return Double.isFinite(v) ? OptionalDouble.of(v) : OptionalDouble.empty();
    }

    private static List<Contour> contoursOf(Requirement r) {
        return List.copyOf(r.getContours());
    }

    /** The requirement's contours, else those of its nearest ancestor that names some (studies use the same rule). */
    private static List<Contour> inheritedContours(Requirement r) {
        return org.tracewell.core.variation.StudyMetrics.inheritedContours(r);
    }

    static String siUnit(RequirementKind kind) {
        return switch (kind) {
            case CONTOUR_DEVIATION, FOLLOWING_ERROR, STEADY_STATE_ERROR -> "m";
            case PHASE_MARGIN -> "rad";
            case GAIN_MARGIN -> "1";
            case BANDWIDTH -> "Hz";
            case SETTLING_TIME -> "s";
            case POSITION_GAIN -> "1/s";
        };
    }

    private static String metricLabel(ContourMetric metric) {
        return switch (metric) {
            case CIRCULAR_DEVIATION -> "circular deviation G";
            case RADIAL_DEVIATION -> "radial deviation F";
            case MAX_NORMAL_DEVIATION -> "max contour error";
        };
    }

    // ------------------------------------------------------------------------------------------------ trace

    static List<CoverageFinding> coverage(Machine machine, List<RequirementResult> results) {
        List<CoverageFinding> findings = new ArrayList<>();
        for (RequirementResult r : results) {
            if (r.machineLevel() && r.childIds().isEmpty()) {
                findings.add(new CoverageFinding(CoverageFinding.Kind.MACHINE_REQUIREMENT_WITHOUT_ALLOCATION, r.id(),
                        "machine requirement " + r.id() + " has no derived requirement; allocate it to axes or"
                                + " error sources"));
            }
            if (!r.machineLevel() && r.verifiedBy().isEmpty()) {
                findings.add(new CoverageFinding(CoverageFinding.Kind.ALLOCATION_WITHOUT_VERIFICATION, r.id(),
                        "requirement " + r.id() + " is not verified by any computed result: "
                                + r.notEvaluatedReason().orElse("no result")));
            }
            Requirement model = machine.getRequirements().stream().filter(m -> m.getId().equals(r.id()))
                    .findFirst().orElseThrow();
            if (model.getParent() != null && !machine.getRequirements().contains(model.getParent())) {
                findings.add(new CoverageFinding(CoverageFinding.Kind.ORPHAN, r.id(), "requirement " + r.id()
                        + " is derived from " + model.getParent().getId() + ", which is not in this machine"));
            }
        }
        return findings;
    }

    // ------------------------------------------------------------------------------------------------ allocation

    /**
     * Apportions the limit among the axes of the budget lines (one item per axis, machine-wide lines as one
     * "machine" item), weighted by each item's present portion of the total (so the current design's shares are
     * kept), with the budget's reserve.
     */
    static RequirementApportionment apportion(Requirement r, org.tracewell.core.analysis.RequirementBudget budget,
            Machine machine) {
        java.util.Map<String, double[]> byItem = new java.util.LinkedHashMap<>();
        java.util.Map<String, ErrorClass> classes = new java.util.LinkedHashMap<>();
        for (LineContribution c : budget.evaluation().contributions()) {
            String item = c.line().axis() == null ? "machine" : c.line().axis();
            byItem.computeIfAbsent(item, k -> new double[1])[0] += c.portion();
            classes.merge(item, c.line().errorClass(), (p, q) -> p == ErrorClass.SYSTEMATIC ? p : q);
        }
        List<AllocationItem> items = new ArrayList<>();
        for (var e : byItem.entrySet()) {
            items.add(new AllocationItem(e.getKey(), Math.max(e.getValue()[0], 0), classes.get(e.getKey())));
        }
        BudgetTarget target = new BudgetTarget(r.getLimit(), MachineBudget.RESERVE_FRACTION);
        boolean anyWeight = items.stream().anyMatch(i -> i.weight() > 0);
        Apportionment apportionment = anyWeight ? Apportionment.apportion(target, budget.budget().method(), items)
                : Apportionment.apportionEqually(target, budget.budget().method(),
                        items.stream().map(AllocationItem::name).toList(), ErrorClass.SYSTEMATIC);
        List<RequirementApportionment.ApportionedItem> out = new ArrayList<>();
        for (var e : byItem.entrySet()) {
            double allocated = apportionment.allocationFor(e.getKey()).allocated();
            String axisId = machine.getAxes().stream().filter(a -> e.getKey().equals(a.getName())).map(Axis::getId)
                    .findFirst().orElse("");
            out.add(new RequirementApportionment.ApportionedItem(e.getKey(), axisId, allocated, e.getValue()[0],
                    e.getValue()[0] <= allocated * (1 + 1e-9)));
        }
        String basis = "weights = each axis's present portion of the " + budget.budget().method().displayName()
                + " total, " + Math.round(MachineBudget.RESERVE_FRACTION * 100) + " % reserve held back";
        return new RequirementApportionment(r.getId(), basis, apportionment, out);
    }

    /**
     * Inverse-design limits from a machine contour requirement on each of its contours' axis pairs. With an error
     * budget, the servo figure may use only the headroom the other contributors and the reserve leave: the
     * largest value of the budget's computed Kv-mismatch line that keeps the total within the limit less the
     * reserve, plus the Kv-independent servo-lag part it replaces. Without a budget the whole limit less the
     * reserve is allowed.
     */
    static List<DerivedRequirement> inverseDesign(Requirement r, MachineAnalysis analysis,
            Optional<org.tracewell.core.analysis.RequirementBudget> budget) {
        List<DerivedRequirement> out = new ArrayList<>();
        if (r.getParent() != null || r.getKind() != RequirementKind.CONTOUR_DEVIATION || !(r.getLimit() > 0)) {
            return out;
        }
        double allowedTotal = r.getLimit() * (1 - MachineBudget.RESERVE_FRACTION);
        double allowed = allowedTotal;
        String basis = r.getId() + " less the reserve";
        Optional<org.tracewell.engine.budget.ErrorBudget> lines = budget.map(b -> b.budget());
        String mismatchLine = MachineBudgets.computedLineId(r.getId(), "mismatch");
        if (lines.isPresent() && lines.get().lines().stream().anyMatch(l -> l.id().equals(mismatchLine))) {
            allowed = InverseDesign.headroomForLine(lines.get(), mismatchLine, allowedTotal);
            basis = "the headroom " + r.getId() + "'s budget leaves after its other contributors and the reserve";
        }
        java.util.Set<String> seen = new java.util.HashSet<>();
        for (Contour c : r.getContours()) {
            Optional<ContourResult> cr = analysis.contour(c.getId());
            if (cr.isEmpty()) {
                continue;
            }
            ContourResult result = cr.get();
            String pair = result.firstAxisName() + "/" + result.secondAxisName();
            if (!seen.add(pair)) {
                continue;
            }
            double kx = result.estimate().firstAxisKv();
            double ky = result.estimate().secondAxisKv();
            double present = Math.abs(1 / kx - 1 / ky);
            DesignLimit mismatch = result.fullCircle()
                    ? InverseDesign.maxGainMismatchForCircularDeviation(allowed, result.feed())
                    : InverseDesign.maxGainMismatchForLine(allowed, result.feed(), Math.PI / 4);
            out.add(new DerivedRequirement(r.getId() + ":derived:" + pair + "-mismatch", r.getId(), "", pair,
                    "|1/Kx − 1/Ky| of " + pair + " at most " + TradeUnits.format(mismatch.value() * 1e3, 3)
                            + " ms, from " + basis, mismatch, OptionalDouble.of(present),
                    mismatch.isSatisfiedBy(present)));
            if (result.fullCircle() && r.getMetric() == ContourMetric.RADIAL_DEVIATION) {
                String servoLine = MachineBudgets.computedLineId(r.getId(), "servo-lag");
                double allowedLoss = lines.isPresent()
                        && lines.get().lines().stream().anyMatch(l -> l.id().equals(servoLine))
                                ? InverseDesign.headroomForLine(lines.get(), servoLine, allowedTotal)
                                : allowedTotal;
                DesignLimit kvMin = InverseDesign.minPositionGainForRadiusLoss(result.radius(), result.feed(),
                        allowedLoss);
                double kv = Math.min(kx, ky);
                out.add(new DerivedRequirement(r.getId() + ":derived:" + pair + "-kv-min", r.getId(), "", pair,
                        "Kv of " + pair + " at least " + TradeUnits.format(TradeUnits.kvToMPerMinPerMm(kvMin.value()), 3)
                                + " (m/min)/mm for the radius loss allowed by " + r.getId(), kvMin,
                        OptionalDouble.of(kv), kvMin.isSatisfiedBy(kv)));
            }
        }
        return out;
    }

    // ------------------------------------------------------------------------------------------------ matrix

    static ComplianceMatrix matrix(Machine machine, List<RequirementResult> results) {
        List<Axis> axes = new ArrayList<>(machine.getAxes());
        axes.addAll(machine.getLibraryAxes());
        List<RequirementResult> rows = results.stream().filter(RequirementResult::machineLevel).toList();
        List<List<ComplianceMatrix.Cell>> cells = new ArrayList<>();
        for (RequirementResult row : rows) {
            List<RequirementResult> below = descendants(row, results);
            List<ComplianceMatrix.Cell> line = new ArrayList<>();
            for (Axis axis : axes) {
                List<RequirementResult> here = below.stream()
                        .filter(d -> d.allocatedAxisId().map(axis.getId()::equals).orElse(false)).toList();
                RequirementStatus status = here.isEmpty() ? null
                        : here.stream().map(RequirementResult::status).reduce(RequirementStatus.MET,
                                RequirementStatus::worse);
                line.add(new ComplianceMatrix.Cell(here.stream().map(RequirementResult::id).toList(), status));
            }
            cells.add(line);
        }
        return new ComplianceMatrix(rows.stream().map(RequirementResult::id).toList(),
                rows.stream().map(RequirementResult::status).toList(), axes.stream().map(Axis::getId).toList(),
                axes.stream().map(Axis::getName).toList(), cells);
    }

    private static List<RequirementResult> descendants(RequirementResult root, List<RequirementResult> all) {
        List<RequirementResult> out = new ArrayList<>();
        for (String child : root.childIds()) {
            all.stream().filter(r -> r.id().equals(child)).findFirst().ifPresent(c -> {
                out.add(c);
                out.addAll(descendants(c, all));
            });
        }
        return out;
    }

    private static String nz(String s) {
        return s == null ? "" : s;
    }
}
