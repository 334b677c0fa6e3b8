package org.tracewell.core.io;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collection;
import java.util.HashMap;
import java.util.Iterator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.stream.Collectors;

import javax.xml.parsers.ParserConfigurationException;

import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EReference;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.eclipse.emf.ecore.InternalEObject;
import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.emf.ecore.resource.ResourceSet;
import org.eclipse.emf.ecore.resource.impl.ExtensibleURIConverterImpl;
import org.eclipse.emf.ecore.resource.impl.ResourceFactoryRegistryImpl;
import org.eclipse.emf.ecore.resource.impl.ResourceSetImpl;
import org.eclipse.emf.ecore.util.EcoreUtil;
import org.eclipse.emf.ecore.util.InternalEList;
import org.eclipse.emf.ecore.xmi.ClassNotFoundException;
import org.eclipse.emf.ecore.xmi.FeatureNotFoundException;
import org.eclipse.emf.ecore.xmi.IllegalValueException;
import org.eclipse.emf.ecore.xmi.PackageNotFoundException;
import org.eclipse.emf.ecore.xmi.UnresolvedReferenceException;
import org.eclipse.emf.ecore.xmi.XMIException;
import org.eclipse.emf.ecore.xmi.XMLResource;
import org.tracewell.model.Axis;
import org.tracewell.model.Machine;
import org.tracewell.model.TracewellPackage;
import org.xml.sax.SAXParseException;

/**
 * Reads and writes Tracewell model files ({@code *.machine}, {@code *.axis}) safely, in a plain JVM.
 * <ul>
 * <li>Reading never resolves DTDs or external entities ({@link SafeXml}), reads only {@code .machine}/{@code .axis}
 * files given by relative path or {@code file:} URI, and stops at {@link #maxFileBytes()} bytes per file.</li>
 * <li>Every problem is reported with file, line and column and what was expected, as one {@link ModelLoadException};
 * a referenced library file that is missing or broken is such a problem too, not a crash later.</li>
 * <li>Writing is deterministic (same model, same bytes; {@code \n} line ends; references relative; one attribute
 * per line so that changes merge line by line) and atomic with a {@code .bak} of the previous version
 * ({@link AtomicFileWriter}).</li>
 * </ul>
 * Instances hold no mutable state and may be shared.
 */
public final class ModelFiles {

    /** Default per-file size limit: 32 MiB, far above any real machine model. */
    public static final long DEFAULT_MAX_FILE_BYTES = 32L * 1024 * 1024;
    public static final String MACHINE_EXTENSION = "machine";
    public static final String AXIS_EXTENSION = "axis";

    private final long maxFileBytes;
    private final AtomicFileWriter writer;

    /** Default size limit, atomic rename. */
    public ModelFiles() {
        this(DEFAULT_MAX_FILE_BYTES, new AtomicFileWriter());
    }

    /**
     * @param maxFileBytes largest file accepted, in bytes (&gt; 0)
     * @param writer       how files are replaced (tests inject failures here)
     */
    public ModelFiles(long maxFileBytes, AtomicFileWriter writer) {
        if (maxFileBytes <= 0) {
            throw new IllegalArgumentException("maxFileBytes must be > 0, was " + maxFileBytes);
        }
        this.maxFileBytes = maxFileBytes;
        this.writer = java.util.Objects.requireNonNull(writer, "writer");
    }

    public long maxFileBytes() {
        return maxFileBytes;
    }

    // ------------------------------------------------------------------------------------------------ resource set

    /**
     * A resource set that only knows Tracewell files: no global factories, no network, size-bounded streams, safe
     * parser options for on-demand loading, and atomic saving even through {@link Resource#save(Map)}.
     */
    public ResourceSet newResourceSet() {
        ResourceSetImpl resourceSet = new ResourceSetImpl();
        resourceSet.setResourceFactoryRegistry(new ResourceFactoryRegistryImpl() {
            @Override
            protected Resource.Factory delegatedGetFactory(URI uri, String contentTypeIdentifier) {
                return null; // never fall back to globally registered factories
            }
        });
        TracewellResourceFactory factory = new TracewellResourceFactory();
        resourceSet.getResourceFactoryRegistry().getExtensionToFactoryMap().put(MACHINE_EXTENSION, factory);
        resourceSet.getResourceFactoryRegistry().getExtensionToFactoryMap().put(AXIS_EXTENSION, factory);
        resourceSet.getPackageRegistry().put(TracewellPackage.eNS_URI, TracewellPackage.eINSTANCE);
        resourceSet.setURIConverter(new GuardedUriConverter());
        resourceSet.getLoadOptions().putAll(loadOptions());
        return resourceSet;
    }

