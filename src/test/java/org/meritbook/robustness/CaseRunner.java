package org.meritbook.robustness;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import java.util.function.Function;
import org.meritbook.analysis.Quantity;
import org.meritbook.analysis.SectionResult;
import org.meritbook.cli.Main;
import org.meritbook.analysis.Verdict;
import org.meritbook.dossier.DossierRenderer;
import org.meritbook.error.InputException;
import org.meritbook.error.Problem;
import org.meritbook.pipeline.StudyResults;
import org.meritbook.pipeline.StudyRunner;
import org.meritbook.revision.ResultsJson;
import org.meritbook.trail.Step;
import org.meritbook.trail.StepInput;

/**
 * Runs one corpus case through the whole pipeline, as {@code meritbook run} does (parse, read,
 * analyse, judge, results.json, the HTML dossier; the PDF on request), bounded in time, and
 * classifies how it ended against its expectation.
 */
final class CaseRunner implements AutoCloseable {
    /** Generous: a case takes well under a second; a hang is what this bounds. */
    static final long SECONDS = 60;

    /** How a case ended. The last six are failures, and the statistics gap in strict mode. */
    enum Outcome {
        SAME_RESULT("same numbers as unmutated"),
        RESULT("result"),
        NOT_EVALUABLE("not evaluable"),
        LOCATED_ERROR("located error (exit 2)"),
        /**
         * An internal error inside the statistics or an analysis on data the reader read faithfully
         * (1e300, 4.9e-324): the statistics' own preconditions, which issue 6 asks for separately, must
         * turn these into "not evaluable" or a located error. Counted and listed; a failure under
         * {@code -Dcorpus.strict=true}.
         */
        STATISTICS_GAP("internal error in the statistics on valid data"),
        WRONG_NUMBER("FAIL: wrong number"),
        UNEXPECTED_RESULT("FAIL: result where an error was due"),
        WRONG_KEY("FAIL: another error than due"),
        UNLOCATED_ERROR("FAIL: unlocated error"),
        INTERNAL_ERROR("FAIL: internal error"),
        TIMEOUT("FAIL: timeout");

        final String label;

        Outcome(String label) {
            this.label = label;
        }

        boolean failed() {
            return ordinal() >= WRONG_NUMBER.ordinal() || (this == STATISTICS_GAP && Boolean.getBoolean("corpus.strict"));
        }
    }

    /** The outcome with what a reader of a failure needs, and what of the dossier was rendered. */
    record Ended(Outcome outcome, String detail, Throwable error, Rendering rendered) {
        Ended(Outcome outcome, String detail, Throwable error) {
            this(outcome, detail, error, Rendering.NONE);
        }
    }

    /** What is compared between a case and its unmutated run: every quantity bit for bit, every verdict's outcome. */
    record Fingerprint(Map<String, Long> quantities, List<String> verdicts, int notEvaluable, int points) {
        static Fingerprint of(StudyResults r) {
            Map<String, Long> q = new LinkedHashMap<>();
            List<String> v = new ArrayList<>();
            int ne = 0;
            for (SectionResult s : r.sections()) {
                for (Quantity x : s.quantities()) {
                    q.put(s.id() + "." + x.name(), Double.doubleToLongBits(x.value()));
                }
                for (Verdict verdict : s.verdicts()) {
                    v.add(s.id() + "." + verdict.quantity() + "=" + verdict.outcome());
                    ne += verdict.outcome() == Verdict.Outcome.NOT_EVALUABLE ? 1 : 0;
                }
                ne += (int) s.warnings().stream().filter(w -> w.contains("not evaluable")).count();
            }
            return new Fingerprint(q, v, ne, CaseRunner.points(r));
        }

        boolean sameNumbers(Fingerprint other) {
            return quantities.equals(other.quantities) && verdicts.equals(other.verdicts);
        }
    }

    private final Path root;
    private final DossierRenderer renderer = new DossierRenderer(Optional.empty());
    private ExecutorService executor = newExecutor();
    private int serial;

    CaseRunner(Path root) {
        this.root = root;
    }

    private static ExecutorService newExecutor() {
        return Executors.newSingleThreadExecutor(r -> {
            Thread t = new Thread(r, "corpus-case");
            t.setDaemon(true); // a hung case must not keep the test JVM alive
            return t;
        });
    }

