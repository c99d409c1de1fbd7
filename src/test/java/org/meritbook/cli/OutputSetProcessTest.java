package org.meritbook.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.File;
import java.io.IOException;
import java.nio.channels.FileChannel;
import java.nio.channels.FileLock;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.Set;
import java.util.TreeSet;
import java.util.concurrent.TimeUnit;
import java.util.jar.JarEntry;
import java.util.jar.JarOutputStream;
import java.util.stream.Stream;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code meritbook run} as separate processes, the way two analysts or a killed terminal meet it: two
 * runs of one study at once, and runs killed with SIGKILL at random points. Every revision folder
 * must hold a complete, self-consistent output set or not exist, and the next run leaves nothing
 * behind. The children run {@link Main} from this build's classes (packed into a jar so that they
 * can share a class-data archive and start faster).
 */
class OutputSetProcessTest {
    private static final long SEED = 20261120L;
    private static final int KILLS = 20;
    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    static Path dir;
    private static String classpath;
    private static Path archive;
    /** Wall time of one complete run of the study below, measured by the warm-up run. */
    private static long runMillis;

    @BeforeAll
    static void buildChildClasspathAndWarmUp() throws Exception {
        Path jar = dir.resolve("meritbook-under-test.jar");
        List<String> entries = new ArrayList<>();
        for (String e : System.getProperty("java.class.path").split(File.pathSeparator)) {
            Path p = Path.of(e);
            if (Files.isDirectory(p) && p.endsWith(Path.of("target", "classes"))) {
                packInto(p, jar);
                entries.add(jar.toString());
            } else if (e.endsWith(".jar") && !e.contains("surefire")) {
                entries.add(e);
            }
        }
        assertTrue(entries.contains(jar.toString()), "this build's classes are on the test class path: " + entries);
        classpath = String.join(File.pathSeparator, entries);
        archive = dir.resolve("children.jsa");
        Path study = study(dir.resolve("warm-up"), 1, "none");
        Path log = dir.resolve("warm-up/run.log");
        Process p = child(study, dir.resolve("warm-up/out"), log, false, "-XX:ArchiveClassesAtExit=" + archive);
        assertTrue(p.waitFor(300, TimeUnit.SECONDS), "the warm-up run finishes");
        assertEquals(0, p.exitValue(), Files.readString(log));
        // The duration the kills are spread over: one ordinary run, with the archive the children use.
        long start = System.nanoTime();
        p = child(study, dir.resolve("warm-up/out2"), log, false);
        assertTrue(p.waitFor(300, TimeUnit.SECONDS), "the measured run finishes");
        runMillis = TimeUnit.NANOSECONDS.toMillis(System.nanoTime() - start);
        assertEquals(0, p.exitValue(), Files.readString(log));
    }

    private static void packInto(Path classes, Path jar) throws IOException {
        try (JarOutputStream out = new JarOutputStream(Files.newOutputStream(jar)); Stream<Path> files = Files.walk(classes)) {
            for (Path f : files.filter(Files::isRegularFile).sorted().toList()) {
                out.putNextEntry(new JarEntry(classes.relativize(f).toString().replace(File.separatorChar, '/')));
                Files.copy(f, out);
                out.closeEntry();
            }
        }
    }

    /** A small study (a CSV calibration) in {@code folder}, as {@code study.md}. */
    private static Path study(Path folder, int revision, String weighting) throws IOException {
        SmallCalibration.csv(folder.resolve("runs.csv"));
        Path nb = folder.resolve("study.md");
        Files.writeString(nb, """
                ---
                title: Output set check
                revision: %d
                date: 2026-11-20
                sources:
                  runs: runs.csv
                ---

                ```calibration
                data: runs!runs!A1:B6
                x: Conc
                y: Area
                weighting: %s
                ```
                """.formatted(revision, weighting));
        return nb;
    }

    /** {@code meritbook run} in a new JVM under umask 027, its standard output and error in {@code log}. */
    private static Process child(Path notebook, Path out, Path log, boolean force, String... jvmOptions)
            throws IOException {
        List<String> cmd = new ArrayList<>(List.of("sh", "-c", "umask 027 && exec \"$@\"", "sh",
                Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-XX:TieredStopAtLevel=1", "-XX:+UseSerialGC", "-Xshare:auto", "-Xlog:cds=off", "-Xlog:cds+dynamic=off",
                "-Djava.awt.headless=true"));
        cmd.addAll(List.of(jvmOptions));
        if (jvmOptions.length == 0 && Files.exists(archive)) {
            cmd.add("-XX:SharedArchiveFile=" + archive);
        }
        cmd.addAll(List.of("-cp", classpath, Main.class.getName(), "run", notebook.toString(), "-o", out.toString()));
        if (force) {
            cmd.add("--force");
        }
        return new ProcessBuilder(cmd).redirectErrorStream(true).redirectOutput(log.toFile()).start();
    }

