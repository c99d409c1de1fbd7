package org.meritbook.workbook;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.ss.util.CellRangeAddress;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.error.Problem;
import org.meritbook.study.DataReference;
import org.meritbook.study.ReadingOptions;
import org.meritbook.study.ReadingOptions.Formulas;
import org.meritbook.study.ReadingOptions.Hidden;
import org.meritbook.study.ReadingOptions.Merged;

/**
 * What the workbook leaves open is read only as the notebook says: hidden rows and columns
 * ({@code hidden:}), a number merged over several rows ({@code merged:}) and formulas without a
 * stored result ({@code formulas:}). Without the option each is a located error.
 */
class ReadingOptionsTest {
    private static final DataReference CAL = Fixtures.ref("Calibration", "A4:D8");
    private static final String IN_BLOCK = " (data reference 'runs!Calibration!A4:D8', notebook line 14)";

    @TempDir
    Path dir;

    private Path workbook(Fixtures.Filler extra) {
        return Fixtures.xlsx(dir, "lab.xlsx", wb -> {
            Fixtures.calibration(wb);
            extra.fill(wb);
        });
    }

    private static DataBlock read(Path f, ReadingOptions options) {
        try (WorkbookReader reader = new WorkbookReader()) {
            return reader.read(f, CAL.withReading(options));
        }
    }

    private static InputException fails(Path f, ReadingOptions options) {
        return assertThrows(InputException.class, () -> read(f, options));
    }

    @Test
    void hiddenRowIsAnErrorUnlessTheNotebookSaysHowToReadIt() {
        Path f = workbook(wb -> wb.getSheet("Calibration").getRow(5).setZeroHeight(true)); // row 6
        InputException e = fails(f, ReadingOptions.DEFAULT);
        assertEquals(ErrorKey.HIDDEN_CELLS, e.key());
        Problem p = e.problems().get(0);
        assertEquals("lab.xlsx, Calibration!A6:D6" + IN_BLOCK, p.where());
        assertEquals("row 6, hidden in the workbook", p.found());
        assertTrue(p.fix().contains("'hidden: include'") && p.fix().contains("'hidden: leave-out'"), p.fix());

        DataBlock included = read(f, ReadingOptions.DEFAULT.withHidden(Hidden.INCLUDE));
        assertEquals(4, included.rowCount());
        assertEquals(Map.of(), included.leftOut());
        assertTrue(included.decisions().contains("hidden row 6 read like visible rows (hidden: include)"), included.decisions().toString());

        DataBlock leftOut = read(f, ReadingOptions.DEFAULT.withHidden(Hidden.LEAVE_OUT));
        assertEquals(4, leftOut.rowCount(), "the row stays in the block, to be shown with its reason");
        assertEquals(Map.of(1, "row 6 is hidden in the workbook; left out (hidden: leave-out)"), leftOut.leftOut());
    }

    @Test
    void hiddenColumnIsNotReadUnderLeaveOut() {
        Path f = workbook(wb -> wb.getSheet("Calibration").setColumnHidden(3, true)); // D, the remarks
        InputException e = fails(f, ReadingOptions.DEFAULT);
        assertEquals("lab.xlsx, Calibration!D5:D8" + IN_BLOCK, e.problems().get(0).where());
        assertEquals("column D 'Remark', hidden in the workbook", e.problems().get(0).found());
        DataBlock b = read(f, ReadingOptions.DEFAULT.withHidden(Hidden.LEAVE_OUT));
        assertEquals(List.of("Level", "Nominal (mg/L)", "Peak area [mAU·s]"), b.headers());
        assertTrue(b.decisions().contains("hidden column D 'Remark' not read (hidden: leave-out)"), b.decisions().toString());
    }

    @Test
    void hiddenBlankSpacerChangesNothing() {
        Path f = Fixtures.xlsx(dir, "lab.xlsx", wb -> {
            Sheet s = wb.createSheet("Calibration");
            Fixtures.row(s, 4, "Level", "Nominal (mg/L)", "Peak area [mAU·s]", "Remark");
            Fixtures.row(s, 5, "L1", 0.05, 1210.0);
            Fixtures.row(s, 6, "L2", 0.10, 2405.5);
            s.setColumnHidden(3, true);
        });
        assertEquals(2, read(f, ReadingOptions.DEFAULT).rowCount());
    }

