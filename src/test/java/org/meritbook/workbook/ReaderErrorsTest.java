package org.meritbook.workbook;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import org.apache.poi.hssf.record.crypto.Biff8EncryptionKey;
import org.apache.poi.hssf.usermodel.HSSFWorkbook;
import org.apache.poi.openxml4j.opc.OPCPackage;
import org.apache.poi.poifs.crypt.EncryptionInfo;
import org.apache.poi.poifs.crypt.EncryptionMode;
import org.apache.poi.poifs.crypt.Encryptor;
import org.apache.poi.poifs.filesystem.POIFSFileSystem;
import org.apache.poi.ss.usermodel.Name;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.study.DataReference;

/** Bad files and references: key, location and the full message. */
class ReaderErrorsTest {
    private static final String AT = "lab.xlsx, data reference 'runs!Calibration!A4:C25' (notebook line 14): ";

    @TempDir
    Path dir;

    private InputException fails(Path file, DataReference ref) {
        try (WorkbookReader reader = new WorkbookReader()) {
            return assertThrows(InputException.class, () -> reader.read(file, ref));
        }
    }

    private Path calibrationWorkbook() {
        return Fixtures.xlsx(dir, "lab.xlsx", wb -> {
            Fixtures.calibration(wb);
            wb.createSheet("Precision");
        });
    }

    @Test
    void missingSheetListsTheSheets() {
        InputException e = fails(calibrationWorkbook(), Fixtures.ref("Calib", "A4:C25"));
        assertEquals(ErrorKey.MISSING_SHEET, e.key());
        assertEquals("lab.xlsx, data reference 'runs!Calib!A4:C25' (notebook line 14): expected a sheet named 'Calib' "
                + "but found only the sheets 'Calibration', 'Precision'. Correct the sheet name in the data reference.",
                e.getMessage());
    }

    @Test
    void headerWithoutDataIsAnEmptyRange() {
        InputException e = fails(calibrationWorkbook(), Fixtures.ref("Calibration", "A4:D4"));
        assertEquals(ErrorKey.EMPTY_RANGE, e.key());
        assertEquals("lab.xlsx, data reference 'runs!Calibration!A4:D4' (notebook line 14): expected a header row and "
                + "at least one data row in Calibration!A4:D4 but found the header row 4 and no data rows below it. "
                + "Extend the range down to the last data row.", e.getMessage());
    }

    @Test
    void blankRangeIsAnEmptyRange() {
        InputException e = fails(calibrationWorkbook(), Fixtures.ref("Calibration", "F1:G10"));
        assertEquals(ErrorKey.EMPTY_RANGE, e.key());
        assertEquals("lab.xlsx, data reference 'runs!Calibration!F1:G10' (notebook line 14): expected a header row and "
                + "at least one data row in Calibration!F1:G10 but found only blank cells. Check the sheet and the range "
                + "in the data reference.", e.getMessage());
    }

    @Test
    void emptyWholeColumns() {
        InputException e = fails(calibrationWorkbook(), Fixtures.ref("Precision", "B:C"));
        assertEquals(ErrorKey.EMPTY_RANGE, e.key());
    }

    @Test
    void notAWorkbookIsCorrupt() throws Exception {
        Path f = Files.writeString(dir.resolve("lab.xlsx"), "Conc,Area\n1,2\n");
        InputException e = fails(f, Fixtures.ref("Calibration", "A4:C25"));
        assertEquals(ErrorKey.CORRUPT_FILE, e.key());
        assertEquals(AT + "expected an Excel workbook (.xlsx) but found a file that is not a workbook (neither a zip "
                + "package nor an OLE2 file). Open the file in Excel and save it again, or use an intact copy.",
                e.getMessage());
    }

    @Test
    void truncatedWorkbookIsCorrupt() throws Exception {
        byte[] whole = Files.readAllBytes(calibrationWorkbook());
        Path f = Files.write(dir.resolve("lab.xlsx"), Arrays.copyOf(whole, whole.length / 3));
        InputException e = fails(f, Fixtures.ref("Calibration", "A4:C25"));
        assertEquals(ErrorKey.CORRUPT_FILE, e.key());
        assertEquals(AT + "expected an Excel workbook (.xlsx) but found a zip package whose directory cannot be read "
                + "(the file is cut short or damaged). Open the file in Excel and save it again, or use an intact copy.",
                e.getMessage());
        assertNotNull(e.getCause());
    }

    /** Agile encryption as Excel 2010 and later write it (POI's Encryptor, EncryptionMode.agile). */
    @Test
    void passwordProtectedXlsxIsEncrypted() throws Exception {
        byte[] plain = Files.readAllBytes(calibrationWorkbook());
        Path f = dir.resolve("lab.xlsx");
        try (POIFSFileSystem fs = new POIFSFileSystem()) {
            Encryptor enc = new EncryptionInfo(EncryptionMode.agile).getEncryptor();
            enc.confirmPassword("secret");
            try (OPCPackage opc = OPCPackage.open(new ByteArrayInputStream(plain));
                    OutputStream os = enc.getDataStream(fs)) {
                opc.save(os);
            }
            try (OutputStream out = Files.newOutputStream(f)) {
                fs.writeFilesystem(out);
            }
        }
        InputException e = fails(f, Fixtures.ref("Calibration", "A4:C25"));
        assertEquals(ErrorKey.ENCRYPTED_FILE, e.key());
        assertEquals(AT + "expected a workbook without a password but found a password-protected (encrypted) workbook. "
                + "Save a copy without the password from Excel and point the source at that copy.", e.getMessage());
    }

