package org.tracewell.ui.problems;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.atomic.AtomicLong;

import org.eclipse.core.resources.IFile;
import org.eclipse.core.resources.IMarker;
import org.eclipse.core.resources.IResource;
import org.eclipse.core.resources.IWorkspace;
import org.eclipse.core.resources.IWorkspaceRunnable;
import org.eclipse.core.resources.ResourcesPlugin;
import org.eclipse.core.resources.WorkspaceJob;
import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.ILog;
import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.util.EcoreUtil;
import org.eclipse.ui.ide.IDE;
import org.tracewell.core.io.SourcePosition;
import org.tracewell.core.validation.TracewellValidator;
import org.tracewell.core.validation.ValidationProblem;

/**
 * The validation findings of one open model file as Problems markers on that file: severity, the validator's message
 * (bad value, valid range), the element as location, its line when it is in this file, and the element's URI
 * so a double-click can select it in the Machine Editor. Findings on a shared library axis are marked on the machine
 * being edited too, with the library file in the location. Markers are not persistent: they describe the model as it
 * is open, and are removed when the editor closes. Marker writes run as a workspace job, off the UI thread.
 */
public final class ProblemMarkers {

    /** Marker type (a problem marker, so the Problems view lists it). */
    public static final String TYPE = "org.tracewell.ui.modelProblem";
    /** Marker attribute: URI of the element the finding is about ({@code file:…#id}). */
    public static final String ELEMENT_URI = "org.tracewell.ui.elementUri";
    /** Family of the jobs that write markers (the workbench waits for them before it saves the workspace). */
    public static final Object JOB_FAMILY = ProblemMarkers.class;
    /** Marker attribute: the validator's rule code, e.g. {@code tw.positive}. */
    public static final String RULE = "org.tracewell.ui.rule";

    /**
     * One finding as a marker carries it; built on the UI thread from the live model, written later.
     *
     * @param severity   {@link IMarker#SEVERITY_ERROR} or {@link IMarker#SEVERITY_WARNING}
     * @param message    the validator's message
     * @param location   the element, e.g. "library/z-slide-25x5.axis › Axis 'Z'"
     * @param line       line of the element in the marked file; 0 when not in it or unknown
     * @param elementUri URI of the element, empty when the finding has no element
     * @param rule       rule code
     */
    public record Finding(int severity, String message, String location, int line, String elementUri, String rule) {
    }

    private final Path file;
    private final String editorId;
    private final AtomicLong generation = new AtomicLong();
    private volatile IFile marked;

    /**
     * @param file     the file the editor has open
     * @param editorId editor that opens the file from a marker
     */
    public ProblemMarkers(Path file, String editorId) {
        this.file = file.toAbsolutePath().normalize();
        this.editorId = editorId;
    }

    /** Turns validation problems into findings for this file (pure apart from reading element positions). */
    public List<Finding> findings(List<ValidationProblem> problems) {
        List<Finding> findings = new ArrayList<>();
        for (ValidationProblem problem : problems) {
            EObject element = problem.element();
            String where = element == null ? "" : TracewellValidator.describe(element);
            int line = 0;
            Optional<SourcePosition> position = problem.position();
            if (position.isPresent()) {
                Path in = position.get().file().toAbsolutePath().normalize();
                if (in.equals(file)) {
                    line = position.get().line();
                } else if (file.getParent() != null) {
                    where = file.getParent().relativize(in).toString().replace('\\', '/') + " › " + where;
                }
            }
            String uri = element == null || element.eResource() == null ? "" : EcoreUtil.getURI(element).toString();
            // The validator's messages start with the element; the Location column names it already.
            String message = problem.message();
            String prefix = element == null ? null : TracewellValidator.describe(element) + ": ";
            if (prefix != null && message.startsWith(prefix) && message.length() > prefix.length()) {
                message = message.substring(prefix.length());
            }
            findings.add(new Finding(problem.severity() == ValidationProblem.Severity.ERROR ? IMarker.SEVERITY_ERROR
                    : IMarker.SEVERITY_WARNING, message, where, line, uri, problem.code()));
        }
        return findings;
    }

    /** Replaces this file's markers by {@code findings}, in a workspace job; a newer call supersedes an older one. */
    public Job replace(List<Finding> findings) {
        long mine = generation.incrementAndGet();
        List<Finding> copy = List.copyOf(findings);
        return schedule("Model checks of " + file.getFileName(), monitor -> {
            if (mine != generation.get()) {
                return;
            }
            IFile target = target(monitor);
            target.deleteMarkers(TYPE, false, IResource.DEPTH_ZERO);
            for (Finding finding : copy) {
                Map<String, Object> attributes = new HashMap<>();
                attributes.put(IMarker.SEVERITY, finding.severity());
                attributes.put(IMarker.MESSAGE, finding.message());
                attributes.put(IMarker.LOCATION, finding.location());
                if (finding.line() > 0) {
                    attributes.put(IMarker.LINE_NUMBER, finding.line());
                }
                attributes.put(ELEMENT_URI, finding.elementUri());
                attributes.put(RULE, finding.rule());
                attributes.put(IDE.EDITOR_ID_ATTR, editorId);
                attributes.put(IMarker.TRANSIENT, Boolean.TRUE);
                target.createMarker(TYPE, attributes);
            }
        });
    }

    /** Removes this file's markers (the editor closed). */
    public Job clear() {
        generation.incrementAndGet();
        return schedule("Model checks of " + file.getFileName(), monitor -> {
            IFile target = marked;
            if (target != null && target.exists()) {
                target.deleteMarkers(TYPE, false, IResource.DEPTH_ZERO);
            }
        });
    }

    /** The workspace file the markers are on, once the first job made it (null before). */
    public IFile markedFile() {
        return marked;
    }

    /** The element a marker of this type points at, as a URI (empty when it has none). */
    public static Optional<URI> elementOf(IMarker marker) {
        String text = marker.getAttribute(ELEMENT_URI, "");
        return text.isEmpty() ? Optional.empty() : Optional.of(URI.createURI(text));
    }

    private IFile target(IProgressMonitor monitor) throws CoreException {
        IFile target = marked;
        if (target == null || !target.exists()) {
            target = WorkspaceLinks.fileFor(file, monitor);
            marked = target;
        }
        return target;
    }

    private static Job schedule(String name, IWorkspaceRunnable work) {
        IWorkspace workspace;
        try {
            workspace = ResourcesPlugin.getWorkspace();
        } catch (IllegalStateException noWorkspace) {
            // Started without a workspace (-data @none): the checks still reject bad entries in the editor.
            return Job.create(name, monitor -> Status.OK_STATUS);
        }
        WorkspaceJob job = new WorkspaceJob(name) {
            @Override
            public boolean belongsTo(Object family) {
                return family == JOB_FAMILY;
            }

            @Override
            public IStatus runInWorkspace(IProgressMonitor monitor) throws CoreException {
                try {
                    work.run(monitor);
                    return Status.OK_STATUS;
                } catch (CoreException e) {
                    ILog.of(ProblemMarkers.class).log(e.getStatus());
                    return Status.OK_STATUS; // markers are a view of the checks: a failure must not pop up dialogs
                }
            }
        };
        job.setRule(workspace.getRoot());
        job.setSystem(true);
        job.schedule();
        return job;
    }
}
