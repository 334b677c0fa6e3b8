package org.tracewell.engine.budget;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/** Apportionment of the LM-3020 target G ≤ 25 µm (demo scenario) among axes and categories. */
class ApportionmentTest {

    private static final double UM = 1e-6;
    private static final double TOL = 1e-12 * UM;
    private static final BudgetTarget LM3020_G = new BudgetTarget(25.0 * UM, 0.20);

    private static final List<AllocationItem> MIXED = List.of(
            new AllocationItem("servo", 3.0, ErrorClass.SYSTEMATIC),
            new AllocationItem("geometric", 2.0, ErrorClass.SYSTEMATIC),
            new AllocationItem("thermal", 1.0, ErrorClass.RANDOM),
            new AllocationItem("quantisation", 0.5, ErrorClass.RANDOM),
            new AllocationItem("spare", 0.0, ErrorClass.RANDOM));

    @ParameterizedTest
    @EnumSource(CombinationMethod.class)
    void allocationsCombineToTheTargetLessReserve(CombinationMethod method) {
        Apportionment apportionment = Apportionment.apportion(LM3020_G, method, MIXED);
        // Round trip: (1 − 0.20)·25 µm = 20 µm, to rounding.
        assertEquals(20.0 * UM, apportionment.allowedTotal(), TOL);
        assertEquals(20.0 * UM, apportionment.combinedTotal(), TOL);
        // Allocations are proportional to the weights.
        assertEquals(1.5 * apportionment.allocationFor("geometric").allocated(),
                apportionment.allocationFor("servo").allocated(), TOL);
        assertEquals(0.0, apportionment.allocationFor("spare").allocated());
    }

    @ParameterizedTest
    @EnumSource(CombinationMethod.class)
    void aBudgetFilledToItsAllocationsIsMet(CombinationMethod method) {
        Apportionment apportionment = Apportionment.apportion(LM3020_G, method, MIXED);
        List<BudgetLine> lines = apportionment.allocations().stream().map(a -> new BudgetLine(a.item().name(),
                a.item().name(), null, SourceKind.USER_ENTERED, a.allocated(), ValueOrigin.ENTERED,
                a.item().errorClass(), Distribution.NORMAL, 2.0, 1.0, "allocation")).toList();
        BudgetEvaluation evaluation = ErrorBudget.of("filled", method, lines).evaluate(LM3020_G);
        assertEquals(20.0 * UM, evaluation.total(), TOL);
        assertEquals(BudgetStatus.MET, evaluation.status());
        assertEquals(5.0 * UM, evaluation.comparison().orElseThrow().margin(), TOL);
    }

    @Test
    void closedFormsOfLinearAndRss() {
        List<String> axes = List.of("X1", "X2", "Y", "Z");
        // Equal linear split: 20 µm / 4 = 5 µm each [der].
        Apportionment linear = Apportionment.apportionEqually(LM3020_G, CombinationMethod.LINEAR_SUM, axes,
                ErrorClass.SYSTEMATIC);
        linear.allocations().forEach(a -> assertEquals(5.0 * UM, a.allocated(), TOL));
        // Equal RSS split: 20 µm / √4 = 10 µm each [der].
        Apportionment rss = Apportionment.apportionEqually(LM3020_G, CombinationMethod.RSS, axes,
                ErrorClass.RANDOM);
        rss.allocations().forEach(a -> assertEquals(10.0 * UM, a.allocated(), TOL));
        // Weighted RSS 3:4 → a = w·20/5 → 12 and 16 µm (3-4-5 triangle) [der].
        Apportionment weighted = Apportionment.apportion(LM3020_G, CombinationMethod.RSS, List.of(
                new AllocationItem("X", 3, ErrorClass.RANDOM), new AllocationItem("Y", 4, ErrorClass.RANDOM)));
        assertEquals(12.0 * UM, weighted.allocationFor("X").allocated(), TOL);
        assertEquals(16.0 * UM, weighted.allocationFor("Y").allocated(), TOL);
    }

