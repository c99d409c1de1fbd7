package org.meritbook.workbook;

import java.time.LocalDateTime;
import java.time.LocalTime;
import java.util.Locale;
import java.util.function.Supplier;
import javax.xml.namespace.QName;
import org.apache.poi.ss.formula.FormulaParseException;
import org.apache.poi.ss.formula.FormulaParser;
import org.apache.poi.ss.formula.FormulaType;
import org.apache.poi.ss.formula.eval.NotImplementedFunctionException;
import org.apache.poi.ss.formula.ptg.AreaPtgBase;
import org.apache.poi.ss.formula.ptg.Ptg;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellStyle;
import org.apache.poi.ss.usermodel.DataFormatter;
import org.apache.poi.ss.usermodel.Date1904Support;
import org.apache.poi.ss.usermodel.DateUtil;
import org.apache.poi.ss.usermodel.FormulaError;
import org.apache.poi.ss.usermodel.FormulaEvaluator;
import org.apache.poi.ss.usermodel.Workbook;
import org.apache.poi.xssf.model.SharedStrings;
import org.apache.poi.xssf.usermodel.XSSFCell;
import org.apache.poi.xssf.usermodel.XSSFEvaluationWorkbook;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.apache.xmlbeans.XmlCursor;
import org.openxmlformats.schemas.spreadsheetml.x2006.main.CTCell;

/**
 * Turns one POI cell into a {@link CellValue}. A formula's value is the result the spreadsheet
 * program stored when it saved the file, so meritbook reports what the analyst saw; a formula saved
 * without one is marked as such and evaluated only on request ({@link #evaluate}).
 *
 * <p>For .xlsx cells the stored text is read as written, not through POI's lenient conversions,
 * which read an empty value as 0, "NaN" as NaN and "1e309" as infinity: such a value becomes an
 * unreadable cell with its reason, reported if a method needs it as a number.
 */
final class PoiCells {
    /** Display text of numbers in a fixed locale, so the same file gives the same raw text everywhere. */
    private final DataFormatter formatter = new DataFormatter(Locale.US);
    private final Workbook workbook;
    private final boolean date1904;
    private final long maxReferencedCells;
    private FormulaEvaluator evaluator;
    /** Shared strings as read, by index (the ref of the first cell that used each). */
    private final java.util.Map<Integer, CellValue> sharedRead = new java.util.HashMap<>();
    /** The number facts of each cell style met, by the style's index. */
    private final java.util.Map<Integer, NumberStyle> numberStyles = new java.util.HashMap<>();

    /**
     * @param maxReferencedCells the most cells one evaluated formula may refer to (a formula over
     *                           whole columns of a large range would otherwise take minutes)
     */
    PoiCells(Workbook workbook, long maxReferencedCells) {
        this.workbook = workbook;
        this.date1904 = workbook instanceof Date1904Support s && s.isDate1904();
        this.maxReferencedCells = maxReferencedCells;
    }

    CellValue read(Cell cell, CellRef ref) {
        if (cell == null) {
            return blank(ref, null);
        }
        try {
            return cell instanceof XSSFCell x ? stored(new XssfStored(x), ref) : binary(cell, ref);
        } catch (RuntimeException e) {
            // A cell POI cannot read (a shared string past the table's end, a damaged record): located, never guessed.
            return CellText.unreadable(ref, "", "a cell that cannot be read (" + e.getClass().getSimpleName() + ")", null);
        }
    }

    /** A cell of a sheet read by streaming ({@link StreamedSheet}), by the same rules as a POI cell. */
    CellValue read(StoredCell cell, CellRef ref) {
        if (cell == null) {
            return blank(ref, null);
        }
        try {
            return stored(cell, ref);
        } catch (RuntimeException e) {
            return CellText.unreadable(ref, "", "a cell that cannot be read (" + e.getClass().getSimpleName() + ")", null);
        }
    }

    /** An .xls cell: binary records, numbers as doubles. */
    private CellValue binary(Cell cell, CellRef ref) {
        return switch (cell.getCellType()) {
            case NUMERIC -> number(cell::getCellStyle, ref, cell.getNumericCellValue(), null);
            case STRING -> CellText.classify(ref, cell.getStringCellValue(), null);
            case BOOLEAN -> logical(ref, cell.getBooleanCellValue(), null);
            case ERROR -> error(ref, cell.getErrorCellValue(), null);
            case FORMULA -> cachedBinary(cell, ref);
            default -> blank(ref, null);
        };
    }

