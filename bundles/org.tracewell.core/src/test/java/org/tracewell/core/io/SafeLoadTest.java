package org.tracewell.core.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.net.InetAddress;
import java.net.ServerSocket;
import java.net.Socket;
import java.net.SocketTimeoutException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.atomic.AtomicInteger;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** XML external entities, DTDs and remote references must never be followed. */
class SafeLoadTest {

    private static final String SECRET = "TOP-SECRET-7f3a9";
    private static final String HEADER = "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n";
    private static final String AXIS_OPEN = "<tw:Axis xmi:version=\"2.0\" xmlns:xmi=\"http://www.omg.org/XMI\""
            + " xmlns:tw=\"http://tracewell.org/model/1.0\" id=\"a\" name=\"X\" description=\"";

    @TempDir
    Path temp;

    private final ModelFiles files = new ModelFiles();
    private ServerSocket server;
    private final AtomicInteger connections = new AtomicInteger();
    private Thread acceptor;

    @BeforeEach
    void startListener() throws IOException {
        server = new ServerSocket(0, 5, InetAddress.getLoopbackAddress());
        server.setSoTimeout(50);
        acceptor = new Thread(() -> {
            while (!server.isClosed()) {
                try (Socket ignored = server.accept()) {
                    connections.incrementAndGet();
                } catch (SocketTimeoutException again) {
                    // poll until closed
                } catch (IOException closed) {
                    return;
                }
            }
        }, "xxe-listener");
        acceptor.setDaemon(true);
        acceptor.start();
    }

    @AfterEach
    void stopListener() throws Exception {
        server.close();
        acceptor.join(2000);
    }

    private String url(String name) {
        return "http://127.0.0.1:" + server.getLocalPort() + "/" + name;
    }

    private Path write(String name, String content) throws IOException {
        Path file = temp.resolve(name);
        Files.writeString(file, content);
        return file;
    }

    private ModelLoadException loadFails(Path file) {
        return assertThrows(ModelLoadException.class, () -> files.load(file));
    }

    @Test
    void localFileEntityIsRefusedAndReadsNothing() throws Exception {
        Path secret = write("secret.txt", SECRET);
        Path file = write("xxe-file.axis", HEADER
                + "<!DOCTYPE tw:Axis [ <!ENTITY xxe SYSTEM \"" + secret.toUri() + "\"> ]>\n"
                + AXIS_OPEN + "&xxe;\"/>\n");
        ModelLoadException e = loadFails(file);
        assertFalse(e.getMessage().contains(SECRET), e.getMessage());
        assertTrue(e.getMessage().contains("DOCTYPE"), e.getMessage());
        assertEquals(file, e.file());
        assertEquals(2, e.line(), "the DOCTYPE is on line 2");
        assertTrue(e.column() > 0);
    }

    @Test
    void urlEntityIsRefusedWithoutConnecting() throws Exception {
        Path file = write("xxe-url.axis", HEADER
                + "<!DOCTYPE tw:Axis [ <!ENTITY xxe SYSTEM \"" + url("leak") + "\"> ]>\n"
                + AXIS_OPEN + "&xxe;\"/>\n");
        loadFails(file);
        Thread.sleep(100);
        assertEquals(0, connections.get(), "the parser contacted the entity URL");
    }

    @Test
    void externalParameterEntityAndDtdAreRefusedWithoutConnecting() throws Exception {
        Path file = write("xxe-dtd.axis", HEADER
                + "<!DOCTYPE tw:Axis SYSTEM \"" + url("evil.dtd") + "\" [ <!ENTITY % p SYSTEM \"" + url("p")
                + "\"> %p; ]>\n" + AXIS_OPEN + "x\"/>\n");
        loadFails(file);
        Thread.sleep(100);
        assertEquals(0, connections.get(), "the parser fetched a DTD");
    }

