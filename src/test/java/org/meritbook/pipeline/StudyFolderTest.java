package org.meritbook.pipeline;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermission;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;

/** Publishing a revision's output set as one folder, under the study's lock, and cleaning up after crashes. */
class StudyFolderTest {
    @TempDir
    Path out;

    private static Map<String, byte[]> set(String text) {
        Map<String, byte[]> files = new LinkedHashMap<>();
        files.put("s-rev1.pdf", ("%PDF-" + text).getBytes(StandardCharsets.UTF_8));
        files.put("s-rev1.html", ("<html>" + text).getBytes(StandardCharsets.UTF_8));
        files.put("results.json", ("{\"t\":\"" + text + "\"}").getBytes(StandardCharsets.UTF_8));
        files.put("trail.md", ("# " + text).getBytes(StandardCharsets.UTF_8));
        return files;
    }

    private static List<String> names(Path dir) throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    private StudyFolder.Published publish(StudyFolder folder, int revision, Map<String, byte[]> files, boolean force) {
        try (StudyFolder.Lock lock = folder.lock(() -> { })) {
            lock.cleanUp();
            return lock.publish(revision, files, force);
        }
    }

    @Test
    void aSetAppearsAsOneRevisionFolder() throws IOException {
        StudyFolder folder = new StudyFolder(out.resolve("s"));
        StudyFolder.Published p = publish(folder, 1, set("a"), false);
        assertEquals(StudyFolder.Outcome.NEW, p.outcome());
        assertEquals(List.of(".meritbook.lock", "rev1"), names(folder.path()), "no staging folder left");
        assertEquals(List.of("results.json", "s-rev1.html", "s-rev1.pdf", "trail.md"), names(p.folder()));
        assertArrayEquals(set("a").get("s-rev1.pdf"), Files.readAllBytes(p.files().get(0)));
    }

    @Test
    void anIdenticalRerunWritesNothing() throws IOException {
        StudyFolder folder = new StudyFolder(out.resolve("s"));
        publish(folder, 1, set("a"), false);
        long modified = Files.getLastModifiedTime(folder.revision(1).resolve("s-rev1.pdf")).toMillis();
        assertEquals(StudyFolder.Outcome.UNCHANGED, publish(folder, 1, set("a"), false).outcome());
        assertEquals(modified, Files.getLastModifiedTime(folder.revision(1).resolve("s-rev1.pdf")).toMillis());
    }

    @Test
    void aDifferentSetOfTheSameRevisionIsRefusedNamingEachFileAndKept() throws IOException {
        StudyFolder folder = new StudyFolder(out.resolve("s"));
        publish(folder, 1, set("first"), false);
        InputException e = assertThrows(InputException.class, () -> publish(folder, 1, set("second"), false));
        assertEquals(ErrorKey.OUTPUT_EXISTS, e.key());
        assertEquals(4, e.problems().size(), "every differing file is named");
        assertTrue(e.getMessage().contains("Raise 'revision:'") && e.getMessage().contains("--force"), e.getMessage());
        for (Map.Entry<String, byte[]> f : set("first").entrySet()) {
            assertArrayEquals(f.getValue(), Files.readAllBytes(folder.revision(1).resolve(f.getKey())), "kept");
        }
        assertEquals(List.of(".meritbook.lock", "rev1"), names(folder.path()));
    }

    @Test
    void forceReplacesTheWholeSet() throws IOException {
        StudyFolder folder = new StudyFolder(out.resolve("s"));
        publish(folder, 1, set("first"), false);
        assertEquals(StudyFolder.Outcome.REPLACED, publish(folder, 1, set("second"), true).outcome());
        for (Map.Entry<String, byte[]> f : set("second").entrySet()) {
            assertArrayEquals(f.getValue(), Files.readAllBytes(folder.revision(1).resolve(f.getKey())));
        }
        assertEquals(List.of(".meritbook.lock", "rev1"), names(folder.path()), "nothing set aside is left");
    }

    @Test
    void aNewRevisionSitsBesideTheOldOneWhichStaysUntouched() throws IOException {
        StudyFolder folder = new StudyFolder(out.resolve("s"));
        publish(folder, 1, set("first"), false);
        publish(folder, 2, set("second"), false);
        assertEquals(List.of(".meritbook.lock", "rev1", "rev2"), names(folder.path()));
        assertArrayEquals(set("first").get("results.json"), Files.readAllBytes(folder.revision(1).resolve("results.json")));
    }

    /** The states a run killed at each step of publishing leaves, and what the next run makes of them. */
    @Test
    void theNextRunCleansUpWhateverAnInterruptedRunLeft() throws IOException {
        StudyFolder folder = new StudyFolder(out.resolve("s"));
        publish(folder, 1, set("first"), false);
        publish(folder, 3, set("third"), false);
        Path root = folder.path();
        // killed while staging: a half-written staging folder
        Files.createDirectories(root.resolve(".staging-rev2-0a1b2c"));
        Files.write(root.resolve(".staging-rev2-0a1b2c/s-rev1.pdf"), new byte[100]);
        // killed by --force between setting revision 1 aside and moving its replacement in
        Files.move(folder.revision(1), root.resolve(".replaced-rev1-00ff00"));
        // killed by --force after the replacement was in place, before the old set was removed
        Files.createDirectories(root.resolve(".replaced-rev3-abcdef"));
        // an older version's half-written temporary file
        Files.write(root.resolve(".s-rev1.pdf123456.part"), new byte[10]);

        List<String> notes;
        try (StudyFolder.Lock lock = folder.lock(() -> { })) {
            notes = lock.cleanUp();
        }
        assertEquals(List.of(".meritbook.lock", "rev1", "rev3"), names(root), notes.toString());
        assertEquals(4, notes.size(), notes.toString());
        assertTrue(notes.contains("restored rev1, which an interrupted --force run had set aside"), notes.toString());
        assertArrayEquals(set("first").get("s-rev1.pdf"), Files.readAllBytes(folder.revision(1).resolve("s-rev1.pdf")));
    }

