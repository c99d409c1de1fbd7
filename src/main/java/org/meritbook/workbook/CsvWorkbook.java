package org.meritbook.workbook;

import java.time.Instant;
import java.util.List;
import java.util.Optional;

/** A CSV file: one sheet named after the file, no defined names, no tables. */
final class CsvWorkbook implements SourceWorkbook {
    private final CsvGrid grid;
    private final List<String> openingDecisions;

    CsvWorkbook(CsvGrid grid, List<String> openingDecisions) {
        this.grid = grid;
        this.openingDecisions = List.copyOf(openingDecisions);
    }

    @Override
    public List<String> sheetNames() {
        return List.of(grid.name());
    }

    @Override
    public Optional<Grid> sheet(String name) {
        return grid.name().equalsIgnoreCase(name.strip()) ? Optional.of(grid) : Optional.empty();
    }

    @Override
    public List<String> definedNames() {
        return List.of();
    }

    @Override
    public Optional<NamedRange> definedName(String name) {
        return Optional.empty();
    }

    @Override
    public List<String> tableNames() {
        return List.of();
    }

    @Override
    public Optional<TableRange> table(String name) {
        return Optional.empty();
    }

    @Override
    public Optional<Instant> recordedSaveTime() {
        return Optional.empty();
    }

    @Override
    public List<String> openingDecisions() {
        return openingDecisions;
    }

    @Override
    public void close() {
        // nothing held but memory
    }
}
