package org.tracewell.engine.bench;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.ZonedDateTime;
import java.util.Arrays;
import java.util.Locale;
import java.util.function.LongSupplier;

import org.tracewell.engine.loop.LoopFrequencyAnalysis;
import org.tracewell.engine.loop.Margins;
import org.tracewell.engine.poly.Polynomial;
import org.tracewell.engine.tf.FrequencyResponse;
import org.tracewell.engine.tf.TransferFunction;

/**
 * Benchmark main (not a unit test): frequency response of a 12th-order loop at 10⁴ points
 * (target ≤ 5 ms) and margins of a 12th-order loop (target ≤ 1 ms). Warm-up, then repeated
 * timing; median and minimum written to {@code args[0]} (default
 * {@code benchmarks/loop-benchmark.txt}).
 */
public final class LoopBenchmark {

    private static final int WARMUP_ROUNDS = 3000;
    private static final int MEASURED_ROUNDS = 500;

    private LoopBenchmark() {
    }

    /**
     * The 12th-order loop: position gain 25 1/s, velocity loop 900 rad/s (2nd order, ζ 0.7),
     * current loop 6000 rad/s, two axial/structural modes (40 Hz ζ 0.03, 120 Hz ζ 0.02) with
     * anti-resonances, a 2nd-order low-pass at 2000 rad/s, a notch at 300 Hz and the integrator:
     * 12 poles. Built freshly by each call so no cached poles are reused.
     */
    static TransferFunction twelfthOrderLoop() {
        Polynomial num = Polynomial.constant(1.0);
        Polynomial den = Polynomial.S; // integrator
        den = den.multiply(second(900, 0.7));
        num = num.multiply(Polynomial.constant(900 * 900.0));
        den = den.multiply(Polynomial.ofDescending(1, 6000));
        num = num.multiply(Polynomial.constant(6000));
        double w1 = 2 * Math.PI * 40;
        double w2 = 2 * Math.PI * 120;
        num = num.multiply(second(0.8 * w1, 0.02)).multiply(Polynomial.constant(1 / (0.64)));
        den = den.multiply(second(w1, 0.03));
        num = num.multiply(second(0.85 * w2, 0.015)).multiply(Polynomial.constant(1 / 0.7225));
        den = den.multiply(second(w2, 0.02));
        den = den.multiply(second(2000, 0.7));
        num = num.multiply(Polynomial.constant(2000 * 2000.0));
        double wn = 2 * Math.PI * 300;
        num = num.multiply(second(wn, 0.01));
        den = den.multiply(second(wn, 0.5));
        num = num.multiply(Polynomial.constant(25.0));
        return TransferFunction.of(num, den);
    }

    private static Polynomial second(double w, double zeta) {
        return Polynomial.ofDescending(1, 2 * zeta * w, w * w);
    }

    public static void main(String[] args) throws IOException {
        Path outFile = Path.of(args.length > 0 ? args[0] : "benchmarks/loop-benchmark.txt");
        TransferFunction loop = twelfthOrderLoop();
        if (loop.denominator().degree() != 12) {
            throw new IllegalStateException("benchmark loop must be 12th order, is " + loop.denominator().degree());
        }
        double[] omega = new double[10_000];
        for (int i = 0; i < omega.length; i++) {
            omega[i] = Math.pow(10, -1 + 6.0 * i / (omega.length - 1));
        }
        double[] sink = new double[1];
        LongSupplier frequencyResponse = () -> {
            long t0 = System.nanoTime();
            FrequencyResponse fr = loop.frequencyResponse(omega);
            long t1 = System.nanoTime();
            sink[0] += fr.real(fr.size() / 2);
            return t1 - t0;
        };
        LongSupplier margins = () -> {
            TransferFunction fresh = twelfthOrderLoop();
            long t0 = System.nanoTime();
            Margins m = LoopFrequencyAnalysis.margins(fresh);
            long t1 = System.nanoTime();
            sink[0] += m.phaseMarginDeg();
            return t1 - t0;
        };
        long[] fr = measure(frequencyResponse);
        long[] mg = measure(margins);
        Margins m = LoopFrequencyAnalysis.margins(loop);
        StringBuilder sb = new StringBuilder();
        sb.append("Tracewell loop benchmark, ").append(ZonedDateTime.now()).append('\n');
        sb.append("JVM ").append(System.getProperty("java.vm.name")).append(' ')
                .append(System.getProperty("java.version")).append(", ")
                .append(Runtime.getRuntime().availableProcessors()).append(" processors, ")
                .append(System.getProperty("os.name")).append(' ').append(System.getProperty("os.arch")).append('\n');
        sb.append("loop: ").append(loop.denominator().degree()).append("th order, numerator degree ")
                .append(loop.numerator().degree()).append("; ").append(m.gainCrossovers().size()).append(" gain and ")
                .append(m.phaseCrossovers().size()).append(" phase crossings, PM ")
                .append(String.format(Locale.ROOT, "%.3f", m.phaseMarginDeg())).append(" deg, GM ")
                .append(String.format(Locale.ROOT, "%.3f", m.gainMarginDb())).append(" dB\n");
        sb.append("warm-up ").append(WARMUP_ROUNDS).append(" rounds, measured ").append(MEASURED_ROUNDS)
                .append(" rounds each\n");
        sb.append(line("frequency response, 10^4 points", fr, 5.0));
        sb.append(line("margins (incl. roots for the grid)", mg, 1.0));
        sb.append("(checksum ").append(sink[0]).append(")\n");
        Path parent = outFile.toAbsolutePath().getParent();
        if (parent != null) {
            Files.createDirectories(parent);
        }
        Files.writeString(outFile, sb.toString(), StandardCharsets.UTF_8);
        System.out.print(sb);
        System.out.println("written to " + outFile.toAbsolutePath());
    }

    private static long[] measure(LongSupplier task) {
        for (int i = 0; i < WARMUP_ROUNDS; i++) {
            task.getAsLong();
        }
        long[] t = new long[MEASURED_ROUNDS];
        for (int i = 0; i < t.length; i++) {
            t[i] = task.getAsLong();
        }
        Arrays.sort(t);
        return t;
    }

    private static String line(String name, long[] sortedNanos, double targetMs) {
        double median = sortedNanos[sortedNanos.length / 2] / 1e6;
        double min = sortedNanos[0] / 1e6;
        double p90 = sortedNanos[(int) (sortedNanos.length * 0.9)] / 1e6;
        return String.format(Locale.ROOT, "%-38s median %8.4f ms  min %8.4f ms  p90 %8.4f ms  target <= %.1f ms  %s%n",
                name, median, min, p90, targetMs, median <= targetMs ? "MET" : "NOT MET");
    }
}