    /** A nominal level merged over two injections: one value, read twice only when the notebook says so. */
    @Test
    void numberMergedOverRowsIsOneValue() {
        Path f = workbook(wb -> {
            Sheet s = wb.getSheet("Calibration");
            s.getRow(5).getCell(1).setBlank(); // B6 under the merged B5
            s.addMergedRegion(new CellRangeAddress(4, 5, 1, 1)); // B5:B6
        });
        InputException e = fails(f, ReadingOptions.DEFAULT);
        assertEquals(ErrorKey.MERGED_VALUE, e.key());
        assertEquals("lab.xlsx, Calibration!B5:B6" + IN_BLOCK, e.problems().get(0).where());
        assertEquals("the number 0.05 (B5) merged over B5:B6, which covers 2 cells of the block", e.problems().get(0).found());

        DataBlock repeated = read(f, ReadingOptions.DEFAULT.withMerged(Merged.REPEAT));
        List<CellValue> nominal = repeated.column("Nominal").orElseThrow().values();
        assertEquals(0.05, nominal.get(1).number(), 0.0);
        assertEquals("value of merged cells B5:B6", nominal.get(1).note());

        DataBlock once = read(f, ReadingOptions.DEFAULT.withMerged(Merged.ONCE));
        assertEquals(CellValue.Kind.BLANK, once.column("Nominal").orElseThrow().values().get(1).kind());
        assertEquals(Map.of(1, "row 6 lies in merged region B5:B6, whose value '0.05' is read once, at B5 (merged: once)"),
                once.leftOut());
    }

    @Test
    void everyProblemOfTheBlockIsReportedAtOnce() {
        Path f = workbook(wb -> {
            Sheet s = wb.getSheet("Calibration");
            s.getRow(7).setZeroHeight(true);
            s.getRow(5).getCell(1).setBlank();
            s.addMergedRegion(new CellRangeAddress(4, 5, 1, 1));
            Fixtures.row(s, 7, "L3", new Fixtures.Formula("B5*10"));
        });
        List<ErrorKey> keys = fails(f, ReadingOptions.DEFAULT).problems().stream().map(Problem::key).toList();
        assertEquals(List.of(ErrorKey.HIDDEN_CELLS, ErrorKey.MERGED_VALUE, ErrorKey.FORMULA_WITHOUT_RESULT), keys);
    }

    private Path formula(String text) {
        return workbook(wb -> Fixtures.row(wb.getSheet("Calibration"), 7, "L3", 0.5, new Fixtures.Formula(text)));
    }

    private static Problem evaluationFails(Path f) {
        InputException e = fails(f, ReadingOptions.DEFAULT.withFormulas(Formulas.EVALUATE));
        assertEquals(ErrorKey.FORMULA_NOT_EVALUATED, e.key());
        assertEquals("lab.xlsx, Calibration!C7" + IN_BLOCK, e.problems().get(0).where());
        return e.problems().get(0);
    }

    @Test
    void anErrorResultIsNotAValue() {
        assertEquals("the formula =C6/0, which evaluates to the error #DIV/0!", evaluationFails(formula("C6/0")).found());
    }

    @Test
    void aFormulaOverTooManyCellsIsNotEvaluated() {
        assertEquals("the formula =SUM(A1:XFD1048576), which refers to 17,179,869,184 cells, more than the 1,000,000 meritbook "
                + "evaluates", evaluationFails(formula("SUM(A1:XFD1048576)")).found());
    }

    @Test
    void aFunctionPoiDoesNotImplementIsNamed() {
        assertEquals("the formula =CUBEVALUE(\"x\"), which uses the function CUBEVALUE, which meritbook cannot evaluate",
                evaluationFails(formula("CUBEVALUE(\"x\")")).found());
    }

    @Test
    void aReferenceToAnotherWorkbookIsNotFollowed() throws Exception {
        Path f = formula("C6*2");
        byte[] edited = XlsxParts.of(Files.readAllBytes(f))
                .edit("xl/worksheets/sheet1.xml", x -> x.replace("<f>C6*2</f>", "<f>[1]Sheet1!A1*2</f>")).zip();
        Files.write(f, edited);
        assertEquals("the formula =[1]Sheet1!A1*2, which refers to another workbook, which meritbook does not open",
                evaluationFails(f).found());
    }

    @Test
    void cellsOutsideTheBlockAndCachedResultsAreNotEvaluated() {
        Path f = workbook(wb -> {
            Sheet s = wb.getSheet("Calibration");
            Fixtures.row(s, 12, null, new Fixtures.Formula("FOO()")); // outside A4:D8
        });
        assertEquals(4, read(f, ReadingOptions.DEFAULT.withFormulas(Formulas.EVALUATE)).rowCount());
    }
}
