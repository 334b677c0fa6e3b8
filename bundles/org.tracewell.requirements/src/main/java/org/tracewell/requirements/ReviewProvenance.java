package org.tracewell.requirements;

import java.time.Instant;
import java.util.List;

/**
 * Where a review's results come from, so a report is reproducible.
 *
 * @param toolVersion   Tracewell version ("development" outside a built product)
 * @param inputFile     the machine file as given on the command line (or the example's name)
 * @param inputSha256   SHA-256 of the machine file's bytes, lower-case hex
 * @param analysedAt    when the analysis ran
 * @param contourFilter contour names the run was limited to (empty = all)
 * @param settings      assumptions and settings in one line each (reserve, coverage factor, methods…)
 */
public record ReviewProvenance(String toolVersion, String inputFile, String inputSha256, Instant analysedAt,
        List<String> contourFilter, List<String> settings) {

    public ReviewProvenance {
        contourFilter = List.copyOf(contourFilter);
        settings = List.copyOf(settings);
    }
}
