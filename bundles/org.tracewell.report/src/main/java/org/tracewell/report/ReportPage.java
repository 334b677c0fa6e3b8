package org.tracewell.report;

import java.io.IOException;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Collectors;

import org.jfree.chart.JFreeChart;
import org.tracewell.charts.Magnification;
import org.tracewell.core.SafetyCaution;
import org.tracewell.core.analysis.AxisResult;
import org.tracewell.core.analysis.ContourEstimate;
import org.tracewell.core.analysis.EstimateCheck;
import org.tracewell.core.analysis.ContourResult;
import org.tracewell.core.analysis.ContourRun;
import org.tracewell.core.analysis.ContourRunMetrics;
import org.tracewell.core.analysis.FeedFollowingError;
import org.tracewell.core.analysis.MachineAnalysis;
import org.tracewell.core.analysis.MachineBudget;
import org.tracewell.core.analysis.RequirementBudget;
import org.tracewell.core.analysis.SupersededLine;
import org.tracewell.core.mapping.MachineInputs;
import org.tracewell.core.mapping.MappedAxis;
import org.tracewell.engine.axis.AxisDynamics;
import org.tracewell.engine.axis.CascadeController;
import org.tracewell.engine.axis.FilterStage;
import org.tracewell.engine.axis.PositionSensor;
import org.tracewell.engine.budget.BudgetEvaluation;
import org.tracewell.engine.budget.CombinationMethod;
import org.tracewell.engine.budget.LineContribution;
import org.tracewell.engine.budget.TargetComparison;
import org.tracewell.engine.contour.BidirectionalCircleResult;
import org.tracewell.engine.contour.CircleTestResult;
import org.tracewell.engine.contour.CircleTestSetup;
import org.tracewell.engine.loop.LoopAnalysis;
import org.tracewell.engine.loop.Margins;
import org.tracewell.engine.loop.StepResponse;
import org.tracewell.engine.loop.SteadyStateErrors;
import org.tracewell.requirements.ComplianceMatrix;
import org.tracewell.requirements.CoverageFinding;
import org.tracewell.requirements.DerivedRequirement;
import org.tracewell.requirements.RequirementApportionment;
import org.tracewell.requirements.RequirementReport;
import org.tracewell.requirements.RequirementResult;
import org.tracewell.requirements.RequirementStatus;
import org.tracewell.requirements.ReviewProvenance;
import org.tracewell.requirements.ReviewResults;
import org.tracewell.report.Page.Cell;

/** Lays out the design-review page section by section; charts go through a {@link ChartSink}. */
final class ReportPage {

    /** Where a chart image goes; returns the {@code src} to write into the page. */
    interface ChartSink {
        String add(String slug, JFreeChart chart, int widthPx, int heightPx) throws IOException;
    }

    static final String[][] SECTIONS = {
        {"summary", "Summary and verdict"},
        {"machine", "Machine and axes"},
        {"loops", "Loop analysis"},
        {"tracking", "Tracking and contour deviation"},
        {"circles", "Circle tests"},
        {"budget", "Error budget"},
        {"trace", "Requirement trace"},
        {"assumptions", "Assumptions and settings"},
        {"caution", "Safety caution"},
    };

    /** The studies section, after the budget, present only when the model asks for studies. */
    static final String[] STUDIES_SECTION = {"studies", "Tolerance studies"};

    /** Tallest budget chart; very long budgets get thinner bars rather than a page-long image. */
    static final int MAX_BUDGET_HEIGHT_PX = 1400;

    private static final DateTimeFormatter DATE = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm:ss 'UTC'")
            .withZone(ZoneOffset.UTC);

    private final ReportInput input;
    private final ReviewResults review;
    private final MachineAnalysis analysis;
    private final RequirementReport requirements;
    private final ChartSink charts;
    private final Page page = new Page();

    ReportPage(ReportInput input, ChartSink charts) {
        this.input = input;
        this.review = input.review();
        this.analysis = review.analysis();
        this.requirements = review.requirements();
        this.charts = charts;
    }

    String render() throws IOException {
        page.documentStart("Design review: " + analysis.machineName(), ReportStyle.CSS);
        header();
        summary();
        machine();
        loops();
        tracking();
        circles();
        budget();
        if (!input.studies().isEmpty()) {
            new StudySection(page, this::figure).render(input.studies());
        }
        trace();
        assumptions();
        closingCaution();
        page.open("footer").text("Written by Tracewell " + review.provenance().toolVersion()
                + " from " + review.provenance().inputFile() + ". Figures are model results, not measurements.")
                .close("footer");
        page.documentEnd();
        return page.toString();
    }

    /** A page with the trace alone: requirement tree, compliance matrix, apportionment, suggestions. */
    String renderTraceMatrix() {
        ReviewProvenance p = review.provenance();
        page.documentStart("Requirement trace: " + analysis.machineName(), ReportStyle.CSS);
        page.open("header");
        page.element("h1", "Requirement trace: " + analysis.machineName());
        page.element("p", "subtitle", "Machine " + analysis.machineId() + " · input " + p.inputFile()
                + " · analysed " + DATE.format(p.analysedAt()) + " · Tracewell " + p.toolVersion());
        caution();
        page.close("header");
        trace();
        page.open("footer").text("Written by Tracewell " + p.toolVersion() + " from " + p.inputFile()
                + ". Figures are model results, not measurements.").close("footer");
        page.documentEnd();
        return page.toString();
    }

    // ---------------------------------------------------------------- header and summary

