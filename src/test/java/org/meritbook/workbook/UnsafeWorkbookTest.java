package org.meritbook.workbook;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.apache.poi.ss.usermodel.Sheet;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.study.DataReference;

/**
 * Hostile and damaged packages: zip bombs with honest and lying headers, entity expansion, damaged
 * entries, and the reading budget. Each ends in a located error within seconds and small memory,
 * never in an exhausted heap, a hang or a number.
 */
class UnsafeWorkbookTest {
    private static final String SHEET = "xl/worksheets/sheet1.xml";
    private static final Duration QUICK = Duration.ofSeconds(30);

    @TempDir
    Path dir;

    private XlsxParts plain() throws Exception {
        return XlsxParts.of(Files.readAllBytes(Fixtures.xlsx(dir, "plain.xlsx", Fixtures::calibration)));
    }

    private InputException fails(byte[] bytes, WorkbookBudget budget) throws Exception {
        Path f = Files.write(dir.resolve("lab.xlsx"), bytes);
        DataReference ref = Fixtures.ref("Calibration", "A4:D8");
        return assertTimeoutPreemptively(QUICK, () -> {
            try (WorkbookReader reader = new WorkbookReader(budget)) {
                return assertThrows(InputException.class, () -> reader.read(f, ref));
            }
        });
    }

    private InputException fails(byte[] bytes) throws Exception {
        return fails(bytes, WorkbookBudget.DEFAULT);
    }

    private static void assertLocated(InputException e) {
        e.problems().forEach(p -> assertTrue(p.where().startsWith("lab.xlsx"), p.where()));
    }

    /** 20 MB of spaces, deflated about 1000-fold: the payload of the bombs below. */
    private static final byte[] BOMB = XlsxParts.deflatedRepeats(20, (byte) ' ');

    /** A sheet part declaring 300 MB: refused from the directory, before anything is inflated. */
    @Test
    void zipBombWithHonestHeadersIsRefusedFromTheDirectory() throws Exception {
        XlsxParts.Raw raw = new XlsxParts.Raw();
        for (XlsxParts.Raw.Entry e : plain().rawEntries()) {
            raw.add(e.name().equals(SHEET)
                    ? new XlsxParts.Raw.Entry(SHEET, BOMB, 8, 0, 300L << 20, true) : e);
        }
        InputException e = fails(raw.bytes());
        assertEquals(ErrorKey.WORKBOOK_TOO_LARGE, e.key());
        assertLocated(e);
        assertTrue(e.getMessage().contains("entries that declare more than 200 MB uncompressed"), e.getMessage());
        assertTrue(e.getMessage().contains("MERITBOOK_MAX_WORKBOOK_MB"), "says how to raise the limit: " + e.getMessage());
    }

    /** A bomb declaring 1 kB: stopped once the bytes actually inflated pass the budget (here 10 MB), long before its 20 MB. */
    @Test
    void zipBombWithLyingHeadersIsStoppedWhileInflating() throws Exception {
        XlsxParts.Raw raw = new XlsxParts.Raw();
        for (XlsxParts.Raw.Entry e : plain().rawEntries()) {
            raw.add(e.name().equals(SHEET) ? new XlsxParts.Raw.Entry(SHEET, BOMB, 8, 0, 1024, true) : e);
        }
        InputException e = fails(raw.bytes(), new WorkbookBudget(10_000_000, 1_000_000));
        assertEquals(ErrorKey.WORKBOOK_TOO_LARGE, e.key());
        assertLocated(e);
        assertEquals("parts that inflate to more than 10 MB (" + SHEET + " among them)", e.problems().get(0).found());
    }

    /** A sheet listed by the workbook part whose own part is not in the zip: damage, not a missing sheet name. */
    @Test
    void aListedSheetWithoutItsPartIsDamage() throws Exception {
        XlsxParts.Raw raw = new XlsxParts.Raw();
        for (XlsxParts.Raw.Entry e : plain().rawEntries()) {
            if (!e.name().equals(SHEET)) {
                raw.add(e);
            }
        }
        InputException e = fails(raw.bytes());
        assertEquals(ErrorKey.CORRUPT_FILE, e.key());
        assertLocated(e);
        assertTrue(e.problems().get(0).found().contains("lists the sheet 'Calibration' (part " + SHEET + "), which the file does not hold"),
                e.getMessage());
    }

