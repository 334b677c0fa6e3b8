package org.tracewell.report;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

import org.tracewell.core.analysis.AxisResult;
import org.tracewell.core.analysis.CancellationFlag;
import org.tracewell.core.analysis.ContourResult;
import org.tracewell.core.analysis.MachineAnalysis;
import org.tracewell.core.analysis.MachineAnalyzer;
import org.tracewell.core.analysis.MachineBudget;
import org.tracewell.core.analysis.MachineBudgets;
import org.tracewell.core.analysis.ProgressListener;
import org.tracewell.core.io.ModelFiles;
import org.tracewell.core.mapping.EngineMapping;
import org.tracewell.core.mapping.MachineInputs;
import org.tracewell.model.Machine;
import org.tracewell.requirements.ComplianceMatrix;
import org.tracewell.requirements.CoverageFinding;
import org.tracewell.requirements.RequirementReport;
import org.tracewell.requirements.RequirementResult;
import org.tracewell.requirements.RequirementStatus;
import org.tracewell.requirements.ReviewProvenance;
import org.tracewell.requirements.ReviewResults;
import org.tracewell.requirements.Verification;

/**
 * The LM-3020 example analysed by the real pipeline (loops, contours, circle tests, budget), with a small
 * requirement report built here by hand from those results, so the report is exercised on real data without
 * depending on the requirement evaluator.
 */
final class ReportFixtures {

    static final Instant ANALYSED_AT = Instant.parse("2026-03-14T09:30:00Z");
    static final String HOSTILE = "<script>alert('x')</script> & \"quoted\"";

    /** One analysis for the whole test run: it is a pure function of the example file. */
    private static Loaded cached;

    record Loaded(Machine machine, MachineInputs inputs, MachineAnalysis analysis, MachineBudget budget) {
    }

    private ReportFixtures() {
    }

    static synchronized Loaded lm3020() throws Exception {
        if (cached == null) {
            Machine machine = new ModelFiles().loadMachine(examples().resolve("LM-3020.machine"));
            MachineInputs inputs = EngineMapping.map(machine);
            MachineAnalysis analysis = MachineAnalyzer.analyze(inputs, ProgressListener.SILENT, CancellationFlag.create());
            MachineBudget budget = MachineBudgets.build(machine, analysis);
            cached = new Loaded(machine, inputs, analysis, budget);
        }
        return cached;
    }

    static Path examples() {
        for (Path dir = Path.of("").toAbsolutePath(); dir != null; dir = dir.getParent()) {
            for (Path candidate : List.of(dir.resolve("examples"), dir.resolve("main/examples"))) {
                if (Files.isRegularFile(candidate.resolve("LM-3020.machine"))) {
                    return candidate;
                }
            }
        }
        Path fallback = Path.of("/work/main/examples");
        if (Files.isRegularFile(fallback.resolve("LM-3020.machine"))) {
            return fallback;
        }
        throw new IllegalStateException("examples/LM-3020.machine not found above " + Path.of("").toAbsolutePath());
    }

    /** The review of the LM-3020 with the requirement results built from its analysis. */
    static ReviewResults review(Loaded l) {
        return new ReviewResults(l.analysis(), l.budget(), requirements(l.analysis()), provenance());
    }

    /** The same review with a hostile machine name, to check escaping. */
    static ReviewResults hostileReview(Loaded l) {
        MachineAnalysis a = l.analysis();
        MachineAnalysis renamed = new MachineAnalysis(a.machineId(), HOSTILE + " LM-3020", a.interpolationPeriod(),
                a.axes(), a.contours(), List.of(HOSTILE + " note"));
        return new ReviewResults(renamed, l.budget(), requirements(renamed), provenance());
    }

    static ReviewProvenance provenance() {
        return new ReviewProvenance("0.1.0-test", "LM-3020.machine",
                "0f1e2d3c4b5a69788796a5b4c3d2e1f00f1e2d3c4b5a69788796a5b4c3d2e1f0", ANALYSED_AT, List.of(),
                List.of("reserve 10 % of every limit", "coverage factor k = 2"));
    }

