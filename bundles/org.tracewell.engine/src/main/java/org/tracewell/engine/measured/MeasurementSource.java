package org.tracewell.engine.measured;

import java.time.LocalDate;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;

/**
 * Where a measurement comes from: the file name (never a full path, so results and budgets stay portable), the
 * measurement date and the file's {@code # key: value} metadata.
 *
 * @param fileName   file name without folders
 * @param date       the date stated in the file ({@code # date: yyyy-mm-dd}), else the file's modification date
 *                   (UTC), else empty
 * @param dateStated true when the date comes from the file's own {@code # date:} line
 * @param metadata   every {@code # key: value} entry, keys lower-case, in file order
 */
public record MeasurementSource(String fileName, Optional<LocalDate> date, boolean dateStated,
        Map<String, String> metadata) {

    public MeasurementSource {
        if (fileName == null || fileName.isBlank()) {
            throw new IllegalArgumentException("a measurement source needs a file name, got '" + fileName + "'");
        }
        if (date == null || metadata == null) {
            throw new IllegalArgumentException("date and metadata of measurement " + fileName + " must not be null");
        }
        metadata = Collections.unmodifiableMap(new LinkedHashMap<>(metadata));
    }

    /** Evidence text for budget lines and reports: "file name, date". */
    public String evidence() {
        return fileName + ", " + date.map(d -> d.toString() + (dateStated ? "" : " (file date)"))
                .orElse("date not stated");
    }

    /** A metadata value, e.g. {@code metadata("axis")}. */
    public Optional<String> metadata(String key) {
        return Optional.ofNullable(metadata.get(key));
    }
}
