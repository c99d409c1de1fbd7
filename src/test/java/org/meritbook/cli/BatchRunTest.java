package org.meritbook.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meritbook.cli.Cli.Outcome;
import picocli.CommandLine;

/**
 * {@code meritbook run A.md B.md ...}: the studies of one batch, run at once, write what each would
 * write alone, are reported whole in argument order, and are refused together when two would share
 * one revision history.
 */
class BatchRunTest {
    private static final Path DEMO = Path.of("demo-data/hmf-honey-validation.md");
    private static final Path DEMO_WORKBOOK = Path.of("demo-data/hmf-honey-validation.xlsx");

    @TempDir
    Path dir;

    /**
     * The demo (a render of seconds) and a small study render at the same time on the two workers,
     * with a broken notebook between them: each written set is byte for byte what a single run of
     * that notebook writes (both notebooks state their date, so no clock enters the bytes), the bad
     * one is reported in a single run's words, and everything comes out whole in argument order.
     * bench/batch.sh does the same check on N copies of the demo rendering side by side.
     */
    @Test
    void aBatchWritesWhatSingleRunsWriteAndReportsEachStudyWholeInArgumentOrder() throws Exception {
        Files.copy(DEMO_WORKBOOK, dir.resolve(DEMO_WORKBOOK.getFileName()));
        Path first = Files.copy(DEMO, dir.resolve(DEMO.getFileName()));
        Path bad = dir.resolve("bad.md");
        Files.writeString(bad, "---\ntitle: Left unfinished\n");
        SmallCalibration.csv(dir.resolve("runs.csv"));
        Path second = small("second-study.md", null);

        Path single = dir.resolve("single");
        Outcome firstAlone = Cli.execute("run", first.toString(), "-o", single.toString());
        Outcome secondAlone = Cli.execute("run", second.toString(), "-o", single.toString());
        Outcome badAlone = Cli.execute("run", bad.toString(), "-o", single.toString());
        assertEquals(Main.DONE, firstAlone.code(), firstAlone.err());
        assertEquals(Main.DONE, secondAlone.code(), secondAlone.err());
        assertEquals(Main.BAD_INPUT, badAlone.code());
        assertTrue(badAlone.err().contains("bad.md line 1"), badAlone.err());

        Path batch = dir.resolve("batch");
        StringWriter console = new StringWriter(); // standard output and error on one console, as in a terminal
        CommandLine cl = Main.commandLine();
        cl.setOut(new PrintWriter(console));
        cl.setErr(new PrintWriter(console));
        int code = cl.execute("run", first.toString(), bad.toString(), second.toString(), "-o", batch.toString());

        assertEquals(Main.BAD_INPUT, code, "the most severe code of the three: 0, 2, 0");
        String summary = "meritbook: 3 studies: 2 written, 0 unchanged, 0 failed acceptance, 1 could not run (" + bad
                + ")" + System.lineSeparator();
        assertEquals(firstAlone.out() + badAlone.err() + secondAlone.out() + summary,
                console.toString().replace(batch.toString(), single.toString()));
        assertSameFiles(single.resolve("hmf-honey-validation"), batch.resolve("hmf-honey-validation"));
        assertSameFiles(single.resolve("second-study"), batch.resolve("second-study"));
        assertFalse(Files.exists(batch.resolve("bad")), "nothing published for the notebook that could not run");
    }

    /** Exit code: the highest of the studies' codes (0 done, 1 acceptance failed, 2 bad input, 3 internal). */
    @Test
    void theExitCodeIsTheMostSevereOfTheStudiesCodes() throws Exception {
        SmallCalibration.csv(dir.resolve("runs.csv"));
        Path passing = small("passing.md", null);
        Path failing = small("failing.md", "strict.yaml");
        Files.writeString(dir.resolve("strict.yaml"), """
                name: strict
                rules:
                  - quantity: r_squared
                    at-least: 0.9999999
                    characteristic: Linearity
                """);
        String out = dir.resolve("out").toString();

        Outcome first = Cli.execute("run", passing.toString(), failing.toString(), "-o", out);
        assertEquals(Main.ACCEPTANCE_FAILED, first.code(), first.err());
        assertTrue(first.out().endsWith("meritbook: 2 studies: 1 written, 0 unchanged, 1 failed acceptance ("
                + failing + "), 0 could not run" + System.lineSeparator()), first.out());
        assertTrue(Files.exists(dir.resolve("out/failing/rev1/failing-rev1.pdf")), "a failed study's dossier is written");

        Path other = small("other.md", null);
        Outcome again = Cli.execute("run", passing.toString(), other.toString(), "-o", out);
        assertEquals(Main.DONE, again.code(), again.err());
        assertTrue(again.out().endsWith("meritbook: 2 studies: 1 written, 1 unchanged, 0 failed acceptance, "
                + "0 could not run" + System.lineSeparator()), again.out());

        Outcome missing = Cli.execute("run", failing.toString(), dir.resolve("absent.md").toString(), "-o", out);
        assertEquals(Main.BAD_INPUT, missing.code(), "2 outranks 1");
        assertTrue(missing.err().contains("absent.md"), missing.err());

        // A lab template that names a value the dossier lacks fails the render: an internal error, exit 3.
        Path templates = Files.createDirectories(dir.resolve("broken-templates"));
        Files.writeString(templates.resolve("dossier.ftlh"), "<html>${noSuchValue}</html>");
        Outcome internal = Cli.execute("run", dir.resolve("absent.md").toString(), passing.toString(),
                "--templates", templates.toString(), "-o", dir.resolve("elsewhere").toString());
        assertEquals(Main.INTERNAL_ERROR, internal.code(), "3 outranks 2");
        assertTrue(internal.err().contains("meritbook: internal error, please report it"), internal.err());
        assertTrue(internal.out().endsWith("meritbook: 2 studies: 0 written, 0 unchanged, 0 failed acceptance, "
                + "2 could not run (" + dir.resolve("absent.md") + ", " + passing + ")" + System.lineSeparator()),
                internal.out());
        assertFalse(Files.exists(dir.resolve("elsewhere/passing/rev1")), "nothing published without a dossier");
    }

