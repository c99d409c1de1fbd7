package org.meritbook.workbook;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.Charset;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import javax.xml.stream.XMLStreamException;
import org.apache.commons.compress.archivers.zip.ZipArchiveEntry;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.apache.poi.EncryptedDocumentException;
import org.apache.poi.hssf.usermodel.HSSFWorkbook;
import org.apache.poi.poifs.crypt.Decryptor;
import org.apache.poi.poifs.filesystem.FileMagic;
import org.apache.poi.poifs.filesystem.POIFSFileSystem;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.ss.usermodel.Workbook;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.meritbook.error.InputException;

/**
 * Opens a workbook file by its extension. The file is read into memory once and parsed from
 * there: POI never gets a path it could open for writing, and the user's file is never locked.
 */
final class WorkbookFiles {
    private WorkbookFiles() {
    }

    static SourceWorkbook open(Path file, String where, WorkbookBudget budget) {
        return parse(file, read(file, where, budget), where, budget);
    }

    /** The file's bytes, after the checks every format shares: it exists, its extension is known, its size is in budget. */
    static byte[] read(Path file, String where, WorkbookBudget budget) {
        if (!Files.isRegularFile(file)) {
            throw ReadErrors.fileNotFound(where, file, Files.isDirectory(file));
        }
        String ext = extension(file);
        if (!List.of("xlsx", "xlsm", "xls", "csv").contains(ext)) {
            throw ReadErrors.unsupported(where, ext);
        }
        byte[] bytes;
        try {
            // A zip never shrinks what it stores much below its own size, so the file's size is a first bound for every format.
            long size = Files.size(file);
            if (size > budget.maxBytes()) {
                throw budget.tooManyBytes(where, "a file of " + WorkbookBudget.megabytes(size));
            }
            bytes = Files.readAllBytes(file);
        } catch (IOException e) {
            throw ReadErrors.corrupt(where, "a readable file", "a file that cannot be read (" + e.getClass().getSimpleName() + ")", e);
        }
        return bytes;
    }

    /** The workbook those bytes (read from {@code file} by {@link #read}) hold. */
    static SourceWorkbook parse(Path file, byte[] bytes, String where, WorkbookBudget budget) {
        String ext = extension(file);
        return ext.equals("csv") ? csv(file, bytes, where, budget) : excel(bytes, file, ext, where, budget);
    }

    static String extension(Path file) {
        String name = ReadErrors.fileName(file);
        int dot = name.lastIndexOf('.');
        return dot < 0 ? "" : name.substring(dot + 1).toLowerCase(Locale.ROOT);
    }

    private static SourceWorkbook excel(byte[] bytes, Path file, String ext, String where, WorkbookBudget budget) {
        String expected = "an Excel workbook (." + ext + ")";
        if (bytes.length == 0) {
            throw ReadErrors.corrupt(where, expected, "an empty file", null);
        }
        List<String> decisions = new ArrayList<>();
        try {
            FileMagic magic = FileMagic.valueOf(bytes);
            Workbook wb;
            if (magic == FileMagic.OOXML) {
                if (ext.equals("xls")) {
                    decisions.add("the file is named .xls but holds an .xlsx workbook; read as .xlsx");
                }
                long threshold = SheetStreams.threshold();
                Map<String, ZipArchiveEntry> directory = PackageScan.directory(bytes, where, expected, budget);
                SplitAhead ahead = SplitAhead.start(bytes, directory.values(), threshold, budget);
                SourceWorkbook streamed;
                try {
                    Map<String, Long> cells = PackageScan.check(bytes, directory, ReadErrors.fileName(file), where, expected,
                            budget);
                    PoiLimits.allow(budget);
                    streamed = streamed(bytes, SheetStreams.large(cells, threshold), ahead, decisions,
                            ReadErrors.fileName(file), budget);
                } finally {
                    if (ahead != null) {
                        ahead.abandon(); // whatever ended the check, nobody waits for the split any more
                    }
                }
                if (streamed != null) {
                    return streamed;
                }
                wb = new XSSFWorkbook(new ByteArrayInputStream(bytes));
            } else if (magic == FileMagic.OLE2) {
                POIFSFileSystem fs = new POIFSFileSystem(new ByteArrayInputStream(bytes));
                // An encrypted .xlsx is an OLE2 container whose EncryptionInfo stream holds the key data.
                if (fs.getRoot().hasEntry(Decryptor.DEFAULT_POIFS_ENTRY)) {
                    fs.close();
                    throw ReadErrors.encrypted(where);
                }
                if (!ext.equals("xls")) {
                    decisions.add("the file is named ." + ext + " but holds a legacy .xls workbook; read as .xls");
                }
                wb = new HSSFWorkbook(fs);
                checkCells(wb, where, budget);
            } else {
                throw ReadErrors.corrupt(where, expected,
                        "a file that is not a workbook (neither a zip package nor an OLE2 file)", null);
            }
            return new PoiWorkbook(wb, decisions, ReadErrors.fileName(file), budget);
        } catch (InputException e) {
            throw e;
        } catch (EncryptedDocumentException e) {
            throw ReadErrors.encrypted(where);
        } catch (IOException | RuntimeException e) {
            throw ReadErrors.corrupt(where, expected, "a damaged workbook that cannot be read", e);
        }
    }

