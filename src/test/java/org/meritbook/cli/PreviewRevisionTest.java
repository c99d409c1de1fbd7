package org.meritbook.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meritbook.publishing.PublishingSequence;
import org.meritbook.serve.LiveStudy;
import org.meritbook.serve.Snapshot;

/**
 * The live preview of a study whose revision 1 is published is the dossier {@code run} issues as
 * revision 2: the same revision history and the same changes since revision 1, because both go
 * through one publishing sequence.
 */
class PreviewRevisionTest {
    @TempDir
    Path dir;

    @Test
    void thePreviewOfRevisionTwoIsTheHtmlRunWritesForIt() throws Exception {
        SmallCalibration.csv(dir.resolve("runs.csv"));
        Path nb = dir.resolve("study.md");
        Files.writeString(nb, """
                ---
                title: Preview check
                revision: 1
                sources:
                  runs: runs.csv
                ---

                ```calibration
                data: runs!runs!A1:B6
                x: Conc
                y: Area
                ```
                """);
        Path out = dir.resolve("out");
        assertEquals(0, Cli.execute("run", nb.toString(), "-o", out.toString()).code());

        // Revision 2 is due: a corrected area and a new weighting.
        Files.writeString(dir.resolve("runs.csv"), Files.readString(dir.resolve("runs.csv")).replace("79.4", "80.1"));
        Files.writeString(nb, Files.readString(nb).replace("revision: 1", "revision: 2")
                .replace("y: Area", "y: Area\nweighting: 1/x"));
        String preview = preview(nb, out);

        assertEquals(0, Cli.execute("run", nb.toString(), "-o", out.toString()).code());
        String issued = Files.readString(out.resolve("study/rev2/study-rev2.html"), StandardCharsets.UTF_8);
        assertTrue(issued.contains("id=\"revisions\""), "run writes the revision history");
        assertTrue(issued.contains("Changes since revision 1 (study-rev1.pdf)"), "run writes the changes since revision 1");
        assertEquals(section(issued, "id=\"revisions\""), section(preview, "id=\"revisions\""));
        assertEquals(section(issued, "id=\"changes\""), section(preview, "id=\"changes\""));
        // Nothing in the dossier depends on the time of the run, so the whole HTML is the same.
        assertEquals(issued, preview);
    }

    /** What {@code serve -o out} shows after its first run. */
    private static String preview(Path notebook, Path out) throws InterruptedException {
        LinkedBlockingQueue<Snapshot> done = new LinkedBlockingQueue<>();
        try (LiveStudy live = new LiveStudy(notebook, PublishingSequence.standard(Optional.empty()), Optional.of(out),
                files -> { }, done::add)) {
            live.start();
            Snapshot first = done.poll(90, TimeUnit.SECONDS);
            if (first == null) {
                throw new AssertionError("no preview run completed within 90 s");
            }
            assertEquals(Snapshot.State.OK, first.state(), first.problems().toString());
            return new String(first.issued().html(), StandardCharsets.UTF_8);
        }
    }

    /** The front-matter section that starts at the heading carrying this id, up to the next heading. */
    private static String section(String html, String id) {
        int start = html.indexOf(id);
        assertTrue(start >= 0, "no " + id);
        int end = html.indexOf("<h2", start + id.length());
        return html.substring(start, end < 0 ? html.length() : end);
    }
}
