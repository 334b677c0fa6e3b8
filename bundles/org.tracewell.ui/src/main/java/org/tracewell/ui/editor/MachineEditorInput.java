package org.tracewell.ui.editor;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Objects;

import org.eclipse.core.runtime.IPath;
import org.eclipse.core.runtime.Platform;
import org.eclipse.jface.resource.ImageDescriptor;
import org.eclipse.ui.IPathEditorInput;
import org.eclipse.ui.IPersistableElement;

/**
 * A {@code .machine} or {@code .axis} file on the local file system as editor input. The product has no IDE
 * workspace, so files are opened by path; two inputs of the same file are equal, so a file opens in one editor only.
 */
public final class MachineEditorInput implements IPathEditorInput {

    private final Path file;

    public MachineEditorInput(Path file) {
        this.file = Objects.requireNonNull(file, "file").toAbsolutePath().normalize();
    }

    /** The file, absolute and normalised. */
    public Path file() {
        return file;
    }

    @Override
    public IPath getPath() {
        return IPath.fromOSString(file.toString());
    }

    @Override
    public boolean exists() {
        return Files.isRegularFile(file);
    }

    @Override
    public ImageDescriptor getImageDescriptor() {
        return null;
    }

    @Override
    public String getName() {
        return file.getFileName().toString();
    }

    @Override
    public IPersistableElement getPersistable() {
        return null; // not reopened at the next start: the file may have moved
    }

    @Override
    public String getToolTipText() {
        return file.toString();
    }

    @Override
    public <T> T getAdapter(Class<T> adapter) {
        return Platform.getAdapterManager().getAdapter(this, adapter);
    }

    @Override
    public boolean equals(Object other) {
        return other instanceof MachineEditorInput input && input.file.equals(file);
    }

    @Override
    public int hashCode() {
        return file.hashCode();
    }

    @Override
    public String toString() {
        return "MachineEditorInput[" + file + "]";
    }
}