    /** Writes the case's files into a folder of its own. */
    Path write(CorpusCase c) {
        Path dir = root.resolve("case-" + (serial++));
        try {
            Files.createDirectories(dir);
            for (Map.Entry<String, byte[]> f : c.files().entrySet()) {
                Files.write(dir.resolve(f.getKey()), f.getValue());
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return dir;
    }

    /** The unmutated run's fingerprint; it must succeed, dossier included. */
    Fingerprint baseline(CorpusCase c) {
        StudyResults r = StudyRunner.withBuiltInAnalyses().run(write(c).resolve(c.notebook()));
        renderer.renderHtml(r, ResultsJson.toBytes(r));
        return Fingerprint.of(r);
    }

    /** What of the dossier a case renders once its results are judged. */
    enum Rendering {
        NONE, HTML, PDF
    }

    /**
     * CPU time spent per stage over this runner's cases, in nanoseconds: run (parse, read, analyse,
     * judge), results.json, HTML, PDF. CPU time, not wall time, so a loaded machine does not inflate it.
     */
    final long[] nanos = new long[4];
    private static final java.lang.management.ThreadMXBean CPU = java.lang.management.ManagementFactory.getThreadMXBean();

    private static long cpu() {
        return CPU.getCurrentThreadCpuTime();
    }

    /**
     * @param rendering what to render, given how the case ended (the HTML dossier costs more than the
     *                  run itself, so the corpus renders it where a change could break it)
     */
    Ended run(CorpusCase c, Fingerprint base, Function<Outcome, Rendering> rendering) {
        Path dir = write(c);
        Future<Ended> f = executor.submit(() -> {
            long t0 = cpu();
            StudyResults results;
            try {
                results = StudyRunner.withBuiltInAnalyses().run(dir.resolve(c.notebook()));
            } catch (RuntimeException e) {
                return failed(c, e);
            } finally {
                nanos[0] += cpu() - t0;
            }
            long t1 = cpu();
            byte[] json = ResultsJson.toBytes(results);
            nanos[1] += cpu() - t1;
            Ended judged = judge(c, results, base);
            Rendering r = judged.outcome().failed() ? Rendering.NONE : rendering.apply(judged.outcome());
            try {
                render(results, json, r);
            } catch (RuntimeException e) {
                return new Ended(Outcome.INTERNAL_ERROR, "rendering the dossier: " + e, e, r);
            }
            return new Ended(judged.outcome(), judged.detail(), judged.error(), r);
        });
        try {
            return f.get(SECONDS, TimeUnit.SECONDS);
        } catch (TimeoutException e) {
            f.cancel(true);
            executor.shutdownNow();
            executor = newExecutor();
            return new Ended(Outcome.TIMEOUT, "no end within " + SECONDS + " s", e, Rendering.NONE);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException(e);
        } catch (ExecutionException e) {
            return failed(c, e.getCause()); // an Error (StackOverflowError, OutOfMemoryError): internal
        }
    }

    private void render(StudyResults results, byte[] json, Rendering r) {
        if (r == Rendering.NONE) {
            return;
        }
        long t = cpu();
        byte[] html = renderer.renderHtml(results, json);
        nanos[2] += cpu() - t;
        if (html.length == 0) {
            throw new IllegalStateException("an empty HTML dossier");
        }
        if (r == Rendering.PDF) {
            long p = cpu();
            renderer.render(results, json);
            nanos[3] += cpu() - p;
        }
    }

    private static Ended failed(CorpusCase c, Throwable t) {
        if (t instanceof InputException input) {
            for (Problem p : input.problems()) {
                // A file of the case, or the notebook line that names a file (a mistyped source is not among the files).
                boolean located = c.files().keySet().stream().anyMatch(name -> p.where().startsWith(name))
                        || p.where().matches(".*\\(notebook line \\d+\\)$");
                if (!located) {
                    return new Ended(Outcome.UNLOCATED_ERROR, p.message(), t);
                }
            }
            if (c.expectation() instanceof CorpusCase.Same) {
                return new Ended(Outcome.WRONG_KEY, "a benign change refused: " + input.getMessage(), t);
            }
            if (c.expectation() instanceof CorpusCase.Refused r && !r.keys().isEmpty() && !r.keys().contains(input.key())) {
                return new Ended(Outcome.WRONG_KEY, "expected " + r.keys() + ": " + input.getMessage(), t);
            }
            return new Ended(Outcome.LOCATED_ERROR, input.problems().get(0).key().name(), t);
        }
        boolean validData = c.expectation() instanceof CorpusCase.Faithful || c.expectation() instanceof CorpusCase.Anything
                || c.expectation() instanceof CorpusCase.NotFrom;
        if (validData && t instanceof RuntimeException && thrownIn(t, "org.meritbook.stats.", "org.meritbook.analysis.")) {
            return new Ended(Outcome.STATISTICS_GAP, t.toString(), t);
        }
        return new Ended(Outcome.INTERNAL_ERROR, t.toString(), t);
    }

    /** Whether the first meritbook frame of the stack lies in one of the packages. */
    private static boolean thrownIn(Throwable t, String... packages) {
        for (StackTraceElement f : t.getStackTrace()) {
            if (f.getClassName().startsWith("org.meritbook.")) {
                return java.util.Arrays.stream(packages).anyMatch(f.getClassName()::startsWith);
            }
        }
        return false;
    }

    private static Ended judge(CorpusCase c, StudyResults r, Fingerprint base) {
        Fingerprint f = Fingerprint.of(r);
        boolean same = base != null && f.sameNumbers(base);
        Outcome kept = same ? Outcome.SAME_RESULT
                : base != null && f.notEvaluable() > base.notEvaluable() ? Outcome.NOT_EVALUABLE : Outcome.RESULT;
        CorpusCase.Expectation e = c.expectation();
        if (e instanceof CorpusCase.Same || e instanceof CorpusCase.ErrorOrSame) {
            return same ? new Ended(Outcome.SAME_RESULT, "", null)
                    : new Ended(Outcome.WRONG_NUMBER, (e instanceof CorpusCase.Same ? "a benign change changed " : "damage gave other numbers: ")
                            + difference(f, base), null);
        }
        if (e instanceof CorpusCase.Refused) {
            return new Ended(Outcome.UNEXPECTED_RESULT, "damage was read: " + difference(f, base), null);
        }
        if (e instanceof CorpusCase.NotFrom n) {
            Optional<String> used = usedInFit(r, n.cells());
            if (used.isPresent()) {
                return new Ended(Outcome.WRONG_NUMBER, "a damaged cell became a number: " + used.get(), null);
            }
            int points = points(r);
            int expected = base == null ? -1 : base.points() - n.fewer();
            return n.fewer() >= 0 && points != expected
                    ? new Ended(Outcome.WRONG_NUMBER, "expected " + expected + " points, found " + points, null)
                    : new Ended(kept, "", null);
        }
        if (e instanceof CorpusCase.Faithful fa) {
            boolean exact = r.sections().stream().flatMap(s -> s.steps().stream()).flatMap(st -> st.inputs().stream())
                    .anyMatch(in -> in.text() == null && in.source().equals(fa.cell()) && Double.compare(in.value(), fa.value()) == 0);
            return exact || kept == Outcome.NOT_EVALUABLE ? new Ended(kept, "", null)
                    : new Ended(Outcome.WRONG_NUMBER, fa.cell() + " not used as " + fa.value(), null);
        }
        return new Ended(kept, "", null);
    }

    /**
     * The first of the cells the fit of a section uses as a number: an input of the step that lists the
     * points in the fit (quantity {@code n}). Points left out are still shown and back-calculated, as
     * excluded points are, so other steps may cite them.
     */
    static Optional<String> usedInFit(StudyResults r, java.util.Set<String> cells) {
        for (SectionResult s : r.sections()) {
            for (Step st : s.steps()) {
                if (!st.id().endsWith(".n")) {
                    continue;
                }
                for (StepInput in : st.inputs()) {
                    if (in.text() == null && cells.contains(in.source())) {
                        return Optional.of(st.id() + " " + in.name() + " = " + in.value() + " from " + in.source());
                    }
                }
            }
        }
        return Optional.empty();
    }

    private static int points(StudyResults r) {
        return r.sections().isEmpty() ? -1 : r.sections().get(0).quantity("n").map(q -> (int) q.value()).orElse(-1);
    }

    private static String difference(Fingerprint f, Fingerprint base) {
        if (base == null) {
            return "(no baseline)";
        }
        for (Map.Entry<String, Long> e : base.quantities().entrySet()) {
            Long v = f.quantities().get(e.getKey());
            if (!e.getValue().equals(v)) {
                return e.getKey() + " " + Double.longBitsToDouble(e.getValue()) + " → " + (v == null ? "absent" : Double.longBitsToDouble(v));
            }
        }
        return f.quantities().size() != base.quantities().size() ? "the set of quantities" : "the verdicts " + f.verdicts();
    }

    /**
     * {@code meritbook new} on a case's workbook: a starter notebook (exit 0) or a located error
     * (exit 2), never an internal error.
     */
    Ended starter(CorpusCase c, String workbook) {
        Path dir = write(c);
        Future<Integer> f;
        StringWriter err = new StringWriter();
        f = executor.submit(() -> {
            var cl = Main.commandLine();
            cl.setOut(new PrintWriter(new StringWriter()));
            cl.setErr(new PrintWriter(err));
            return cl.execute("new", dir.resolve(workbook).toString(), "-o", dir.resolve("starter.md").toString());
        });
        try {
            int code = f.get(SECONDS, TimeUnit.SECONDS);
            return switch (code) {
                case Main.DONE -> new Ended(Outcome.RESULT, "", null);
                case Main.BAD_INPUT -> err.toString().contains(workbook) ? new Ended(Outcome.LOCATED_ERROR, "", null)
                        : new Ended(Outcome.UNLOCATED_ERROR, err.toString(), null);
                default -> new Ended(Outcome.INTERNAL_ERROR, "exit " + code + ": " + err, null);
            };
        } catch (TimeoutException e) {
            f.cancel(true);
            executor.shutdownNow();
            executor = newExecutor();
            return new Ended(Outcome.TIMEOUT, "new: no end within " + SECONDS + " s", e);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException(e);
        } catch (ExecutionException e) {
            return new Ended(Outcome.INTERNAL_ERROR, e.getCause().toString(), e.getCause());
        }
    }

    @Override
    public void close() {
        executor.shutdownNow();
    }
}
