package org.tracewell.core.mapping;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.emf.ecore.resource.ResourceSet;
import org.tracewell.core.io.ModelFiles;
import org.tracewell.model.Axis;
import org.tracewell.model.Machine;

/**
 * An updated copy of the model file that holds an axis, with a fit written into the axis's plant. The original is
 * never touched: the copy lives in no resource until {@link #write} gives it a new file.
 *
 * @param original the root the axis came from: its machine, or the library {@code .axis} file's axis
 * @param copy     the updated copy of {@code original} (an {@code EcoreUtil} copy; ids kept)
 * @param axis     the updated axis inside {@code copy}
 * @param changes  the attributes set from the fit, in the order they were set
 */
public record UpdatedAxisModel(EObject original, EObject copy, Axis axis, List<PlantAttributeChange> changes) {

    public UpdatedAxisModel {
        changes = List.copyOf(changes);
    }

    /** True when the axis lives in its own {@code .axis} file (a shared library axis), not inside a machine. */
    public boolean fromLibrary() {
        return !(original instanceof Machine);
    }

    /** The file the original was read from, when it was read from a local file. */
    public Optional<Path> originalFile() {
        return fileOf(original.eResource());
    }

    /** The file extension the copy must be written with: {@code machine} or {@code axis}. */
    public String extension() {
        return fromLibrary() ? ModelFiles.AXIS_EXTENSION : ModelFiles.MACHINE_EXTENSION;
    }

    /**
     * Writes the copy to {@code out} with the atomic, deterministic save of {@link ModelFiles} (so only the changed
     * attribute lines differ from the original when both sit in the same folder). References to library files are
     * written relative to {@code out}.
     *
     * @throws IllegalArgumentException when {@code out} is the original file or any other file of the model in use
     *                                  (a library file the machine references), or has the wrong extension
     * @throws IOException              when the file cannot be written
     */
    public Path write(Path out, ModelFiles files) throws IOException {
        String name = out.getFileName() == null ? "" : out.getFileName().toString();
        if (!name.endsWith("." + extension())) {
            throw new IllegalArgumentException(out + ": the updated " + (fromLibrary() ? "library axis" : "machine")
                    + " must be written to a ." + extension() + " file" + (fromLibrary() ? " (axis '"
                            + axis.getName() + "' comes from " + originalFile().map(Path::toString).orElse("a library file")
                            + ")" : ""));
        }
        ResourceSet resourceSet = original.eResource() == null ? files.newResourceSet()
                : original.eResource().getResourceSet();
        if (resourceSet == null) {
            resourceSet = files.newResourceSet();
        }
        for (Resource inUse : List.copyOf(resourceSet.getResources())) {
            Optional<Path> file = fileOf(inUse);
            if (file.isPresent() && sameFile(file.get(), out)) {
                String which = inUse != original.eResource() ? "a model file in use "
                        : fromLibrary() ? "the library file axis '" + axis.getName() + "' comes from "
                                : "the input file ";
                throw new IllegalArgumentException(out + ": refusing to overwrite " + which + file.get()
                        + "; give a new file name for the updated copy");
            }
        }
        Resource resource = resourceSet.createResource(URI.createFileURI(out.toAbsolutePath().normalize().toString()));
        if (resource == null) {
            throw new IllegalArgumentException(out + ": not a Tracewell model file name; expected ." + extension());
        }
        try {
            resource.getContents().add(copy);
            files.save(resource);
        } finally {
            // The copy stays usable in memory; the set the original came from is left as it was.
            resource.getContents().clear();
            resourceSet.getResources().remove(resource);
        }
        return out;
    }

    private static Optional<Path> fileOf(Resource resource) {
        if (resource == null || resource.getURI() == null || !resource.getURI().isFile()) {
            return Optional.empty();
        }
        return Optional.of(Path.of(resource.getURI().toFileString()));
    }

    /** Same file after resolving relative parts and links (a file that does not exist yet by its folder). */
    static boolean sameFile(Path a, Path b) {
        return canonical(a).equals(canonical(b));
    }

    private static Path canonical(Path p) {
        Path absolute = p.toAbsolutePath().normalize();
        try {
            if (Files.exists(absolute)) {
                return absolute.toRealPath();
            }
            Path parent = absolute.getParent();
            if (parent != null && Files.exists(parent)) {
                return parent.toRealPath().resolve(absolute.getFileName());
            }
        } catch (IOException e) {
            return absolute; // unreadable: compare as written
        }
        return absolute;
    }
}
