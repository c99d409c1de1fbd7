package org.meritbook.workbook;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.meritbook.workbook.Fixtures.row;

import java.nio.file.Path;
import java.util.List;
import org.apache.poi.hssf.usermodel.HSSFWorkbook;
import org.apache.poi.ss.usermodel.CellStyle;
import org.apache.poi.ss.usermodel.CreationHelper;
import org.apache.poi.ss.usermodel.FormulaEvaluator;
import org.apache.poi.ss.usermodel.Name;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.ss.util.AreaReference;
import org.apache.poi.ss.util.CellRangeAddress;
import org.apache.poi.ss.util.CellReference;
import org.apache.poi.xssf.usermodel.XSSFSheet;
import org.apache.poi.xssf.usermodel.XSSFTable;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.study.DataReference;
import org.meritbook.study.ReadingOptions;

class WorkbookReaderTest {
    @TempDir
    Path dir;

    private DataBlock read(Path file, DataReference ref) {
        try (WorkbookReader reader = new WorkbookReader()) {
            return reader.read(file, ref);
        }
    }

    private static Column col(DataBlock b, String header) {
        return b.column(header).orElseThrow(() -> new AssertionError("no column " + header + " in " + b.headers()));
    }

    private static boolean decided(DataBlock b, String fragment) {
        return b.decisions().stream().anyMatch(d -> d.contains(fragment));
    }

    @Test
    void rangeFirstRowIsHeaderAndEveryValueKeepsItsCell() {
        Path f = Fixtures.xlsx(dir, "lab.xlsx", Fixtures::calibration);
        DataBlock b = read(f, Fixtures.ref("Calibration", "A4:D8"));
        assertEquals("Calibration", b.sheet());
        assertEquals("A4:D8", b.range());
        assertEquals(List.of("Level", "Nominal (mg/L)", "Peak area [mAU·s]", "Remark"), b.headers());
        assertEquals(4, b.rowCount());
        Column area = col(b, "Peak area");
        assertEquals("C", area.letter());
        assertEquals("mAU·s", area.unit());
        assertEquals("Calibration!C6", area.values().get(1).ref().address());
        assertEquals(2405.5, area.values().get(1).number(), 0.0);
        assertEquals("mg/L", col(b, "Nominal").unit());
    }

    @Test
    void aRowOfUnitsUnderTheHeadersGivesTheUnitsAndTheDataStartBelowIt() {
        // A layout a new user built: names in row 1, units in row 2 ("Conc." over "[µg/mL]", "Area" over "mAU·s").
        Path f = Fixtures.xlsx(dir, "own.xlsx", wb -> {
            Sheet s = wb.createSheet("Std");
            row(s, 1, "Conc.", "Area", "Comment");
            row(s, 2, "[µg/mL]", "mAU·s", null);
            row(s, 3, 0.5, 101.2, "fresh");
            row(s, 4, 1.0, 203.9, null);
            row(s, 5, 2.0, 405.1, null);
        });
        for (DataReference ref : List.of(Fixtures.ref("Std", "A1:C5"), Fixtures.ref("Std", "A:C"))) {
            DataBlock b = read(f, ref);
            assertEquals(3, b.rowCount(), ref.text());
            assertEquals("µg/mL", col(b, "Conc.").unit());
            assertEquals("mAU·s", col(b, "Area").unit());
            assertEquals("Std!B3", col(b, "Area").values().get(0).ref().address());
            assertEquals(101.2, col(b, "Area").values().get(0).number(), 0.0);
            assertTrue(b.decisions().contains("row 2 read as a row of units under the headers of row 1"), b.decisions().toString());
        }
        // A first data row of text only (no number below it either) is data, not units.
        Path g = Fixtures.xlsx(dir, "text.xlsx", wb -> {
            Sheet s = wb.createSheet("Ids");
            row(s, 1, "Sample", "Lot");
            row(s, 2, "S1", "L7");
            row(s, 3, "S2", "L8");
        });
        assertEquals(2, read(g, Fixtures.ref("Ids", "A1:B3")).rowCount());
    }

    @Test
    void notesColumnIsPlainTextWithBlanks() {
        Path f = Fixtures.xlsx(dir, "lab.xlsx", Fixtures::calibration);
        Column remark = col(read(f, Fixtures.ref("Calibration", "A4:D8")), "Remark");
        assertEquals(List.of(CellValue.Kind.BLANK, CellValue.Kind.TEXT, CellValue.Kind.BLANK, CellValue.Kind.BLANK),
                remark.values().stream().map(CellValue::kind).toList());
        assertEquals("re-injected", remark.values().get(1).raw());
        assertNull(remark.unit());
    }