    private CellValue cachedBinary(Cell cell, CellRef ref) {
        String formula = "=" + formulaText(cell);
        String note = Notes.CACHED + formula;
        return switch (cell.getCachedFormulaResultType()) {
            case NUMERIC -> number(cell::getCellStyle, ref, cell.getNumericCellValue(), note);
            case STRING -> CellText.classify(ref, cell.getStringCellValue(), note);
            case BOOLEAN -> logical(ref, cell.getBooleanCellValue(), note);
            case ERROR -> error(ref, cell.getErrorCellValue(), note);
            default -> blank(ref, note);
        };
    }

    /** An .xlsx cell, read from its stored XML: type attribute {@code t}, value {@code v}, formula {@code f}. */
    private CellValue stored(StoredCell cell, CellRef ref) {
        String t = cell.type();
        String note = null;
        if (cell.hasFormula()) {
            String formula = "=" + formulaText(cell);
            boolean textResult = t.equals("str") || t.equals("s") || t.equals("inlineStr");
            // openpyxl and other writers that do not calculate store <f> with no <v>, or an empty <v>.
            if (!cell.hasValue() || (cell.value().isEmpty() && !textResult)) {
                return new CellValue(ref, CellValue.Kind.TEXT, Double.NaN, formula, Notes.NO_CACHED + formula);
            }
            note = Notes.CACHED + formula;
        }
        String v = cell.hasValue() ? cell.value() : null;
        return switch (t) {
            case "n" -> storedNumber(cell, ref, v, note);
            case "e" -> storedError(ref, v == null ? "" : v.strip(), note);
            case "b" -> {
                String b = v == null ? "" : v.strip();
                yield b.equals("0") || b.equals("1") ? logical(ref, b.equals("1"), note)
                        : CellText.unreadable(ref, b, "a logical cell whose stored value '" + b + "' is neither 0 nor 1", note);
            }
            // An ISO 8601 date stored as text (strict OOXML); a date is never a measurement.
            case "d" -> new CellValue(ref, CellValue.Kind.TEXT, Double.NaN, v == null ? "" : v.strip(), Notes.join(note, Notes.DATE));
            case "s" -> note == null ? sharedString(ref, v) : CellText.classify(ref, cell.text(), note);
            case "str", "inlineStr" -> CellText.classify(ref, cell.text(), note);
            default -> CellText.unreadable(ref, v == null ? "" : v.strip(), "a cell of the unknown type '" + t + "'", note);
        };
    }

    /** A POI usermodel cell seen as its stored XML. */
    private static final class XssfStored implements StoredCell {
        private final XSSFCell cell;
        private final CTCell ct;

        XssfStored(XSSFCell cell) {
            this.cell = cell;
            this.ct = cell.getCTCell();
        }

        /** The cell's {@code t} attribute as written ("n" when absent); read as text, since POI's enum lacks some types. */
        @Override
        public String type() {
            if (!ct.isSetT()) {
                return "n";
            }
            try (XmlCursor c = ct.newCursor()) {
                String t = c.getAttributeText(new QName("", "t"));
                return t == null ? "n" : t.strip();
            }
        }

        @Override
        public boolean hasFormula() {
            return ct.isSetF();
        }

        @Override
        public String formula() {
            return cell.getCellFormula();
        }

        @Override
        public boolean hasValue() {
            return ct.isSetV();
        }

        @Override
        public String value() {
            return ct.getV();
        }

        @Override
        public String text() {
            return cell.getStringCellValue();
        }

        @Override
        public CellStyle style() {
            return cell.getCellStyle();
        }
    }

    /** A shared string by its index, checked: POI shows an index past the table's end as an empty cell. */
    private CellValue sharedString(CellRef ref, String v) {
        String index = v == null ? "" : v.strip();
        SharedStrings table = ((XSSFWorkbook) workbook).getSharedStringSource();
        if (!sharedIndex(index) || table == null || Integer.parseInt(index) >= table.getUniqueCount()) {
            return CellText.unreadable(ref, index, "a reference '" + index + "' to a shared string the workbook does not hold", null);
        }
        // A label repeats on many rows; its reading depends on the text alone, so it is classified once per string.
        CellValue once = sharedRead.computeIfAbsent(Integer.parseInt(index),
                i -> CellText.classify(ref, table.getItemAt(i).getString(), null));
        return once.ref().equals(ref) ? once : new CellValue(ref, once.kind(), once.number(), once.raw(), once.note());
    }

