package org.tracewell.ui.editor;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.attribute.BasicFileAttributes;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.Collection;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * What an open editor knows about its files on disk: the state each file had when it was read or last saved (the
 * <em>base</em>), and the state the user last answered a prompt about (the <em>seen</em> state). A file counts as
 * changed only when its content differs: a newer time stamp with the same bytes (a touch, a copy back) is taken in
 * silently. Reading is cheap: the content hash is computed only when size or time stamp moved.
 * <p>
 * The decision what to do is {@link #decide}, a pure function, so it can be tested without a display.
 */
public final class DiskWatch {

    /**
     * A file's state on disk.
     *
     * @param exists   false when the file is gone
     * @param modified last-modified time, ms since the epoch
     * @param size     bytes
     * @param sha256   content hash (lower-case hex), empty when the file is gone
     */
    public record Stamp(boolean exists, long modified, long size, String sha256) {

        static final Stamp MISSING = new Stamp(false, 0, 0, "");

        /** Same content (both missing counts as the same). */
        boolean sameContent(Stamp other) {
            return exists == other.exists && size == other.size && sha256.equals(other.sha256);
        }
    }

    /** What the editor does after a look at the disk. */
    public enum Decision {
        /** Nothing changed since load (or the user already answered for this version). */
        NOTHING,
        /** A file changed and the editor has no unsaved changes: ask whether to reload. */
        OFFER_RELOAD,
        /** A file changed while the editor has unsaved changes: ask whether to reload and lose them, or keep them. */
        CONFLICT,
        /** A file was deleted: say so; saving writes it again. */
        DELETED
    }

    private final Map<Path, Stamp> base = new LinkedHashMap<>();
    private final Map<Path, Stamp> seen = new LinkedHashMap<>();

    /** Stamps the files as they are now (just read). */
    public DiskWatch(Collection<Path> files) {
        restamp(files);
    }

    /** The files watched, in the order given. */
    public List<Path> files() {
        return List.copyOf(base.keySet());
    }

    /** Takes the current disk state as the base of {@code files} (after they were read or written by the editor). */
    public void restamp(Collection<Path> files) {
        for (Path file : files) {
            Stamp now = stamp(file);
            base.put(file, now);
            seen.put(file, now);
        }
    }

    /** Files whose content differs from the base: saving over them would overwrite someone else's change. */
    public List<Path> changedSinceBase() {
        return changed(base, false);
    }

    /** Files whose content differs from what the user last answered about (base, or the version they kept). */
    public List<Path> changedSinceSeen() {
        return changed(seen, false);
    }

    /** Of the files changed since seen, those that no longer exist. */
    public List<Path> deletedSinceSeen() {
        return changed(seen, true);
    }

    /** The user answered for the present disk state ("keep my version"): no further prompt until it changes again. */
    public void acknowledge() {
        for (Path file : base.keySet()) {
            seen.put(file, stamp(file));
        }
    }

    /**
     * What to do after a look at the disk.
     *
     * @param changedSinceSeen files whose content moved since the user last answered (or since load)
     * @param deleted          of those, the ones that no longer exist
     * @param dirty            the editor has unsaved changes
     */
    public static Decision decide(List<Path> changedSinceSeen, List<Path> deleted, boolean dirty) {
        if (changedSinceSeen.isEmpty()) {
            return Decision.NOTHING;
        }
        if (!deleted.isEmpty() && deleted.size() == changedSinceSeen.size()) {
            return Decision.DELETED;
        }
        return dirty ? Decision.CONFLICT : Decision.OFFER_RELOAD;
    }

    /** True when saving must ask first: a file changed on disk since it was read or last saved. */
    public static boolean saveNeedsConfirmation(List<Path> changedSinceBase) {
        return !changedSinceBase.isEmpty();
    }

    private List<Path> changed(Map<Path, Stamp> reference, boolean onlyDeleted) {
        List<Path> changed = new ArrayList<>();
        for (Map.Entry<Path, Stamp> e : reference.entrySet()) {
            Stamp was = e.getValue();
            Stamp now = quickStamp(e.getKey(), was);
            if (!now.sameContent(was) && (!onlyDeleted || !now.exists())) {
                changed.add(e.getKey());
            }
        }
        return changed;
    }

    /** The present stamp, hashing only when size or time moved from {@code known}. */
    private static Stamp quickStamp(Path file, Stamp known) {
        try {
            BasicFileAttributes attributes = Files.readAttributes(file, BasicFileAttributes.class);
            long modified = attributes.lastModifiedTime().toMillis();
            if (known.exists() && modified == known.modified() && attributes.size() == known.size()) {
                return known;
            }
            return stamp(file);
        } catch (NoSuchFileException gone) {
            return Stamp.MISSING;
        } catch (IOException unreadable) {
            return known; // a file being rewritten right now: look again next time
        }
    }

    static Stamp stamp(Path file) {
        Objects.requireNonNull(file, "file");
        try {
            BasicFileAttributes attributes = Files.readAttributes(file, BasicFileAttributes.class);
            MessageDigest digest = MessageDigest.getInstance("SHA-256");
            try (InputStream in = Files.newInputStream(file)) {
                byte[] buffer = new byte[64 * 1024];
                for (int n; (n = in.read(buffer)) > 0;) {
                    digest.update(buffer, 0, n);
                }
            }
            return new Stamp(true, attributes.lastModifiedTime().toMillis(), attributes.size(),
                    HexFormat.of().formatHex(digest.digest()));
        } catch (NoSuchFileException gone) {
            return Stamp.MISSING;
        } catch (IOException | NoSuchAlgorithmException e) {
            // Unreadable now: an empty hash never equals a real one, so the file counts as changed and is asked about.
            return new Stamp(true, -1, -1, "");
        }
    }
}
