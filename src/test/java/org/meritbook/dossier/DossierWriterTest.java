package org.meritbook.dossier;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;

class DossierWriterTest {
    private final DossierWriter writer = new DossierWriter();

    private static RenderedDossier dossier(String text) {
        return new RenderedDossier(("<html>" + text + "</html>").getBytes(StandardCharsets.UTF_8),
                ("%PDF-" + text).getBytes(StandardCharsets.UTF_8));
    }

    private static List<String> names(Path dir) throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    @Test
    void writesPdfAndHtmlUnderTheRevisionName(@TempDir Path out) throws IOException {
        Path dir = out.resolve("nitrite");
        List<Path> written = writer.write(dossier("a"), dir, "nitrite-rev2", false);
        assertEquals(List.of(dir.resolve("nitrite-rev2.pdf"), dir.resolve("nitrite-rev2.html")), written);
        assertEquals(List.of("nitrite-rev2.html", "nitrite-rev2.pdf"), names(dir), "no temporary file left");
        assertArrayEquals(dossier("a").pdf(), Files.readAllBytes(written.get(0)));
    }

    @Test
    void anIdenticalRerunIsFine(@TempDir Path dir) throws IOException {
        writer.write(dossier("a"), dir, "s-rev1", false);
        writer.write(dossier("a"), dir, "s-rev1", false);
        assertEquals(List.of("s-rev1.html", "s-rev1.pdf"), names(dir));
    }

    @Test
    void aDifferentDossierOfTheSameRevisionIsNotOverwritten(@TempDir Path dir) throws IOException {
        writer.write(dossier("first"), dir, "s-rev1", false);
        InputException e = assertThrows(InputException.class,
                () -> writer.write(dossier("second"), dir, "s-rev1", false));
        assertEquals(ErrorKey.OUTPUT_EXISTS, e.key());
        assertEquals(2, e.problems().size(), "both files are named");
        assertTrue(e.getMessage().contains("revision") && e.getMessage().contains("--force"), e.getMessage());
        assertArrayEquals(dossier("first").pdf(), Files.readAllBytes(dir.resolve("s-rev1.pdf")), "kept");
        assertArrayEquals(dossier("first").html(), Files.readAllBytes(dir.resolve("s-rev1.html")), "kept");
        assertEquals(List.of("s-rev1.html", "s-rev1.pdf"), names(dir), "no temporary file left");
    }

    @Test
    void forceReplaces(@TempDir Path dir) throws IOException {
        writer.write(dossier("first"), dir, "s-rev1", false);
        writer.write(dossier("second"), dir, "s-rev1", true);
        assertArrayEquals(dossier("second").pdf(), Files.readAllBytes(dir.resolve("s-rev1.pdf")));
        assertArrayEquals(dossier("second").html(), Files.readAllBytes(dir.resolve("s-rev1.html")));
        assertEquals(List.of("s-rev1.html", "s-rev1.pdf"), names(dir), "no temporary file left");
    }

    @Test
    void aNewRevisionNumberSitsBesideTheOldOne(@TempDir Path dir) throws IOException {
        writer.write(dossier("first"), dir, "s-rev1", false);
        writer.write(dossier("second"), dir, "s-rev2", false);
        assertEquals(List.of("s-rev1.html", "s-rev1.pdf", "s-rev2.html", "s-rev2.pdf"), names(dir));
    }

    @Test
    void theBaseNameComesFromTheNotebookAndItsRevision(@TempDir Path dir) {
        assertEquals("nitrite-fixture-rev2", DossierWriter.baseName(DossierFixtures.results(dir).study()));
    }
}
