package org.meritbook.robustness;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.SplittableRandom;
import java.util.function.Consumer;
import org.apache.poi.hssf.record.crypto.Biff8EncryptionKey;
import org.apache.poi.hssf.usermodel.HSSFWorkbook;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellType;
import org.apache.poi.ss.usermodel.DataFormatter;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.ss.util.CellRangeAddress;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.meritbook.error.ErrorKey;
import org.meritbook.robustness.CorpusCase.Faithful;
import org.meritbook.robustness.CorpusCase.NotFrom;
import org.meritbook.robustness.CorpusCase.Refused;
import org.meritbook.robustness.CorpusCase.Same;

/**
 * The demo's calibration block in the other formats meritbook reads, mutated there: as a .csv file
 * (text fields: NaN, 1e309, delimiters, encodings) and as a legacy .xls workbook (binary doubles,
 * hidden rows, merged cells, encryption). Each has its own notebook and its own unmutated run.
 */
final class FormatMutations {
    static final String CSV = "cal.csv";
    static final String CSV_NOTEBOOK = "cal-csv.md";
    static final String XLS = "cal.xls";
    static final String XLS_NOTEBOOK = "cal-xls.md";
    private static final Set<ErrorKey> NOT_A_NUMBER = Set.of(ErrorKey.NOT_A_NUMBER, ErrorKey.CENSORED_VALUE);

    private final SplittableRandom random;
    /** The block A8:F31 as text fields, header first; row 21 (blank) an empty record. */
    private final List<List<String>> fields = new ArrayList<>();
    private final String csvNotebook;
    private final String xlsNotebook;
    private final byte[] xls;

