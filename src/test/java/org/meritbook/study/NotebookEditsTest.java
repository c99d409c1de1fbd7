package org.meritbook.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Edits the live page makes to a notebook: only the lines of the edit change, everything else
 * (comments, quoting, blank lines, narrative) stays byte for byte, and the result reads back.
 */
class NotebookEditsTest {
    private static final Path FILE = Path.of("/lab/studies/fluoride.md");
    private static final String TEXT = StudyParserTest.NOTEBOOK;

    private static AnalysisCell cell(String text, String id) {
        return StudyParser.parse(text, FILE).cell(id).orElseThrow();
    }

    /** The lines of {@code after} that are not in {@code before}, in order (a minimal line diff for inserts). */
    private static List<String> inserted(String before, String after) {
        List<String> b = List.of(before.split("\n", -1));
        List<String> a = List.of(after.split("\n", -1));
        int head = 0;
        while (head < b.size() && b.get(head).equals(a.get(head))) {
            head++;
        }
        int tail = 0;
        while (tail < b.size() - head && b.get(b.size() - 1 - tail).equals(a.get(a.size() - 1 - tail))) {
            tail++;
        }
        assertEquals(b.size() - head - tail, 0, "lines were changed, not only inserted");
        return a.subList(head, a.size() - tail);
    }

    @Test
    void anExclusionIsAppendedToAnExistingListInItsIndentation() {
        String id = StudyParser.parse(TEXT, FILE).cells().get(0).id();
        String edited = NotebookEdits.exclude(TEXT, FILE, id, "Calibration!C12", "Vial cap # split: re-prepared",
                null, null);
        assertEquals(List.of("  - cell: \"Calibration!C12\"", "    reason: \"Vial cap # split: re-prepared\""),
                inserted(TEXT, edited));
        List<Exclusion> now = cell(edited, id).exclusions();
        assertEquals(3, now.size());
        assertEquals("Vial cap # split: re-prepared", now.get(2).reason());
        assertTrue(edited.contains("data: runs!Calibration!A4:C16     # headers in the first row"));
    }

    @Test
    void aCellWithoutExclusionsGetsTheListBeforeItsClosingFenceWithWhoAndWhen() {
        String edited = NotebookEdits.exclude(TEXT, FILE, "weighted-fit", "'Day 2'!C7", "Say \"why\"", "B. Chemist",
                "2025-03-01");
        assertEquals(List.of("exclude:", "  - cell: \"'Day 2'!C7\"", "    reason: \"Say \\\"why\\\"\"",
                "    by: \"B. Chemist\"", "    on: \"2025-03-01\""), inserted(TEXT, edited));
        Exclusion e = cell(edited, "weighted-fit").exclusions().get(0);
        assertEquals("Day 2!C7", e.address());
        assertEquals("Say \"why\" (B. Chemist, 2025-03-01)", e.shownReason());
    }

    @Test
    void restoringRemovesOnlyThatEntryAndTheEmptyListGoesWithTheLast() {
        String id = StudyParser.parse(TEXT, FILE).cells().get(0).id();
        String one = NotebookEdits.restore(TEXT, FILE, id, "Calibration!C9");
        assertEquals(List.of("Day 2!B5"), cell(one, id).exclusions().stream().map(Exclusion::address).toList());
        assertEquals(TEXT.split("\n").length - 2, one.split("\n").length);
        String none = NotebookEdits.restore(one, FILE, id, "'Day 2'!B5".replace("'", ""));
        assertTrue(cell(none, id).exclusions().isEmpty());
        assertTrue(cell(none, id).option("exclude").isEmpty(), "the empty 'exclude:' key is removed");
        // Excluding and restoring gives back the notebook exactly.
        String back = NotebookEdits.restore(NotebookEdits.exclude(TEXT, FILE, "weighted-fit", "'Day 2'!C7", "r", null,
                null), FILE, "weighted-fit", "Day 2!C7");
        assertEquals(TEXT, back);
    }

    @Test
    void theRevisionIsRaisedWithItsReasonAndNothingElseMoves() {
        String edited = NotebookEdits.nextRevision(TEXT, FILE, "Blank B4 re-read: transcription error");
        FrontMatter fm = StudyParser.parse(edited, FILE).frontMatter();
        assertEquals(4, fm.revision());
        assertEquals("Blank B4 re-read: transcription error", fm.revisionReason());
        assertEquals(TEXT.split("\n").length, edited.split("\n").length);
        assertTrue(edited.contains("criteria: trace-water          # acceptance profile"));
    }

    @Test
    void aRevisionCanBeSetToAGivenNumberWithItsReason() {
        String edited = NotebookEdits.withRevision(TEXT, FILE, 3, "Issued from the page");
        FrontMatter fm = StudyParser.parse(edited, FILE).frontMatter();
        assertEquals(3, fm.revision());
        assertEquals("Issued from the page", fm.revisionReason());
        assertEquals("A revision is a whole number from 1 on, not 0.", assertThrows(NotebookEdits.EditRefused.class,
                () -> NotebookEdits.withRevision(TEXT, FILE, 0, "r")).getMessage());
    }

    @Test
    void unsafeEditsAreRefusedWithAReason() {
        String id = StudyParser.parse(TEXT, FILE).cells().get(0).id();
        assertEquals("Calibration!C9 is already excluded in cell '" + id + "'.", assertThrows(
                NotebookEdits.EditRefused.class,
                () -> NotebookEdits.exclude(TEXT, FILE, id, "Calibration!C9", "again", null, null)).getMessage());
        assertEquals("The reason must be one non-blank line.", assertThrows(NotebookEdits.EditRefused.class,
                () -> NotebookEdits.exclude(TEXT, FILE, id, "Calibration!C10", "two\nlines", null, null)).getMessage());
        assertEquals("A reason is required.", assertThrows(NotebookEdits.EditRefused.class,
                () -> NotebookEdits.nextRevision(TEXT, FILE, null)).getMessage());
        assertEquals("The notebook has no cell 'nope'.", assertThrows(NotebookEdits.EditRefused.class,
                () -> NotebookEdits.restore(TEXT, FILE, "nope", "Calibration!C9")).getMessage());
        assertEquals("Calibration!C10 is not excluded in cell '" + id + "'.", assertThrows(
                NotebookEdits.EditRefused.class,
                () -> NotebookEdits.restore(TEXT, FILE, id, "Calibration!C10")).getMessage());
    }

    @Test
    void aMalformedDateInAnEntryIsALocatedError() {
        String bad = TEXT.replace("    reason: Bubble on membrane", "    reason: Bubble on membrane\n    on: 1 March");
        var e = assertThrows(org.meritbook.error.InputException.class, () -> StudyParser.parse(bad, FILE));
        assertTrue(e.getMessage().contains("a date as YYYY-MM-DD for 'on:'"), e.getMessage());
    }
}
