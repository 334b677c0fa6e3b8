package org.tracewell.engine.measured;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.time.Instant;
import java.time.LocalDate;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The strict CSV imports: what they accept, and that every bad cell names file, line, column, text and remedy. */
class MeasuredImportTest {

    @TempDir
    Path tmp;

    private static final String POLAR = String.join("\n",
            "# torque command to motor velocity", "# axis: Y", "# date: 2026-03-12",
            "frequency_Hz, magnitude_dB, phase_deg", "10, 0, -90", "20, -6.0206, -135", "40,-20,180");

    @Test
    void polarFileIsReadIntoSiWithMetadata() throws MeasuredDataException {
        MeasuredFrequencyResponse r = MeasuredFrequencyResponse.parse("y-frf.csv", POLAR);
        assertEquals(3, r.size());
        assertEquals(2 * Math.PI * 10, r.omega(0), 1e-12); // Hz → rad/s
        assertEquals(1.0, r.magnitude(0), 1e-12);
        assertEquals(-Math.PI / 2, r.phase(0), 1e-12);
        assertEquals(0.5, r.magnitude(1), 1e-5); // −6.0206 dB = 0.5 (20·log10 0.5 = −6.0206)
        assertEquals(0.1, r.magnitude(2), 1e-12);
        // unwrapping continues −90°, −135° to −180° rather than jumping to +180°
        assertEquals(-Math.PI, r.unwrappedPhase()[2], 1e-12);
        assertEquals("Y", r.source().metadata("axis").orElseThrow());
        assertEquals("y-frf.csv, 2026-03-12", r.source().evidence());
        assertFalse(r.hasCoherence());
    }

    @Test
    void complexFileWithCoherenceCrlfAndByteOrderMark() throws MeasuredDataException {
        String text = "\uFEFFfrequency_Hz,real,imag,coherence\r\n5,0.5,-0.5,0.99\r\n10,-1e-3,-2.5E-2,1\r\n";
        MeasuredFrequencyResponse r = MeasuredFrequencyResponse.parse("x1.csv", text);
        assertEquals(2, r.size());
        assertEquals(-2.5e-2, r.imaginary(1), 0);
        assertEquals(0.99, r.coherence(0), 0);
        assertEquals("x1.csv, date not stated", r.source().evidence());
    }

    @Test
    void fileDateIsTheFallbackEvidenceDate() throws Exception {
        Path file = tmp.resolve("z-frf.csv");
        Files.writeString(file, "frequency_Hz,real,imag\n5,1,0\n6,1,0\n");
        Files.setLastModifiedTime(file, FileTime.from(Instant.parse("2026-02-01T10:00:00Z")));
        MeasuredFrequencyResponse r = MeasuredFrequencyResponse.read(file);
        assertEquals(LocalDate.of(2026, 2, 1), r.source().date().orElseThrow());
        assertEquals("z-frf.csv, 2026-02-01 (file date)", r.source().evidence());
    }

    /** Parses and expects failure, returning the exception. */
    private static MeasuredDataException bad(String text) {
        return assertThrows(MeasuredDataException.class, () -> MeasuredFrequencyResponse.parse("m.csv", text));
    }

    private static void at(MeasuredDataException e, int line, int column, String badText, String... words) {
        assertEquals(line, e.line(), e.getMessage());
        assertEquals(column, e.column(), e.getMessage());
        assertEquals(badText, e.badText(), e.getMessage());
        String where = line > 0 ? "m.csv:" + line + (column > 0 ? ":" + column : "") + ": " : "m.csv: ";
        assertTrue(e.getMessage().startsWith(where), e.getMessage());
        for (String w : words) {
            assertTrue(e.getMessage().contains(w), "'" + w + "' in: " + e.getMessage());
        }
    }

