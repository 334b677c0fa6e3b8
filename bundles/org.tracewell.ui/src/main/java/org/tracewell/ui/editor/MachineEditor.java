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
import org.eclipse.core.resources.IMarker;
import org.eclipse.emf.ecore.util.EcoreUtil;
import org.eclipse.jface.action.Action;
import org.eclipse.jface.action.IMenuManager;
import org.eclipse.jface.action.MenuManager;
import org.eclipse.jface.action.Separator;
import org.eclipse.jface.util.IPropertyChangeListener;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Listener;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.ui.IPageLayout;
import org.eclipse.ui.IPartListener2;
import org.eclipse.ui.IWorkbenchPartReference;
import org.eclipse.ui.ide.IGotoMarker;
import org.eclipse.ui.views.properties.IPropertySheetPage;
import org.eclipse.ui.views.properties.PropertySheetPage;
import org.tracewell.core.validation.ModelValidation;
import org.tracewell.core.validation.ValidationProblem;
import org.tracewell.ui.prefs.TracewellPreferences;
import org.tracewell.ui.problems.ProblemMarkers;
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
 * <p>
 * Elements are added and deleted from each tree's context menu ({@link ElementCommands}); the Properties view edits
 * the selected element ({@link ElementPropertySource}); the validation rules run after every change and their findings
 * are Problems markers on the file ({@link ProblemMarkers}), a double-click selecting the element here. When a file of
 * the model changes on disk the editor asks before reloading, and it never saves over such a change without asking
 * ({@link DiskWatch}).
 */
public final class MachineEditor extends MultiPageEditorPart implements IEditingDomainProvider, IGotoMarker {

    public static final String ID = "org.tracewell.ui.editor.machine";

    public static final String AXES_PAGE = "Axes";
    public static final String CONTOURS_PAGE = "Contours";
    public static final String REQUIREMENTS_PAGE = "Requirements";
    public static final String BUDGET_PAGE = "Budget";
    public static final String STUDIES_PAGE = "Studies";

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
    private ElementCommands elementCommands;
    private ProblemMarkers markers;
    private DiskWatch diskWatch;
    private DiskPrompt diskPrompt = DiskPrompt.DIALOGS;
    private boolean askingAboutDisk;
    private long validationGeneration;
    private final IPropertyChangeListener unitsListener = event -> {
        if (TracewellPreferences.UNIT_SYSTEM.equals(event.getProperty())) {
            Display.getDefault().asyncExec(this::unitsChanged);
        }
    };
    private final IPartListener2 activation = new IPartListener2() {
        @Override
        public void partActivated(IWorkbenchPartReference ref) {
            if (ref.getPart(false) == MachineEditor.this) {
                // After the activation finished: a prompt (or a reload) from inside it would disturb the workbench.
                Display.getDefault().asyncExec(MachineEditor.this::checkDisk);
            }
        }
    };
    private final Listener shellActivation = event -> {
        if (getSite().getPage().getActiveEditor() == this) {
            checkDisk();
        }
    };

