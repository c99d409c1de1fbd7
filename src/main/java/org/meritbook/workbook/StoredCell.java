package org.meritbook.workbook;

import org.apache.poi.ss.usermodel.CellStyle;

/**
 * One .xlsx cell as its sheet XML stores it, whether POI's usermodel holds it or it was read by
 * streaming ({@link StreamedSheet}): {@link PoiCells} turns either into a {@link CellValue} by the
 * same rules, so the two ways of reading a sheet cannot drift apart.
 */
interface StoredCell {
    /** The {@code t} attribute as written, stripped; "n" when absent. */
    String type();

    /** True when the cell has an {@code <f>} element. */
    boolean hasFormula();

    /** The formula as POI renders it (a shared formula shifted to this cell); may throw for a damaged one. */
    String formula();

    /** True when the cell has a {@code <v>} element. */
    boolean hasValue();

    /** The text of {@code <v>}, as written. */
    String value();

    /** The cell's text as POI's {@code getStringCellValue} gives it, for text cells and text formula results. */
    String text();

    /** The cell's style as POI resolves it (style 0 when the cell names none), or null. */
    CellStyle style();
}
