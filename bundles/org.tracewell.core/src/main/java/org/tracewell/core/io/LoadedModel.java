package org.tracewell.core.io;

import java.nio.file.Path;
import java.util.Optional;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.emf.ecore.resource.ResourceSet;
import org.tracewell.model.Axis;
import org.tracewell.model.Machine;

/**
 * A model file read by {@link ModelFiles}, with every file it references loaded into the same resource set.
 *
 * @param file        the file as the caller named it
 * @param resource    its resource
 * @param resourceSet the resource set holding it and the referenced library files
 */
public record LoadedModel(Path file, Resource resource, ResourceSet resourceSet) {

    /** The root element of the file. */
    public EObject root() {
        return resource.getContents().get(0);
    }

    /** The machine of a {@code .machine} file. */
    public Machine machine() {
        if (root() instanceof Machine machine) {
            return machine;
        }
        throw new IllegalStateException(file + " holds a " + root().eClass().getName() + ", not a Machine");
    }

    /** The axis of an {@code .axis} file. */
    public Axis axis() {
        if (root() instanceof Axis axis) {
            return axis;
        }
        throw new IllegalStateException(file + " holds a " + root().eClass().getName() + ", not an Axis");
    }

    /** Where an element of this model (in this file or a referenced one) starts, when it was read from a file. */
    public Optional<SourcePosition> positionOf(EObject element) {
        return ModelFiles.positionOf(element);
    }
}
