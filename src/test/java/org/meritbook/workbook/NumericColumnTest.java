package org.meritbook.workbook;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.nio.file.Path;
import java.util.List;
import org.apache.poi.ss.usermodel.Sheet;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.error.Problem;
import org.meritbook.study.ReadingOptions;

class NumericColumnTest {
    @TempDir
    Path dir;

    /**
     * Peak areas in C5:C17 with a censored entry, a text, an error value and a formula saved without
     * its result (evaluated on request: 1000).
     */
    private DataBlock block() {
        Path f = Fixtures.xlsx(dir, "lab.xlsx", wb -> {
            Sheet s = wb.createSheet("Calibration");
            Fixtures.row(s, 4, "Nominal (mg/L)", "Injection", "Peak area (mAU·s)");
            for (int r = 5; r <= 16; r++) {
                Fixtures.row(s, r, 0.05 * r, 1.0, 100.0 * r);
            }
            Fixtures.row(s, 8, 0.4, 1.0, "abc");
            Fixtures.row(s, 9, 0.45, 1.0, new Fixtures.Formula("1/0"));
            Fixtures.row(s, 10, 0.5, 1.0, new Fixtures.Formula("A10*2000"));
            Fixtures.row(s, 17, 0.85, 1.0, "n.d.");
            s.getRow(8).getCell(2).setCellErrorValue(org.apache.poi.ss.usermodel.FormulaError.DIV0.getCode());
        });
        try (WorkbookReader reader = new WorkbookReader()) {
            return reader.read(f, Fixtures.ref("Calibration", "A4:C17").withReading(
                    ReadingOptions.DEFAULT.withFormulas(ReadingOptions.Formulas.EVALUATE)));
        }
    }

    @Test
    void censoredEntryIsLocatedWithExactMessage() {
        DataBlock b = block();
        Column area = b.column("Peak area").orElseThrow();
        InputException e = assertThrows(InputException.class,
                () -> NumericColumn.values(b.file(), area, ref -> !ref.a1().equals("C17")));
        assertEquals(ErrorKey.CENSORED_VALUE, e.key());
        assertEquals(1, e.problems().size());
        assertEquals("lab.xlsx, Calibration!C17: expected a number in column 'Peak area (mAU·s)' but found the censored "
                + "result 'n.d.'. This method needs measured values; report the measured value, or exclude it in the "
                + "notebook with a reason (exclude: - cell: Calibration!C17, reason: ...).", e.getMessage());
    }

    @Test
    void everyBadCellIsReportedAtOnce() {
        DataBlock b = block();
        InputException e = assertThrows(InputException.class,
                () -> NumericColumn.values(b.file(), b.column("C").orElseThrow()));
        List<String> where = e.problems().stream().map(Problem::where).toList();
        assertEquals(List.of("lab.xlsx, Calibration!C8", "lab.xlsx, Calibration!C9", "lab.xlsx, Calibration!C17"), where);
        assertEquals(List.of(ErrorKey.NOT_A_NUMBER, ErrorKey.NOT_A_NUMBER, ErrorKey.CENSORED_VALUE),
                e.problems().stream().map(Problem::key).toList());
        assertEquals("the text 'abc'", e.problems().get(0).found());
        assertEquals("the error value '#DIV/0!'", e.problems().get(1).found());
    }

    /** A block built by hand can still hold a formula without result (the reader refuses such blocks). */
    @Test
    void formulaWithoutResultIsNamedWithItsFormula() {
        CellRef ref = new CellRef("Calibration", 9, 2);
        Column c = new Column("Peak area (mAU·s)", "Peak area", "mAU·s", "C", List.of(new CellValue(ref, CellValue.Kind.TEXT,
                Double.NaN, "=A10*2000", CellValue.NO_CACHED_RESULT + "=A10*2000")));
        InputException e = assertThrows(InputException.class, () -> NumericColumn.values(dir.resolve("lab.xlsx"), c));
        assertEquals(ErrorKey.FORMULA_WITHOUT_RESULT, e.key());
        assertEquals("lab.xlsx, Calibration!C10: expected a number in column 'Peak area (mAU·s)' but found the formula "
                + "=A10*2000 saved without its result. Open the workbook in Excel, let it calculate and save it, or "
                + "exclude it in the notebook with a reason (exclude: - cell: Calibration!C10, reason: ...).", e.getMessage());
    }

    @Test
    void evaluatedFormulaIsANumber() {
        CellValue c10 = block().column("C").orElseThrow().values().get(5);
        assertEquals(1000.0, c10.number(), 0.0);
        assertEquals("evaluated by meritbook: formula =A10*2000", c10.note());
    }

    @Test
    void excludedCellsBecomeNaN() {
        DataBlock b = block();
        double[] v = NumericColumn.values(b.file(), b.column("C").orElseThrow(),
                ref -> List.of("C8", "C9", "C10", "C17").contains(ref.a1()));
        assertEquals(13, v.length);
        assertEquals(500.0, v[0], 0.0);
        assertEquals(Double.NaN, v[3], 0.0);
        assertArrayEquals(new double[] {1100.0, 1200.0}, new double[] {v[6], v[7]}, 0.0);
    }
}
