package org.meritbook.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.MemoryMXBean;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.TimeUnit;
import org.meritbook.dossier.DossierRenderer;
import org.meritbook.serve.LiveSession;
import org.meritbook.serve.Snapshot;

/**
 * Measures (asserts nothing) whether the live notebook grows over many re-runs: a session on a copy
 * of a study, its notebook saved N times, each save waited for; heap after a full GC and live thread
 * count printed at the start, every tenth of the way and at the end. Run by bench/live-reruns.sh.
 */
public final class LiveReruns {
    private LiveReruns() {
    }

    public static void main(String[] args) throws Exception {
        Path source = Path.of(args.length > 0 ? args[0] : "demo-data/hmf-honey-validation.md");
        int n = args.length > 1 ? Integer.parseInt(args[1]) : 1000;
        Path notebook = StudyCopy.of(source, "meritbook-reruns");
        String text = Files.readString(notebook);
        LinkedBlockingQueue<Snapshot> done = new LinkedBlockingQueue<>();
        long start = System.nanoTime();
        try (LiveSession session = LiveSession.start(notebook, 0, new DossierRenderer(Optional.empty()), done::add)) {
            next(done);
            System.out.println("serving " + session.server().base() + " (" + notebook + ")");
            print("start", 0, start);
            for (int i = 1; i <= n; i++) {
                // A different comment each time, so every save changes the file and is seen as a change.
                Files.writeString(notebook, text + "\n<!-- save " + i + " -->\n");
                Snapshot s = next(done);
                if (s.state() != Snapshot.State.OK) {
                    throw new IllegalStateException("re-run " + i + " failed: " + s.problems());
                }
                if (i % Math.max(1, n / 10) == 0 || i == n) {
                    print(i == n ? "end" : "re-run", i, start);
                }
            }
        }
        print("closed", n, start);
    }

    private static Snapshot next(LinkedBlockingQueue<Snapshot> done) throws InterruptedException {
        Snapshot s = done.poll(120, TimeUnit.SECONDS);
        if (s == null) {
            throw new IllegalStateException("no run finished within 120 s");
        }
        return s;
    }

    private static void print(String what, int reruns, long start) {
        MemoryMXBean memory = ManagementFactory.getMemoryMXBean();
        System.gc();
        System.gc();
        long heap = memory.getHeapMemoryUsage().getUsed();
        int threads = ManagementFactory.getThreadMXBean().getThreadCount();
        System.out.printf("%-7s re-runs %5d  heap after GC %6.1f MiB  threads %3d  elapsed %7.1f s%n", what, reruns,
                heap / 1048576.0, threads, (System.nanoTime() - start) / 1e9);
    }
}
