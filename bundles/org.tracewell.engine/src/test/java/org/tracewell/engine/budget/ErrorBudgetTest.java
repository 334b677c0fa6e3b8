package org.tracewell.engine.budget;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

/** Budget of the LM-T5 circular test in XY (demo scenario: G ≤ 8 µm at 2 m/min, R = 50 mm). */
class ErrorBudgetTest {

    private static final double UM = 1e-6;
    /** Relative rounding tolerance for sums of a handful of µm-sized doubles. */
    private static final double TOL = 1e-12 * UM;

    private static final BudgetLine MISMATCH = BudgetLine.systematic("mismatch-xy", "Kv mismatch X/Y", null,
            SourceKind.GAIN_MISMATCH, 2.0 * UM, "circle test simulation, R 50 mm, F 2 m/min");
    private static final BudgetLine SQUARENESS = BudgetLine.systematic("squareness-xy", "XY squareness", null,
            SourceKind.GEOMETRIC, -2.5 * UM, "alignment report");
    private static final BudgetLine THERMAL = BudgetLine.systematic("thermal-x", "X screw growth", "X",
            SourceKind.THERMAL, 1.5 * UM, "estimate").withSensitivity(-0.5);
    private static final BudgetLine ENCODER_X = new BudgetLine("quant-x", "X encoder", "X",
            SourceKind.QUANTISATION, 1.0 * UM, ValueOrigin.COMPUTED, ErrorClass.RANDOM, Distribution.QUANTISATION,
            2.0, 1.0, "encoder step 1 µm");
    private static final BudgetLine FRICTION_Y = BudgetLine.random("friction-y", "Y reversal spikes", "Y",
            SourceKind.FRICTION_REVERSAL, 1.2 * UM, "tracking simulation, k = 2");

    private static ErrorBudget budget(CombinationMethod method) {
        return ErrorBudget.of("LM-T5 circle G", method, List.of(MISMATCH, SQUARENESS, THERMAL, ENCODER_X, FRICTION_Y));
    }

    @Test
    void contributionsFollowTheCoverageConvention() {
        BudgetEvaluation evaluation = budget(CombinationMethod.SYSTEMATIC_PLUS_RSS).evaluate();
        // Systematic: |s·v| (sign of value and sensitivity ignored).
        assertEquals(2.5 * UM, evaluation.contributionOf("squareness-xy").contribution(), TOL);
        assertEquals(0.75 * UM, evaluation.contributionOf("thermal-x").contribution(), TOL);
        // Random quantisation step q at budget k = 2: 2·q/√12 (JCGM 100:2008, from memory).
        assertEquals(2.0 * UM / Math.sqrt(12.0), evaluation.contributionOf("quant-x").contribution(), TOL);
        assertEquals(UM / Math.sqrt(12.0), evaluation.contributionOf("quant-x").standardUncertainty(), TOL);
        // A normal line stated at k = 2 in a k = 2 budget contributes its stated value unchanged.
        assertEquals(1.2 * UM, evaluation.contributionOf("friction-y").contribution(), TOL);

        double systematic = (2.0 + 2.5 + 0.75) * UM;
        double randomU = Math.sqrt(Math.pow(2.0 / Math.sqrt(12.0), 2) + 1.2 * 1.2) * UM;
        assertEquals(systematic, evaluation.systematicSum(), TOL);
        assertEquals(randomU, evaluation.randomExpandedUncertainty(), TOL);
        assertEquals(randomU / 2.0, evaluation.combinedStandardUncertainty(), TOL);
        assertEquals(systematic + randomU, evaluation.total(), TOL);
    }

    @Test
    void coverageFactorRescalesRandomLinesOnly() {
        BudgetEvaluation atTwo = budget(CombinationMethod.SYSTEMATIC_PLUS_RSS).evaluate();
        BudgetEvaluation atThree = budget(CombinationMethod.SYSTEMATIC_PLUS_RSS).withCoverageFactor(3.0).evaluate();
        assertEquals(atTwo.systematicSum(), atThree.systematicSum(), TOL);
        assertEquals(1.5 * atTwo.randomExpandedUncertainty(), atThree.randomExpandedUncertainty(), TOL);
        assertEquals(atTwo.combinedStandardUncertainty(), atThree.combinedStandardUncertainty(), TOL);
        assertEquals(1.8 * UM, atThree.contributionOf("friction-y").contribution(), TOL);
    }

