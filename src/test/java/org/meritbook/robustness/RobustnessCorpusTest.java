package org.meritbook.robustness;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meritbook.robustness.CaseRunner.Ended;
import org.meritbook.robustness.CaseRunner.Fingerprint;
import org.meritbook.robustness.CaseRunner.Outcome;

/**
 * The robustness corpus (issue 6): well over a thousand mutations of the demo workbook and notebook
 * and of the same data as .csv and .xls, generated from a fixed seed, each run through the whole
 * pipeline (parse, read, analyse, judge, results.json, the HTML dossier, and for a sample the PDF).
 * Every case must end in the unmutated run's numbers (benign mutations), another result that uses no
 * damaged cell, a located input error, or an explicit "not evaluable"; never in an internal error, a
 * hang, or a number read from damaged data. {@code meritbook new} runs on a share of the mutated
 * workbooks and must write a starter or give a located error. The counts per category and outcome
 * are printed.
 */
class RobustnessCorpusTest {
    private static final long SEED = 20_261_202L;
    /** One case in this many also renders the PDF, when it gives a result (about a second each). */
    private static final int PDF_EVERY = 100;
    /** One workbook case in this many also runs {@code meritbook new} on its workbook. */
    private static final int STARTER_EVERY = 5;

    @TempDir
    Path dir;

    static List<CorpusCase> cases(Demo demo, FormatMutations formats, SplittableRandom random) {
        List<CorpusCase> all = new ArrayList<>();
        CellMutations cells = new CellMutations(demo, random.split());
        LayoutMutations layout = new LayoutMutations(demo, random.split());
        PackageMutations pack = new PackageMutations(demo, random.split());
        NotebookMutations notebook = new NotebookMutations(demo, random.split());
        all.addAll(cells.text(66));
        all.addAll(cells.errors(50));
        all.addAll(cells.empty(50));
        all.addAll(layout.hidden(64));
        all.addAll(layout.merged(56));
        all.addAll(cells.dates(40));
        all.addAll(cells.huge(36));
        all.addAll(cells.tiny(36));
        all.addAll(cells.notFinite(51));
        all.addAll(cells.formulas(64));
        all.addAll(layout.shiftedHeaders(40));
        all.addAll(layout.duplicates(56));
        all.addAll(pack.truncated(50));
        all.addAll(pack.corrupt(100));
        all.addAll(pack.encrypted(8));
        all.addAll(pack.bombs(16));
        all.addAll(pack.entities(45));
        all.addAll(layout.longStrings(36));
        all.addAll(layout.nonLatin(40));
        all.addAll(notebook.random(100));
        all.addAll(notebook.targeted());
        all.addAll(formats.csv(60));
        all.addAll(formats.xls(40));
        return all;
    }

    /** Categories whose changes are text the dossier shows: their results are always rendered. */
    private static final java.util.Set<String> TEXT = java.util.Set.of("text", "long-strings", "non-latin", "notebook", "shifted-header");

    /**
     * What a case renders: the PDF for one in {@link #PDF_EVERY}; the HTML dossier for every result
     * with other numbers than the unmutated run (new figures and tables), for every result of the text
     * categories, and for one in six of the rest (their dossier differs from the unmutated one only
     * in the trail's reading notes).
     */
    private static CaseRunner.Rendering rendering(int index, CorpusCase c, Outcome outcome) {
        if (index % PDF_EVERY == 0) {
            return CaseRunner.Rendering.PDF;
        }
        return outcome != Outcome.SAME_RESULT || TEXT.contains(c.category()) || index % 6 == 0
                ? CaseRunner.Rendering.HTML : CaseRunner.Rendering.NONE;
    }

