package org.meritbook.workbook;

import java.nio.file.Path;
import java.util.List;
import java.util.stream.Collectors;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.study.DataReference;

/**
 * Every message the reader gives for a bad file or reference, in one place so the wording stays
 * stable (tests assert some of them in full).
 */
final class ReadErrors {
    private ReadErrors() {
    }

    /** "lab.xlsx, data reference 'runs!Calib!A4:C25' (notebook line 14)". */
    static String where(Path file, DataReference ref) {
        String w = fileName(file) + ", data reference '" + ref.text() + "'";
        return ref.line() > 0 ? w + " (notebook line " + ref.line() + ")" : w;
    }

    /** "data reference 'runs!Calib!A4:C25', notebook line 14", to name the block a cell-located problem belongs to. */
    static String reference(DataReference ref) {
        String w = "data reference '" + ref.text() + "'";
        return ref.line() > 0 ? w + ", notebook line " + ref.line() : w;
    }

    static String fileName(Path file) {
        Path name = file.getFileName();
        return name == null ? file.toString() : name.toString();
    }

    static InputException fileNotFound(String where, Path file, boolean isFolder) {
        return new InputException(ErrorKey.FILE_NOT_FOUND, where, "a workbook file at " + file,
                isFolder ? "a folder" : "no such file",
                "Check the path under 'sources:' in the front matter; it is resolved against the notebook's folder.");
    }

    static InputException unsupported(String where, String extension) {
        return new InputException(ErrorKey.UNSUPPORTED_FORMAT, where, "a .xlsx, .xlsm, .xls or .csv file",
                extension.isEmpty() ? "a file name without extension" : "a '." + extension + "' file",
                "Save the data as .xlsx (or export the sheet as .csv) and point the source at that file.");
    }

    static InputException encrypted(String where) {
        return new InputException(ErrorKey.ENCRYPTED_FILE, where, "a workbook without a password",
                "a password-protected (encrypted) workbook",
                "Save a copy without the password from Excel and point the source at that copy.");
    }

    static InputException corrupt(String where, String expected, String found, Throwable cause) {
        InputException e = new InputException(ErrorKey.CORRUPT_FILE, where, expected, found,
                "Open the file in Excel and save it again, or use an intact copy.");
        if (cause != null) {
            e.initCause(cause);
        }
        return e;
    }

    static InputException missingSheet(String where, String sheet, List<String> sheets) {
        return new InputException(ErrorKey.MISSING_SHEET, where, "a sheet named '" + sheet + "'",
                sheets.isEmpty() ? "a workbook without a sheet" : "only the " + plural(sheets.size(), "sheet") + " " + quoted(sheets),
                "Correct the sheet name in the data reference.");
    }

    static InputException missingName(String where, String name, SourceWorkbook wb) {
        String found = "no such name; the workbook has "
                + listing("defined names", wb.definedNames()) + ", "
                + listing("tables", wb.tableNames()) + " and "
                + listing("sheets", wb.sheetNames());
        return new InputException(ErrorKey.MISSING_NAME, where,
                "a defined name, Excel table or sheet named '" + name + "'", found,
                "Correct the name, or give a sheet and range such as Sheet1!A1:C20.");
    }

    static InputException badRange(String where, String found) {
        return new InputException(ErrorKey.BAD_CELL_ADDRESS, where,
                "a range such as A4:C25 (top-left to bottom-right cell) or whole columns such as B:C", found,
                "Correct the range in the data reference.");
    }

    static InputException badName(String where, SourceWorkbook.NamedRange name) {
        return new InputException(ErrorKey.BAD_CELL_ADDRESS, where,
                "the defined name '" + name.name() + "' to refer to one range on one sheet",
                "'" + name.refersTo() + "'",
                "Redefine the name in Excel (Formulas > Name Manager) as one range, or reference Sheet!A1:C20 directly.");
    }

    static InputException emptyRange(String where, String expected, String found, String fix) {
        return new InputException(ErrorKey.EMPTY_RANGE, where, expected, found, fix);
    }

    static String quoted(List<String> items) {
        return items.stream().map(s -> "'" + s + "'").collect(Collectors.joining(", "));
    }

    private static String listing(String what, List<String> items) {
        return items.isEmpty() ? "no " + what : what + " " + quoted(items);
    }

    private static String plural(int n, String word) {
        return n == 1 ? word : word + "s";
    }
}