    /** Milliseconds between looks at the disk while the editor is active (besides on activation). */
    static final int DISK_CHECK_INTERVAL_MS = 2000;
    /** Pause after the last model change before the checks run again, ms: one run for a burst of edits. */
    static final int VALIDATION_DEBOUNCE_MS = 250;

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
        // A workspace file (a marker's, the Problems view) is the same file on disk: the editor works on paths.
        MachineEditorInput fileInput = input instanceof MachineEditorInput machineInput ? machineInput
                : MachineEditorMatching.fileOf(input).map(MachineEditorInput::new).orElseThrow(() -> new PartInitException(
                        "The Machine Editor opens .machine and .axis files from the file system; got "
                                + input.getClass().getSimpleName() + " " + input.getName()));
        super.init(site, fileInput);
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
        elementCommands = new ElementCommands(domain, () -> TracewellPreferences.templateOrDefault(fileInput.getName()));
        markers = new ProblemMarkers(fileInput.file(), ID);
        diskWatch = new DiskWatch(modelFiles());
        undo = new StackAction(true, stack);
        redo = new StackAction(false, stack);
        stack.addCommandStackListener(event -> stackChanged());
        setPartName(input.getName());
        setTitleToolTip(fileInput.file().toString());
        site.setSelectionProvider(selectionProvider);
        TracewellPreferences.store().addPropertyChangeListener(unitsListener);
        site.getPage().addPartListener(activation);
        site.getShell().addListener(SWT.Activate, shellActivation);
        scheduleDiskCheck();
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
            addModelPage(STUDIES_PAGE, "Variation studies: Monte Carlo and sweeps over model values (run one with"
                    + " Analysis → Run Variation Study…)", input -> machine.getStudies());
        } else {
            addModelPage(AXES_PAGE, "Axis file " + getEditorInput().getName(), input -> List.of(root));
        }
        setActivePage(0);
        validate();
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
        hookContextMenu(page);
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
            if (page.form().element() != null && page.form().element().eResource() == null) {
                page.form().show(null); // its element was deleted
            }
            page.form().refresh();
        }
        long mine = ++validationGeneration;
        Display.getCurrent().timerExec(VALIDATION_DEBOUNCE_MS, () -> {
            if (mine == validationGeneration && domain != null) {
                validate();
            }
        });
    }

    // ------------------------------------------------------------------------------------------------ add and delete

    private void hookContextMenu(ModelPage page) {
        MenuManager menu = new MenuManager("#PopupMenu");
        menu.setRemoveAllWhenShown(true);
        menu.addMenuListener(manager -> fillContextMenu(manager, page));
        page.tree().getControl().setMenu(menu.createContextMenu(page.tree().getControl()));
        page.tree().getControl().addListener(SWT.KeyDown, event -> {
            if (event.keyCode == SWT.DEL && selectedElement(page) instanceof EObject element) {
                run(elementCommands.delete(element, machineOrNull(), isLibraryAxis(element)), page);
            }
        });
    }

    private void fillContextMenu(IMenuManager manager, ModelPage page) {
        if (model.root() instanceof Machine machine) {
            elementCommands.addToMachine(machine, page.title()).ifPresent(edit -> manager.add(action(edit, page)));
        }
        Object selected = selectedElement(page);
        if (selected instanceof EObject element) {
            List<ElementCommands.Edit> children = elementCommands.newChildren(element);
            if (!children.isEmpty()) {
                MenuManager newChild = new MenuManager("&New");
                children.forEach(edit -> newChild.add(action(edit, page)));
                manager.add(newChild);
            }
            manager.add(new Separator());
            IAction delete = action(elementCommands.delete(element, machineOrNull(), isLibraryAxis(element)), page);
            delete.setAccelerator(SWT.DEL);
            manager.add(delete);
        }
        manager.add(new Separator());
        manager.add(new Action("Show &Properties") {
            @Override
            public void run() {
                showView(IPageLayout.ID_PROP_SHEET);
            }
        });
    }

    private IAction action(ElementCommands.Edit edit, ModelPage page) {
        Action action = new Action(edit.label()) {
            @Override
            public void run() {
                MachineEditor.this.run(edit, page);
            }
        };
        action.setEnabled(edit.command().canExecute());
        return action;
    }

    /** Executes an add or delete and selects what it created (or the parent of what it deleted). */
    private void run(ElementCommands.Edit edit, ModelPage page) {
        elementCommands.execute(edit).ifPresent(affected -> {
            if (affected instanceof EObject e && e.eResource() != null) {
                page.select(e);
            }
        });
    }

    /** The add and delete commands, for handlers and tests. */
    public ElementCommands elementCommands() {
        return elementCommands;
    }

    private static Object selectedElement(ModelPage page) {
        return ((IStructuredSelection) page.tree().getSelection()).getFirstElement();
    }

    private Machine machineOrNull() {
        return model.root() instanceof Machine machine ? machine : null;
    }

    private void showView(String id) {
        try {
            getSite().getPage().showView(id);
        } catch (PartInitException e) {
            MessageDialog.openError(getSite().getShell(), "Show view", e.getMessage());
        }
    }

    // ------------------------------------------------------------------------------------------------ checks and markers

    /** Runs the validation rules on the model as it is now and shows the findings as Problems markers. */
    private void validate() {
        List<ValidationProblem> problems = new ModelValidation().validate(model.root());
        markers.replace(markers.findings(problems));
    }

    /** The markers of this editor's file. */
    public ProblemMarkers problemMarkers() {
        return markers;
    }

    @Override
    public void gotoMarker(IMarker marker) {
        ProblemMarkers.elementOf(marker)
                .map(uri -> domain.getResourceSet().getEObject(uri, false))
                .ifPresent(this::reveal);
    }

    @Override
    public <T> T getAdapter(Class<T> adapter) {
        if (adapter == IPropertySheetPage.class) {
            PropertySheetPage page = new PropertySheetPage();
            page.setPropertySourceProvider(new ElementPropertySource.Provider(adapterFactory, entry));
            return adapter.cast(page);
        }
        if (adapter == IGotoMarker.class) {
            return adapter.cast(this);
        }
        return super.getAdapter(adapter);
    }

    private void unitsChanged() {
        if (pages.isEmpty() || getContainer() == null || getContainer().isDisposed()) {
            return;
        }
        TracewellPreferences.applyDisplayUnits();
        for (ModelPage page : pages) {
            page.tree().refresh(true);
            page.form().show(page.form().element()); // units and hints of every row
        }
    }

    // ------------------------------------------------------------------------------------------------ files on disk

    /** How the editor asks about files changed on disk; dialogs unless replaced (tests answer without a dialog). */
    public interface DiskPrompt {

        /** What the user chose. */
        enum Answer {
            RELOAD, KEEP, OVERWRITE, CANCEL
        }

        /** The file(s) changed on disk: reload them ({@code dirty}: and lose the unsaved changes) or keep editing. */
        Answer changedOnDisk(Shell shell, List<Path> files, boolean dirty);

        /** The file(s) were deleted on disk; saving writes them again. */
        void deletedOnDisk(Shell shell, List<Path> files);

        /** Saving would overwrite a change made on disk since it was read: overwrite, or cancel the save. */
        Answer saveOverChange(Shell shell, List<Path> files);

        DiskPrompt DIALOGS = new DiskPrompt() {
            @Override
            public Answer changedOnDisk(Shell shell, List<Path> files, boolean dirty) {
                String which = names(files);
                String message = dirty
                        ? which + " changed on disk, and this editor has unsaved changes.\n\nReload the file from disk "
                                + "(your unsaved changes are lost) or keep editing your version (saving will ask "
                                + "before it overwrites the change on disk)?"
                        : which + " changed on disk.\n\nReload it? Keeping this version means saving will ask before "
                                + "it overwrites the change on disk.";
                int choice = new MessageDialog(shell, "File changed on disk", null, message,
                        dirty ? MessageDialog.WARNING : MessageDialog.QUESTION, 0,
                        dirty ? "Reload and lose my changes" : "Reload", "Keep my version").open();
                return choice == 0 ? Answer.RELOAD : Answer.KEEP;
            }

            @Override
            public void deletedOnDisk(Shell shell, List<Path> files) {
                MessageDialog.openWarning(shell, "File deleted on disk", names(files) + " no longer exists on disk. "
                        + "The editor keeps the model; saving writes the file again.");
            }

            @Override
            public Answer saveOverChange(Shell shell, List<Path> files) {
                int choice = new MessageDialog(shell, "File changed on disk", null, names(files)
                        + " changed on disk since it was read. Saving now replaces that change with your version "
                        + "(the replaced file is kept as .bak).", MessageDialog.WARNING, 1, "Overwrite",
                        "Cancel save").open();
                return choice == 0 ? Answer.OVERWRITE : Answer.CANCEL;
            }

            private static String names(List<Path> files) {
                return files.stream().map(Path::toString).collect(java.util.stream.Collectors.joining(", "));
            }
        };
    }

    /** Replaces the prompt (tests; an embedding that answers differently). */
    public void setDiskPrompt(DiskPrompt prompt) {
        diskPrompt = java.util.Objects.requireNonNull(prompt, "prompt");
    }

    /** The files of the model that are watched: the opened file and every library file it uses. */
    private List<Path> modelFiles() {
        List<Path> files = new ArrayList<>();
        for (Resource resource : domain.getResourceSet().getResources()) {
            URI uri = resource.getURI();
            if (uri != null && uri.isFile()) {
                files.add(Path.of(uri.toFileString()).toAbsolutePath().normalize());
            }
        }
        return files;
    }

    private void scheduleDiskCheck() {
        Display display = getSite().getShell().getDisplay();
        display.timerExec(DISK_CHECK_INTERVAL_MS, () -> {
            if (domain == null || getContainer() == null || getContainer().isDisposed()) {
                return; // closed
            }
            if (getSite().getPage().getActiveEditor() == this && display.getActiveShell() == getSite().getShell()) {
                checkDisk();
            }
            scheduleDiskCheck();
        });
    }

    /**
     * Looks at the disk and, when a file of the model changed, asks what to do (see {@link DiskWatch#decide}).
     *
     * @return the decision taken (for tests)
     */
    public DiskWatch.Decision checkDisk() {
        if (askingAboutDisk || domain == null || getContainer() == null || getContainer().isDisposed()) {
            return DiskWatch.Decision.NOTHING;
        }
        List<Path> changed = diskWatch.changedSinceSeen();
        List<Path> deleted = diskWatch.deletedSinceSeen();
        DiskWatch.Decision decision = DiskWatch.decide(changed, deleted, isDirty());
        if (decision == DiskWatch.Decision.NOTHING) {
            return decision;
        }
        askingAboutDisk = true;
        try {
            if (decision == DiskWatch.Decision.DELETED) {
                diskPrompt.deletedOnDisk(getSite().getShell(), deleted);
                diskWatch.acknowledge();
            } else if (diskPrompt.changedOnDisk(getSite().getShell(), changed,
                    decision == DiskWatch.Decision.CONFLICT) == DiskPrompt.Answer.RELOAD) {
                reload();
            } else {
                diskWatch.acknowledge();
            }
        } finally {
            askingAboutDisk = false;
        }
        return decision;
    }

    /**
     * Reads the file again: closes this editor without saving and opens the file anew on the page and element shown
     * now. Views follow the new editor as they follow any activation.
     */
    private void reload() {
        IWorkbenchPage page = getSite().getPage();
        Path file = model.file();
        String pageTitle = getActivePage() >= 0 && getActivePage() < pages.size() ? pages.get(getActivePage()).title()
                : AXES_PAGE;
        URI selected = selectedElement(pages.get(Math.max(0, getActivePage()))) instanceof EObject e
                && e.eResource() != null ? EcoreUtil.getURI(e) : null;
        page.closeEditor(this, false);
        try {
            MachineEditor fresh = open(page, file);
            for (int i = 0; i < fresh.pages.size(); i++) {
                if (fresh.pages.get(i).title().equals(pageTitle)) {
                    fresh.setActivePage(i);
                }
            }
            if (selected != null && fresh.domain.getResourceSet().getEObject(selected, false) instanceof EObject again) {
                fresh.reveal(again);
            }
        } catch (PartInitException e) {
            MessageDialog.openError(page.getWorkbenchWindow().getShell(), "Reload", e.getMessage());
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
        List<Path> changedOnDisk = diskWatch.changedSinceBase();
        if (DiskWatch.saveNeedsConfirmation(changedOnDisk)
                && diskPrompt.saveOverChange(getSite().getShell(), changedOnDisk) != DiskPrompt.Answer.OVERWRITE) {
            if (monitor != null) {
                monitor.setCanceled(true);
            }
            return;
        }
        try {
            files.saveModified(domain.getResourceSet());
            // What is on disk is now this editor's version (also of files other programs had changed).
            diskWatch.restamp(modelFiles());
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
        TracewellPreferences.store().removePropertyChangeListener(unitsListener);
        if (getSite() != null) {
            getSite().getPage().removePartListener(activation);
            if (!getSite().getShell().isDisposed()) {
                getSite().getShell().removeListener(SWT.Activate, shellActivation);
            }
        }
        if (markers != null) {
            markers.clear();
        }
        if (adapterFactory != null) {
            adapterFactory.dispose();
        }
        domain = null;
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

    /** What Edit → Undo says now, e.g. "&Undo Add axis A". */
    public String undoLabel() {
        return undo.getText();
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
