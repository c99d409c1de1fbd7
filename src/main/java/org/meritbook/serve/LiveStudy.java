package org.meritbook.serve;

import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.Consumer;
import java.util.function.Function;
import org.meritbook.criteria.AcceptanceProfiles;
import org.meritbook.dossier.DossierRenderer;
import org.meritbook.error.InputException;
import org.meritbook.pipeline.SideTask;
import org.meritbook.pipeline.StudyResults;
import org.meritbook.pipeline.StudyRunner;
import org.meritbook.publishing.PublishingSequence;
import org.meritbook.revision.RevisionContext;
import org.meritbook.revision.RevisionDiff;
import org.meritbook.revision.RevisionDiffer;
import org.meritbook.study.SourceFile;
import org.meritbook.study.Study;
import org.meritbook.study.StudyParser;

/**
 * A notebook kept up to date: takes the steps of the publishing sequence {@code run} issues with
 * (parse, the study, its earlier revisions, results.json, the HTML dossier; {@link PublishingSequence})
 * on one background thread whenever {@link #request()} is called. Requests that arrive during a run
 * are folded into a single following run, so a burst of saves costs at most one extra run, and
 * the overtaken run's result is discarded unseen. Writes nothing to disk.
 */
public final class LiveStudy implements AutoCloseable {
    private final Path notebook;
    private final PublishingSequence sequence;
    private final Optional<Path> out;
    private final Consumer<Set<Path>> inputsChanged;
    private final Consumer<Snapshot> finished;
    private final AtomicReference<Snapshot> current = new AtomicReference<>(Snapshot.initial());
    private final Object lock = new Object();
    private final Thread worker;
    private boolean requested;
    private boolean closed;
    /**
     * The last shown run's results.json as parsed for its comparison, so that the next comparison
     * parses only its own run's; read and written by the worker thread only (after the join).
     */
    private RevisionDiffer.Parsed lastParsed;

    /**
     * A preview that knows no output folder, so no earlier revision: a first revision's dossier.
     *
     * @param notebook      the study notebook
     * @param renderer      renders the HTML dossier (default or a lab's templates)
     * @param inputsChanged told the files the notebook reads (itself, its workbooks, a profile file) after each parse
     * @param finished      told each completed run's snapshot (for the console)
     */
    public LiveStudy(Path notebook, DossierRenderer renderer, Consumer<Set<Path>> inputsChanged, Consumer<Snapshot> finished) {
        this(notebook, renderer, inputsChanged, finished, StudyRunner.withBuiltInAnalyses()::run);
    }

    /** With another pipeline step between parse and rendering (tests inject failures here). */
    LiveStudy(Path notebook, DossierRenderer renderer, Consumer<Set<Path>> inputsChanged, Consumer<Snapshot> finished,
              Function<Study, StudyResults> runner) {
        this(notebook, new PublishingSequence(runner, renderer), Optional.empty(), inputsChanged, finished);
    }

    /**
     * @param sequence the publishing sequence {@code run} issues with
     * @param out      the output folder {@code run} writes into ({@code -o}): the preview shows the history
     *                 and the changes since the latest revision published there, as the next run would
     */
    public LiveStudy(Path notebook, PublishingSequence sequence, Optional<Path> out, Consumer<Set<Path>> inputsChanged,
                     Consumer<Snapshot> finished) {
        this.sequence = sequence;
        this.out = out;
        this.notebook = notebook.toAbsolutePath().normalize();
        this.inputsChanged = inputsChanged;
        this.finished = finished;
        this.worker = new Thread(this::work, "meritbook-live-runner");
        this.worker.setDaemon(true);
    }

    /** The publishing sequence this preview takes its steps from ("Issue revision" publishes with it). */
    PublishingSequence sequence() {
        return sequence;
    }

    public Path notebook() {
        return notebook;
    }

    /** Starts the worker and the first run. */
    public void start() {
        worker.start();
        request();
    }

    /** Asks for a run; returns at once. */
    public void request() {
        synchronized (lock) {
            requested = true;
            lock.notifyAll();
        }
    }

    public Snapshot snapshot() {
        return current.get();
    }

    private void work() {
        while (true) {
            synchronized (lock) {
                while (!requested && !closed) {
                    try {
                        lock.wait();
                    } catch (InterruptedException e) {
                        return;
                    }
                }
                if (closed) {
                    return;
                }
                requested = false;
            }
            try {
                runOnce();
            } catch (Throwable e) {
                // Only the bookkeeping around the pipeline or the console callback can get here; the
                // worker lives on, and a run left half done is not shown as running for ever.
                current.updateAndGet(s -> s.state() == Snapshot.State.RUNNING ? failed(s, e) : s);
                e.printStackTrace(System.err);
            }
        }
    }

