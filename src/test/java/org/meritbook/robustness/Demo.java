package org.meritbook.robustness;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.UnaryOperator;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.meritbook.workbook.XlsxParts;

/**
 * The demo study as the corpus's main input: its notebook, its workbook taken apart once, and what
 * the tests need to know of its calibration block (Calibration!A8:F31): the x and y cells the fits
 * use (C and D of rows 9 to 31, less the blank row 21 and the excluded row 23) and the values they hold.
 */
final class Demo {
    static final String NOTEBOOK = "hmf-honey-validation.md";
    static final String WORKBOOK = "hmf-honey-validation.xlsx";
    static final String SHEET = "xl/worksheets/sheet1.xml";
    static final String SHEET_NAME = "Calibration";
    /** The data rows of the block, the blank row 21 left out. */
    static final List<Integer> ROWS;
    /** The row whose point the notebook excludes. */
    static final int EXCLUDED_ROW = 23;
    /** First and last row of each standard's injections (S1 to S7), for merges over a level. */
    static final int[][] LEVELS = {{9, 11}, {12, 14}, {15, 17}, {18, 20}, {22, 25}, {26, 28}, {29, 31}};

    static {
        List<Integer> rows = new ArrayList<>();
        for (int r = 9; r <= 31; r++) {
            if (r != 21) {
                rows.add(r);
            }
        }
        ROWS = List.copyOf(rows);
    }

    final String notebook;
    final XlsxParts parts;
    final String sheet;
    /** Stored numbers of the used cells ("C9" → "0.1"); D16, a number stored as text, has none. */
    final Map<String, String> stored = new LinkedHashMap<>();

    Demo() {
        try {
            notebook = cellsOnTheCalibrationSheet(Files.readString(Path.of("demo-data").resolve(NOTEBOOK)));
            parts = XlsxParts.of(Files.readAllBytes(Path.of("demo-data").resolve(WORKBOOK)));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        sheet = parts.text(SHEET);
        Matcher m = Pattern.compile("<c r=\"([CD]\\d+)\"[^>]*>(?:<f>[^<]*</f>)?<v>([^<]*)</v></c>").matcher(sheet);
        while (m.find()) {
            String a = m.group(1);
            if (usedCells().contains(a) && !m.group(0).contains("t=\"s\"")) {
                stored.put(a, m.group(2));
            }
        }
    }

    /** The x and y cells the fits use, as A1 addresses. */
    static List<String> usedCells() {
        List<String> cells = new ArrayList<>();
        for (int r : ROWS) {
            if (r != EXCLUDED_ROW) {
                cells.add("C" + r);
                cells.add("D" + r);
            }
        }
        return cells;
    }

    /** Cells inside the block that no fit uses: labels, injection numbers, retention times, notes, the excluded row. */
    static List<String> unusedCells(String xml) {
        List<String> cells = new ArrayList<>();
        for (int r : ROWS) {
            for (String col : r == EXCLUDED_ROW ? List.of("A", "B", "C", "D", "E") : List.of("A", "B", "E")) {
                if (xml.contains("<c r=\"" + col + r + "\"")) {
                    cells.add(col + r);
                }
            }
        }
        return cells;
    }

    static String address(String a1) {
        return SHEET_NAME + "!" + a1;
    }

    static Set<String> addresses(String... a1) {
        Set<String> out = new java.util.LinkedHashSet<>();
        for (String a : a1) {
            out.add(address(a));
        }
        return out;
    }

    /** The stored number of a used cell as a double (D16 holds the text "21.08"). */
    double value(String a1) {
        return a1.equals("D16") ? 21.08 : Double.parseDouble(stored.get(a1));
    }

    /**
     * The corpus damages the Calibration sheet: it keeps the cells that read it or use the
     * calibration's line (the limits, the range and the samples go through it), and drops those that
     * read only other sheets, which every case would otherwise recompute unchanged.
     */
    static String cellsOnTheCalibrationSheet(String notebook) {
        Matcher m = Pattern.compile("(?ms)^```([a-z-]+)\\n(.*?)^```\\n").matcher(notebook);
        StringBuilder out = new StringBuilder();
        while (m.find()) {
            String body = m.group(2);
            boolean keep = m.group(1).equals("text") || body.contains("!Calibration!") || body.contains("calibration: linearity");
            m.appendReplacement(out, Matcher.quoteReplacement(keep ? m.group() : ""));
        }
        m.appendTail(out);
        return out.toString();
    }

    /** The notebook with every fenced cell but the calibration cells removed (their narrative stays). */
    static String calibrationCellsOnly(String notebook) {
        return notebook.replaceAll("(?ms)^```(?!calibration\\b)[a-z-]+\\n.*?^```\\n", "");
    }

    /** Both calibration cells of the notebook with one more option line. */
    static String withOption(String notebook, String option) {
        return notebook.replace("model: linear\n", "model: linear\n" + option + "\n");
    }

    CorpusCase original(String category) {
        return workbook(category, "unmutated", parts, notebook, new CorpusCase.Same());
    }

    CorpusCase sheet(String category, String label, UnaryOperator<String> edit, CorpusCase.Expectation e) {
        return sheet(category, label, edit, notebook, e);
    }

    CorpusCase sheet(String category, String label, UnaryOperator<String> edit, String notebookText, CorpusCase.Expectation e) {
        return workbook(category, label, parts.with(SHEET, edit.apply(sheet)), notebookText, e);
    }

    CorpusCase workbook(String category, String label, XlsxParts changed, String notebookText, CorpusCase.Expectation e) {
        return bytes(category, label, changed.zip(), notebookText, e);
    }

    CorpusCase bytes(String category, String label, byte[] workbook, String notebookText, CorpusCase.Expectation e) {
        Map<String, byte[]> files = new LinkedHashMap<>();
        files.put(NOTEBOOK, notebookText.getBytes(StandardCharsets.UTF_8));
        files.put(WORKBOOK, workbook);
        return new CorpusCase(category, label, files, NOTEBOOK, e);
    }
}
