package org.meritbook.workbook;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class RangeTextTest {
    @Test
    void cells() throws RangeText.Refused {
        assertEquals(new RangeText.Cells(new Area(3, 0, 24, 2)), RangeText.parse("A4:C25"));
        assertEquals(new RangeText.Cells(new Area(3, 0, 24, 2)), RangeText.parse("$a$4:$C$25"));
        assertEquals(new RangeText.Cells(new Area(0, 26, 0, 27)), RangeText.parse("AA1:AB1"));
    }

    @Test
    void wholeColumns() throws RangeText.Refused {
        assertEquals(new RangeText.Columns(1, 2), RangeText.parse("B:C"));
    }

    @ParameterizedTest
    @ValueSource(strings = {"A4:C", "A4", "C4:A1", "A4:C1", "A0:C5", "C:B", "A1:XFE2", "A1:B1048577", "4:25", "Calib"})
    void refused(String text) {
        assertThrows(RangeText.Refused.class, () -> RangeText.parse(text));
    }

    @Test
    void refusalSaysWhy() {
        RangeText.Refused e = assertThrows(RangeText.Refused.class, () -> RangeText.parse("C4:A1"));
        assertEquals("'C4:A1', which does not run from its top-left to its bottom-right cell", e.getMessage());
    }
}
