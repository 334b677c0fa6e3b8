package org.tracewell.core.io;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.Objects;

/**
 * Replaces a file so that readers see either the old or the new content, never a mix: the new bytes go to a temporary
 * file in the same folder, are forced to disk, and are then renamed over the original in one atomic step. The previous
 * version is kept beside it as {@code NAME.bak}. Any failure leaves the original file as it was.
 */
public final class AtomicFileWriter {

    /** Suffix of the backup of the previous version. */
    public static final String BACKUP_SUFFIX = ".bak";

    /** The rename step; replaceable so tests can make it fail. */
    @FunctionalInterface
    public interface Mover {
        void move(Path source, Path target) throws IOException;
    }

    private final Mover mover;

    /** A writer that renames with {@link StandardCopyOption#ATOMIC_MOVE}. */
    public AtomicFileWriter() {
        this(AtomicFileWriter::atomicMove);
    }

    /** A writer whose rename step is {@code mover} (for failure injection in tests). */
    public AtomicFileWriter(Mover mover) {
        this.mover = Objects.requireNonNull(mover, "mover");
    }

    /** The backup path of {@code file}: {@code NAME.bak} in the same folder. */
    public static Path backupOf(Path file) {
        return file.resolveSibling(file.getFileName() + BACKUP_SUFFIX);
    }

    /**
     * Writes {@code content} to {@code target} atomically, keeping the previous version as {@link #backupOf backup}.
     *
     * @throws IOException when any step fails; {@code target} then still has its previous content
     */
    public void write(Path target, byte[] content) throws IOException {
        Path absolute = target.toAbsolutePath();
        Path folder = absolute.getParent();
        if (folder == null || !Files.isDirectory(folder)) {
            throw new IOException("cannot save " + target + ": folder " + folder + " does not exist");
        }
        String name = absolute.getFileName().toString();
        Path temp = Files.createTempFile(folder, "." + name + ".", ".tmp");
        Path backupTemp = null;
        try {
            writeAndForce(temp, content);
            if (Files.exists(absolute)) {
                backupTemp = Files.createTempFile(folder, "." + name + ".", ".bak.tmp");
                Files.copy(absolute, backupTemp, StandardCopyOption.REPLACE_EXISTING);
                mover.move(backupTemp, backupOf(absolute));
            }
            mover.move(temp, absolute);
            forceFolder(folder);
        } finally {
            Files.deleteIfExists(temp);
            if (backupTemp != null) {
                Files.deleteIfExists(backupTemp);
            }
        }
    }

    private static void writeAndForce(Path file, byte[] content) throws IOException {
        try (FileChannel channel = FileChannel.open(file, StandardOpenOption.WRITE,
                StandardOpenOption.TRUNCATE_EXISTING)) {
            ByteBuffer buffer = ByteBuffer.wrap(content);
            while (buffer.hasRemaining()) {
                channel.write(buffer);
            }
            channel.force(true);
        }
    }

    private static void atomicMove(Path source, Path target) throws IOException {
        // Same folder, so an atomic rename is available; never fall back to a copy that could leave half a file.
        Files.move(source, target, StandardCopyOption.ATOMIC_MOVE);
    }

    /** Makes the rename itself durable where the platform allows syncing a folder (Linux does, Windows does not). */
    private static void forceFolder(Path folder) {
        try (FileChannel channel = FileChannel.open(folder, StandardOpenOption.READ)) {
            channel.force(true);
        } catch (IOException | UnsupportedOperationException notSupported) {
            // Durability of the rename is best effort; atomicity does not depend on it.
        }
    }
}
