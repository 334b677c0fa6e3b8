package org.tracewell.core.validation;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;

import org.eclipse.emf.common.util.Diagnostic;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EValidator;
import org.eclipse.emf.ecore.impl.EValidatorRegistryImpl;
import org.eclipse.emf.ecore.util.Diagnostician;
import org.eclipse.emf.ecore.util.EcoreUtil;
import org.tracewell.core.io.ModelFiles;
import org.tracewell.core.io.SourcePosition;
import org.tracewell.model.Axis;
import org.tracewell.model.Machine;
import org.tracewell.model.TracewellPackage;

/**
 * Runs {@link TracewellValidator} (with EMF's structural checks) over a machine and the library axes it references,
 * and turns the EMF diagnostics into {@link ValidationProblem}s with file positions. Uses its own validator registry,
 * so no global state is needed; the workbench may register {@link TracewellValidator#INSTANCE} globally for markers.
 */
public final class ModelValidation {

    private final Diagnostician diagnostician;

    public ModelValidation() {
        EValidator.Registry registry = new EValidatorRegistryImpl();
        registry.put(TracewellPackage.eINSTANCE, TracewellValidator.INSTANCE);
        this.diagnostician = new Diagnostician(registry);
    }

    /** Validates a machine (or an axis file's axis), including every library axis a machine references. */
    public List<ValidationProblem> validate(EObject root) {
        Set<EObject> roots = new LinkedHashSet<>();
        roots.add(root);
        if (root instanceof Machine machine) {
            for (Axis axis : machine.getLibraryAxes()) {
                if (!axis.eIsProxy()) {
                    roots.add(EcoreUtil.getRootContainer(axis));
                }
            }
        }
        List<ValidationProblem> problems = new ArrayList<>();
        for (EObject each : roots) {
            collect(diagnostician.validate(each), problems);
        }
        return problems;
    }

    /** True when the problems contain at least one error. */
    public static boolean hasErrors(List<ValidationProblem> problems) {
        return problems.stream().anyMatch(p -> p.severity() == ValidationProblem.Severity.ERROR);
    }

    private static void collect(Diagnostic diagnostic, List<ValidationProblem> problems) {
        if (diagnostic.getChildren().isEmpty()) {
            if (diagnostic.getSeverity() >= Diagnostic.WARNING) {
                problems.add(toProblem(diagnostic));
            }
            return;
        }
        for (Diagnostic child : diagnostic.getChildren()) {
            collect(child, problems);
        }
    }

    private static ValidationProblem toProblem(Diagnostic diagnostic) {
        EObject element = diagnostic.getData().isEmpty() || !(diagnostic.getData().get(0) instanceof EObject e) ? null
                : e;
        Optional<SourcePosition> position = element == null ? Optional.empty() : ModelFiles.positionOf(element);
        ValidationProblem.Severity severity = diagnostic.getSeverity() >= Diagnostic.ERROR
                ? ValidationProblem.Severity.ERROR
                : ValidationProblem.Severity.WARNING;
        String code = TracewellValidator.DIAGNOSTIC_SOURCE.equals(diagnostic.getSource())
                ? TracewellValidator.codeName(diagnostic.getCode())
                : "emf." + diagnostic.getCode();
        String message = TracewellValidator.DIAGNOSTIC_SOURCE.equals(diagnostic.getSource()) || element == null
                ? diagnostic.getMessage()
                : TracewellValidator.describe(element) + ": " + diagnostic.getMessage();
        return new ValidationProblem(severity, code, element, position, message);
    }
}
