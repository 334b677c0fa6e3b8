package org.tracewell.cli;

import java.io.BufferedWriter;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;

import com.google.gson.GsonBuilder;
import com.google.gson.JsonArray;
import com.google.gson.JsonNull;
import com.google.gson.JsonObject;

import org.tracewell.core.SafetyCaution;
import org.tracewell.core.variation.RequirementYield;
import org.tracewell.core.variation.StudyDefinition;
import org.tracewell.core.variation.StudyFigures;
import org.tracewell.core.variation.StudyMetric;
import org.tracewell.core.variation.StudyResult;
import org.tracewell.core.variation.SweepRange;
import org.tracewell.core.variation.Tolerance;
import org.tracewell.engine.variation.MetricSummary;
import org.tracewell.engine.variation.MonteCarloResult;
import org.tracewell.engine.variation.Quantity;
import org.tracewell.engine.variation.Sensitivity;
import org.tracewell.engine.variation.SweepResult;
import org.tracewell.engine.variation.WorstVariant;
import org.tracewell.model.StudyKind;
import org.tracewell.model.units.UnitTable;

/**
 * The files of one study: {@code NAME.json} (definition, nominal point, per-metric summary with percentiles in SI
 * and in the trade unit, yields, worst variants, sensitivities, provenance, the safety caution),
 * {@code NAME-summary.csv} (one row per metric) and {@code NAME-variants.csv} (Monte-Carlo: one row per variant) or
 * {@code NAME-grid.csv} (sweep: one row per grid point), SI with the unit in each column header.
 */
final class StudyFiles {

    /** Where the results came from, as analyze records it. */
    record Provenance(String toolVersion, String inputFile, String inputSha256, Instant date, String command) {
    }

    /** The files written. */
    record Written(Path json, Path summary, Path data) {
    }

    private StudyFiles() {
    }

    /** The file-name stem of a study: its name with anything but letters, digits, '.', '_' and '-' as '_'. */
    static String stem(StudyDefinition d) {
        String s = d.name().replaceAll("[^A-Za-z0-9._-]", "_");
        return s.isEmpty() ? "study" : s;
    }

    static Written write(StudyResult result, Path dir, Provenance provenance) throws IOException {
        Files.createDirectories(dir);
        String stem = stem(result.definition());
        Path json = dir.resolve(stem + ".json");
        Files.writeString(json, new GsonBuilder().setPrettyPrinting().serializeNulls()
                .serializeSpecialFloatingPointValues().disableHtmlEscaping().create()
                .toJson(json(result, provenance)) + "\n", StandardCharsets.UTF_8);
        Path summary = dir.resolve(stem + "-summary.csv");
        writeSummary(result, summary);
        Path data;
        if (result.monteCarlo().isPresent()) {
            data = dir.resolve(stem + "-variants.csv");
            writeVariants(result, result.monteCarlo().get(), data);
        } else {
            data = dir.resolve(stem + "-grid.csv");
            writeGrid(result, result.sweep().orElseThrow(), data);
        }
        return new Written(json, summary, data);
    }

    // ------------------------------------------------------------------------------------------------ JSON