    FormatMutations(Demo demo, SplittableRandom random) {
        this.random = random;
        try (XSSFWorkbook wb = new XSSFWorkbook(new ByteArrayInputStream(demo.parts.zip()))) {
            Sheet s = wb.getSheet(Demo.SHEET_NAME);
            DataFormatter text = new DataFormatter(java.util.Locale.ROOT);
            for (int r = 7; r <= 30; r++) {
                List<String> row = new ArrayList<>();
                Row sr = s.getRow(r);
                for (int c = 0; c < 6; c++) {
                    Cell cell = sr == null ? null : sr.getCell(c);
                    if (cell == null) {
                        row.add("");
                    } else if (cell.getCellType() == CellType.NUMERIC || cell.getCellType() == CellType.FORMULA) {
                        row.add(Double.toString(cell.getNumericCellValue())); // shortest text that reads back as the same double
                    } else {
                        row.add(text.formatCellValue(cell));
                    }
                }
                fields.add(sr == null ? List.of() : row);
            }
            xls = toXls(s);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        String block = demo.notebook.replace("hmf-honey-validation.xlsx", CSV)
                .replace("lab!Calibration!A8:F31", "lab!cal!A1:F24").replace("cell: Calibration!D23", "cell: cal!D16");
        // These copies hold the calibration sheet only: the demo's precision cell stays a plain text block here.
        csvNotebook = calibrationOnly(block);
        xlsNotebook = calibrationOnly(demo.notebook.replace("hmf-honey-validation.xlsx", XLS));
    }

    private static String calibrationOnly(String notebook) {
        return notebook.replace("```precision\n", "```text\n");
    }

    /** An .xls copy of the calibration sheet, values and C29's formula (with its computed result). */
    private static byte[] toXls(Sheet from) throws IOException {
        try (HSSFWorkbook wb = new HSSFWorkbook(); ByteArrayOutputStream out = new ByteArrayOutputStream()) {
            Sheet to = wb.createSheet(Demo.SHEET_NAME);
            for (Row r : from) {
                Row t = to.createRow(r.getRowNum());
                for (Cell c : r) {
                    Cell d = t.createCell(c.getColumnIndex());
                    switch (c.getCellType()) {
                        case NUMERIC -> d.setCellValue(c.getNumericCellValue());
                        case FORMULA -> d.setCellFormula(c.getCellFormula());
                        default -> d.setCellValue(c.getStringCellValue());
                    }
                }
            }
            wb.getCreationHelper().createFormulaEvaluator().evaluateAll();
            wb.write(out);
            return out.toByteArray();
        }
    }

    CorpusCase csvOriginal() {
        return csvCase("unmutated", csv(fields, ','), new Same());
    }

    CorpusCase xlsOriginal() {
        return xlsCase("unmutated", xls, xlsNotebook, new Same());
    }

    private CorpusCase csvCase(String label, byte[] csv, CorpusCase.Expectation e) {
        return csvCase(label, csv, csvNotebook, e);
    }

    private CorpusCase csvCase(String label, byte[] csv, String notebook, CorpusCase.Expectation e) {
        Map<String, byte[]> files = new LinkedHashMap<>();
        files.put(CSV_NOTEBOOK, notebook.getBytes(StandardCharsets.UTF_8));
        files.put(CSV, csv);
        return new CorpusCase("csv", label, files, CSV_NOTEBOOK, e);
    }

    private CorpusCase xlsCase(String label, byte[] workbook, String notebook, CorpusCase.Expectation e) {
        Map<String, byte[]> files = new LinkedHashMap<>();
        files.put(XLS_NOTEBOOK, notebook.getBytes(StandardCharsets.UTF_8));
        files.put(XLS, workbook);
        return new CorpusCase("xls", label, files, XLS_NOTEBOOK, e);
    }

    private static byte[] csv(List<List<String>> rows, char delimiter) {
        return csvText(rows, delimiter, "\n").getBytes(StandardCharsets.UTF_8);
    }

    private static String csvText(List<List<String>> rows, char delimiter, String newline) {
        StringBuilder sb = new StringBuilder();
        for (List<String> row : rows) {
            for (int i = 0; i < row.size(); i++) {
                String f = row.get(i);
                boolean quote = f.indexOf(delimiter) >= 0 || f.contains("\"") || f.contains("\n");
                sb.append(i == 0 ? "" : String.valueOf(delimiter)).append(quote ? "\"" + f.replace("\"", "\"\"") + "\"" : f);
            }
            sb.append(newline);
        }
        return sb.toString();
    }

    /** A used field: block row 2..24 (not the blank 14 nor the excluded 16), column C or D. */
    private int[] usedField() {
        while (true) {
            int r = 1 + random.nextInt(fields.size() - 1);
            if (!fields.get(r).isEmpty() && r != 15) {
                return new int[] {r, 2 + random.nextInt(2)};
            }
        }
    }

    private List<List<String>> with(int[] at, String value) {
        List<List<String>> copy = new ArrayList<>();
        fields.forEach(r -> copy.add(new ArrayList<>(r)));
        copy.get(at[0]).set(at[1], value);
        return copy;
    }

    private static String a1(int[] at) {
        return "cal!" + (char) ('A' + at[1]) + (at[0] + 1);
    }

    List<CorpusCase> csv(int n) {
        String[] bad = {"NaN", "INF", "-Infinity", "1e309", "-1e309", "1e-400", "abc", "<0.05", "n.d.", "", "#DIV/0!", "0,5", "1.2.3"};
        String[] valid = {"1e300", "-1e300", "1.7976931348623157E308", "4.9E-324", "1e-300"};
        List<CorpusCase> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            int[] at = usedField();
            String v = fields.get(at[0]).get(at[1]);
            switch (i % 10) {
                case 0, 1, 2 -> {
                    String b = bad[random.nextInt(bad.length)];
                    out.add(csvCase("'" + b + "' in " + a1(at), csv(with(at, b), ','), new Refused(NOT_A_NUMBER)));
                }
                case 3 -> {
                    String x = valid[random.nextInt(valid.length)];
                    out.add(csvCase(x + " in " + a1(at), csv(with(at, x), ','), new Faithful(a1(at), Double.parseDouble(x))));
                }
                case 4 -> {
                    double d = Double.parseDouble(v);
                    String same = new String[] {String.format(java.util.Locale.ROOT, "%.17g", d).trim(), " " + v + " ", "+" + v,
                        v + "0", "0" + v}[random.nextInt(5)];
                    out.add(csvCase("'" + same + "' for " + v + " in " + a1(at), csv(with(at, same), ','), new Same()));
                }
                case 5 -> out.add(csvCase("semicolons", csv(fields, ';'), new Same()));
                case 6 -> out.add(csvCase("tabs and CRLF", csvText(fields, '\t', "\r\n").getBytes(StandardCharsets.UTF_8), new Same()));
                case 7 -> out.add(csvCase("UTF-8 with BOM", ("\uFEFF" + csvText(fields, ',', "\n")).getBytes(StandardCharsets.UTF_8),
                        new Same()));
                case 8 -> out.add(csvCase("Windows-1252", csvText(fields, ',', "\r\n").getBytes(Charset.forName("windows-1252")), new Same()));
                default -> {
                    List<List<String>> rows = with(at, "<0.5");
                    out.add(csvCase("'<0.5' in " + a1(at) + ", censored: drop", csv(rows, ','),
                            Demo.withOption(csvNotebook, "censored: drop"), new NotFrom(Set.of(a1(at)), 1)));
                }
            }
        }
        out.add(csvCase("an unclosed quotation mark", csvText(fields, ',', "\n").replaceFirst("S1", "\"S1").getBytes(StandardCharsets.UTF_8),
                new Refused(Set.of(ErrorKey.CORRUPT_FILE))));
        return out;
    }

