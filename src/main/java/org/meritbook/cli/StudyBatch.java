package org.meritbook.cli;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.ThreadFactory;
import java.util.concurrent.atomic.AtomicInteger;
import org.meritbook.publishing.PublishingSequence;

/**
 * {@code meritbook run A.md B.md ...}: the studies run at once in this JVM, on a fixed pool of one
 * thread per processor (never more than there are studies). Each study's report is held and printed
 * whole in argument order, then one summary line. A study that cannot run is reported as a single
 * run would report it and the others go on; the exit code is the most severe of the studies' codes.
 *
 * <p>Each worker thread renders with its own publishing sequence (FreeMarker configuration,
 * fonts, glyph coverage, openhtmltopdf builders): a renderer is never used by two threads. What the
 * workers do share is immutable or synchronised: configured Jackson mappers, the chart font, the
 * XML input factory (used under its lock), POI's limits (set under a lock), the study folders'
 * in-process locks.
 */
final class StudyBatch {
    private final List<Path> notebooks;
    private final OutputOptions options;

    StudyBatch(List<Path> notebooks, OutputOptions options) {
        this.notebooks = List.copyOf(notebooks);
        this.options = options;
    }

    /** Runs every study and prints the reports; refuses the whole batch first when two studies would collide. */
    int run(PrintWriter out, PrintWriter err) {
        BatchNotebooks.requireSeparate(notebooks, options.out);
        int threads = Math.min(notebooks.size(), Runtime.getRuntime().availableProcessors());
        ExecutorService pool = Executors.newFixedThreadPool(threads, named());
        ThreadLocal<PublishingSequence> ownSequence = ThreadLocal.withInitial(() -> StudyOutput.sequence(options));
        try {
            List<Future<StudyReport>> pending = new ArrayList<>();
            for (Path notebook : notebooks) {
                pending.add(pool.submit(() -> runOne(notebook, ownSequence)));
            }
            List<StudyReport> reports = new ArrayList<>();
            for (Future<StudyReport> f : pending) {
                StudyReport report = await(f);
                report.printTo(out, err);
                reports.add(report);
            }
            out.println(summary(reports));
            out.flush();
            return reports.stream().mapToInt(StudyReport::code).max().orElse(Main.DONE);
        } finally {
            pool.shutdownNow();
        }
    }

    /** One study, its console text captured; its failure told as {@link Main} tells a single run's. */
    private StudyReport runOne(Path notebook, ThreadLocal<PublishingSequence> ownSequence) {
        StringWriter outText = new StringWriter();
        StringWriter errText = new StringWriter();
        PrintWriter out = new PrintWriter(outText);
        PrintWriter err = new PrintWriter(errText);
        try {
            StudyOutput.Written written = StudyOutput.runAndWrite(ownSequence.get(), notebook, options, out);
            return new StudyReport(notebook, written.code(), written.outcome(), outText.toString(), errText.toString());
        } catch (OutOfMemoryError e) {
            int code = Main.reportOutOfMemory(e, err);
            out.flush();
            return new StudyReport(notebook, code, null, outText.toString(), errText.toString());
        } catch (RuntimeException e) {
            int code = Main.report(e, err);
            out.flush();
            return new StudyReport(notebook, code, null, outText.toString(), errText.toString());
        }
    }

    private static StudyReport await(Future<StudyReport> f) {
        try {
            return f.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("the batch run was interrupted", e);
        } catch (ExecutionException e) {
            // runOne reports every exception itself; what arrives here is an Error other than memory.
            if (e.getCause() instanceof Error error) {
                throw error;
            }
            throw new IllegalStateException("a study of the batch failed", e.getCause());
        }
    }

    /**
     * e.g. {@code meritbook: 4 studies: 2 written, 0 unchanged, 1 failed acceptance (b.md), 1 could not run (c.md)};
     * a study that failed acceptance has its dossier written all the same, as in a single run.
     */
    private static String summary(List<StudyReport> reports) {
        return "meritbook: " + reports.size() + " studies: " + count(reports, StudyReport.Kind.WRITTEN) + " written, "
                + count(reports, StudyReport.Kind.UNCHANGED) + " unchanged, "
                + named(reports, StudyReport.Kind.FAILED_ACCEPTANCE, "failed acceptance") + ", "
                + named(reports, StudyReport.Kind.NOT_RUN, "could not run");
    }

    private static long count(List<StudyReport> reports, StudyReport.Kind kind) {
        return reports.stream().filter(r -> r.kind() == kind).count();
    }

    private static String named(List<StudyReport> reports, StudyReport.Kind kind, String label) {
        List<String> names = reports.stream().filter(r -> r.kind() == kind).map(r -> r.notebook().toString()).toList();
        return names.size() + " " + label + (names.isEmpty() ? "" : " (" + String.join(", ", names) + ")");
    }

    private static ThreadFactory named() {
        AtomicInteger n = new AtomicInteger();
        return r -> new Thread(r, "meritbook-run-" + n.incrementAndGet());
    }
}
