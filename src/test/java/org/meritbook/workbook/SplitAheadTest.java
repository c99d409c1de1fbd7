package org.meritbook.workbook;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Set;
import org.apache.poi.ss.usermodel.Sheet;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meritbook.error.InputException;

/**
 * The split made alongside the package check: used only when it is of exactly the parts the check
 * picks, then the same as the split made after the check; held to its byte budget and stoppable;
 * and a package the check refuses is refused with the check's own error.
 */
class SplitAheadTest {
    private static final String LARGE = "xl/worksheets/sheet1.xml";
    private static final String SMALL = "xl/worksheets/sheet2.xml";
    private static final WorkbookBudget UNLIMITED = new WorkbookBudget(Long.MAX_VALUE, Long.MAX_VALUE);

    /** The zip's directory, as the package check's first step reads it. */
    private static java.util.Collection<org.apache.commons.compress.archivers.zip.ZipArchiveEntry> directory(byte[] xlsx) {
        return PackageScan.directory(xlsx, "test.xlsx", "an Excel workbook (.xlsx)", WorkbookBudget.DEFAULT).values();
    }

    /** A workbook with a sheet of 3,000 cells and one of 2. */
    private static byte[] workbook(Path dir) throws IOException {
        Path file = Fixtures.xlsx(dir, "two-sheets.xlsx", wb -> {
            Sheet large = wb.createSheet("Runs");
            Fixtures.row(large, 1, "Run", "Level", "Nitrate");
            for (int r = 2; r <= 1000; r++) {
                Fixtures.row(large, r, "R" + (r % 20), r % 2 == 0 ? "low" : "high", 10 + r * 0.001);
            }
            Fixtures.row(wb.createSheet("Notes"), 1, "Analyst", "B. Block");
        });
        return Files.readAllBytes(file);
    }

    @Test
    void guessesTheSheetsLargeEnoughToHoldMoreCellsThanTheThreshold(@TempDir Path dir) throws IOException {
        byte[] bytes = workbook(dir);
        assertEquals(Set.of(LARGE), SplitAhead.guess(directory(bytes), 1000));
        assertEquals(Set.of(LARGE, SMALL), SplitAhead.guess(directory(bytes), 0));
        assertEquals(Set.of(), SplitAhead.guess(directory(bytes), 1_000_000));
        assertThrows(InputException.class, () -> directory(new byte[] {'P', 'K', 3, 4, 0}),
                "a damaged zip: the check's first step refuses it, before any guess");
    }

    @Test
    void aRightGuessGivesTheSplitMadeAfterTheCheck(@TempDir Path dir) throws Exception {
        byte[] bytes = workbook(dir);
        SplitAhead ahead = SplitAhead.start(bytes, directory(bytes), 1000, WorkbookBudget.DEFAULT);
        assertNotNull(ahead);
        SheetStreams.Split early = ahead.take(Set.of(LARGE));
        SheetStreams.Split after = SheetStreams.split(bytes, Set.of(LARGE), UNLIMITED, () -> false);
        assertNotNull(early);
        assertArrayEquals(after.lightPackage(), early.lightPackage());
        assertEquals(after.sheets().keySet(), early.sheets().keySet());
        assertEquals(Set.of("/" + LARGE), early.sheets().keySet());
    }

    @Test
    void aWrongGuessIsNotUsed(@TempDir Path dir) throws IOException {
        byte[] bytes = workbook(dir);
        SplitAhead ahead = SplitAhead.start(bytes, directory(bytes), 0, WorkbookBudget.DEFAULT);
        assertNotNull(ahead);
        assertNull(ahead.take(Set.of(LARGE)), "guessed both sheets, the check picks one");
        assertNull(SplitAhead.start(bytes, directory(bytes), 1_000_000, WorkbookBudget.DEFAULT), "nothing to guess: no thread");
    }

    @Test
    void theSplitKeepsToItsByteAndCellBudgetsAndStopsWhenAsked(@TempDir Path dir) throws Exception {
        byte[] bytes = workbook(dir);
        WorkbookBudget thousandBytes = new WorkbookBudget(1000, Long.MAX_VALUE);
        assertThrows(IOException.class, () -> SheetStreams.split(bytes, Set.of(LARGE), thousandBytes, () -> false));
        WorkbookBudget oneCellShort = new WorkbookBudget(Long.MAX_VALUE, 2999);
        assertThrows(IllegalStateException.class, () -> SheetStreams.split(bytes, Set.of(LARGE), oneCellShort, () -> false));
        WorkbookBudget justEnough = new WorkbookBudget(Long.MAX_VALUE, 3000);
        assertEquals(1, SheetStreams.split(bytes, Set.of(LARGE), justEnough, () -> false).sheets().size(), "its 3,000 cells fit");
        assertThrows(IOException.class, () -> SheetStreams.split(bytes, Set.of(LARGE), UNLIMITED, () -> true));
    }

    /** A row of one cell more than the columns A to XFD: the check refuses it, and the split ahead never holds more. */
    @Test
    void aRowWiderThanASheetStopsTheSplit(@TempDir Path dir) throws IOException {
        byte[] bytes = workbook(dir);
        String wide = "<row r=\"1\">" + "<c><v>1</v></c>".repeat(RangeText.MAX_COLS + 1) + "</row>";
        byte[] hostile = XlsxParts.of(bytes).edit(LARGE, xml -> xml.replaceFirst("<sheetData>.*</sheetData>",
                "<sheetData>" + wide + "</sheetData>")).zip();
        assertThrows(IllegalStateException.class, () -> SheetStreams.split(hostile, Set.of(LARGE), UNLIMITED, () -> false));
        InputException e = refused(dir, hostile);
        assertTrue(e.getMessage().contains("beyond the last column"), e.getMessage());
    }

    /** The reader's error on {@code xlsx}, with sheets of more than 1,000 cells streamed (so split ahead). */
    private static InputException refused(Path dir, byte[] xlsx) throws IOException {
        Path file = Files.write(dir.resolve("hostile.xlsx"), xlsx);
        System.setProperty(SheetStreams.THRESHOLD_PROPERTY, "1000");
        try (WorkbookReader reader = new WorkbookReader()) {
            return assertThrows(InputException.class, () -> reader.read(file, Fixtures.ref("Runs", "A1:C10")));
        } finally {
            System.clearProperty(SheetStreams.THRESHOLD_PROPERTY);
        }
    }

    /** A large sheet with a document type declaration: the check's located refusal, whatever the split ahead did. */
    @Test
    void aPackageTheCheckRefusesIsRefusedWithTheChecksError(@TempDir Path dir) throws IOException {
        byte[] bytes = workbook(dir);
        byte[] hostile = XlsxParts.of(bytes).edit(LARGE, xml -> xml.replaceFirst("\\?>",
                "?><!DOCTYPE worksheet [<!ENTITY a \"aaaaaaaaaa\">]>")).zip();
        assertEquals(Set.of(LARGE), SplitAhead.guess(directory(hostile), 1000));
        InputException e = refused(dir, hostile);
        assertTrue(e.getMessage().contains("document type declaration"), e.getMessage());
    }
}
