package org.meritbook.workbook;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.function.UnaryOperator;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.error.Problem;
import org.meritbook.study.DataReference;
import org.meritbook.study.ReadingOptions;

/**
 * Sheet XML as other programs and hand edits write it: values POI would read leniently (an empty
 * value as 0, "NaN" as NaN, 1e309 as ∞), formulas without results, rows and cells written twice.
 * Each must be read faithfully or reported with its cell, never turned into a number.
 */
class SheetXmlTest {
    private static final String SHEET = "xl/worksheets/sheet1.xml";

    @TempDir
    Path dir;

    /** The fixture's calibration sheet (header row 4, data rows 5 to 8), its sheet XML edited. */
    private Path edited(UnaryOperator<String> edit) throws Exception {
        Path plain = Fixtures.xlsx(dir, "plain.xlsx", Fixtures::calibration);
        byte[] bytes = XlsxParts.of(Files.readAllBytes(plain)).edit(SHEET, edit).zip();
        return Files.write(dir.resolve("lab.xlsx"), bytes);
    }

    /** The sheet XML with the whole element of one cell replaced. */
    private static String cell(String xml, String address, String element) {
        String out = xml.replaceFirst("<c r=\"" + address + "\"[^>]*>.*?</c>", java.util.regex.Matcher.quoteReplacement(element));
        if (out.equals(xml)) {
            throw new AssertionError("no cell " + address + " in " + xml);
        }
        return out;
    }

    private static DataBlock read(Path file, DataReference ref) {
        try (WorkbookReader reader = new WorkbookReader()) {
            return reader.read(file, ref);
        }
    }

    private static InputException fails(Path file, DataReference ref) {
        return assertThrows(InputException.class, () -> read(file, ref));
    }

    private static DataReference calibration() {
        return Fixtures.ref("Calibration", "A4:D8");
    }

    /** The peak area of row {@code r} (C5..C8), through NumericColumn as an analysis reads it. */
    private static InputException numberFails(DataBlock b) {
        return assertThrows(InputException.class, () -> NumericColumn.values(b.file(), b.column("C").orElseThrow()));
    }

    @ParameterizedTest(name = "stored value ''{0}''")
    @CsvSource(delimiter = '|', value = {
        "NaN|the stored value 'NaN', which is not a finite number",
        "INF|the stored value 'INF', which is not a finite number",
        "-Infinity|the stored value '-Infinity', which is not a finite number",
        "1e309|the number 1e309, which is beyond the largest number a double holds (about 1.8e308)",
        "-2E400|the number -2E400, which is beyond the largest number a double holds (about 1.8e308)",
        "1e-400|the number 1e-400, which is below the smallest number a double holds (about 4.9e-324) and would read as 0",
        "0x1p3|the stored number '0x1p3', which is not a number",
    })
    void valuesNoDoubleHoldsAreReportedWithTheirCell(String stored, String found) throws Exception {
        Path f = edited(x -> x.replace("<v>12010.0</v>", "<v>" + stored + "</v>"));
        InputException e = numberFails(read(f, calibration()));
        assertEquals(1, e.problems().size());
        Problem p = e.problems().get(0);
        assertEquals(ErrorKey.NOT_A_NUMBER, p.key());
        assertEquals("lab.xlsx, Calibration!C7", p.where());
        assertEquals(found, p.found());
    }

    @Test
    void extremeButFiniteValuesAreReadExactly() throws Exception {
        Path f = edited(x -> x.replace("<v>12010.0</v>", "<v>1.7976931348623157E308</v>")
                .replace("<v>24100.0</v>", "<v>4.9E-324</v>").replace("<v>1210.0</v>", "<v>2.2250738585072014E-308</v>"));
        double[] v = NumericColumn.values(f, read(f, calibration()).column("C").orElseThrow());
        assertEquals(Double.MAX_VALUE, v[2], 0.0);
        assertEquals(Double.MIN_VALUE, v[3], 0.0); // the smallest subnormal
        assertEquals(Double.MIN_NORMAL, v[0], 0.0);
    }

    @Test
    void anEmptyStoredNumberIsNotZero() throws Exception {
        Path f = edited(x -> x.replace("<v>12010.0</v>", "<v></v>"));
        Problem p = numberFails(read(f, calibration())).problems().get(0);
        assertEquals("lab.xlsx, Calibration!C7", p.where());
        assertEquals("a number cell whose stored value is empty", p.found());
    }

    @Test
    void unknownErrorCodeIsReportedNotGuessed() throws Exception {
        Path f = edited(x -> cell(x, "C7", "<c r=\"C7\" t=\"e\"><v>#BOGUS!</v></c>"));
        Problem p = numberFails(read(f, calibration())).problems().get(0);
        assertEquals("lab.xlsx, Calibration!C7", p.where());
        assertEquals("the unknown error value '#BOGUS!'", p.found());
    }

    @Test
    void sharedStringPastTheTableIsAnUnreadableCell() throws Exception {
        Path f = edited(x -> cell(x, "C7", "<c r=\"C7\" t=\"s\"><v>9999</v></c>"));
        Problem p = numberFails(read(f, calibration())).problems().get(0);
        assertEquals("lab.xlsx, Calibration!C7", p.where());
        assertEquals("a reference '9999' to a shared string the workbook does not hold", p.found());
    }

    @Test
    void isoDateCellIsADateNotANumber() throws Exception {
        Path f = edited(x -> cell(x, "C7", "<c r=\"C7\" t=\"d\"><v>2026-11-09</v></c>"));
        CellValue c7 = read(f, calibration()).column("C").orElseThrow().values().get(2);
        assertEquals(CellValue.Kind.TEXT, c7.kind());
        assertEquals("2026-11-09", c7.raw());
        assertEquals("the date '2026-11-09'", numberFails(read(f, calibration())).problems().get(0).found());
    }

