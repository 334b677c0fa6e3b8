package org.tracewell.engine.measured;

import java.util.Locale;

import org.tracewell.engine.budget.BudgetLine;
import org.tracewell.engine.budget.Distribution;
import org.tracewell.engine.budget.ErrorClass;
import org.tracewell.engine.budget.SourceKind;
import org.tracewell.engine.budget.ValueOrigin;

/**
 * Measured results as error-budget lines: source {@link SourceKind#MEASURED}, origin entered (kept as measured,
 * not recomputed), sensitivity 1 (project with {@link BudgetLine#withSensitivity} where the figure is not along the
 * path normal), evidence "file name, date".
 */
public final class MeasuredBudgetLines {

    private MeasuredBudgetLines() {
    }

    /**
     * A systematic line holding a circle-test figure.
     *
     * @param axis axis name, or null for a machine-wide line (a circle test measures two axes together)
     * @throws IllegalArgumentException for G(b) when only one direction was measured
     */
    public static BudgetLine circle(String id, String axis, MeasuredCircleEvaluation evaluation, CircleFigure figure) {
        double value = switch (figure) {
            case CIRCULAR_DEVIATION -> evaluation.circularDeviation();
            case RADIAL_DEVIATION -> evaluation.radialDeviation();
            case BIDIRECTIONAL_DEVIATION -> evaluation.bidirectional().orElseThrow(() -> new IllegalArgumentException(
                    evaluation.test().source().fileName() + " holds one direction only; G(b) needs a CW and a CCW run"))
                    .bidirectionalDeviation();
        };
        MeasuredCircleTest test = evaluation.test();
        String name = String.format(Locale.ROOT, "measured %s, circle R %s mm at %s m/min", figure.displayName(),
                trim(test.radius() * 1e3), trim(test.feed() * 60));
        return new BudgetLine(id, name, axis, SourceKind.MEASURED, value, ValueOrigin.ENTERED, ErrorClass.SYSTEMATIC,
                Distribution.UNIFORM, Distribution.DEFAULT_COVERAGE_FACTOR, 1.0, test.source().evidence());
    }

    /**
     * A line holding an ISO 230-2 figure of one axis: systematic for A, B, E and M; random for R (see
     * {@link PositioningFigure}).
     */
    public static BudgetLine positioning(String id, String axis, PositioningEvaluation evaluation,
            PositioningFigure figure) {
        double value = figure.of(evaluation.figures());
        String name = "measured " + figure.displayName() + " (ISO 230-2)";
        String evidence = evaluation.measurement().source().evidence();
        if (figure.random()) {
            return new BudgetLine(id, name, axis, SourceKind.MEASURED, value, ValueOrigin.ENTERED, ErrorClass.RANDOM,
                    Distribution.NORMAL, PositioningFigure.REPEATABILITY_COVERAGE, 1.0, evidence);
        }
        return new BudgetLine(id, name, axis, SourceKind.MEASURED, value, ValueOrigin.ENTERED, ErrorClass.SYSTEMATIC,
                Distribution.UNIFORM, Distribution.DEFAULT_COVERAGE_FACTOR, 1.0, evidence);
    }

    private static String trim(double value) {
        return java.math.BigDecimal.valueOf(value).round(new java.math.MathContext(4)).stripTrailingZeros()
                .toPlainString();
    }
}
