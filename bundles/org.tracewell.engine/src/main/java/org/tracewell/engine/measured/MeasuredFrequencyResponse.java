package org.tracewell.engine.measured;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

import org.tracewell.engine.tf.FrequencyResponse;

/**
 * A frequency response measured on a machine, SI inside: angular frequency in rad/s, the response as complex
 * values (real and imaginary part in the unit of the measured quantity, e.g. (rad/s)/(N·m) for torque command to
 * motor velocity), and the coherence of each point when the file gives one. Immutable; accessors copy.
 * <p>
 * CSV layouts (any column order, '#' comments, {@code # key: value} metadata such as {@code # axis: Y} and
 * {@code # date: 2026-03-14}):
 * <pre>
 *   frequency_Hz,magnitude_dB,phase_deg[,coherence]
 *   frequency_Hz,real,imag[,coherence]
 * </pre>
 * Frequencies must be &gt; 0 and strictly increasing; coherence lies in 0..1.
 */
public final class MeasuredFrequencyResponse {

    static final List<List<String>> LAYOUTS = List.of(List.of("frequency_Hz", "magnitude_dB", "phase_deg"),
            List.of("frequency_Hz", "real", "imag"));
    static final List<String> OPTIONAL = List.of("coherence");

    private final MeasurementSource source;
    private final FrequencyResponse response;
    private final double[] coherence;

    private MeasuredFrequencyResponse(MeasurementSource source, double[] omega, double[] re, double[] im,
            double[] coherence) {
        this.source = source;
        this.response = FrequencyResponse.of(omega, re, im);
        this.coherence = coherence;
    }

    /**
     * A response from values already in SI (for tests and synthetic data).
     *
     * @param coherence per point in 0..1, or null when unknown
     */
    public static MeasuredFrequencyResponse of(MeasurementSource source, double[] omegaRadPerSec, double[] real,
            double[] imaginary, double[] coherence) {
        int n = omegaRadPerSec.length;
        if (real.length != n || imaginary.length != n || (coherence != null && coherence.length != n)) {
            throw new IllegalArgumentException("measured response " + source.fileName() + ": " + n + " frequencies, "
                    + real.length + " real and " + imaginary.length + " imaginary parts"
                    + (coherence == null ? "" : ", " + coherence.length + " coherences") + "; all must match");
        }
        if (n < 2) {
            throw new IllegalArgumentException("measured response " + source.fileName() + " needs at least 2 points, got "
                    + n);
        }
        for (int i = 0; i < n; i++) {
            if (!(omegaRadPerSec[i] > 0) || !Double.isFinite(omegaRadPerSec[i])
                    || (i > 0 && !(omegaRadPerSec[i] > omegaRadPerSec[i - 1]))) {
                throw new IllegalArgumentException("measured response " + source.fileName() + ": frequency #" + i
                        + " = " + omegaRadPerSec[i] + " rad/s; frequencies must be finite, > 0 and strictly increasing");
            }
            if (!Double.isFinite(real[i]) || !Double.isFinite(imaginary[i])) {
                throw new IllegalArgumentException("measured response " + source.fileName() + ": point #" + i
                        + " is not finite (" + real[i] + ", " + imaginary[i] + ")");
            }
            if (coherence != null && !(coherence[i] >= 0 && coherence[i] <= 1)) {
                throw new IllegalArgumentException("measured response " + source.fileName() + ": coherence #" + i
                        + " = " + coherence[i] + "; must lie in 0..1");
            }
        }
        return new MeasuredFrequencyResponse(source, omegaRadPerSec, real, imaginary,
                coherence == null ? null : coherence.clone());
    }

    /** Reads a CSV file; nothing is returned unless every line is valid. */
    public static MeasuredFrequencyResponse read(Path file) throws MeasuredDataException, IOException {
        return fromTable(CsvTable.read(file));
    }

    /** Parses CSV text; {@code fileName} names the source in messages and evidence. */
    public static MeasuredFrequencyResponse parse(String fileName, String text) throws MeasuredDataException {
        return fromTable(CsvTable.parse(fileName, text, Optional.empty()));
    }