    /** Like {@code index.matches("[0-9]{1,9}")}, which compiled a pattern per cell. */
    private static boolean sharedIndex(String index) {
        if (index.isEmpty() || index.length() > 9) {
            return false;
        }
        for (int i = 0; i < index.length(); i++) {
            if (index.charAt(i) < '0' || index.charAt(i) > '9') {
                return false;
            }
        }
        return true;
    }

    private CellValue storedNumber(StoredCell cell, CellRef ref, String v, String note) {
        if (v == null) {
            return blank(ref, note);
        }
        if (v.isBlank()) {
            return CellText.unreadable(ref, "", "a number cell whose stored value is empty", note);
        }
        StoredNumber.Parsed n = StoredNumber.parse(v);
        if (!n.ok()) {
            return CellText.unreadable(ref, v.strip(), n.problem() != null ? n.problem()
                    : "the stored number '" + v.strip() + "', which is not a number", note);
        }
        return number(cell::style, ref, n.value(), v.strip(), note);
    }

    private static CellValue storedError(CellRef ref, String v, String note) {
        try {
            FormulaError known = FormulaError.forString(v);
            return new CellValue(ref, CellValue.Kind.TEXT, Double.NaN, known.getString(), Notes.join(note, Notes.ERROR));
        } catch (IllegalArgumentException e) {
            return CellText.unreadable(ref, v, "the unknown error value '" + v + "'", note);
        }
    }

    private static String formulaText(Cell cell) {
        try {
            return cell.getCellFormula();
        } catch (RuntimeException e) {
            // A formula POI cannot render (e.g. a damaged shared formula) still has its cached value.
            return "?";
        }
    }

    private static String formulaText(StoredCell cell) {
        try {
            return cell.formula();
        } catch (RuntimeException e) {
            return "?";
        }
    }

    private CellValue number(Supplier<CellStyle> styleOf, CellRef ref, double value, String note) {
        return number(styleOf, ref, value, null, note);
    }

    /** @param stored the text the sheet stored the value as, when it was read from one; else null */
    private CellValue number(Supplier<CellStyle> styleOf, CellRef ref, double value, String stored, String note) {
        if (!Double.isFinite(value)) {
            return CellText.unreadable(ref, String.valueOf(value), "the stored value " + value + ", which is not a finite number", note);
        }
        NumberStyle style = numberStyle(styleOf.get());
        if (style != null && style.date() && DateUtil.isValidExcelDate(value)) {
            LocalDateTime t = DateUtil.getLocalDateTime(value, date1904, true);
            if (t != null) {
                return new CellValue(ref, CellValue.Kind.TEXT, Double.NaN, iso(t, value), Notes.join(note, Notes.DATE));
            }
        }
        String shown = style == null || style.general() ? GeneralNumber.plain(value, stored) : null;
        if (shown == null) {
            shown = style == null
                    ? formatter.formatRawCellContents(value, 0, "General")
                    : formatter.formatRawCellContents(value, style.format(), style.text());
        }
        return new CellValue(ref, CellValue.Kind.NUMBER, value, shown, note);
    }

    /**
     * What a cell style says about showing a number, read once per style: POI reads a style's number
     * format from the style's XML on every call, and a block has 100,000 numbers in a few styles.
     */
    private NumberStyle numberStyle(CellStyle style) {
        if (style == null) {
            return null;
        }
        // A style's index names it within its workbook (POI makes a new style object per call).
        return numberStyles.computeIfAbsent((int) style.getIndex(), i -> {
            short format = style.getDataFormat();
            String text = style.getDataFormatString();
            // POI's date test runs several regular expressions: once per style, not per number.
            return new NumberStyle(format, text, DateUtil.isADateFormat(format, text), GeneralNumber.isGeneral(text));
        });
    }

    /** A style's number format, whether it shows dates, and whether it is "General". */
    private record NumberStyle(short format, String text, boolean date, boolean general) {
    }