    /** Options for reading: hardened parser features, unknown elements reported (not silently kept). */
    public static Map<Object, Object> loadOptions() {
        Map<Object, Object> options = new HashMap<>();
        options.put(XMLResource.OPTION_PARSER_FEATURES, new HashMap<>(SafeXml.PARSER_FEATURES));
        options.put(XMLResource.OPTION_RECORD_UNKNOWN_FEATURE, Boolean.FALSE);
        options.put(XMLResource.OPTION_DEFER_IDREF_RESOLUTION, Boolean.TRUE);
        return options;
    }

    /** Options for writing: the fixed format that makes output deterministic and merge-friendly. */
    public static Map<Object, Object> saveOptions() {
        Map<Object, Object> options = new HashMap<>();
        options.put(XMLResource.OPTION_ENCODING, "UTF-8");
        options.put(Resource.OPTION_LINE_DELIMITER, "\n");
        // A width of 1 puts each attribute on a line of its own: a changed value is a one-line diff.
        options.put(XMLResource.OPTION_LINE_WIDTH, 1);
        options.put(XMLResource.OPTION_PROCESS_DANGLING_HREF, XMLResource.OPTION_PROCESS_DANGLING_HREF_THROW);
        return options;
    }

    // ------------------------------------------------------------------------------------------------ loading

    /** Reads a model file and every file it references into a new resource set. */
    public LoadedModel load(Path file) throws ModelLoadException {
        return load(file, newResourceSet());
    }

    /** Reads a model file and every file it references into {@code resourceSet} (from {@link #newResourceSet()}). */
    public LoadedModel load(Path file, ResourceSet resourceSet) throws ModelLoadException {
        if (resourceSet.getResource(fileUri(file), false) instanceof TracewellResource existing
                && existing.isLoaded() && existing.getErrors().isEmpty() && !existing.getContents().isEmpty()) {
            return new LoadedModel(file, existing, resourceSet); // e.g. a library file a machine already pulled in
        }
        List<Resource> before = List.copyOf(resourceSet.getResources());
        List<LoadProblem> problems = new ArrayList<>();
        TracewellResource resource = loadResource(file, null, resourceSet, problems);
        if (!problems.isEmpty()) {
            // Leave a shared resource set as it was: no half-read resources stay behind.
            resourceSet.getResources().retainAll(before);
        }
        return finish(file, resource, resourceSet, problems);
    }

    /**
     * Reads model content held in memory as if it were the file {@code nominalFile} (references resolve relative to
     * it). For previews, pasted content and tests.
     */
    public LoadedModel load(byte[] content, Path nominalFile) throws ModelLoadException {
        ResourceSet resourceSet = newResourceSet();
        List<LoadProblem> problems = new ArrayList<>();
        TracewellResource resource = loadResource(nominalFile, content, resourceSet, problems);
        return finish(nominalFile, resource, resourceSet, problems);
    }

    /** Reads a {@code .machine} file. */
    public Machine loadMachine(Path file) throws ModelLoadException {
        return load(file).machine();
    }

    private LoadedModel finish(Path file, TracewellResource resource, ResourceSet resourceSet,
            List<LoadProblem> problems) throws ModelLoadException {
        if (!problems.isEmpty()) {
            throw new ModelLoadException(problems);
        }
        return new LoadedModel(file, resource, resourceSet);
    }

    /**
     * Loads one file (from disk, or from {@code content} when given), checks its root, then loads and resolves
     * what it references. Problems are appended; returns the resource (possibly empty).
     */
    private TracewellResource loadResource(Path file, byte[] content, ResourceSet resourceSet,
            List<LoadProblem> problems) {
        URI uri = fileUri(file);
        TracewellResource resource = (TracewellResource) resourceSet.createResource(uri);
        if (resource == null) {
            problems.add(new LoadProblem(new SourcePosition(file, 0, 0),
                    "not a Tracewell model file; expected a name ending in ." + MACHINE_EXTENSION + " or ."
                            + AXIS_EXTENSION));
            return null;
        }
        int before = problems.size();
        try {
            if (content != null) {
                if (content.length > maxFileBytes) {
                    throw new BoundedInputStream.FileTooLargeException(file.toString(), maxFileBytes);
                }
                resource.load(new ByteArrayInputStream(content), resourceSet.getLoadOptions());
            } else {
                resource.load(resourceSet.getLoadOptions());
            }
        } catch (IOException | RuntimeException e) {
            collectProblems(file, resource, e, problems);
            resource.getContents().clear();
            return resource;
        }
        checkRoot(file, resource, problems);
        if (problems.size() == before) {
            resolveReferences(file, resource, resourceSet, problems);
        }
        // From here on edits mark the resource modified, so saveModified writes only the files that changed.
        resource.setTrackingModification(true);
        return resource;
    }

