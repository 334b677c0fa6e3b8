package org.tracewell.core.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tracewell.core.Examples;

/** Broken files give file, line, column and what was expected, as a ModelLoadException. */
class LoadDiagnosticsTest {

    @TempDir
    Path temp;

    private final ModelFiles files = new ModelFiles();

    /** The example with one exact text replacement, written next to a copy of the library. */
    private Path brokenCopy(String file, String find, String replace) throws Exception {
        Path examples = Examples.copyTo(temp.resolve("ex"));
        Path target = examples.resolve(file);
        String text = Files.readString(target);
        assertTrue(text.contains(find), "fixture text not found: " + find);
        Files.writeString(target, text.replace(find, replace));
        return target;
    }

    private static int lineOf(Path file, String text) throws Exception {
        String content = Files.readString(file);
        int index = content.indexOf(text);
        return (int) content.substring(0, index).chars().filter(c -> c == '\n').count() + 1;
    }

    /** SAX reports an element at the end of its start tag, which spans several lines (one attribute per line). */
    private static void assertWithinStartTag(int startLine, int reportedLine) {
        assertTrue(reportedLine >= startLine && reportedLine <= startLine + 3,
                "reported line " + reportedLine + " is not within the start tag beginning on line " + startLine);
    }

    @Test
    void malformedXmlNamesFileLineAndColumn() throws Exception {
        Path file = brokenCopy(Examples.LM_3020, "  </controller>\n    <encoder\n        id=\"lm3020-x1-encoder\"",
                "  </controllr>\n    <encoder\n        id=\"lm3020-x1-encoder\"");
        ModelLoadException e = assertThrows(ModelLoadException.class, () -> files.load(file));
        assertEquals(file, e.file());
        assertEquals(lineOf(file, "</controllr>"), e.line());
        assertTrue(e.column() > 0);
        assertTrue(e.getMessage().contains("not well-formed") && e.getMessage().contains("controller"),
                e.getMessage());
        assertTrue(e.getMessage().startsWith(file + ":" + e.line() + ":" + e.column() + ": "), e.getMessage());
    }

    @Test
    void unknownElementIsAnErrorListingWhatIsExpected() throws Exception {
        Path file = brokenCopy(Examples.LM_3020, "    <encoder\n        id=\"lm3020-x1-encoder\"",
                "    <sensor\n        id=\"lm3020-x1-encoder\"");
        ModelLoadException e = assertThrows(ModelLoadException.class, () -> files.load(file));
        assertTrue(e.getMessage().contains("unknown element or attribute 'sensor' in Axis"), e.getMessage());
        assertTrue(e.getMessage().contains("expected one of:") && e.getMessage().contains("encoder"), e.getMessage());
        assertWithinStartTag(lineOf(file, "<sensor"), e.line());
    }

    @Test
    void unknownAttributeIsAnError() throws Exception {
        Path file = brokenCopy(Examples.SHARED_Z, "lead=\"0.005\"", "pitch=\"0.005\"");
        ModelLoadException e = assertThrows(ModelLoadException.class, () -> files.load(file));
        assertTrue(e.getMessage().contains("'pitch' in RigidScrewDrive") && e.getMessage().contains("lead"),
                e.getMessage());
    }

    @Test
    void badNumberNamesTheAttributeAndTheExpectedForm() throws Exception {
        Path file = brokenCopy(Examples.SHARED_Z, "lead=\"0.005\"", "lead=\"5 mm\"");
        ModelLoadException e = assertThrows(ModelLoadException.class, () -> files.load(file));
        assertTrue(e.getMessage().contains("'5 mm' is not valid for lead; expected a number"), e.getMessage());
        assertTrue(e.line() > 0, e.getMessage());
    }

    @Test
    void unknownTypeListsTheKnownTypes() throws Exception {
        Path file = brokenCopy(Examples.SHARED_Z, "xsi:type=\"tw:RigidScrewDrive\"", "xsi:type=\"tw:BeltDrive\"");
        ModelLoadException e = assertThrows(ModelLoadException.class, () -> files.load(file));
        assertTrue(e.getMessage().contains("unknown type") && e.getMessage().contains("tw:RigidScrewDrive"),
                e.getMessage());
    }

