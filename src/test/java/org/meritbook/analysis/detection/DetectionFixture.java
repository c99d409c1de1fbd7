package org.meritbook.analysis.detection;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.meritbook.analysis.AnalysisContext;
import org.meritbook.analysis.SectionResult;
import org.meritbook.analysis.calibration.CalibrationAnalysis;
import org.meritbook.study.AnalysisCell;
import org.meritbook.study.AnalysisKind;
import org.meritbook.study.Study;
import org.meritbook.study.StudyParser;
import org.meritbook.workbook.CellRef;
import org.meritbook.workbook.CellValue;
import org.meritbook.workbook.Column;
import org.meritbook.workbook.DataBlock;

/** Small in-memory workbooks and a runner for detection-limit cells (after any calibration cells). */
final class DetectionFixture {
    static final Path FILE = Path.of("limits.xlsx");

    private final Map<String, DataBlock> blocks = new LinkedHashMap<>();

    /** A block on {@code sheet} whose header row is row 1 at column {@code firstCol}; columns as header → raw values. */
    DetectionFixture block(String sheet, int firstCol, String range, String[] headers, String[][] values) {
        List<Column> columns = new ArrayList<>();
        for (int c = 0; c < headers.length; c++) {
            List<CellValue> cells = new ArrayList<>();
            for (int r = 0; r < values[c].length; r++) {
                cells.add(cell(sheet, r + 1, firstCol + c, values[c][r]));
            }
            String header = headers[c];
            int open = header.indexOf(" (");
            String name = open < 0 ? header : header.substring(0, open);
            String unit = open < 0 ? null : header.substring(open + 2, header.length() - 1);
            columns.add(new Column(header, name, unit, String.valueOf((char) ('A' + firstCol + c)), cells));
        }
        blocks.put(sheet + "!" + range, new DataBlock(FILE, sheet, range, columns, List.of()));
        return this;
    }

    static String[] numbers(double... v) {
        String[] s = new String[v.length];
        for (int i = 0; i < v.length; i++) {
            s[i] = Double.toString(v[i]);
        }
        return s;
    }

    private static CellValue cell(String sheet, int row, int col, String raw) {
        CellRef ref = new CellRef(sheet, row, col);
        if (raw.startsWith("<") || raw.equals("n.d.")) {
            double stated = raw.startsWith("<") ? Double.parseDouble(raw.substring(1)) : Double.NaN;
            return new CellValue(ref, CellValue.Kind.CENSORED, stated, raw, null);
        }
        try {
            return new CellValue(ref, CellValue.Kind.NUMBER, Double.parseDouble(raw), raw, null);
        } catch (NumberFormatException e) {
            // Not a number: kept as text, as a reader would.
            return new CellValue(ref, CellValue.Kind.TEXT, Double.NaN, raw, null);
        }
    }

    /** Runs every cell of the notebook body in order and returns the last detection-limit section. */
    SectionResult run(String body) {
        String text = """
                ---
                title: Limits test
                sources:
                  lab: limits.xlsx
                ---

                """ + body;
        Study study = StudyParser.parse(text, Path.of("study.md"));
        AnalysisContext context = new AnalysisContext(study, ref -> {
            DataBlock b = blocks.get(ref.target() + "!" + ref.range());
            if (b == null) {
                throw new AssertionError("no test block " + ref.target() + "!" + ref.range());
            }
            return b;
        });
        SectionResult last = null;
        for (AnalysisCell cell : study.cells()) {
            SectionResult s = cell.kind() == AnalysisKind.CALIBRATION ? new CalibrationAnalysis().run(cell, context)
                    : new DetectionLimitAnalysis().run(cell, context);
            context = context.with(s);
            last = s;
        }
        return last;
    }
}