    private byte[] editedXls(Consumer<HSSFWorkbook> edit) {
        try (HSSFWorkbook wb = new HSSFWorkbook(new ByteArrayInputStream(xls)); ByteArrayOutputStream out = new ByteArrayOutputStream()) {
            edit.accept(wb);
            wb.write(out);
            return out.toByteArray();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private int usedRow() {
        List<Integer> rows = Demo.ROWS.stream().filter(r -> r != Demo.EXCLUDED_ROW).toList();
        return rows.get(random.nextInt(rows.size()));
    }

    List<CorpusCase> xls(int n) {
        List<CorpusCase> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            int row = usedRow();
            int col = 2 + random.nextInt(2);
            String a = (char) ('A' + col) + String.valueOf(row);
            switch (i % 8) {
                case 0 -> {
                    double bad = new double[] {Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY}[random.nextInt(3)];
                    out.add(xlsCase(bad + " stored in " + a, editedXls(wb -> cellAt(wb, row, col).setCellValue(bad)), xlsNotebook,
                            new Refused(NOT_A_NUMBER)));
                }
                case 1 -> out.add(xlsCase("text in " + a, editedXls(wb -> cellAt(wb, row, col).setCellValue("n.d.")), xlsNotebook,
                        new Refused(NOT_A_NUMBER)));
                case 2 -> out.add(xlsCase("error value in " + a,
                        editedXls(wb -> cellAt(wb, row, col).setCellErrorValue(org.apache.poi.ss.usermodel.FormulaError.NA.getCode())),
                        xlsNotebook, new Refused(NOT_A_NUMBER)));
                case 3 -> out.add(xlsCase("hidden row " + row, editedXls(wb -> wb.getSheetAt(0).getRow(row - 1).setZeroHeight(true)),
                        xlsNotebook, new Refused(Set.of(ErrorKey.HIDDEN_CELLS))));
                case 4 -> out.add(xlsCase("hidden row " + row + ", hidden: leave-out",
                        editedXls(wb -> wb.getSheetAt(0).getRow(row - 1).setZeroHeight(true)),
                        Demo.withOption(xlsNotebook, "hidden: leave-out"), new NotFrom(Demo.addresses("C" + row, "D" + row), 1)));
                case 5 -> out.add(xlsCase("nominal C9:C11 merged", editedXls(wb -> {
                    Sheet s = wb.getSheetAt(0);
                    s.getRow(9).getCell(2).setBlank();
                    s.getRow(10).getCell(2).setBlank();
                    s.addMergedRegion(new CellRangeAddress(8, 10, 2, 2));
                }), xlsNotebook, new Refused(Set.of(ErrorKey.MERGED_VALUE))));
                case 6 -> out.add(xlsCase(".xls content named .xls, a note changed",
                        editedXls(wb -> cellAt(wb, row, 5).setCellValue("Проба " + row)), xlsNotebook, new Same()));
                default -> out.add(xlsCase("huge " + a, editedXls(wb -> cellAt(wb, row, col).setCellValue(1e300)), xlsNotebook,
                        new Faithful(Demo.address(a), 1e300)));
            }
        }
        out.add(xlsCase("cut short", java.util.Arrays.copyOf(xls, xls.length / 2), xlsNotebook, new Refused(Set.of(ErrorKey.CORRUPT_FILE))));
        out.add(xlsCase("password-protected (FILEPASS)", encryptedXls(), xlsNotebook, new Refused(Set.of(ErrorKey.ENCRYPTED_FILE))));
        return out;
    }

    private static Cell cellAt(HSSFWorkbook wb, int row, int col) {
        Row r = wb.getSheetAt(0).getRow(row - 1);
        Cell c = r.getCell(col);
        return c == null ? r.createCell(col) : c;
    }

    private byte[] encryptedXls() {
        Biff8EncryptionKey.setCurrentUserPassword("Fenwick");
        try {
            return editedXls(wb -> { });
        } finally {
            Biff8EncryptionKey.setCurrentUserPassword(null);
        }
    }
}
