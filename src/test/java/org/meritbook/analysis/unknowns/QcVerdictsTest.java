package org.meritbook.analysis.unknowns;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.meritbook.analysis.AnalysisContext;
import org.meritbook.analysis.SectionResult;
import org.meritbook.analysis.calibration.CalibrationAnalysis;
import org.meritbook.analysis.Verdict;
import org.meritbook.criteria.BuiltInProfiles;
import org.meritbook.error.InputException;
import org.meritbook.study.Study;
import org.meritbook.study.StudyParser;
import org.meritbook.workbook.CellRef;
import org.meritbook.workbook.CellValue;
import org.meritbook.workbook.Column;
import org.meritbook.workbook.DataBlock;

/**
 * QC samples read back through a calibration and judged by the bioanalysis-m10 profile (issue 11):
 * ±15 % of the known value, ±20 % at the LLOQ, the calibration's lowest standard above zero; a low QC
 * above it is held to ±15 % (ICH M10 (2022), calibration curve and accuracy and precision, from memory). Calibration: Miller &amp; Miller's fluorescence example
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
        if (raw.isEmpty()) {
            return new CellValue(ref, CellValue.Kind.BLANK, Double.NaN, raw, null);
        }
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

    /** The unknowns section of these QC rows (sample, reading, known) read through the 0-12 mg/L calibration. */
    private static SectionResult qcs(String[][] samples, String extra) {
        double[] x = {0, 2, 4, 6, 8, 10, 12};
        double[] y = {2.1, 5.0, 9.0, 12.6, 17.3, 21.0, 24.7};
        String[][] cal = new String[x.length][];
        for (int i = 0; i < x.length; i++) {
            cal[i] = new String[] {Double.toString(x[i]), Double.toString(y[i])};
        }
        DataBlock calibration = block("Cal", new String[] {"Conc (mg/L)", "Signal (counts)"},
                new String[] {"Conc", "Signal"}, new String[] {"mg/L", "counts"}, cal);
        DataBlock rows = block("Samples", new String[] {"Sample", "Signal (counts)", "Nominal (mg/L)"},
                new String[] {"Sample", "Signal", "Nominal"}, new String[] {null, "counts", "mg/L"}, samples);
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
                data: runs!Samples!A1:C%d
                sample: Sample
                y: Signal
                known: Nominal
                %s```
                """.formatted(samples.length + 1, extra);
        Study study = StudyParser.parse(text, Path.of("study.md"));
        AnalysisContext context = new AnalysisContext(study, ref -> ref.target().equals("Cal") ? calibration : rows);
        SectionResult c = new CalibrationAnalysis().run(study.cells().get(0), context);
        return new UnknownsAnalysis().run(study.cells().get(1), context.with(c));
    }

    private static List<Verdict> judged(SectionResult u) {
        return BuiltInProfiles.all().get("bioanalysis-m10").judge(u).verdicts();
    }

    @Test
    void eachQcIsJudgedWithTheLloqLevelSetApart() {
        // The lowest standard above zero is 2 mg/L (the 0 standard is a zero calibrator): QC-LLOQ stands there.
        SectionResult u = qcs(new String[][] {
            {"QC-H", reading(10 * 0.95), "10"},
            {"QC-LLOQ", reading(2 * 1.18), "2"},
            {"QC-M", reading(6 * 1.18), "6"}}, "");
        List<Verdict> v = judged(u);
        assertEquals(List.of("QC samples (QC-H)", "QC samples (QC-LLOQ, LLOQ)", "QC samples (QC-M)"),
                v.stream().map(Verdict::characteristic).toList(), v.toString());
        // +18 % passes at the LLOQ (±20 %) and fails at the mid level (±15 %)
        assertEquals(List.of(Verdict.Outcome.PASS, Verdict.Outcome.PASS, Verdict.Outcome.FAIL),
                v.stream().map(Verdict::outcome).toList(), v.toString());
        assertTrue(u.settings().stream().anyMatch(s -> s.label().equals("LLOQ level") && s.value().equals(
                "QC-LLOQ: known value equal to the lowest standard above zero of calibration 'cal' (2.000 mg/L)")),
                u.settings().toString());
    }

    @Test
    void aLowQcAboveTheLowestStandardIsHeldToTheGeneralLimit() {
        // QC-L at 3 mg/L is a low QC, not the LLOQ (2 mg/L): +18 % fails, where taking the lowest QC for the
        // LLOQ would have passed it.
        SectionResult u = qcs(new String[][] {
            {"QC-L", reading(3 * 1.18), "3"},
            {"QC-H", reading(10 * 0.95), "10"}}, "");
        List<Verdict> v = judged(u);
        assertEquals(List.of("QC samples (QC-L)", "QC samples (QC-H)"), v.stream().map(Verdict::characteristic).toList());
        assertEquals(List.of(Verdict.Outcome.FAIL, Verdict.Outcome.PASS), v.stream().map(Verdict::outcome).toList(),
                v.toString());
        assertTrue(u.settings().stream().anyMatch(s -> s.label().equals("LLOQ level") && s.value().equals(
                "none: no known value equals the lowest standard above zero of calibration 'cal' (2.000 mg/L)")),
                u.settings().toString());
        // named in the cell, the same QC is judged at the LLOQ's ±20 %
        List<Verdict> named = judged(qcs(new String[][] {
            {"QC-L", reading(3 * 1.18), "3"},
            {"QC-H", reading(10 * 0.95), "10"}}, "lloq-level: QC-L\n"));
        assertEquals(List.of(Verdict.Outcome.PASS, Verdict.Outcome.PASS), named.stream().map(Verdict::outcome).toList(),
                named.toString());
    }

    @Test
    void aSampleWithoutAKnownValueIsNotALloqLevel() {
        InputException e = assertThrows(InputException.class, () -> qcs(new String[][] {
            {"QC-H", reading(10 * 0.95), "10"},
            {"S-1", reading(5), ""}}, "lloq-level: [S-1]\n"));
        assertTrue(e.getMessage().contains("QC samples read back (samples with a known value): QC-H"), e.getMessage());
        assertTrue(e.getMessage().contains("'S-1'"), e.getMessage());
    }
}
