package org.tracewell.report;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.Base64;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

import org.jfree.chart.JFreeChart;
import org.tracewell.charts.ChartExport;
import org.tracewell.requirements.ReviewResults;

/**
 * Writes the design-review report: {@code index.html} and, by default, its chart images as
 * {@code charts/NN-what-id.png} beside it, linked relatively. The page has no script and loads nothing from
 * outside its directory; every model string is escaped ({@link Html#escape}). For the same input the output is
 * byte for byte the same (the only date shown is the analysis date from the provenance).
 */
public final class ReportWriter {

    /** The page's file name. */
    public static final String INDEX = "index.html";
    /** Folder of the chart images in {@link ImageMode#ALONGSIDE} mode. */
    public static final String CHARTS = "charts";

    private ReportWriter() {
    }

    /** The report from the results alone (axis tables without plant and controller parameters), charts alongside. */
    public static List<Path> write(ReviewResults review, Path outDir) throws IOException {
        return write(ReportInput.of(review), outDir, ImageMode.ALONGSIDE);
    }

    /** The full report, charts alongside. */
    public static List<Path> write(ReportInput input, Path outDir) throws IOException {
        return write(input, outDir, ImageMode.ALONGSIDE);
    }

    /**
     * Writes the report into {@code outDir} (created when missing) and returns the files written, the page
     * first. In {@link ImageMode#ALONGSIDE} mode stale {@code charts/*.png} of an earlier report are removed first
     * so the folder holds exactly what the page links to.
     */
    public static List<Path> write(ReportInput input, Path outDir, ImageMode mode) throws IOException {
        Files.createDirectories(outDir);
        Path chartDir = outDir.resolve(CHARTS);
        List<Path> written = new ArrayList<>();
        if (mode == ImageMode.ALONGSIDE) {
            Files.createDirectories(chartDir);
            removeOldCharts(chartDir);
        }
        // Charts are independent: draw and encode them on every core while the page is laid out; names are
        // handed out in page order, so the output stays byte-for-byte the same.
        ExecutorService painters = Executors.newFixedThreadPool(Math.max(1, Runtime.getRuntime().availableProcessors()));
        List<Future<?>> pending = new ArrayList<>();
        ReportPage.ChartSink sink = new ReportPage.ChartSink() {
            private int sequence;

            @Override
            public String add(String slug, JFreeChart chart, int widthPx, int heightPx) throws IOException {
                if (mode == ImageMode.EMBEDDED) {
                    byte[] png = ChartExport.png(chart, widthPx, heightPx);
                    return "data:image/png;base64," + Base64.getEncoder().encodeToString(png);
                }
                sequence++;
                String name = String.format(Locale.ROOT, "%02d-%s.png", sequence, fileSlug(slug));
                Path file = chartDir.resolve(name);
                pending.add(painters.submit(() -> {
                    Files.write(file, ChartExport.png(chart, widthPx, heightPx));
                    return null;
                }));
                written.add(file);
                return CHARTS + "/" + name;
            }
        };
        String html;
        try {
            html = new ReportPage(input, sink).render();
            for (Future<?> chart : pending) {
                chart.get();
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IOException("interrupted while drawing the report's charts", e);
        } catch (ExecutionException e) {
            Throwable cause = e.getCause();
            if (cause instanceof IOException io) {
                throw io;
            }
            throw new IOException("a report chart could not be drawn: " + cause, cause);
        } finally {
            painters.shutdownNow();
        }
        Path index = outDir.resolve(INDEX);
        // Written beside and moved into place, so a reader never sees half a page.
        Path partial = outDir.resolve(INDEX + ".partial");
        Files.write(partial, html.getBytes(StandardCharsets.UTF_8));
        Files.move(partial, index, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        written.add(0, index);
        return List.copyOf(written);
    }

    /** Lower-case letters, digits and '-' only, at most 60 characters: safe on every file system and in a URL. */
    static String fileSlug(String text) {
        StringBuilder out = new StringBuilder();
        for (char c : text.toLowerCase(Locale.ROOT).toCharArray()) {
            boolean keep = (c >= 'a' && c <= 'z') || (c >= '0' && c <= '9');
            if (keep) {
                out.append(c);
            } else if (out.length() > 0 && out.charAt(out.length() - 1) != '-') {
                out.append('-');
            }
            if (out.length() >= 60) {
                break;
            }
        }
        while (out.length() > 0 && out.charAt(out.length() - 1) == '-') {
            out.setLength(out.length() - 1);
        }
        return out.length() == 0 ? "chart" : out.toString();
    }

    private static void removeOldCharts(Path chartDir) throws IOException {
        try (var files = Files.list(chartDir)) {
            for (Path f : files.filter(p -> p.getFileName().toString().matches("\\d{2,}-[a-z0-9-]+\\.png")).toList()) {
                Files.delete(f);
            }
        }
    }
}