    @Test
    void formulaUsesCachedResultAndSaysSo() {
        Path f = Fixtures.xlsx(dir, "lab.xlsx", wb -> {
            Sheet s = wb.createSheet("Calc");
            row(s, 1, "x", "y");
            row(s, 2, 1.0, new Fixtures.Formula("A2*2"));
            row(s, 3, 2.0, new Fixtures.Formula("A3*2"));
            wb.getCreationHelper().createFormulaEvaluator().evaluateAll();
        });
        DataBlock b = read(f, Fixtures.ref("Calc", "A1:B3"));
        CellValue y = col(b, "y").values().get(1);
        assertEquals(CellValue.Kind.NUMBER, y.kind());
        assertEquals(4.0, y.number(), 0.0);
        assertEquals("cached result of formula =A3*2", y.note());
        assertTrue(decided(b, "column B 'y': cached formula results used in B2, B3"), b.decisions().toString());
    }

    @Test
    void formulaWithoutCachedResultIsRefusedUnlessEvaluated() {
        Path f = Fixtures.xlsx(dir, "lab.xlsx", wb -> {
            Sheet s = wb.createSheet("Calc");
            row(s, 1, "x", "y");
            row(s, 2, 1.0, new Fixtures.Formula("A2*2")); // POI, like openpyxl, stores no result
        });
        InputException e = assertThrows(InputException.class, () -> read(f, Fixtures.ref("Calc", "A1:B2")));
        assertEquals(ErrorKey.FORMULA_WITHOUT_RESULT, e.key());
        assertTrue(e.problems().get(0).found().contains("Calc!B2 (=A2*2)"), e.getMessage());
        DataBlock b = read(f, Fixtures.ref("Calc", "A1:B2").withReading(ReadingOptions.DEFAULT.withFormulas(ReadingOptions.Formulas.EVALUATE)));
        CellValue y = col(b, "y").values().get(0);
        assertEquals(2.0, y.number(), 0.0);
        assertTrue(decided(b, "Calc!B2: formula =A2*2 had no stored result; evaluated by meritbook to '2' (formulas: evaluate)"),
                b.decisions().toString());
    }

    @Test
    void errorCellsAndErrorResultsAreText() {
        Path f = Fixtures.xlsx(dir, "lab.xlsx", wb -> {
            Sheet s = wb.createSheet("Calc");
            row(s, 1, "x", "ratio");
            row(s, 2, 0.0, new Fixtures.Formula("1/A2"));
            wb.getCreationHelper().createFormulaEvaluator().evaluateAll();
        });
        CellValue v = col(read(f, Fixtures.ref("Calc", "A1:B2")), "ratio").values().get(0);
        assertEquals(CellValue.Kind.TEXT, v.kind());
        assertEquals("#DIV/0!", v.raw());
        assertEquals("cached result of formula =1/A2; error value", v.note());
    }

    @Test
    void datesAreIsoTextAndBooleansText() {
        Path f = Fixtures.xlsx(dir, "lab.xlsx", wb -> {
            Sheet s = wb.createSheet("Runs");
            CreationHelper h = wb.getCreationHelper();
            CellStyle date = wb.createCellStyle();
            date.setDataFormat(h.createDataFormat().getFormat("dd.mm.yyyy"));
            row(s, 1, "Run date", "Passed");
            row(s, 2, 45356.0, true).getCell(0).setCellStyle(date);
        });
        DataBlock b = read(f, Fixtures.ref("Runs", "A1:B2"));
        CellValue d = col(b, "Run date").values().get(0);
        assertEquals(CellValue.Kind.TEXT, d.kind());
        assertEquals("2024-03-05", d.raw());
        CellValue passed = col(b, "Passed").values().get(0);
        assertEquals(CellValue.Kind.TEXT, passed.kind());
        assertEquals("TRUE", passed.raw());
        assertTrue(decided(b, "dates read as ISO text in A2"), b.decisions().toString());
    }

