package org.meritbook.bench;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Optional;
import org.meritbook.dossier.DossierRenderer;
import org.meritbook.dossier.RenderedDossier;
import org.meritbook.pipeline.StudyResults;
import org.meritbook.pipeline.StudyRunner;
import org.meritbook.revision.ResultsJson;
import org.meritbook.workbook.DataBlock;
import org.meritbook.workbook.WorkbookReader;
import org.meritbook.study.DataReference;
import org.meritbook.study.Study;
import org.meritbook.study.StudyParser;

/**
 * One cold pass of the pipeline over a notebook with a large data block (bench/bigblock.sh):
 * read + analyse, results.json, HTML, and HTML + PDF, each in milliseconds, with the sizes of what
 * was made. Optionally writes the HTML for a look at what makes it large. Prints figures, asserts nothing.
 */
public final class BigBlockTiming {
    private BigBlockTiming() {
    }

    /** CPU time of this thread: on a shared machine, what the work cost whatever else ran. */
    private static long cpu() {
        return java.lang.management.ManagementFactory.getThreadMXBean().getCurrentThreadCpuTime();
    }

    /**
     * Parse, read and analyse as the first work of a fresh JVM (bench/bigblock.sh starts it with the
     * launcher's options): what a user waits for before the dossier is made.
     */
    private static void fresh(Path notebook) {
        long t0 = System.nanoTime();
        StudyResults results = StudyRunner.withBuiltInAnalyses().run(StudyParser.parse(notebook));
        long t1 = System.nanoTime();
        long processCpu = ((com.sun.management.OperatingSystemMXBean) java.lang.management.ManagementFactory
                .getOperatingSystemMXBean()).getProcessCpuTime();
        System.out.printf(Locale.ROOT, "fresh JVM, parse notebook + read + analyse: %6.0f ms (%d sections; main thread CPU %.0f ms,"
                + " process CPU since start %.0f ms, GC %d ms)%n", (t1 - t0) / 1e6, results.sections().size(), cpu() / 1e6,
                processCpu / 1e6, gcMillis());
    }

    /** Collection time so far, all collectors: the part of a stage's wall time that is neither work nor waiting. */
    private static long gcMillis() {
        return java.lang.management.ManagementFactory.getGarbageCollectorMXBeans().stream()
                .mapToLong(java.lang.management.GarbageCollectorMXBean::getCollectionTime).sum();
    }

    public static void main(String[] args) throws IOException {
        if (args.length > 1 && args[1].equals("--fresh")) {
            fresh(Path.of(args[0]));
            return;
        }
        Path notebook = Path.of(args[0]);
        Path workbook = notebook.resolveSibling(BigBlockWorkbook.WORKBOOK);
        if (Files.exists(workbook)) {
            // The block alone, read once cold: the reader's share of the stage below.
            long r0 = System.nanoTime();
            long g0 = gcMillis();
            String range = BigBlockWorkbook.range(BigBlockWorkbook.rowsOf(workbook));
            try (WorkbookReader reader = new WorkbookReader()) {
                DataBlock block = reader.read(workbook, new DataReference("lab", "Checks", range, "lab!Checks!" + range, 1));
                System.out.printf(Locale.ROOT, "read the block alone (cold):     %8.0f ms (%,d rows; main thread CPU %.0f ms, GC %d ms)%n",
                        (System.nanoTime() - r0) / 1e6, block.rowCount(), cpu() / 1e6, gcMillis() - g0);
            }
        }
        long t0 = System.nanoTime();
        long c0 = cpu();
        long g0 = gcMillis();
        Study study = StudyParser.parse(notebook);
        StudyResults results = StudyRunner.withBuiltInAnalyses().run(study);
        long t1 = System.nanoTime();
        long c1 = cpu();
        long g1 = gcMillis();
        byte[] json = ResultsJson.toBytes(results);
        long t2 = System.nanoTime();
        DossierRenderer renderer = new DossierRenderer(Optional.empty());
        byte[] html = renderer.renderHtml(results, json);
        long t3 = System.nanoTime();
        if (args.length > 1) {
            Files.write(Path.of(args[1]), html);
        }
        RenderedDossier dossier = renderer.render(results, json);
        long t4 = System.nanoTime();
        System.out.printf(Locale.ROOT, "parse notebook + read + analyse: %8.0f ms (main thread CPU %.0f ms, GC %d ms)%n",
                (t1 - t0) / 1e6, (c1 - c0) / 1e6, g1 - g0);
        System.out.printf(Locale.ROOT, "results.json:                    %8.0f ms (%,d bytes)%n", (t2 - t1) / 1e6, json.length);
        System.out.printf(Locale.ROOT, "HTML dossier alone:              %8.0f ms (%,d bytes)%n", (t3 - t2) / 1e6, html.length);
        System.out.printf(Locale.ROOT, "HTML + PDF dossier:              %8.0f ms (PDF %,d bytes)%n", (t4 - t3) / 1e6,
                dossier.pdf().length);
    }
}
