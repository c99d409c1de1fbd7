package org.meritbook.workbook;

import java.nio.file.Path;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.TreeMap;

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
 * @param leftOut   rows the reader leaves out because the notebook said so ({@code hidden: leave-out},
 *                  {@code merged: once}), by row index within the block, with the reason; an analysis
 *                  treats them as excluded points: shown, with the reason, and not used
 */
public record DataBlock(Path file, String sheet, String range, List<Column> columns, List<String> decisions,
                        Map<Integer, String> leftOut) {
    public DataBlock {
        Objects.requireNonNull(file, "file");
        Objects.requireNonNull(sheet, "sheet");
        Objects.requireNonNull(range, "range");
        columns = List.copyOf(columns);
        decisions = List.copyOf(decisions);
        leftOut = Collections.unmodifiableMap(new TreeMap<>(leftOut));
        int rows = columns.isEmpty() ? 0 : columns.get(0).values().size();
        for (Column c : columns) {
            if (c.values().size() != rows) {
                throw new IllegalArgumentException("columns of " + sheet + "!" + range + " differ in length");
            }
        }
        for (int i : leftOut.keySet()) {
            if (i < 0 || i >= rows) {
                throw new IllegalArgumentException("left-out row " + i + " outside " + sheet + "!" + range);
            }
        }
    }

    /** A block with no rows left out. */
    public DataBlock(Path file, String sheet, String range, List<Column> columns, List<String> decisions) {
        this(file, sheet, range, columns, decisions, Map.of());
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
