package org.tracewell.releng.generator;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.charset.StandardCharsets;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.Comparator;
import java.util.List;
import java.util.stream.Stream;

import org.eclipse.emf.codegen.ecore.generator.Generator;
import org.eclipse.emf.codegen.ecore.generator.GeneratorAdapterFactory;
import org.eclipse.emf.codegen.ecore.genmodel.GenModel;
import org.eclipse.emf.codegen.ecore.genmodel.GenModelPackage;
import org.eclipse.emf.codegen.ecore.genmodel.GenPackage;
import org.eclipse.emf.codegen.ecore.genmodel.generator.GenBaseGeneratorAdapter;
import org.eclipse.emf.codegen.ecore.genmodel.generator.GenModelGeneratorAdapterFactory;
import org.eclipse.emf.common.util.BasicMonitor;
import org.eclipse.emf.common.util.Diagnostic;
import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.EAnnotation;
import org.eclipse.emf.ecore.EAttribute;
import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.EClassifier;
import org.eclipse.emf.ecore.EcorePackage;
import org.eclipse.emf.ecore.plugin.EcorePlugin;
import org.eclipse.emf.ecore.resource.ResourceSet;
import org.eclipse.emf.ecore.resource.impl.ResourceSetImpl;
import org.eclipse.emf.ecore.xmi.impl.EcoreResourceFactoryImpl;
import org.eclipse.emf.ecore.xmi.impl.XMIResourceFactoryImpl;

/**
 * Headless (non-OSGi) regeneration of Tracewell's EMF model and edit code.
 * <p>
 * Arguments: {@code path/to/tracewell.genmodel bundlesDir stagingDir}.
 * <p>
 * The generator works on a staging copy of each bundle, pre-filled with the current {@code src-gen} and
 * {@code plugin.xml}/{@code plugin.properties}, so EMF's merger keeps members marked {@code @generated NOT}. Only those
 * files are copied back: the bundles' MANIFEST.MF and build.properties belong to the Tycho build and are never
 * touched.
 */
public final class GenerateModel {

    private static final List<String> BUNDLES = List.of("org.tracewell.model", "org.tracewell.model.edit");
    private static final List<String> BUNDLE_ROOT_FILES = List.of("plugin.xml", "plugin.properties");
    /** Generated once if absent (default icons); kept as they are afterwards. */
    private static final String ICONS = "icons";

    private GenerateModel() {
    }

    public static void main(String[] args) throws IOException {
        if (args.length != 3) {
            System.err.println("usage: GenerateModel path/to/tracewell.genmodel bundlesDir stagingDir");
            System.exit(2);
        }
        Path genModelFile = Path.of(args[0]).toAbsolutePath().normalize();
        Path bundlesDir = Path.of(args[1]).toAbsolutePath().normalize();
        Path stagingDir = Path.of(args[2]).toAbsolutePath().normalize();

        deleteTree(stagingDir);
        for (String bundle : BUNDLES) {
            Path staged = stagingDir.resolve(bundle);
            Files.createDirectories(staged);
            copyTree(bundlesDir.resolve(bundle).resolve("src-gen"), staged.resolve("src-gen"));
            for (String name : BUNDLE_ROOT_FILES) {
                copyIfPresent(bundlesDir.resolve(bundle).resolve(name), staged.resolve(name));
            }
            copyTree(bundlesDir.resolve(bundle).resolve(ICONS), staged.resolve(ICONS));
            // The genmodel names its output folders as /<bundle>/src-gen; point those platform URIs at the staging copy.
            EcorePlugin.getPlatformResourceMap().put(bundle, URI.createFileURI(staged + "/"));
        }

        ResourceSet resourceSet = new ResourceSetImpl();
        resourceSet.getResourceFactoryRegistry().getExtensionToFactoryMap().put("ecore", new EcoreResourceFactoryImpl());
        resourceSet.getResourceFactoryRegistry().getExtensionToFactoryMap().put("genmodel", new XMIResourceFactoryImpl());
        resourceSet.getPackageRegistry().put(EcorePackage.eNS_URI, EcorePackage.eINSTANCE);
        resourceSet.getPackageRegistry().put(GenModelPackage.eNS_URI, GenModelPackage.eINSTANCE);

        GenModel genModel = (GenModel) resourceSet.getResource(URI.createFileURI(genModelFile.toString()), true)
                .getContents().get(0);
        genModel.reconcile();
        genModel.setCanGenerate(true);
        genModel.setUpdateClasspath(false);

        // Outside OSGi the generatorAdapters extension point does not exist: without this nothing is generated.
        GeneratorAdapterFactory.Descriptor.Registry.INSTANCE.addDescriptor(GenModelPackage.eNS_URI,
                GenModelGeneratorAdapterFactory.DESCRIPTOR);

        Generator generator = new Generator();
        generator.setInput(genModel);
        boolean failed = false;
        for (String projectType : List.of(GenBaseGeneratorAdapter.MODEL_PROJECT_TYPE,
                GenBaseGeneratorAdapter.EDIT_PROJECT_TYPE)) {
            Diagnostic result = generator.generate(genModel, projectType, new BasicMonitor());
            System.out.println(projectType + ": " + severityName(result.getSeverity())
                    + (result.getMessage() == null ? "" : " " + result.getMessage()));
            for (Diagnostic child : result.getChildren()) {
                if (child.getSeverity() != Diagnostic.OK) {
                    System.out.println("  " + severityName(child.getSeverity()) + " " + child.getMessage());
                }
            }
            failed |= result.getSeverity() == Diagnostic.ERROR;
        }
        if (failed) {
            System.err.println("generation failed; bundles left unchanged");
            System.exit(1);
        }

        addUnitsToPropertyNames(genModel, stagingDir.resolve("org.tracewell.model.edit").resolve("plugin.properties"));

        for (String bundle : BUNDLES) {
            Path staged = stagingDir.resolve(bundle);
            Path target = bundlesDir.resolve(bundle);
            deleteTree(target.resolve("src-gen"));
            copyTree(staged.resolve("src-gen"), target.resolve("src-gen"));
            for (String name : BUNDLE_ROOT_FILES) {
                copyIfPresent(staged.resolve(name), target.resolve(name));
            }
            copyTree(staged.resolve(ICONS), target.resolve(ICONS));
            System.out.println("updated " + target.resolve("src-gen"));
        }
    }