    private static MeasuredFrequencyResponse fromTable(CsvTable table) throws MeasuredDataException {
        boolean polar = table.requireLayout(LAYOUTS, OPTIONAL) == 0;
        int f = table.column("frequency_Hz");
        int a = table.column(polar ? "magnitude_dB" : "real");
        int b = table.column(polar ? "phase_deg" : "imag");
        int c = table.column("coherence");
        List<CsvTable.Row> rows = table.rows();
        int n = rows.size();
        double[] omega = new double[n];
        double[] re = new double[n];
        double[] im = new double[n];
        double[] coherence = c < 0 ? null : new double[n];
        for (int i = 0; i < n; i++) {
            CsvTable.Row row = rows.get(i);
            double hz = table.number(row, f, "a frequency in Hz > 0, e.g. 12.5");
            if (!(hz > 0)) {
                throw table.error(row.cell(f), "frequency must be > 0 Hz", "a frequency in Hz > 0, e.g. 12.5");
            }
            omega[i] = 2 * Math.PI * hz;
            if (i > 0 && !(omega[i] > omega[i - 1])) {
                throw table.error(row.cell(f), "frequency not above the previous line's "
                        + rows.get(i - 1).cell(f).text() + " Hz", "frequencies strictly increasing from line to line");
            }
            if (polar) {
                double db = table.number(row, a, "a magnitude in dB, e.g. -42.1");
                double deg = table.number(row, b, "a phase in degrees, e.g. -93.5");
                double magnitude = Math.pow(10, db / 20);
                if (!(magnitude > 0) || !Double.isFinite(magnitude)) {
                    throw table.error(row.cell(a), "magnitude out of range", "a magnitude between -6000 and 6000 dB");
                }
                re[i] = magnitude * Math.cos(Math.toRadians(deg));
                im[i] = magnitude * Math.sin(Math.toRadians(deg));
            } else {
                re[i] = table.number(row, a, "the real part as a decimal number, e.g. -0.0123");
                im[i] = table.number(row, b, "the imaginary part as a decimal number, e.g. -1.5e-3");
                if (re[i] == 0 && im[i] == 0) {
                    throw table.error(row.cell(a), "response is exactly zero (phase undefined)",
                            "a non-zero complex value");
                }
            }
            if (coherence != null) {
                coherence[i] = table.number(row, c, "a coherence between 0 and 1");
                if (!(coherence[i] >= 0 && coherence[i] <= 1)) {
                    throw table.error(row.cell(c), "coherence outside 0..1", "a coherence between 0 and 1");
                }
            }
        }
        if (n < 2) {
            throw table.error(rows.get(0), "a frequency response needs at least 2 points, the file has 1",
                    "two or more lines of data");
        }
        return new MeasuredFrequencyResponse(table.source(), omega, re, im, coherence);
    }

    public MeasurementSource source() {
        return source;
    }

    /** The measured points as a frequency response, the same type the engine computes. */
    public FrequencyResponse response() {
        return response;
    }

    public int size() {
        return response.size();
    }

    /** Angular frequency of point i, rad/s. */
    public double omega(int i) {
        return response.omega(i);
    }

    public double real(int i) {
        return response.real(i);
    }

    public double imaginary(int i) {
        return response.imaginary(i);
    }

    public double magnitude(int i) {
        return response.magnitude(i);
    }

    /** Principal phase of point i, rad, (−π, π]. */
    public double phase(int i) {
        return Math.atan2(response.imaginary(i), response.real(i));
    }

    /** Whether the file gave a coherence per point. */
    public boolean hasCoherence() {
        return coherence != null;
    }

    /** Coherence of point i; 1 when the file gave none. */
    public double coherence(int i) {
        return coherence == null ? 1.0 : coherence[i];
    }

    public double[] omegas() {
        return response.omegas();
    }

    public double[] magnitudes() {
        double[] m = new double[size()];
        for (int i = 0; i < m.length; i++) {
            m[i] = magnitude(i);
        }
        return m;
    }

    /** Phase in rad, unwrapped along frequency as {@link FrequencyResponse#unwrappedPhaseDeg()} does it. */
    public double[] unwrappedPhase() {
        double[] p = response.unwrappedPhaseDeg();
        for (int i = 0; i < p.length; i++) {
            p[i] = Math.toRadians(p[i]);
        }
        return p;
    }
}