    @Test
    void numbersStoredAsTextAreNumbersButDecimalCommaIsNot() {
        Path f = Fixtures.xlsx(dir, "lab.xlsx", wb -> {
            Sheet s = wb.createSheet("Precision");
            row(s, 1, "Replicate", "Result");
            row(s, 2, 1.0, "0.512");
            row(s, 3, 2.0, "0,512");
        });
        DataBlock b = read(f, Fixtures.ref("Precision", "A1:B3"));
        List<CellValue> r = col(b, "Result").values();
        assertEquals(CellValue.Kind.NUMBER, r.get(0).kind());
        assertEquals(0.512, r.get(0).number(), 0.0);
        assertEquals("number stored as text", r.get(0).note());
        assertEquals(CellValue.Kind.TEXT, r.get(1).kind());
        assertTrue(decided(b, "numbers stored as text, read as numbers in B2"), b.decisions().toString());
    }

    @Test
    void censoredValuesKeepTheirLimit() {
        Path f = Fixtures.xlsx(dir, "lab.xlsx", wb -> {
            Sheet s = wb.createSheet("Blanks");
            row(s, 1, "Blank", "Result");
            row(s, 2, "B1", "<0.05");
            row(s, 3, "B2", "n.d.");
            row(s, 4, "B3", 0.01);
        });
        List<CellValue> r = col(read(f, Fixtures.ref("Blanks", "A1:B4")), "Result").values();
        assertEquals(CellValue.Kind.CENSORED, r.get(0).kind());
        assertEquals(0.05, r.get(0).number(), 0.0);
        assertEquals(CellValue.Kind.CENSORED, r.get(1).kind());
        assertTrue(Double.isNaN(r.get(1).number()));
        assertEquals(CellValue.Kind.NUMBER, r.get(2).kind());
    }

    @Test
    void blankRowsInsideAreSkippedAndRecorded() {
        Path f = Fixtures.xlsx(dir, "lab.xlsx", wb -> {
            Sheet s = wb.createSheet("Calibration");
            row(s, 1, "x", "y");
            row(s, 2, 1.0, 10.0);
            row(s, 4, 2.0, 20.0);
            row(s, 5, 3.0, 30.0);
        });
        DataBlock b = read(f, Fixtures.ref("Calibration", "A1:B9"));
        assertEquals(3, b.rowCount());
        assertEquals("Calibration!A4", col(b, "x").values().get(1).ref().address());
        assertTrue(b.decisions().contains("skipped blank row 3"), b.decisions().toString());
        assertTrue(b.decisions().contains("rows 6 to 9 at the end of the range are blank; the data end at row 5"),
                b.decisions().toString());
    }

    @Test
    void mergedHeaderCellTakesTheRegionText() {
        Path f = Fixtures.xlsx(dir, "lab.xlsx", wb -> {
            Sheet s = wb.createSheet("Precision");
            row(s, 1, "Day", "Result (mg/L)");
            row(s, 2, null, null);
            row(s, 3, "D1", 0.51);
            s.addMergedRegion(new CellRangeAddress(0, 1, 1, 1)); // B1:B2
        });
        DataBlock b = read(f, Fixtures.ref("Precision", "A2:B3"));
        assertEquals("Result (mg/L)", col(b, "B").header());
        assertEquals("mg/L", col(b, "Result").unit());
        assertTrue(decided(b, "header B2 taken from merged cells B1:B2"), b.decisions().toString());
    }

    @Test
    void mergedDataCellsAreReadWithTheRegionValue() {
        Path f = Fixtures.xlsx(dir, "lab.xlsx", wb -> {
            Sheet s = wb.createSheet("Precision");
            row(s, 1, "Day", "Result");
            row(s, 2, "Day 1", 0.51);
            row(s, 3, null, 0.52);
            row(s, 4, "Day 2", 0.50);
            s.addMergedRegion(new CellRangeAddress(1, 2, 0, 0)); // A2:A3
        });
        DataBlock b = read(f, Fixtures.ref("Precision", "A1:B4"));
        CellValue a3 = col(b, "Day").values().get(1);
        assertEquals("Day 1", a3.raw());
        assertEquals("Precision!A3", a3.ref().address());
        assertEquals("value of merged cells A2:A3", a3.note());
        assertTrue(b.decisions().contains("cells in merged region A2:A3 read with its value 'Day 1'"), b.decisions().toString());
    }

