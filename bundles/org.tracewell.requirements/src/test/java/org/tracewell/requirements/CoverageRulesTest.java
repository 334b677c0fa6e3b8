package org.tracewell.requirements;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.eclipse.emf.ecore.util.EcoreUtil;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.tracewell.core.analysis.MachineAnalysis;
import org.tracewell.model.Machine;
import org.tracewell.model.Requirement;
import org.tracewell.model.RequirementKind;
import org.tracewell.model.TracewellFactory;

/**
 * The three trace-coverage rules, each provoked on a copy of the example: a machine requirement with no
 * allocation, an allocation no computed result verifies, and an orphan derived from a requirement outside the
 * machine.
 */
class CoverageRulesTest {

    static Machine machine;
    static MachineAnalysis analysis;

    @BeforeAll
    static void load() throws Exception {
        machine = ExampleMachines.lm3020();
        analysis = ExampleMachines.analyse(machine);
    }

    private static List<CoverageFinding> coverage(Machine m) {
        return ExampleMachines.evaluate(m, analysis).coverage();
    }

    @Test
    void exampleIsFullyCovered() {
        assertEquals(List.of(), coverage(machine));
    }

    @Test
    void machineRequirementWithoutAllocation() {
        Machine m = EcoreUtil.copy(machine);
        Requirement lone = TracewellFactory.eINSTANCE.createRequirement();
        lone.setId("lm3020-r9");
        lone.setStatement("Max contour error at most 60 µm on the 45° line.");
        lone.setKind(RequirementKind.CONTOUR_DEVIATION);
        lone.setLimit(60e-6);
        lone.getContours().add(m.getContours().stream().filter(c -> c.getId().equals("lm3020-line-45")).findFirst()
                .orElseThrow());
        m.getRequirements().add(lone);
        List<CoverageFinding> findings = coverage(m);
        assertEquals(1, findings.size(), findings.toString());
        assertEquals(CoverageFinding.Kind.MACHINE_REQUIREMENT_WITHOUT_ALLOCATION, findings.get(0).kind());
        assertEquals("lm3020-r9", findings.get(0).requirementId());
    }

    @Test
    void allocationWithoutVerification() {
        Machine m = EcoreUtil.copy(machine);
        Requirement kv = m.getRequirements().stream().filter(r -> r.getId().equals("lm3020-r1-y-kv")).findFirst()
                .orElseThrow();
        kv.setAllocatedAxis(null); // a Kv requirement with no axis has nothing to be verified by
        List<CoverageFinding> findings = coverage(m);
        assertTrue(findings.stream().anyMatch(f -> f.kind() == CoverageFinding.Kind.ALLOCATION_WITHOUT_VERIFICATION
                && f.requirementId().equals("lm3020-r1-y-kv")), findings.toString());
    }

    @Test
    void orphanDerivedFromARequirementOutsideTheMachine() {
        Machine m = EcoreUtil.copy(machine);
        Requirement outside = TracewellFactory.eINSTANCE.createRequirement();
        outside.setId("lm2515-r1");
        outside.setKind(RequirementKind.CONTOUR_DEVIATION);
        outside.setLimit(30e-6);
        Requirement fe = m.getRequirements().stream().filter(r -> r.getId().equals("lm3020-r2-x1-fe")).findFirst()
                .orElseThrow();
        fe.setParent(outside);
        List<CoverageFinding> findings = coverage(m);
        assertTrue(findings.stream().anyMatch(f -> f.kind() == CoverageFinding.Kind.ORPHAN
                && f.requirementId().equals("lm3020-r2-x1-fe") && f.message().contains("lm2515-r1")),
                findings.toString());
        // r2 has lost its only child: it is now unallocated as well
        assertTrue(findings.stream().anyMatch(f -> f.kind() == CoverageFinding.Kind.MACHINE_REQUIREMENT_WITHOUT_ALLOCATION
                && f.requirementId().equals("lm3020-r2")), findings.toString());
    }
}