    /** As openpyxl writes every formula: an empty value element, or none at all. */
    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {"<v></v>", "<v/>", "''"})
    void formulaWithoutStoredResultIsNeverZero(String value) throws Exception {
        String v = value.equals("''") ? "" : value;
        Path f = edited(x -> cell(cell(x, "C7", "<c r=\"C7\"><f>C6*5</f>" + v + "</c>"),
                "C8", "<c r=\"C8\"><f>C7*2</f>" + v + "</c>"));
        InputException e = fails(f, calibration());
        assertEquals(ErrorKey.FORMULA_WITHOUT_RESULT, e.key());
        assertEquals(1, e.problems().size(), "one error naming every such cell of the block");
        assertEquals("lab.xlsx, data reference 'runs!Calibration!A4:D8' (notebook line 14): expected the results a "
                + "spreadsheet program stores with each formula when it saves the workbook but found 2 formulas saved without "
                + "their results: Calibration!C7 (=C6*5), Calibration!C8 (=C7*2). Open the workbook in a spreadsheet program, "
                + "let it calculate and save it (the file was written by a program that does not calculate); or add "
                + "'formulas: evaluate' to the notebook cell to have meritbook evaluate them, each recorded in the "
                + "calculation trail.", e.getMessage());
        DataBlock evaluated = read(f, calibration().withReading(ReadingOptions.DEFAULT.withFormulas(ReadingOptions.Formulas.EVALUATE)));
        double[] c = NumericColumn.values(f, evaluated.column("C").orElseThrow());
        assertEquals(2405.5 * 5, c[2], 0.0);
        assertEquals(2405.5 * 10, c[3], 0.0);
        assertTrue(evaluated.decisions().contains("Calibration!C8: formula =C7*2 had no stored result; evaluated by meritbook "
                + "to '24055' (formulas: evaluate)"), evaluated.decisions().toString());
    }

    @Test
    void aFormulaWithAStoredEmptyTextResultIsBlankText() throws Exception {
        Path f = edited(x -> x.replace("<c r=\"D7\"", "<c r=\"X7\"").replace("</row><row r=\"8\">",
                "<c r=\"D7\" t=\"str\"><f>IF(C7&gt;0,\"\",\"low\")</f><v></v></c></row><row r=\"8\">"));
        CellValue d7 = read(f, calibration()).column("D").orElseThrow().values().get(2);
        assertEquals(CellValue.Kind.BLANK, d7.kind());
    }

    @Test
    void cellWrittenTwiceIsLocated() throws Exception {
        Path f = edited(x -> cell(x, "C7",
                "<c r=\"C7\" t=\"n\"><v>12010.0</v></c><c r=\"C7\" t=\"n\"><v>99999.0</v></c>"));
        InputException e = fails(f, calibration());
        assertEquals(ErrorKey.MALFORMED_SHEET, e.key());
        assertEquals("lab.xlsx, Calibration!C7", e.problems().get(0).where());
        assertEquals("cell C7 written twice in the sheet's XML (a spreadsheet program writes each cell once)",
                e.problems().get(0).found());
    }

    @Test
    void rowWrittenTwiceIsLocated() throws Exception {
        Path f = edited(x -> x.replace("<row r=\"8\">", "<row r=\"7\"><c r=\"C7\" t=\"n\"><v>5.0</v></c></row><row r=\"8\">"));
        InputException e = fails(f, calibration());
        assertEquals(ErrorKey.MALFORMED_SHEET, e.key());
        assertEquals("lab.xlsx, Calibration row 7", e.problems().get(0).where());
    }

    @Test
    void cellInsideTheWrongRowIsLocated() throws Exception {
        Path f = edited(x -> x.replace("<c r=\"C7\"", "<c r=\"C5\""));
        InputException e = fails(f, calibration());
        assertEquals(ErrorKey.MALFORMED_SHEET, e.key());
        assertEquals("lab.xlsx, Calibration!C5", e.problems().get(0).where());
        assertEquals("a cell C5 written inside row 7, so its row is ambiguous", e.problems().get(0).found());
    }

    @Test
    void rowsAndCellsWithoutAddressesTakeTheNextPosition() throws Exception {
        Path f = edited(x -> x.replaceAll(" r=\"[A-D][5-8]\"", "").replace("<row r=\"6\">", "<row>"));
        List<CellValue> areas = read(f, calibration()).column("C").orElseThrow().values();
        assertEquals(List.of(1210.0, 2405.5, 12010.0, 24100.0), areas.stream().map(CellValue::number).toList());
        assertEquals("Calibration!C6", areas.get(1).ref().address());
    }

    @Test
    void csvFieldsNoDoubleHoldsAreReported() throws Exception {
        Path f = Files.writeString(dir.resolve("runs.csv"), "x,y\n1,1e309\n2,NaN\n3,1e-999\n4,5e-324\n");
        DataBlock b = read(f, new DataReference("runs", "runs", "A1:B5", "runs!runs!A1:B5", 3));
        InputException e = assertThrows(InputException.class, () -> NumericColumn.values(f, b.column("y").orElseThrow()));
        assertEquals(List.of("runs.csv, runs!B2", "runs.csv, runs!B3", "runs.csv, runs!B4"),
                e.problems().stream().map(Problem::where).toList());
        assertEquals(Double.MIN_VALUE, b.column("y").orElseThrow().values().get(3).number(), 0.0);
    }
}