    private void header() {
        ReviewProvenance p = review.provenance();
        page.open("header");
        page.element("h1", "Design review: " + analysis.machineName());
        page.element("p", "subtitle", "Machine " + analysis.machineId() + " · input " + p.inputFile()
                + " · analysed " + DATE.format(p.analysedAt()) + " · Tracewell " + p.toolVersion()
                + (input.author().isEmpty() ? "" : " · prepared by " + input.author()));
        caution();
        page.open("nav", "contents").element("strong", "Contents").open("ol");
        for (String[] s : SECTIONS) {
            page.open("li").anchorLink(s[0], s[1]).close("li");
            if (s[0].equals("budget") && !input.studies().isEmpty()) {
                page.open("li").anchorLink(STUDIES_SECTION[0], STUDIES_SECTION[1]).close("li");
            }
        }
        page.close("ol").close("nav");
        page.close("header");
    }

    private void caution() {
        page.open("div", "caution").element("strong", "Safety caution").text(SafetyCaution.TEXT).close("div");
    }

    private void summary() {
        page.open("section", null, "summary-section");
        page.open("h2", "first", "summary").text("Summary and verdict").close("h2");
        List<RequirementResult> results = requirements.results();
        long violated = count(results, RequirementStatus.VIOLATED);
        long open = count(results, RequirementStatus.NOT_EVALUATED);
        long met = count(results, RequirementStatus.MET);
        RequirementStatus overall = results.isEmpty() ? RequirementStatus.NOT_EVALUATED : requirements.overallStatus();
        page.open("p", "verdict " + statusKey(overall)).status(statusKey(overall), overall.label()).text(" ")
                .text(verdict(results.size(), met, violated, open)).close("p");
        page.facts(List.of(
                new String[] {"Requirements", results.size() + " (" + met + " met, " + violated + " violated, " + open
                        + " not evaluated)"},
                new String[] {"Axes", Integer.toString(analysis.axes().size())},
                new String[] {"Contours analysed", Integer.toString(analysis.contours().size())},
                new String[] {"Error budgets", budgetCounts()}));
        requirementTable("Requirement summary", results);
        if (!requirements.coverage().isEmpty()) {
            page.element("h4", "Trace coverage findings");
            List<String> findings = requirements.coverage().stream()
                    .sorted(Comparator.comparing((CoverageFinding f) -> f.requirementId()).thenComparing(f -> f.kind()))
                    .map(f -> f.requirementId() + " — " + coverageLabel(f.kind()) + ": " + f.message()).toList();
            page.list("notes", findings);
        }
        page.close("section");
    }

    /** "2 (1 met, 1 violated)": budgets are shown beside the requirement verdict, not folded into it. */
    private String budgetCounts() {
        List<RequirementBudget> budgets = review.budget().requirements();
        if (budgets.isEmpty()) {
            return "none";
        }
        java.util.Map<String, Long> byStatus = new java.util.TreeMap<>();
        for (RequirementBudget b : budgets) {
            byStatus.merge(b.evaluation().status().displayName(), 1L, Long::sum);
        }
        return budgets.size() + " (" + byStatus.entrySet().stream().map(e -> e.getValue() + " " + e.getKey())
                .collect(Collectors.joining(", ")) + ")";
    }

    static String verdict(int total, long met, long violated, long open) {
        if (total == 0) {
            return "The model states no requirements: nothing was verified.";
        }
        if (violated > 0) {
            return violated + " of " + total + " requirements violated" + (open > 0 ? ", " + open + " not evaluated." : ".");
        }
        if (open > 0) {
            return "No requirement violated; " + open + " of " + total + " not evaluated.";
        }
        return "All " + total + " requirements met.";
    }

    private void requirementTable(String caption, List<RequirementResult> results) {
        Page.Table t = page.table("requirements", caption, "Requirement", "Statement", "Kind", "Allocated to", "Value",
                "Limit", "Margin", "Margin %", "Status");
        for (RequirementResult r : results) {
            String unit = unitOf(r);
            t.row(Cell.text(r.id()), Cell.text(r.statement()), Cell.text(kindOf(r)),
                    Cell.text(r.allocatedAxisName().orElse(r.machineLevel() ? "machine" : "—")),
                    Cell.number(withUnit(Fmt.num(r.displayValue()), unit)),
                    Cell.number(("atLeast".equals(r.bound()) ? "≥ " : "≤ ") + withUnit(Fmt.num(r.displayLimit()), unit)),
                    Cell.number(withUnit(Fmt.num(r.displayMargin()), unit)),
                    Cell.number(r.marginPercent().isPresent() ? Fmt.num(r.marginPercent().getAsDouble()) + " %" : "—"),
                    statusCell(r));
        }
        if (t.rowCount() == 0) {
            page.element("p", "muted", "No requirements.");
        } else {
            t.end();
        }
    }

    private static Cell statusCell(RequirementResult r) {
        return Cell.status(statusKey(r.status()), r.status().label(), r.notEvaluatedReason().orElse(null));
    }

    // ---------------------------------------------------------------- machine and axes

