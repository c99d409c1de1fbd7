package org.meritbook.error;

/**
 * Stable keys for every input problem meritbook reports. Tests assert on the key and the
 * location, never on incidental wording; the wording lives in {@link Problem}.
 */
public enum ErrorKey {
    // study notebook
    NOTEBOOK_UNREADABLE,
    NOTEBOOK_SYNTAX,
    FRONT_MATTER,
    UNKNOWN_KIND,
    UNKNOWN_OPTION,
    MISSING_OPTION,
    BAD_OPTION_VALUE,
    DUPLICATE_ID,
    UNKNOWN_REFERENCE,
    UNDECLARED_SOURCE,
    BAD_DATA_REFERENCE,
    // workbooks
    FILE_NOT_FOUND,
    CORRUPT_FILE,
    ENCRYPTED_FILE,
    UNSUPPORTED_FORMAT,
    MISSING_SHEET,
    MISSING_NAME,
    MISSING_COLUMN,
    EMPTY_RANGE,
    NOT_A_NUMBER,
    CENSORED_VALUE,
    FORMULA_WITHOUT_RESULT,
    FORMULA_NOT_EVALUATED,
    HIDDEN_CELLS,
    MERGED_VALUE,
    MALFORMED_SHEET,
    WORKBOOK_TOO_LARGE,
    BAD_CELL_ADDRESS,
    /** A used row whose grouping label (level, group, sample) is empty. */
    MISSING_LABEL,
    // data that cannot support a method
    TOO_FEW_POINTS,
    ZERO_VARIANCE,
    NON_POSITIVE_WEIGHT_BASIS,
    /** A known (nominal, added) value of 0: a recovery relative to it is undefined. */
    ZERO_KNOWN_VALUE,
    /** Values a statistic cannot take at all (non-finite, or beyond double precision's squares). */
    UNUSABLE_VALUES,
    // command line
    /** One notebook file given twice to a batch run. */
    REPEATED_NOTEBOOK,
    /** Two notebooks of a batch run that would publish into one study folder (one revision history). */
    SHARED_STUDY_FOLDER,
    // outputs
    OUTPUT_EXISTS,
    /** The output folder or file cannot be written where the user's environment puts it. */
    OUTPUT_NOT_WRITABLE
}
