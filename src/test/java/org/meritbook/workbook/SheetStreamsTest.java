package org.meritbook.workbook;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.function.Supplier;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meritbook.bench.BigBlockWorkbook;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.study.DataReference;

/**
 * Large sheets read by streaming ({@link SheetStreams}) give the very blocks POI's usermodel gives:
 * a generated 2,000-row block, sheet XML other programs write (shared formulas, inline and rich
 * inline strings, rows and cells without positions), a sheet that claims a huge size, and a bad
 * value deep in the block, reported with its cell. The existing reader tests run again with every
 * sheet streamed (the {@code Streamed…Test} classes).
 */
class SheetStreamsTest {
    private static final String SHEET = "xl/worksheets/sheet1.xml";
    private static final int ROWS = 2_000;

    @TempDir
    Path dir;

    @AfterEach
    void defaultThreshold() {
        System.clearProperty(SheetStreams.THRESHOLD_PROPERTY);
    }

    /** The result of {@code read} with POI's usermodel, then with every sheet streamed. */
    private static <T> T[] bothWays(Supplier<T> read, T[] out) {
        System.setProperty(SheetStreams.THRESHOLD_PROPERTY, String.valueOf(Long.MAX_VALUE));
        out[0] = read.get();
        System.setProperty(SheetStreams.THRESHOLD_PROPERTY, "0");
        out[1] = read.get();
        return out;
    }

    private static DataBlock read(Path file, DataReference ref) {
        try (WorkbookReader reader = new WorkbookReader()) {
            return reader.read(file, ref);
        }
    }

    private Path generated() {
        BigBlockWorkbook.write(dir, ROWS);
        return dir.resolve(BigBlockWorkbook.WORKBOOK);
    }

    /**
     * The generated workbook's parts: POI's streaming writer sizes its entries in trailing data
     * descriptors, which {@link XlsxParts} (java.util.zip's stream) does not read, so the zip is
     * rewritten from its central directory first.
     */
    private static XlsxParts parts(Path file) throws java.io.IOException {
        java.io.ByteArrayOutputStream out = new java.io.ByteArrayOutputStream();
        try (java.util.zip.ZipFile zip = new java.util.zip.ZipFile(file.toFile());
             java.util.zip.ZipOutputStream copy = new java.util.zip.ZipOutputStream(out)) {
            for (var e : java.util.Collections.list(zip.entries())) {
                copy.putNextEntry(new java.util.zip.ZipEntry(e.getName()));
                try (var in = zip.getInputStream(e)) {
                    in.transferTo(copy);
                }
                copy.closeEntry();
            }
        }
        return XlsxParts.of(out.toByteArray());
    }

    private static DataReference checks() {
        return Fixtures.ref("Checks", BigBlockWorkbook.range(ROWS));
    }

    @Test
    void aGeneratedBlockReadsTheSameBothWays() {
        Path file = generated();
        DataBlock[] b = bothWays(() -> read(file, checks()), new DataBlock[2]);
        assertEquals(ROWS, b[1].rowCount());
        assertEquals(b[0], b[1]);
        assertEquals("Checks!D2003", b[1].column("Nitrate").orElseThrow().values().get(ROWS - 1).ref().address());
    }

    @Test
    void theStreamedPathIsTakenAboveTheThresholdOnly() {
        Path file = generated();
        System.setProperty(SheetStreams.THRESHOLD_PROPERTY, String.valueOf(4L * ROWS + 5)); // header, title: 4 × 2,000 + 5 cells
        try (SourceWorkbook wb = WorkbookFiles.open(file, "test", WorkbookBudget.DEFAULT)) {
            assertEquals(0, ((PoiWorkbook) wb).streamedSheets());
        }
        System.setProperty(SheetStreams.THRESHOLD_PROPERTY, String.valueOf(4L * ROWS + 4));
        try (SourceWorkbook wb = WorkbookFiles.open(file, "test", WorkbookBudget.DEFAULT)) {
            assertEquals(1, ((PoiWorkbook) wb).streamedSheets());
        }
    }