    /** The cases one worker runs (every {@code step}-th from {@code first}), each with its own runner and folder. */
    private static Map<Integer, Ended[]> work(List<CorpusCase> cases, Map<String, Fingerprint> baselines, Path root, int first,
                                              int step, long[] nanos) {
        Map<Integer, Ended[]> out = new LinkedHashMap<>();
        try (CaseRunner runner = new CaseRunner(root)) {
            for (int i = first; i < cases.size(); i += step) {
                CorpusCase c = cases.get(i);
                int index = i;
                Ended e = runner.run(c, baselines.get(c.notebook()), o -> rendering(index, c, o));
                String workbook = c.files().keySet().stream().filter(n -> !n.equals(c.notebook())).findFirst().orElse(null);
                Ended starter = workbook != null && i % STARTER_EVERY == 0 ? runner.starter(c, workbook) : null;
                out.put(i, new Ended[] {e, starter});
            }
            for (int k = 0; k < nanos.length; k++) {
                nanos[k] += runner.nanos[k];
            }
        }
        return out;
    }

    @Test
    void everyMutationEndsInARightResultALocatedErrorOrNotEvaluable() throws Exception {
        long start = System.nanoTime();
        SplittableRandom random = new SplittableRandom(SEED);
        Demo demo = new Demo();
        FormatMutations formats = new FormatMutations(demo, random.split());
        List<CorpusCase> cases = cases(demo, formats, random);

        Map<String, Fingerprint> baselines = new LinkedHashMap<>();
        try (CaseRunner runner = new CaseRunner(dir.resolve("baselines"))) {
            for (CorpusCase original : List.of(demo.original("baseline"), formats.csvOriginal(), formats.xlsOriginal())) {
                baselines.put(original.notebook(), runner.baseline(original));
            }
        }
        // Cases are independent: two workers share the machine's cores (a case's own time bound is in CaseRunner).
        int workers = Math.max(1, Math.min(2, Runtime.getRuntime().availableProcessors()));
        java.util.concurrent.ExecutorService pool = java.util.concurrent.Executors.newFixedThreadPool(workers);
        long[][] nanos = new long[workers][4];
        Map<Integer, Ended[]> ended = new java.util.TreeMap<>();
        try {
            List<java.util.concurrent.Future<Map<Integer, Ended[]>>> parts = new ArrayList<>();
            for (int w = 0; w < workers; w++) {
                int first = w;
                parts.add(pool.submit(() -> work(cases, baselines, dir.resolve("worker-" + first), first, workers, nanos[first])));
            }
            for (var part : parts) {
                ended.putAll(part.get());
            }
        } finally {
            pool.shutdownNow();
        }

        Map<String, Map<Outcome, Integer>> counts = new LinkedHashMap<>();
        Map<Outcome, Integer> starters = new EnumMap<>(Outcome.class);
        List<String> failures = new ArrayList<>();
        List<String> gaps = new ArrayList<>();
        int pdfs = 0;
        for (Map.Entry<Integer, Ended[]> entry : ended.entrySet()) {
            int i = entry.getKey();
            CorpusCase c = cases.get(i);
            Ended e = entry.getValue()[0];
            pdfs += e.rendered() == CaseRunner.Rendering.PDF ? 1 : 0;
            counts.computeIfAbsent(c.category(), k -> new EnumMap<>(Outcome.class)).merge(e.outcome(), 1, Integer::sum);
            if (e.outcome() == Outcome.STATISTICS_GAP && !e.outcome().failed()) {
                gaps.add("#" + i + " " + c.category() + " [" + c.label() + "]: " + e.detail() + origin(e.error()));
            }
            if (e.outcome().failed()) {
                failures.add("#" + i + " " + c.category() + " [" + c.label() + "]: " + e.outcome().label + ": " + e.detail()
                        + origin(e.error()));
            }
            Ended s = entry.getValue()[1];
            if (s != null) {
                starters.merge(s.outcome(), 1, Integer::sum);
                if (s.outcome().failed()) {
                    failures.add("#" + i + " new on " + c.category() + " [" + c.label() + "]: " + s.outcome().label + ": " + s.detail());
                }
            }
        }
        long[] stages = new long[4];
        for (long[] n : nanos) {
            for (int k = 0; k < 4; k++) {
                stages[k] += n[k];
            }
        }
        double seconds = (System.nanoTime() - start) / 1e9;
        System.out.println(table(cases.size(), counts, starters, pdfs, seconds));
        System.out.printf(Locale.ROOT, "CPU time per stage, %d workers: run %.1f s, results.json %.1f s, HTML %.1f s, PDF %.1f s%n",
                workers, stages[0] / 1e9, stages[1] / 1e9, stages[2] / 1e9, stages[3] / 1e9);
        if (!gaps.isEmpty()) {
            System.out.println(gaps.size() + " cases end in an internal error in the statistics on valid data (strict: -Dcorpus.strict=true):");
            gaps.forEach(g -> System.out.println("  " + g));
        }
        failures.forEach(System.out::println);
        assertTrue(cases.size() >= 1000, "the corpus holds " + cases.size() + " cases");
        assertTrue(failures.isEmpty(), failures.size() + " of " + cases.size() + " cases failed:\n"
                + String.join("\n", failures.subList(0, Math.min(40, failures.size()))));
    }