    @Test
    void autoDetectSkipsTitleAndMetadataRows() {
        Path f = Fixtures.xlsx(dir, "lab.xlsx", wb -> {
            Sheet s = wb.createSheet("Calibration");
            row(s, 1, "Nitrite calibration, IC-07");
            row(s, 2, "Column temp", 30.0, "Flow", 1.0); // numbers, but no header above: metadata
            row(s, 4, "Level", "Nominal (mg/L)", "Area (mAU·s)");
            row(s, 5, "Blank", "n.d.", "n.d.");
            row(s, 6, "L1", 0.05, 1210.0);
            row(s, 7, "L2", 0.10, 2405.0);
            row(s, 9, "L3", 0.50, 12010.0);
            row(s, 11, "Reviewed by B. Reviewer");
        });
        DataBlock b = read(f, Fixtures.ref("Calibration", null));
        assertEquals("A4:C9", b.range());
        assertEquals(List.of("Level", "Nominal (mg/L)", "Area (mAU·s)"), b.headers());
        assertEquals(4, b.rowCount());
        assertEquals("Calibration!C5", col(b, "Area").values().get(0).ref().address());
        assertTrue(b.decisions().contains("block A4:C9 detected on sheet 'Calibration': header row 4 is the nearest row "
                + "of text cells above row 6, the first row with two or more numbers under a header; rows 1 to 3 above it not read"),
                b.decisions().toString());
        assertTrue(decided(b, "rows 2 hold numbers but no header row"), b.decisions().toString());
        assertTrue(b.decisions().contains("skipped blank row 8"), b.decisions().toString());
        assertTrue(decided(b, "block ends at row 9"), b.decisions().toString());
    }

    @Test
    void autoDetectCombinesMergedUpperHeader() {
        Path f = Fixtures.xlsx(dir, "lab.xlsx", wb -> {
            Sheet s = wb.createSheet("Repeatability");
            row(s, 1, "Repeatability, 6 injections");
            row(s, 3, "Sample", "Area (mAU·s)", null);
            row(s, 4, null, "Inj 1", "Inj 2");
            row(s, 5, "S1", 101.0, 102.0);
            row(s, 6, "S2", 99.0, 100.5);
            s.addMergedRegion(new CellRangeAddress(2, 3, 0, 0)); // A3:A4
            s.addMergedRegion(new CellRangeAddress(2, 2, 1, 2)); // B3:C3
        });
        DataBlock b = read(f, Fixtures.ref("Repeatability", null));
        assertEquals("A3:C6", b.range());
        assertEquals(List.of("Sample", "Area (mAU·s) Inj 1", "Area (mAU·s) Inj 2"), b.headers());
        Column inj2 = col(b, "Area Inj 2");
        assertEquals("mAU·s", inj2.unit());
        assertEquals(100.5, inj2.values().get(1).number(), 0.0);
        assertTrue(b.decisions().contains("header rows 3 and 4 combined as 'upper lower'"), b.decisions().toString());
    }

    @Test
    void autoDetectCombinesAUnitRow() {
        Path f = Fixtures.xlsx(dir, "lab.xlsx", wb -> {
            Sheet s = wb.createSheet("Accuracy");
            row(s, 1, "Known", "Measured");
            row(s, 2, "(mg/L)", "[mg/L]");
            row(s, 3, 0.5, 0.49);
        });
        DataBlock b = read(f, Fixtures.ref("Accuracy", null));
        assertEquals(List.of("Known (mg/L)", "Measured [mg/L]"), b.headers());
        assertEquals("mg/L", col(b, "Measured").unit());
    }

    @Test
    void autoDetectFindsNothingOnATextSheet() {
        Path f = Fixtures.xlsx(dir, "lab.xlsx", wb -> row(wb.createSheet("Notes"), 1, "Only", "words", "here"));
        var e = org.junit.jupiter.api.Assertions.assertThrows(org.meritbook.error.InputException.class,
                () -> read(f, Fixtures.ref("Notes", null)));
        assertEquals(org.meritbook.error.ErrorKey.EMPTY_RANGE, e.key());
        assertEquals("lab.xlsx, data reference 'runs!Notes' (notebook line 14): expected a table on sheet 'Notes': "
                + "a header row of two or more text cells above rows with two or more numbers but found no row with "
                + "two or more numbers. Give the range in the data reference, with the header in its first row, e.g. "
                + "Notes!A4:C25.", e.getMessage());
    }

