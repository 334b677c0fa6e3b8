package org.tracewell.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Base64;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import javax.imageio.ImageIO;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracewell.core.SafetyCaution;
import org.tracewell.core.analysis.CancellationFlag;
import org.tracewell.core.analysis.ProgressListener;
import org.tracewell.requirements.DesignReview;
import org.tracewell.requirements.RequirementResult;
import org.tracewell.requirements.RequirementStatus;
import org.tracewell.requirements.ReviewResults;

/** The design-review report of the LM-3020 example, analysed by the real pipeline. */
class ReportWriterTest {

    private static final Pattern LINK = Pattern.compile("(?:src|href)=\"([^\"]*)\"");

    private static ReportFixtures.Loaded lm3020;

    @BeforeAll
    static void analyse() throws Exception {
        lm3020 = ReportFixtures.lm3020();
    }

    private static ReportInput fullInput() {
        return new ReportInput(ReportFixtures.review(lm3020), java.util.Optional.of(lm3020.inputs()),
                lm3020.machine().getDescription());
    }

    private static String html(Path dir) throws Exception {
        return Files.readString(dir.resolve(ReportWriter.INDEX), StandardCharsets.UTF_8);
    }

    @Test
    void pageHasEverySectionAndTheCautionAtTopAndEnd(@TempDir Path dir) throws Exception {
        ReportWriter.write(fullInput(), dir);
        String html = html(dir);
        for (String[] section : ReportPage.SECTIONS) {
            assertTrue(html.contains("id=\"" + section[0] + "\""), "section " + section[0]);
            assertTrue(html.contains(section[1]), "heading " + section[1]);
        }
        String caution = Html.escape(SafetyCaution.TEXT);
        int first = html.indexOf(caution);
        assertTrue(first > 0 && first < html.indexOf("id=\"summary\""), "caution before the summary");
        assertTrue(html.lastIndexOf(caution) > html.indexOf("id=\"assumptions\""), "caution again at the end");
        for (String expected : List.of("Requirement summary", "Axes in trade units", "Kv ((m/min)/mm)",
                "Velocity PI", "Position loop PM", "Following error", "ISO 230-4 figures per direction", "G(b)",
                "Lines, largest portion first", "Compliance matrix", "Padé", "zero-order-hold",
                ReportFixtures.provenance().inputSha256(), "2026-03-14 09:30:00 UTC", "0.1.0-test")) {
            assertTrue(html.contains(Html.escape(expected)), expected);
        }
        assertTrue(html.contains("class=\"status met\"") || html.contains("class=\"status violated\""));
        assertTrue(html.contains("<span class=\"status not-evaluated\">not evaluated"),
                "the status word sits inside its coloured badge");
    }

    @Test
    void authorIsNamedInTheHeaderAndTheSettingsOnlyWhenGiven(@TempDir Path dir) throws Exception {
        ReportWriter.write(fullInput().withAuthor("  R. Okafor, controls  "), dir.resolve("named"));
        String named = html(dir.resolve("named"));
        assertTrue(named.contains("· prepared by R. Okafor, controls</p>"), "author in the subtitle, trimmed");
        assertTrue(named.contains("R. Okafor, controls</td>") || named.contains("R. Okafor, controls</dd>"),
                "author among the settings");
        ReportWriter.write(fullInput(), dir.resolve("unnamed"));
        String unnamed = html(dir.resolve("unnamed"));
        assertFalse(unnamed.contains("prepared by"), "no author, no claim");
        assertTrue(unnamed.contains("(not named)"));
    }