    @Test
    void systematicPlusRssTakesEachItemsClassIntoAccount() {
        // Weights 3, 2 systematic and 3, 4 random → λ = 20/(5 + 5) = 2 µm per unit weight [der].
        Apportionment apportionment = Apportionment.apportion(LM3020_G, CombinationMethod.SYSTEMATIC_PLUS_RSS,
                List.of(new AllocationItem("servo", 3, ErrorClass.SYSTEMATIC),
                        new AllocationItem("geometric", 2, ErrorClass.SYSTEMATIC),
                        new AllocationItem("thermal", 3, ErrorClass.RANDOM),
                        new AllocationItem("quantisation", 4, ErrorClass.RANDOM)));
        assertEquals(2.0 * UM, apportionment.scale(), TOL);
        assertEquals(6.0 * UM, apportionment.allocationFor("servo").allocated(), TOL);
        assertEquals(8.0 * UM, apportionment.allocationFor("quantisation").allocated(), TOL);
        assertTrue(apportionment.formula().contains("Σ_systematic w"));
    }

    @Test
    void meanMethodClosedFormAgreesWithANumericalRoot() {
        Apportionment apportionment = Apportionment.apportion(LM3020_G, CombinationMethod.MEAN_OF_LINEAR_AND_RSS,
                MIXED);
        // Independent numerics: solve (Σ λw + √Σ(λw)²)/2 = T' for λ with Commons Math's Brent solver.
        double sumW = MIXED.stream().mapToDouble(AllocationItem::weight).sum();
        double rootW = Math.sqrt(MIXED.stream().mapToDouble(i -> i.weight() * i.weight()).sum());
        double allowedUm = 20.0;
        double lambdaUm = new BrentSolver(1e-14).solve(100,
                lambda -> 0.5 * (lambda * sumW + lambda * rootW) - allowedUm, 0.0, 100.0);
        assertEquals(lambdaUm * UM, apportionment.scale(), 1e-12 * UM);
    }

    @Test
    void invalidInputsNameTheBadValueAndTheValidRange() {
        IllegalArgumentException negative = assertThrows(IllegalArgumentException.class,
                () -> new AllocationItem("Y", -2.0, ErrorClass.RANDOM));
        assertTrue(negative.getMessage().contains("weight of allocation item Y = -2.0"), negative.getMessage());
        assertTrue(negative.getMessage().contains(">= 0"), negative.getMessage());

        IllegalArgumentException empty = assertThrows(IllegalArgumentException.class,
                () -> Apportionment.apportion(LM3020_G, CombinationMethod.RSS, List.of()));
        assertTrue(empty.getMessage().contains("allocation items = []"), empty.getMessage());
        assertTrue(empty.getMessage().contains("at least one"), empty.getMessage());

        IllegalArgumentException zeros = assertThrows(IllegalArgumentException.class,
                () -> Apportionment.apportion(LM3020_G, CombinationMethod.LINEAR_SUM, List.of(
                        new AllocationItem("X", 0, ErrorClass.RANDOM), new AllocationItem("Y", 0, ErrorClass.RANDOM))));
        assertTrue(zeros.getMessage().contains("[0.0, 0.0]"), zeros.getMessage());
        assertTrue(zeros.getMessage().contains("> 0"), zeros.getMessage());

        IllegalArgumentException duplicate = assertThrows(IllegalArgumentException.class,
                () -> Apportionment.apportionEqually(LM3020_G, CombinationMethod.RSS, List.of("X", "X"),
                        ErrorClass.RANDOM));
        assertTrue(duplicate.getMessage().contains("\"X\""), duplicate.getMessage());

        for (double bad : new double[] {-0.1, 1.0, 1.5, Double.NaN}) {
            IllegalArgumentException reserve = assertThrows(IllegalArgumentException.class,
                    () -> new BudgetTarget(25 * UM, bad));
            assertTrue(reserve.getMessage().contains("reserve fraction = " + bad), reserve.getMessage());
            assertTrue(reserve.getMessage().contains("[0, 1)"), reserve.getMessage());
        }

        IllegalArgumentException unknown = assertThrows(IllegalArgumentException.class,
                () -> Apportionment.apportion(LM3020_G, CombinationMethod.RSS, MIXED).allocationFor("Z"));
        assertTrue(unknown.getMessage().contains("\"Z\""), unknown.getMessage());
    }
}
