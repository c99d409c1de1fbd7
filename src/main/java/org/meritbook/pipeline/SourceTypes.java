package org.meritbook.pipeline;

import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * The file types a study may declare under {@code sources:}: the workbook formats the reader opens,
 * recognised by extension, case-insensitively. Anything else is refused before a byte is read.
 */
public final class SourceTypes {
    /** For messages. */
    public static final String DESCRIPTION = ".xlsx, .xlsm, .xls or .csv";

    private static final List<String> EXTENSIONS = List.of("xlsx", "xlsm", "xls", "csv");

    private SourceTypes() {
    }

    public static boolean isWorkbook(String path) {
        return extension(path).isPresent();
    }

    /** The workbook extension of a path as written, lower case without the dot, or empty when it is none. */
    public static Optional<String> extension(String path) {
        String name = path.replace('\\', '/');
        name = name.substring(name.lastIndexOf('/') + 1);
        int dot = name.lastIndexOf('.');
        if (dot <= 0) {
            return Optional.empty();
        }
        String ext = name.substring(dot + 1).toLowerCase(Locale.ROOT);
        return EXTENSIONS.contains(ext) ? Optional.of(ext) : Optional.empty();
    }
}
