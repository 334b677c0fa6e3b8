package org.tracewell.ui.views;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.time.Instant;
import java.util.HexFormat;
import java.util.List;

import org.tracewell.core.analysis.MachineBudget;
import org.tracewell.core.analysis.MachineBudgets;
import org.tracewell.requirements.ReviewProvenance;
import org.tracewell.ui.ProductInfo;

/** The provenance of a review run in the workbench: the views and the report written from the editor share it. */
public final class WorkbenchProvenance {

    private WorkbenchProvenance() {
    }

    /**
     * The settings line up with those {@code tracewell analyze} states, so a view and a report read alike.
     *
     * @param file  the machine file, or null for a model without one
     * @param dirty the editor holds unsaved changes (the hash is then that of the saved file, which the settings say)
     */
    public static ReviewProvenance of(Path file, boolean dirty) {
        List<String> settings = List.of(
                "combination: " + MachineBudgets.DEFAULT_METHOD.printable(),
                "reserve held back from each contour requirement: "
                        + Math.round(MachineBudget.RESERVE_FRACTION * 100) + " %",
                "coverage factor of random lines: k = 2",
                "contours simulated with each axis's linear closed loop at the contour's sample period",
                dirty ? "reviewed with the editor's unsaved changes (the hash is that of the saved file)"
                        : "reviewed as saved");
        return new ReviewProvenance(ProductInfo.version(), file == null ? "" : file.getFileName().toString(),
                sha256(file), Instant.now(), List.of(), settings);
    }

    private static String sha256(Path file) {
        if (file == null) {
            return "";
        }
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(Files.readAllBytes(file)));
        } catch (IOException | NoSuchAlgorithmException e) {
            return ""; // the hash only documents the review; a file being rewritten must not stop it
        }
    }
}