    static JsonObject json(StudyResult r, Provenance provenance) {
        StudyDefinition d = r.definition();
        JsonObject root = new JsonObject();
        root.addProperty("tool", "tracewell");
        root.addProperty("toolVersion", provenance.toolVersion());
        root.addProperty("command", provenance.command());
        root.addProperty("inputFile", provenance.inputFile());
        root.addProperty("inputSha256", provenance.inputSha256());
        root.addProperty("date", provenance.date().toString());
        root.addProperty("machine", r.machineName());
        JsonObject study = new JsonObject();
        study.addProperty("name", d.name());
        study.addProperty("kind", d.kind().getLiteral());
        if (d.kind() == StudyKind.MONTE_CARLO) {
            study.addProperty("variantCount", d.variantCount());
            study.addProperty("seed", d.seed());
            study.addProperty("worstKept", d.worstKept());
        } else {
            study.addProperty("gridPoints", r.plannedCount());
        }
        study.addProperty("completed", r.completedCount());
        study.addProperty("cancelled", r.cancelled());
        study.addProperty("threads", r.threads());
        study.addProperty("seconds", r.seconds());
        root.add("study", study);
        JsonArray parameters = new JsonArray();
        for (int j = 0; j < r.parameters().size(); j++) {
            Quantity q = r.parameters().get(j);
            JsonObject p = new JsonObject();
            p.addProperty("path", q.name());
            p.addProperty("siUnit", q.unit());
            p.addProperty("displayUnit", r.parameterDisplayUnits().get(j));
            p.addProperty("nominalSi", r.nominalParameters()[j]);
            if (d.kind() == StudyKind.MONTE_CARLO) {
                Tolerance t = d.tolerances().get(j);
                p.addProperty("shape", t.shape().getLiteral());
                p.addProperty(t.shape() == org.tracewell.model.ToleranceShape.NORMAL ? "sigmaSi" : "halfWidthSi",
                        t.width());
                p.addProperty("minimumSi", t.lowerFor(r.nominalParameters()[j]));
                p.addProperty("maximumSi", t.upperFor());
            } else {
                SweepRange s = d.ranges().get(j);
                p.addProperty("fromSi", s.from());
                p.addProperty("toSi", s.to());
                p.addProperty("steps", s.steps());
            }
            parameters.add(p);
        }
        root.add("parameters", parameters);
        JsonArray metrics = new JsonArray();
        for (int m = 0; m < r.metrics().size(); m++) {
            metrics.add(metric(r, m));
        }
        root.add("metrics", metrics);
        JsonArray yields = new JsonArray();
        for (RequirementYield y : r.yields()) {
            JsonObject o = new JsonObject();
            o.addProperty("requirement", y.requirement().requirementId());
            o.addProperty("metric", y.requirement().name());
            o.addProperty("bound", y.requirement().bound().symbol());
            o.addProperty("limitSi", y.requirement().limit());
            o.addProperty("limit", display(y.requirement().limit(), y.requirement().displayUnit()));
            o.addProperty("unit", y.requirement().displayUnit());
            put(o, "nominalSi", y.nominalValue());
            o.addProperty("nominalMet", y.nominalMet());
            o.addProperty("passCount", y.estimate().passCount());
            o.addProperty("sampleCount", y.estimate().sampleCount());
            put(o, "fraction", y.estimate().fraction());
            put(o, "standardError", y.estimate().standardError());
            yields.add(o);
        }
        root.add("yields", yields);
        r.sweep().ifPresent(s -> root.add("grid", grid(s)));
        JsonArray sensitivities = new JsonArray();
        r.sensitivities().ifPresent(sa -> {
            for (int m = 0; m < r.metrics().size(); m++) {
                JsonObject o = new JsonObject();
                o.addProperty("metric", r.metrics().get(m).name());
                JsonArray ranked = new JsonArray();
                for (Sensitivity s : sa.ranked(m)) {
                    JsonObject e = new JsonObject();
                    e.addProperty("parameter", s.name());
                    put(e, "derivativeSi", s.derivative());
                    put(e, "normalised", s.normalised());
                    ranked.add(e);
                }
                o.add("ranked", ranked);
                sensitivities.add(o);
            }
        });
        root.add("sensitivities", sensitivities);
        root.addProperty("sensitivityMethod", "central differences at the nominal point, relative step "
                + org.tracewell.core.variation.StudyRunner.SENSITIVITY_STEP + "; normalised = (∂m/m)/(∂p/p)");
        root.addProperty("safetyCaution", SafetyCaution.TEXT);
        return root;
    }

    private static JsonObject metric(StudyResult r, int m) {
        StudyMetric metric = r.metrics().get(m);
        String unit = metric.displayUnit();
        JsonObject o = new JsonObject();
        o.addProperty("name", metric.name());
        o.addProperty("description", metric.description());
        o.addProperty("siUnit", metric.siUnit());
        o.addProperty("displayUnit", unit);
        put(o, "nominalSi", r.nominalMetrics()[m]);
        put(o, "nominal", display(r.nominalMetrics()[m], unit));
        r.monteCarlo().ifPresent(mc -> {
            MetricSummary s = mc.summary(m);
            o.addProperty("count", s.count());
            o.addProperty("notComputable", s.invalidCount());
            JsonObject si = new JsonObject();
            JsonObject shown = new JsonObject();
            double[] values = {s.mean(), s.standardDeviation(), s.min(), s.p01(), s.p05(), s.p50(), s.p95(), s.p99(),
                    s.max()};
            String[] names = {"mean", "standardDeviation", "min", "p01", "p05", "p50", "p95", "p99", "max"};
            for (int i = 0; i < names.length; i++) {
                put(si, names[i], values[i]);
                // a standard deviation is a difference: no dB of it
                put(shown, names[i], i == 1 && isDecibel(unit) ? Double.NaN : display(values[i], unit));
            }
            o.add("summarySi", si);
            o.add("summary", shown);
            JsonArray worst = new JsonArray();
            for (WorstVariant w : r.worst(m)) {
                JsonObject e = new JsonObject();
                e.addProperty("variant", w.index());
                put(e, "valueSi", w.value());
                JsonObject p = new JsonObject();
                double[] params = w.parameters();
                for (int j = 0; j < params.length; j++) {
                    p.addProperty(r.parameters().get(j).name(), params[j]);
                }
                e.add("parametersSi", p);
                worst.add(e);
            }
            o.add("worstVariants", worst);
        });
        return o;
    }

    private static JsonObject grid(SweepResult s) {
        JsonObject o = new JsonObject();
        JsonArray axes = new JsonArray();
        for (var axis : s.axes()) {
            JsonArray values = new JsonArray();
            for (double v : axis.values()) {
                values.add(v);
            }
            axes.add(values);
        }
        o.add("axisValuesSi", axes);
        o.addProperty("layout", "point (i, j) at index i·n₂ + j, i along the first parameter; see the -grid.csv");
        return o;
    }