    private void machine() {
        page.open("section");
        page.heading(2, "machine", "Machine and axes");
        List<String[]> facts = new ArrayList<>();
        facts.add(new String[] {"Machine", analysis.machineName()});
        facts.add(new String[] {"Model id", analysis.machineId()});
        if (!input.machineDescription().isBlank()) {
            facts.add(new String[] {"Description", input.machineDescription()});
        }
        facts.add(new String[] {"Interpolation period", Fmt.ms(analysis.interpolationPeriod()) + " ms"});
        facts.add(new String[] {"Axes", analysis.axes().stream().map(AxisResult::axisName)
                .collect(Collectors.joining(", "))});
        facts.add(new String[] {"Contours", analysis.contours().stream().map(ContourResult::contourName)
                .collect(Collectors.joining(", "))});
        page.facts(facts);

        Optional<MachineInputs> inputs = input.inputs();
        if (inputs.isPresent()) {
            Page.Table t = page.table("axes", "Axes in trade units", "Axis", "Kind", "Plant", "Kv ((m/min)/mm)",
                    "Kv (1/s)", "Velocity PI", "Filters", "Feedforward", "Sample periods", "Encoder", "Limits",
                    "Gantry partner");
            for (AxisResult a : analysis.axes()) {
                Optional<MappedAxis> mapped = inputs.get().axis(a.axisId());
                if (mapped.isEmpty()) {
                    t.row(Cell.text(a.axisName()), Cell.text(kind(a)), Cell.text("not in the machine inputs"),
                            Cell.number(Fmt.kvTrade(a.positionGain())), Cell.number(Fmt.num(a.positionGain())),
                            Cell.text("—"), Cell.text("—"), Cell.text("—"), Cell.text("—"),
                            Cell.text(encoder(a, null)), Cell.text(velocity(a, a.maxVelocity())),
                            Cell.text(partner(a)));
                    continue;
                }
                MappedAxis m = mapped.get();
                CascadeController c = m.model().controller();
                t.row(Cell.text(a.axisName()), Cell.text(kind(a)), Cell.text(AxisText.plant(m.model().plant())),
                        Cell.number(Fmt.kvTrade(c.positionGain())), Cell.number(Fmt.num(c.positionGain())),
                        Cell.text(AxisText.velocityPi(c, m.model().plant())), Cell.text(filters(c.filters())),
                        Cell.text("velocity " + Fmt.percent(c.velocityFeedforward()) + ", acceleration "
                                + Fmt.percent(c.accelerationFeedforward())),
                        Cell.text("position " + Fmt.ms(c.positionSamplePeriod()) + " ms, velocity "
                                + Fmt.ms(c.velocitySamplePeriod()) + " ms"),
                        Cell.text(encoder(a, m.model().sensor())),
                        Cell.text(velocity(a, m.limits().velocity()) + "; " + AxisText.acceleration(a.rotary(),
                                m.limits().acceleration(), m.limits().jerk())),
                        Cell.text(partner(a)));
            }
            t.end();
        } else {
            page.element("p", "muted", "Plant and controller parameters were not supplied to the report; the table "
                    + "shows what the analysis carries.");
            Page.Table t = page.table("axes", "Axes in trade units", "Axis", "Kind", "Kv ((m/min)/mm)", "Kv (1/s)",
                    "Velocity limit", "Encoder", "Gantry partner");
            for (AxisResult a : analysis.axes()) {
                t.row(Cell.text(a.axisName()), Cell.text(kind(a)), Cell.number(Fmt.kvTrade(a.positionGain())),
                        Cell.number(Fmt.num(a.positionGain())), Cell.text(velocity(a, a.maxVelocity())),
                        Cell.text(encoder(a, null)), Cell.text(partner(a)));
            }
            t.end();
        }
        List<String> notes = new ArrayList<>();
        for (AxisResult a : analysis.axes()) {
            notes.addAll(prefixed(a.axisName(), a.notes()));
        }
        notesList("h4", "Mapping notes", notes);
        page.close("section");
    }

    private static String kind(AxisResult a) {
        return a.rotary() ? "rotary" : "linear";
    }

    private String partner(AxisResult a) {
        return a.gantryPartnerId().map(id -> analysis.axis(id).map(AxisResult::axisName).orElse(id)).orElse("—");
    }

    private static String encoder(AxisResult a, PositionSensor sensor) {
        String step = a.positionResolution() > 0
                ? (a.rotary() ? Fmt.num(Math.toDegrees(a.positionResolution()) * 3600) + " arcsec"
                        : Fmt.num(org.tracewell.engine.units.TradeUnits.micrometres(a.positionResolution())) + " µm")
                        + " at the load"
                : "resolution not given";
        if (sensor == null) {
            return step;
        }
        return (sensor == PositionSensor.LOAD ? "load-side scale, " : "motor encoder, ") + step;
    }

    private static String velocity(AxisResult a, double v) {
        return a.rotary() ? Fmt.num(v * 60 / (2 * Math.PI)) + " rpm" : Fmt.mPerMin(v) + " m/min";
    }

    private static String filters(List<FilterStage> stages) {
        if (stages.isEmpty()) {
            return "none";
        }
        return stages.stream().map(AxisText::filter).collect(Collectors.joining("; "));
    }

    // ---------------------------------------------------------------- loops

