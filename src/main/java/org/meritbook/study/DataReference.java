package org.meritbook.study;

import java.util.Objects;

/**
 * A data reference as written in a notebook: {@code source!Sheet!A1:D40}, {@code source!Sheet!B:C},
 * {@code source!DefinedName}, {@code source!TableName} or {@code source!Sheet}.
 *
 * @param source the source alias declared under {@code sources:} in the front matter
 * @param target the sheet name, or (when {@code range} is null) a defined name, a table name or a sheet
 * @param range  an A1 range ({@code A4:C25}) or whole columns ({@code B:C}); null when absent
 * @param text   the reference exactly as written, for messages
 * @param line    the notebook line it was written on (1-based)
 * @param reading how the cell that uses it asks for its data to be read ({@link ReadingOptions})
 */
public record DataReference(String source, String target, String range, String text, int line, ReadingOptions reading) {
    public DataReference {
        Objects.requireNonNull(source, "source");
        Objects.requireNonNull(target, "target");
        Objects.requireNonNull(text, "text");
        Objects.requireNonNull(reading, "reading");
    }

    /** A reference read with the default (strict) reading options. */
    public DataReference(String source, String target, String range, String text, int line) {
        this(source, target, range, text, line, ReadingOptions.DEFAULT);
    }

    /** The same reference, read as the cell's options say. */
    public DataReference withReading(ReadingOptions options) {
        return new DataReference(source, target, range, text, line, options);
    }

    public boolean hasRange() {
        return range != null;
    }
}
