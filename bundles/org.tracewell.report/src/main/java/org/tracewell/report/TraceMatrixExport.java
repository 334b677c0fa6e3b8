package org.tracewell.report;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import java.util.Set;
import java.util.stream.Collectors;

import org.tracewell.requirements.DisplayUnits;
import org.tracewell.requirements.RequirementReport;
import org.tracewell.requirements.RequirementResult;
import org.tracewell.requirements.ReviewResults;

/**
 * The trace matrix on its own, for design reviews and spreadsheets: every requirement with its parent, the axis it
 * is allocated to, what verifies it, and value, limit, margin and status. CSV (RFC 4180: comma separated, fields
 * quoted when they hold a comma, quote or line break, CRLF line ends, UTF-8) with values in the requirement's
 * display unit; or a self-contained HTML page with the same rows plus the compliance matrix (no script, every
 * model string escaped).
 */
public final class TraceMatrixExport {

    /** Column names of the CSV, in order. */
    public static final List<String> CSV_COLUMNS = List.of("machine_requirement", "requirement", "level", "parent",
            "statement", "allocated_axis", "verified_by", "value", "limit_bound", "limit", "margin", "unit", "status");

    private TraceMatrixExport() {
    }

    /** The CSV text; rows in trace order (each machine requirement, then its allocations depth first). */
    public static String csv(ReviewResults review) {
        RequirementReport report = review.requirements();
        StringBuilder out = new StringBuilder();
        out.append(String.join(",", CSV_COLUMNS)).append("\r\n");
        for (Row row : rows(report)) {
            RequirementResult r = row.result();
            List<String> fields = List.of(row.root(), r.id(), Integer.toString(row.depth()), r.parentId().orElse(""),
                    r.statement(), r.allocatedAxisName().orElse(r.machineLevel() ? "machine" : ""),
                    r.verifiedBy().stream().map(v -> v.describe()).collect(Collectors.joining("; ")),
                    number(r.displayValue()), "atLeast".equals(r.bound()) ? ">=" : "<=",
                    number(OptionalDouble.of(r.displayLimit())), number(r.displayMargin()),
                    DisplayUnits.shown(r.siUnit(), r.displayUnit()), r.status().label());
            out.append(fields.stream().map(TraceMatrixExport::quoted).collect(Collectors.joining(","))).append("\r\n");
        }
        return out.toString();
    }

    /** The HTML page: trace table, compliance matrix, apportionment and inverse-design suggestions. */
    public static String html(ReviewResults review) {
        return new ReportPage(ReportInput.of(review), (slug, chart, w, h) -> {
            throw new IllegalStateException("the trace page draws no charts");
        }).renderTraceMatrix();
    }

    /** Writes {@code text} to {@code file} through a temporary file, so a failed write leaves the old file. */
    public static void write(String text, Path file) throws IOException {
        Path dir = file.toAbsolutePath().getParent();
        Files.createDirectories(dir);
        Path partial = Files.createTempFile(dir, file.getFileName().toString(), ".part");
        try {
            Files.writeString(partial, text, StandardCharsets.UTF_8);
            Files.move(partial, file, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        } finally {
            Files.deleteIfExists(partial);
        }
    }

    /** One trace row: the machine requirement it hangs under, the requirement, its depth below that one. */
    record Row(String root, RequirementResult result, int depth) {
    }

    /** Trace order: each machine requirement, then its allocations depth first; parentless others last. */
    static List<Row> rows(RequirementReport report) {
        List<Row> rows = new ArrayList<>();
        Set<String> shown = new LinkedHashSet<>();
        for (RequirementResult top : report.machineLevel()) {
            add(report, top, top.id(), 0, rows, shown);
        }
        for (RequirementResult r : report.results()) {
            add(report, r, r.id(), 0, rows, shown); // a parent outside the machine: listed on its own
        }
        return rows;
    }

    private static void add(RequirementReport report, RequirementResult r, String root, int depth, List<Row> rows,
            Set<String> shown) {
        if (!shown.add(r.id())) {
            return;
        }
        rows.add(new Row(root, r, depth));
        for (RequirementResult child : report.children(r.id())) {
            add(report, child, root, depth + 1, rows, shown);
        }
    }

    private static String number(OptionalDouble value) {
        // six significant digits, locale-independent, so any spreadsheet parses it
        return value.isPresent() ? String.format(Locale.ROOT, "%.6g", value.getAsDouble()) : "";
    }

    static String quoted(String field) {
        if (field.contains(",") || field.contains("\"") || field.contains("\n") || field.contains("\r")) {
            return "\"" + field.replace("\"", "\"\"") + "\"";
        }
        return field;
    }
}