    @Test
    void somethingElseInTheFolderIsLeftAlone() throws IOException {
        StudyFolder folder = new StudyFolder(out.resolve("s"));
        Files.createDirectories(folder.path().resolve(".staging-notes"));
        Files.writeString(folder.path().resolve("README.txt"), "the analyst's own note");
        publish(folder, 1, set("a"), false);
        assertEquals(List.of(".meritbook.lock", ".staging-notes", "README.txt", "rev1"), names(folder.path()));
    }

    @Test
    void outputsTakeTheModeTheUmaskGives() throws Exception {
        Process p = new ProcessBuilder("sh", "-c", "umask").start();
        int umask = Integer.parseInt(new String(p.getInputStream().readAllBytes(), StandardCharsets.US_ASCII).trim(), 8);
        assertEquals(0, p.waitFor());
        StudyFolder folder = new StudyFolder(out.resolve("s"));
        publish(folder, 1, set("a"), false);
        AtomicFiles.write(out.resolve("single.md"), new byte[] {1});
        assertEquals(mode(0666 & ~umask), Files.getPosixFilePermissions(folder.revision(1).resolve("s-rev1.pdf")));
        assertEquals(mode(0666 & ~umask), Files.getPosixFilePermissions(out.resolve("single.md")));
        assertEquals(mode(0777 & ~umask), Files.getPosixFilePermissions(folder.revision(1)));
    }

    static Set<PosixFilePermission> mode(int bits) {
        StringBuilder s = new StringBuilder();
        String rwx = "rwxrwxrwx";
        for (int i = 0; i < 9; i++) {
            s.append((bits & (1 << (8 - i))) != 0 ? rwx.charAt(i) : '-');
        }
        return PosixFilePermissions.fromString(s.toString());
    }

    // Issue 6: the user's environment is a located error (exit 2) with a fix, never an internal error.

    @Test
    void aFileWhereTheOutputFolderShouldBeIsALocatedError() throws IOException {
        Path file = Files.writeString(out.resolve("results"), "a note the user keeps here");
        InputException e = assertThrows(InputException.class,
                () -> publish(new StudyFolder(file.resolve("s")), 1, set("a"), false));
        assertEquals(ErrorKey.OUTPUT_NOT_WRITABLE, e.key());
        assertEquals(file.toAbsolutePath().toString(), e.problems().get(0).where());
        assertTrue(e.getMessage().contains("-o DIR"), e.getMessage());
        assertEquals("a note the user keeps here", Files.readString(file));
    }

    @Test
    void aFolderWhereTheDossierShouldBeIsALocatedErrorEvenUnderForce() throws IOException {
        StudyFolder folder = new StudyFolder(out.resolve("s"));
        Path inTheWay = Files.createDirectories(folder.revision(1).resolve("s-rev1.pdf"));
        Files.writeString(inTheWay.resolve("keep.txt"), "mine");
        for (boolean force : new boolean[] {false, true}) {
            InputException e = assertThrows(InputException.class, () -> publish(folder, 1, set("a"), force));
            assertEquals(ErrorKey.OUTPUT_NOT_WRITABLE, e.key());
            assertEquals(inTheWay.toString(), e.problems().get(0).where());
        }
        assertEquals("mine", Files.readString(inTheWay.resolve("keep.txt")), "the user's folder is never removed");
    }

    @Test
    void aRefusedWriteIsALocatedErrorWithAFix() {
        // Tests may run as root, for whom a read-only folder is writable: the refusal is given directly.
        Path folder = out.resolve("readonly");
        InputException e = OutputProblem.of(folder, new java.nio.file.AccessDeniedException(folder.toString()));
        assertEquals(ErrorKey.OUTPUT_NOT_WRITABLE, e.key());
        assertEquals(folder.toString(), e.problems().get(0).where());
        assertTrue(e.getMessage().contains("no permission to write there"), e.getMessage());
        assertTrue(e.getMessage().contains("Make the folder writable, or choose another output folder with -o DIR."));
    }

    @Test
    void aReadOnlyFolderIsALocatedErrorWhenTheSystemEnforcesIt() throws IOException {
        Path folder = Files.createDirectory(out.resolve("locked"));
        Files.setPosixFilePermissions(folder, PosixFilePermissions.fromString("r-xr-xr-x"));
        try {
            org.junit.jupiter.api.Assumptions.assumeFalse(Files.isWritable(folder), "running as root");
            InputException e = assertThrows(InputException.class,
                    () -> publish(new StudyFolder(folder.resolve("s")), 1, set("a"), false));
            assertEquals(ErrorKey.OUTPUT_NOT_WRITABLE, e.key());
        } finally {
            Files.setPosixFilePermissions(folder, PosixFilePermissions.fromString("rwxr-xr-x"));
        }
    }
}