    private void loops() throws IOException {
        page.open("section");
        page.heading(2, "loops", "Loop analysis");
        Page.Table t = page.table("loops", "Both loops of every axis (margins with the dead time exact)", "Axis",
                "Type (position loop / with feedforward)", "Kv (1/s)", "Position loop PM", "Position loop GM",
                "Velocity loop PM", "Velocity loop GM", "Bandwidth velocity / position (Hz)", "First mode",
                "Stable");
        for (AxisResult a : analysis.axes()) {
            AxisDynamics d = a.dynamics();
            t.row(Cell.text(a.axisName()), Cell.text(d.positionLoopType() + " / " + d.effectiveType()),
                    Cell.number(Fmt.num(a.positionGain())), Cell.number(phaseMargin(d.positionLoopMargins())),
                    Cell.number(gainMargin(d.positionLoopMargins())), Cell.number(phaseMargin(d.velocityLoopMargins())),
                    Cell.number(gainMargin(d.velocityLoopMargins())),
                    Cell.number(Fmt.num(d.velocityBandwidthHz()) + " / " + Fmt.num(d.positionBandwidthHz())),
                    Cell.text(d.resonance().map(r -> Fmt.num(r.resonanceHz()) + " Hz (anti-resonance "
                            + Fmt.num(r.antiResonanceHz()) + " Hz" + (d.velocityOpenLoopGainAtResonanceDb().isPresent()
                                    ? ", |L_v| " + Fmt.num(d.velocityOpenLoopGainAtResonanceDb().getAsDouble()) + " dB"
                                    : "") + ")").orElse("rigid drive")),
                    Cell.status(d.stable() ? "met" : "violated", d.stable() ? "stable" : "unstable"));
        }
        t.end();

        Page.Table fe = page.table("following", "Steady following error (with / without feedforward)", "Axis",
                "At", "Velocity", "With feedforward", "Without feedforward");
        for (AxisResult a : analysis.axes()) {
            feRow(fe, a, "maximum velocity", a.atMaxVelocity());
            for (FeedFollowingError f : a.atContourFeeds()) {
                feRow(fe, a, "contour " + f.contourName(), f);
            }
        }
        fe.end();

        for (AxisResult a : analysis.axes()) {
            AxisDynamics d = a.dynamics();
            page.heading(3, Html.fragmentId("axis", a.axisId()), "Axis " + a.axisName());
            page.open("div", "charts");
            Optional<MappedAxis> mapped = input.inputs().flatMap(i -> i.axis(a.axisId()));
            String basis = mapped.isPresent() ? "dead time exact" : "dead time as Padé approximant of order "
                    + d.positionLoop().padeOrder();
            figure("bode-position-" + a.axisId(), ReportCharts.bode("Axis " + a.axisName() + ": position loop L_p(jω)",
                    "L_p", mapped.isPresent() ? mapped.get().model().positionOpenLoop() : d.positionLoop().loop(),
                    d.positionLoopMargins()), 900, 560,
                    "Open position loop of axis " + a.axisName() + " (" + basis + "), margins marked.");
            figure("bode-velocity-" + a.axisId(), ReportCharts.bode("Axis " + a.axisName() + ": velocity loop L_v(jω)",
                    "L_v", mapped.isPresent() ? mapped.get().model().velocityOpenLoop() : d.velocityLoop().loop(),
                    d.velocityLoopMargins()), 900, 560,
                    "Open velocity loop of axis " + a.axisName() + " (" + basis + "), margins marked.");
            Optional<JFreeChart> step = ReportCharts.step("Axis " + a.axisName() + ": position step response",
                    d.positionLoop());
            if (step.isPresent()) {
                figure("step-" + a.axisId(), step.get(), 900, 380, "Unit-step response of the closed position loop of "
                        + a.axisName() + stepFigures(d.positionLoop()) + ".");
            } else {
                page.element("p", "muted", "No step response: the position loop of " + a.axisName() + " is not stable.");
            }
            page.close("div");
        }
        page.close("section");
    }

    private static String stepFigures(LoopAnalysis loop) {
        return loop.step().map(s -> {
            var m = s.metrics();
            return ": overshoot " + Fmt.num(m.overshootPercent()) + " %, rise time "
                    + (m.riseTimeSeconds().isPresent() ? Fmt.ms(m.riseTimeSeconds().getAsDouble()) + " ms" : "—")
                    + ", 2 % settling " + (m.settlingTimeSeconds().isPresent()
                            ? Fmt.ms(m.settlingTimeSeconds().getAsDouble()) + " ms" : "—");
        }).orElse("");
    }

    private static void feRow(Page.Table t, AxisResult a, String at, FeedFollowingError f) {
        t.row(Cell.text(a.axisName()), Cell.text(at), Cell.number(velocity(a, f.velocity())),
                Cell.number(distance(a, f.followingError())), Cell.number(distance(a, f.followingErrorWithoutFeedforward())));
    }

    private static String distance(AxisResult a, OptionalDouble si) {
        if (si.isEmpty()) {
            return "—";
        }
        return a.rotary() ? Fmt.num(Math.toDegrees(si.getAsDouble()) * 3600) + " arcsec" : Fmt.length(si.getAsDouble());
    }

    static String phaseMargin(Margins m) {
        return Fmt.num(m.phaseMarginDeg()) + "°" + m.gainCrossoverRadPerSec().stream()
                .mapToObj(w -> " at " + Fmt.hz(w) + " Hz").findFirst().orElse("");
    }

    static String gainMargin(Margins m) {
        return Fmt.num(m.gainMarginDb()) + " dB" + m.phaseCrossoverRadPerSec().stream()
                .mapToObj(w -> " at " + Fmt.hz(w) + " Hz").findFirst().orElse("");
    }

    // ---------------------------------------------------------------- tracking