    /** Where an internal error was thrown: the first meritbook frame. */
    private static String origin(Throwable t) {
        if (t == null || t instanceof org.meritbook.error.InputException) {
            return "";
        }
        for (StackTraceElement f : t.getStackTrace()) {
            if (f.getClassName().startsWith("org.meritbook.")) {
                return " (at " + f.getClassName() + "." + f.getMethodName() + ":" + f.getLineNumber() + ")";
            }
        }
        return "";
    }

    private static String table(int total, Map<String, Map<Outcome, Integer>> counts, Map<Outcome, Integer> starters, int pdfs,
                                double seconds) {
        StringBuilder sb = new StringBuilder();
        sb.append(String.format(Locale.ROOT, "%nRobustness corpus, seed %d: %d cases in %.1f s (%d PDF dossiers rendered)%n",
                SEED, total, seconds, pdfs));
        sb.append(String.format(Locale.ROOT, "%-18s %6s %6s %6s %6s %6s %6s %6s%n", "category", "cases", "same", "result", "n.eval",
                "exit2", "stats", "FAIL"));
        Map<Outcome, Integer> sum = new EnumMap<>(Outcome.class);
        for (Map.Entry<String, Map<Outcome, Integer>> e : counts.entrySet()) {
            e.getValue().forEach((o, n) -> sum.merge(o, n, Integer::sum));
            sb.append(row(e.getKey(), e.getValue()));
        }
        sb.append(row("total", sum));
        sb.append("outcomes:");
        sum.forEach((o, n) -> sb.append(' ').append(o.label).append(' ').append(n).append(';'));
        sb.append(String.format(Locale.ROOT, "%nmeritbook new on %d mutated workbooks: %d starters written, %d located errors, %d failures%n",
                starters.values().stream().mapToInt(Integer::intValue).sum(), starters.getOrDefault(Outcome.RESULT, 0),
                starters.getOrDefault(Outcome.LOCATED_ERROR, 0),
                starters.entrySet().stream().filter(e -> e.getKey().failed()).mapToInt(Map.Entry::getValue).sum()));
        return sb.toString();
    }

    private static String row(String name, Map<Outcome, Integer> m) {
        int failed = m.entrySet().stream().filter(e -> e.getKey().failed()).mapToInt(Map.Entry::getValue).sum();
        int cases = m.values().stream().mapToInt(Integer::intValue).sum();
        return String.format(Locale.ROOT, "%-18s %6d %6d %6d %6d %6d %6d %6d%n", name, cases, m.getOrDefault(Outcome.SAME_RESULT, 0),
                m.getOrDefault(Outcome.RESULT, 0), m.getOrDefault(Outcome.NOT_EVALUABLE, 0), m.getOrDefault(Outcome.LOCATED_ERROR, 0),
                Outcome.STATISTICS_GAP.failed() ? 0 : m.getOrDefault(Outcome.STATISTICS_GAP, 0), failed);
    }
}