    private static void checkRoot(Path file, Resource resource, List<LoadProblem> problems) {
        String extension = extensionOf(file);
        EClass expected = MACHINE_EXTENSION.equals(extension) ? TracewellPackage.Literals.MACHINE
                : AXIS_EXTENSION.equals(extension) ? TracewellPackage.Literals.AXIS : null;
        if (resource.getContents().isEmpty()) {
            problems.add(new LoadProblem(new SourcePosition(file, 1, 1), "the file holds no model element; expected "
                    + (expected == null ? "a Machine or an Axis" : "one tw:" + expected.getName())));
            return;
        }
        if (resource.getContents().size() > 1) {
            problems.add(new LoadProblem(positionOrFile(resource.getContents().get(1), file),
                    "more than one root element; expected exactly one"));
        }
        EObject root = resource.getContents().get(0);
        if (expected != null && root.eClass() != expected) {
            problems.add(new LoadProblem(positionOrFile(root, file), "root element is a " + root.eClass().getName()
                    + "; a ." + extension + " file must hold one tw:" + expected.getName()));
        }
    }

    /** Loads every file the resource refers to and replaces proxies by the referenced elements. */
    private void resolveReferences(Path file, TracewellResource resource, ResourceSet resourceSet,
            List<LoadProblem> problems) {
        List<EObject> elements = new ArrayList<>();
        resource.getAllContents().forEachRemaining(elements::add);
        for (EObject element : elements) {
            for (EReference reference : element.eClass().getEAllReferences()) {
                if (reference.isContainment() || reference.isContainer() || reference.isDerived()
                        || reference.isTransient()) {
                    continue;
                }
                for (EObject target : targetsOf(element, reference)) {
                    if (target.eIsProxy()) {
                        resolveProxy(file, element, reference, target, resourceSet, problems);
                    }
                }
            }
        }
    }

    /** The referenced elements without resolving proxies (copying a resolving list would demand-load files). */
    @SuppressWarnings("unchecked")
    private static List<EObject> targetsOf(EObject element, EReference reference) {
        Object value = element.eGet(reference, false);
        if (value == null) {
            return List.of();
        }
        if (!reference.isMany()) {
            return List.of((EObject) value);
        }
        Collection<EObject> list = (Collection<EObject>) value;
        return new ArrayList<>(list instanceof InternalEList<?> internal ? (List<EObject>) internal.basicList() : list);
    }

    private void resolveProxy(Path file, EObject element, EReference reference, EObject proxy,
            ResourceSet resourceSet, List<LoadProblem> problems) {
        URI proxyUri = ((InternalEObject) proxy).eProxyURI();
        // The proxy was read from the element naming the file (<libraryAxes href=...>); point there when known.
        SourcePosition where = element.eResource() instanceof TracewellResource resource
                ? resource.startOf(proxy).map(p -> new SourcePosition(file, p[0], p[1]))
                        .orElse(new SourcePosition(file, 0, 0))
                : new SourcePosition(file, 0, 0);
        if (where.line() == 0) {
            where = positionOrFile(element, file);
        }
        String what = "reference " + reference.getName() + " → '" + relativeToFile(proxyUri, file) + "'";
        URI fileUri = proxyUri.trimFragment();
        Optional<String> refusal = refusalOf(fileUri);
        if (refusal.isPresent()) {
            problems.add(new LoadProblem(where, what + ": " + refusal.get()));
            return;
        }
        Path targetFile = Path.of(fileUri.toFileString());
        Resource targetResource = resourceSet.getResource(fileUri, false);
        if (targetResource == null) {
            if (!Files.isRegularFile(targetFile)) {
                problems.add(new LoadProblem(where, what + ": file " + targetFile
                        + " does not exist; expected a ." + AXIS_EXTENSION + " file at that path relative to " + file));
                return;
            }
            List<LoadProblem> inner = new ArrayList<>();
            targetResource = loadResource(targetFile, null, resourceSet, inner);
            if (!inner.isEmpty()) {
                problems.add(new LoadProblem(where, what + ": the referenced file cannot be read ("
                        + inner.size() + (inner.size() == 1 ? " problem" : " problems") + " below)"));
                problems.addAll(inner);
                return;
            }
        } else if (!targetResource.isLoaded() || !targetResource.getErrors().isEmpty()
                || targetResource.getContents().isEmpty()) {
            // Its own problems were reported when it was first read; say where else it is needed.
            problems.add(new LoadProblem(where, what + ": the referenced file cannot be read (see its problems)"));
            return;
        }
        EObject resolved = EcoreUtil.resolve(proxy, resourceSet);
        if (resolved.eIsProxy()) {
            problems.add(new LoadProblem(where, what + ": " + targetFile + " has no element with id '"
                    + proxyUri.fragment() + "'; ids there: " + idsIn(targetResource)));
        } else if (!reference.getEReferenceType().isInstance(resolved)) {
            problems.add(new LoadProblem(where, what + ": '" + proxyUri.fragment() + "' is a "
                    + resolved.eClass().getName() + "; expected a " + reference.getEReferenceType().getName()));
        }
    }