    /**
     * r1 (G over both circle runs, machine level) with two Kv allocations, r2 (max contour error on the line),
     * and one requirement whose text is hostile markup.
     */
    static RequirementReport requirements(MachineAnalysis analysis) {
        double g = 0;
        List<Verification> gVerified = new ArrayList<>();
        for (ContourResult c : analysis.contours()) {
            if (c.fullCircle()) {
                for (var run : c.runs()) {
                    double runG = run.metrics().circularDeviationG().orElse(0);
                    g = Math.max(g, runG);
                    gVerified.add(new Verification("contour", c.contourId(), c.contourName(), run.direction().label(),
                            "circular deviation G", OptionalDouble.of(runG)));
                }
            }
        }
        ContourResult line = analysis.contours().stream().filter(c -> !c.fullCircle()).findFirst().orElseThrow();
        double lineError = line.worstMaxContourError();
        AxisResult x = analysis.axes().get(0);
        AxisResult y = analysis.axes().stream().filter(a -> a.axisName().equals("Y")).findFirst()
                .orElse(analysis.axes().get(1));

        List<RequirementResult> results = new ArrayList<>();
        results.add(length("lm3020-r1", "Circular deviation G at most 25 µm at F = 3 m/min, R = 100 mm.",
                "contourDeviation", "circularDeviation", 25e-6, g, Optional.empty(),
                List.of("lm3020-r1-x1-kv", "lm3020-r1-y-kv"), gVerified, "Panel customers inspect pockets.", true));
        results.add(kv("lm3020-r1-x1-kv", x, "lm3020-r1"));
        results.add(kv("lm3020-r1-y-kv", y, "lm3020-r1"));
        results.add(length("lm3020-r2", "Max contour error at most 40 µm on a 45° line at 10 m/min.",
                "contourDeviation", "maxNormalDeviation", 40e-6, lineError, Optional.empty(), List.of(),
                List.of(new Verification("contour", line.contourId(), line.contourName(), "programmed",
                        "max contour error", OptionalDouble.of(lineError))), "Straight edges.", true));
        results.add(new RequirementResult("lm3020-r9", HOSTILE + " statement", "settlingTime", "", "atMost", 0.05, "s",
                "ms", OptionalDouble.empty(), OptionalDouble.empty(), OptionalDouble.empty(),
                RequirementStatus.NOT_EVALUATED, Optional.of("no verification " + HOSTILE), Optional.empty(), List.of(),
                Optional.empty(), Optional.empty(), List.of(), HOSTILE + " rationale", true));

        List<String> axisIds = analysis.axes().stream().map(AxisResult::axisId).toList();
        List<String> axisNames = analysis.axes().stream().map(AxisResult::axisName).toList();
        List<List<ComplianceMatrix.Cell>> cells = new ArrayList<>();
        List<String> rows = List.of("lm3020-r1", "lm3020-r2", "lm3020-r9");
        List<RequirementStatus> rowStatus = new ArrayList<>();
        for (String row : rows) {
            RequirementResult r = results.stream().filter(q -> q.id().equals(row)).findFirst().orElseThrow();
            rowStatus.add(r.status());
            List<ComplianceMatrix.Cell> line2 = new ArrayList<>();
            for (String axisId : axisIds) {
                List<String> ids = results.stream().filter(q -> q.parentId().equals(Optional.of(row))
                        && q.allocatedAxisId().equals(Optional.of(axisId))).map(RequirementResult::id).toList();
                RequirementStatus worst = results.stream().filter(q -> ids.contains(q.id()))
                        .map(RequirementResult::status).reduce(RequirementStatus::worse).orElse(null);
                line2.add(new ComplianceMatrix.Cell(ids, worst));
            }
            cells.add(line2);
        }
        ComplianceMatrix matrix = new ComplianceMatrix(rows, rowStatus, axisIds, axisNames, cells);
        List<CoverageFinding> coverage = List.of(new CoverageFinding(CoverageFinding.Kind.ALLOCATION_WITHOUT_VERIFICATION,
                "lm3020-r9", "nothing computes " + HOSTILE));
        return new RequirementReport(analysis.machineId(), results, coverage, List.of(), List.of(), matrix);
    }

    private static RequirementResult length(String id, String statement, String kind, String metric, double limit,
            double value, Optional<String> parent, List<String> children, List<Verification> verified, String rationale,
            boolean machineLevel) {
        RequirementStatus status = value <= limit ? RequirementStatus.MET : RequirementStatus.VIOLATED;
        return new RequirementResult(id, statement, kind, metric, "atMost", limit, "m", "µm", OptionalDouble.of(value),
                OptionalDouble.of(limit - value), OptionalDouble.of(100 * (limit - value) / limit), status,
                Optional.empty(), parent, children, Optional.empty(), Optional.empty(), verified, rationale,
                machineLevel);
    }

    private static RequirementResult kv(String id, AxisResult axis, String parent) {
        double limit = 40.0; // 2.4 (m/min)/mm in 1/s, as the example states it
        double value = axis.positionGain();
        RequirementStatus status = value >= limit ? RequirementStatus.MET : RequirementStatus.VIOLATED;
        return new RequirementResult(id, axis.axisName() + " position gain at least 2.4 (m/min)/mm.", "positionGain",
                "", "atLeast", limit, "1/s", "(m/min)/mm", OptionalDouble.of(value), OptionalDouble.of(value - limit),
                OptionalDouble.of(100 * (value - limit) / limit), status, Optional.empty(), Optional.of(parent),
                List.of(), Optional.of(axis.axisId()), Optional.of(axis.axisName()),
                List.of(new Verification("axis", axis.axisId(), axis.axisName(), "", "position gain Kv",
                        OptionalDouble.of(value))), "Matched gains keep the circle round.", false);
    }
}