    private void tracking() throws IOException {
        page.open("section");
        page.heading(2, "tracking", "Tracking and contour deviation");
        if (analysis.contours().isEmpty()) {
            page.element("p", "muted", "The model has no contours.");
        }
        for (ContourResult c : analysis.contours()) {
            page.heading(3, Html.fragmentId("contour", c.contourId()), "Contour " + c.contourName());
            List<String[]> facts = new ArrayList<>();
            facts.add(new String[] {"Axes", c.firstAxisName() + " (u), " + c.secondAxisName() + " (v)"});
            facts.add(new String[] {"Feed", Fmt.mPerMin(c.feed()) + " m/min"});
            facts.add(new String[] {"Path length", Fmt.mm(c.programmedRun().path().length()) + " mm"});
            facts.add(new String[] {"Reference sample period", Fmt.ms(c.samplePeriod()) + " ms"});
            if (c.fullCircle()) {
                facts.add(new String[] {"Full circle", "R = " + Fmt.mm(c.radius()) + " mm, programmed "
                        + c.programmedDirection().label() + ", run both ways"});
            }
            page.facts(facts);
            Page.Table runs = page.table("runs", "Simulated runs", "Run", "Max contour error", "RMS contour error",
                    "At time", "Peak following error " + c.firstAxisName(), "Peak following error " + c.secondAxisName(),
                    "Duration", "Samples");
            for (ContourRun r : c.runs()) {
                ContourRunMetrics m = r.metrics();
                runs.row(Cell.text(r.direction().label()), Cell.number(Fmt.um(m.maxContourError()) + " µm"),
                        Cell.number(Fmt.um(m.rmsContourError()) + " µm"), Cell.number(Fmt.num(m.timeOfMax()) + " s"),
                        Cell.number(Fmt.um(m.peakFollowingErrorFirst()) + " µm"),
                        Cell.number(Fmt.um(m.peakFollowingErrorSecond()) + " µm"),
                        Cell.number(Fmt.num(m.duration()) + " s"), Cell.number(Integer.toString(m.sampleCount())));
            }
            runs.end();
            estimates(c);
            page.open("div", "charts");
            ContourRun programmed = c.programmedRun();
            figure("following-" + c.contourId(), ReportCharts.followingError("Contour " + c.contourName()
                    + ": following error (" + programmed.direction().label() + ")", c, programmed), 900, 380,
                    "Following error of " + c.firstAxisName() + " and " + c.secondAxisName() + " against time, run "
                            + programmed.direction().label() + ".");
            ReportCharts.Magnified deviation = ReportCharts.contourDeviation("Contour " + c.contourName(), c, programmed);
            figure("deviation-" + c.contourId(), deviation.chart(), 720, 780, "Programmed path (dashed) and the "
                    + "contour error drawn along the path normal, magnified " + Magnification.label(deviation.factor())
                    + "; the largest error is marked with its true value.");
            page.close("div");
            page.list("notes", c.notes());
        }
        page.close("section");
    }

    private void estimates(ContourResult c) {
        ContourEstimate e = c.estimate();
        Page.Table t = page.table("estimates", "Simulated figures beside their analytic estimates (Kv "
                + c.firstAxisName() + " " + Fmt.num(e.firstAxisKv()) + " 1/s, " + c.secondAxisName() + " "
                + Fmt.num(e.secondAxisKv()) + " 1/s; " + e.basis() + ")",
                "Figure", "Simulated", "Estimate", "Formula", "Difference", "Relative");
        for (EstimateCheck check : c.estimateChecks()) {
            double relative = check.relativeDifference();
            t.row(Cell.text(check.figure()), Cell.number(Fmt.um(check.simulated()) + " µm"),
                    Cell.number(Fmt.um(check.estimate()) + " µm"), Cell.text(check.formula()),
                    Cell.number(Fmt.um(check.difference()) + " µm"),
                    Double.isNaN(relative) ? Cell.text("—")
                            : Cell.number(String.format(Locale.ROOT, "%+.1f %%", relative * 100)));
        }
        t.end();
    }

    // ---------------------------------------------------------------- circles

    private void circles() throws IOException {
        page.open("section");
        page.heading(2, "circles", "Circle tests");
        List<ContourResult> circles = analysis.contours().stream().filter(ContourResult::fullCircle).toList();
        if (circles.isEmpty()) {
            page.element("p", "muted", "No full-circle contour was analysed, so there is no circle test.");
        }
        for (ContourResult c : circles) {
            page.heading(3, Html.fragmentId("circle", c.contourId()), "Circle test " + c.contourName());
            Optional<CircleTestSetup> setup = c.programmedRun().circleSetup();
            if (setup.isPresent()) {
                CircleTestSetup s = setup.get();
                page.facts(List.of(
                        new String[] {"Nominal circle", "R = " + Fmt.mm(s.radius()) + " mm about ("
                                + Fmt.mm(s.centre().u()) + ", " + Fmt.mm(s.centre().v()) + ") mm in the "
                                + c.firstAxisName() + c.secondAxisName() + " plane"},
                        new String[] {"Feed", Fmt.mPerMin(s.feed()) + " m/min"},
                        new String[] {"Start angle, overshoot arcs", Fmt.deg(s.startAngle()) + "°, "
                                + Fmt.deg(s.overshootAngle()) + "° each (left out of the evaluation)"}));
            }
            Page.Table t = page.table("circle", "ISO 230-4 figures per direction", "Direction", "G", "F",
                    "F outward (max ρ − R)", "F inward (min ρ − R)", "Ellipse orientation", "Ellipse peak to peak",
                    "Least-squares radius", "Evaluated samples");
            for (ContourRun r : c.runs()) {
                if (r.circleTest().isEmpty()) {
                    continue;
                }
                CircleTestResult ct = r.circleTest().get();
                t.row(Cell.text(r.direction().label()), Cell.number(Fmt.um(ct.circularDeviation()) + " µm"),
                        Cell.number(Fmt.um(ct.radialDeviation()) + " µm"),
                        Cell.number(Fmt.um(ct.radialDeviationMax()) + " µm"),
                        Cell.number(Fmt.um(ct.radialDeviationMin()) + " µm"),
                        Cell.number(Fmt.deg(ct.ellipseOrientation()) + "°"),
                        Cell.number(Fmt.um(ct.ellipsePeakToPeak()) + " µm"),
                        Cell.number(Fmt.mm(ct.leastSquaresCircle().radius()) + " mm"),
                        Cell.number(Integer.toString(ct.evaluatedSamples())));
            }
            Optional<BidirectionalCircleResult> both = c.bidirectional();
            if (both.isPresent()) {
                t.row(Cell.text("both (G(b))"), Cell.number(Fmt.um(both.get().bidirectionalDeviation()) + " µm"),
                        Cell.text("—"), Cell.text("—"), Cell.text("—"), Cell.text("—"), Cell.text("—"),
                        Cell.number(Fmt.mm(both.get().commonCircle().radius()) + " mm"), Cell.text("—"));
            }
            t.end();
            Optional<ReportCharts.Magnified> polar = ReportCharts.circleTest("Circle test " + c.contourName(), c);
            if (polar.isPresent()) {
                figure("circle-" + c.contourId(), polar.get().chart(), 760, 840, "Both directions, radial deviation "
                        + "magnified " + Magnification.label(polar.get().factor()) + " (angles true); rings mark equal "
                        + "radial deviation in µm, the dashed ring is the nominal circle when it is on scale, "
                        + "triangles mark the axis reversal points.");
            }
        }
        page.close("section");
    }

