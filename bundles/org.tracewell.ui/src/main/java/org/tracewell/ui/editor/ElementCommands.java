package org.tracewell.ui.editor;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;
import java.util.function.Supplier;

import org.eclipse.emf.common.command.Command;
import org.eclipse.emf.common.command.CommandWrapper;
import org.eclipse.emf.common.command.UnexecutableCommand;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.eclipse.emf.edit.command.CommandActionDelegate;
import org.eclipse.emf.edit.command.CommandParameter;
import org.eclipse.emf.edit.command.CreateChildCommand;
import org.eclipse.emf.edit.command.DeleteCommand;
import org.eclipse.emf.edit.command.RemoveCommand;
import org.eclipse.emf.edit.domain.EditingDomain;
import org.tracewell.core.io.IdAssigner;
import org.tracewell.core.template.MachineTemplate;
import org.tracewell.model.Axis;
import org.tracewell.model.BudgetLine;
import org.tracewell.model.Contour;
import org.tracewell.model.Machine;
import org.tracewell.model.Named;
import org.tracewell.model.Requirement;
import org.tracewell.model.TracewellFactory;
import org.tracewell.model.TracewellPackage.Literals;
import org.tracewell.model.VariationStudy;

/**
 * The commands that add and delete elements in the Machine Editor: EMF's {@link CreateChildCommand} (children the
 * item providers offer) and {@link DeleteCommand} (which also clears every reference to what it deletes) on the
 * editor's editing domain, each under a label that names the element, so Edit → Undo says what it undoes. New
 * elements get their ids at once ({@link IdAssigner}): ids are required, and the model stays valid before its first
 * save. Axes and circle tests added at the top level start complete, from the {@link MachineTemplate}.
 */
public final class ElementCommands {

    /** Axis names offered in turn for a new axis (then "Axis n"). */
    private static final List<String> AXIS_NAMES = List.of("X", "Y", "Z", "A", "B", "C", "U", "V", "W");

    private final EditingDomain domain;
    private final Supplier<MachineTemplate> template;

    /**
     * @param template gives new top-level axes and contours their starting values (loop periods, circle test); asked
     *                 at each add, so it follows the preferences
     */
    public ElementCommands(EditingDomain domain, Supplier<MachineTemplate> template) {
        this.domain = domain;
        this.template = template;
    }

    /** A labelled command, ready to execute, with the element it creates or the one it deletes. */
    public record Edit(String label, Command command) {
    }

    /** Adding a top-level element of a page ({@code Axis}, {@code Contour}, {@code Requirement}, {@code BudgetLine}). */
    public Optional<Edit> addToMachine(Machine machine, String pageTitle) {
        return switch (pageTitle) {
            case MachineEditor.AXES_PAGE -> {
                Axis axis = template.get().newAxis(freeAxisName(machine));
                yield Optional.of(create(machine, Literals.MACHINE__AXES, axis, "Add axis " + axis.getName()));
            }
            case MachineEditor.CONTOURS_PAGE -> {
                List<Axis> axes = new ArrayList<>(machine.getAxes());
                axes.addAll(machine.getLibraryAxes());
                Contour circle = template.get().circleTest(axes.size() > 0 ? axes.get(0) : null,
                        axes.size() > 1 ? axes.get(1) : null);
                yield Optional.of(create(machine, Literals.MACHINE__CONTOURS, circle, "Add contour " + circle.getName()));
            }
            case MachineEditor.REQUIREMENTS_PAGE -> {
                Requirement requirement = TracewellFactory.eINSTANCE.createRequirement();
                requirement.setStatement("New requirement: state what is required, then set kind, limit and unit.");
                requirement.setDisplayUnit("µm");
                yield Optional.of(create(machine, Literals.MACHINE__REQUIREMENTS, requirement, "Add requirement"));
            }
            case MachineEditor.BUDGET_PAGE -> {
                BudgetLine line = TracewellFactory.eINSTANCE.createBudgetLine();
                line.setName("new line");
                yield Optional.of(create(machine, Literals.MACHINE__BUDGET_LINES, line, "Add budget line"));
            }
            case MachineEditor.STUDIES_PAGE -> {
                VariationStudy study = MachineTemplate.newStudy(machine);
                yield Optional.of(create(machine, Literals.MACHINE__STUDIES, study, "Add study " + study.getName()));
            }
            default -> Optional.empty();
        };
    }

