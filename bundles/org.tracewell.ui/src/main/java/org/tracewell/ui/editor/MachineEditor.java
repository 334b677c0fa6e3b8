package org.tracewell.ui.editor;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Function;

import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.ListenerList;
import org.eclipse.emf.common.command.BasicCommandStack;
import org.eclipse.emf.common.command.Command;
import org.eclipse.emf.common.command.CommandStack;
import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.emf.edit.domain.AdapterFactoryEditingDomain;
import org.eclipse.emf.edit.domain.EditingDomain;
import org.eclipse.emf.edit.domain.IEditingDomainProvider;
import org.eclipse.emf.edit.provider.ComposedAdapterFactory;
import org.eclipse.emf.edit.provider.ReflectiveItemProviderAdapterFactory;
import org.eclipse.emf.edit.provider.resource.ResourceItemProviderAdapterFactory;
import org.eclipse.jface.action.Action;
import org.eclipse.jface.action.IAction;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.jface.viewers.ISelection;
import org.eclipse.jface.viewers.ISelectionChangedListener;
import org.eclipse.jface.viewers.ISelectionProvider;
import org.eclipse.jface.viewers.SelectionChangedEvent;
import org.eclipse.jface.viewers.StructuredSelection;
import org.eclipse.ui.IEditorInput;
import org.eclipse.ui.IEditorSite;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.PartInitException;
import org.eclipse.ui.actions.ActionFactory;
import org.eclipse.ui.part.MultiPageEditorPart;
import org.tracewell.core.io.LoadedModel;
import org.tracewell.core.io.ModelFiles;
import org.tracewell.core.io.ModelLoadException;
import org.tracewell.model.Axis;
import org.tracewell.model.Machine;
import org.tracewell.model.provider.TracewellItemProviderAdapterFactory;

/**
 * The Machine Editor: a {@code .machine} (pages Axes, Contours, Requirements, Budget) or an {@code .axis} file (page
 * Axes) as trees with a form for the selected element. Every change is an EMF command on the editor's editing domain,
 * so Edit → Undo/Redo, the dirty mark and File → Save work; saving writes each changed file atomically with a backup
 * ({@link ModelFiles}), including shared library axes edited through the machine.
 */
public final class MachineEditor extends MultiPageEditorPart implements IEditingDomainProvider {

    public static final String ID = "org.tracewell.ui.editor.machine";

    public static final String AXES_PAGE = "Axes";
    public static final String CONTOURS_PAGE = "Contours";
    public static final String REQUIREMENTS_PAGE = "Requirements";
    public static final String BUDGET_PAGE = "Budget";

    private final ModelFiles files = new ModelFiles();
    private final List<ModelPage> pages = new ArrayList<>();
    private final PageSelectionProvider selectionProvider = new PageSelectionProvider();
    private final Map<Resource, List<String>> libraryUsers = new HashMap<>();
    private ComposedAdapterFactory adapterFactory;
    private AdapterFactoryEditingDomain domain;
    private LoadedModel model;
    private ValueEntry entry;
    private StackAction undo;
    private StackAction redo;

    /** Opens {@code file} in a Machine Editor (or activates the one that has it open). */
    public static MachineEditor open(IWorkbenchPage page, Path file) throws PartInitException {
        if (page.openEditor(new MachineEditorInput(file), ID) instanceof MachineEditor editor) {
            return editor;
        }
        // The workbench shows an error part in place of an editor that failed to open; its reason is shown there.
        throw new PartInitException("The Machine Editor could not open " + file);
    }

    @Override
    public void init(IEditorSite site, IEditorInput input) throws PartInitException {
        if (!(input instanceof MachineEditorInput fileInput)) {
            throw new PartInitException("The Machine Editor opens .machine and .axis files from the file system; got "
                    + input.getClass().getSimpleName() + " " + input.getName());
        }
        super.init(site, input);
        adapterFactory = new ComposedAdapterFactory();
        adapterFactory.addAdapterFactory(new ResourceItemProviderAdapterFactory());
        adapterFactory.addAdapterFactory(new TracewellItemProviderAdapterFactory());
        adapterFactory.addAdapterFactory(new ReflectiveItemProviderAdapterFactory());
        BasicCommandStack stack = new BasicCommandStack();
        domain = new AdapterFactoryEditingDomain(adapterFactory, stack, files.newResourceSet());
        try {
            model = files.load(fileInput.file(), domain.getResourceSet());
        } catch (ModelLoadException e) {
            adapterFactory.dispose();
            throw new PartInitException("Cannot open " + fileInput.file() + ":\n" + e.getMessage(), e);
        }
        entry = new ValueEntry(domain);
        undo = new StackAction(true, stack);
        redo = new StackAction(false, stack);
        stack.addCommandStackListener(event -> stackChanged());
        setPartName(input.getName());
        setTitleToolTip(fileInput.file().toString());
        site.setSelectionProvider(selectionProvider);
    }