    private Snapshot failed(Snapshot before, Throwable e) {
        return new Snapshot(before.run() + 1, Snapshot.State.ERROR, List.of(ShownProblem.internal(notebook.getFileName().toString(), e)),
                before.elapsedMs(), Instant.now(), before.issued());
    }

    private void runOnce() {
        Snapshot before = current.updateAndGet(Snapshot::running);
        long start = System.nanoTime();
        Snapshot.Issued issued = before.issued();
        List<ShownProblem> problems = new ArrayList<>();
        int run = before.run() + 1;
        try {
            Study study = StudyParser.parse(notebook);
            inputsChanged.accept(inputs(study));
            StudyResults results = sequence.run(study);
            PublishingSequence.Draft draft = out.isPresent()
                    ? sequence.draft(results, PublishingSequence.studyFolder(out.get(), study))
                    : sequence.draft(results, RevisionContext.none());
            byte[] json = draft.json();
            Snapshot.Issued previous = issued;
            RevisionDiffer.Parsed parsedBefore = lastParsed;
            // Compared with the last successful run, so a fix after a broken save lists what the edits
            // moved; worked out on a second thread while this one renders the page.
            SideTask<Compared> changes = SideTask.start("meritbook-live-changes",
                    () -> compare(previous, parsedBefore, run, json));
            byte[] html = sequence.html(draft);
            Compared compared = changes.join("listing the changes since the last run");
            List<RevisionDiff.Change> changed = compared.changes();
            lastParsed = compared.now();
            issued = new Snapshot.Issued(run, study.frontMatter().title(), study.frontMatter().revision(), html, json,
                    Outcome.of(results), previous == null ? 0 : previous.run(), changed, PointIndex.of(results),
                    Instant.now());
        } catch (InputException e) {
            e.problems().forEach(p -> problems.add(ShownProblem.of(p)));
        } catch (Throwable e) {
            // Anything else, even OutOfMemoryError or StackOverflowError: the run's objects are garbage
            // now, so the preview keeps serving; the error is shown on the page, its stack trace on the
            // console, and the next save runs again.
            problems.add(ShownProblem.internal(notebook.getFileName().toString(), e));
            e.printStackTrace(System.err);
        }
        long elapsed = TimeUnit.NANOSECONDS.toMillis(System.nanoTime() - start);
        if (overtaken()) {
            // A save arrived while this run read the files: its result may already be out of date, so
            // it is dropped and the next run (already requested) is the one shown.
            current.set(before);
            return;
        }
        Snapshot.State state = problems.isEmpty() ? Snapshot.State.OK : Snapshot.State.ERROR;
        Snapshot done = new Snapshot(run, state, problems, elapsed, Instant.now(), issued);
        current.set(done);
        finished.accept(done);
    }

    /** The changes since the previous run, and this run's results.json parsed for the next comparison. */
    private record Compared(List<RevisionDiff.Change> changes, RevisionDiffer.Parsed now) {
    }

    private static Compared compare(Snapshot.Issued previous, RevisionDiffer.Parsed parsedBefore, int run, byte[] json) {
        RevisionDiffer.Parsed now = RevisionDiffer.parse("run " + run, json);
        if (previous == null) {
            return new Compared(List.of(), now);
        }
        // The previous run's tree is reused only when it is that run's (an overtaken run was parsed but never shown).
        String label = "run " + previous.run();
        RevisionDiffer.Parsed before = parsedBefore != null && parsedBefore.label().equals(label)
                ? parsedBefore : RevisionDiffer.parse(label, previous.json());
        return new Compared(RevisionDiffer.diff(before, now).results(), now);
    }

    private boolean overtaken() {
        synchronized (lock) {
            return requested && !closed;
        }
    }

    /** The files a run reads: the notebook, each declared workbook, and a laboratory's profile file. */
    private Set<Path> inputs(Study study) {
        Set<Path> files = new LinkedHashSet<>();
        files.add(notebook);
        for (SourceFile source : study.sources().values()) {
            files.add(source.path().toAbsolutePath().normalize());
        }
        Optional<Path> profile = AcceptanceProfiles.file(study);
        profile.ifPresent(p -> files.add(p.toAbsolutePath().normalize()));
        return files;
    }

    /** Stops the worker after the run in progress, if any (a run takes about a second). */
    @Override
    public void close() {
        synchronized (lock) {
            closed = true;
            lock.notifyAll();
        }
        try {
            worker.join(TimeUnit.SECONDS.toMillis(30));
            if (worker.isAlive()) {
                worker.interrupt();
                worker.join(TimeUnit.SECONDS.toMillis(5));
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }
}
