package org.tracewell.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Locale;
import java.util.zip.ZipEntry;
import java.util.zip.ZipInputStream;
import java.util.zip.ZipOutputStream;

/**
 * Copies the jars of the headless class path into one folder, leaving out jar-signature files.
 * <p>
 * Why: a signed jar on a plain class path is verified on every start (about half a second for the four EMF
 * jars on a small machine), and the JVM keeps classes from signed jars out of the class-data archive the
 * launcher writes, so they are also parsed afresh each time. The signatures were already checked when the
 * build resolved the jars; the launcher runs this once per product build ({@code tracewell} script), and the
 * workbench keeps using the signed originals.
 */
public final class UnsignedJarCopy {

    private UnsignedJarCopy() {
    }

    /** {@code UnsignedJarCopy TARGET_DIR JAR...}; exit 0 when every jar was copied, 2 otherwise. */
    public static void main(String[] args) {
        if (args.length < 2) {
            System.err.println("usage: UnsignedJarCopy TARGET_DIR JAR...");
            System.exit(ExitCode.BAD_INPUT);
        }
        Path target = Path.of(args[0]);
        try {
            Files.createDirectories(target);
            for (int i = 1; i < args.length; i++) {
                Path jar = Path.of(args[i]);
                copy(jar, target.resolve(jar.getFileName()));
            }
        } catch (IOException e) {
            System.err.println("tracewell: cannot prepare the headless class path in " + target + ": " + e);
            System.exit(ExitCode.BAD_INPUT);
        }
    }

    /** Copies {@code source} to {@code target}; a signed jar is rewritten without its signature files. */
    static void copy(Path source, Path target) throws IOException {
        if (!isSigned(source)) {
            Files.copy(source, target, StandardCopyOption.REPLACE_EXISTING);
            return;
        }
        Path partial = target.resolveSibling(target.getFileName() + ".part");
        try (ZipInputStream in = new ZipInputStream(Files.newInputStream(source));
                ZipOutputStream out = new ZipOutputStream(Files.newOutputStream(partial))) {
            for (ZipEntry entry = in.getNextEntry(); entry != null; entry = in.getNextEntry()) {
                if (isSignatureFile(entry.getName())) {
                    continue;
                }
                ZipEntry copy = new ZipEntry(entry.getName());
                copy.setTime(entry.getTime());
                out.putNextEntry(copy);
                in.transferTo(out);
                out.closeEntry();
            }
        }
        Files.move(partial, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
    }

    static boolean isSigned(Path jar) throws IOException {
        try (ZipInputStream in = new ZipInputStream(Files.newInputStream(jar))) {
            for (ZipEntry entry = in.getNextEntry(); entry != null; entry = in.getNextEntry()) {
                if (isSignatureFile(entry.getName())) {
                    return true;
                }
            }
        }
        return false;
    }

    /** The files the jar specification names for signatures: META-INF/*.SF, *.RSA, *.DSA, *.EC and SIG-*. */
    static boolean isSignatureFile(String entryName) {
        String name = entryName.toUpperCase(Locale.ROOT);
        if (!name.startsWith("META-INF/") || name.indexOf('/', "META-INF/".length()) >= 0) {
            return false;
        }
        String file = name.substring("META-INF/".length());
        return file.endsWith(".SF") || file.endsWith(".RSA") || file.endsWith(".DSA") || file.endsWith(".EC")
                || file.startsWith("SIG-");
    }
}
