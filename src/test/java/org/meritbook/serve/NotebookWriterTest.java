package org.meritbook.serve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meritbook.study.NotebookEdits;

/** The notebook is rewritten whole or not at all, each earlier text kept in a backup that is never overwritten. */
class NotebookWriterTest {
    @TempDir
    Path dir;

    @Test
    void eachEditKeepsTheTextBeforeItInANewNumberedBackup() throws Exception {
        Path notebook = dir.resolve("study.md");
        Files.writeString(notebook, "one\n");
        Files.writeString(dir.resolve("study.md.~2~"), "an older backup, made by hand\n");
        NotebookWriter writer = new NotebookWriter(notebook);

        NotebookWriter.Written first = writer.apply(t -> t + "two\n");
        NotebookWriter.Written second = writer.apply(t -> t + "three\n");

        assertEquals("one\ntwo\nthree\n", Files.readString(notebook));
        assertEquals(dir.resolve("study.md.~1~"), first.backup());
        assertEquals("one\n", Files.readString(first.backup()));
        assertEquals(dir.resolve("study.md.~3~"), second.backup(), "a taken number is skipped, never overwritten");
        assertEquals("one\ntwo\n", Files.readString(second.backup()));
        assertEquals("an older backup, made by hand\n", Files.readString(dir.resolve("study.md.~2~")));
        try (var files = Files.list(dir)) {
            assertTrue(files.noneMatch(p -> p.getFileName().toString().endsWith(".part")), "no temporary file left");
        }
    }

    @Test
    void aRefusedEditWritesNothing() throws Exception {
        Path notebook = dir.resolve("study.md");
        Files.writeString(notebook, "kept\n");
        NotebookWriter writer = new NotebookWriter(notebook);
        assertThrows(NotebookEdits.EditRefused.class, () -> writer.apply(t -> {
            throw new NotebookEdits.EditRefused("no");
        }));
        assertEquals("kept\n", Files.readString(notebook));
        try (var files = Files.list(dir)) {
            assertEquals(List.of(notebook), files.toList(), "no backup for an edit that was not made");
        }
    }
}