    private static String idsIn(Resource resource) {
        List<String> ids = new ArrayList<>();
        for (Iterator<EObject> it = resource.getAllContents(); it.hasNext() && ids.size() < 20;) {
            String id = EcoreUtil.getID(it.next());
            if (id != null) {
                ids.add(id);
            }
        }
        return ids.isEmpty() ? "(none)" : String.join(", ", ids);
    }

    /** Why a referenced file may not be read, or empty when it may. */
    private static Optional<String> refusalOf(URI fileUri) {
        if (!fileUri.isFile()) {
            return Optional.of("only relative paths to local ." + AXIS_EXTENSION + " or ." + MACHINE_EXTENSION
                    + " files are allowed, not a " + fileUri.scheme() + " URI");
        }
        String extension = fileUri.fileExtension();
        if (!AXIS_EXTENSION.equals(extension) && !MACHINE_EXTENSION.equals(extension)) {
            return Optional.of("only ." + AXIS_EXTENSION + " and ." + MACHINE_EXTENSION
                    + " files can be referenced, not '" + fileUri.lastSegment() + "'");
        }
        return Optional.empty();
    }

    private static String relativeToFile(URI uri, Path file) {
        URI base = fileUri(file);
        URI relative = uri.deresolve(base, true, true, false);
        return relative.toString();
    }

    private static void collectProblems(Path file, Resource resource, Exception failure, List<LoadProblem> problems) {
        Set<String> seen = new LinkedHashSet<>();
        List<LoadProblem> found = new ArrayList<>();
        for (Resource.Diagnostic diagnostic : resource.getErrors()) {
            add(found, seen, problemFrom(file, diagnostic));
        }
        Throwable cause = failure;
        while (cause instanceof Resource.IOWrappedException || cause instanceof org.eclipse.emf.common.util.WrappedException) {
            if (cause.getCause() == null || cause.getCause() == cause) {
                break;
            }
            cause = cause.getCause();
        }
        if (cause instanceof Resource.Diagnostic diagnostic) {
            add(found, seen, problemFrom(file, diagnostic));
        } else if (cause instanceof SAXParseException sax) {
            add(found, seen, new LoadProblem(new SourcePosition(file, sax.getLineNumber(), sax.getColumnNumber()),
                    describeSax(sax)));
        } else if (found.isEmpty()) {
            add(found, seen, new LoadProblem(new SourcePosition(file, 0, 0), describeOther(file, cause)));
        }
        problems.addAll(found);
    }

    private static void add(List<LoadProblem> problems, Set<String> seen, LoadProblem problem) {
        if (seen.add(problem.toString())) {
            problems.add(problem);
        }
    }