    @Test
    void everyBadCellNamesLineColumnTextAndWhatIsValid() {
        String head = "frequency_Hz,magnitude_dB,phase_deg\n";
        at(bad(head + "10,0,-90\n20,-3,-9O\n"), 3, 7, "-9O", "phase_deg", "valid: a phase in degrees");
        at(bad(head + "10,0,NaN\n"), 2, 6, "NaN", "not a finite decimal number");
        at(bad(head + "10,0,0x10\n"), 2, 6, "0x10");
        at(bad(head + "10,1e999,0\n"), 2, 4, "1e999");
        at(bad(head + "10,0,-90\n10,0,-90\n"), 3, 1, "10", "not above the previous line's 10 Hz");
        at(bad(head + "0,0,-90\n1,0,0\n"), 2, 1, "0", "> 0 Hz");
        at(bad(head + "10,0,-90,1\n"), 2, 0, "10,0,-90,1", "4 field(s) but the header has 3", "decimal separator is '.'");
        at(bad(head + "10,,-90\n"), 2, 4, "", "empty field 2");
        at(bad(head + "10,\"0\",-90\n"), 2, 4, "\"0\"", "quoted");
        at(bad("frequency_Hz,magnitude_dB,phase_rad\n1,0,0\n"), 1, 1, "frequency_Hz,magnitude_dB,phase_rad",
                "frequency_Hz,magnitude_dB,phase_deg or frequency_Hz,real,imag");
        at(bad("frequency_Hz,real,imag,phase_deg\n1,0,0,0\n"), 1, 24, "phase_deg", "unknown column");
        at(bad("frequency_Hz,real,imag,real\n1,0,0,0\n"), 1, 24, "real", "named twice");
        at(bad("# date: 14.03.2026\n" + head + "1,0,0\n2,0,0\n"), 1, 9, "14.03.2026", "yyyy-mm-dd");
        at(bad("# axis: Y\n# axis: X\n" + head + "1,0,0\n"), 2, 3, "axis", "first on line 1");
        at(bad("frequency_Hz,real,imag,coherence\n1,1,0,1.2\n2,1,0,1\n"), 2, 7, "1.2", "coherence outside 0..1");
        at(bad("# only comments\n\n"), 0, 0, "", "no header line");
        at(bad(head), 1, 0, "", "no data lines");
        at(bad(head + "10,0,-90\n"), 2, 0, "", "at least 2 points");
    }

    @Test
    void notUtf8IsReportedAtItsLine() throws IOException {
        Path file = tmp.resolve("latin1.csv");
        byte[] head = "frequency_Hz,real,imag\n1,1,0\n".getBytes(StandardCharsets.US_ASCII);
        byte[] bytes = new byte[head.length + 8];
        System.arraycopy(head, 0, bytes, 0, head.length);
        System.arraycopy(new byte[] {'2', ',', (byte) 0xB5, ',', '0', '\n', '3', '\n'}, 0, bytes, head.length, 8);
        Files.write(file, bytes);
        MeasuredDataException e = assertThrows(MeasuredDataException.class, () -> MeasuredFrequencyResponse.read(file));
        assertEquals(3, e.line(), e.getMessage());
        assertTrue(e.getMessage().contains("not UTF-8"), e.getMessage());
    }

    @Test
    void valuesFromSiAreCopiedNotShared() {
        double[] w = {1, 2};
        double[] re = {1, 1};
        double[] im = {0, 0};
        MeasuredFrequencyResponse r = MeasuredFrequencyResponse.of(
                new MeasurementSource("s", java.util.Optional.empty(), false, java.util.Map.of()), w, re, im, null);
        w[0] = 5;
        assertArrayEquals(new double[] {1, 2}, r.omegas(), 0);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> MeasuredFrequencyResponse.of(
                new MeasurementSource("s", java.util.Optional.empty(), false, java.util.Map.of()), new double[] {2, 1},
                re, im, null));
        assertTrue(e.getMessage().contains("strictly increasing"), e.getMessage());
    }
}
