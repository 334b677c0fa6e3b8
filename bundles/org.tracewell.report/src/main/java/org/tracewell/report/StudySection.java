package org.tracewell.report;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.jfree.chart.JFreeChart;
import org.tracewell.charts.HistogramBins;
import org.tracewell.charts.HistogramChart;
import org.tracewell.charts.SweepChart;
import org.tracewell.charts.SweepCurve;
import org.tracewell.core.SafetyCaution;
import org.tracewell.core.variation.RequirementValue;
import org.tracewell.core.variation.RequirementYield;
import org.tracewell.core.variation.StudyDefinition;
import org.tracewell.core.variation.StudyFigures;
import org.tracewell.core.variation.StudyMetric;
import org.tracewell.core.variation.StudyResult;
import org.tracewell.core.variation.SweepRange;
import org.tracewell.core.variation.Tolerance;
import org.tracewell.engine.variation.MetricSummary;
import org.tracewell.engine.variation.SensitivityAnalysis;
import org.tracewell.engine.variation.SweepResult;
import org.tracewell.engine.variation.WorstVariant;
import org.tracewell.model.StudyKind;
import org.tracewell.model.units.UnitTable;
import org.tracewell.report.Page.Cell;

/**
 * The report's section on the tolerance studies the model asks for: per study its definition (what varies and how,
 * in trade units), then for a Monte-Carlo run the yield against each requirement, percentiles, the worst variants,
 * normalised sensitivities and one histogram per metric; for a sweep one chart per metric and the grid. A study not
 * run for the report says how to run it. Every string goes through the page's escaping.
 */
final class StudySection {

    /** Grids up to this many points are listed in a table under the charts. */
    static final int MAX_GRID_ROWS = 200;

    /** Draws a chart into the page. */
    interface Figures {
        void add(String slug, JFreeChart chart, int widthPx, int heightPx, String caption) throws IOException;
    }

    private final Page page;
    private final Figures figures;

    StudySection(Page page, Figures figures) {
        this.page = page;
        this.figures = figures;
    }

    void render(List<StudyReport> studies) throws IOException {
        page.open("section");
        page.heading(2, ReportPage.STUDIES_SECTION[0], ReportPage.STUDIES_SECTION[1]);
        page.element("p", "Spreads of the results over the variation the model declares. Each variant is a copy of"
                + " the machine with the varied attributes set, run through the same loop analysis, contour"
                + " simulation, error budget and requirement evaluation as this review. Sampling is seeded:"
                + " the same seed gives the same variants.");
        page.element("p", "caution", "Where these results suggest other gains or settings: "
                + SafetyCaution.SHORT);
        for (StudyReport study : studies) {
            page.heading(3, Html.fragmentId("study", study.name()), study.kind() + " study: " + study.name());
            if (!study.description().isBlank()) {
                page.element("p", study.description());
            }
            if (study.result().isEmpty()) {
                page.element("p", "muted", "Not run for this report (a study can take minutes, the review seconds):"
                        + " tracewell analyze --studies runs every study into the report, tracewell "
                        + ("sweep".equals(study.kind()) ? "sweep" : "montecarlo") + " --study '" + study.name()
                        + "' runs this one alone.");
                continue;
            }
            StudyResult r = study.result().get();
            facts(r);
            parameters(r);
            if (r.monteCarlo().isPresent()) {
                monteCarlo(r);
            } else {
                sweep(r);
            }
        }
        page.close("section");
    }

    private void facts(StudyResult r) {
        StudyDefinition d = r.definition();
        List<String[]> facts = new ArrayList<>();
        facts.add(new String[] {"Kind", d.kind() == StudyKind.SWEEP ? "sweep over a grid, both ends included"
                : "Monte-Carlo, seed " + d.seed() + ", inverse-CDF sampling truncated to each physical range"});
        facts.add(new String[] {d.kind() == StudyKind.SWEEP ? "Grid points" : "Variants", r.completedCount() + " of "
                + r.plannedCount() + (r.cancelled() ? " (cancelled)" : "")});
        facts.add(new String[] {"Run", String.format(Locale.ROOT, "%.1f s on %d %s", r.seconds(), r.threads(),
                r.threads() == 1 ? "thread" : "threads")});
        page.facts(facts);
    }

