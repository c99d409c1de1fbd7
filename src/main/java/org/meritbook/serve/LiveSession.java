package org.meritbook.serve;

import java.io.IOException;
import java.net.InetAddress;
import java.net.URI;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Optional;
import java.util.Set;
import java.util.function.Consumer;
import org.meritbook.dossier.DossierRenderer;
import org.meritbook.pipeline.StudyRunner;
import org.meritbook.publishing.PublishingSequence;

/**
 * {@code meritbook serve} assembled: the study, the watcher that re-runs it and the server that
 * shows it. Closing stops all three and leaves no thread or port behind.
 */
public final class LiveSession implements AutoCloseable {
    /** Editors often write a file in several steps; one run after they settle is enough. */
    static final Duration DEBOUNCE = Duration.ofMillis(300);

    private final LiveStudy study;
    private final FileWatcher watcher;
    private final LiveServer server;
    /** The runner that keeps parsed workbooks between runs, when this session made the sequence itself. */
    private final StudyRunner ownRunner;

    private LiveSession(LiveStudy study, FileWatcher watcher, LiveServer server, StudyRunner ownRunner) {
        this.study = study;
        this.watcher = watcher;
        this.server = server;
        this.ownRunner = ownRunner;
    }

    /**
     * Starts serving on 127.0.0.1:port (0 for any free port) and runs the study once; the preview
     * shows the earlier revisions in {@code out/} beside the notebook, where "Issue revision" publishes.
     *
     * @param finished told each completed run (for the console); called on the worker thread
     */
    public static LiveSession start(Path notebook, int port, DossierRenderer renderer, Consumer<Snapshot> finished)
            throws IOException {
        Path out = notebook.toAbsolutePath().normalize().getParent().resolve("out");
        StudyRunner runner = StudyRunner.withBuiltInAnalyses().keepingWorkbooks();
        try {
            return start(notebook, new Options(null, port, out), new PublishingSequence(runner::run, renderer),
                    finished, runner);
        } catch (IOException | RuntimeException e) {
            runner.close();
            throw e;
        }
    }

    /**
     * Where to listen, and the output folder whose earlier revisions the preview shows as the next
     * run would and into which "Issue revision" publishes.
     *
     * @param bind the address to listen on, given explicitly; null for 127.0.0.1
     * @param port the port (0 for any free one)
     * @param out  the output root, as {@code meritbook run -o}
     */
    public record Options(InetAddress bind, int port, Path out) {
    }

    /**
     * Starts serving with {@code options} and runs the study once.
     *
     * @param sequence the publishing sequence {@code run} issues with; the preview and "Issue revision" use it
     *                 (with a {@link StudyRunner#keepingWorkbooks} runner, re-runs do not parse an unchanged workbook again)
     */
    public static LiveSession start(Path notebook, Options options, PublishingSequence sequence,
                                    Consumer<Snapshot> finished) throws IOException {
        return start(notebook, options, sequence, finished, null);
    }

    private static LiveSession start(Path notebook, Options options, PublishingSequence sequence,
                                     Consumer<Snapshot> finished, StudyRunner ownRunner) throws IOException {
        LiveStudy[] study = new LiveStudy[1];
        FileWatcher watcher = new FileWatcher(DEBOUNCE, () -> study[0].request());
        study[0] = new LiveStudy(notebook, sequence, Optional.of(options.out()), watcher::watch, finished);
        LiveServer server;
        try {
            // The notebook is watched from the start, so an edit during a failed first parse is seen.
            watcher.watch(Set.of(study[0].notebook()));
            watcher.start();
            server = LiveServer.start(options.bind(), options.port(), study[0], options.out(), sequence);
        } catch (IOException | RuntimeException e) {
            watcher.close();
            throw e;
        }
        study[0].start();
        return new LiveSession(study[0], watcher, server, ownRunner);
    }

    public URI uri() {
        return server.uri();
    }

    public LiveServer server() {
        return server;
    }

    public Snapshot snapshot() {
        return study.snapshot();
    }

    /** The files watched now: the notebook and what its last parse declared. */
    public Set<Path> watched() {
        return watcher.watched();
    }

    @Override
    public void close() {
        server.close();
        watcher.close();
        study.close();
        if (ownRunner != null) {
            ownRunner.close();
        }
    }
}
