package org.tracewell.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.jar.JarFile;
import java.util.zip.ZipEntry;
import java.util.zip.ZipOutputStream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class UnsignedJarCopyTest {

    @TempDir
    Path dir;

    @Test
    void signatureFilesAreTheOnesTheJarSpecificationNames() {
        // JAR File Specification, "Signed JAR File" (JDK documentation), from memory: signature files are
        // META-INF/*.SF, their blocks *.RSA / *.DSA / *.EC, and SIG-* files, directly in META-INF.
        assertTrue(UnsignedJarCopy.isSignatureFile("META-INF/ECLIPSE_.SF"));
        assertTrue(UnsignedJarCopy.isSignatureFile("META-INF/ECLIPSE_.RSA"));
        assertTrue(UnsignedJarCopy.isSignatureFile("META-INF/signer.dsa"));
        assertTrue(UnsignedJarCopy.isSignatureFile("META-INF/KEY.EC"));
        assertTrue(UnsignedJarCopy.isSignatureFile("META-INF/SIG-ONE"));
        assertFalse(UnsignedJarCopy.isSignatureFile("META-INF/MANIFEST.MF"));
        assertFalse(UnsignedJarCopy.isSignatureFile("META-INF/services/x.SF"));
        assertFalse(UnsignedJarCopy.isSignatureFile("org/example/A.SF"));
    }

    @Test
    void signedJarLosesOnlyItsSignatureFiles() throws IOException {
        Path signed = jar("signed.jar", List.of("META-INF/MANIFEST.MF", "META-INF/ECLIPSE_.SF", "META-INF/ECLIPSE_.RSA",
                "org/example/A.class", "plugin.properties"));
        Path copy = dir.resolve("out/signed.jar");
        Files.createDirectories(copy.getParent());
        UnsignedJarCopy.copy(signed, copy);

        assertFalse(UnsignedJarCopy.isSigned(copy));
        try (JarFile jar = new JarFile(copy.toFile())) {
            assertEquals(List.of("META-INF/MANIFEST.MF", "org/example/A.class", "plugin.properties"),
                    jar.stream().map(ZipEntry::getName).toList());
            assertArrayEquals(content("org/example/A.class"),
                    jar.getInputStream(jar.getEntry("org/example/A.class")).readAllBytes());
        }
    }

    @Test
    void unsignedJarIsCopiedByteForByte() throws IOException {
        Path plain = jar("plain.jar", List.of("META-INF/MANIFEST.MF", "org/example/B.class"));
        Path copy = dir.resolve("plain-copy.jar");
        UnsignedJarCopy.copy(plain, copy);
        assertArrayEquals(Files.readAllBytes(plain), Files.readAllBytes(copy));
    }

    private Path jar(String name, List<String> entries) throws IOException {
        Path file = dir.resolve(name);
        try (ZipOutputStream out = new ZipOutputStream(Files.newOutputStream(file))) {
            for (String entry : entries) {
                out.putNextEntry(new ZipEntry(entry));
                out.write(content(entry));
                out.closeEntry();
            }
        }
        return file;
    }

    private static byte[] content(String entry) {
        return entry.equals("META-INF/MANIFEST.MF") ? "Manifest-Version: 1.0\r\n\r\n".getBytes(StandardCharsets.UTF_8)
                : ("content of " + entry).getBytes(StandardCharsets.UTF_8);
    }
}
