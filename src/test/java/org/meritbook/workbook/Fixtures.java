package org.meritbook.workbook;

import java.io.IOException;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.ss.usermodel.Workbook;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.meritbook.study.DataReference;

/** Tiny workbooks written by POI into a test's temporary folder, one quirk each. */
final class Fixtures {
    private Fixtures() {
    }

    /** A formula cell's text, for {@link #row}. */
    record Formula(String text) {
    }

    interface Filler {
        void fill(Workbook wb) throws IOException;
    }

    static Path xlsx(Path dir, String fileName, Filler filler) {
        return write(new XSSFWorkbook(), dir.resolve(fileName), filler);
    }

    static Path write(Workbook wb, Path file, Filler filler) {
        try (wb; OutputStream out = Files.newOutputStream(file)) {
            filler.fill(wb);
            wb.write(out);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return file;
    }

    /** Writes values into row {@code rowNumber} (1-based, as in Excel) from column A; null leaves a cell out. */
    static Row row(Sheet sheet, int rowNumber, Object... values) {
        Row row = sheet.getRow(rowNumber - 1) == null ? sheet.createRow(rowNumber - 1) : sheet.getRow(rowNumber - 1);
        for (int c = 0; c < values.length; c++) {
            Object v = values[c];
            if (v == null) {
                continue;
            }
            Cell cell = row.createCell(c);
            if (v instanceof Number n) {
                cell.setCellValue(n.doubleValue());
            } else if (v instanceof Boolean b) {
                cell.setCellValue(b);
            } else if (v instanceof Formula f) {
                cell.setCellFormula(f.text());
            } else {
                cell.setCellValue(v.toString());
            }
        }
        return row;
    }

    /** A reference as the study parser hands it over, written on notebook line 14. */
    static DataReference ref(String target, String range) {
        String text = "runs!" + target + (range == null ? "" : "!" + range);
        return new DataReference("runs", target, range, text, 14);
    }

    /** The calibration sheet used by several tests: header in row 4, data in rows 5 to 8. */
    static void calibration(Workbook wb) {
        Sheet s = wb.createSheet("Calibration");
        row(s, 1, "Nitrite calibration");
        row(s, 2, "Analyst:", "A. Analyst");
        row(s, 4, "Level", "Nominal (mg/L)", "Peak area [mAU·s]", "Remark");
        row(s, 5, "L1", 0.05, 1210.0);
        row(s, 6, "L2", 0.10, 2405.5, "re-injected");
        row(s, 7, "L3", 0.50, 12010.0);
        row(s, 8, "L4", 1.00, 24100.0);
    }
}