    // ---------------------------------------------------------------- budget

    private void budget() throws IOException {
        page.open("section");
        page.heading(2, "budget", "Error budget");
        MachineBudget budget = review.budget();
        if (budget.requirements().isEmpty()) {
            page.element("p", "muted", "No machine-level contour requirement, so no budget was evaluated.");
        }
        page.element("p", "Coverage convention: " + CombinationMethod.COVERAGE_CONVENTION + ". Reserve held back from "
                + "every limit: " + Fmt.percent(MachineBudget.RESERVE_FRACTION) + ".");
        for (RequirementBudget rb : budget.requirements()) {
            BudgetEvaluation ev = rb.evaluation();
            String statement = requirements.result(rb.requirementId()).map(RequirementResult::statement).orElse("");
            page.heading(3, Html.fragmentId("budget", rb.requirementId()), "Budget of " + rb.requirementId()
                    + (statement.isEmpty() ? "" : ": " + statement));
            List<String[]> facts = new ArrayList<>();
            facts.add(new String[] {"Metric", rb.metric()});
            facts.add(new String[] {"Contours", rb.contourIds().stream()
                    .map(id -> analysis.contour(id).map(ContourResult::contourName).orElse(id))
                    .collect(Collectors.joining(", "))});
            facts.add(new String[] {"Combination", ev.methodStatement()});
            facts.add(new String[] {"Total", Fmt.um(ev.total()) + " µm (linear sum " + Fmt.um(ev.linearSum())
                    + " µm, RSS " + Fmt.um(ev.rootSumSquare()) + " µm, systematic " + Fmt.um(ev.systematicSum())
                    + " µm, random U " + Fmt.um(ev.randomExpandedUncertainty()) + " µm)"});
            if (ev.comparison().isPresent()) {
                TargetComparison tc = ev.comparison().get();
                facts.add(new String[] {"Allocation", Fmt.um(tc.target()) + " µm, allowed after reserve "
                        + Fmt.um(tc.allowedTotal()) + " µm"});
                facts.add(new String[] {"Margin", Fmt.um(tc.margin()) + " µm (" + Fmt.num(tc.marginPercent())
                        + " % of the allocation), " + Fmt.um(tc.reserveMargin()) + " µm after the reserve"});
            }
            page.facts(facts);
            page.open("p").text("Budget status: ").status(budgetKey(ev), ev.status().displayName()).close("p");
            Page.Table t = page.table("budget", "Lines, largest portion first", "Rank", "Line", "Axis",
                    "Source (origin)", "Class, distribution", "Value", "Sensitivity", "Contribution", "Portion", "Share",
                    "Evidence");
            for (LineContribution lc : ev.ranking()) {
                var line = lc.line();
                t.row(Cell.number(Integer.toString(lc.rank())), Cell.text(line.name() + " [" + line.id() + "]"),
                        Cell.text(line.axis() == null ? "machine" : line.axis()),
                        Cell.text(line.source().displayName() + " (" + line.origin().displayName() + ")"),
                        Cell.text(line.errorClass().displayName() + ", " + line.distribution().displayName()),
                        Cell.number(Fmt.um(line.value()) + " µm"), Cell.number(Fmt.num(line.sensitivity())),
                        Cell.number(Fmt.um(lc.contribution()) + " µm"), Cell.number(Fmt.um(lc.portion()) + " µm"),
                        Cell.number(Fmt.percent(lc.share())),
                        Cell.text(line.evidence().isEmpty() ? "—" : line.evidence()));
            }
            t.end();
            Page.Table methods = page.table("methods", "The same contributions under every combination method",
                    "Method", "Formula", "Total");
            for (CombinationMethod m : CombinationMethod.values()) {
                methods.row(Cell.text(m.displayName() + (m == ev.method() ? " (used)" : "")), Cell.text(m.description()),
                        Cell.number(Fmt.um(ev.totalFor(m)) + " µm"));
            }
            methods.end();
            if (!ev.contributions().isEmpty()) {
                int height = Math.min(MAX_BUDGET_HEIGHT_PX, 150 + 30 * (ev.contributions().size() + 1));
                figure("budget-" + rb.requirementId(), ReportCharts.budget("Budget of " + rb.requirementId(), rb),
                        1000, height, "Portions of the total, ranked, against the allocation (limit line).");
            }
        }
        if (!budget.superseded().isEmpty()) {
            page.element("h4", "Stored lines replaced by recomputed ones");
            page.list("notes", budget.superseded().stream().sorted(Comparator.comparing(
                    (SupersededLine s) -> s.stored().id())).map(s -> s.stored().name() + " [" + s.stored().id()
                            + "] → " + s.replacedById()).toList());
        }
        page.close("section");
    }

