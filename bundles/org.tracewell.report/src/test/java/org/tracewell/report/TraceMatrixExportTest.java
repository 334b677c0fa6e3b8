package org.tracewell.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracewell.requirements.RequirementResult;
import org.tracewell.requirements.ReviewResults;

class TraceMatrixExportTest {

    private static ReviewResults review;

    @BeforeAll
    static void analyse() throws Exception {
        review = ReportFixtures.hostileReview(ReportFixtures.lm3020());
    }

    /** An RFC 4180 reader written for the test (quoted fields, doubled quotes, CRLF records). */
    private static List<List<String>> parse(String csv) {
        List<List<String>> records = new ArrayList<>();
        List<String> fields = new ArrayList<>();
        StringBuilder field = new StringBuilder();
        boolean quoted = false;
        for (int i = 0; i < csv.length(); i++) {
            char c = csv.charAt(i);
            if (quoted) {
                if (c == '"' && i + 1 < csv.length() && csv.charAt(i + 1) == '"') {
                    field.append('"');
                    i++;
                } else if (c == '"') {
                    quoted = false;
                } else {
                    field.append(c);
                }
            } else if (c == '"') {
                quoted = true;
            } else if (c == ',') {
                fields.add(field.toString());
                field.setLength(0);
            } else if (c == '\r' && i + 1 < csv.length() && csv.charAt(i + 1) == '\n') {
                fields.add(field.toString());
                field.setLength(0);
                records.add(fields);
                fields = new ArrayList<>();
                i++;
            } else {
                field.append(c);
            }
        }
        assertTrue(fields.isEmpty() && field.isEmpty(), "the last record ends with CRLF");
        return records;
    }

    @Test
    void csvHasOneRowPerRequirementInTraceOrder() {
        List<List<String>> records = parse(TraceMatrixExport.csv(review));
        assertEquals(TraceMatrixExport.CSV_COLUMNS, records.get(0));
        List<List<String>> rows = records.subList(1, records.size());
        assertEquals(review.requirements().results().size(), rows.size());
        // r1, then its two allocations one level down, then r2 and r9
        assertEquals(List.of("lm3020-r1", "lm3020-r1-x1-kv", "lm3020-r1-y-kv", "lm3020-r2", "lm3020-r9"),
                rows.stream().map(r -> r.get(1)).toList());
        assertEquals(List.of("0", "1", "1", "0", "0"), rows.stream().map(r -> r.get(2)).toList());
        assertEquals("lm3020-r1", rows.get(1).get(0));
        assertEquals("lm3020-r1", rows.get(1).get(3));
        for (List<String> row : rows) {
            assertEquals(TraceMatrixExport.CSV_COLUMNS.size(), row.size(), row.toString());
            RequirementResult r = review.requirements().result(row.get(1)).orElseThrow();
            assertEquals(r.status().label(), row.get(12));
            if (r.displayValue().isPresent()) {
                assertEquals(r.displayValue().getAsDouble(), Double.parseDouble(row.get(7)),
                        1e-5 * Math.abs(r.displayValue().getAsDouble()), "six significant digits");
            } else {
                assertEquals("", row.get(7));
            }
        }
        // the hostile statement survives the round trip unchanged: commas, quotes and markup are data in CSV
        assertEquals(ReportFixtures.HOSTILE + " statement", rows.get(4).get(4));
    }

    @Test
    void csvQuotingFollowsRfc4180() {
        // RFC 4180 §2.6–2.7: fields with commas, quotes or line breaks are quoted; quotes are doubled.
        assertEquals("plain", TraceMatrixExport.quoted("plain"));
        assertEquals("\"a,b\"", TraceMatrixExport.quoted("a,b"));
        assertEquals("\"say \"\"hi\"\"\"", TraceMatrixExport.quoted("say \"hi\""));
        assertEquals("\"two\nlines\"", TraceMatrixExport.quoted("two\nlines"));
    }

    @Test
    void htmlPageIsSelfContainedEscapedAndCarriesTheCaution(@TempDir Path dir) throws Exception {
        String html = TraceMatrixExport.html(review);
        assertFalse(html.toLowerCase(Locale.ROOT).contains("<script"), "no script, hostile text escaped");
        assertTrue(html.contains("&lt;script&gt;"));
        assertTrue(html.contains("id=\"trace\""));
        assertTrue(html.contains("Compliance matrix"));
        assertTrue(html.contains("Safety caution"));
        assertFalse(html.contains("<img"), "the trace page has no images");
        Path file = dir.resolve("sub/trace.html");
        TraceMatrixExport.write(html, file);
        assertEquals(html, Files.readString(file, StandardCharsets.UTF_8));
        try (var listing = Files.list(file.getParent())) {
            assertEquals(1, listing.count(), "no partial file left behind");
        }
    }
}
