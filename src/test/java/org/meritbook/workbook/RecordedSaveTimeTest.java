package org.meritbook.workbook;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.Date;
import java.util.Optional;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The save date a file records about itself, used to date a dossier whose notebook states none. */
class RecordedSaveTimeTest {
    @TempDir
    Path dir;

    @Test
    void anXlsxReportsItsCorePropertyModified() throws Exception {
        Path file = dir.resolve("saved.xlsx");
        Instant saved = Instant.parse("2025-07-04T10:15:00Z");
        try (XSSFWorkbook wb = new XSSFWorkbook(); OutputStream out = Files.newOutputStream(file)) {
            wb.createSheet("S").createRow(0).createCell(0).setCellValue("x");
            wb.getProperties().getCoreProperties().setModified(Optional.of(Date.from(saved)));
            wb.write(out);
        }
        try (WorkbookReader reader = new WorkbookReader()) {
            assertEquals(Optional.of(saved), reader.recordedSaveTime(file));
        }
    }

    @Test
    void aCsvFileRecordsNone() throws Exception {
        Path file = dir.resolve("plain.csv");
        Files.writeString(file, "a,b\n1,2\n");
        try (WorkbookReader reader = new WorkbookReader()) {
            assertTrue(reader.recordedSaveTime(file).isEmpty());
        }
    }
}