    /**
     * The workbook with its large sheets read by streaming ({@link SheetStreams}), or null when no
     * sheet is large or a streamed part is not found among the sheets POI opened (then POI reads the
     * whole file, as for a small workbook: never a sheet with cells missing).
     */
    private static SourceWorkbook streamed(byte[] bytes, Set<String> large, SplitAhead ahead, List<String> decisions,
                                           String fileName, WorkbookBudget budget) throws IOException {
        if (large.isEmpty()) {
            return null;
        }
        SheetStreams.Split split = ahead == null ? null : ahead.take(large);
        if (split == null) {
            try {
                split = SheetStreams.split(bytes, large, budget, () -> false);
            } catch (XMLStreamException e) {
                throw new IOException(e);
            }
        }
        PoiWorkbook wb = new PoiWorkbook(new XSSFWorkbook(new ByteArrayInputStream(split.lightPackage())), decisions, fileName,
                budget, split.sheets(), bytes);
        if (wb.streamedSheetsFound()) {
            return wb;
        }
        wb.close();
        return null;
    }

    /** An .xls holds its cells as records already in memory; counting them is cheap and keeps one rule for all formats. */
    private static void checkCells(Workbook wb, String where, WorkbookBudget budget) throws IOException {
        long cells = 0;
        for (Sheet s : wb) {
            for (Row r : s) {
                cells += r.getPhysicalNumberOfCells();
            }
        }
        if (cells > budget.maxCells()) {
            wb.close();
            throw budget.tooManyCells(where, String.format(Locale.ROOT, "%,d", cells) + " cells");
        }
    }

    private static SourceWorkbook csv(Path file, byte[] bytes, String where, WorkbookBudget budget) {
        List<String> decisions = new ArrayList<>();
        String text = decode(bytes, decisions);
        if (text.startsWith("\uFEFF")) {
            text = text.substring(1);
        }
        char delimiter = Delimiter.detect(text, decisions);
        CSVFormat format = CSVFormat.DEFAULT.builder()
                .setDelimiter(delimiter)
                .setIgnoreEmptyLines(false) // keep row numbers equal to line numbers
                .get();
        List<List<String>> records = new ArrayList<>();
        try (CSVParser parser = CSVParser.parse(text, format)) {
            long fields = 0;
            for (CSVRecord r : parser) {
                fields += r.size();
                if (fields > budget.maxCells()) {
                    throw budget.tooManyCells(where, "more than " + String.format(Locale.ROOT, "%,d", budget.maxCells()) + " fields");
                }
                records.add(r.toList());
            }
        } catch (IOException | UncheckedIOException | IllegalStateException e) {
            throw ReadErrors.corrupt(where, "a CSV file", "text that cannot be read as CSV (an unclosed quotation mark?)", e);
        }
        String name = ReadErrors.fileName(file);
        String sheet = name.substring(0, name.length() - ".csv".length());
        return new CsvWorkbook(new CsvGrid(sheet, records), decisions);
    }

    /** UTF-8 when the bytes are valid UTF-8; otherwise Windows-1252, as Excel writes CSV on Windows. */
    private static String decode(byte[] bytes, List<String> decisions) {
        try {
            return StandardCharsets.UTF_8.newDecoder()
                    .onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT)
                    .decode(ByteBuffer.wrap(bytes)).toString();
        } catch (CharacterCodingException e) {
            decisions.add("the CSV file is not valid UTF-8; read as Windows-1252");
            return new String(bytes, Charset.forName("windows-1252"));
        }
    }

    /** The field delimiter of a CSV file, detected from its first non-blank line. */
    static final class Delimiter {
        private Delimiter() {
        }

        static char detect(String text, List<String> decisions) {
            String[] lines = text.split("\r\n|\r|\n", -1);
            int lineNo = 0;
            while (lineNo < lines.length && lines[lineNo].isBlank()) {
                lineNo++;
            }
            String line = lineNo < lines.length ? lines[lineNo] : "";
            int tabs = countOutsideQuotes(line, '\t');
            int semicolons = countOutsideQuotes(line, ';');
            int commas = countOutsideQuotes(line, ',');
            String counts = "(" + tabs + " tabs, " + semicolons + " semicolons, " + commas + " commas)";
            if (tabs == 0 && semicolons == 0 && commas == 0) {
                decisions.add("CSV line " + (lineNo + 1) + " holds no comma, semicolon or tab; read as one column");
                return ',';
            }
            // On a tie, tab before semicolon before comma: a comma may be a decimal comma, a tab rarely is data.
            char d;
            String word;
            if (tabs >= semicolons && tabs >= commas) {
                d = '\t';
                word = "tab";
            } else if (semicolons >= commas) {
                d = ';';
                word = "semicolon";
            } else {
                d = ',';
                word = "comma";
            }
            decisions.add("CSV delimiter: " + word + ", detected from line " + (lineNo + 1) + " " + counts);
            return d;
        }

        private static int countOutsideQuotes(String line, char c) {
            int n = 0;
            boolean quoted = false;
            for (char ch : line.toCharArray()) {
                if (ch == '"') {
                    quoted = !quoted;
                } else if (ch == c && !quoted) {
                    n++;
                }
            }
            return n;
        }
    }
}
