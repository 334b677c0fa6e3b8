package org.tracewell.requirements;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.tracewell.core.analysis.CancellationFlag;
import org.tracewell.core.analysis.MachineAnalysis;
import org.tracewell.core.analysis.MachineAnalyzer;
import org.tracewell.core.analysis.MachineBudgets;
import org.tracewell.core.analysis.ProgressListener;
import org.tracewell.core.io.ModelFiles;
import org.tracewell.core.mapping.EngineMapping;
import org.tracewell.core.variation.MachineVariantModel;
import org.tracewell.model.Machine;
import org.tracewell.model.Requirement;

/**
 * A study's requirement values come from the same pieces as the design review, assembled for speed; for the nominal
 * machine they must be the review's values. The reference is {@link RequirementEvaluator} on a full analysis.
 */
class StudyAgreesWithReviewTest {

    @ParameterizedTest
    @ValueSource(strings = {"LM-3020.machine", "LM-T5.machine"})
    void nominalRequirementValuesAreTheReviewsValues(String file) throws Exception {
        Machine machine = new ModelFiles().loadMachine(Path.of(System.getProperty("tracewell.examples", "examples"))
                .resolve(file));
        MachineAnalysis analysis = MachineAnalyzer.analyze(EngineMapping.map(machine), ProgressListener.SILENT,
                CancellationFlag.create());
        RequirementReport report = RequirementEvaluator.evaluate(machine, analysis,
                MachineBudgets.build(machine, analysis));
        String anyAxis = "axis[" + machine.getAxes().get(0).getName() + "].plant.viscousFriction";
        MachineVariantModel model = new MachineVariantModel(machine, List.of(anyAxis), List.of());
        double[] values = model.evaluate(model.nominal());
        List<Requirement> requirements = machine.getRequirements();
        assertEquals(requirements.size(), values.length);
        for (int i = 0; i < values.length; i++) {
            RequirementResult review = report.result(requirements.get(i).getId()).orElseThrow();
            if (review.value().isEmpty()) {
                assertTrue(Double.isNaN(values[i]), review.id() + " is not evaluated by the review, so not by the study");
                continue;
            }
            double expected = review.value().getAsDouble();
            // same figures from the same code: agreement to rounding
            assertEquals(expected, values[i], 1e-12 * Math.abs(expected), file + " " + review.id());
        }
    }
}
