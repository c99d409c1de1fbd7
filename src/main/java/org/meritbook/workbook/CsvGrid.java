package org.meritbook.workbook;

import java.util.List;
import java.util.Optional;

/**
 * A CSV file seen as a {@link Grid}: row i is the i-th record (row 1 is the first line), column j
 * its j-th field. Every field is text; {@link CellText} decides what it holds.
 */
final class CsvGrid implements Grid {
    private final String name;
    private final List<List<String>> records;

    CsvGrid(String name, List<List<String>> records) {
        this.name = name;
        this.records = List.copyOf(records.stream().map(List::copyOf).toList());
    }

    @Override
    public String name() {
        return name;
    }

    @Override
    public int lastRow() {
        return records.size() - 1;
    }

    @Override
    public int lastCol(int row) {
        return row < records.size() ? records.get(row).size() - 1 : -1;
    }

    @Override
    public CellValue value(int row, int col) {
        String text = row < records.size() && col < records.get(row).size() ? records.get(row).get(col) : "";
        return CellText.classifyCsv(ref(row, col), text);
    }

    @Override
    public Optional<Area> merged(int row, int col) {
        return Optional.empty();
    }
}
