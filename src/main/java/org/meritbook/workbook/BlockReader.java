package org.meritbook.workbook;

import java.nio.file.Path;
import org.meritbook.study.DataReference;

/**
 * Reads the data block a reference names from a workbook file (.xlsx, .xls or .csv). Throws
 * {@link org.meritbook.error.InputException} for a missing file, sheet or name, a corrupt or
 * encrypted workbook, or an empty range; it does not judge values (a text in a numeric column is
 * the analysis' concern, reported through {@link NumericColumn}).
 *
 * <p>A reader may keep files open between calls (a study reads several blocks from one workbook);
 * close it when the study has been read. The default {@link #close()} does nothing, so a lambda
 * still makes a valid reader in tests.
 */
public interface BlockReader extends AutoCloseable {
    DataBlock read(Path file, DataReference reference);

    /** Releases the files this reader keeps open. Never throws a checked exception. */
    @Override
    default void close() {
    }
}
