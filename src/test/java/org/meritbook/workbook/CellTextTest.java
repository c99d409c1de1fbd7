package org.meritbook.workbook;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

class CellTextTest {
    private static final CellRef AT = new CellRef("Blanks", 6, 2);

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {"<0.05|0.05", "< 0.05|0.05", ">200|200", "<= 1e-3|0.001", "≤0.1|0.1"})
    void censoredWithLimit(String text, double limit) {
        CellValue v = CellText.classify(AT, text, null);
        assertEquals(CellValue.Kind.CENSORED, v.kind());
        assertEquals(limit, v.number(), 0.0);
        assertEquals(text, v.raw());
    }

    @ParameterizedTest
    @ValueSource(strings = {"n.d.", "ND", "nd", "BLQ", "<LOQ", "< LOQ", "not detected", "Not  Detected", "BDL"})
    void censoredWithoutLimit(String text) {
        CellValue v = CellText.classify(AT, text, null);
        assertEquals(CellValue.Kind.CENSORED, v.kind());
        assertTrue(Double.isNaN(v.number()));
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {"0.512|0.512", " 12 |12", "-3.5e2|-350", ".5|0.5"})
    void numberStoredAsText(String text, double expected) {
        CellValue v = CellText.classify(AT, text, null);
        assertEquals(CellValue.Kind.NUMBER, v.kind());
        assertEquals(expected, v.number(), 0.0);
        assertEquals("number stored as text", v.note());
    }

    /** A decimal comma or thousands separator is ambiguous ("1,234"): never guessed. */
    @ParameterizedTest
    @ValueSource(strings = {"0,512", "1,234", "1 234", "12%", "1e999", "<0,05", "Std 1"})
    void ambiguousTextStaysText(String text) {
        CellValue v = CellText.classify(AT, text, null);
        assertEquals(CellValue.Kind.TEXT, v.kind());
        assertEquals(text.strip(), v.raw());
    }

    @ParameterizedTest
    @ValueSource(strings = {"", "   "})
    void whitespaceIsBlank(String text) {
        assertEquals(CellValue.Kind.BLANK, CellText.classify(AT, text, null).kind());
    }

    @ParameterizedTest
    @ValueSource(strings = {"0.512", "7"})
    void csvNumbersCarryNoNote(String text) {
        CellValue v = CellText.classifyCsv(AT, text);
        assertEquals(CellValue.Kind.NUMBER, v.kind());
        assertNull(v.note());
    }
}
