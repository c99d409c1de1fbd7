package org.meritbook.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;

/** Reading a notebook from disk: UTF-8, sources next to it, and the files that cannot be read. */
class StudyFileTest {
    @TempDir
    Path dir;

    @Test
    void readsUtf8AndResolvesSourcesNextToTheNotebook() throws IOException {
        Path file = dir.resolve("lead.md");
        Files.writeString(file, """
                ---
                title: Blei (Pb) im Trinkwasser — µg/L
                sources:
                  runs: ../shared/lead runs.xlsx
                ---
                """, StandardCharsets.UTF_8);
        Study s = StudyParser.parse(file);
        assertEquals("Blei (Pb) im Trinkwasser — µg/L", s.frontMatter().title());
        assertEquals(dir.getParent().resolve("shared/lead runs.xlsx"), s.sources().get("runs").path());
    }

    @Test
    void missingFileIsUnreadable() {
        InputException e = assertThrows(InputException.class, () -> StudyParser.parse(dir.resolve("absent.md")));
        assertEquals(ErrorKey.NOTEBOOK_UNREADABLE, e.key());
        assertEquals("absent.md", e.problems().get(0).where());
        assertEquals("no such file", e.problems().get(0).found());
    }

    @Test
    void notUtf8IsUnreadable() throws IOException {
        Path file = dir.resolve("latin1.md");
        Files.write(file, "---\ntitle: Calcium in Käse\n---\n".getBytes(StandardCharsets.ISO_8859_1));
        InputException e = assertThrows(InputException.class, () -> StudyParser.parse(file));
        assertEquals(ErrorKey.NOTEBOOK_UNREADABLE, e.key());
        assertEquals("latin1.md: expected a text file in UTF-8 but found bytes that are not UTF-8. Save the notebook"
                + " as UTF-8 in your editor.", e.getMessage());
    }

    @Test
    void aFolderIsUnreadable() {
        InputException e = assertThrows(InputException.class, () -> StudyParser.parse(dir));
        assertEquals(ErrorKey.NOTEBOOK_UNREADABLE, e.key());
    }
}