    @Test
    void hostileModelStringsAreEscapedAndThePageHasNoScript(@TempDir Path dir) throws Exception {
        ReportInput hostile = new ReportInput(ReportFixtures.hostileReview(lm3020), java.util.Optional.of(lm3020.inputs()),
                ReportFixtures.HOSTILE + " description", ReportFixtures.HOSTILE + " author", java.util.List.of());
        ReportWriter.write(hostile, dir);
        String html = html(dir);
        String lower = html.toLowerCase(Locale.ROOT);
        assertFalse(lower.contains("<script"), "no script element at all");
        assertFalse(lower.contains("javascript:"), "no script URLs");
        assertFalse(Pattern.compile("\\son[a-z]+=").matcher(lower).find(), "no event-handler attributes");
        assertTrue(html.contains("&lt;script&gt;alert(&#39;x&#39;)&lt;/script&gt; &amp; &quot;quoted&quot; LM-3020"),
                "machine name escaped");
        assertTrue(html.contains("&lt;script&gt;alert(&#39;x&#39;)&lt;/script&gt; &amp; &quot;quoted&quot; rationale"),
                "rationale escaped");
        assertTrue(html.contains("&lt;script&gt;alert(&#39;x&#39;)&lt;/script&gt; &amp; &quot;quoted&quot; description"),
                "description escaped");
        assertTrue(html.contains("prepared by &lt;script&gt;alert(&#39;x&#39;)&lt;/script&gt; &amp; &quot;quoted&quot; author"),
                "author escaped");
    }

    @Test
    void everyLinkIsRelativeAndResolvesToAWrittenPng(@TempDir Path dir) throws Exception {
        List<Path> written = ReportWriter.write(fullInput(), dir);
        assertEquals(dir.resolve(ReportWriter.INDEX), written.get(0), "page first");
        String html = html(dir);
        Matcher m = LINK.matcher(html);
        List<String> images = new ArrayList<>();
        while (m.find()) {
            String target = m.group(1);
            if (target.startsWith("#")) {
                assertTrue(html.contains("id=\"" + target.substring(1) + "\""), "fragment " + target);
                continue;
            }
            assertFalse(target.contains(":") || target.startsWith("/") || target.contains(".."),
                    "relative link inside the report folder: " + target);
            Path file = dir.resolve(target);
            assertTrue(Files.isRegularFile(file), "linked file exists: " + target);
            assertTrue(written.contains(file), "linked file is reported as written: " + target);
            images.add(target);
        }
        // 3 charts per axis, 2 per contour, 1 per circle test, 1 per budget (the example has budgets).
        long circles = lm3020.analysis().contours().stream().filter(c -> c.fullCircle()).count();
        long expected = 3L * lm3020.analysis().axes().size() + 2L * lm3020.analysis().contours().size() + circles
                + lm3020.budget().requirements().stream().filter(b -> !b.evaluation().contributions().isEmpty()).count();
        assertEquals(expected, images.size(), "one image per chart");
        assertEquals(written.size() - 1, images.size(), "nothing written that the page does not link");
        BufferedImage first = ImageIO.read(dir.resolve(images.get(0)).toFile());
        assertEquals(900, first.getWidth(), "Bode chart at its stated width");
        assertEquals(560, first.getHeight());
    }

    @Test
    void embeddedModeWritesOneFileWithDataUris(@TempDir Path dir) throws Exception {
        List<Path> written = ReportWriter.write(fullInput(), dir, ImageMode.EMBEDDED);
        assertEquals(List.of(dir.resolve(ReportWriter.INDEX)), written);
        String html = html(dir);
        Matcher m = Pattern.compile("src=\"data:image/png;base64,([A-Za-z0-9+/=]+)\"").matcher(html);
        assertTrue(m.find(), "an embedded PNG");
        BufferedImage image = ImageIO.read(new ByteArrayInputStream(Base64.getDecoder().decode(m.group(1))));
        assertEquals(900, image.getWidth());
        assertFalse(html.contains("src=\"charts/"));
    }

