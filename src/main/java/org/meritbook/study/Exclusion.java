package org.meritbook.study;

import java.util.Objects;

/**
 * An {@code exclude:} entry: one cell (e.g. {@code Calibration!C17}) left out of the statistics,
 * with the analyst's reason. Excluded values stay in the data table, marked.
 *
 * @param sheet  sheet name
 * @param cell   A1 address within the sheet, e.g. {@code C17}
 * @param reason the reason as written (required, non-blank)
 * @param line   notebook line of the entry
 */
public record Exclusion(String sheet, String cell, String reason, int line) {
    public Exclusion {
        Objects.requireNonNull(sheet, "sheet");
        Objects.requireNonNull(cell, "cell");
        if (reason == null || reason.isBlank()) {
            throw new IllegalArgumentException("an exclusion needs a reason");
        }
    }

    /** {@code Sheet!C17}, the form used in trails and tables. */
    public String address() {
        return sheet + "!" + cell;
    }
}