    /**
     * Evaluates a formula cell the workbook holds no result for, with POI's formula evaluator.
     *
     * @return the value, noted as evaluated by meritbook with its formula
     * @throws FormulaFailure an unsupported function, a reference to another workbook, an error
     *                        result, or a formula over more cells than the budget allows
     */
    CellValue evaluate(Cell cell, CellRef ref) throws FormulaFailure {
        String formula = "=" + formulaText(cell);
        String note = Notes.EVALUATED + formula;
        checkReferencedArea(cell, formula);
        org.apache.poi.ss.usermodel.CellValue v;
        try {
            v = evaluator().evaluate(cell);
        } catch (StackOverflowError e) {
            throw new FormulaFailure("the formula " + formula + ", which depends on a chain of formulas too long to evaluate");
        } catch (RuntimeException e) {
            throw new FormulaFailure("the formula " + formula + ", which " + whyNot(e, formula));
        }
        if (v == null) {
            throw new FormulaFailure("the formula " + formula + ", which evaluates to nothing");
        }
        return switch (v.getCellType()) {
            case NUMERIC -> {
                CellValue n = number(cell::getCellStyle, ref, v.getNumberValue(), note);
                if (!n.isNumber() && n.note().contains(Notes.UNREADABLE)) {
                    throw new FormulaFailure("the formula " + formula + ", which evaluates to " + v.getNumberValue());
                }
                yield n;
            }
            case STRING -> CellText.classify(ref, v.getStringValue(), note);
            case BOOLEAN -> logical(ref, v.getBooleanValue(), note);
            case ERROR -> throw new FormulaFailure("the formula " + formula + ", which evaluates to the error "
                    + errorText(v.getErrorValue()));
            default -> throw new FormulaFailure("the formula " + formula + ", which evaluates to nothing");
        };
    }

    private FormulaEvaluator evaluator() {
        if (evaluator == null) {
            evaluator = workbook.getCreationHelper().createFormulaEvaluator();
        }
        return evaluator;
    }

    /** Refuses a formula whose ranges together cover more cells than the budget, before POI walks them. */
    private void checkReferencedArea(Cell cell, String formula) throws FormulaFailure {
        if (!(workbook instanceof XSSFWorkbook x)) {
            return;
        }
        Ptg[] tokens;
        try {
            tokens = FormulaParser.parse(formulaText(cell), XSSFEvaluationWorkbook.create(x), FormulaType.CELL,
                    workbook.getSheetIndex(cell.getSheet()), cell.getRowIndex());
        } catch (FormulaParseException | IllegalStateException e) {
            throw new FormulaFailure("the formula " + formula + ", which cannot be read (" + clean(e.getMessage()) + ")");
        }
        long cells = 0;
        for (Ptg p : tokens) {
            if (p instanceof AreaPtgBase a) {
                cells += (long) (a.getLastRow() - a.getFirstRow() + 1) * (a.getLastColumn() - a.getFirstColumn() + 1);
            }
        }
        if (cells > maxReferencedCells) {
            throw new FormulaFailure("the formula " + formula + ", which refers to " + String.format(Locale.ROOT, "%,d", cells)
                    + " cells, more than the " + String.format(Locale.ROOT, "%,d", maxReferencedCells) + " meritbook evaluates");
        }
    }

    /** "[1]Sheet1!A1", "'[Book2.xlsx]Data'!B4": a sheet of another workbook (a table's "T[Col]" has no '!'). */
    private static final java.util.regex.Pattern EXTERNAL = java.util.regex.Pattern.compile("\\[[^\\]]*\\][^!\\[\\]]*!");

    private static String whyNot(RuntimeException e, String formula) {
        if (EXTERNAL.matcher(formula).find()) {
            return "refers to another workbook, which meritbook does not open";
        }
        for (Throwable t = e; t != null; t = t.getCause()) {
            if (t instanceof NotImplementedFunctionException f) {
                return "uses the function " + f.getFunctionName() + ", which meritbook cannot evaluate";
            }
        }
        Throwable root = e;
        while (root.getCause() != null && root.getCause() != root) {
            root = root.getCause();
        }
        return "cannot be evaluated (" + root.getClass().getSimpleName()
                + (root.getMessage() == null ? "" : ": " + clean(root.getMessage())) + ")";
    }

    private static String clean(String message) {
        if (message == null) {
            return "";
        }
        String m = message.replaceAll("\\s+", " ").strip();
        return m.length() > 160 ? m.substring(0, 160) + "…" : m;
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
        try {
            String text = FormulaError.forInt(code).getString();
            return new CellValue(ref, CellValue.Kind.TEXT, Double.NaN, text, Notes.join(note, Notes.ERROR));
        } catch (IllegalArgumentException e) {
            return CellText.unreadable(ref, "#ERROR(" + code + ")", "the unknown error code " + code, note);
        }
    }

    private static String errorText(byte code) {
        try {
            return FormulaError.forInt(code).getString();
        } catch (IllegalArgumentException e) {
            return "#ERROR(" + code + ")";
        }
    }

    private static CellValue blank(CellRef ref, String note) {
        return new CellValue(ref, CellValue.Kind.BLANK, Double.NaN, "", note);
    }
}
