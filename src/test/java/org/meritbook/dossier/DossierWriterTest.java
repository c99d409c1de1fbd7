package org.meritbook.dossier;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class DossierWriterTest {
    @Test
    void aRevisionsSetIsTheDossierWithItsResultsAndTrail() {
        RenderedDossier dossier = new RenderedDossier("<html/>".getBytes(StandardCharsets.UTF_8),
                "%PDF-".getBytes(StandardCharsets.UTF_8));
        Map<String, byte[]> set = DossierWriter.outputSet("nitrite-rev2", dossier, new byte[] {'{', '}'},
                new byte[] {'#'});
        assertEquals(List.of("nitrite-rev2.pdf", "nitrite-rev2.html", "results.json", "trail.md"),
                List.copyOf(set.keySet()));
        assertArrayEquals(dossier.pdf(), set.get("nitrite-rev2.pdf"));
    }

    @Test
    void theBaseNameComesFromTheNotebookAndItsRevision(@TempDir Path dir) {
        assertEquals("nitrite-fixture-rev2", DossierWriter.baseName(DossierFixtures.results(dir).study()));
    }
}
