package org.tracewell.engine.measured;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.tracewell.engine.budget.BudgetLine;
import org.tracewell.engine.budget.ErrorClass;
import org.tracewell.engine.budget.SourceKind;

/**
 * ISO 230-2 evaluation on a small dataset whose figures are worked out by hand below (ISO 230-2:2014 definitions,
 * from memory; coverage factor 2). Deviations in µm; 3 targets × 3 approaches each way, deliberately below the
 * standard's 5 × 5 so the arithmetic stays on paper.
 */
class Iso230PositioningTest {

    /** Approaches interleaved as on a laser run: run j up over all targets, then down. */
    static final String CSV = String.join("\n",
            "# LM-3020 Y axis, ISO 230-2 positioning (hand-worked test set)",
            "# axis: Y",
            "# date: 2026-03-14",
            "target_mm,run,direction,deviation_um",
            "0,1,+,1", "100,1,+,4", "250,1,+,-2", "250,1,-,-5", "100,1,-,1", "0,1,-,-1",
            "0,2,+,2", "100,2,+,4", "250,2,+,0", "250,2,-,-3", "100,2,-,3", "0,2,-,0",
            "0,3,+,3", "100,3,+,4", "250,3,+,-1", "250,3,-,-4", "100,3,-,5", "0,3,-,1", "");

    private static final double UM = 1e-6;
    private static final double TOL = 1e-12; // exact arithmetic on small integers; only rounding remains

    @Test
    void figuresMatchTheHandWorkedValues() throws MeasuredDataException {
        PositioningEvaluation e = Iso230Positioning.evaluate(PositioningMeasurement.parse("y-iso230-2.csv", CSV));
        List<TargetStatistics> t = e.targets();
        assertEquals(3, t.size());

        // Target 0 mm: ↑ {1, 2, 3} → x̄↑ = 2, s↑ = √((1 + 0 + 1)/2) = 1; ↓ {−1, 0, 1} → x̄↓ = 0, s↓ = 1.
        //   x̄ = (2 + 0)/2 = 1, B = 2 − 0 = 2, R↑ = R↓ = 4·1 = 4, R = max(2·1 + 2·1 + 2, 4, 4) = 6.
        check(t.get(0), 0, 2, 0, 1, 1);
        assertEquals(1 * UM, t.get(0).meanBidirectional(), TOL);
        assertEquals(2 * UM, t.get(0).reversal(), TOL);
        assertEquals(6 * UM, t.get(0).repeatability(), TOL);
        // Target 100 mm: ↑ {4, 4, 4} → x̄↑ = 4, s↑ = 0; ↓ {1, 3, 5} → x̄↓ = 3, s↓ = √((4 + 0 + 4)/2) = 2.
        //   x̄ = 3.5, B = 1, R↑ = 0, R↓ = 8, R = max(0 + 4 + 1, 0, 8) = 8 (the unidirectional value governs).
        check(t.get(1), 0.1, 4, 3, 0, 2);
        assertEquals(1 * UM, t.get(1).reversal(), TOL);
        assertEquals(8 * UM, t.get(1).repeatabilityDown(), TOL);
        assertEquals(8 * UM, t.get(1).repeatability(), TOL);
        // Target 250 mm: ↑ {−2, 0, −1} → x̄↑ = −1, s↑ = 1; ↓ {−5, −3, −4} → x̄↓ = −4, s↓ = 1.
        //   x̄ = −2.5, B = 3, R = max(2 + 2 + 3, 4, 4) = 7.
        check(t.get(2), 0.25, -1, -4, 1, 1);
        assertEquals(7 * UM, t.get(2).repeatability(), TOL);

        PositioningFigures f = e.figures();
        // R↑ = max(4, 0, 4) = 4; R↓ = max(4, 8, 4) = 8; R = max(6, 8, 7) = 8.
        assertEquals(4 * UM, f.repeatabilityUp(), TOL);
        assertEquals(8 * UM, f.repeatabilityDown(), TOL);
        assertEquals(8 * UM, f.repeatability(), TOL);
        // B = max |B_i| = max(2, 1, 3) = 3; mean reversal B̄ = (2 + 1 + 3)/3 = 2.
        assertEquals(3 * UM, f.reversal(), TOL);
        assertEquals(2 * UM, f.meanReversal(), TOL);
        // E↑ = 4 − (−1) = 5; E↓ = 3 − (−4) = 7; E = max(2, 4, −1, 0, 3, −4) − min(…) = 4 − (−4) = 8.
        assertEquals(5 * UM, f.systematicUp(), TOL);
        assertEquals(7 * UM, f.systematicDown(), TOL);
        assertEquals(8 * UM, f.systematic(), TOL);
        // M = max x̄_i − min x̄_i = 3.5 − (−2.5) = 6.
        assertEquals(6 * UM, f.meanRange(), TOL);
        // A↑: x̄↑ + 2s↑ = {4, 4, 1}, x̄↑ − 2s↑ = {0, 4, −3} → 4 − (−3) = 7.
        // A↓: x̄↓ + 2s↓ = {2, 7, −2}, x̄↓ − 2s↓ = {−2, −1, −6} → 7 − (−6) = 13.
        // A: max(4, 7) − min(−3, −6) = 13.
        assertEquals(7 * UM, f.accuracyUp(), TOL);
        assertEquals(13 * UM, f.accuracyDown(), TOL);
        assertEquals(13 * UM, f.accuracy(), TOL);

        // Fewer targets and approaches than the standard asks for (5 each, ISO 230-2, from memory) are noted.
        assertEquals(2, e.notes().size(), e.notes().toString());
        assertTrue(e.notes().get(0).contains("3 target positions"), e.notes().get(0));
    }

