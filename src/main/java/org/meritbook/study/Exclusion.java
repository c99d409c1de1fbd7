package org.meritbook.study;

import java.util.Objects;

/**
 * An {@code exclude:} entry: one cell (e.g. {@code Calibration!C17}) left out of the statistics,
 * with the analyst's reason and, where the lab records them, who excluded it and when. Excluded
 * values stay in the data table, marked.
 *
 * @param sheet  sheet name
 * @param cell   A1 address within the sheet, e.g. {@code C17}
 * @param reason the reason as written (required, non-blank)
 * @param by     who excluded the point ({@code by:}), or null
 * @param on     when ({@code on:}, an ISO date), or null
 * @param line   notebook line of the entry
 */
public record Exclusion(String sheet, String cell, String reason, String by, String on, int line) {
    public Exclusion {
        Objects.requireNonNull(sheet, "sheet");
        Objects.requireNonNull(cell, "cell");
        if (reason == null || reason.isBlank()) {
            throw new IllegalArgumentException("an exclusion needs a reason");
        }
    }

    /** An entry with a reason only. */
    public Exclusion(String sheet, String cell, String reason, int line) {
        this(sheet, cell, reason, null, null, line);
    }

    /** {@code Sheet!C17}, the form used in trails and tables. */
    public String address() {
        return sheet + "!" + cell;
    }

    /** The reason as the data table shows it: with who and when, when the entry says. */
    public String shownReason() {
        if (by == null && on == null) {
            return reason;
        }
        String who = by == null ? "" : by;
        String when = on == null ? "" : on;
        String sep = by != null && on != null ? ", " : "";
        return reason + " (" + who + sep + when + ")";
    }
}