    /** A workbook part that lists no sheet at all, and no sheet part: the sheet asked for is missing, said plainly. */
    @Test
    void aWorkbookWithoutSheetsSaysSo() throws Exception {
        XlsxParts p = plain().edit("xl/workbook.xml", x -> x.replaceAll("<sheet [^>]*/>", ""));
        XlsxParts.Raw raw = new XlsxParts.Raw();
        for (XlsxParts.Raw.Entry e : p.rawEntries()) {
            if (!e.name().equals(SHEET)) {
                raw.add(e);
            }
        }
        InputException e = fails(raw.bytes());
        assertEquals(ErrorKey.MISSING_SHEET, e.key(), e.getMessage());
        assertEquals("a workbook without a sheet", e.problems().get(0).found());
    }

    /** The same bomb within the budget: its header lies about its size, so it is a damaged file. */
    @Test
    void aSizeTheDirectoryUnderstatesIsDamage() throws Exception {
        XlsxParts.Raw raw = new XlsxParts.Raw();
        for (XlsxParts.Raw.Entry e : plain().rawEntries()) {
            raw.add(e.name().equals(SHEET) ? new XlsxParts.Raw.Entry(SHEET, BOMB, 8, 0, 1024, true) : e);
        }
        InputException e = fails(raw.bytes());
        assertEquals(ErrorKey.CORRUPT_FILE, e.key());
        assertLocated(e);
    }

    /** A long note of repeated text compresses far more than 100-fold; it is read, not taken for a bomb. */
    @Test
    void highlyCompressibleTextIsRead() throws Exception {
        String note = "lot H-26-118 ".repeat(15_000);
        XlsxParts p = plain().edit(SHEET, x -> x.replaceFirst("(<row r=\"5\"[^>]*>.*?)</row>",
                "$1<c r=\"F5\" t=\"inlineStr\"><is><t>" + note + "</t></is></c></row>"));
        Path f = Files.write(dir.resolve("lab.xlsx"), p.zip());
        try (WorkbookReader reader = new WorkbookReader()) {
            DataBlock b = reader.read(f, Fixtures.ref("Calibration", "A4:F8"));
            assertEquals(note.strip(), b.column("F").orElseThrow().values().get(0).raw());
        }
    }

    /** Over the byte budget (here 1 MB): counted as inflated, whatever the headers say. */
    @Test
    void inflatedBytesOverTheBudgetAreRefused() throws Exception {
        StringBuilder rows = new StringBuilder();
        java.util.SplittableRandom random = new java.util.SplittableRandom(3);
        for (int r = 10; r < 40_000; r++) {
            rows.append("<row r=\"").append(r).append("\"><c r=\"B").append(r).append("\"><v>").append(random.nextDouble())
                    .append("</v></c></row>");
        }
        XlsxParts big = plain().edit(SHEET, x -> x.replace("</sheetData>", rows + "</sheetData>"));
        List<XlsxParts.Raw.Entry> entries = big.rawEntries();
        XlsxParts.Raw raw = new XlsxParts.Raw();
        entries.forEach(en -> raw.add(en.name().equals(SHEET) ? en.withSize(100) : en)); // the directory understates it
        InputException e = fails(raw.bytes(), new WorkbookBudget(1_000_000, 1_000_000));
        assertEquals(ErrorKey.WORKBOOK_TOO_LARGE, e.key());
        assertLocated(e);
        assertTrue(e.getMessage().contains("parts that inflate to more than 1 MB (" + SHEET + " among them)"), e.getMessage());
    }