    private static void check(TargetStatistics t, double targetM, double meanUpUm, double meanDownUm, double sUpUm,
            double sDownUm) {
        assertEquals(targetM, t.target(), 1e-15);
        assertEquals(meanUpUm * UM, t.meanUp(), TOL);
        assertEquals(meanDownUm * UM, t.meanDown(), TOL);
        assertEquals(sUpUm * UM, t.standardUncertaintyUp(), TOL);
        assertEquals(sDownUm * UM, t.standardUncertaintyDown(), TOL);
    }

    @Test
    void figuresBecomeBudgetLinesWithFileAndDateAsEvidence() throws MeasuredDataException {
        PositioningEvaluation e = Iso230Positioning.evaluate(PositioningMeasurement.parse("y-iso230-2.csv", CSV));
        BudgetLine systematic = MeasuredBudgetLines.positioning("y-e", "Y", e, PositioningFigure.SYSTEMATIC);
        assertEquals(SourceKind.MEASURED, systematic.source());
        assertEquals(ErrorClass.SYSTEMATIC, systematic.errorClass());
        assertEquals("y-iso230-2.csv, 2026-03-14", systematic.evidence());
        assertEquals(8 * UM, systematic.contribution(2), TOL); // systematic: the value itself, E = 8 µm
        BudgetLine repeat = MeasuredBudgetLines.positioning("y-r", "Y", e, PositioningFigure.REPEATABILITY_DOWN);
        assertEquals(ErrorClass.RANDOM, repeat.errorClass());
        // R↓ = 4·s = 8 µm stated at k = 4 → u = 2 µm (= s_i↓ at 100 mm); at the budget's k = 2 it contributes 4 µm
        // (GUM, JCGM 100:2008 normal conversion u = value/k, from memory).
        assertEquals(2 * UM, repeat.standardUncertainty(), TOL);
        assertEquals(4 * UM, repeat.contribution(2), TOL);
    }

    @Test
    void missingRunOrDirectionIsReportedWithItsLine() {
        String missing = CSV.replace("0,3,-,1\n", "");
        MeasuredDataException e = org.junit.jupiter.api.Assertions.assertThrows(MeasuredDataException.class,
                () -> PositioningMeasurement.parse("y.csv", missing));
        assertTrue(e.getMessage().contains("target 0 mm, direction - has runs [1, 2]"), e.getMessage());
        String twice = CSV.replace("0,3,-,1", "0,2,-,1");
        e = org.junit.jupiter.api.Assertions.assertThrows(MeasuredDataException.class,
                () -> PositioningMeasurement.parse("y.csv", twice));
        assertEquals(22, e.line());
        assertEquals(3, e.column()); // the run field
        assertTrue(e.getMessage().startsWith("y.csv:22:3: run 2 in direction - at target 0 mm given twice"),
                e.getMessage());
        e = org.junit.jupiter.api.Assertions.assertThrows(MeasuredDataException.class,
                () -> PositioningMeasurement.parse("y.csv", CSV.replace("100,2,+,4", "100,2,up,4")));
        assertEquals(12, e.line());
        assertEquals(7, e.column());
        assertTrue(e.getMessage().contains("'up'") && e.getMessage().contains("'+'"), e.getMessage());
    }
}
