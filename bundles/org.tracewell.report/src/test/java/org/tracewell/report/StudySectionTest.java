package org.tracewell.report;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.eclipse.emf.ecore.util.EcoreUtil;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracewell.core.SafetyCaution;
import org.tracewell.core.variation.StudyDefinition;
import org.tracewell.core.variation.StudyResult;
import org.tracewell.core.variation.StudyRunner;
import org.tracewell.core.variation.SweepRange;
import org.tracewell.core.variation.Tolerance;
import org.tracewell.engine.variation.RunControl;
import org.tracewell.model.Machine;
import org.tracewell.model.StudyKind;
import org.tracewell.model.ToleranceShape;
import org.tracewell.model.VariationStudy;

/** The studies section: present when the model asks for studies, results when run, every model string escaped. */
class StudySectionTest {

    static ReportFixtures.Loaded lm3020;

    @BeforeAll
    static void analyse() throws Exception {
        lm3020 = ReportFixtures.lm3020();
    }

    private static String write(ReportInput input, Path dir) throws Exception {
        ReportWriter.write(input, dir);
        return Files.readString(dir.resolve(ReportWriter.INDEX), StandardCharsets.UTF_8);
    }

    private static ReportInput base(Machine machine) {
        return new ReportInput(ReportFixtures.review(lm3020), Optional.of(lm3020.inputs()), "",
                machine.getStudies().stream().map(StudyReport::notRun).toList());
    }

    @Test
    void aStudyTheModelAsksForIsListedAndSaysHowToRunIt(@TempDir Path dir) throws Exception {
        String html = write(base(lm3020.machine()), dir);
        assertTrue(html.contains("id=\"studies\"") && html.contains("href=\"#studies\""), "section and contents entry");
        assertTrue(html.contains("Monte-Carlo study: XY tolerances") && html.contains("sweep study: Kv match"));
        assertTrue(html.contains("Not run for this report"));
        assertTrue(html.contains(Html.escape("tracewell montecarlo --study 'XY tolerances'")), "how to run it");
        String none = write(new ReportInput(ReportFixtures.review(lm3020), Optional.of(lm3020.inputs()), ""),
                dir.resolve("none"));
        assertFalse(none.contains("id=\"studies\""), "no section when the model asks for none");
    }

    @Test
    void resultsShowYieldsPercentilesWorstVariantsSensitivitiesAndCharts(@TempDir Path dir) throws Exception {
        Machine machine = lm3020.machine();
        StudyResult monteCarlo = StudyRunner.run(machine, new StudyDefinition("XY tolerances", StudyKind.MONTE_CARLO,
                List.of(new Tolerance("axis[Y].controller.positionGain", ToleranceShape.NORMAL, 0.5, 38, 42)), List.of(),
                List.of("requirement[lm3020-r1-y-kv]", "axis[Y].phaseMargin"), 40, 3020, 3), RunControl.serial());
        StudyResult sweep = StudyRunner.run(machine, new StudyDefinition("Kv match", StudyKind.SWEEP, List.of(),
                List.of(new SweepRange("axis[Y].controller.positionGain", 38, 42, 3)),
                List.of("requirement[lm3020-r1-y-kv]"), 1, 1, 0), RunControl.serial());
        String html = write(base(machine).withStudyResults(List.of(monteCarlo, sweep)), dir);
        for (String expected : List.of("Yield against each requirement", "lm3020-r1-y-kv", "Hyndman & Fan",
                "Worst variants on requirement[lm3020-r1-y-kv]", "Normalised sensitivities", "Every grid point",
                "normal, σ 0.03 (m/min)/mm", "[2.28 (m/min)/mm, 2.52 (m/min)/mm]", SafetyCaution.SHORT)) {
            assertTrue(html.contains(Html.escape(expected)), expected);
        }
        assertFalse(html.contains("Not run for this report"), "both studies ran");
        try (var charts = Files.list(dir.resolve(ReportWriter.CHARTS))) {
            List<String> names = charts.map(p -> p.getFileName().toString()).filter(n -> n.contains("study")).toList();
            // one histogram per Monte-Carlo metric, one sweep chart per sweep metric
            assertTrue(names.size() == 3, names.toString());
        }
    }

    @Test
    void hostileStudyStringsAreEscaped(@TempDir Path dir) throws Exception {
        Machine machine = EcoreUtil.copy(lm3020.machine());
        VariationStudy study = machine.getStudies().get(0);
        study.setName(ReportFixtures.HOSTILE);
        study.setDescription(ReportFixtures.HOSTILE + " study description");
        String html = write(base(machine), dir);
        assertFalse(html.toLowerCase(Locale.ROOT).contains("<script"), "no script element at all");
        assertTrue(html.contains("&lt;script&gt;alert(&#39;x&#39;)&lt;/script&gt; &amp; &quot;quoted&quot; study"
                + " description"), "description escaped");
    }
}