    @Override
    protected void createPages() {
        EObject root = model.root();
        if (root instanceof Machine machine) {
            addModelPage(AXES_PAGE, "Axes of " + machine.getName() + " (shared library axes marked)", input -> {
                List<Object> axes = new ArrayList<>(machine.getAxes());
                axes.addAll(machine.getLibraryAxes());
                return axes;
            });
            addModelPage(CONTOURS_PAGE, "Test contours: segments, feed, axis assignment", input -> machine.getContours());
            addModelPage(REQUIREMENTS_PAGE, "Machine requirements and their allocations to axes",
                    input -> machine.getRequirements());
            addModelPage(BUDGET_PAGE, "Error budget lines per axis and source", input -> machine.getBudgetLines());
        } else {
            addModelPage(AXES_PAGE, "Axis file " + getEditorInput().getName(), input -> List.of(root));
        }
        setActivePage(0);
        // Start with the first axis selected: the form and the Loop Analysis view show something useful at once.
        ModelPage first = pages.get(0);
        Object[] top = ((org.eclipse.jface.viewers.ITreeContentProvider) first.tree().getContentProvider())
                .getElements(first.tree().getInput());
        if (top.length > 0) {
            first.select(top[0]);
        }
    }

    private void addModelPage(String title, String hint, Function<Object, List<?>> roots) {
        ModelPage page = new ModelPage(getContainer(), title, hint, adapterFactory, entry, roots, this::librarySuffix,
                this::libraryBanner, model.root());
        pages.add(page);
        int index = addPage(page.control());
        setPageText(index, title);
        page.tree().addSelectionChangedListener(event -> {
            if (getActivePage() >= 0 && pages.get(getActivePage()) == page) {
                selectionProvider.fire(event.getSelection());
            }
        });
    }

    @Override
    protected void pageChange(int newPageIndex) {
        super.pageChange(newPageIndex);
        if (newPageIndex >= 0 && newPageIndex < pages.size()) {
            selectionProvider.fire(pages.get(newPageIndex).tree().getSelection());
        }
    }

    private void stackChanged() {
        firePropertyChange(PROP_DIRTY);
        undo.update();
        redo.update();
        for (ModelPage page : pages) {
            page.form().refresh();
        }
    }

    // ------------------------------------------------------------------------------------------------ library axes

    /** True for an axis that lives in its own library file rather than in the file being edited. */
    public boolean isLibraryAxis(Object element) {
        return element instanceof Axis axis && axis.eResource() != null && axis.eResource() != model.resource();
    }

    private String librarySuffix(Object element) {
        return isLibraryAxis(element) ? "   [shared library axis: " + fileName(((Axis) element).eResource()) + "]" : "";
    }

    /** The notice above the form of a library axis and of everything in it. */
    public Optional<String> libraryBanner(EObject element) {
        for (EObject e = element; e != null; e = e.eContainer()) {
            if (isLibraryAxis(e)) {
                Resource resource = e.eResource();
                List<String> users = libraryUsers.computeIfAbsent(resource,
                        r -> LibraryUsage.usedBy(Path.of(r.getURI().toFileString()), model.file()));
                String relative = relativeName(resource);
                return Optional.of("Shared library axis — used by: " + (users.isEmpty() ? "this machine"
                        : String.join(", ", users)) + ". Changes are saved to " + relative
                        + " and apply to every machine that uses it.");
            }
        }
        return Optional.empty();
    }

    private String relativeName(Resource resource) {
        Path file = Path.of(resource.getURI().toFileString());
        Path base = model.file().toAbsolutePath().getParent();
        return base == null ? file.toString() : base.relativize(file).toString();
    }

    private static String fileName(Resource resource) {
        URI uri = resource.getURI();
        return uri == null ? "?" : uri.lastSegment();
    }

    // ------------------------------------------------------------------------------------------------ saving

    @Override
    public boolean isDirty() {
        return domain != null && ((BasicCommandStack) domain.getCommandStack()).isSaveNeeded();
    }