    @Test
    void cellsOverTheBudgetAreRefusedAndSayHowToRaiseIt() throws Exception {
        InputException e = fails(plain().zip(), new WorkbookBudget(200_000_000, 10));
        assertEquals(ErrorKey.WORKBOOK_TOO_LARGE, e.key());
        assertEquals("lab.xlsx, data reference 'runs!Calibration!A4:D8' (notebook line 14): expected a workbook within "
                + "meritbook's reading budget of 200 MB uncompressed and 10 cells but found more than 10 cells and shared "
                + "strings. If the workbook is genuine, raise the limit with the environment variable "
                + "MERITBOOK_MAX_WORKBOOK_CELLS (e.g. MERITBOOK_MAX_WORKBOOK_CELLS=20) and give Java the memory it needs "
                + "(e.g. MERITBOOK_JAVA_OPTS=-Xmx4g); or read the block from a copy of the workbook that holds only the "
                + "data the study needs.", e.getMessage());
    }

    @Test
    void theBudgetComesFromTheEnvironment() {
        assertEquals(WorkbookBudget.DEFAULT, WorkbookBudget.from(Map.of()));
        assertEquals(new WorkbookBudget(450_000_000, 3_000_000),
                WorkbookBudget.from(Map.of("MERITBOOK_MAX_WORKBOOK_MB", "450", "MERITBOOK_MAX_WORKBOOK_CELLS", "3_000_000")));
        InputException e = assertThrows(InputException.class,
                () -> WorkbookBudget.from(Map.of("MERITBOOK_MAX_WORKBOOK_MB", "lots")));
        assertEquals("environment variable MERITBOOK_MAX_WORKBOOK_MB", e.problems().get(0).where());
        assertEquals("'lots'", e.problems().get(0).found());
    }

    /** "Billion laughs": ten levels of ten references, 10^9 copies if expanded. */
    private static final String LAUGHS = "<!DOCTYPE lolz [<!ENTITY lol \"lol\">"
            + "<!ENTITY lol1 \"&lol;&lol;&lol;&lol;&lol;&lol;&lol;&lol;&lol;&lol;\">"
            + "<!ENTITY lol2 \"&lol1;&lol1;&lol1;&lol1;&lol1;&lol1;&lol1;&lol1;&lol1;&lol1;\">"
            + "<!ENTITY lol3 \"&lol2;&lol2;&lol2;&lol2;&lol2;&lol2;&lol2;&lol2;&lol2;&lol2;\">"
            + "<!ENTITY lol4 \"&lol3;&lol3;&lol3;&lol3;&lol3;&lol3;&lol3;&lol3;&lol3;&lol3;\">"
            + "<!ENTITY lol5 \"&lol4;&lol4;&lol4;&lol4;&lol4;&lol4;&lol4;&lol4;&lol4;&lol4;\">"
            + "<!ENTITY lol6 \"&lol5;&lol5;&lol5;&lol5;&lol5;&lol5;&lol5;&lol5;&lol5;&lol5;\">"
            + "<!ENTITY lol7 \"&lol6;&lol6;&lol6;&lol6;&lol6;&lol6;&lol6;&lol6;&lol6;&lol6;\">"
            + "<!ENTITY lol8 \"&lol7;&lol7;&lol7;&lol7;&lol7;&lol7;&lol7;&lol7;&lol7;&lol7;\">"
            + "<!ENTITY lol9 \"&lol8;&lol8;&lol8;&lol8;&lol8;&lol8;&lol8;&lol8;&lol8;&lol8;\">]>";

    @Test
    void entityExpansionInSharedStringsIsRefused() throws Exception {
        XlsxParts p = plain().edit("xl/sharedStrings.xml", x -> x.replaceFirst("\\?>", "?>" + LAUGHS)
                .replace("<t>L1</t>", "<t>&lol9;</t>"));
        InputException e = fails(p.zip());
        assertEquals(ErrorKey.CORRUPT_FILE, e.key());
        assertLocated(e);
        assertTrue(e.problems().get(0).found().startsWith("a document type declaration in the part xl/sharedStrings.xml"),
                e.getMessage());
    }

    @Test
    void externalEntityInASheetIsRefused() throws Exception {
        XlsxParts p = plain().edit(SHEET, x -> x.replaceFirst("\\?>", "?><!DOCTYPE w [<!ENTITY x SYSTEM \"file:///etc/passwd\">]>")
                .replace("<v>12010.0</v>", "<v>&x;</v>"));
        InputException e = fails(p.zip());
        assertEquals(ErrorKey.CORRUPT_FILE, e.key());
        assertTrue(e.problems().get(0).found().contains("document type declaration in the part " + SHEET), e.getMessage());
    }

