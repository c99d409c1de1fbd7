package org.meritbook.workbook;

import java.time.LocalDateTime;
import java.time.LocalTime;
import java.util.Locale;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellStyle;
import org.apache.poi.ss.usermodel.CellType;
import org.apache.poi.ss.usermodel.DataFormatter;
import org.apache.poi.ss.usermodel.Date1904Support;
import org.apache.poi.ss.usermodel.DateUtil;
import org.apache.poi.ss.usermodel.FormulaError;
import org.apache.poi.xssf.usermodel.XSSFCell;

/**
 * Turns one POI cell into a {@link CellValue}. Formulas are never evaluated: the value is the
 * result Excel cached when it saved the file, so meritbook reports what the analyst saw.
 */
final class PoiCells {
    /** Display text of numbers in a fixed locale, so the same file gives the same raw text everywhere. */
    private final DataFormatter formatter = new DataFormatter(Locale.US);
    private final boolean date1904;

    PoiCells(org.apache.poi.ss.usermodel.Workbook workbook) {
        this.date1904 = workbook instanceof Date1904Support s && s.isDate1904();
    }

    CellValue read(Cell cell, CellRef ref) {
        if (cell == null) {
            return blank(ref, null);
        }
        return switch (cell.getCellType()) {
            case NUMERIC -> number(cell, ref, cell.getNumericCellValue(), null);
            case STRING -> CellText.classify(ref, cell.getStringCellValue(), null);
            case BOOLEAN -> logical(ref, cell.getBooleanCellValue(), null);
            case ERROR -> error(ref, cell.getErrorCellValue(), null);
            case FORMULA -> formula(cell, ref);
            default -> blank(ref, null);
        };
    }

    private CellValue formula(Cell cell, CellRef ref) {
        String formula = "=" + formulaText(cell);
        if (cell instanceof XSSFCell x && !x.getCTCell().isSetV()) {
            // Saved by a program that does not calculate; guessing a value would be worse than none.
            return new CellValue(ref, CellValue.Kind.TEXT, Double.NaN, formula, Notes.NO_CACHED + formula);
        }
        String note = Notes.CACHED + formula;
        CellType type = cell.getCachedFormulaResultType();
        return switch (type) {
            case NUMERIC -> number(cell, ref, cell.getNumericCellValue(), note);
            case STRING -> CellText.classify(ref, cell.getStringCellValue(), note);
            case BOOLEAN -> logical(ref, cell.getBooleanCellValue(), note);
            case ERROR -> error(ref, cell.getErrorCellValue(), note);
            default -> blank(ref, note);
        };
    }

    private static String formulaText(Cell cell) {
        try {
            return cell.getCellFormula();
        } catch (RuntimeException e) {
            // A formula POI cannot render (e.g. a damaged shared formula) still has its cached value.
            return "?";
        }
    }

    private CellValue number(Cell cell, CellRef ref, double value, String note) {
        CellStyle style = cell.getCellStyle();
        if (DateUtil.isCellDateFormatted(cell)) {
            LocalDateTime t = DateUtil.getLocalDateTime(value, date1904, true);
            if (t != null) {
                return new CellValue(ref, CellValue.Kind.TEXT, Double.NaN, iso(t, value), Notes.join(note, Notes.DATE));
            }
        }
        String shown = style == null
                ? formatter.formatRawCellContents(value, 0, "General")
                : formatter.formatRawCellContents(value, style.getDataFormat(), style.getDataFormatString());
        return new CellValue(ref, CellValue.Kind.NUMBER, value, shown, note);
    }

    /** ISO-8601: a date, a date and time, or a time alone for values below one day. */
    private static String iso(LocalDateTime t, double value) {
        if (value < 1) {
            return t.toLocalTime().toString();
        }
        return t.toLocalTime().equals(LocalTime.MIDNIGHT) ? t.toLocalDate().toString() : t.toString();
    }

    private static CellValue logical(CellRef ref, boolean value, String note) {
        return new CellValue(ref, CellValue.Kind.TEXT, Double.NaN, value ? "TRUE" : "FALSE", Notes.join(note, Notes.LOGICAL));
    }

    private static CellValue error(CellRef ref, byte code, String note) {
        String text;
        try {
            text = FormulaError.forInt(code).getString();
        } catch (IllegalArgumentException e) {
            text = "#ERROR(" + code + ")";
        }
        return new CellValue(ref, CellValue.Kind.TEXT, Double.NaN, text, Notes.join(note, Notes.ERROR));
    }

    private static CellValue blank(CellRef ref, String note) {
        return new CellValue(ref, CellValue.Kind.BLANK, Double.NaN, "", note);
    }
}
