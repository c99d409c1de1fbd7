package org.meritbook.workbook;

import java.util.List;
import java.util.Objects;

/**
 * One column of a data block.
 *
 * @param header the header text as written (merged header rows joined with a space), never null
 * @param name   the header without its unit, trimmed: "Peak area" for "Peak area (mAU·s)"
 * @param unit   the unit taken from the header, "mAU·s" for "Peak area (mAU·s)" or "ng/mL" for
 *               "Conc [ng/mL]"; null when the header states none
 * @param letter the column letter in the sheet, e.g. "C"
 * @param values one value per data row of the block, aligned across columns
 */
public record Column(String header, String name, String unit, String letter, List<CellValue> values) {
    public Column {
        Objects.requireNonNull(header, "header");
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(letter, "letter");
        values = List.copyOf(values);
    }
}
