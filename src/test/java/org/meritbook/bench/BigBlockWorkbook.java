package org.meritbook.bench;

import java.io.IOException;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Random;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.streaming.SXSSFWorkbook;

/**
 * Writes an invented study whose data block is large: check standards of an on-line nitrate
 * analyser, two levels (2.00 and 20.0 mg/L) measured in runs of 50 injections, as many runs as the
 * requested number of rows needs. The values are drawn from a seeded random generator, so a given
 * row count always gives the same workbook: each run has its own offset (SD 1.5 % of the level,
 * the day-to-day part) and each injection its own error (SD 1 % of the level, the repeatability).
 * The data start on row 4 of sheet Checks under a title and a header row; the notebook reads them
 * with a precision cell grouped by run. POI's streaming writer keeps the cost of writing 100,000
 * rows to a few megabytes of heap.
 *
 * <p>Usage: {@code BigBlockWorkbook DIR [ROWS]}; writes {@code DIR/analyser-checks.xlsx} and
 * {@code DIR/analyser-checks.md}. Not a test: the bench script and tests call it to make a
 * workbook of a chosen size.
 */
public final class BigBlockWorkbook {
    /** The workbook's file name. */
    public static final String WORKBOOK = "analyser-checks.xlsx";
    /** The notebook's file name. */
    public static final String NOTEBOOK = "analyser-checks.md";
    /** Injections per run and level. */
    public static final int PER_RUN = 50;
    /** Sheet row (1-based) of the header; the data follow it. */
    public static final int HEADER_ROW = 3;
    private static final long SEED = 20261203L;
    private static final double[] LEVELS = {2.00, 20.0};

    private BigBlockWorkbook() {
    }

    public static void main(String[] args) {
        Path dir = Path.of(args.length > 0 ? args[0] : ".");
        int rows = args.length > 1 ? Integer.parseInt(args[1].replace("_", "")) : 100_000;
        Path notebook = write(dir, rows);
        System.out.println(notebook);
    }

    /**
     * Writes the workbook and its notebook.
     *
     * @param rows data rows (a multiple of {@code 2 × PER_RUN} keeps every run complete)
     * @return the notebook
     */
    public static Path write(Path dir, int rows) {
        try {
            Files.createDirectories(dir);
            writeWorkbook(dir.resolve(WORKBOOK), rows);
            Path notebook = dir.resolve(NOTEBOOK);
            Files.writeString(notebook, notebook(rows), StandardCharsets.UTF_8);
            return notebook;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The block's range as the notebook gives it, header row included. */
    public static String range(int rows) {
        return "A" + HEADER_ROW + ":D" + (HEADER_ROW + rows);
    }

    /** The number of data rows of a workbook written here, from its notebook beside it. */
    public static int rowsOf(Path workbook) {
        try {
            String text = Files.readString(workbook.resolveSibling(NOTEBOOK), StandardCharsets.UTF_8);
            java.util.regex.Matcher m = java.util.regex.Pattern.compile("Checks!A" + HEADER_ROW + ":D(\\d+)").matcher(text);
            if (!m.find()) {
                throw new IllegalStateException("no data reference in " + NOTEBOOK);
            }
            return Integer.parseInt(m.group(1)) - HEADER_ROW;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static void writeWorkbook(Path file, int rows) throws IOException {
        Random random = new Random(SEED);
        // Shared strings, as spreadsheet programs write them: the labels repeat on every row.
        try (SXSSFWorkbook wb = new SXSSFWorkbook(null, 200, true, true); OutputStream out = Files.newOutputStream(file)) {
            Sheet s = wb.createSheet("Checks");
            s.createRow(0).createCell(0).setCellValue("On-line nitrate analyser NA-3, check standards (invented data)");
            Row h = s.createRow(HEADER_ROW - 1);
            String[] headers = {"Level", "Run", "Injection", "Nitrate (mg/L)"};
            for (int c = 0; c < headers.length; c++) {
                h.createCell(c).setCellValue(headers[c]);
            }
            int runs = (rows + PER_RUN * LEVELS.length - 1) / (PER_RUN * LEVELS.length);
            double[][] offsets = new double[runs][LEVELS.length];
            for (int r = 0; r < runs; r++) {
                for (int l = 0; l < LEVELS.length; l++) {
                    offsets[r][l] = random.nextGaussian() * 0.015 * LEVELS[l];
                }
            }
            for (int i = 0; i < rows; i++) {
                int run = i / (PER_RUN * LEVELS.length);
                int level = (i / PER_RUN) % LEVELS.length;
                double value = LEVELS[level] + offsets[run][level] + random.nextGaussian() * 0.01 * LEVELS[level];
                Row row = s.createRow(HEADER_ROW + i);
                row.createCell(0).setCellValue(String.format(Locale.ROOT, "QC %.1f", LEVELS[level]));
                row.createCell(1).setCellValue(String.format(Locale.ROOT, "R%04d", run + 1));
                row.createCell(2).setCellValue(i % PER_RUN + 1);
                // Four decimals, as the analyser reports them.
                row.createCell(3).setCellValue(Math.round(value * 1e4) / 1e4);
            }
            wb.write(out);
        }
    }

    private static String notebook(int rows) {
        return """
                ---
                title: Check standards of the on-line nitrate analyser NA-3 (invented data)
                method: NA-3-NO3
                laboratory: Invented laboratory for a large-block test
                revision: 1
                revision-reason: "First issue"
                prepared-by: B. Block
                date: 2026-12-03
                sources:
                  lab: %s
                ---

                ## Precision over many runs

                Two check standards measured %d times each per run; repeatability and intermediate
                precision by one-way analysis of variance with the run as the grouping factor.

                ```precision
                data: lab!Checks!%s
                value: Nitrate
                group: Run
                level: Level
                ```
                """.formatted(WORKBOOK, PER_RUN, range(rows));
    }
}
