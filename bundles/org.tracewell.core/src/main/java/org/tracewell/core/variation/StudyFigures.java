package org.tracewell.core.variation;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.tracewell.engine.budget.LimitBound;
import org.tracewell.engine.variation.Histogram;
import org.tracewell.engine.variation.MonteCarloResult;
import org.tracewell.engine.variation.SweepAxis;
import org.tracewell.engine.variation.SweepResult;
import org.tracewell.model.units.UnitTable;

/**
 * The chart models of a study, in trade units: what the report and the workbench draw, made once here so both show
 * the same bins, curves, limits and words. The unit conversion happens here (the edge); bins equal in SI stay
 * exact when a unit is logarithmic (dB), their widths just differ.
 */
public final class StudyFigures {

    /** Fewest and most bins of a histogram. */
    public static final int MIN_BINS = 5;
    public static final int MAX_BINS = 60;

    /**
     * A histogram of one metric over the evaluated variants.
     *
     * @param title     chart title
     * @param axisLabel metric and unit
     * @param edges     bin edges, display unit, increasing
     * @param counts    variants per bin
     * @param nominal   the nominal design's value, display unit (NaN if not computable)
     * @param limit     the requirement's limit, display unit; NaN for a metric without one
     * @param atMost    true when values up to the limit meet it
     * @param yieldText the yield in words; empty without a limit
     */
    public record HistogramFigure(String title, String axisLabel, double[] edges, int[] counts, double nominal,
            double limit, boolean atMost, String yieldText) {

        public HistogramFigure {
            edges = edges.clone();
            counts = counts.clone();
        }

        @Override
        public double[] edges() {
            return edges.clone();
        }

        @Override
        public int[] counts() {
            return counts.clone();
        }
    }

    /** One curve of a sweep, display units. */
    public record Curve(String name, double[] x, double[] y) {

        public Curve {
            x = x.clone();
            y = y.clone();
        }

        @Override
        public double[] x() {
            return x.clone();
        }

        @Override
        public double[] y() {
            return y.clone();
        }
    }

    /**
     * A metric over the first swept attribute, one curve per value of the second (2-D) or one curve (1-D).
     *
     * @param limit    the requirement's limit, y unit; NaN for none
     * @param nominalX the nominal value of the first attribute, x unit
     */
    public record SweepFigure(String title, String xLabel, String yLabel, List<Curve> curves, double limit,
            double nominalX) {

        public SweepFigure {
            curves = List.copyOf(curves);
        }
    }

    private StudyFigures() {
    }

    /** Bins for n values: the Rice rule 2·n^(1/3) (from memory), within {@link #MIN_BINS}..{@link #MAX_BINS}. */
    public static int binsFor(int n) {
        return Math.max(MIN_BINS, Math.min(MAX_BINS, (int) Math.ceil(2 * Math.cbrt(Math.max(n, 1)))));
    }

    /** The histogram of metric {@code m}; empty when no variant has a finite value. */
    public static Optional<HistogramFigure> histogram(StudyResult r, int m) {
        MonteCarloResult mc = r.monteCarlo().orElseThrow(() -> new IllegalArgumentException("study '"
                + r.definition().name() + "' is a sweep; it has no distribution to draw"));
        StudyMetric metric = r.metrics().get(m);
        int finite = mc.summary(m).count();
        if (finite == 0) {
            return Optional.empty();
        }
        Histogram h = mc.histogram(m, binsFor(finite));
        String unit = metric.displayUnit();
        double[] edges = new double[h.binCount() + 1];
        for (int i = 0; i <= h.binCount(); i++) {
            edges[i] = display(i == h.binCount() ? h.upper() : h.binStart(i), unit);
        }
        double limit = Double.NaN;
        boolean atMost = metric.goodSide() == LimitBound.AT_MOST;
        String yieldText = "";
        Optional<RequirementYield> y = r.yieldOf(m);
        if (y.isPresent()) {
            RequirementValue req = y.get().requirement();
            limit = display(req.limit(), unit);
            yieldText = String.format(java.util.Locale.ROOT, "yield %.1f %% ± %.1f %% of %d variants (%s %s)",
                    100 * y.get().estimate().fraction(), 100 * y.get().estimate().standardError(),
                    y.get().estimate().sampleCount(), req.bound().symbol(), UnitTable.format(req.limit(), unit));
        }
        return Optional.of(new HistogramFigure(metric.name() + " over " + mc.completedCount() + " variants",
                label(metric), edges, h.counts(), display(r.nominalMetrics()[m], unit), limit, atMost, yieldText));
    }

    /** The sweep figure of metric {@code m}. */
    public static SweepFigure sweep(StudyResult r, int m) {
        SweepResult s = r.sweep().orElseThrow(() -> new IllegalArgumentException("study '" + r.definition().name()
                + "' is a Monte-Carlo study; it has no sweep to draw"));
        StudyMetric metric = r.metrics().get(m);
        String yUnit = metric.displayUnit();
        String xUnit = r.parameterDisplayUnits().get(0);
        SweepAxis first = s.axes().get(0);
        double[] x = new double[first.size()];
        for (int i = 0; i < x.length; i++) {
            x[i] = display(first.value(i), xUnit);
        }
        List<Curve> curves = new ArrayList<>();
        if (s.axes().size() == 1) {
            double[] y = new double[x.length];
            for (int i = 0; i < x.length; i++) {
                y[i] = display(s.metric(m, i), yUnit);
            }
            curves.add(new Curve(metric.name(), x, y));
        } else {
            SweepAxis second = s.axes().get(1);
            String secondUnit = r.parameterDisplayUnits().get(1);
            for (int j = 0; j < second.size(); j++) {
                double[] y = new double[x.length];
                for (int i = 0; i < x.length; i++) {
                    y[i] = display(s.metric(m, i, j), yUnit);
                }
                curves.add(new Curve(r.parameters().get(1).name() + " = " + UnitTable.format(second.value(j),
                        secondUnit), x, y));
            }
        }
        double limit = metric instanceof RequirementValue req ? display(req.limit(), yUnit) : Double.NaN;
        String xName = r.parameters().get(0).name();
        return new SweepFigure(metric.name() + " over " + xName, withUnit(xName, xUnit), label(metric), curves, limit,
                display(r.nominalParameters()[0], xUnit));
    }

    /** The metric's name and its display unit, e.g. {@code contour[circle R100 F3 CCW].G (µm)}. */
    public static String label(StudyMetric metric) {
        return withUnit(metric.name(), metric.displayUnit());
    }

    private static String withUnit(String name, String unit) {
        return unit.isEmpty() || "1".equals(unit) ? name : name + " (" + unit + ")";
    }

    /** An SI value as a number in a display unit, without the unit; "—" when not computable. */
    public static String number(double si, String unit) {
        if (Double.isNaN(si)) {
            return "—";
        }
        return UnitTable.find(unit).map(u -> UnitTable.formatNumber(u.fromSi(si), u.minFractionDigits()))
                .orElse(UnitTable.formatNumber(si, 0));
    }

    /** An SI value in a display unit (NaN stays NaN; an unknown unit leaves SI). */
    public static double display(double si, String unit) {
        if (Double.isNaN(si)) {
            return Double.NaN;
        }
        return UnitTable.find(unit).map(u -> u.fromSi(si)).orElse(si);
    }
}