    @Override
    public void doSave(IProgressMonitor monitor) {
        try {
            files.saveModified(domain.getResourceSet());
            ((BasicCommandStack) domain.getCommandStack()).saveIsDone();
            firePropertyChange(PROP_DIRTY);
        } catch (IOException e) {
            if (monitor != null) {
                monitor.setCanceled(true);
            }
            MessageDialog.openError(getSite().getShell(), "Save failed", "The machine was not saved; the files on "
                    + "disk are unchanged.\n\n" + e.getMessage());
        }
    }

    @Override
    public void doSaveAs() {
        throw new UnsupportedOperationException("Save As is not offered: copy the machine folder with its library");
    }

    @Override
    public boolean isSaveAsAllowed() {
        return false;
    }

    @Override
    public void setFocus() {
        int active = getActivePage();
        if (active >= 0 && active < pages.size()) {
            pages.get(active).tree().getControl().setFocus();
        } else {
            super.setFocus();
        }
    }

    @Override
    public void dispose() {
        if (adapterFactory != null) {
            adapterFactory.dispose();
        }
        super.dispose();
    }

    // ------------------------------------------------------------------------------------------------ for handlers, views and tests

    @Override
    public EditingDomain getEditingDomain() {
        return domain;
    }

    /** The file opened, with the resource set holding it and its library files. */
    public LoadedModel model() {
        return model;
    }

    /** The value path the forms use: parse, check, set by command. */
    public ValueEntry valueEntry() {
        return entry;
    }

    /** The pages, in tab order. */
    public List<ModelPage> pages() {
        return List.copyOf(pages);
    }

    /** Shows the page whose tree holds {@code element} at its top level or below, and selects it there. */
    public boolean reveal(EObject element) {
        for (int i = 0; i < pages.size(); i++) {
            ModelPage page = pages.get(i);
            Object[] roots = ((org.eclipse.jface.viewers.ITreeContentProvider) page.tree().getContentProvider())
                    .getElements(page.tree().getInput());
            for (Object top : roots) {
                if (top == element || top instanceof EObject e && org.eclipse.emf.ecore.util.EcoreUtil.isAncestor(e,
                        element)) {
                    setActivePage(i);
                    page.select(element);
                    return true;
                }
            }
        }
        return false;
    }

    IAction undoAction() {
        return undo;
    }

    IAction redoAction() {
        return redo;
    }

    /** Undo or redo on the editor's command stack, labelled with the command it would undo or redo. */
    private static final class StackAction extends Action {
        private final boolean isUndo;
        private final CommandStack stack;

        StackAction(boolean isUndo, CommandStack stack) {
            this.isUndo = isUndo;
            this.stack = stack;
            setId(isUndo ? ActionFactory.UNDO.getId() : ActionFactory.REDO.getId());
            setActionDefinitionId(isUndo ? "org.eclipse.ui.edit.undo" : "org.eclipse.ui.edit.redo");
            update();
        }

        @Override
        public void run() {
            if (isUndo && stack.canUndo()) {
                stack.undo();
            } else if (!isUndo && stack.canRedo()) {
                stack.redo();
            }
        }

        void update() {
            Command next = isUndo ? stack.getUndoCommand() : stack.getRedoCommand();
            setEnabled(isUndo ? stack.canUndo() : stack.canRedo());
            String what = next == null || next.getLabel() == null ? "" : " " + next.getLabel();
            setText((isUndo ? "&Undo" : "&Redo") + what);
        }
    }

    /** The editor's selection: the selection of the tree of the page on top. */
    private final class PageSelectionProvider implements ISelectionProvider {
        private final ListenerList<ISelectionChangedListener> listeners = new ListenerList<>();
        private ISelection selection = StructuredSelection.EMPTY;

        void fire(ISelection newSelection) {
            selection = newSelection;
            SelectionChangedEvent event = new SelectionChangedEvent(this, newSelection);
            for (ISelectionChangedListener listener : listeners) {
                listener.selectionChanged(event);
            }
        }

        @Override
        public void addSelectionChangedListener(ISelectionChangedListener listener) {
            listeners.add(listener);
        }

        @Override
        public void removeSelectionChangedListener(ISelectionChangedListener listener) {
            listeners.remove(listener);
        }

        @Override
        public ISelection getSelection() {
            return selection;
        }

        @Override
        public void setSelection(ISelection newSelection) {
            int active = getActivePage();
            if (active >= 0 && active < pages.size()) {
                pages.get(active).tree().setSelection(newSelection, true);
            }
        }
    }
}
