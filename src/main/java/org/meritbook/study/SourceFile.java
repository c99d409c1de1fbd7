package org.meritbook.study;

import java.nio.file.Path;

/**
 * A workbook declared under {@code sources:}.
 *
 * @param alias   the name used in data references
 * @param path    the file, resolved against the notebook's folder
 * @param written the path as written in the notebook (for messages and the manifest)
 * @param line    notebook line of the declaration
 */
public record SourceFile(String alias, Path path, String written, int line) {
}
