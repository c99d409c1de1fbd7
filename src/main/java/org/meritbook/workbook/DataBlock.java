package org.meritbook.workbook;

import java.nio.file.Path;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * A rectangular block of data read from a workbook: a header row and aligned data columns, every
 * value keeping its cell address.
 *
 * @param file      the workbook file it was read from
 * @param sheet     the sheet name
 * @param range     the A1 range actually read including the header, e.g. {@code A4:C25}
 * @param columns   the columns, left to right
 * @param decisions what the reader decided on the user's behalf, in plain words, for the trail
 *                  (e.g. "skipped blank row 12", "used cached formula results in C5:C11",
 *                  "header taken from merged cells A3:A4")
 */
public record DataBlock(Path file, String sheet, String range, List<Column> columns, List<String> decisions) {
    public DataBlock {
        Objects.requireNonNull(file, "file");
        Objects.requireNonNull(sheet, "sheet");
        Objects.requireNonNull(range, "range");
        columns = List.copyOf(columns);
        decisions = List.copyOf(decisions);
        int rows = columns.isEmpty() ? 0 : columns.get(0).values().size();
        for (Column c : columns) {
            if (c.values().size() != rows) {
                throw new IllegalArgumentException("columns of " + sheet + "!" + range + " differ in length");
            }
        }
    }

    public int rowCount() {
        return columns.isEmpty() ? 0 : columns.get(0).values().size();
    }

    /**
     * Finds a column by its header text (case-insensitive; with or without the unit part) or by
     * its sheet column letter ("C").
     */
    public Optional<Column> column(String headerOrLetter) {
        String want = headerOrLetter.trim();
        for (Column c : columns) {
            if (c.header().equalsIgnoreCase(want) || c.name().equalsIgnoreCase(want)) {
                return Optional.of(c);
            }
        }
        for (Column c : columns) {
            if (c.letter().equalsIgnoreCase(want)) {
                return Optional.of(c);
            }
        }
        return Optional.empty();
    }

    /** Headers, for "expected one of …" messages. */
    public List<String> headers() {
        return columns.stream().map(Column::header).toList();
    }
}
