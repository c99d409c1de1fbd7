package org.meritbook.analysis;

import java.util.List;

/**
 * The data table a section shows: headers (with units) and rows; excluded rows stay, marked with
 * their reason.
 */
public record DataTable(List<String> headers, List<Row> rows) {
    public DataTable {
        headers = List.copyOf(headers);
        rows = List.copyOf(rows);
        for (Row r : rows) {
            if (r.cells().size() != headers.size()) {
                throw new IllegalArgumentException("row has " + r.cells().size() + " cells for "
                        + headers.size() + " headers");
            }
        }
    }

    /**
     * @param label           the row's label (e.g. the point name used in quantity names)
     * @param cells           one cell per header
     * @param exclusionReason the notebook's reason when the row is excluded, else null
     */
    public record Row(String label, List<TableCell> cells, String exclusionReason) {
        public Row {
            cells = List.copyOf(cells);
        }

        public boolean excluded() {
            return exclusionReason != null;
        }
    }
}
