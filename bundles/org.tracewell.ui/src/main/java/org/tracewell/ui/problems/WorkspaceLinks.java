package org.tracewell.ui.problems;

import java.nio.file.Path;

import org.eclipse.core.resources.IContainer;
import org.eclipse.core.resources.IFile;
import org.eclipse.core.resources.IFolder;
import org.eclipse.core.resources.IProject;
import org.eclipse.core.resources.IResource;
import org.eclipse.core.resources.IWorkspaceRoot;
import org.eclipse.core.resources.ResourcesPlugin;
import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.IPath;
import org.eclipse.core.runtime.IProgressMonitor;

/**
 * Tracewell opens model files wherever they are; workspace markers need a workspace file. A file outside every
 * project is reached through a linked folder (a link to the file's folder, named after it) in the project
 * {@value #PROJECT}: the files stay where they are, nothing is copied, and the Problems view shows the file with the
 * folder it lives in. Must run inside a workspace operation (see {@link ProblemMarkers}).
 */
final class WorkspaceLinks {

    /** The project holding the links (it lives in the workspace folder; deleting it deletes only the links). */
    static final String PROJECT = "Machines";

    private WorkspaceLinks() {
    }

    /** The workspace file for {@code file}, linking its folder into {@link #PROJECT} when no project has it yet. */
    static IFile fileFor(Path file, IProgressMonitor monitor) throws CoreException {
        Path absolute = file.toAbsolutePath().normalize();
        IWorkspaceRoot root = ResourcesPlugin.getWorkspace().getRoot();
        for (IFile existing : root.findFilesForLocationURI(absolute.toUri())) {
            if (existing.getProject().isAccessible()) {
                existing.refreshLocal(IResource.DEPTH_ZERO, monitor);
                if (existing.exists()) {
                    return existing;
                }
            }
        }
        IProject project = root.getProject(PROJECT);
        if (!project.exists()) {
            project.create(monitor);
        }
        if (!project.isOpen()) {
            project.open(monitor);
        }
        IFolder folder = linkTo(project, absolute.getParent(), monitor);
        IFile linked = folder.getFile(absolute.getFileName().toString());
        linked.refreshLocal(IResource.DEPTH_ZERO, monitor);
        return linked;
    }

    /** The link to {@code directory}: an existing one, else a new one named after the folder ("examples (2)" …). */
    private static IFolder linkTo(IProject project, Path directory, IProgressMonitor monitor) throws CoreException {
        IPath location = IPath.fromOSString(directory.toString());
        String base = directory.getFileName() == null ? "root" : directory.getFileName().toString();
        for (int n = 1;; n++) {
            IFolder folder = project.getFolder(n == 1 ? base : base + " (" + n + ")");
            if (!folder.exists()) {
                folder.createLink(location, IResource.ALLOW_MISSING_LOCAL, monitor);
                return folder;
            }
            if (folder.isLinked() && sameLocation(folder, directory)) {
                return folder;
            }
        }
    }

    private static boolean sameLocation(IContainer folder, Path directory) {
        IPath location = folder.getLocation();
        return location != null && Path.of(location.toOSString()).toAbsolutePath().normalize().equals(directory);
    }
}
