package org.meritbook.workbook;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.time.Instant;
import java.util.List;
import java.util.stream.Stream;
import org.apache.poi.hssf.usermodel.HSSFWorkbook;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** DESIGN §7: nothing is overwritten in place; the user's workbook is only ever read. */
class ReadOnlyTest {
    @TempDir
    Path dir;

    private void assertUntouched(Path f, String target, String range) throws Exception {
        FileTime then = FileTime.from(Instant.parse("2024-03-05T08:00:00Z"));
        Files.setLastModifiedTime(f, then);
        byte[] before = Files.readAllBytes(f);
        List<Path> filesBefore = list();
        try (WorkbookReader reader = new WorkbookReader()) {
            reader.read(f, Fixtures.ref(target, range));
            reader.read(f, Fixtures.ref(target, null));
        }
        assertArrayEquals(before, Files.readAllBytes(f));
        assertEquals(then, Files.getLastModifiedTime(f));
        assertEquals(filesBefore, list(), "no lock or temporary file left beside the workbook");
    }

    private List<Path> list() throws Exception {
        try (Stream<Path> s = Files.list(dir)) {
            return s.sorted().toList();
        }
    }

    @Test
    void xlsxIsNotModified() throws Exception {
        Path f = Fixtures.xlsx(dir, "lab.xlsx", wb -> {
            Fixtures.calibration(wb);
            Fixtures.row(wb.getSheet("Calibration"), 9, "L5", 2.0, new Fixtures.Formula("C8*2"));
            wb.getCreationHelper().createFormulaEvaluator().evaluateAll(); // stored results, as a spreadsheet program saves
        });
        assertUntouched(f, "Calibration", "A4:D9");
    }

    @Test
    void xlsIsNotModified() throws Exception {
        Path f = Fixtures.write(new HSSFWorkbook(), dir.resolve("old.xls"), Fixtures::calibration);
        assertUntouched(f, "Calibration", "A4:D8");
    }
}
