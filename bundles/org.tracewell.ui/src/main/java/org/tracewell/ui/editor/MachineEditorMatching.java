package org.tracewell.ui.editor;

import java.nio.file.Path;
import java.util.Optional;

import org.eclipse.core.runtime.IPath;
import org.eclipse.ui.IEditorInput;
import org.eclipse.ui.IEditorMatchingStrategy;
import org.eclipse.ui.IEditorReference;
import org.eclipse.ui.IPathEditorInput;
import org.eclipse.ui.IURIEditorInput;
import org.eclipse.ui.PartInitException;

/**
 * A file is open in one Machine Editor whatever way it was opened: by path (File → Open Machine), or as a workspace
 * file (a double-click in the Problems view). Inputs match when they name the same file on disk.
 */
public final class MachineEditorMatching implements IEditorMatchingStrategy {

    @Override
    public boolean matches(IEditorReference reference, IEditorInput input) {
        try {
            Optional<Path> wanted = fileOf(input);
            return wanted.isPresent() && wanted.equals(fileOf(reference.getEditorInput()));
        } catch (PartInitException unreadable) {
            return false;
        }
    }

    /** The local file an input stands for, absolute and normalised; empty when it is not a local file. */
    static Optional<Path> fileOf(IEditorInput input) {
        if (input instanceof MachineEditorInput machine) {
            return Optional.of(machine.file());
        }
        if (input instanceof IPathEditorInput pathInput) {
            IPath path = pathInput.getPath();
            if (path != null) {
                return Optional.of(Path.of(path.toOSString()).toAbsolutePath().normalize());
            }
        }
        if (input instanceof IURIEditorInput uriInput && uriInput.getURI() != null
                && "file".equals(uriInput.getURI().getScheme())) {
            return Optional.of(Path.of(uriInput.getURI()).toAbsolutePath().normalize());
        }
        return Optional.empty();
    }
}
