package org.tracewell.ui.editor;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.stream.Stream;

/**
 * Which machines use a shared library axis file. A library is shared by the machines of one project folder: the
 * folder of the machine being edited and the folder above the library. Their {@code .machine} files are scanned for a
 * reference to the axis file (the text only; nothing is loaded), so the answer costs milliseconds.
 */
public final class LibraryUsage {

    private LibraryUsage() {
    }

    /** Names (file name without {@code .machine}) of the machines that reference {@code axisFile}, sorted. */
    public static List<String> usedBy(Path axisFile, Path editedFile) {
        Path axis = axisFile.toAbsolutePath().normalize();
        Set<Path> folders = new LinkedHashSet<>();
        if (editedFile != null && editedFile.toAbsolutePath().getParent() != null) {
            folders.add(editedFile.toAbsolutePath().normalize().getParent());
        }
        if (axis.getParent() != null && axis.getParent().getParent() != null) {
            folders.add(axis.getParent().getParent());
        }
        Set<String> users = new java.util.TreeSet<>();
        for (Path folder : folders) {
            try (Stream<Path> files = Files.list(folder)) {
                for (Path machine : files.filter(f -> f.getFileName().toString().endsWith(".machine")).toList()) {
                    if (references(machine, axis)) {
                        String name = machine.getFileName().toString();
                        users.add(name.substring(0, name.length() - ".machine".length()));
                    }
                }
            } catch (IOException unreadableFolder) {
                // A folder that cannot be listed contributes no users; the mark still says the axis is shared.
            }
        }
        return new ArrayList<>(users);
    }

    private static boolean references(Path machine, Path axis) throws IOException {
        if (Files.size(machine) > 32L * 1024 * 1024) {
            return false;
        }
        String text = Files.readString(machine, StandardCharsets.UTF_8);
        String relative = machine.getParent().relativize(axis).toString().replace('\\', '/');
        return text.contains("href=\"" + relative + "#");
    }
}
