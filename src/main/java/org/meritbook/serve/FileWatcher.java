package org.meritbook.serve;

import java.io.IOException;
import java.nio.file.ClosedWatchServiceException;
import java.nio.file.FileSystems;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardWatchEventKinds;
import java.nio.file.WatchEvent;
import java.nio.file.WatchKey;
import java.nio.file.WatchService;
import java.time.Duration;
import java.util.HashMap;
import java.util.HashSet;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.TimeUnit;

/**
 * Calls back once a set of files has changed and then stayed quiet for the debounce time. It
 * watches the files' folders and matches names, because editors and spreadsheet programs save
 * by writing a temporary file and renaming it over the original, which a watch on the file
 * itself would lose.
 */
public final class FileWatcher implements AutoCloseable {
    private final WatchService service;
    private final long debounceNanos;
    private final Runnable onChange;
    private final Thread thread;
    /** Folder to the file names watched in it, and to its registration; guarded by itself. */
    private final Map<Path, Set<String>> names = new HashMap<>();
    private final Map<Path, WatchKey> keys = new HashMap<>();

    public FileWatcher(Duration debounce, Runnable onChange) throws IOException {
        this.service = FileSystems.getDefault().newWatchService();
        this.debounceNanos = debounce.toNanos();
        this.onChange = onChange;
        this.thread = new Thread(this::loop, "meritbook-live-watcher");
        this.thread.setDaemon(true);
    }

    public void start() {
        thread.start();
    }

    /**
     * Watches exactly these files from now on (replacing the previous set). A file whose folder
     * does not exist cannot be watched; it is picked up when a later set names it again.
     */
    public void watch(Set<Path> files) {
        Map<Path, Set<String>> wanted = new HashMap<>();
        for (Path f : files) {
            Path file = f.toAbsolutePath().normalize();
            if (file.getParent() != null && file.getFileName() != null) {
                wanted.computeIfAbsent(file.getParent(), k -> new HashSet<>()).add(file.getFileName().toString());
            }
        }
        synchronized (names) {
            for (Map.Entry<Path, WatchKey> e : Map.copyOf(keys).entrySet()) {
                if (!wanted.containsKey(e.getKey())) {
                    e.getValue().cancel();
                    keys.remove(e.getKey());
                }
            }
            names.clear();
            for (Map.Entry<Path, Set<String>> e : wanted.entrySet()) {
                Path folder = e.getKey();
                if (!keys.containsKey(folder) && Files.isDirectory(folder)) {
                    try {
                        keys.put(folder, folder.register(service, StandardWatchEventKinds.ENTRY_CREATE,
                                StandardWatchEventKinds.ENTRY_MODIFY, StandardWatchEventKinds.ENTRY_DELETE));
                    } catch (IOException | ClosedWatchServiceException ex) {
                        continue;
                    }
                }
                names.put(folder, Set.copyOf(e.getValue()));
            }
        }
    }

    /** The files watched now; for tests and the console. */
    public Set<Path> watched() {
        Set<Path> files = new HashSet<>();
        synchronized (names) {
            names.forEach((folder, in) -> in.forEach(n -> files.add(folder.resolve(n))));
        }
        return files;
    }

    private void loop() {
        long due = 0;
        boolean pending = false;
        try {
            while (true) {
                long waitNanos = pending ? Math.max(due - System.nanoTime(), 0) : TimeUnit.SECONDS.toNanos(1);
                WatchKey key = service.poll(Math.max(TimeUnit.NANOSECONDS.toMillis(waitNanos), 1), TimeUnit.MILLISECONDS);
                if (key != null) {
                    if (concernsWatchedFile(key)) {
                        pending = true;
                        due = System.nanoTime() + debounceNanos;
                    }
                    key.reset();
                }
                if (pending && System.nanoTime() - due >= 0) {
                    pending = false;
                    onChange.run();
                }
            }
        } catch (InterruptedException | ClosedWatchServiceException e) {
            // Closed: the thread ends.
        }
    }

    private boolean concernsWatchedFile(WatchKey key) {
        Path folder = (Path) key.watchable();
        boolean hit = false;
        for (WatchEvent<?> event : key.pollEvents()) {
            if (event.kind() == StandardWatchEventKinds.OVERFLOW) {
                hit = true;
            } else if (event.context() instanceof Path name) {
                synchronized (names) {
                    hit |= names.getOrDefault(folder, Set.of()).contains(name.toString());
                }
            }
        }
        return hit;
    }

    @Override
    public void close() {
        try {
            service.close();
        } catch (IOException e) {
            // Nothing to release beyond what close already did.
        }
        thread.interrupt();
        try {
            thread.join(TimeUnit.SECONDS.toMillis(10));
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }
}
