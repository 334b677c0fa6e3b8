package org.tracewell.engine.measured;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The one strict CSV reader behind every measurement import. The format:
 * <ul>
 * <li>UTF-8 text, fields separated by ',', no quoting; spaces around a field are ignored;</li>
 * <li>lines starting with '#' are comments; a comment of the form {@code # key: value} is a metadata entry
 * (for example {@code # radius_mm: 100}, {@code # date: 2026-03-14});</li>
 * <li>the first other line is the header, naming every column with its unit ({@code frequency_Hz});</li>
 * <li>every following non-blank line has exactly one field per header column; no field is empty.</li>
 * </ul>
 * Anything else is rejected with its line and column. The table only holds text; the readers turn it into
 * SI values and build their result only after every cell has been checked.
 */
final class CsvTable {

    /** Largest file read, bytes: far above any real measurement, small enough to hold in memory. */
    static final long MAX_BYTES = 64L * 1024 * 1024;
    /** Largest number of data rows accepted. */
    static final int MAX_ROWS = 2_000_000;

    private static final Pattern METADATA = Pattern.compile("([A-Za-z][A-Za-z0-9_]*)\\s*:\\s*(.*)");
    private static final Pattern DECIMAL = Pattern.compile("[+-]?(\\d+(\\.\\d*)?|\\.\\d+)([eE][+-]?\\d+)?");

    /** One field as found: trimmed text and where it starts (1-based line and character column). */
    record Cell(String text, int line, int column) {
    }

    /** One data line. */
    record Row(int line, List<Cell> cells) {
        Cell cell(int index) {
            return cells.get(index);
        }
    }

    /** A {@code # key: value} comment; the key is lower-cased; the column is where the value starts. */
    record Metadata(String key, String value, int line, int column) {
    }

    private final String fileName;
    private final Optional<LocalDate> fileDate;
    private final Map<String, Metadata> metadata;
    private final List<Cell> header;
    private final List<Row> rows;

    private CsvTable(String fileName, Optional<LocalDate> fileDate, Map<String, Metadata> metadata, List<Cell> header,
            List<Row> rows) {
        this.fileName = fileName;
        this.fileDate = fileDate;
        this.metadata = Collections.unmodifiableMap(metadata);
        this.header = List.copyOf(header);
        this.rows = List.copyOf(rows);
    }

    /** Reads a file (UTF-8, at most {@link #MAX_BYTES}); its modification date (UTC) is kept as a fallback date. */
    static CsvTable read(Path file) throws MeasuredDataException, IOException {
        String name = file.getFileName() == null ? file.toString() : file.getFileName().toString();
        long size = Files.size(file);
        if (size > MAX_BYTES) {
            throw new MeasuredDataException(name, 0, 0, size + " bytes", "file too large",
                    "at most " + MAX_BYTES + " bytes");
        }
        byte[] bytes = Files.readAllBytes(file);
        LocalDate modified = LocalDate.ofInstant(Files.getLastModifiedTime(file).toInstant(), ZoneOffset.UTC);
        return parse(name, decode(name, bytes), Optional.of(modified));
    }

    /** Strict UTF-8 decoding; a bad byte is reported at its line. */
    static String decode(String fileName, byte[] bytes) throws MeasuredDataException {
        CharsetDecoder decoder = StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        ByteBuffer in = ByteBuffer.wrap(bytes);
        CharBuffer out = CharBuffer.allocate(bytes.length + 1);
        CoderResult result = decoder.decode(in, out, true);
        if (result.isError()) {
            int line = 1;
            for (int i = 0; i < in.position(); i++) {
                if (bytes[i] == '\n') {
                    line++;
                }
            }
            throw new MeasuredDataException(fileName, line, 0, String.format(Locale.ROOT, "byte 0x%02X at offset %d",
                    bytes[in.position()] & 0xFF, in.position()), "not UTF-8 text", "a UTF-8 (or plain ASCII) CSV file");
        }
        decoder.flush(out);
        out.flip();
        return out.toString();
    }

    /**
     * Parses CSV text.
     *
     * @param fileName name used in messages and as evidence
     * @param text     the whole file
     * @param fileDate date to fall back on when the file states none (its modification date), or empty
     */
    static CsvTable parse(String fileName, String text, Optional<LocalDate> fileDate) throws MeasuredDataException {
        if (!text.isEmpty() && text.charAt(0) == '\uFEFF') {
            text = text.substring(1); // byte-order mark written by some spreadsheet programs
        }
        Map<String, Metadata> metadata = new LinkedHashMap<>();
        List<Cell> header = null;
        List<Row> rows = new ArrayList<>();
        int lineNumber = 0;
        int start = 0;
        while (start <= text.length()) {
            int end = text.indexOf('\n', start);
            if (end < 0) {
                end = text.length();
            }
            String line = text.substring(start, end);
            if (line.endsWith("\r")) {
                line = line.substring(0, line.length() - 1);
            }
            lineNumber++;
            start = end + 1;
            String trimmed = line.strip();
            if (trimmed.isEmpty()) {
                if (end == text.length()) {
                    break;
                }
                continue;
            }
            if (trimmed.startsWith("#")) {
                readComment(fileName, line, lineNumber, metadata);
                continue;
            }
            List<Cell> cells = split(fileName, line, lineNumber);
            if (header == null) {
                header = cells;
                checkHeader(fileName, header);
            } else {
                if (cells.size() != header.size()) {
                    throw new MeasuredDataException(fileName, lineNumber, 0, line.strip(),
                            "line has " + cells.size() + " field(s) but the header has " + header.size(),
                            "one field per header column (" + names(header)
                                    + "), separated by ','; the decimal separator is '.'");
                }
                if (rows.size() >= MAX_ROWS) {
                    throw new MeasuredDataException(fileName, lineNumber, 0, "", "more than " + MAX_ROWS
                            + " data lines", "at most " + MAX_ROWS + " data lines per file");
                }
                rows.add(new Row(lineNumber, cells));
            }
        }
        if (header == null) {
            throw new MeasuredDataException(fileName, 0, 0, "", "no header line",
                    "a header line naming the columns with their units, then one line per sample");
        }
        if (rows.isEmpty()) {
            throw new MeasuredDataException(fileName, header.get(0).line(), 0, "", "no data lines after the header",
                    "one line per sample after the header");
        }
        return new CsvTable(fileName, fileDate, metadata, header, rows);
    }

    private static void readComment(String fileName, String line, int lineNumber, Map<String, Metadata> metadata)
            throws MeasuredDataException {
        int hash = line.indexOf('#');
        String body = line.substring(hash + 1);
        int offset = hash + 1;
        while (!body.isEmpty() && Character.isWhitespace(body.charAt(0))) {
            body = body.substring(1);
            offset++;
        }
        Matcher m = METADATA.matcher(body.stripTrailing());
        if (!m.matches()) {
            return; // a plain comment
        }
        String key = m.group(1).toLowerCase(Locale.ROOT);
        Metadata entry = new Metadata(key, m.group(2).strip(), lineNumber, offset + m.start(2) + 1);
        Metadata previous = metadata.putIfAbsent(key, entry);
        if (previous != null) {
            throw new MeasuredDataException(fileName, lineNumber, offset + 1, key,
                    "metadata key given twice (first on line " + previous.line() + ")", "each '# key: value' once");
        }
    }

    private static List<Cell> split(String fileName, String line, int lineNumber) throws MeasuredDataException {
        List<Cell> cells = new ArrayList<>();
        int from = 0;
        while (true) {
            int comma = line.indexOf(',', from);
            int to = comma < 0 ? line.length() : comma;
            String raw = line.substring(from, to);
            int lead = 0;
            while (lead < raw.length() && Character.isWhitespace(raw.charAt(lead))) {
                lead++;
            }
            String text = raw.strip();
            int column = from + lead + 1;
            if (text.isEmpty()) {
                throw new MeasuredDataException(fileName, lineNumber, column, "", "empty field " + (cells.size() + 1),
                        "a value in every field");
            }
            if (text.indexOf('"') >= 0 || text.indexOf('\'') >= 0) {
                throw new MeasuredDataException(fileName, lineNumber, column, text, "quoted field",
                        "plain values without quotes");
            }
            cells.add(new Cell(text, lineNumber, column));
            if (comma < 0) {
                return cells;
            }
            from = comma + 1;
        }
    }

    private static void checkHeader(String fileName, List<Cell> header) throws MeasuredDataException {
        for (int i = 0; i < header.size(); i++) {
            for (int j = 0; j < i; j++) {
                if (header.get(i).text().equalsIgnoreCase(header.get(j).text())) {
                    throw new MeasuredDataException(fileName, header.get(i).line(), header.get(i).column(),
                            header.get(i).text(), "column named twice in the header", "each column once");
                }
            }
        }
    }

    private static String names(List<Cell> cells) {
        List<String> names = new ArrayList<>();
        for (Cell c : cells) {
            names.add(c.text());
        }
        return String.join(",", names);
    }

    String fileName() {
        return fileName;
    }

    List<Row> rows() {
        return rows;
    }

    List<Cell> header() {
        return header;
    }

    int headerLine() {
        return header.get(0).line();
    }

    /**
     * Matches the header against the accepted layouts (each a list of required columns, any order) plus the
     * optional columns any layout may have; returns the index of the layout found.
     */
    int requireLayout(List<List<String>> layouts, List<String> optional) throws MeasuredDataException {
        for (int l = 0; l < layouts.size(); l++) {
            List<String> required = layouts.get(l);
            boolean all = true;
            for (String name : required) {
                all &= column(name) >= 0;
            }
            if (!all) {
                continue;
            }
            for (Cell c : header) {
                if (!containsIgnoreCase(required, c.text()) && !containsIgnoreCase(optional, c.text())) {
                    throw new MeasuredDataException(fileName, c.line(), c.column(), c.text(), "unknown column",
                            "the columns " + String.join(",", required) + optionalText(optional));
                }
            }
            return l;
        }
        List<String> shapes = new ArrayList<>();
        for (List<String> layout : layouts) {
            shapes.add(String.join(",", layout));
        }
        throw new MeasuredDataException(fileName, headerLine(), 1, names(header), "header does not name the columns"
                + " of this kind of measurement", "a header of " + String.join(" or ", shapes) + optionalText(optional)
                + " (units in the names, any column order)");
    }

    private static String optionalText(List<String> optional) {
        return optional.isEmpty() ? "" : " (optional: " + String.join(",", optional) + ")";
    }

    private static boolean containsIgnoreCase(List<String> names, String name) {
        for (String n : names) {
            if (n.equalsIgnoreCase(name)) {
                return true;
            }
        }
        return false;
    }

    /** Index of the column with this name (case-insensitive), or −1. */
    int column(String name) {
        for (int i = 0; i < header.size(); i++) {
            if (header.get(i).text().equalsIgnoreCase(name)) {
                return i;
            }
        }
        return -1;
    }

    /** Name of column {@code index} as written in the header. */
    String columnName(int index) {
        return header.get(index).text();
    }

    /** A finite decimal number (no hex, no NaN, no infinity). */
    double number(Row row, int column, String valid) throws MeasuredDataException {
        return number(row.cell(column), columnName(column), valid);
    }

    double number(Cell cell, String what, String valid) throws MeasuredDataException {
        String text = cell.text();
        if (DECIMAL.matcher(text).matches()) {
            double value = Double.parseDouble(text);
            if (Double.isFinite(value)) {
                return value;
            }
        }
        throw error(cell, "not a finite decimal number in " + what, valid);
    }

    MeasuredDataException error(Cell cell, String problem, String valid) {
        return new MeasuredDataException(fileName, cell.line(), cell.column(), cell.text(), problem, valid);
    }

    /** An error about a whole data line. */
    MeasuredDataException error(Row row, String problem, String valid) {
        return new MeasuredDataException(fileName, row.line(), 0, "", problem, valid);
    }

    Optional<Metadata> metadata(String key) {
        return Optional.ofNullable(metadata.get(key));
    }

    /** Metadata as found, keys lower-case, in file order. */
    Map<String, String> metadataValues() {
        Map<String, String> values = new LinkedHashMap<>();
        metadata.forEach((k, m) -> values.put(k, m.value()));
        return values;
    }

    /** A required {@code # key: number} entry. */
    double requiredNumber(String key, String valid) throws MeasuredDataException {
        Metadata m = metadata.get(key);
        if (m == null) {
            throw new MeasuredDataException(fileName, headerLine(), 0, "", "missing metadata line '# " + key
                    + ": …' before the data", valid);
        }
        return metadataNumber(m, valid);
    }

    double metadataNumber(Metadata m, String valid) throws MeasuredDataException {
        return number(new Cell(m.value(), m.line(), m.column()), "'# " + m.key() + "'", valid);
    }

    /** Where the measurement came from: file name, the stated date (or the file's modification date), metadata. */
    MeasurementSource source() throws MeasuredDataException {
        Optional<Metadata> stated = metadata("date");
        if (stated.isPresent()) {
            Metadata m = stated.get();
            try {
                return new MeasurementSource(fileName, Optional.of(LocalDate.parse(m.value())), true,
                        metadataValues());
            } catch (DateTimeParseException e) {
                throw new MeasuredDataException(fileName, m.line(), m.column(), m.value(), "not a date",
                        "an ISO date yyyy-mm-dd, e.g. 2026-03-14");
            }
        }
        return new MeasurementSource(fileName, fileDate, false, metadataValues());
    }
}