    private static boolean isDecibel(String unit) {
        return UnitTable.find(unit).map(u -> u.decibel()).orElse(false);
    }

    static double display(double si, String unit) {
        return StudyFigures.display(si, unit);
    }

    private static void put(JsonObject o, String name, double v) {
        if (Double.isFinite(v)) {
            o.addProperty(name, v);
        } else {
            o.add(name, JsonNull.INSTANCE);
        }
    }

    // ------------------------------------------------------------------------------------------------ CSV

    private static void writeSummary(StudyResult r, Path target) throws IOException {
        try (BufferedWriter w = Files.newBufferedWriter(target, StandardCharsets.UTF_8)) {
            w.write("metric,si_unit,nominal,mean,standard_deviation,min,p01,p05,p50,p95,p99,max,count,not_computable,"
                    + "yield,yield_standard_error\n");
            for (int m = 0; m < r.metrics().size(); m++) {
                StudyMetric metric = r.metrics().get(m);
                StringBuilder line = new StringBuilder(csv(metric.name())).append(',').append(csv(metric.siUnit()))
                        .append(',').append(r.nominalMetrics()[m]);
                if (r.monteCarlo().isPresent()) {
                    MetricSummary s = r.summary(m);
                    for (double v : new double[] {s.mean(), s.standardDeviation(), s.min(), s.p01(), s.p05(), s.p50(),
                            s.p95(), s.p99(), s.max()}) {
                        line.append(',').append(v);
                    }
                    line.append(',').append(s.count()).append(',').append(s.invalidCount());
                } else {
                    line.append(",,,,,,,,,,,");
                }
                var yield = r.yieldOf(m);
                line.append(',').append(yield.map(y -> String.valueOf(y.estimate().fraction())).orElse(""))
                        .append(',').append(yield.map(y -> String.valueOf(y.estimate().standardError())).orElse(""));
                w.write(line.append('\n').toString());
            }
        }
    }

    /** One row per variant: its index, every parameter and every metric (empty when not evaluated), SI. */
    private static void writeVariants(StudyResult r, MonteCarloResult mc, Path target) throws IOException {
        try (BufferedWriter w = Files.newBufferedWriter(target, StandardCharsets.UTF_8)) {
            w.write("variant," + header(r) + "\n");
            int p = r.parameters().size();
            StringBuilder line = new StringBuilder(256);
            for (int v = 0; v < mc.variantCount(); v++) {
                if (!mc.isEvaluated(v)) {
                    continue;
                }
                line.setLength(0);
                line.append(v);
                for (int j = 0; j < p; j++) {
                    line.append(',').append(mc.parameter(v, j));
                }
                for (int m = 0; m < r.metrics().size(); m++) {
                    line.append(',').append(number(mc.metric(m, v)));
                }
                w.append(line.append('\n'));
            }
        }
    }

    /** One row per grid point: its index, the swept values and every metric, SI. */
    private static void writeGrid(StudyResult r, SweepResult s, Path target) throws IOException {
        try (BufferedWriter w = Files.newBufferedWriter(target, StandardCharsets.UTF_8)) {
            w.write("point," + header(r) + "\n");
            List<org.tracewell.engine.variation.SweepAxis> axes = s.axes();
            int n2 = axes.size() == 2 ? axes.get(1).size() : 1;
            StringBuilder line = new StringBuilder(256);
            for (int k = 0; k < s.pointCount(); k++) {
                if (!s.isEvaluated(k)) {
                    continue;
                }
                line.setLength(0);
                line.append(k).append(',').append(axes.get(0).value(k / n2));
                if (axes.size() == 2) {
                    line.append(',').append(axes.get(1).value(k % n2));
                }
                for (int m = 0; m < r.metrics().size(); m++) {
                    line.append(',').append(number(s.metric(m, k)));
                }
                w.append(line.append('\n'));
            }
        }
    }

    private static String header(StudyResult r) {
        StringBuilder h = new StringBuilder();
        for (Quantity q : r.parameters()) {
            h.append(h.length() == 0 ? "" : ",").append(csv(q.name() + " [" + q.unit() + "]"));
        }
        for (StudyMetric m : r.metrics()) {
            h.append(',').append(csv(m.name() + " [" + m.siUnit() + "]"));
        }
        return h.toString();
    }

    /** NaN (not computable) as an empty field. */
    private static String number(double v) {
        return Double.isNaN(v) ? "" : String.valueOf(v);
    }

    /** A CSV field, quoted when it holds a comma, a quote or a line break (RFC 4180). */
    static String csv(String field) {
        if (field.indexOf(',') < 0 && field.indexOf('"') < 0 && field.indexOf('\n') < 0) {
            return field;
        }
        return '"' + field.replace("\"", "\"\"") + '"';
    }
}