    @Test
    void wholeColumnsRunFromFirstToLastNonEmptyRow() {
        Path f = Fixtures.xlsx(dir, "lab.xlsx", wb -> {
            Sheet s = wb.createSheet("Calibration");
            row(s, 1, "ignored title in A");
            row(s, 3, null, "Conc [ng/mL]", "Area");
            row(s, 4, null, 1.0, 100.0);
            row(s, 6, null, 2.0, 200.0);
            row(s, 7, "footnote in A, outside B:C");
        });
        DataBlock b = read(f, Fixtures.ref("Calibration", "B:C"));
        assertEquals("B3:C6", b.range());
        assertEquals(2, b.rowCount());
        assertEquals("ng/mL", col(b, "Conc").unit());
        assertEquals("Calibration!B6", col(b, "Conc").values().get(1).ref().address());
        assertTrue(b.decisions().contains("columns B:C read from row 3 (the first non-empty row, read as the header) "
                + "to row 6 (the last non-empty row)"), b.decisions().toString());
        assertTrue(b.decisions().contains("skipped blank row 5"), b.decisions().toString());
    }

    @Test
    void definedNameBeforeTableBeforeSheet() {
        Path f = Fixtures.xlsx(dir, "lab.xlsx", wb -> {
            Fixtures.calibration(wb);
            Name n = wb.createName();
            n.setNameName("CalPoints");
            n.setRefersToFormula("Calibration!$B$4:$C$8");
        });
        DataBlock b = read(f, Fixtures.ref("calpoints", null));
        assertEquals("B4:C8", b.range());
        assertEquals(List.of("Nominal (mg/L)", "Peak area [mAU·s]"), b.headers());
        assertTrue(b.decisions().contains("read defined name 'CalPoints' (Calibration!$B$4:$C$8)"), b.decisions().toString());
    }

    @Test
    void sheetNameWithSpacesAndQuotedNameFormula() {
        Path f = Fixtures.xlsx(dir, "lab.xlsx", wb -> {
            Sheet s = wb.createSheet("Day 2 runs");
            row(s, 1, "Run", "Result");
            row(s, 2, 1.0, 0.521);
            Name n = wb.createName();
            n.setNameName("SecondDay");
            n.setRefersToFormula("'Day 2 runs'!$A$1:$B$2");
        });
        DataBlock byRange = read(f, Fixtures.ref("Day 2 runs", "A1:B2"));
        DataBlock byName = read(f, Fixtures.ref("SecondDay", null));
        assertEquals("Day 2 runs!B2", col(byRange, "Result").values().get(0).ref().address());
        assertEquals(col(byRange, "Result").values(), col(byName, "Result").values());
    }

    @Test
    void nameThatIsAlsoASheetIsReadAsTheNameAndSaysSo() {
        Path f = Fixtures.xlsx(dir, "lab.xlsx", wb -> {
            Fixtures.calibration(wb);
            Name n = wb.createName();
            n.setNameName("Calibration");
            n.setRefersToFormula("Calibration!$B$4:$C$8");
        });
        DataBlock b = read(f, Fixtures.ref("Calibration", null));
        assertEquals("B4:C8", b.range());
        assertTrue(b.decisions().contains("'Calibration' names a defined name and also a sheet; the defined name was "
                + "read (order: defined name, table, sheet)"), b.decisions().toString());
    }

    @Test
    void excelTableGivesHeaderAndDataArea() {
        Path f = Fixtures.xlsx(dir, "lab.xlsx", wb -> {
            XSSFSheet s = (XSSFSheet) wb.createSheet("Recovery");
            row(s, 1, "Spike recovery");
            row(s, 3, "Level", "Known", "Measured");
            row(s, 4, "low", 0.1, 0.098);
            row(s, 5, "high", 1.0, 1.02);
            XSSFTable t = s.createTable(new AreaReference(new CellReference(2, 0), new CellReference(4, 2),
                    wb.getSpreadsheetVersion()));
            t.setName("RecoveryData");
            t.setDisplayName("RecoveryData");
        });
        DataBlock b = read(f, Fixtures.ref("RecoveryData", null));
        assertEquals("Recovery", b.sheet());
        assertEquals("A3:C5", b.range());
        assertEquals(List.of("Level", "Known", "Measured"), b.headers());
        assertEquals(1.02, col(b, "Measured").values().get(1).number(), 0.0);
        assertTrue(b.decisions().contains("read Excel table 'RecoveryData' (Recovery!A3:C5)"), b.decisions().toString());
    }