    @Test
    void passwordProtectedXlsIsEncrypted() throws Exception {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        Biff8EncryptionKey.setCurrentUserPassword("secret");
        try (HSSFWorkbook wb = new HSSFWorkbook()) {
            Fixtures.row(wb.createSheet("Calibration"), 1, "x", "y");
            wb.write(bytes);
        } finally {
            Biff8EncryptionKey.setCurrentUserPassword(null);
        }
        Path f = Files.write(dir.resolve("old.xls"), bytes.toByteArray());
        InputException e = fails(f, Fixtures.ref("Calibration", "A1:B2"));
        assertEquals(ErrorKey.ENCRYPTED_FILE, e.key());
        assertEquals("old.xls, data reference 'runs!Calibration!A1:B2' (notebook line 14)", e.problems().get(0).where());
    }

    @Test
    void unknownExtensionIsUnsupported() throws Exception {
        Path f = Files.writeString(dir.resolve("lab.ods"), "not read");
        InputException e = fails(f, Fixtures.ref("Calibration", "A4:C25"));
        assertEquals(ErrorKey.UNSUPPORTED_FORMAT, e.key());
        assertEquals("lab.ods, data reference 'runs!Calibration!A4:C25' (notebook line 14): expected a .xlsx, .xlsm, "
                + ".xls or .csv file but found a '.ods' file. Save the data as .xlsx (or export the sheet as .csv) and "
                + "point the source at that file.", e.getMessage());
    }

    @Test
    void missingFile() {
        Path f = dir.resolve("lab.xlsx");
        InputException e = fails(f, Fixtures.ref("Calibration", "A4:C25"));
        assertEquals(ErrorKey.FILE_NOT_FOUND, e.key());
        assertEquals(AT + "expected a workbook file at " + f + " but found no such file. Check the path under "
                + "'sources:' in the front matter; it is resolved against the notebook's folder.", e.getMessage());
    }

    @Test
    void malformedRangeIsABadAddress() {
        InputException e = fails(calibrationWorkbook(), Fixtures.ref("Calibration", "A4:C"));
        assertEquals(ErrorKey.BAD_CELL_ADDRESS, e.key());
        assertEquals("lab.xlsx, data reference 'runs!Calibration!A4:C' (notebook line 14): expected a range such as "
                + "A4:C25 (top-left to bottom-right cell) or whole columns such as B:C but found 'A4:C'. Correct the "
                + "range in the data reference.", e.getMessage());
    }

    @Test
    void reversedRangeIsABadAddress() {
        InputException e = fails(calibrationWorkbook(), Fixtures.ref("Calibration", "C4:A1"));
        assertEquals(ErrorKey.BAD_CELL_ADDRESS, e.key());
        assertEquals("'C4:A1', which does not run from its top-left to its bottom-right cell", e.problems().get(0).found());
    }

    @Test
    void unknownNameListsNamesTablesAndSheets() {
        Path f = Fixtures.xlsx(dir, "lab.xlsx", wb -> {
            Fixtures.calibration(wb);
            Name n = wb.createName();
            n.setNameName("CalPoints");
            n.setRefersToFormula("Calibration!$B$4:$C$8");
        });
        InputException e = fails(f, Fixtures.ref("Linearity", null));
        assertEquals(ErrorKey.MISSING_NAME, e.key());
        assertEquals("lab.xlsx, data reference 'runs!Linearity' (notebook line 14): expected a defined name, Excel "
                + "table or sheet named 'Linearity' but found no such name; the workbook has defined names 'CalPoints', "
                + "no tables and sheets 'Calibration'. Correct the name, or give a sheet and range such as "
                + "Sheet1!A1:C20.", e.getMessage());
    }

    @Test
    void nameOverTwoAreasIsNotOneRange() {
        Path f = Fixtures.xlsx(dir, "lab.xlsx", wb -> {
            Fixtures.calibration(wb);
            Name n = wb.createName();
            n.setNameName("Split");
            n.setRefersToFormula("Calibration!$A$4:$A$8,Calibration!$C$4:$C$8");
        });
        InputException e = fails(f, Fixtures.ref("Split", null));
        assertEquals(ErrorKey.BAD_CELL_ADDRESS, e.key());
    }

    @Test
    void csvSheetIsTheFileName() throws Exception {
        Path f = Files.writeString(dir.resolve("blanks.csv"), "a,b\n1,2\n");
        InputException e = fails(f, Fixtures.ref("Sheet1", "A1:B2"));
        assertEquals(ErrorKey.MISSING_SHEET, e.key());
        assertEquals("only the sheet 'blanks'", e.problems().get(0).found());
    }
}
