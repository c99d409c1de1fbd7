package org.meritbook.dossier;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meritbook.pipeline.StudyResults;

class DossierRendererTest {
    static final RenderEnvironment PINNED = new RenderEnvironment("Java 17 (test)", "test OS");
    static final byte[] RESULTS_JSON = "{\"fixture\": true}".getBytes(java.nio.charset.StandardCharsets.UTF_8);

    @Test
    void rendersAPdfA3Dossier(@TempDir Path dir) throws Exception {
        StudyResults results = DossierFixtures.results(dir);
        RenderedDossier d = new DossierRenderer(Optional.empty(), PINNED).render(results, RESULTS_JSON);
        Files.write(Path.of("target/fixture-dossier.pdf"), d.pdf());
        Files.write(Path.of("target/fixture-dossier.html"), d.html());
        PdfAssertions.assertPdfA3(d.pdf());
        assertTrue(d.html().length > 1000);
    }
}
