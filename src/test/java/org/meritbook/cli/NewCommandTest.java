package org.meritbook.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.meritbook.study.AnalysisCell;
import org.meritbook.study.Study;
import org.meritbook.study.StudyParser;
import org.meritbook.workbook.XlsxParts;
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
        Cli.Outcome unfilled = Cli.execute("run", notebook.toString(), "-o", dir.resolve("out").toString());
        assertEquals(2, unfilled.code(), "no dossier with the starter's placeholders in it");
        assertTrue(unfilled.err().contains("runs.md line 3: expected the study's own value for 'method' but found the "
                + "placeholder '<method id>' left by 'meritbook new'"), unfilled.err());
        Files.writeString(notebook, filledIn(text));
        assertEquals(0, execute("run", notebook.toString(), "-o", dir.resolve("out").toString()), "runs once filled in");

        assertEquals(2, execute("new", workbook.toString()), "an existing notebook is never overwritten");
    }

    /** The starter with its front-matter placeholders filled in, as the analyst would. */
    private static String filledIn(String starter) {
        return starter.replaceAll("<[^<>\n]+>", "filled in");
    }

    private Path demoWith(String edit, String replacement) throws Exception {
        XlsxParts parts = XlsxParts.of(Files.readAllBytes(Path.of("demo-data/hmf-honey-validation.xlsx")))
                .edit("xl/worksheets/sheet1.xml", x -> {
                    if (!x.contains(edit)) {
                        throw new AssertionError("no " + edit);
                    }
                    return x.replace(edit, replacement);
                });
        return Files.write(dir.resolve("runs.xlsx"), parts.zip());
    }

    /** A stored NaN once ended `new` with an internal error; now the starter is written, and `run` names the cell. */
    @Test
    void aStoredNanGivesAStarterAndALocatedErrorOnRun() throws Exception {
        Path workbook = demoWith("<v>10.68</v>", "<v>NaN</v>");
        assertEquals(0, execute("new", workbook.toString()));
        assertTrue(Files.readString(dir.resolve("runs.md")).contains("Data block `lab!Calibration!A8:F31`: "));
        Path notebook = Files.writeString(dir.resolve("demo.md"), Files.readString(Path.of("demo-data/hmf-honey-validation.md"))
                .replace("lab: hmf-honey-validation.xlsx", "lab: runs.xlsx"));
        Cli.Outcome run = Cli.execute("run", notebook.toString(), "-o", dir.resolve("out").toString());
        assertEquals(2, run.code(), run.err());
        assertTrue(run.err().contains("runs.xlsx, Calibration!D12: expected a number in column 'Peak area (mAU·s)' but found the "
                + "stored value 'NaN', which is not a finite number"), run.err());
    }

    /** A workbook re-saved by a program that does not calculate: the starter offers the choice, commented out. */
    @Test
    void formulasWithoutResultsAreLeftForTheNotebookToDecide() throws Exception {
        Path workbook = demoWith("<f>$B$6/2</f><v>10.0</v>", "<f>$B$6/2</f><v></v>");
        assertEquals(0, execute("new", workbook.toString()));
        Path notebook = dir.resolve("runs.md");
        String text = filledIn(Files.readString(notebook));
        Files.writeString(notebook, text);
        assertTrue(text.contains("data: lab!Calibration!A8:F31\n# formulas: evaluate "), text);
        Path out = dir.resolve("out");
        assertEquals(2, execute("run", notebook.toString(), "-o", out.toString()), "the choice is not made for the analyst");
        Files.writeString(notebook, text.replace("# formulas: evaluate ", "formulas: evaluate #"));
        assertEquals(0, execute("run", notebook.toString(), "-o", out.toString()));
        String trail = Files.readString(out.resolve("runs/rev1/trail.md"));
        assertTrue(trail.contains("Calibration!C29: formula =$B$6/2 had no stored result; evaluated by meritbook to '10.00' "
                + "(formulas: evaluate)"), "the evaluated cell is in the trail with its formula");
    }
}