    @Test
    void internalEntityExpansionIsRefusedToo() throws Exception {
        // Even an internal entity needs a DOCTYPE; refusing every DOCTYPE also stops "billion laughs" expansion.
        Path file = write("laughs.axis", HEADER + "<!DOCTYPE tw:Axis [ <!ENTITY a \"aaaaaaaaaa\">"
                + " <!ENTITY b \"&a;&a;&a;&a;&a;&a;&a;&a;&a;&a;\"> ]>\n" + AXIS_OPEN + "&b;\"/>\n");
        assertTrue(loadFails(file).getMessage().contains("DOCTYPE"));
    }

    @Test
    void unknownNamespaceWithASchemaLocationIsNotFetched() throws Exception {
        Path file = write("schema.axis", HEADER + "<x:Axis xmi:version=\"2.0\" xmlns:xmi=\"http://www.omg.org/XMI\""
                + " xmlns:xsi=\"http://www.w3.org/2001/XMLSchema-instance\" xmlns:x=\"http://example.invalid/x\""
                + " xsi:schemaLocation=\"http://example.invalid/x " + url("x.ecore") + "\" id=\"a\"/>\n");
        ModelLoadException e = loadFails(file);
        assertTrue(e.getMessage().contains("unknown namespace 'http://example.invalid/x'")
                && e.getMessage().contains("http://tracewell.org/model/1.0"), e.getMessage());
        Thread.sleep(100);
        assertEquals(0, connections.get(), "a schema location was fetched");
    }

    @Test
    void aDescriptionMentioningAFileUrlStillSaves() throws Exception {
        Path file = write("note.axis", HEADER + AXIS_OPEN + "see file:/srv/drawings/z.pdf\"/>\n");
        LoadedModel model = files.load(file);
        assertTrue(new String(files.serialize(model.resource()), java.nio.charset.StandardCharsets.UTF_8)
                .contains("file:/srv/drawings/z.pdf"));
    }

    @Test
    void referenceToAUrlIsRefusedWithoutConnecting() throws Exception {
        Path file = write("remote.machine", HEADER + "<tw:Machine xmi:version=\"2.0\" xmlns:xmi=\"http://www.omg.org/XMI\""
                + " xmlns:tw=\"http://tracewell.org/model/1.0\" id=\"m\" name=\"M\" interpolationPeriod=\"0.001\">\n"
                + "  <libraryAxes href=\"" + url("z.axis") + "#z\"/>\n</tw:Machine>\n");
        ModelLoadException e = loadFails(file);
        assertTrue(e.getMessage().contains("only relative paths"), e.getMessage());
        Thread.sleep(100);
        assertEquals(0, connections.get(), "a library reference was fetched over the network");
    }

    @Test
    void referenceToANonModelFileIsRefusedAndReadsNothing() throws Exception {
        write("secret.txt", SECRET);
        Path file = write("sneaky.machine", HEADER + "<tw:Machine xmi:version=\"2.0\" xmlns:xmi=\"http://www.omg.org/XMI\""
                + " xmlns:tw=\"http://tracewell.org/model/1.0\" id=\"m\" name=\"M\" interpolationPeriod=\"0.001\">\n"
                + "  <libraryAxes href=\"secret.txt#z\"/>\n</tw:Machine>\n");
        ModelLoadException e = loadFails(file);
        assertFalse(e.getMessage().contains(SECRET), e.getMessage());
        assertTrue(e.getMessage().contains("only .axis and .machine files"), e.getMessage());
        assertEquals(3, e.line(), "reported at the element holding the reference");
    }

    @Test
    void fileLargerThanTheLimitIsRefusedBeforeParsing() throws Exception {
        Path big = write("big.axis", HEADER + AXIS_OPEN + "x".repeat(5000) + "\"/>\n");
        ModelFiles small = new ModelFiles(1024, new AtomicFileWriter());
        ModelLoadException e = assertThrows(ModelLoadException.class, () -> small.load(big));
        assertTrue(e.getMessage().contains("limit of 1024 bytes"), e.getMessage());
        ModelLoadException inMemory = assertThrows(ModelLoadException.class,
                () -> small.load(Files.readAllBytes(big), big));
        assertTrue(inMemory.getMessage().contains("limit of 1024 bytes"), inMemory.getMessage());
    }
}
