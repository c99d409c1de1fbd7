package org.meritbook.serve;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meritbook.dossier.DossierRenderer;
import org.meritbook.pipeline.StudyResults;
import org.meritbook.pipeline.StudyRunner;
import org.meritbook.revision.ResultsJson;

/** The worker folds requests made during a run into one more run (the overtaken one unseen), and previews what run would issue. */
class LiveStudyTest {
    private static final String NAME = "hmf-honey-validation";

    @TempDir
    Path dir;

    private Path demoCopy() throws Exception {
        Files.copy(Path.of("demo-data", NAME + ".xlsx"), dir.resolve(NAME + ".xlsx"));
        return Files.copy(Path.of("demo-data", NAME + ".md"), dir.resolve(NAME + ".md"));
    }

    @Test
    void requestsDuringARunGiveOneMoreRunAndTheOvertakenRunIsDiscarded() throws Exception {
        Path notebook = demoCopy();
        CountDownLatch release = new CountDownLatch(1);
        CountDownLatch inFirstRun = new CountDownLatch(1);
        AtomicInteger parses = new AtomicInteger();
        LinkedBlockingQueue<Snapshot> done = new LinkedBlockingQueue<>();
        // The first run waits inside the pipeline (after parsing) until the requests are made.
        LiveStudy study = new LiveStudy(notebook, new DossierRenderer(Optional.empty()), files -> {
            if (parses.incrementAndGet() == 1) {
                inFirstRun.countDown();
                await(release);
            }
        }, done::add);
        try {
            study.start();
            assertTrue(inFirstRun.await(15, TimeUnit.SECONDS), "the first run started");
            for (int i = 0; i < 5; i++) {
                study.request();
            }
            release.countDown();
            Snapshot shown = poll(done);
            // The run the five saves overtook was dropped unseen: the first snapshot comes from the second parse.
            assertEquals(2, parses.get(), "five requests during the first run give one more run, not five");
            assertEquals(1, shown.run());
            assertEquals(1, shown.issued().run());
            // Nothing else was queued: the next request is the third parse, shown as run 2.
            study.request();
            assertEquals(2, poll(done).run());
            assertEquals(3, parses.get());
            assertNull(done.peek(), "no further run");
        } finally {
            study.close();
        }
    }

    @Test
    void thePreviewIsTheHtmlThatRunWouldIssueAndTheInputsAreReported() throws Exception {
        Path notebook = demoCopy();
        DossierRenderer renderer = new DossierRenderer(Optional.empty());
        LinkedBlockingQueue<Set<Path>> inputs = new LinkedBlockingQueue<>();
        LinkedBlockingQueue<Snapshot> done = new LinkedBlockingQueue<>();
        LiveStudy study = new LiveStudy(notebook, renderer, inputs::add, done::add);
        Snapshot first;
        try {
            study.start();
            first = poll(done);
        } finally {
            study.close();
        }
        assertEquals(Snapshot.State.OK, first.state());
        assertEquals(Set.of(notebook.toAbsolutePath().normalize(), dir.resolve(NAME + ".xlsx").toAbsolutePath().normalize()),
                inputs.poll(15, TimeUnit.SECONDS));

        StudyResults results = StudyRunner.withBuiltInAnalyses().run(notebook);
        byte[] json = ResultsJson.toBytes(results);
        assertArrayEquals(json, first.issued().json());
        assertArrayEquals(renderer.render(results, json).html(), first.issued().html());
    }

    @Test
    void aRunKilledByAnyThrowableIsReportedAndTheNextRequestRunsAgain() throws Exception {
        Path notebook = demoCopy();
        StudyRunner real = StudyRunner.withBuiltInAnalyses();
        LinkedBlockingQueue<Throwable> failures = new LinkedBlockingQueue<>(List.of(
                new StackOverflowError("injected deep recursion"), new OutOfMemoryError("injected: Java heap space"),
                new AssertionError("injected unexpected state")));
        LinkedBlockingQueue<Snapshot> done = new LinkedBlockingQueue<>();
        LiveStudy study = new LiveStudy(notebook, new DossierRenderer(Optional.empty()), files -> { }, done::add, s -> {
            Throwable t = failures.poll();
            if (t instanceof Error e) {
                throw e;
            }
            return real.run(s);
        });
        try {
            study.start();
            for (String error : List.of("java.lang.StackOverflowError: injected deep recursion",
                    "java.lang.OutOfMemoryError: injected: Java heap space", "java.lang.AssertionError: injected unexpected state")) {
                Snapshot failed = poll(done);
                assertEquals(Snapshot.State.ERROR, failed.state(), error);
                assertEquals(Snapshot.State.ERROR, study.snapshot().state(), "/status shows the failure, not running");
                assertEquals(1, failed.problems().size());
                ShownProblem p = failed.problems().get(0);
                assertEquals("INTERNAL_ERROR", p.key());
                assertEquals(NAME + ".md", p.where());
                assertEquals(error, p.found());
                assertEquals(null, failed.issued(), "nothing to show yet");
                study.request();
            }
            Snapshot recovered = poll(done);
            assertEquals(Snapshot.State.OK, recovered.state());
            assertEquals(4, recovered.run());
            assertEquals(4, recovered.issued().run());
            assertEquals(List.of(), recovered.problems());
        } finally {
            study.close();
        }
    }

    private static Snapshot poll(LinkedBlockingQueue<Snapshot> done) throws InterruptedException {
        Snapshot s = done.poll(90, TimeUnit.SECONDS);
        if (s == null) {
            throw new AssertionError("no run completed within 90 s");
        }
        return s;
    }

    private static void await(CountDownLatch latch) {
        try {
            latch.await(15, TimeUnit.SECONDS);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }
}