    /** What the element's item provider offers as new children (filter stages, segments, plant, controller …). */
    public List<Edit> newChildren(EObject owner) {
        List<Edit> edits = new ArrayList<>();
        Collection<?> descriptors = domain.getNewChildDescriptors(owner, null);
        for (Object descriptor : descriptors) {
            if (descriptor instanceof CommandParameter parameter && parameter.getValue() instanceof EObject child
                    && parameter.getEStructuralFeature() != null) {
                EStructuralFeature feature = parameter.getEStructuralFeature();
                Command command = CreateChildCommand.create(domain, owner, parameter, List.of(owner));
                String type = command instanceof CommandActionDelegate delegate && delegate.getText() != null
                        ? delegate.getText() : child.eClass().getName();
                boolean replaces = !feature.isMany() && owner.eGet(feature) != null;
                String label = words(feature.getName()) + ": " + type + (replaces ? " (replaces the current one)" : "");
                IdAssigner.assignNewIds(child, owner, feature, owner.eResource());
                edits.add(new Edit(label, new CommandWrapper((replaces ? "Replace " : "Add ")
                        + words(feature.getName()).toLowerCase(Locale.ROOT) + " " + type, null, command)));
            }
        }
        return edits;
    }

    /**
     * Deleting an element. A shared library axis is not deleted (its file belongs to every machine using it): the
     * machine stops referring to it. The root of the file cannot be deleted.
     */
    public Edit delete(EObject element, Machine machine, boolean libraryAxis) {
        String name = element instanceof Named named && named.getName() != null && !named.getName().isBlank()
                ? named.getName() : words(element.eClass().getName()).toLowerCase(Locale.ROOT);
        if (libraryAxis && machine != null) {
            return new Edit("Remove library axis " + name + " from " + machine.getName(), new CommandWrapper(
                    "Remove library axis " + name, null,
                    RemoveCommand.create(domain, machine, Literals.MACHINE__LIBRARY_AXES, element)));
        }
        if (element.eContainer() == null) {
            return new Edit("Delete " + name, UnexecutableCommand.INSTANCE);
        }
        return new Edit("Delete " + name, new CommandWrapper("Delete " + name, null,
                DeleteCommand.create(domain, element)));
    }

    /** Runs an edit on the command stack; returns the element it created or the parent of what it deleted. */
    public Optional<Object> execute(Edit edit) {
        if (!edit.command().canExecute()) {
            return Optional.empty();
        }
        domain.getCommandStack().execute(edit.command());
        Collection<?> affected = edit.command().getAffectedObjects();
        return affected.isEmpty() ? Optional.empty() : Optional.of(affected.iterator().next());
    }

    private Edit create(EObject owner, EStructuralFeature feature, EObject child, String label) {
        IdAssigner.assignNewIds(child, owner, feature, owner.eResource());
        Command command = CreateChildCommand.create(domain, owner, new CommandParameter(owner, feature, child),
                List.of(owner));
        return new Edit(label, new CommandWrapper(label, null, command));
    }

    /** The first of X, Y, Z, A … that no axis is named by or after (X1 and X2 take X), else "Axis n". */
    private static String freeAxisName(Machine machine) {
        Set<String> used = new TreeSet<>();
        machine.getAxes().forEach(a -> used.add(a.getName() == null ? "" : a.getName()));
        machine.getLibraryAxes().forEach(a -> used.add(a.getName() == null ? "" : a.getName()));
        for (String name : AXIS_NAMES) {
            if (used.stream().noneMatch(u -> u.startsWith(name))) {
                return name;
            }
        }
        for (int n = used.size() + 1;; n++) {
            if (!used.contains("Axis " + n)) {
                return "Axis " + n;
            }
        }
    }

    /** {@code "filterStages"} → {@code "Filter stages"}. */
    static String words(String camelCase) {
        String spaced = camelCase.replaceAll("([a-z])([A-Z])", "$1 $2").toLowerCase(Locale.ROOT);
        return spaced.isEmpty() ? spaced : Character.toUpperCase(spaced.charAt(0)) + spaced.substring(1);
    }
}
