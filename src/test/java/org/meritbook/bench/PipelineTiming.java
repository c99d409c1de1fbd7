package org.meritbook.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Locale;
import java.util.Optional;
import org.meritbook.dossier.DossierRenderer;
import org.meritbook.dossier.RenderedDossier;
import org.meritbook.pipeline.StudyResults;
import org.meritbook.pipeline.StudyRunner;
import org.meritbook.revision.ResultsJson;
import org.meritbook.study.Study;
import org.meritbook.study.StudyParser;

/**
 * Times the pipeline's stages on a notebook, cold (first iteration) and warm (median of the rest),
 * with the warm CPU time of the calling thread (steadier than wall time on a shared machine; work
 * on side threads, figures and HTML, is not in it), and reports the peak heap. Run by
 * bench/timing.sh; prints figures, asserts nothing.
 */
public final class PipelineTiming {
    private PipelineTiming() {
    }

    public static void main(String[] args) {
        Path notebook = Path.of(args.length > 0 ? args[0] : "demo-data/hmf-honey-validation.md");
        int iterations = args.length > 1 ? Integer.parseInt(args[1]) : 10;
        String[] stages = {"parse notebook", "read + analyse", "results.json", "render dossier", "total"};
        double[][] ms = new double[stages.length][iterations];
        double[][] cpuMs = new double[stages.length][iterations];
        int pages = 0;
        for (int i = 0; i < iterations; i++) {
            long c0 = cpu();
            long t0 = System.nanoTime();
            Study study = StudyParser.parse(notebook);
            long t1 = System.nanoTime();
            long c1 = cpu();
            StudyResults results = StudyRunner.withBuiltInAnalyses().run(study);
            long t2 = System.nanoTime();
            long c2 = cpu();
            byte[] json = ResultsJson.toBytes(results);
            long t3 = System.nanoTime();
            long c3 = cpu();
            RenderedDossier dossier = new DossierRenderer(Optional.empty()).render(results, json);
            long t4 = System.nanoTime();
            long c4 = cpu();
            long[] t = {t0, t1, t2, t3, t4};
            long[] c = {c0, c1, c2, c3, c4};
            for (int s = 0; s < 4; s++) {
                ms[s][i] = (t[s + 1] - t[s]) / 1e6;
                cpuMs[s][i] = (c[s + 1] - c[s]) / 1e6;
            }
            ms[4][i] = (t4 - t0) / 1e6;
            cpuMs[4][i] = (c4 - c0) / 1e6;
            pages = dossier.pdf().length;
        }
        System.out.printf(Locale.ROOT, "notebook %s, %d iterations, PDF %d bytes%n", notebook, iterations, pages);
        System.out.printf(Locale.ROOT, "%-16s %10s %12s %16s%n", "stage", "cold ms", "warm median", "warm thread CPU");
        for (int s = 0; s < stages.length; s++) {
            System.out.printf(Locale.ROOT, "%-16s %10.1f %12.1f %16.1f%n", stages[s], ms[s][0], warmMedian(ms[s]),
                    warmMedian(cpuMs[s]));
        }
        long peak = 0;
        for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
            if (pool.getType() == MemoryType.HEAP) {
                peak += pool.getPeakUsage().getUsed();
            }
        }
        System.out.printf(Locale.ROOT, "peak heap occupancy (includes garbage not yet collected): %.1f MiB%n", peak / (1024.0 * 1024.0));
    }

    /** The median of every iteration but the first (cold) one. */
    private static double warmMedian(double[] perIteration) {
        double[] warm = Arrays.copyOfRange(perIteration, 1, perIteration.length);
        Arrays.sort(warm);
        return warm.length == 0 ? Double.NaN : warm[warm.length / 2];
    }

    private static long cpu() {
        return ManagementFactory.getThreadMXBean().getCurrentThreadCpuTime();
    }
}
