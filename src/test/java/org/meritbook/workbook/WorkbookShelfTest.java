package org.meritbook.workbook;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotSame;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.meritbook.workbook.Fixtures.row;

import java.nio.file.Files;
import java.nio.file.Path;
import org.apache.poi.ss.usermodel.Sheet;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.study.DataReference;

/** The live session's kept workbooks: reused only while a file's bytes are unchanged, never shared. */
class WorkbookShelfTest {
    private static final DataReference CAL = Fixtures.ref("Calibration", "A4:D8");

    @TempDir
    Path dir;

    private static DataBlock read(WorkbookShelf shelf, Path file) {
        try (WorkbookReader reader = new WorkbookReader(WorkbookBudget.DEFAULT, shelf)) {
            return reader.read(file, CAL);
        }
    }

    private static Path key(Path file) {
        return file.toAbsolutePath().normalize();
    }

    @Test
    void anUnchangedFileIsNotParsedAgainAndReadsTheSame() {
        Path f = Fixtures.xlsx(dir, "lab.xlsx", Fixtures::calibration);
        try (WorkbookShelf shelf = new WorkbookShelf()) {
            DataBlock first = read(shelf, f);
            assertEquals(1, shelf.size());
            WorkbookShelf.Kept kept = shelf.take(key(f), f, "lab.xlsx", WorkbookBudget.DEFAULT);
            assertEquals(0, shelf.size(), "a kept workbook leaves the shelf while it is lent");
            shelf.giveBack(key(f), kept);
            DataBlock second = read(shelf, f);
            assertEquals(first, second);
            assertSame(kept.workbook(), shelf.take(key(f), f, "lab.xlsx", WorkbookBudget.DEFAULT).workbook());
        }
        // Without a shelf, the same file reads the same block.
        try (WorkbookReader plain = new WorkbookReader()) {
            assertEquals(plain.read(f, CAL), readOnce(f));
        }
    }

    private static DataBlock readOnce(Path f) {
        try (WorkbookShelf shelf = new WorkbookShelf()) {
            return read(shelf, f);
        }
    }

    @Test
    void aSavedChangeIsReadAtOnce() {
        Path f = Fixtures.xlsx(dir, "lab.xlsx", Fixtures::calibration);
        try (WorkbookShelf shelf = new WorkbookShelf()) {
            assertEquals(2405.5, read(shelf, f).column("Peak area").orElseThrow().values().get(1).number(), 0.0);
            // The analyst corrects one reading and saves: same name, same size class, new bytes.
            Fixtures.xlsx(dir, "lab.xlsx", wb -> {
                Fixtures.calibration(wb);
                row(wb.getSheet("Calibration"), 6, "L2", 0.10, 2410.0, "re-injected");
            });
            assertEquals(2410.0, read(shelf, f).column("Peak area").orElseThrow().values().get(1).number(), 0.0);
            assertEquals(1, shelf.size(), "the workbook parsed from the old bytes was replaced");
        }
    }

    @Test
    void twoReadersAtOnceNeverShareAWorkbook() {
        Path f = Fixtures.xlsx(dir, "lab.xlsx", Fixtures::calibration);
        try (WorkbookShelf shelf = new WorkbookShelf()) {
            read(shelf, f);
            WorkbookShelf.Kept a = shelf.take(key(f), f, "lab.xlsx", WorkbookBudget.DEFAULT);
            WorkbookShelf.Kept b = shelf.take(key(f), f, "lab.xlsx", WorkbookBudget.DEFAULT);
            assertNotSame(a.workbook(), b.workbook());
            shelf.giveBack(key(f), a);
            shelf.giveBack(key(f), b);
            assertEquals(1, shelf.size());
        }
    }

    @Test
    void anotherBudgetParsesAgain() {
        Path f = Fixtures.xlsx(dir, "lab.xlsx", Fixtures::calibration);
        try (WorkbookShelf shelf = new WorkbookShelf()) {
            read(shelf, f);
            WorkbookBudget tight = new WorkbookBudget(WorkbookBudget.DEFAULT.maxBytes(), 5);
            // Kept under the default budget, the file is still checked against the tighter one.
            InputException e = assertThrows(InputException.class, () -> shelf.take(key(f), f, "lab.xlsx", tight));
            assertEquals(ErrorKey.WORKBOOK_TOO_LARGE, e.problems().get(0).key());
        }
    }

    @Test
    void aFileThatVanishedIsToldAsWithoutAShelf() throws Exception {
        Path f = Fixtures.xlsx(dir, "lab.xlsx", Fixtures::calibration);
        try (WorkbookShelf shelf = new WorkbookShelf()) {
            read(shelf, f);
            Files.delete(f);
            InputException e = assertThrows(InputException.class, () -> read(shelf, f));
            assertEquals(ErrorKey.FILE_NOT_FOUND, e.problems().get(0).key());
        }
    }

    @Test
    void onlyTheLastFewFilesAreKept() {
        try (WorkbookShelf shelf = new WorkbookShelf()) {
            for (int i = 0; i < 11; i++) {
                int n = i;
                Path f = Fixtures.xlsx(dir, "lab" + i + ".xlsx", wb -> {
                    Fixtures.calibration(wb);
                    Sheet s = wb.getSheet("Calibration");
                    row(s, 2, "Analyst:", "A. Analyst " + n);
                });
                read(shelf, f);
            }
            assertEquals(8, shelf.size());
        }
    }
}
