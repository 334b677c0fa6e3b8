package org.tracewell.core;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

/** Finds the demo scenario in {@code examples/} and copies it for tests that change files. */
public final class Examples {

    public static final String LM_3020 = "LM-3020.machine";
    public static final String LM_T5 = "LM-T5.machine";
    public static final String SHARED_Z = "library/z-slide-25x5.axis";

    private Examples() {
    }

    /**
     * The examples folder: system property {@code tracewell.examples} (the launcher sets it), else the first
     * {@code examples/} holding the LM-3020 found walking up from the working directory (a bundle folder in the
     * reactor build), else walking up from this bundle's jar (inside a product next to a checkout).
     *
     * @throws IllegalStateException naming where it looked
     */
    public static Path folder() {
        String configured = System.getProperty("tracewell.examples");
        if (configured != null && !configured.isBlank()) {
            return Path.of(configured).toAbsolutePath().normalize();
        }
        Path found = findUpwards(Path.of("").toAbsolutePath());
        if (found == null) {
            try {
                var source = Examples.class.getProtectionDomain().getCodeSource();
                if (source != null) {
                    found = findUpwards(Path.of(source.getLocation().toURI()).toAbsolutePath());
                }
            } catch (java.net.URISyntaxException | IllegalArgumentException | java.nio.file.FileSystemNotFoundException e) {
                found = null;
            }
        }
        if (found == null) {
            throw new IllegalStateException("examples/" + LM_3020 + " not found above " + Path.of("").toAbsolutePath()
                    + "; set -Dtracewell.examples=PATH");
        }
        return found;
    }

    private static Path findUpwards(Path start) {
        for (Path dir = start; dir != null; dir = dir.getParent()) {
            Path candidate = dir.resolve("examples");
            if (Files.isRegularFile(candidate.resolve(LM_3020))) {
                return candidate;
            }
        }
        return null;
    }

    public static Path file(String relative) {
        return folder().resolve(relative);
    }

    /** Every model file of the examples: machines and library axes. */
    public static List<Path> allModelFiles() {
        try (Stream<Path> files = Files.walk(folder())) {
            return files.filter(p -> p.toString().endsWith(".machine") || p.toString().endsWith(".axis")).sorted()
                    .toList();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Copies the examples (with the library) into {@code target}; returns {@code target}. */
    public static Path copyTo(Path target) {
        Path source = folder();
        try (Stream<Path> files = Files.walk(source)) {
            for (Path p : files.toList()) {
                Path destination = target.resolve(source.relativize(p).toString());
                if (Files.isDirectory(p)) {
                    Files.createDirectories(destination);
                } else {
                    Files.copy(p, destination);
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return target;
    }
}