    @Test
    void sheetXmlOfOtherWritersReadsTheSameBothWays() throws Exception {
        Path plain = Fixtures.xlsx(dir, "plain.xlsx", Fixtures::calibration);
        byte[] bytes = XlsxParts.of(Files.readAllBytes(plain)).edit(SHEET, x -> x
                // a shared formula over C5:C8 with cached results, as spreadsheet programs write a filled-down column
                .replaceFirst("<c r=\"C5\"[^>]*>.*?</c>", "<c r=\"C5\"><f t=\"shared\" ref=\"C5:C8\" si=\"0\">B5*24200</f><v>1210</v></c>")
                .replaceFirst("<c r=\"C6\"[^>]*>.*?</c>", "<c r=\"C6\"><f t=\"shared\" si=\"0\"/><v>2420</v></c>")
                // an inline string and a rich inline string with a phonetic run, which POI leaves out
                .replaceFirst("<c r=\"A7\"[^>]*>.*?</c>", "<c r=\"A7\" t=\"inlineStr\"><is><t>L3</t></is></c>")
                .replaceFirst("<c r=\"A8\"[^>]*>.*?</c>", "<c r=\"A8\" t=\"inlineStr\"><is><r><t>L</t></r><r><t>4</t></r>"
                        + "<rPh sb=\"0\" eb=\"1\"><t>x</t></rPh></is></c>")
                // a cell written without its position: one after the row's last cell
                .replaceFirst("<c r=\"D6\"", "<c")
                // a hidden row whose height is zero
                .replaceFirst("<row r=\"7\"", "<row r=\"7\" ht=\"0\" customHeight=\"1\"")).zip();
        Path file = Files.write(dir.resolve("edited.xlsx"), bytes);
        DataReference ref = new DataReference("runs", "Calibration", "A4:D8", "runs!Calibration!A4:D8", 14,
                org.meritbook.study.ReadingOptions.DEFAULT.withHidden(org.meritbook.study.ReadingOptions.Hidden.INCLUDE));
        DataBlock[] b = bothWays(() -> read(file, ref), new DataBlock[2]);
        assertEquals(b[0], b[1]);
        CellValue shared = b[1].column("C").orElseThrow().values().get(1);
        assertEquals("cached result of formula =B6*24200", shared.note());
        assertEquals("L4", b[1].column("A").orElseThrow().values().get(3).raw());
        assertTrue(b[1].decisions().stream().anyMatch(d -> d.contains("hidden row 7")), b[1].decisions().toString());
    }

    /** The streamed pass reads a UTF-8 part on its bytes: XML's own forms must read as the StAX reader reads them. */
    @Test
    void xmlMarkupInTheSheetReadsTheSameBothWays() throws Exception {
        Path plain = Fixtures.xlsx(dir, "plain.xlsx", Fixtures::calibration);
        String ns = "http://schemas.openxmlformats.org/spreadsheetml/2006/main";
        byte[] bytes = XlsxParts.of(Files.readAllBytes(plain)).edit(SHEET, x -> x
                // a comment and a processing instruction between rows and inside a value, line ends CR LF between cells
                .replaceFirst("<row r=\"5\"", "<!-- edited by hand --><?note a?>\r\n<row r=\"5\"")
                .replaceFirst("<c r=\"B5\"([^>]*)><v>([^<]*)</v>", "<c r='B5'$1>\r\n<v>$2<!-- kept --></v>")
                // text written with entities, character references, a CDATA section and CR LF inside
                .replaceFirst("<c r=\"A7\"[^>]*>.*?</c>", "<c r=\"A7\" t=\"inlineStr\"><is><t>L&amp;&#51;&#x3C;<![CDATA[a<b]]]]>\r\nc</t></is></c>")
                // a row whose cells carry a namespace prefix, a formula among them, and a cell position written as a character reference
                .replaceFirst("<row r=\"8\"([^>]*)>.*?</row>", "<x:row r=\"8\"$1 xmlns:x=\"" + ns + "\"><x:c r=\"A8\" t=\"inlineStr\">"
                        + "<x:is><x:t>L4</x:t></x:is></x:c><x:c r=\"&#66;8\" s = '0'><x:v>1</x:v></x:c>"
                        + "<x:c r=\"C8\"><x:f>B8*24100</x:f><x:v>24100</x:v></x:c></x:row>")).zip();
        Path file = Files.write(dir.resolve("markup.xlsx"), bytes);
        DataReference ref = Fixtures.ref("Calibration", "A4:D8");
        DataBlock[] b = bothWays(() -> read(file, ref), new DataBlock[2]);
        assertEquals(b[0], b[1]);
        assertEquals("L&3<a<b]]\nc", b[1].column("A").orElseThrow().values().get(2).raw());
        assertEquals("cached result of formula =B8*24100", b[1].column("C").orElseThrow().values().get(3).note());
        assertEquals(1.0, b[1].column("B").orElseThrow().values().get(3).number());
    }

