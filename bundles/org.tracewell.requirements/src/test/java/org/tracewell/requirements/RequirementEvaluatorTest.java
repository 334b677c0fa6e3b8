package org.tracewell.requirements;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.tracewell.core.analysis.MachineAnalysis;
import org.tracewell.model.Machine;

class RequirementEvaluatorTest {

    static Machine machine;
    static MachineAnalysis analysis;
    static RequirementReport report;

    @BeforeAll
    static void evaluate() throws Exception {
        machine = ExampleMachines.lm3020();
        analysis = ExampleMachines.analyse(machine);
        report = ExampleMachines.evaluate(machine, analysis);
    }

    @Test
    void marginsByHand() {
        // at most: margin = limit − value; at least: value − limit (definition of a signed margin).
        assertEquals(15.0e-6, RequirementEvaluator.margin(10.0e-6, 25.0e-6, false), 1e-18);
        assertEquals(-5.0e-6, RequirementEvaluator.margin(30.0e-6, 25.0e-6, false), 1e-18);
        assertEquals(0.5, RequirementEvaluator.margin(2.5, 2.0, true), 1e-15);
    }

    @Test
    void followingErrorRequirementUsesTheParentsContour() {
        RequirementResult fe = report.result("lm3020-r2-x1-fe").orElseThrow();
        // Line at 45°, 10 m/min: axis velocity 0.1667·cos45° = 0.1179 m/s; v/Kv = 0.1179/40 = 2.95 mm (plus the
        // velocity-loop lag during the ramp); limit 4.5 mm → margin ≈ 1.5 mm, 33 % (hand computation, 5 % tolerance).
        assertEquals(RequirementStatus.MET, fe.status());
        assertEquals(2.95e-3, fe.value().getAsDouble(), 0.05 * 2.95e-3);
        assertEquals(100 * (4.5e-3 - fe.value().getAsDouble()) / 4.5e-3, fe.marginPercent().getAsDouble(), 1e-9);
        assertEquals("contour 'line 45° F10' · peak following error of X1", fe.governing().orElseThrow().describe());
    }

    @Test
    void gainMarginShownInDecibels() {
        RequirementResult gm = report.result("lm3020-r1-y-gm").orElseThrow();
        // Limit stored as the ratio 1.9953 = 6 dB (20·log10).
        assertEquals(6.0, gm.displayLimit(), 1e-6);
        assertEquals(gm.displayValue().getAsDouble() - 6.0, gm.displayMargin().getAsDouble(), 1e-9);
    }

    @Test
    void traceLinksParentChildrenAndResults() {
        RequirementResult g = report.result("lm3020-r1").orElseThrow();
        assertTrue(g.machineLevel());
        assertEquals(List.of("lm3020-r1-x1-kv", "lm3020-r1-y-kv", "lm3020-r1-x1-pm", "lm3020-r1-y-pm",
                "lm3020-r1-y-gm"), g.childIds());
        // two circle contours × CW and CCW, plus the error budget that rolls every contributor up
        assertEquals(5, g.verifiedBy().size());
        assertEquals(4, g.verifiedBy().stream().filter(v -> v.resultName().equals("circular deviation G")).count());
        // the budget total (servo + mismatch tolerance + geometric + thermal + …) exceeds the servo-only G,
        // so it governs the requirement's value
        assertEquals("budget", g.governing().orElseThrow().elementKind());
        assertEquals("lm3020-r1", report.result("lm3020-r1-y-kv").orElseThrow().parentId().orElseThrow());
        assertTrue(report.coverage().isEmpty(), report.coverage().toString());
    }

    @Test
    void complianceMatrixRowsAreMachineRequirements() {
        ComplianceMatrix m = report.matrix();
        assertEquals(List.of("lm3020-r1", "lm3020-r2"), m.rowRequirementIds());
        int y = m.columnAxisNames().indexOf("Y");
        assertEquals(List.of("lm3020-r1-y-kv", "lm3020-r1-y-pm", "lm3020-r1-y-gm"), m.cell(0, y).requirementIds());
        int z = m.columnAxisNames().indexOf("Z");
        assertTrue(m.cell(0, z).isEmpty());
    }

    @Test
    void apportionmentAndInverseDesign() {
        RequirementApportionment a = report.apportionments().get(0);
        assertEquals("lm3020-r1", a.requirementId());
        assertFalse(a.items().isEmpty());
        DerivedRequirement d = report.derived().stream().filter(r -> r.parentId().equals("lm3020-r1")).findFirst()
                .orElseThrow();
        // G ≈ F·Δ(1/Kv) (Kakino et al. 1993, from memory), with only the headroom the budget leaves: the
        // design's mismatch line is 0 (matched Kv) and systematic, so under "systematic sum plus random RSS" the
        // headroom is linear: Δ ≤ (0.9·25 µm − budget total) / 0.05 m/s.
        double total = report.result("lm3020-r1").orElseThrow().value().getAsDouble();
        assertEquals((0.9 * 25e-6 - total) / 0.05, d.limit().value(), 1e-12);
        assertTrue(d.statement().contains("headroom"), d.statement());
        assertTrue(d.currentlySatisfied());
    }
}