    private void parameters(StudyResult r) {
        StudyDefinition d = r.definition();
        Page.Table t = page.table("study-parameters", "Varied attributes", "Attribute", "Nominal",
                d.kind() == StudyKind.SWEEP ? "Grid" : "Spread", d.kind() == StudyKind.SWEEP ? "Points"
                        : "Physical range");
        for (int j = 0; j < r.parameters().size(); j++) {
            String unit = r.parameterDisplayUnits().get(j);
            double nominal = r.nominalParameters()[j];
            if (d.kind() == StudyKind.SWEEP) {
                SweepRange s = d.ranges().get(j);
                t.row(Cell.text(s.path()), Cell.number(UnitTable.format(nominal, unit)),
                        Cell.text(UnitTable.format(s.from(), unit) + " to " + UnitTable.format(s.to(), unit)),
                        Cell.number(Integer.toString(s.steps())));
            } else {
                Tolerance tol = d.tolerances().get(j);
                String spread = switch (tol.shape()) {
                    case NORMAL -> "normal, σ " + spreadText(tol.width(), unit);
                    case UNIFORM -> "uniform, ± " + spreadText(tol.width(), unit);
                    case TRIANGULAR -> "triangular, ± " + spreadText(tol.width(), unit) + ", peak at nominal";
                };
                t.row(Cell.text(tol.path()), Cell.number(UnitTable.format(nominal, unit)), Cell.text(spread),
                        Cell.text("[" + bound(tol.lowerFor(nominal), unit) + ", " + bound(tol.upperFor(), unit) + "]"));
            }
        }
        t.end();
    }

    private void monteCarlo(StudyResult r) throws IOException {
        if (!r.yields().isEmpty()) {
            Page.Table y = page.table("study-yields", "Yield against each requirement (binomial standard error)",
                    "Requirement", "Limit", "Nominal", "Median", "95th percentile", "Yield", "Variants meeting it");
            for (RequirementYield ry : r.yields()) {
                RequirementValue req = ry.requirement();
                MetricSummary s = r.summary(ry.metricIndex());
                String unit = req.displayUnit();
                boolean all = ry.estimate().passCount() == ry.estimate().sampleCount();
                y.row(Cell.text(req.requirementId()), Cell.number(req.bound().symbol() + " "
                        + UnitTable.format(req.limit(), unit)), Cell.number(UnitTable.format(ry.nominalValue(), unit)),
                        Cell.number(UnitTable.format(s.p50(), unit)), Cell.number(UnitTable.format(s.p95(), unit)),
                        Cell.status(all ? "met" : "violated", String.format(Locale.ROOT, "%.1f %% ± %.1f %%",
                                100 * ry.estimate().fraction(), 100 * ry.estimate().standardError())),
                        Cell.number(ry.estimate().passCount() + " of " + ry.estimate().sampleCount()));
            }
            y.end();
        }
        Page.Table t = page.table("study-summary", "Distribution of every result (percentiles: Hyndman & Fan"
                + " definition 7)", "Result", "Unit", "Nominal", "Mean", "σ", "1 %", "5 %", "50 %", "95 %", "99 %",
                "Max", "Not computable");
        for (int m = 0; m < r.metrics().size(); m++) {
            StudyMetric metric = r.metrics().get(m);
            MetricSummary s = r.summary(m);
            String unit = metric.displayUnit();
            t.row(Cell.text(metric.name()), Cell.text(unit), Cell.number(StudyFigures.number(r.nominalMetrics()[m], unit)),
                    Cell.number(StudyFigures.number(s.mean(), unit)), Cell.number(spreadNumber(s.standardDeviation(), unit)),
                    Cell.number(StudyFigures.number(s.p01(), unit)), Cell.number(StudyFigures.number(s.p05(), unit)),
                    Cell.number(StudyFigures.number(s.p50(), unit)), Cell.number(StudyFigures.number(s.p95(), unit)),
                    Cell.number(StudyFigures.number(s.p99(), unit)), Cell.number(StudyFigures.number(s.max(), unit)),
                    Cell.number(Integer.toString(s.invalidCount())));
        }
        t.end();
        worst(r);
        sensitivities(r);
        for (int m = 0; m < r.metrics().size(); m++) {
            var figure = StudyFigures.histogram(r, m);
            if (figure.isEmpty()) {
                continue;
            }
            var f = figure.get();
            JFreeChart chart = HistogramChart.create(f.title(), f.axisLabel(), new HistogramBins(f.edges(), f.counts()),
                    f.nominal(), f.limit(), f.atMost(), f.yieldText());
            figures.add("study-" + r.definition().name() + "-" + r.metrics().get(m).name(), chart, 900, 380,
                    "Variants per bin" + (Double.isFinite(f.limit()) ? "; red bins lie beyond the limit" : "")
                            + "; the note line is the nominal design.");
        }
    }