    private static LoadProblem problemFrom(Path file, Resource.Diagnostic diagnostic) {
        SourcePosition where = new SourcePosition(file, Math.max(0, diagnostic.getLine()),
                Math.max(0, diagnostic.getColumn()));
        Object cause = diagnostic instanceof Exception e && e.getCause() != null ? e.getCause() : null;
        if (diagnostic instanceof XMIException xmi && xmi.getWrappedException() instanceof SAXParseException sax) {
            return new LoadProblem(new SourcePosition(file, sax.getLineNumber(), sax.getColumnNumber()),
                    describeSax(sax));
        }
        if (diagnostic instanceof FeatureNotFoundException missing) {
            EObject owner = missing.getObject();
            String expected = owner == null ? "" : "; expected one of: " + owner.eClass().getEAllStructuralFeatures()
                    .stream().filter(f -> !f.isTransient() && !f.isDerived()).map(EStructuralFeature::getName)
                    .collect(Collectors.joining(", "));
            return new LoadProblem(where, "unknown element or attribute '" + missing.getName() + "'"
                    + (owner == null ? "" : " in " + owner.eClass().getName()) + expected);
        } else if (diagnostic instanceof ClassNotFoundException unknownType) {
            return new LoadProblem(where, "unknown type '" + unknownType.getName() + "'; expected one of: "
                    + TracewellPackage.eINSTANCE.getEClassifiers().stream()
                            .filter(c -> c instanceof EClass k && !k.isAbstract())
                            .map(c -> "tw:" + c.getName()).collect(Collectors.joining(", ")));
        } else if (diagnostic instanceof PackageNotFoundException unknownPackage) {
            return new LoadProblem(where, "unknown namespace '" + unknownPackage.uri() + "'; expected "
                    + TracewellPackage.eNS_URI);
        } else if (diagnostic instanceof UnresolvedReferenceException unresolved) {
            return new LoadProblem(where, "reference " + (unresolved.getFeature() == null ? ""
                    : unresolved.getFeature().getName() + " ") + "→ '" + unresolved.getReference()
                    + "': no element with that id in this file");
        } else if (diagnostic instanceof IllegalValueException illegal) {
            return new LoadProblem(where, "value '" + illegal.getValue() + "' is not valid for "
                    + (illegal.getFeature() == null ? "this attribute" : illegal.getFeature().getName())
                    + expectedType(illegal.getFeature()));
        }
        String message = diagnostic.getMessage();
        if (cause instanceof NumberFormatException number) {
            message = "not a number: " + number.getMessage();
        }
        return new LoadProblem(where, message == null ? "unreadable content" : message);
    }

    private static String expectedType(EStructuralFeature feature) {
        if (feature == null || feature.getEType() == null) {
            return "";
        }
        return "; expected " + switch (feature.getEType().getName()) {
            case "EDouble" -> "a number such as 0.012 (SI units)";
            case "EInt" -> "a whole number";
            case "EBoolean" -> "true or false";
            default -> feature.getEType() instanceof org.eclipse.emf.ecore.EEnum e
                    ? "one of " + e.getELiterals().stream().map(l -> l.getLiteral()).collect(Collectors.joining(", "))
                    : "a " + feature.getEType().getName();
        };
    }

    private static String describeSax(SAXParseException sax) {
        String message = sax.getMessage() == null ? "" : sax.getMessage();
        if (message.contains("DOCTYPE") || message.contains("disallow-doctype-decl")) {
            return "a DOCTYPE declaration is not allowed: Tracewell files use no DTDs or entities, so nothing"
                    + " outside the file is ever read; remove the <!DOCTYPE ...> part";
        }
        return "XML is not well-formed: " + message;
    }

    private static String describeOther(Path file, Throwable cause) {
        if (cause instanceof NoSuchFileException || cause instanceof java.io.FileNotFoundException) {
            return "file does not exist";
        }
        if (cause instanceof BoundedInputStream.FileTooLargeException) {
            return cause.getMessage();
        }
        if (cause instanceof ParserConfigurationException) {
            return "XML parser cannot be configured safely: " + cause.getMessage();
        }
        String message = cause.getMessage();
        return (message == null ? cause.getClass().getSimpleName() : message);
    }

    // ------------------------------------------------------------------------------------------------ saving

    /**
     * The bytes {@link #save} would write. Assigns ids to elements that lack one (see {@link IdAssigner}).
     *
     * @throws IOException when the model refers to an element outside any file, or would need an absolute path
     */
    public byte[] serialize(Resource resource) throws IOException {
        IdAssigner.assignMissingIds(resource);
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try {
            resource.save(bytes, saveOptions());
        } catch (RuntimeException e) {
            throw new IOException("cannot write " + resource.getURI() + ": " + e.getMessage(), e);
        }
        byte[] content = bytes.toByteArray();
        String text = new String(content, StandardCharsets.UTF_8);
        // Only references matter (user text may well mention a file: URL): they are written as href="...".
        int absolute = text.indexOf("href=\"file:");
        if (absolute >= 0) {
            throw new IOException("cannot write " + resource.getURI() + ": a reference would be stored as an absolute"
                    + " path (" + text.substring(absolute, Math.min(text.length(), absolute + 80)).split("[\"#]")[0]
                    + "); keep referenced files on the same drive so a relative path exists");
        }
        return content;
    }