    @Test
    void theSameNotebookTwiceIsRefusedBeforeAnythingRuns() throws Exception {
        SmallCalibration.csv(dir.resolve("runs.csv"));
        Path nb = small("study.md", null);
        Path other = small("other.md", null);
        String sameFileAnotherWay = dir.resolve(".").resolve("study.md").toString();
        Path out = dir.resolve("out");

        Outcome o = Cli.execute("run", nb.toString(), other.toString(), sameFileAnotherWay, "-o", out.toString());

        assertEquals(Main.BAD_INPUT, o.code());
        assertTrue(o.err().contains("run arguments 1 and 3 (" + nb + ", " + sameFileAnotherWay
                + "): expected each notebook given once but found the same file twice"), o.err());
        assertEquals("", o.out());
        assertFalse(Files.exists(out), "nothing ran: not even the output folder was made");
    }

    @Test
    void twoNotebooksThatWouldShareAStudyFolderAreRefusedBeforeAnythingRuns() throws Exception {
        Path a = Files.createDirectories(dir.resolve("site-a"));
        Path b = Files.createDirectories(dir.resolve("site-b"));
        SmallCalibration.csv(a.resolve("runs.csv"));
        SmallCalibration.csv(b.resolve("runs.csv"));
        SmallCalibration.csv(dir.resolve("runs.csv"));
        Path inA = small(a.resolve("study.md"), null);
        Path inB = small(b.resolve("study.md"), null);
        Path upper = small(dir.resolve("Other.md"), null);
        Path lower = small(dir.resolve("other.md"), null);
        Path out = dir.resolve("out");

        Outcome o = Cli.execute("run", inA.toString(), upper.toString(), inB.toString(), lower.toString(),
                "-o", out.toString());

        assertEquals(Main.BAD_INPUT, o.code());
        assertTrue(o.err().contains("the input needs attention (2 problems)"), o.err());
        assertTrue(o.err().contains("run arguments 1 and 3 (" + inA + ", " + inB + "): expected notebooks that publish "
                + "into different study folders (each has its own revision history) but found both would publish into "
                + out.resolve("study")), o.err());
        // One folder wherever file names ignore letter case (Windows, macOS), so refused everywhere.
        assertTrue(o.err().contains("run arguments 2 and 4 (" + upper + ", " + lower + ")"), o.err());
        assertFalse(Files.exists(out), "nothing ran");
    }

    private Path small(String name, String criteria) throws IOException {
        return small(dir.resolve(name), criteria);
    }

    /** A CSV calibration study (renders in well under a second), optionally judged by a profile file. */
    private static Path small(Path nb, String criteria) throws IOException {
        Files.writeString(nb, """
                ---
                title: Batch check
                date: 2026-11-20
                %ssources:
                  runs: runs.csv
                ---

                ```calibration
                data: runs!runs!A1:B6
                x: Conc
                y: Area
                ```
                """.formatted(criteria == null ? "" : "criteria: " + criteria + "\n"));
        return nb;
    }

    /** The same files with the same bytes, the (empty) lock file aside: it belongs to the folder, not the output set. */
    private static void assertSameFiles(Path expected, Path actual) throws IOException {
        List<Path> files = files(expected);
        assertEquals(files, files(actual), "the same files in " + actual);
        assertFalse(files.isEmpty());
        for (Path f : files) {
            assertArrayEquals(Files.readAllBytes(expected.resolve(f)), Files.readAllBytes(actual.resolve(f)),
                    f + " differs between the single run and the batch");
        }
    }

    private static List<Path> files(Path root) throws IOException {
        try (Stream<Path> s = Files.walk(root)) {
            return s.filter(Files::isRegularFile).map(root::relativize)
                    .filter(p -> !p.getFileName().toString().equals(".meritbook.lock")).sorted().toList();
        }
    }
}