    @Test
    void twoRunsAtOnceCannotBothIssueTheSameRevision() throws Exception {
        Path out = dir.resolve("concurrent/out");
        Path a = study(dir.resolve("concurrent/a"), 1, "none");
        Path b = study(dir.resolve("concurrent/b"), 1, "1/x");
        Path lockFile = out.resolve("study/.meritbook.lock");
        Files.createDirectories(lockFile.getParent());
        Path logA = out.resolveSibling("a.log");
        Path logB = out.resolveSibling("b.log");
        Process first;
        Process second;
        // Hold the study's lock while both start, so both have finished their analysis and stand at
        // the check when it is released: the moment an unlocked check-then-write lets both through.
        try (FileChannel channel = FileChannel.open(lockFile, StandardOpenOption.CREATE, StandardOpenOption.WRITE);
             FileLock held = channel.lock()) {
            first = child(a, out, logA, false);
            second = child(b, out, logB, false);
            awaitLine(logA, "waiting for another run", first);
            awaitLine(logB, "waiting for another run", second);
            assertTrue(held.isValid());
        }
        assertTrue(first.waitFor(300, TimeUnit.SECONDS) && second.waitFor(300, TimeUnit.SECONDS));
        String textA = Files.readString(logA);
        String textB = Files.readString(logB);
        Set<Integer> codes = new TreeSet<>(List.of(first.exitValue(), second.exitValue()));
        assertEquals(Set.of(0, 2), codes, textA + "\n---\n" + textB);
        String loser = first.exitValue() == 2 ? textA : textB;
        assertTrue(loser.contains("Raise 'revision:' in the notebook's front matter"), loser);

        Path rev1 = out.resolve("study/rev1");
        JsonNode results = JSON.readTree(rev1.resolve("results.json").toFile());
        String weighting = results.get("sections").get(0).get("settings").get("Weighting").asText();
        assertEquals(first.exitValue() == 0 ? "none" : "1/x", weighting.startsWith("none") ? "none" : "1/x",
                "the published set is the winner's");
        assertCompleteSet(rev1, 1);

        // Both children ran under umask 027: group may read, others nothing.
        assertEquals(PosixFilePermissions.fromString("rw-r-----"),
                Files.getPosixFilePermissions(rev1.resolve("study-rev1.pdf")));
        assertEquals(PosixFilePermissions.fromString("rwxr-x---"), Files.getPosixFilePermissions(rev1));
    }

    private static void awaitLine(Path log, String text, Process p) throws Exception {
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(300);
        while (System.nanoTime() < deadline) {
            if (Files.exists(log) && Files.readString(log).contains(text)) {
                return;
            }
            if (!p.isAlive()) {
                fail("the run ended without waiting for the lock:\n" + Files.readString(log));
            }
            Thread.sleep(50);
        }
        fail("the run did not reach the lock in time:\n" + Files.readString(log));
    }

    @Test
    void runsKilledAtRandomPointsLeaveCompleteSetsOrNoneAndTheNextRunCleansUp() throws Exception {
        Path work = dir.resolve("killed");
        Path out = work.resolve("out");
        Random random = new Random(SEED);
        int finished = 0;
        for (int i = 0; i < KILLS; i++) {
            int revision = 1 + i % 3;
            Path nb = study(work, revision, (i / 3) % 2 == 0 ? "none" : "1/x");
            Process p = child(nb, out, work.resolve("run" + i + ".log"), true);
            long delay = (long) (random.nextDouble() * runMillis * 1.1);
            if (p.waitFor(delay, TimeUnit.MILLISECONDS)) {
                finished++;
            } else {
                p.destroyForcibly(); // SIGKILL on Unix: no shutdown hook, no finally block runs
                assertTrue(p.waitFor(60, TimeUnit.SECONDS));
            }
            assertOnlyCompleteSets(out.resolve("study"), true);
        }
        Path nb = study(work, 4, "none");
        Path log = work.resolve("last.log");
        Process last = child(nb, out, log, false);
        assertTrue(last.waitFor(300, TimeUnit.SECONDS));
        assertEquals(0, last.exitValue(), Files.readString(log));
        assertOnlyCompleteSets(out.resolve("study"), false);
        assertTrue(Files.isDirectory(out.resolve("study/rev4")));
        // The kills are spread over one measured run; later runs may well be faster (that one ran cold,
        // or beside other work), so only ask that the kills did happen: even runs twice as fast as the
        // measured one are killed 6 times in 20 with this seed (17 at the measured speed).
        assertTrue(KILLS - finished >= KILLS / 4, "at least a quarter of the runs were killed (" + finished + " finished)");
    }

    /** Every entry is the lock, a complete revision set, or (before the next run) a leftover. */
    private static void assertOnlyCompleteSets(Path study, boolean leftoversAllowed) throws Exception {
        if (!Files.exists(study)) {
            return;
        }
        try (Stream<Path> entries = Files.list(study)) {
            for (Path e : entries.toList()) {
                String name = e.getFileName().toString();
                if (name.matches("rev[0-9]+")) {
                    assertCompleteSet(e, Integer.parseInt(name.substring(3)));
                } else if (!name.equals(".meritbook.lock")) {
                    assertTrue(leftoversAllowed && (name.startsWith(".staging-") || name.startsWith(".replaced-")),
                            "unexpected " + name + " in " + study);
                }
            }
        }
    }

    private static void assertCompleteSet(Path rev, int revision) throws Exception {
        try (Stream<Path> files = Files.list(rev)) {
            assertEquals(List.of("results.json", "study-rev" + revision + ".html", "study-rev" + revision + ".pdf",
                    "trail.md"), files.map(f -> f.getFileName().toString()).sorted().toList(), rev.toString());
        }
        byte[] json = Files.readAllBytes(rev.resolve("results.json"));
        assertEquals(revision, JSON.readTree(json).get("study").get("revision").asInt());
        try (PDDocument pdf = Loader.loadPDF(rev.resolve("study-rev" + revision + ".pdf").toFile())) {
            byte[] attached = pdf.getDocumentCatalog().getNames().getEmbeddedFiles().getNames().get("results.json")
                    .getEmbeddedFile().toByteArray();
            assertArrayEquals(json, attached, "the PDF and results.json of " + rev + " belong together");
        }
        String trail = Files.readString(rev.resolve("trail.md"), StandardCharsets.UTF_8);
        assertTrue(trail.contains("Revision " + revision + "."), "trail.md of the same revision");
        assertTrue(Files.readString(rev.resolve("study-rev" + revision + ".html"), StandardCharsets.UTF_8)
                .contains("</html>"), "a whole HTML dossier");
    }
}
