package org.meritbook.workbook;

import java.util.Objects;

/**
 * One value read from a cell, with its address and the text as the workbook showed it.
 *
 * @param ref    where it came from
 * @param kind   what the cell held
 * @param number the numeric value for {@link Kind#NUMBER}; for {@link Kind#CENSORED} the stated
 *               limit (0.05 for "&lt;0.05"), NaN when no limit is stated ("n.d."); NaN otherwise
 * @param raw    the cell's text as displayed or stored (never null; "" for blank cells)
 * @param note   how the value was obtained when not a plain number cell, e.g.
 *               "cached result of formula =AVERAGE(B2:B4)" or "number stored as text"; null otherwise
 */
public record CellValue(CellRef ref, Kind kind, double number, String raw, String note) {

    /** What a cell held. Censored and text values are never silently read as numbers. */
    public enum Kind {
        NUMBER,
        /** a censored result: "&lt;0.05", "&gt;200", "n.d.", "ND", "BLQ" */
        CENSORED,
        /** any other text, including error values such as "#DIV/0!" */
        TEXT,
        BLANK
    }

    public CellValue {
        Objects.requireNonNull(ref, "ref");
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(raw, "raw");
        if (kind == Kind.NUMBER && !Double.isFinite(number)) {
            throw new IllegalArgumentException(ref.address() + ": a NUMBER cell needs a finite value");
        }
    }

    /** Start of the note on a formula cell the workbook was saved without a computed value for. */
    public static final String NO_CACHED_RESULT = "no cached result of formula ";

    public boolean isNumber() {
        return kind == Kind.NUMBER;
    }

    /**
     * True for a formula cell saved without its computed value (a file written by a program that
     * does not calculate): the reader cannot know the number, so the value is TEXT holding the formula.
     */
    public boolean isFormulaWithoutResult() {
        return kind == Kind.TEXT && note != null && note.startsWith(NO_CACHED_RESULT);
    }
}
