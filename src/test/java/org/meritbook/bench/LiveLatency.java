package org.meritbook.bench;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.TimeUnit;
import org.meritbook.dossier.DossierRenderer;
import org.meritbook.serve.LiveSession;
import org.meritbook.serve.Snapshot;

/**
 * Measures (asserts nothing) how soon the live notebook shows a saved change: a session on a copy of
 * a study, the notebook saved N times after a few warm-up saves, each save waited for. Prints, per
 * save and as medians, the server's re-run time (parse, read, compute, results, HTML page) and the
 * time from the file written to the new page state, which adds the file watcher's quiet period, and
 * the process's CPU time per save (on a shared machine the steadier figure). Run by bench/live-latency.sh.
 */
public final class LiveLatency {
    private static final int WARM_UP = 5;

    private LiveLatency() {
    }

    public static void main(String[] args) throws Exception {
        Path source = Path.of(args.length > 0 ? args[0] : "demo-data/hmf-honey-validation.md");
        int n = args.length > 1 ? Integer.parseInt(args[1]) : 20;
        Path notebook = StudyCopy.of(source, "meritbook-latency");
        String text = Files.readString(notebook);
        LinkedBlockingQueue<Snapshot> done = new LinkedBlockingQueue<>();
        List<Long> runMs = new ArrayList<>();
        List<Long> saveToPageMs = new ArrayList<>();
        long cpuAtStart = 0;
        try (LiveSession session = LiveSession.start(notebook, 0, new DossierRenderer(Optional.empty()), done::add)) {
            Snapshot first = next(done);
            System.out.printf("serving %s; first run (cold) %d ms%n", session.server().base(), first.elapsedMs());
            for (int i = 1; i <= WARM_UP + n; i++) {
                if (i == WARM_UP + 1) {
                    cpuAtStart = processCpuNanos();
                }
                // A different narrative line each time: the analyses see the same data, the page changes.
                long written = System.nanoTime();
                Files.writeString(notebook, text + "\nEdit " + i + " of the closing remarks.\n");
                Snapshot s = next(done);
                long toPage = TimeUnit.NANOSECONDS.toMillis(System.nanoTime() - written);
                if (s.state() != Snapshot.State.OK) {
                    throw new IllegalStateException("re-run " + i + " failed: " + s.problems());
                }
                if (i > WARM_UP) {
                    runMs.add(s.elapsedMs());
                    saveToPageMs.add(toPage);
                    System.out.printf("save %3d: re-run %4d ms, save to new page state %4d ms%n", i - WARM_UP,
                            s.elapsedMs(), toPage);
                }
            }
        }
        long cpuPerSave = TimeUnit.NANOSECONDS.toMillis(processCpuNanos() - cpuAtStart) / n;
        System.out.printf("median of %d saves: re-run %d ms, save to new page state %d ms (watcher quiet period "
                + "included); process CPU %d ms per save%n", n, median(runMs), median(saveToPageMs), cpuPerSave);
    }

    /** Every thread of this JVM, the compiler's and the collector's included. */
    private static long processCpuNanos() {
        return ((com.sun.management.OperatingSystemMXBean) java.lang.management.ManagementFactory.getOperatingSystemMXBean())
                .getProcessCpuTime();
    }

    private static long median(List<Long> values) {
        List<Long> sorted = new ArrayList<>(values);
        Collections.sort(sorted);
        return sorted.get(sorted.size() / 2);
    }

    private static Snapshot next(LinkedBlockingQueue<Snapshot> done) throws InterruptedException {
        Snapshot s = done.poll(120, TimeUnit.SECONDS);
        if (s == null) {
            throw new IllegalStateException("no run finished within 120 s");
        }
        return s;
    }
}