    /** Annotation source of the unit declarations in tracewell.ecore. */
    private static final String UNITS_SOURCE = "http://tracewell.org/units";
    private static final Pattern FEATURE_NAME = Pattern.compile("^_UI_(\\w+?)_(\\w+)_feature = ([^\\[]*)$");

    /**
     * The property sheet edits stored (SI) values, so each property name says its SI unit, e.g. "Lead [m]",
     * "Max Velocity [m/s | rad/s]". Entries that already carry a unit are left alone.
     */
    private static void addUnitsToPropertyNames(GenModel genModel, Path properties) throws IOException {
        if (!Files.isRegularFile(properties)) {
            return;
        }
        Map<String, String> units = new HashMap<>();
        for (GenPackage genPackage : genModel.getGenPackages()) {
            for (EClassifier classifier : genPackage.getEcorePackage().getEClassifiers()) {
                if (classifier instanceof EClass eClass) {
                    for (EAttribute attribute : eClass.getEAttributes()) {
                        EAnnotation annotation = attribute.getEAnnotation(UNITS_SOURCE);
                        String unit = annotation == null ? null : annotation.getDetails().get("unit");
                        if (unit != null && !unit.isEmpty()) {
                            String rotary = annotation.getDetails().get("rotaryUnit");
                            units.put(eClass.getName() + "_" + attribute.getName(),
                                    rotary == null || rotary.equals(unit) ? unit : unit + " | " + rotary);
                        }
                    }
                }
            }
        }
        List<String> lines = Files.readAllLines(properties, StandardCharsets.ISO_8859_1);
        List<String> result = new ArrayList<>(lines.size());
        for (String line : lines) {
            Matcher m = FEATURE_NAME.matcher(line);
            String unit = m.matches() ? units.get(m.group(1) + "_" + m.group(2)) : null;
            result.add(unit == null ? line : line.stripTrailing() + " [" + asciiEscaped(unit) + "]");
        }
        Files.write(properties, result, StandardCharsets.ISO_8859_1);
    }

    /** .properties files are Latin-1; \\uXXXX keeps them readable by every loader. */
    private static String asciiEscaped(String text) {
        StringBuilder out = new StringBuilder();
        for (char c : text.toCharArray()) {
            out.append(c < 128 ? String.valueOf(c) : String.format("\\u%04x", (int) c));
        }
        return out.toString();
    }

    private static String severityName(int severity) {
        return switch (severity) {
            case Diagnostic.OK -> "OK";
            case Diagnostic.INFO -> "INFO";
            case Diagnostic.WARNING -> "WARNING";
            case Diagnostic.ERROR -> "ERROR";
            default -> "severity " + severity;
        };
    }

    private static void copyIfPresent(Path from, Path to) throws IOException {
        if (Files.isRegularFile(from)) {
            Files.createDirectories(to.getParent());
            Files.copy(from, to, StandardCopyOption.REPLACE_EXISTING);
        }
    }

    private static void copyTree(Path from, Path to) throws IOException {
        if (!Files.isDirectory(from)) {
            return;
        }
        try (Stream<Path> paths = Files.walk(from)) {
            paths.forEach(source -> {
                Path destination = to.resolve(from.relativize(source).toString());
                try {
                    if (Files.isDirectory(source)) {
                        Files.createDirectories(destination);
                    } else {
                        Files.copy(source, destination, StandardCopyOption.REPLACE_EXISTING);
                    }
                } catch (IOException e) {
                    throw new UncheckedIOException(e);
                }
            });
        }
    }

    private static void deleteTree(Path root) throws IOException {
        if (!Files.exists(root)) {
            return;
        }
        try (Stream<Path> paths = Files.walk(root)) {
            for (Path path : paths.sorted(Comparator.reverseOrder()).toList()) {
                Files.delete(path);
            }
        }
    }
}
