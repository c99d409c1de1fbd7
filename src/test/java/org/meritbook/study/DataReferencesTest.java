package org.meritbook.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;

/** The forms of a data reference (DESIGN §3), and the plainly malformed ones. */
class DataReferencesTest {

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', quoteCharacter = '"', nullValues = "-", value = {
            "runs!Calibration!A4:C25   | runs | Calibration | A4:C25",
            "runs!Calibration!b:c      | runs | Calibration | B:C",
            "runs!Cal!$A$4:$C$25       | runs | Cal         | A4:C25",
            "runs!StandardsTable       | runs | StandardsTable | -",
            "runs!'Day 1'!A1:C9        | runs | Day 1       | A1:C9",
            "runs!'Day 1'              | runs | Day 1       | -",
            "runs!'Analyst''s run'!A:A | runs | Analyst's run | A:A",
            "runs!'Odd!Name'!A1:XFD1048576 | runs | Odd!Name | A1:XFD1048576",
            "run-2.b!Sheet1!A1:B2      | run-2.b | Sheet1  | A1:B2",
    })
    void acceptedForms(String text, String source, String target, String range) {
        DataReference ref = DataReferences.parse(new OptionValue(text, 7));
        assertEquals(new DataReference(source, target, range, text, 7), ref);
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', quoteCharacter = '"', value = {
            "Calibration                | 'Calibration' (no '!' after the source alias)",
            "!Cal!A1:B2                 | '!Cal!A1:B2' (no source alias before '!')",
            "runs!                      | 'runs!' (no sheet or name after the source alias)",
            "runs!A1:C9                 | 'runs!A1:C9' (a range with no sheet)",
            "runs!Cal!                  | 'runs!Cal!' (nothing after the last '!')",
            "runs!Cal!A1-B9             | 'runs!Cal!A1-B9' ('A1-B9' as the range)",
            "runs!Cal!A0:B9             | 'runs!Cal!A0:B9' ('A0:B9' as the range)",
            "runs!Cal!A1:XFE9           | 'runs!Cal!A1:XFE9' ('A1:XFE9' as the range)",
            "runs!Cal!Sub!A1:B2         | 'runs!Cal!Sub!A1:B2' (more than one sheet)",
            "runs!'Day 1!A1:C9          | 'runs!'Day 1!A1:C9' (a sheet name with no closing quote)",
            "runs!'Day 1'A1:C9          | 'runs!'Day 1'A1:C9' (text after the quoted sheet name)",
    })
    void malformedReferencesSayWhatWasWrong(String text, String found) {
        InputException e = assertThrows(InputException.class, () -> DataReferences.parse(new OptionValue(text, 12)));
        assertEquals(ErrorKey.BAD_DATA_REFERENCE, e.key());
        assertEquals("notebook line 12", e.problems().get(0).where());
        assertEquals(found, e.problems().get(0).found());
        assertTrue(e.problems().get(0).expected().contains("source!Sheet!A1:D40, source!Sheet!B:C"));
    }

    @Test
    void aListIsNotAReference() {
        OptionValue list = new OptionValue(List.of(new OptionValue("runs!A!A1:B2", 3)), 3);
        InputException e = assertThrows(InputException.class, () -> DataReferences.parse(list));
        assertEquals("a list", e.problems().get(0).found());
    }

    @Test
    void handBuiltCellsReadTheirReferencesToo() {
        AnalysisCell cell = new AnalysisCell("p", AnalysisKind.PRECISION, "p", 1,
                Map.of("data", new OptionValue("runs!Rep!A1:C9", 2)), List.of());
        assertEquals("Rep", cell.dataReference().orElseThrow().target());
        assertTrue(cell.dataReference("blanks").isEmpty());
    }
}