    @Test
    void missingLibraryAxisFileIsAClearError() throws Exception {
        Path file = brokenCopy(Examples.LM_3020, "library/z-slide-25x5.axis", "library/z-slide-missing.axis");
        ModelLoadException e = assertThrows(ModelLoadException.class, () -> files.load(file));
        assertEquals(file, e.file());
        assertWithinStartTag(lineOf(file, "<libraryAxes"), e.line());
        assertTrue(e.getMessage().contains("library/z-slide-missing.axis") && e.getMessage().contains("does not exist"),
                e.getMessage());
    }

    @Test
    void unknownIdInALibraryFileListsTheIdsThere() throws Exception {
        Path file = brokenCopy(Examples.LM_3020, "z-slide-25x5.axis#z-slide-25x5", "z-slide-25x5.axis#z-slide");
        ModelLoadException e = assertThrows(ModelLoadException.class, () -> files.load(file));
        assertTrue(e.getMessage().contains("no element with id 'z-slide'")
                && e.getMessage().contains("z-slide-25x5-plant"), e.getMessage());
    }

    @Test
    void brokenLibraryFileIsReportedWithItsOwnPosition() throws Exception {
        Path machine = brokenCopy(Examples.SHARED_Z, "lead=\"0.005\"", "lead=\"0.005\" lead=\"1\"");
        ModelLoadException e = assertThrows(ModelLoadException.class,
                () -> files.load(machine.getParent().getParent().resolve(Examples.LM_3020)));
        assertTrue(e.problems().size() >= 2, e.getMessage());
        assertTrue(e.problems().get(0).message().contains("cannot be read"), e.getMessage());
        assertTrue(e.problems().get(1).position().file().endsWith(Path.of("library", "z-slide-25x5.axis")),
                e.getMessage());
        assertTrue(e.problems().get(1).position().line() > 0, e.getMessage());
    }

    @Test
    void unresolvedIdInsideTheFileIsAnError() throws Exception {
        Path file = brokenCopy(Examples.LM_3020, "gantryPartner=\"lm3020-x2\"", "gantryPartner=\"lm3020-x9\"");
        ModelLoadException e = assertThrows(ModelLoadException.class, () -> files.load(file));
        assertTrue(e.getMessage().contains("lm3020-x9"), e.getMessage());
        assertTrue(e.line() > 0, e.getMessage());
    }

    @Test
    void wrongRootForTheFileKindIsAnError() throws Exception {
        Path examples = Examples.copyTo(temp.resolve("ex"));
        Path renamed = examples.resolve("library/z-slide-25x5.machine");
        Files.copy(examples.resolve(Examples.SHARED_Z), renamed);
        ModelLoadException e = assertThrows(ModelLoadException.class, () -> files.load(renamed));
        assertTrue(e.getMessage().contains("root element is a Axis; a .machine file must hold one tw:Machine"),
                e.getMessage());
    }

    @Test
    void missingFileAndWrongExtensionAreErrors() throws Exception {
        ModelLoadException missing = assertThrows(ModelLoadException.class,
                () -> files.load(temp.resolve("nothing.machine")));
        assertTrue(missing.getMessage().contains("does not exist"), missing.getMessage());
        Path text = Files.writeString(temp.resolve("notes.txt"), "hello");
        ModelLoadException wrong = assertThrows(ModelLoadException.class, () -> files.load(text));
        assertTrue(wrong.getMessage().contains("expected a name ending in .machine or .axis"), wrong.getMessage());
    }

    @Test
    void emptyFileIsAnError() throws Exception {
        Path empty = Files.writeString(temp.resolve("empty.axis"), "");
        ModelLoadException e = assertThrows(ModelLoadException.class, () -> files.load(empty));
        assertEquals(empty, e.file());
    }
}
