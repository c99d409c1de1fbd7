package org.meritbook.workbook;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.apache.poi.ss.util.CellReference;
import org.junit.jupiter.api.Test;

/** Column letters and addresses, against POI's {@code CellReference} (the reference library). */
class CellRefTest {
    @Test
    void columnLettersAgreeWithPoiAcrossTheSheet() {
        for (int col = 0; col < 16_384; col++) { // A to XFD, the widest sheet a workbook holds
            assertEquals(CellReference.convertNumToColString(col), CellRef.columnLetters(col), "column " + col);
        }
        assertEquals("ZZ", CellRef.columnLetters(701));
        assertEquals("AAA", CellRef.columnLetters(702));
    }

    @Test
    void addressNamesSheetColumnAndRow() {
        assertEquals("Checks!AB17", new CellRef("Checks", 16, 27).address());
        assertEquals("XFD1048576", new CellRef("S", 1_048_575, 16_383).a1());
    }
}