    /** The worst variants of each requirement some variant violates (of the first result when none is violated). */
    private void worst(StudyResult r) {
        List<Integer> shown = new ArrayList<>();
        for (RequirementYield y : r.yields()) {
            if (y.estimate().passCount() < y.estimate().sampleCount()) {
                shown.add(y.metricIndex());
            }
        }
        if (shown.isEmpty() && !r.metrics().isEmpty()) {
            shown.add(0);
        }
        for (int m : shown) {
            List<WorstVariant> worst = r.worst(m);
            if (worst.isEmpty()) {
                continue;
            }
            StudyMetric metric = r.metrics().get(m);
            List<String> headers = new ArrayList<>(List.of("Variant", metric.name()));
            for (int j = 0; j < r.parameters().size(); j++) {
                headers.add(r.parameters().get(j).name());
            }
            Page.Table t = page.table("study-worst", "Worst variants on " + metric.name() + ", worst first (replayable"
                    + " from the seed and the variant number)", headers.toArray(String[]::new));
            for (WorstVariant w : worst) {
                List<Cell> cells = new ArrayList<>();
                cells.add(Cell.number(Integer.toString(w.index())));
                cells.add(Cell.number(UnitTable.format(w.value(), metric.displayUnit())));
                double[] p = w.parameters();
                for (int j = 0; j < p.length; j++) {
                    cells.add(Cell.number(UnitTable.format(p[j], r.parameterDisplayUnits().get(j))));
                }
                t.row(cells.toArray(Cell[]::new));
            }
            t.end();
        }
    }

    private void sensitivities(StudyResult r) {
        if (r.sensitivities().isEmpty()) {
            return;
        }
        SensitivityAnalysis s = r.sensitivities().get();
        List<String> headers = new ArrayList<>(List.of("Result"));
        r.parameters().forEach(q -> headers.add(q.name()));
        Page.Table t = page.table("study-sensitivities", "Normalised sensitivities (∂m/m)/(∂p/p) at the nominal design"
                + " (central differences, relative step " + org.tracewell.core.variation.StudyRunner.SENSITIVITY_STEP
                + "): per cent of the result per per cent of the attribute", headers.toArray(String[]::new));
        for (int m = 0; m < r.metrics().size(); m++) {
            List<Cell> cells = new ArrayList<>();
            cells.add(Cell.text(r.metrics().get(m).name()));
            for (int j = 0; j < r.parameters().size(); j++) {
                double v = s.normalised(m, j);
                cells.add(Cell.number(Double.isNaN(v) ? "—" : Fmt.num(v)));
            }
            t.row(cells.toArray(Cell[]::new));
        }
        t.end();
    }

    private void sweep(StudyResult r) throws IOException {
        SweepResult s = r.sweep().orElseThrow();
        for (int m = 0; m < r.metrics().size(); m++) {
            StudyFigures.SweepFigure f = StudyFigures.sweep(r, m);
            List<SweepCurve> curves = f.curves().stream().map(c -> new SweepCurve(c.name(), c.x(), c.y())).toList();
            figures.add("study-" + r.definition().name() + "-" + r.metrics().get(m).name(),
                    SweepChart.create(f.title(), f.xLabel(), f.yLabel(), curves, f.limit(), f.nominalX()), 900, 420,
                    (curves.size() > 1 ? "One curve per value of " + r.parameters().get(1).name() + "; " : "")
                            + "the note line is the nominal design" + (Double.isFinite(f.limit())
                                    ? ", the dashed line the requirement's limit." : "."));
        }
        if (s.pointCount() > MAX_GRID_ROWS) {
            page.element("p", "muted", s.pointCount() + " grid points: see the study's grid CSV for every value.");
            return;
        }
        List<String> headers = new ArrayList<>();
        r.parameters().forEach(q -> headers.add(q.name()));
        r.metrics().forEach(q -> headers.add(q.name()));
        Page.Table t = page.table("study-grid", "Every grid point", headers.toArray(String[]::new));
        int n2 = s.axes().size() == 2 ? s.axes().get(1).size() : 1;
        for (int k = 0; k < s.pointCount(); k++) {
            List<Cell> cells = new ArrayList<>();
            cells.add(Cell.number(UnitTable.format(s.axes().get(0).value(k / n2), r.parameterDisplayUnits().get(0))));
            if (s.axes().size() == 2) {
                cells.add(Cell.number(UnitTable.format(s.axes().get(1).value(k % n2),
                        r.parameterDisplayUnits().get(1))));
            }
            for (int m = 0; m < r.metrics().size(); m++) {
                cells.add(Cell.number(UnitTable.format(s.metric(m, k), r.metrics().get(m).displayUnit())));
            }
            t.row(cells.toArray(Cell[]::new));
        }
        t.end();
    }

    // ------------------------------------------------------------------------------------------------ numbers

    /** A spread (σ, half-width) in a linear display unit; SI when the unit is logarithmic. */
    private static String spreadNumber(double si, String unit) {
        boolean linear = UnitTable.find(unit).map(u -> !u.decibel()).orElse(false);
        return linear ? StudyFigures.number(si, unit) : UnitTable.formatNumber(si, 0) + " (ratio)";
    }

    private static String spreadText(double si, String unit) {
        boolean linear = UnitTable.find(unit).map(u -> !u.decibel()).orElse(false);
        return linear ? UnitTable.format(si, unit) : UnitTable.formatNumber(si, 0);
    }

    private static String bound(double si, String unit) {
        return Double.isInfinite(si) ? (si > 0 ? "∞" : "−∞") : UnitTable.format(si, unit);
    }
}