    @Test
    void aSheetClaimingTheWholeGridIsReadForWhatItHolds() throws Exception {
        Path file = generated();
        byte[] bytes = parts(file)
                .edit(SHEET, x -> x.replace("<dimension ref=\"A1:D2003\"/>", "<dimension ref=\"A1:XFD1048576\"/>")).zip();
        Path claimed = Files.write(dir.resolve("claimed.xlsx"), bytes);
        DataBlock[] b = bothWays(() -> read(claimed, Fixtures.ref("Checks", "A3:D1048576")), new DataBlock[2]);
        assertEquals(b[0], b[1]);
        assertEquals(ROWS, b[1].rowCount());
        assertEquals("A3:D1048576", b[1].range());
    }

    @Test
    void rowsWrittenInReverseOrderReadTheSameBothWays() throws Exception {
        Path file = generated();
        byte[] bytes = parts(file).edit(SHEET, x -> {
            int start = x.indexOf("<row ");
            int end = x.indexOf("</sheetData>");
            java.util.List<String> rows = new java.util.ArrayList<>(java.util.Arrays.asList(x.substring(start, end).split("(?=<row )")));
            java.util.Collections.reverse(rows);
            return x.substring(0, start) + String.join("", rows) + x.substring(end);
        }).zip();
        Path reversed = Files.write(dir.resolve("reversed.xlsx"), bytes);
        DataBlock[] b = bothWays(() -> read(reversed, checks()), new DataBlock[2]);
        assertEquals(b[0], b[1]);
        assertEquals(ROWS, b[1].rowCount());
        assertEquals("Checks!D4", b[1].column("Nitrate").orElseThrow().values().get(0).ref().address());
    }

    @Test
    void aBadValueDeepInABigBlockIsReportedWithItsCell() throws Exception {
        Path file = generated();
        byte[] bytes = parts(file)
                .edit(SHEET, x -> x.replaceFirst("<c r=\"D1903\"[^>]*>.*?</c>", "<c r=\"D1903\" t=\"inlineStr\"><is><t>n/a</t></is></c>"))
                .zip();
        Path bad = Files.write(dir.resolve("bad.xlsx"), bytes);
        InputException[] e = bothWays(() -> {
            DataBlock b = read(bad, checks());
            return assertThrows(InputException.class, () -> NumericColumn.values(b.file(), b.column("Nitrate").orElseThrow()));
        }, new InputException[2]);
        assertEquals(e[0].getMessage(), e[1].getMessage());
        assertEquals(1, e[1].problems().size());
        assertEquals(ErrorKey.NOT_A_NUMBER, e[1].problems().get(0).key());
        assertTrue(e[1].problems().get(0).where().contains("Checks!D1903"), e[1].problems().get(0).where());
    }
}
