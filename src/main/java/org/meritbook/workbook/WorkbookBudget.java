package org.meritbook.workbook;

import java.util.Locale;
import java.util.Map;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;

/**
 * How much of one workbook meritbook agrees to hold in memory, checked before the workbook is
 * parsed, so that a small file cannot make the reader run out of memory or time.
 *
 * <p>The defaults come from a measurement (docs/workbooks.md): POI holds about 720 bytes of heap per
 * .xlsx cell (a million numbers took 722 MB) and text about five times its size (178 MB of strings
 * took 869 MB); either fits the 2 GB heap Java gives itself on an 8 GB machine. A million cells also
 * holds a 200,000-row block of several columns; the sheet XML of a million numbers is about 45 MB, so
 * 200 MB of uncompressed parts leaves room for text, styles and images.
 *
 * @param maxBytes the largest total size of the workbook's parts once uncompressed (an .xlsx's zip
 *                 entries, counted as they are actually inflated; the file itself for .xls and .csv)
 * @param maxCells the largest number of cells: every cell element of every sheet plus every entry of
 *                 the shared-string table (.xlsx), every cell (.xls), every field (.csv)
 */
public record WorkbookBudget(long maxBytes, long maxCells) {
    /** Environment variable: the byte budget in megabytes (10^6 bytes). */
    public static final String BYTES_VARIABLE = "MERITBOOK_MAX_WORKBOOK_MB";
    /** Environment variable: the cell budget. */
    public static final String CELLS_VARIABLE = "MERITBOOK_MAX_WORKBOOK_CELLS";
    public static final long DEFAULT_MB = 200;
    public static final long DEFAULT_CELLS = 1_000_000;
    public static final WorkbookBudget DEFAULT = new WorkbookBudget(DEFAULT_MB * 1_000_000, DEFAULT_CELLS);

    private static final long MB = 1_000_000;

    public WorkbookBudget {
        if (maxBytes <= 0 || maxCells <= 0) {
            throw new IllegalArgumentException("a workbook budget must be positive: " + maxBytes + " bytes, " + maxCells + " cells");
        }
    }

    /** The budget the environment sets, each limit defaulting when its variable is not set. */
    public static WorkbookBudget fromEnvironment() {
        return from(System.getenv());
    }

    static WorkbookBudget from(Map<String, String> environment) {
        long mb = positive(environment, BYTES_VARIABLE, DEFAULT_MB, "a whole number of megabytes");
        long cells = positive(environment, CELLS_VARIABLE, DEFAULT_CELLS, "a whole number of cells");
        if (mb > Long.MAX_VALUE / MB) {
            throw badVariable(BYTES_VARIABLE, environment.get(BYTES_VARIABLE), "a whole number of megabytes");
        }
        return new WorkbookBudget(mb * MB, cells);
    }

    private static long positive(Map<String, String> environment, String name, long fallback, String expected) {
        String text = environment.get(name);
        if (text == null || text.isBlank()) {
            return fallback;
        }
        try {
            long v = Long.parseLong(text.strip().replace("_", ""));
            if (v > 0) {
                return v;
            }
        } catch (NumberFormatException e) {
            // reported below, with the text as written
        }
        throw badVariable(name, text, expected);
    }

    private static InputException badVariable(String name, String text, String expected) {
        return new InputException(ErrorKey.BAD_OPTION_VALUE, "environment variable " + name,
                expected + " greater than 0", "'" + text + "'",
                "Set it to a number such as " + name + "=" + (name.equals(BYTES_VARIABLE) ? DEFAULT_MB * 2 : DEFAULT_CELLS * 2)
                        + ", or unset it for the default.");
    }

    /** "200 MB uncompressed and 1,000,000 cells", for messages. */
    String describe() {
        return megabytes(maxBytes) + " uncompressed and " + String.format(Locale.ROOT, "%,d", maxCells) + " cells";
    }

    static String megabytes(long bytes) {
        return bytes % MB == 0 ? bytes / MB + " MB" : String.format(Locale.ROOT, "%.1f MB", bytes / (double) MB);
    }

    /** A workbook over the byte budget. */
    InputException tooManyBytes(String where, String found) {
        return exceeded(where, found, BYTES_VARIABLE, megabytesToAsk());
    }

    /** A workbook over the cell budget. */
    InputException tooManyCells(String where, String found) {
        return exceeded(where, found, CELLS_VARIABLE, String.valueOf(maxCells * 2));
    }

    private String megabytesToAsk() {
        return String.valueOf(Math.max(1, maxBytes / MB) * 2);
    }

    private InputException exceeded(String where, String found, String variable, String example) {
        return new InputException(ErrorKey.WORKBOOK_TOO_LARGE, where,
                "a workbook within meritbook's reading budget of " + describe(), found,
                "If the workbook is genuine, raise the limit with the environment variable " + variable + " (e.g. "
                        + variable + "=" + example + ") and give Java the memory it needs (e.g. MERITBOOK_JAVA_OPTS=-Xmx4g); "
                        + "or read the block from a copy of the workbook that holds only the data the study needs.");
    }
}