    private static String budgetKey(BudgetEvaluation ev) {
        return switch (ev.status()) {
            case MET -> "met";
            case VIOLATED -> "violated";
            default -> "not-evaluated";
        };
    }

    // ---------------------------------------------------------------- trace

    private void trace() {
        page.open("section");
        page.heading(2, "trace", "Requirement trace");
        page.element("p", "Each machine requirement, the axis allocations derived from it, what verifies each one, and "
                + "the computed value, margin and status.");
        Page.Table t = page.table("trace", "Machine requirement → allocations → computed value", "Requirement",
                "Statement", "Allocated to", "Verified by", "Value", "Limit", "Margin", "Status", "Rationale");
        for (TraceMatrixExport.Row row : TraceMatrixExport.rows(requirements)) {
            traceRow(t, row.result(), row.depth());
        }
        if (t.rowCount() == 0) {
            page.element("p", "muted", "No requirements.");
        } else {
            t.end();
        }
        complianceMatrix();
        apportionments();
        derived();
        page.close("section");
    }

    private void traceRow(Page.Table t, RequirementResult r, int depth) {
        String unit = unitOf(r);
        String verified = r.verifiedBy().isEmpty() ? "—"
                : r.verifiedBy().stream().map(v -> v.describe()).collect(Collectors.joining("; "));
        String indent = "  ".repeat(depth) + (depth > 0 ? "↳ " : "");
        t.row(Cell.text(indent + r.id()), Cell.text(r.statement()),
                Cell.text(r.allocatedAxisName().orElse(r.machineLevel() ? "machine" : "—")), Cell.text(verified),
                Cell.number(withUnit(Fmt.num(r.displayValue()), unit)),
                Cell.number(("atLeast".equals(r.bound()) ? "≥ " : "≤ ") + withUnit(Fmt.num(r.displayLimit()), unit)),
                Cell.number(withUnit(Fmt.num(r.displayMargin()), unit)), statusCell(r),
                Cell.text(r.rationale().isEmpty() ? "—" : r.rationale()));
    }

    private void complianceMatrix() {
        ComplianceMatrix m = requirements.matrix();
        if (m == null || m.rowRequirementIds().isEmpty()) {
            return;
        }
        page.heading(3, "compliance", "Compliance matrix");
        page.element("p", "Rows: machine requirements; columns: axes; each cell lists the allocations to that axis "
                + "below the row and their worst status.");
        String[] headers = new String[m.columnAxisNames().size() + 2];
        headers[0] = "Requirement";
        headers[1] = "Overall";
        for (int c = 0; c < m.columnAxisNames().size(); c++) {
            headers[c + 2] = m.columnAxisNames().get(c);
        }
        Page.Table t = page.table("matrix", null, headers);
        for (int r = 0; r < m.rowRequirementIds().size(); r++) {
            Cell[] cells = new Cell[headers.length];
            cells[0] = Cell.text(m.rowRequirementIds().get(r));
            RequirementStatus rowStatus = m.rowStatuses().get(r);
            cells[1] = Cell.status(statusKey(rowStatus), rowStatus.label());
            for (int c = 0; c < m.columnAxisIds().size(); c++) {
                ComplianceMatrix.Cell cell = m.cell(r, c);
                cells[c + 2] = cell.isEmpty() || cell.status() == null ? Cell.status("none", "—")
                        : Cell.status(statusKey(cell.status()), cell.status().label() + ": "
                                + String.join(", ", new TreeSet<>(cell.requirementIds())));
            }
            t.row(cells);
        }
        t.end();
    }

    private void apportionments() {
        if (requirements.apportionments().isEmpty()) {
            return;
        }
        page.heading(3, "apportionment", "Top-down apportionment");
        for (RequirementApportionment a : requirements.apportionments()) {
            Page.Table t = page.table("apportionment", a.requirementId() + ": " + a.basis(), "Item", "Axis",
                    "Allocated", "Current", "Fits");
            for (RequirementApportionment.ApportionedItem item : a.items()) {
                t.row(Cell.text(item.name()), Cell.text(item.axisId().isEmpty() ? "machine"
                        : analysis.axis(item.axisId()).map(AxisResult::axisName).orElse(item.axisId())),
                        Cell.number(Fmt.um(item.allocated()) + " µm"), Cell.number(Fmt.um(item.current()) + " µm"),
                        Cell.status(item.fits() ? "met" : "violated", item.fits() ? "fits" : "exceeds"));
            }
            t.end();
        }
    }

    private void derived() {
        if (requirements.derived().isEmpty()) {
            return;
        }
        page.heading(3, "derived", "Suggested axis requirements (inverse design, not in the model)");
        Page.Table t = page.table("derived", null, "Suggestion", "From", "Axis", "Statement", "Limit", "Present value",
                "Present design");
        List<DerivedRequirement> sorted = requirements.derived().stream()
                .sorted(Comparator.comparing(DerivedRequirement::parentId).thenComparing(DerivedRequirement::id)).toList();
        for (DerivedRequirement d : sorted) {
            t.row(Cell.text(d.id()), Cell.text(d.parentId()), Cell.text(d.axisName()), Cell.text(d.statement()),
                    Cell.text(d.limit().statement()), Cell.number(siValue(d.currentValue(), d.limit().siUnit())),
                    Cell.status(d.currentlySatisfied() ? "met" : "violated",
                            d.currentlySatisfied() ? "satisfies" : "does not satisfy"));
        }
        t.end();
    }

