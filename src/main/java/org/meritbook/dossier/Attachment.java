package org.meritbook.dossier;

import java.nio.file.Path;
import java.util.Objects;

/**
 * A file embedded in the PDF as a PDF/A-3 associated file.
 *
 * @param name         the file name shown in the PDF reader's attachment list (unique)
 * @param mimeType     MIME type, written as the embedded file's /Subtype
 * @param relationship /AFRelationship: "Source" for inputs, "Data" for results.json
 * @param description  what the file is, in a few words
 * @param alias        the manifest alias it belongs to ("notebook", a source alias, or "results")
 * @param source       the file on disk, or null when the bytes are passed in (results.json) or made here
 * @param content      the bytes when the dossier makes the file itself (a long data table as CSV), else null
 */
record Attachment(String name, String mimeType, String relationship, String description, String alias,
                  Path source, byte[] content) {
    Attachment {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(mimeType, "mimeType");
        Objects.requireNonNull(relationship, "relationship");
        content = content == null ? null : content.clone();
    }

    /** A file on disk, or results.json ({@code source} null). */
    Attachment(String name, String mimeType, String relationship, String description, String alias, Path source) {
        this(name, mimeType, relationship, description, alias, source, null);
    }

    @Override
    public byte[] content() {
        return content == null ? null : content.clone();
    }
}