    @Test
    void sameInputGivesTheSameBytes(@TempDir Path dir) throws Exception {
        Path a = dir.resolve("a");
        Path b = dir.resolve("b");
        List<Path> first = ReportWriter.write(fullInput(), a);
        List<Path> second = ReportWriter.write(fullInput(), b);
        assertEquals(first.size(), second.size());
        for (int i = 0; i < first.size(); i++) {
            assertEquals(a.relativize(first.get(i)), b.relativize(second.get(i)));
            assertArrayEquals(Files.readAllBytes(first.get(i)), Files.readAllBytes(second.get(i)),
                    "identical " + a.relativize(first.get(i)));
        }
    }

    @Test
    void rewritingRemovesChartsOfAnEarlierReport(@TempDir Path dir) throws Exception {
        Path stale = Files.createDirectories(dir.resolve(ReportWriter.CHARTS)).resolve("99-old-chart.png");
        Files.write(stale, new byte[] {1});
        Path unrelated = dir.resolve(ReportWriter.CHARTS).resolve("notes.txt");
        Files.writeString(unrelated, "kept");
        ReportWriter.write(fullInput(), dir);
        assertFalse(Files.exists(stale), "stale chart removed");
        assertTrue(Files.exists(unrelated), "files the report did not write are left alone");
    }

    @Test
    void resultsAloneStillGiveACompleteReport(@TempDir Path dir) throws Exception {
        ReportWriter.write(ReportFixtures.review(lm3020), dir);
        String html = html(dir);
        assertTrue(html.contains("Plant and controller parameters were not supplied"));
        assertTrue(html.contains("Padé approximant of order"), "Bode basis stated when the exact loop is not at hand");
        for (String[] section : ReportPage.SECTIONS) {
            assertTrue(html.contains("id=\"" + section[0] + "\""), "section " + section[0]);
        }
    }

    @Test
    void theRealRequirementEvaluationReportsEveryRequirementOfTheExample(@TempDir Path dir) throws Exception {
        ReviewResults review = DesignReview.run(lm3020.machine(), ReportFixtures.provenance(), ProgressListener.SILENT,
                CancellationFlag.create());
        ReportWriter.write(ReportInput.of(review, lm3020.machine()), dir);
        String html = html(dir);
        for (RequirementResult r : review.requirements().results()) {
            assertTrue(html.contains(Html.escape(r.statement())), "requirement " + r.id());
        }
        long rows = Pattern.compile("<tr>\\s*<td>lm3020-r").matcher(html).results().count();
        // Every requirement in the summary, and the machine-level ones again at the top of the trace.
        assertTrue(rows >= review.requirements().results().size() + review.requirements().machineLevel().size(),
                "summary and trace rows: " + rows);
        String verdict = ReportPage.verdict(review.requirements().results().size(),
                count(review, RequirementStatus.MET), count(review, RequirementStatus.VIOLATED),
                count(review, RequirementStatus.NOT_EVALUATED));
        assertTrue(html.contains(Html.escape(verdict)), verdict);
    }

    private static long count(ReviewResults review, RequirementStatus status) {
        return review.requirements().results().stream().filter(r -> r.status() == status).count();
    }

    @Test
    void verdictCountsViolationsAndOpenItems() {
        assertEquals("All 4 requirements met.", ReportPage.verdict(4, 4, 0, 0));
        assertEquals("2 of 5 requirements violated, 1 not evaluated.", ReportPage.verdict(5, 2, 2, 1));
        assertEquals("No requirement violated; 1 of 5 not evaluated.", ReportPage.verdict(5, 4, 0, 1));
        assertEquals("The model states no requirements: nothing was verified.", ReportPage.verdict(0, 0, 0, 0));
    }

    @Test
    void chartFileNamesAreSafe() {
        assertEquals("bode-position-lm3020-x1", ReportWriter.fileSlug("bode-position-lm3020-x1"));
        assertEquals("circle-script-x", ReportWriter.fileSlug("circle-<script>/../x"));
        assertEquals("chart", ReportWriter.fileSlug("<>"));
    }
}
