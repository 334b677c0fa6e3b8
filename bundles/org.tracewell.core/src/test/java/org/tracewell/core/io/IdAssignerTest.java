package org.tracewell.core.io;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.tracewell.core.Examples;
import org.tracewell.model.Axis;
import org.tracewell.model.Machine;
import org.tracewell.model.TracewellFactory;
import org.tracewell.model.TracewellPackage.Literals;

class IdAssignerTest {

    @Test
    void newElementGetsTheIdsSavingWouldGiveAndNeverAnExistingOne() throws Exception {
        Machine machine = new ModelFiles().loadMachine(Examples.file(Examples.LM_3020));
        Axis axis = TracewellFactory.eINSTANCE.createAxis();
        axis.setName("Y");
        axis.setPlant(TracewellFactory.eINSTANCE.createRigidScrewDrive());
        axis.setEncoder(TracewellFactory.eINSTANCE.createEncoder());
        IdAssigner.assignNewIds(axis, machine, Literals.MACHINE__AXES, machine.eResource());
        // "lm3020-y" is taken by the existing Y axis: the next free one, then the children below it.
        assertEquals("lm3020-y-2", axis.getId());
        assertEquals("lm3020-y-2-plant", axis.getPlant().getId());
        assertEquals("lm3020-y-2-encoder", axis.getEncoder().getId());

        var line = TracewellFactory.eINSTANCE.createBudgetLine();
        line.setId("kept");
        IdAssigner.assignNewIds(line, machine, Literals.MACHINE__BUDGET_LINES, machine.eResource());
        assertEquals("kept", line.getId(), "existing ids are never changed");
        var requirement = TracewellFactory.eINSTANCE.createRequirement();
        IdAssigner.assignNewIds(requirement, machine, Literals.MACHINE__REQUIREMENTS, machine.eResource());
        assertEquals("lm3020-requirements", requirement.getId());
    }
}
