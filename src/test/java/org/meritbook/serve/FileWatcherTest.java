package org.meritbook.serve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.time.Duration;
import java.util.Set;
import java.util.concurrent.Semaphore;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Saves are noticed by folder and name, settle into one call, and unrelated files are ignored. */
class FileWatcherTest {
    @TempDir
    Path dir;
    private final Semaphore calls = new Semaphore(0);
    private FileWatcher watcher;

    @BeforeEach
    void start() throws Exception {
        watcher = new FileWatcher(Duration.ofMillis(300), calls::release);
        watcher.start();
    }

    @AfterEach
    void stop() {
        watcher.close();
        assertFalse(Thread.getAllStackTraces().keySet().stream()
                .anyMatch(t -> t.isAlive() && t.getName().equals("meritbook-live-watcher")), "watcher thread left running");
    }

    @Test
    void aBurstOfWritesGivesOneCall() throws Exception {
        Path file = Files.writeString(dir.resolve("study.md"), "one");
        watcher.watch(Set.of(file));
        for (int i = 0; i < 5; i++) {
            Files.writeString(file, "edit " + i);
        }
        assertTrue(calls.tryAcquire(15, TimeUnit.SECONDS), "a call after the burst");
        // Quiet files give no further call; 1 s is three debounce periods.
        assertFalse(calls.tryAcquire(1, TimeUnit.SECONDS), "one call for the whole burst");
    }

    @Test
    void aRenameOverTheFileIsASave() throws Exception {
        Path file = Files.writeString(dir.resolve("data.xlsx"), "old");
        watcher.watch(Set.of(file));
        Path temporary = Files.writeString(dir.resolve("tmp1234"), "new");
        Files.move(temporary, file, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        assertTrue(calls.tryAcquire(15, TimeUnit.SECONDS));
    }

    @Test
    void otherFilesInTheFolderAreIgnored() throws Exception {
        Path file = Files.writeString(dir.resolve("study.md"), "one");
        watcher.watch(Set.of(file));
        Files.writeString(dir.resolve("notes.txt"), "not an input");
        assertFalse(calls.tryAcquire(1, TimeUnit.SECONDS), "no call for a file not watched");
        Files.writeString(file, "two");
        assertTrue(calls.tryAcquire(15, TimeUnit.SECONDS), "the watched file still counts");
    }

    @Test
    void aNewSetReplacesTheOldOneAcrossFolders() throws Exception {
        Path first = Files.writeString(dir.resolve("a.md"), "a");
        Path other = Files.createDirectories(dir.resolve("data"));
        Path second = Files.writeString(other.resolve("b.xlsx"), "b");
        watcher.watch(Set.of(first));
        watcher.watch(Set.of(second));
        assertEquals(Set.of(second.toAbsolutePath().normalize()), watcher.watched());
        Files.writeString(first, "no longer an input");
        assertFalse(calls.tryAcquire(1, TimeUnit.SECONDS), "the dropped file is not watched");
        Files.writeString(second, "changed");
        assertTrue(calls.tryAcquire(15, TimeUnit.SECONDS), "the file in the new folder is watched");
    }
}