    @Test
    void totalsByEveryMethodFromTheSameContributions() {
        double[] c = {2.0, 2.5, 0.75, 2.0 / Math.sqrt(12.0), 1.2};
        double linear = 0;
        double squares = 0;
        for (double v : c) {
            linear += v;
            squares += v * v;
        }
        BudgetEvaluation evaluation = budget(CombinationMethod.RSS).evaluate();
        assertEquals(Math.sqrt(squares) * UM, evaluation.total(), TOL);
        assertEquals(linear * UM, evaluation.linearSum(), TOL);
        assertEquals(linear * UM, evaluation.totalFor(CombinationMethod.LINEAR_SUM), TOL);
        assertEquals((linear + Math.sqrt(squares)) / 2 * UM,
                evaluation.totalFor(CombinationMethod.MEAN_OF_LINEAR_AND_RSS), TOL);
        assertEquals(budget(CombinationMethod.MEAN_OF_LINEAR_AND_RSS).evaluate().total(),
                evaluation.totalFor(CombinationMethod.MEAN_OF_LINEAR_AND_RSS), TOL);
    }

    @Test
    void rankingIsLargestFirstWithSharesAddingToOne() {
        BudgetEvaluation evaluation = budget(CombinationMethod.LINEAR_SUM).evaluate();
        List<String> order = evaluation.ranking().stream().map(c -> c.line().id()).toList();
        // Linear portions 2.5, 2.0, 1.2, 0.75, 0.577 µm.
        assertEquals(List.of("squareness-xy", "mismatch-xy", "friction-y", "thermal-x", "quant-x"), order);
        assertEquals(1, evaluation.contributionOf("squareness-xy").rank());
        assertEquals(2.5 / (6.45 + 2.0 / Math.sqrt(12.0)), evaluation.ranking().get(0).share(), 1e-12);
        assertEquals(1.0, evaluation.contributions().stream().mapToDouble(LineContribution::share).sum(), 1e-12);
        // Contributions stay in line order; the ranking is a separate view.
        assertEquals("mismatch-xy", evaluation.contributions().get(0).line().id());
    }

    @Test
    void rssSharesAreVarianceShares() {
        BudgetEvaluation evaluation = budget(CombinationMethod.RSS).evaluate();
        double squares = 4.0 + 6.25 + 0.5625 + 4.0 / 12.0 + 1.44;
        assertEquals(6.25 / squares, evaluation.contributionOf("squareness-xy").share(), 1e-12);
    }

    @Test
    void equalContributionsAreRankedByIdForARepeatableOrder() {
        ErrorBudget budget = ErrorBudget.of("ties", CombinationMethod.LINEAR_SUM, List.of(
                BudgetLine.systematic("b", "b", null, SourceKind.USER_ENTERED, UM, ""),
                BudgetLine.systematic("a", "a", null, SourceKind.USER_ENTERED, UM, "")));
        assertEquals(List.of("a", "b"), budget.evaluate().ranking().stream().map(c -> c.line().id()).toList());
    }

    @Test
    void comparisonWithTargetAndReserve() {
        ErrorBudget budget = budget(CombinationMethod.SYSTEMATIC_PLUS_RSS);
        double total = budget.evaluate().total();
        BudgetEvaluation met = budget.evaluate(new BudgetTarget(8.0 * UM, 0.10));
        TargetComparison comparison = met.comparison().orElseThrow();
        assertEquals(8.0 * UM - total, comparison.margin(), TOL);
        assertEquals(100.0 * (8.0 * UM - total) / (8.0 * UM), comparison.marginPercent(), 1e-9);
        assertEquals(7.2 * UM, comparison.allowedTotal(), TOL);
        assertEquals(7.2 * UM - total, comparison.reserveMargin(), TOL);
        assertTrue(comparison.withinTarget());
        assertEquals(BudgetStatus.MET, met.status());

        // Total = 5.25 + √(1/3 + 1.44) ≈ 6.58 µm: within 8 µm but not within the 75 % left by a 25 % reserve.
        BudgetEvaluation tight = budget.evaluate(new BudgetTarget(8.0 * UM, 0.25));
        assertTrue(tight.comparison().orElseThrow().withinTarget());
        assertTrue(tight.comparison().orElseThrow().reserveMargin() < 0);
        assertEquals(BudgetStatus.VIOLATED, tight.status());

        BudgetEvaluation over = budget.evaluate(BudgetTarget.withoutReserve(5.0 * UM));
        assertFalse(over.comparison().orElseThrow().withinTarget());
        assertTrue(over.comparison().orElseThrow().margin() < 0);
        assertEquals(BudgetStatus.VIOLATED, over.status());

        assertEquals(BudgetStatus.NOT_EVALUATED, budget.evaluate().status());
    }

