package org.tracewell.requirements;

import java.nio.file.Path;

import org.tracewell.core.analysis.CancellationFlag;
import org.tracewell.core.analysis.MachineAnalysis;
import org.tracewell.core.analysis.MachineAnalyzer;
import org.tracewell.core.analysis.MachineBudgets;
import org.tracewell.core.analysis.ProgressListener;
import org.tracewell.core.io.ModelFiles;
import org.tracewell.core.mapping.EngineMapping;
import org.tracewell.model.Machine;

/** The demo machine and the pipeline the requirement tests run it through. */
final class ExampleMachines {

    private ExampleMachines() {
    }

    static Machine lm3020() throws Exception {
        return new ModelFiles().loadMachine(Path.of(System.getProperty("tracewell.examples", "examples"))
                .resolve("LM-3020.machine"));
    }

    static MachineAnalysis analyse(Machine machine) throws Exception {
        return MachineAnalyzer.analyze(EngineMapping.map(machine), ProgressListener.SILENT, CancellationFlag.create());
    }

    /** Requirement evaluation of {@code machine} against {@code analysis} (which may be of another version). */
    static RequirementReport evaluate(Machine machine, MachineAnalysis analysis) {
        return RequirementEvaluator.evaluate(machine, analysis, MachineBudgets.build(machine, analysis));
    }
}
