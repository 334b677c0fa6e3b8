package org.tracewell.requirements;

import java.util.function.Consumer;

import org.tracewell.core.analysis.AnalysisMemo;
import org.tracewell.core.analysis.CancellationFlag;
import org.tracewell.core.analysis.ContourResult;
import org.tracewell.core.analysis.MachineAnalysis;
import org.tracewell.core.analysis.MachineAnalyzer;
import org.tracewell.core.analysis.MachineBudget;
import org.tracewell.core.analysis.MachineBudgets;
import org.tracewell.core.analysis.ProgressListener;
import org.tracewell.core.mapping.EngineMapping;
import org.tracewell.core.mapping.MappingException;
import org.tracewell.model.Machine;

/** The whole pipeline for one machine: map, analyse, budget, evaluate requirements. */
public final class DesignReview {

    private DesignReview() {
    }

    /**
     * @param provenance where the machine came from; its contour filter limits the contours analysed
     */
    public static ReviewResults run(Machine machine, ReviewProvenance provenance, ProgressListener progress,
            CancellationFlag cancel) throws MappingException {
        return run(machine, provenance, progress, cancel, AnalysisMemo.none());
    }

    /**
     * As {@link #run(Machine, ReviewProvenance, ProgressListener, CancellationFlag)}, finding the axis analyses and
     * contour runs of unchanged inputs in {@code memo} (a workbench re-reviews after every edit).
     */
    public static ReviewResults run(Machine machine, ReviewProvenance provenance, ProgressListener progress,
            CancellationFlag cancel, AnalysisMemo memo) throws MappingException {
        return run(machine, provenance, progress, cancel, memo, contour -> { });
    }

    /**
     * As {@link #run(Machine, ReviewProvenance, ProgressListener, CancellationFlag, AnalysisMemo)}, handing each
     * contour's result to {@code contourDone} as soon as it is done (see {@link MachineAnalyzer}), before the budget
     * and the requirements, which need every contour.
     */
    public static ReviewResults run(Machine machine, ReviewProvenance provenance, ProgressListener progress,
            CancellationFlag cancel, AnalysisMemo memo, Consumer<ContourResult> contourDone) throws MappingException {
        MachineAnalysis analysis = MachineAnalyzer.analyze(EngineMapping.map(machine), provenance.contourFilter(),
                progress, cancel, memo, contourDone);
        MachineBudget budget = MachineBudgets.build(machine, analysis);
        RequirementReport requirements = RequirementEvaluator.evaluate(machine, analysis, budget);
        return new ReviewResults(analysis, budget, requirements, provenance);
    }
}