    @Test
    void subBudgetPerAxis() {
        ErrorBudget budget = budget(CombinationMethod.LINEAR_SUM);
        assertEquals(List.of("thermal-x", "quant-x"),
                budget.forAxis("X").lines().stream().map(BudgetLine::id).toList());
        assertEquals(List.of("mismatch-xy", "squareness-xy"),
                budget.forAxis(null).lines().stream().map(BudgetLine::id).toList());
        assertTrue(MISMATCH.isMachineWide());
        assertFalse(THERMAL.isMachineWide());
    }

    @Test
    void withCopiesLeaveTheOriginalUnchanged() {
        ErrorBudget budget = budget(CombinationMethod.LINEAR_SUM);
        ErrorBudget changed = budget.withReplacedLine(MISMATCH.withValue(4.0 * UM));
        assertEquals(2.0 * UM, budget.lines().get(0).value());
        assertEquals(4.0 * UM, changed.lines().get(0).value());
        assertEquals(budget.evaluate().total() + 2.0 * UM, changed.evaluate().total(), TOL);
        assertEquals(ValueOrigin.ENTERED, MISMATCH.withOrigin(ValueOrigin.ENTERED).origin());
        assertEquals(ValueOrigin.COMPUTED, MISMATCH.origin());
        assertEquals(ValueOrigin.ENTERED, SQUARENESS.origin());
    }

    @Test
    void emptyBudgetTotalsZero() {
        BudgetEvaluation evaluation = ErrorBudget.of("empty", CombinationMethod.RSS, List.of())
                .evaluate(new BudgetTarget(UM, 0.2));
        assertEquals(0.0, evaluation.total());
        assertEquals(BudgetStatus.MET, evaluation.status());
    }

    @Test
    void invalidLinesAndBudgetsAreRejectedNamingTheValue() {
        IllegalArgumentException negativeRandom = assertThrows(IllegalArgumentException.class,
                () -> BudgetLine.random("r1", "r", "X", SourceKind.MEASURED, -1e-6, ""));
        assertTrue(negativeRandom.getMessage().contains("r1"), negativeRandom.getMessage());
        assertTrue(negativeRandom.getMessage().contains("-1.0E-6"), negativeRandom.getMessage());
        assertTrue(negativeRandom.getMessage().contains(">= 0"), negativeRandom.getMessage());

        IllegalArgumentException nan = assertThrows(IllegalArgumentException.class,
                () -> MISMATCH.withSensitivity(Double.NaN));
        assertTrue(nan.getMessage().contains("sensitivity of budget line mismatch-xy = NaN"), nan.getMessage());

        IllegalArgumentException blankAxis = assertThrows(IllegalArgumentException.class,
                () -> BudgetLine.systematic("s", "s", " ", SourceKind.THERMAL, UM, ""));
        assertTrue(blankAxis.getMessage().contains("null for a machine-wide line"), blankAxis.getMessage());

        IllegalArgumentException duplicate = assertThrows(IllegalArgumentException.class,
                () -> ErrorBudget.of("dup", CombinationMethod.RSS, List.of(MISMATCH, MISMATCH)));
        assertTrue(duplicate.getMessage().contains("\"mismatch-xy\""), duplicate.getMessage());

        IllegalArgumentException k = assertThrows(IllegalArgumentException.class,
                () -> budget(CombinationMethod.RSS).withCoverageFactor(-1));
        assertTrue(k.getMessage().contains("= -1.0"), k.getMessage());

        IllegalArgumentException reserve = assertThrows(IllegalArgumentException.class,
                () -> new BudgetTarget(8 * UM, 1.0));
        assertTrue(reserve.getMessage().contains("reserve fraction = 1.0"), reserve.getMessage());
        assertTrue(reserve.getMessage().contains("[0, 1)"), reserve.getMessage());

        IllegalArgumentException target = assertThrows(IllegalArgumentException.class,
                () -> new BudgetTarget(0.0, 0.1));
        assertTrue(target.getMessage().contains("target = 0.0 m"), target.getMessage());

        IllegalArgumentException unknown = assertThrows(IllegalArgumentException.class,
                () -> budget(CombinationMethod.RSS).evaluate().contributionOf("nope"));
        assertTrue(unknown.getMessage().contains("\"nope\""), unknown.getMessage());
    }

    @Test
    void methodStatementIsPrintable() {
        String statement = budget(CombinationMethod.SYSTEMATIC_PLUS_RSS).evaluate().methodStatement();
        assertTrue(statement.startsWith("systematic sum plus random RSS at k = 2.0"), statement);
    }
}