    private static String siValue(OptionalDouble value, String siUnit) {
        if (value.isEmpty()) {
            return "—";
        }
        return "m".equals(siUnit) ? Fmt.um(value) + " µm" : Fmt.num(value) + (siUnit.isEmpty() ? "" : " " + siUnit);
    }

    // ---------------------------------------------------------------- assumptions

    private void assumptions() {
        page.open("section");
        page.heading(2, "assumptions", "Assumptions and settings");
        ReviewProvenance p = review.provenance();
        page.facts(List.of(
                new String[] {"Tool version", p.toolVersion()},
                new String[] {"Input file", p.inputFile()},
                new String[] {"Input SHA-256", p.inputSha256()},
                new String[] {"Analysed at", DATE.format(p.analysedAt())},
                new String[] {"Prepared by", input.author().isEmpty() ? "(not named)" : input.author()},
                new String[] {"Contours", p.contourFilter().isEmpty() ? "all" : String.join(", ", p.contourFilter())}));
        List<String> methods = new ArrayList<>();
        methods.add("Step responses: " + StepResponse.METHOD + ".");
        methods.add("Dead time: exact in frequency responses and margins; closed-loop poles, stability, step responses "
                + "and gain ranges use its diagonal Padé approximant of order " + padeOrders() + ".");
        methods.add("Steady-state errors: " + SteadyStateErrors.PARABOLA_CONVENTION);
        methods.add("Contour error: exact shortest distance of every simulated sample to the programmed path (monotone "
                + "search), signed positive to the left of travel.");
        methods.add("Circle tests: G is the radial width of the thinnest ring about the least-squares centre holding the "
                + "evaluated samples, F the deviation from the nominal circle, G(b) both runs about their common "
                + "least-squares centre (ISO 230-4 terms); overshoot arcs are left out.");
        for (RequirementBudget rb : review.budget().requirements()) {
            methods.add("Budget of " + rb.requirementId() + ": " + rb.evaluation().methodStatement() + ".");
        }
        methods.add("Budget coverage convention: " + CombinationMethod.COVERAGE_CONVENTION + "; reserve "
                + Fmt.percent(MachineBudget.RESERVE_FRACTION) + " of each limit.");
        methods.add("Charts of contour and radial deviation magnify the error by the factor printed on each chart.");
        page.element("h3", "Methods");
        page.list(null, methods);
        if (!p.settings().isEmpty()) {
            page.element("h3", "Settings of this run");
            page.list(null, p.settings());
        }
        List<String> notes = new ArrayList<>(analysis.notes());
        for (ContourResult c : analysis.contours()) {
            notes.addAll(prefixed(c.contourName(), c.notes()));
        }
        notesList("h3", "Simplifications and notes", notes);
        page.close("section");
    }

    private String padeOrders() {
        Set<Integer> orders = new TreeSet<>();
        if (input.inputs().isPresent()) {
            for (MappedAxis a : input.inputs().get().axes()) {
                orders.add(a.model().padeOrder());
            }
        } else {
            for (AxisResult a : analysis.axes()) {
                orders.add(a.dynamics().positionLoop().padeOrder());
            }
        }
        return orders.isEmpty() ? "—" : orders.stream().map(String::valueOf).collect(Collectors.joining(", "));
    }

    private void closingCaution() {
        page.open("section");
        page.heading(2, "caution", "Safety caution");
        caution();
        page.close("section");
    }

    // ---------------------------------------------------------------- helpers

    private void figure(String slug, JFreeChart chart, int w, int h, String caption) throws IOException {
        String source = charts.add(slug, chart, w, h);
        String title = chart.getTitle() == null ? caption : chart.getTitle().getText();
        page.figure(source, title, w, h, caption);
    }

    private static List<String> prefixed(String owner, List<String> notes) {
        return notes.stream().map(n -> owner + ": " + n).toList();
    }

    /** A heading and the notes under it; nothing at all when there are none. */
    private void notesList(String headingTag, String heading, List<String> notes) {
        if (!notes.isEmpty()) {
            page.element(headingTag, heading);
            page.list("notes", notes);
        }
    }

    private static long count(List<RequirementResult> results, RequirementStatus status) {
        return results.stream().filter(r -> r.status() == status).count();
    }

    static String statusKey(RequirementStatus status) {
        return switch (status) {
            case MET -> "met";
            case VIOLATED -> "violated";
            case NOT_EVALUATED -> "not-evaluated";
        };
    }

    private static String unitOf(RequirementResult r) {
        return org.tracewell.requirements.DisplayUnits.shown(r.siUnit(), r.displayUnit());
    }

    private static String withUnit(String number, String unit) {
        return "—".equals(number) || unit.isEmpty() || "1".equals(unit) ? number : number + " " + unit;
    }

    private static String kindOf(RequirementResult r) {
        return r.metric().isEmpty() ? r.kind() : r.kind() + " (" + r.metric() + ")";
    }

    private static String coverageLabel(CoverageFinding.Kind kind) {
        return switch (kind) {
            case MACHINE_REQUIREMENT_WITHOUT_ALLOCATION -> "no allocation";
            case ALLOCATION_WITHOUT_VERIFICATION -> "not verified";
            case ORPHAN -> "orphan";
        };
    }
}