    @Test
    void absurdNestingIsRefused() throws Exception {
        String deep = "<x>".repeat(5000) + "</x>".repeat(5000);
        InputException e = fails(plain().edit("docProps/app.xml", x -> x.replaceFirst("</Properties>", deep + "</Properties>")).zip());
        assertEquals(ErrorKey.CORRUPT_FILE, e.key());
        assertTrue(e.problems().get(0).found().contains("nested more than 256"), e.getMessage());
    }

    @Test
    void damagedEntryIsRefusedByItsChecksum() throws Exception {
        List<XlsxParts.Raw.Entry> entries = plain().rawEntries();
        XlsxParts.Raw raw = new XlsxParts.Raw();
        entries.forEach(en -> raw.add(en.name().equals(SHEET) ? en.withCrc(en.crc() ^ 1) : en));
        InputException e = fails(raw.bytes());
        assertEquals(ErrorKey.CORRUPT_FILE, e.key());
        assertLocated(e);
        assertTrue(e.problems().get(0).found().contains("does not match its checksum"), e.getMessage());
    }

    @Test
    void entryTheDirectoryDoesNotListIsRefused() throws Exception {
        List<XlsxParts.Raw.Entry> entries = new ArrayList<>(plain().rawEntries());
        XlsxParts.Raw raw = new XlsxParts.Raw();
        entries.forEach(raw::add);
        // A second copy of the sheet, with other numbers, that only a reader of local headers would see.
        byte[] other = entries.stream().filter(en -> en.name().equals(SHEET)).findFirst().orElseThrow().data();
        raw.add(new XlsxParts.Raw.Entry(SHEET, other, 8, 0, 0, false));
        InputException e = fails(raw.bytes());
        assertEquals(ErrorKey.CORRUPT_FILE, e.key());
        assertTrue(e.problems().get(0).found().contains(SHEET), e.getMessage());
    }

    @Test
    void partsListedTwiceAreRefused() throws Exception {
        XlsxParts.Raw raw = new XlsxParts.Raw();
        plain().rawEntries().forEach(raw::add);
        raw.add(plain().rawEntries().stream().filter(en -> en.name().equals(SHEET)).findFirst().orElseThrow());
        InputException e = fails(raw.bytes());
        assertEquals(ErrorKey.CORRUPT_FILE, e.key());
        assertTrue(e.problems().get(0).found().contains("twice"), e.getMessage());
    }

    @Test
    void csvFieldsOverTheBudgetAreRefused() throws Exception {
        Path f = Files.write(dir.resolve("runs.csv"), "x,y\n1,2\n3,4\n".getBytes(StandardCharsets.UTF_8));
        try (WorkbookReader reader = new WorkbookReader(new WorkbookBudget(1_000_000, 5))) {
            InputException e = assertThrows(InputException.class,
                    () -> reader.read(f, new DataReference("runs", "runs", "A1:B3", "runs!runs!A1:B3", 2)));
            assertEquals(ErrorKey.WORKBOOK_TOO_LARGE, e.key());
        }
    }

    @Test
    void xlsCellsOverTheBudgetAreRefused() throws Exception {
        Path f = Fixtures.write(new org.apache.poi.hssf.usermodel.HSSFWorkbook(), dir.resolve("old.xls"), wb -> {
            Sheet s = wb.createSheet("Calibration");
            for (int r = 1; r <= 20; r++) {
                Fixtures.row(s, r, r * 1.0, r * 2.0);
            }
        });
        try (WorkbookReader reader = new WorkbookReader(new WorkbookBudget(1_000_000, 30))) {
            InputException e = assertThrows(InputException.class, () -> reader.read(f, Fixtures.ref("Calibration", "A1:B20")));
            assertEquals(ErrorKey.WORKBOOK_TOO_LARGE, e.key());
            assertTrue(e.problems().get(0).found().equals("40 cells"), e.getMessage());
        }
    }
}
