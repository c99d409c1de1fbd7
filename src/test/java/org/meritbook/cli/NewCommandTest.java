package org.meritbook.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.meritbook.study.AnalysisCell;
import org.meritbook.study.Study;
import org.meritbook.study.StudyParser;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code meritbook new}: a starter notebook that names the workbook's blocks and runs as written. */
class NewCommandTest {
    @TempDir
    Path dir;

    private static int execute(String... args) {
        return Cli.execute(args).code();
    }

    @Test
    void theDemoWorkbookGivesARunnableStarter() throws Exception {
        Path workbook = dir.resolve("runs.xlsx");
        Files.copy(Path.of("demo-data/hmf-honey-validation.xlsx"), workbook);
        assertEquals(0, execute("new", workbook.toString()));
        Path notebook = dir.resolve("runs.md");
        String text = Files.readString(notebook);
        assertTrue(text.contains("Data block `lab!PrecisionRuns`: 48 rows"), "the Excel table");
        assertTrue(text.contains("Data block `lab!BlankSignals`: 10 rows"), "the defined name");
        assertTrue(text.contains("Data block `lab!Spikes!A5:H23`: 18 rows"), "an auto-detected block");

        Study study = StudyParser.parse(notebook);
        AnalysisCell cell = study.cells().get(0);
        assertEquals("lab!Calibration!A8:F31", cell.options().get("data").text());
        assertEquals("Nominal", cell.options().get("x").text(), "x guessed from the header");
        assertEquals("Peak area", cell.options().get("y").text(), "y guessed from the header");
        assertEquals(0, execute("run", notebook.toString(), "-o", dir.resolve("out").toString()), "runs as written");

        assertEquals(2, execute("new", workbook.toString()), "an existing notebook is never overwritten");
    }
}
