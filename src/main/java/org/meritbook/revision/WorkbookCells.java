package org.meritbook.revision;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellType;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.ss.usermodel.Workbook;
import org.apache.poi.ss.usermodel.WorkbookFactory;
import org.apache.poi.ss.util.CellReference;

/**
 * The first cell in which two copies of a workbook differ, for {@code verify --against}: the copy a
 * dossier carries and the lab's current one. Cells are compared by what they hold (number, text,
 * boolean, error, a formula with its cached result), sheet by sheet, row by row.
 */
final class WorkbookCells {
    private WorkbookCells() {
    }

    /**
     * @param sheetForCsv the sheet name a CSV file is read under (its file name without extension)
     * @return e.g. {@code "Calibration!D16: 21.08 in the dossier, 21.8 in the folder"}, or empty when every
     *         cell agrees (the files then differ only in formatting or metadata)
     */
    static Optional<String> firstDifference(byte[] dossier, byte[] folder, String extension, String sheetForCsv) {
        if (extension.equals("csv")) {
            return csv(dossier, folder, sheetForCsv);
        }
        try (Workbook a = WorkbookFactory.create(new ByteArrayInputStream(dossier));
             Workbook b = WorkbookFactory.create(new ByteArrayInputStream(folder))) {
            return excel(a, b);
        } catch (IOException | RuntimeException e) {
            return Optional.of("the two copies cannot be compared cell by cell (" + e.getClass().getSimpleName() + ")");
        }
    }

    private static Optional<String> excel(Workbook a, Workbook b) {
        for (int s = 0; s < a.getNumberOfSheets(); s++) {
            Sheet sa = a.getSheetAt(s);
            Sheet sb = b.getSheet(sa.getSheetName());
            if (sb == null) {
                return Optional.of("sheet '" + sa.getSheetName() + "' is in the dossier's copy only");
            }
            int rows = Math.max(sa.getLastRowNum(), sb.getLastRowNum());
            for (int r = 0; r <= rows; r++) {
                Row ra = sa.getRow(r);
                Row rb = sb.getRow(r);
                int cols = Math.max(ra == null ? 0 : ra.getLastCellNum(), rb == null ? 0 : rb.getLastCellNum());
                for (int c = 0; c < cols; c++) {
                    String va = value(ra == null ? null : ra.getCell(c));
                    String vb = value(rb == null ? null : rb.getCell(c));
                    if (!va.equals(vb)) {
                        return Optional.of(sa.getSheetName() + "!" + new CellReference(r, c).formatAsString(false)
                                + ": " + shown(va) + " in the dossier, " + shown(vb) + " in the folder");
                    }
                }
            }
        }
        for (int s = 0; s < b.getNumberOfSheets(); s++) {
            if (a.getSheet(b.getSheetName(s)) == null) {
                return Optional.of("sheet '" + b.getSheetName(s) + "' is in the folder's copy only");
            }
        }
        return Optional.empty();
    }

    private static String value(Cell cell) {
        if (cell == null) {
            return "";
        }
        CellType type = cell.getCellType();
        String formula = "";
        if (type == CellType.FORMULA) {
            formula = "=" + cell.getCellFormula() + " → ";
            type = cell.getCachedFormulaResultType();
        }
        return formula + switch (type) {
            case NUMERIC -> String.valueOf(cell.getNumericCellValue());
            case STRING -> "\"" + cell.getStringCellValue() + "\"";
            case BOOLEAN -> String.valueOf(cell.getBooleanCellValue());
            case ERROR -> "error " + cell.getErrorCellValue();
            default -> "";
        };
    }

    private static Optional<String> csv(byte[] dossier, byte[] folder, String sheet) {
        List<List<String>> a = rows(dossier);
        List<List<String>> b = rows(folder);
        for (int r = 0; r < Math.max(a.size(), b.size()); r++) {
            List<String> ra = r < a.size() ? a.get(r) : List.of();
            List<String> rb = r < b.size() ? b.get(r) : List.of();
            for (int c = 0; c < Math.max(ra.size(), rb.size()); c++) {
                String va = c < ra.size() ? ra.get(c) : "";
                String vb = c < rb.size() ? rb.get(c) : "";
                if (!va.equals(vb)) {
                    return Optional.of(sheet + "!" + new CellReference(r, c).formatAsString(false) + ": " + shown(va)
                            + " in the dossier, " + shown(vb) + " in the folder");
                }
            }
        }
        return Optional.empty();
    }

    private static List<List<String>> rows(byte[] bytes) {
        String text = new String(bytes, StandardCharsets.UTF_8);
        String firstLine = text.lines().findFirst().orElse("");
        char delimiter = ',';
        long best = firstLine.chars().filter(ch -> ch == ',').count();
        for (char d : new char[] {';', '\t'}) {
            long n = firstLine.chars().filter(ch -> ch == d).count();
            if (n > best) {
                best = n;
                delimiter = d;
            }
        }
        List<List<String>> out = new ArrayList<>();
        try {
            for (CSVRecord rec : CSVFormat.DEFAULT.builder().setDelimiter(delimiter).get().parse(new StringReader(text))) {
                out.add(rec.toList());
            }
        } catch (IOException | RuntimeException e) {
            out.clear();
            text.lines().forEach(l -> out.add(List.of(l)));
        }
        return out;
    }

    private static String shown(String v) {
        return v.isEmpty() ? "empty" : v;
    }
}
