package org.meritbook.serve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/** A problem's notebook line is quoted and placed in its cell from the text alone. */
class NotebookLinesTest {
    private static final List<String> NOTEBOOK = List.of(
            "---", "title: T", "---", "", "Text with ``` inline.", "",
            "```calibration", "id: cal", "x: Nominal", "smoothing: yes", "```", "",
            "Between cells.", "", "~~~~precision", "data: lab!P", "id: 'rep'", "~~~~");

    @Test
    void aLineInsideACellNamesTheCellWhereverItsIdStands() {
        NotebookLines.Place p = NotebookLines.of("s.md line 10", "s.md", NOTEBOOK).orElseThrow();
        assertEquals(10, p.line());
        assertEquals("smoothing: yes", p.text());
        assertEquals("cal", p.cell());
        assertEquals("rep", NotebookLines.of("s.md line 16", "s.md", NOTEBOOK).orElseThrow().cell(), "id below the line");
    }

    @Test
    void aLineOutsideAnyCellOrAnotherFileIsNotPlacedInACell() {
        assertEquals(null, NotebookLines.of("s.md line 13", "s.md", NOTEBOOK).orElseThrow().cell());
        assertTrue(NotebookLines.of("lab.xlsx, Cal!B4", "s.md", NOTEBOOK).isEmpty());
        assertTrue(NotebookLines.of("s.md line 99", "s.md", NOTEBOOK).isEmpty(), "beyond the end");
        assertTrue(NotebookLines.of("other.md line 2", "s.md", NOTEBOOK).isEmpty());
    }
}