    /** Writes a resource to its file atomically, keeping the previous version as {@code NAME.bak}. */
    public void save(Resource resource) throws IOException {
        URI uri = resource.getURI();
        if (uri == null || !uri.isFile()) {
            throw new IOException("cannot save a resource without a local file URI: " + uri);
        }
        writer.write(Path.of(uri.toFileString()), serialize(resource));
        resource.setModified(false);
    }

    /** Saves every loaded resource of the set that is modified (or never saved); returns the files written. */
    public List<Path> saveModified(ResourceSet resourceSet) throws IOException {
        List<Path> written = new ArrayList<>();
        for (Resource resource : List.copyOf(resourceSet.getResources())) {
            URI uri = resource.getURI();
            boolean neverSaved = uri != null && uri.isFile() && !Files.exists(Path.of(uri.toFileString()));
            if (resource.isLoaded() && (resource.isModified() || neverSaved || !resource.isTrackingModification())) {
                // Resources created in memory are not tracked: they are saved every time.
                save(resource);
                written.add(Path.of(uri.toFileString()));
            }
        }
        return written;
    }

    // ------------------------------------------------------------------------------------------------ positions

    /** Where an element starts in the file it was read from. */
    public static Optional<SourcePosition> positionOf(EObject element) {
        if (element == null || !(element.eResource() instanceof TracewellResource resource)) {
            return Optional.empty();
        }
        URI uri = resource.getURI();
        Path file = uri != null && uri.isFile() ? Path.of(uri.toFileString()) : Path.of(String.valueOf(uri));
        return resource.startOf(element).map(p -> new SourcePosition(file, p[0], p[1]));
    }

    private static SourcePosition positionOrFile(EObject element, Path file) {
        if (element.eResource() instanceof TracewellResource resource) {
            Optional<int[]> start = resource.startOf(element);
            if (start.isPresent()) {
                return new SourcePosition(file, start.get()[0], start.get()[1]);
            }
        }
        return new SourcePosition(file, 0, 0);
    }

    static URI fileUri(Path file) {
        return URI.createFileURI(file.toAbsolutePath().normalize().toString());
    }

    private static String extensionOf(Path file) {
        String name = file.getFileName() == null ? "" : file.getFileName().toString();
        int dot = name.lastIndexOf('.');
        return dot < 0 ? "" : name.substring(dot + 1).toLowerCase(Locale.ROOT);
    }

    /** Reads only local Tracewell files, bounded in size; writes atomically. Anything else is refused. */
    private final class GuardedUriConverter extends ExtensibleURIConverterImpl {

        @Override
        public InputStream createInputStream(URI uri, Map<?, ?> options) throws IOException {
            Path path = allowed(normalize(uri));
            long size = Files.size(path);
            if (size > maxFileBytes) {
                throw new BoundedInputStream.FileTooLargeException(path + " (" + size + " bytes)", maxFileBytes);
            }
            return new BoundedInputStream(Files.newInputStream(path), maxFileBytes, path.toString());
        }

        @Override
        public OutputStream createOutputStream(URI uri, Map<?, ?> options) throws IOException {
            Path path = allowed(normalize(uri));
            return new ByteArrayOutputStream() {
                private boolean closed;

                @Override
                public void close() throws IOException {
                    if (!closed) {
                        closed = true;
                        writer.write(path, toByteArray());
                    }
                }
            };
        }

        private Path allowed(URI uri) throws IOException {
            Optional<String> refusal = refusalOf(uri);
            if (refusal.isPresent()) {
                throw new IOException("refused to open " + uri + ": " + refusal.get());
            }
            return Path.of(uri.toFileString());
        }

        @Override
        public Map<String, ?> getAttributes(URI uri, Map<?, ?> options) {
            return refusalOf(normalize(uri)).isPresent() ? Map.of() : super.getAttributes(uri, options);
        }

        @Override
        public boolean exists(URI uri, Map<?, ?> options) {
            return refusalOf(normalize(uri)).isEmpty() && super.exists(uri, options);
        }
    }
}
