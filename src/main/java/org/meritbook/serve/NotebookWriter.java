package org.meritbook.serve;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.function.UnaryOperator;
import org.meritbook.pipeline.AtomicFiles;

/**
 * Rewrites the notebook for an edit made on the page: the current text is read, edited, the old
 * text kept as a numbered backup beside the notebook ({@code study.md.~1~}, {@code .~2~}, … — a
 * backup is created new and never overwritten), and the new text moved into place through
 * {@link AtomicFiles} (a temporary file in the same folder, then a rename), so an editor or a run
 * sees either the old notebook or the new one. Edits are made one at a time.
 */
final class NotebookWriter {
    /** Enough for years of edits; a folder holding this many backups is refused, not overwritten. */
    private static final int MAX_BACKUPS = 100_000;

    private final Path notebook;

    NotebookWriter(Path notebook) {
        this.notebook = notebook;
    }

    /** What an edit wrote: the backup of the text before it, and the text after it. */
    record Written(Path backup, String before, String after) {
    }

    /** Applies {@code edit} to the notebook's current text and writes the result; the edit may throw to refuse. */
    synchronized Written apply(UnaryOperator<String> edit) {
        String before = read();
        String after = edit.apply(before);
        Path backup = backup(before);
        AtomicFiles.write(notebook, after.getBytes(StandardCharsets.UTF_8));
        return new Written(backup, before, after);
    }

    /** Puts back a text an edit replaced (an issue that failed after the revision was raised), with its own backup. */
    synchronized void putBack(String text) {
        backup(read());
        AtomicFiles.write(notebook, text.getBytes(StandardCharsets.UTF_8));
    }

    private String read() {
        try {
            return Files.readString(notebook, StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read " + notebook, e);
        }
    }

    private Path backup(String text) {
        byte[] bytes = text.getBytes(StandardCharsets.UTF_8);
        for (int n = 1; n <= MAX_BACKUPS; n++) {
            Path candidate = notebook.resolveSibling(notebook.getFileName() + ".~" + n + "~");
            try {
                Files.write(candidate, bytes, StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE);
                return candidate;
            } catch (FileAlreadyExistsException e) {
                continue; // taken: an earlier backup, which stays as it is
            } catch (IOException e) {
                throw new UncheckedIOException("cannot keep a backup of " + notebook + " as " + candidate, e);
            }
        }
        throw new IllegalStateException("no free backup name beside " + notebook + " (" + MAX_BACKUPS + " backups)");
    }
}
