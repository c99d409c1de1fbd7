package org.meritbook.analysis.unknowns;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.meritbook.analysis.AnalysisContext;
import org.meritbook.analysis.SectionResult;
import org.meritbook.analysis.calibration.CalibrationAnalysis;
import org.meritbook.criteria.BuiltInProfiles;
import org.meritbook.analysis.Verdict;
import org.meritbook.study.Study;
import org.meritbook.study.StudyParser;
import org.meritbook.workbook.CellRef;
import org.meritbook.workbook.CellValue;
import org.meritbook.workbook.Column;
import org.meritbook.workbook.DataBlock;

/**
 * QC samples read back through a calibration and judged by the bioanalysis-m10 profile (issue 11):
 * ±15 % of the known value, ±20 % at the LLOQ, the QC level with the lowest known value (ICH M10
 * (2022), accuracy and precision, from memory). Calibration: Miller &amp; Miller's fluorescence example
 * (handbook worked example, ch. 5, from memory), a ≈ 1.518, b ≈ 1.930; each QC's reading is
 * a + b·x₀ for an intended x₀, far enough from the limits (±18 %, −5 %) that the fit's last digits
 * do not matter.
 */
class QcVerdictsTest {
    private static final Path FILE = Path.of("runs.xlsx");
    private static final double A = 1.518;
    private static final double B = 1.930;

    private static CellValue cell(String sheet, int col, int row, String raw) {
        CellRef ref = new CellRef(sheet, row, col);
        try {
            return new CellValue(ref, CellValue.Kind.NUMBER, Double.parseDouble(raw), raw, null);
        } catch (NumberFormatException e) {
            return new CellValue(ref, CellValue.Kind.TEXT, Double.NaN, raw, null);
        }
    }

    private static DataBlock block(String sheet, String[] headers, String[] names, String[] units, String[][] rows) {
        List<Column> columns = new ArrayList<>();
        for (int c = 0; c < headers.length; c++) {
            List<CellValue> values = new ArrayList<>();
            for (int r = 0; r < rows.length; r++) {
                values.add(cell(sheet, c, r + 1, rows[r][c]));
            }
            columns.add(new Column(headers[c], names[c], units[c], CellRef.columnLetters(c), values));
        }
        return new DataBlock(FILE, sheet, "A1:" + CellRef.columnLetters(headers.length - 1) + (rows.length + 1), columns,
                List.of());
    }

    private static String reading(double x0) {
        return Double.toString(A + B * x0);
    }

    @Test
    void eachQcIsJudgedWithTheLloqLevelSetApart() {
        double[] x = {0, 2, 4, 6, 8, 10, 12};
        double[] y = {2.1, 5.0, 9.0, 12.6, 17.3, 21.0, 24.7};
        String[][] cal = new String[x.length][];
        for (int i = 0; i < x.length; i++) {
            cal[i] = new String[] {Double.toString(x[i]), Double.toString(y[i])};
        }
        DataBlock calibration = block("Cal", new String[] {"Conc (mg/L)", "Signal (counts)"},
                new String[] {"Conc", "Signal"}, new String[] {"mg/L", "counts"}, cal);
        DataBlock samples = block("Samples", new String[] {"Sample", "Signal (counts)", "Nominal (mg/L)"},
                new String[] {"Sample", "Signal", "Nominal"}, new String[] {null, "counts", "mg/L"}, new String[][] {
                    {"QC-H", reading(10 * 0.95), "10"},
                    {"QC-LLOQ", reading(2 * 1.18), "2"},
                    {"QC-M", reading(6 * 1.18), "6"}});
        String text = """
                ---
                title: QC test
                sources:
                  runs: runs.xlsx
                ---

                ```calibration
                id: cal
                data: runs!Cal!A1:B8
                x: Conc
                y: Signal
                ```

                ```unknowns
                calibration: cal
                data: runs!Samples!A1:C4
                sample: Sample
                y: Signal
                known: Nominal
                ```
                """;
        Study study = StudyParser.parse(text, Path.of("study.md"));
        AnalysisContext context = new AnalysisContext(study, ref -> ref.target().equals("Cal") ? calibration : samples);
        SectionResult c = new CalibrationAnalysis().run(study.cells().get(0), context);
        SectionResult u = new UnknownsAnalysis().run(study.cells().get(1), context.with(c));
        List<Verdict> v = BuiltInProfiles.all().get("bioanalysis-m10").judge(u).verdicts();
        assertEquals(List.of("QC samples (QC-H)", "QC samples (QC-LLOQ, LLOQ)", "QC samples (QC-M)"),
                v.stream().map(Verdict::characteristic).toList(), v.toString());
        // +18 % passes at the LLOQ (±20 %) and fails at the mid level (±15 %)
        assertEquals(List.of(Verdict.Outcome.PASS, Verdict.Outcome.PASS, Verdict.Outcome.FAIL),
                v.stream().map(Verdict::outcome).toList(), v.toString());
    }
}