    @Test
    void legacyXlsIsRead() {
        Path f = Fixtures.write(new HSSFWorkbook(), dir.resolve("old.xls"), wb -> {
            Sheet s = wb.createSheet("Calibration");
            row(s, 1, "x", "y (mV)");
            row(s, 2, 1.0, "12.5");
            row(s, 3, 2.0, new Fixtures.Formula("B2*2"));
            wb.getCreationHelper().createFormulaEvaluator().evaluateAll();
        });
        DataBlock b = read(f, Fixtures.ref("Calibration", "A1:B3"));
        List<CellValue> y = col(b, "y").values();
        assertEquals("mV", col(b, "y").unit());
        assertEquals(12.5, y.get(0).number(), 0.0);
        assertEquals(25.0, y.get(1).number(), 0.0);
        assertEquals("cached result of formula =B2*2", y.get(1).note());
    }

    @Test
    void csvWithCommas() throws Exception {
        Path f = dir.resolve("calib-run1.csv");
        java.nio.file.Files.writeString(f, "Conc (mg/L),Area,Note\n0.05,1210,\n0.10,2405,\"re-injected, ok\"\n\n0.50,n.d.,\n");
        DataBlock b = read(f, Fixtures.ref("calib-run1", "A1:C5"));
        assertEquals("calib-run1", b.sheet());
        assertEquals(3, b.rowCount());
        assertEquals("calib-run1!B5", col(b, "Area").values().get(2).ref().address());
        assertEquals(CellValue.Kind.CENSORED, col(b, "Area").values().get(2).kind());
        assertEquals("re-injected, ok", col(b, "Note").values().get(1).raw());
        assertTrue(b.decisions().contains("CSV delimiter: comma, detected from line 1 (0 tabs, 0 semicolons, 2 commas)"),
                b.decisions().toString());
        assertTrue(b.decisions().contains("skipped blank row 4"), b.decisions().toString());
    }

    @Test
    void csvWithSemicolonsKeepsDecimalCommaAsText() throws Exception {
        Path f = dir.resolve("blanks.csv");
        java.nio.file.Files.writeString(f, "Blank run;Signal\n1;0.012\n2;0,015\n");
        DataBlock b = read(f, Fixtures.ref("blanks", null));
        List<CellValue> s = col(b, "Signal").values();
        assertEquals(CellValue.Kind.NUMBER, s.get(0).kind());
        assertEquals(CellValue.Kind.TEXT, s.get(1).kind());
        assertEquals("0,015", s.get(1).raw());
        assertTrue(decided(b, "CSV delimiter: semicolon"), b.decisions().toString());
    }

    @Test
    void csvWithTabs() throws Exception {
        Path f = dir.resolve("runs.csv");
        java.nio.file.Files.writeString(f, "x\ty\n1\t2\n3\t4\n");
        DataBlock b = read(f, Fixtures.ref("runs", "A1:B3"));
        assertArrayEquals(new double[] {2, 4}, NumericColumn.values(f, col(b, "y")), 0.0);
    }

    @Test
    void eachFileIsOpenedOncePerReader() throws Exception {
        Path f = Fixtures.xlsx(dir, "lab.xlsx", Fixtures::calibration);
        try (WorkbookReader reader = new WorkbookReader()) {
            DataBlock first = reader.read(f, Fixtures.ref("Calibration", "A4:D8"));
            java.nio.file.Files.delete(f); // a second read must come from the open copy
            DataBlock second = reader.read(f, Fixtures.ref("Calibration", "B4:C8"));
            assertEquals(first.column("C").orElseThrow().values(), second.column("C").orElseThrow().values());
        }
    }

    @Test
    void lambdaIsStillABlockReader() {
        DataBlock empty = new DataBlock(dir, "S", "A1:A1", List.of(), List.of());
        try (BlockReader r = (file, ref) -> empty) {
            assertSame(empty, r.read(dir, Fixtures.ref("S", null)));
        }
    }

    /** Evaluator use in fixtures must not be confused with reading: the reader never evaluates. */
    @Test
    void readerShowsWhatExcelCachedNotARecomputation() {
        Path f = Fixtures.xlsx(dir, "lab.xlsx", wb -> {
            Sheet s = wb.createSheet("Calc");
            row(s, 1, "x", "y");
            row(s, 2, 1.0, new Fixtures.Formula("A2*2"));
            FormulaEvaluator ev = wb.getCreationHelper().createFormulaEvaluator();
            ev.evaluateAll();
            s.getRow(1).getCell(0).setCellValue(5.0); // input changed after the last calculation
        });
        assertEquals(2.0, col(read(f, Fixtures.ref("Calc", "A1:B2")), "y").values().get(0).number(), 0.0);
    }
}
