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
 * @param source       the file on disk, or null when the bytes are passed in (results.json)
 */
record Attachment(String name, String mimeType, String relationship, String description, String alias,
                  Path source) {
    Attachment {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(mimeType, "mimeType");
        Objects.requireNonNull(relationship, "relationship");
    }
}
