package org.meritbook.workbook;

import java.time.Instant;
import java.util.List;
import java.util.Optional;

/**
 * One opened workbook file: its sheets, defined names and Excel tables. Implementations hold the
 * whole file in memory and never write to it.
 */
interface SourceWorkbook extends AutoCloseable {
    /** Sheet names in workbook order. */
    List<String> sheetNames();

    /** The sheet of that name; compared without regard to case, as Excel does. */
    Optional<Grid> sheet(String name);

    /** User-visible defined names (Excel's built-in "_xlnm." names left out). */
    List<String> definedNames();

    Optional<NamedRange> definedName(String name);

    List<String> tableNames();

    Optional<TableRange> table(String name);

    /**
     * The last-saved time the file records about itself (an .xlsx's core property "modified", an
     * .xls's summary "last saved"), or empty (CSV, or not recorded). Content, not file-system time,
     * so it is the same in every copy of the file.
     */
    Optional<Instant> recordedSaveTime();

    /** What was decided while opening the file (e.g. the CSV delimiter), for every block read from it. */
    List<String> openingDecisions();

    @Override
    void close();

    /**
     * A defined name.
     *
     * @param name     the name as defined
     * @param refersTo the formula it stands for, e.g. {@code Calibration!$A$4:$C$25}
     * @param sheet    the sheet of the range, or null when the name is not one range on one sheet
     * @param range    the range text without the sheet, e.g. {@code $A$4:$C$25}; null like {@code sheet}
     */
    record NamedRange(String name, String refersTo, String sheet, String range) {
    }

    /**
     * An Excel table (ListObject).
     *
     * @param name        the table name
     * @param sheet       its sheet
     * @param area        the whole table including header and totals rows
     * @param headerRows  0 or 1
     * @param totalsRows  0 or 1
     * @param columnNames the column names stored in the table definition
     */
    record TableRange(String name, String sheet, Area area, int headerRows, int totalsRows, List<String> columnNames) {
        public TableRange {
            columnNames = List.copyOf(columnNames);
        }
    }
}
