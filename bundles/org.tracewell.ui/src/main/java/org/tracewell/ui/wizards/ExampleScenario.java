package org.tracewell.ui.wizards;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.net.URL;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Enumeration;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import org.osgi.framework.Bundle;
import org.osgi.framework.FrameworkUtil;
import org.tracewell.core.Examples;

/**
 * The demo scenario (Larchmont Motion LM-3020 and LM-T5 with their shared axis library), copied to where the user
 * works. The copy packed into this bundle is used (it is the one the product was built and tested with); outside a
 * packed bundle, the checkout's {@code examples/} folder ({@link Examples#folder()}). Existing files are never
 * overwritten: a file that is already there with the same content is left alone, one with other content stops the
 * copy before anything is written.
 */
public final class ExampleScenario {

    /** Folder of the examples inside this bundle (see the bundle's pom: copied there at build time). */
    static final String BUNDLE_FOLDER = "examples";

    /** References of a machine to library files, as the save code writes them: {@code href="library/x.axis#id"}. */
    private static final Pattern LIBRARY_REFERENCE = Pattern.compile("href=\"([^\"#]+\\.axis)#");

    private ExampleScenario() {
    }

    /** File names of the example machines, sorted ({@code LM-3020.machine}, {@code LM-T5.machine}). */
    public static List<String> machines() {
        return relativeFiles().stream().filter(f -> f.endsWith(".machine") && !f.contains("/")).sorted().toList();
    }

    /** Copies the whole scenario into {@code folder} (created when missing); returns the files it holds there. */
    public static List<Path> copyTo(Path folder) throws IOException {
        return copy(List.copyOf(relativeFiles()), folder);
    }

    /** Copies one example machine and the library files it references into {@code folder}; returns the machine. */
    public static Path copyMachine(String machine, Path folder) throws IOException {
        if (!machines().contains(machine)) {
            throw new IOException("'" + machine + "' is not an example; examples: " + String.join(", ", machines()));
        }
        List<String> files = new ArrayList<>();
        files.add(machine);
        Matcher m = LIBRARY_REFERENCE.matcher(new String(read(machine), java.nio.charset.StandardCharsets.UTF_8));
        while (m.find()) {
            files.add(m.group(1));
        }
        copy(List.copyOf(new LinkedHashSet<>(files)), folder);
        return folder.resolve(machine);
    }

    private static List<Path> copy(List<String> relative, Path folder) throws IOException {
        Path target = folder.toAbsolutePath().normalize();
        List<String> conflicts = new ArrayList<>();
        for (String file : relative) {
            Path destination = target.resolve(file);
            if (Files.exists(destination) && !Arrays.equals(Files.readAllBytes(destination), read(file))) {
                conflicts.add(destination.toString());
            }
        }
        if (!conflicts.isEmpty()) {
            throw new IOException("not copied: " + String.join(", ", conflicts) + (conflicts.size() == 1 ? " exists"
                    : " exist") + " with other content; choose an empty folder or move the file(s) away");
        }
        List<Path> written = new ArrayList<>();
        for (String file : relative) {
            Path destination = target.resolve(file);
            if (!Files.exists(destination)) {
                Files.createDirectories(destination.getParent());
                Files.write(destination, read(file));
            }
            written.add(destination);
        }
        return written;
    }

    /** Every file of the scenario, relative, with '/' separators. */
    private static Set<String> relativeFiles() {
        Set<String> files = new TreeSet<>();
        Bundle bundle = bundle();
        if (bundle != null && bundle.getEntry(BUNDLE_FOLDER + "/" + Examples.LM_3020) != null) {
            Enumeration<URL> entries = bundle.findEntries(BUNDLE_FOLDER, "*", true);
            while (entries != null && entries.hasMoreElements()) {
                String path = entries.nextElement().getPath();
                String relative = path.substring(path.indexOf(BUNDLE_FOLDER + "/") + BUNDLE_FOLDER.length() + 1);
                if (relative.endsWith(".machine") || relative.endsWith(".axis")) {
                    files.add(relative);
                }
            }
            return files;
        }
        Path folder = Examples.folder();
        try (Stream<Path> walk = Files.walk(folder)) {
            walk.filter(Files::isRegularFile).map(p -> folder.relativize(p).toString().replace('\\', '/'))
                    .filter(p -> p.endsWith(".machine") || p.endsWith(".axis")).forEach(files::add);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return files;
    }

    private static byte[] read(String relative) throws IOException {
        Bundle bundle = bundle();
        URL entry = bundle == null ? null : bundle.getEntry(BUNDLE_FOLDER + "/" + relative);
        if (entry != null) {
            try (InputStream in = entry.openStream()) {
                return in.readAllBytes();
            }
        }
        return Files.readAllBytes(Examples.folder().resolve(relative));
    }

    private static Bundle bundle() {
        return FrameworkUtil.getBundle(ExampleScenario.class);
    }
}
