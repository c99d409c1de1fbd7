package org.meritbook.workbook;

import java.nio.file.Path;
import org.meritbook.study.DataReference;

/**
 * Reads the data block a reference names from a workbook file (.xlsx, .xls or .csv). Throws
 * {@link org.meritbook.error.InputException} for a missing file, sheet or name, a corrupt or
 * encrypted workbook, or an empty range; it does not judge values (a text in a numeric column is
 * the analysis' concern, reported through {@link NumericColumn}).
 */
public interface BlockReader {
    DataBlock read(Path file, DataReference reference);
}
