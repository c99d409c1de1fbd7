package org.meritbook.workbook;

/**
 * The fixed phrases of {@link CellValue#note()}. The block builder summarises values by these
 * phrases into {@link DataBlock#decisions()}, so they are kept in one place.
 */
final class Notes {
    static final String CACHED = "cached result of formula ";
    static final String NO_CACHED = CellValue.NO_CACHED_RESULT;
    static final String NUMBER_AS_TEXT = CellText.NUMBER_AS_TEXT;
    static final String DATE = "date cell, read as ISO date text";
    static final String ERROR = "error value";
    static final String LOGICAL = "logical value, read as text";
    static final String MERGED = "value of merged cells ";
    /** A stored value that is no number meritbook can read faithfully; the reason follows. */
    static final String UNREADABLE = "unreadable stored value: ";
    /** A formula without a stored result, evaluated by meritbook under {@code formulas: evaluate}. */
    static final String EVALUATED = "evaluated by meritbook: formula ";

    private Notes() {
    }

    /** Joins two notes, either of which may be null. */
    static String join(String first, String second) {
        if (first == null) {
            return second;
        }
        return second == null ? first : first + "; " + second;
    }
}
