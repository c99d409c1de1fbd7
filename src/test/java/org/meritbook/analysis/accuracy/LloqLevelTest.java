package org.meritbook.analysis.accuracy;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.meritbook.analysis.AnalysisContext;
import org.meritbook.analysis.SectionResult;
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
 * The bioanalysis-m10 profile on a real accuracy section whose levels are text labels: the LLOQ is
 * the level the cell names ({@code lloq-level:}), never guessed (ICH M10 (2022), accuracy and
 * precision: mean within ±15 % of nominal, ±20 % at the LLOQ; from memory). The mean errors,
 * by hand: QC-HIGH (90, 92, 91 of 100) −9 %, QC-LLOQ (1.17, 1.18, 1.19 of 1) +18 %, QC-MID (11.7,
 * 11.8, 11.9 of 10) +18 %.
 */
class LloqLevelTest {
    private static final Path FILE = Path.of("runs.xlsx");

    private static DataBlock block(String[][] rows) {
        String[] headers = {"Level", "Found (ng/mL)", "Nominal (ng/mL)"};
        String[] names = {"Level", "Found", "Nominal"};
        String[] units = {null, "ng/mL", "ng/mL"};
        List<Column> columns = new ArrayList<>();
        for (int c = 0; c < headers.length; c++) {
            List<CellValue> values = new ArrayList<>();
            for (int r = 0; r < rows.length; r++) {
                CellRef ref = new CellRef("Rec", r + 1, c);
                String raw = rows[r][c];
                values.add(c == 0 ? new CellValue(ref, CellValue.Kind.TEXT, Double.NaN, raw, null)
                        : new CellValue(ref, CellValue.Kind.NUMBER, Double.parseDouble(raw), raw, null));
            }
            columns.add(new Column(headers[c], names[c], units[c], CellRef.columnLetters(c), values));
        }
        return new DataBlock(FILE, "Rec", "A1:C" + (rows.length + 1), columns, List.of());
    }

    private static final DataBlock DATA = block(new String[][] {
        {"QC-HIGH", "90", "100"}, {"QC-HIGH", "92", "100"}, {"QC-HIGH", "91", "100"},
        {"QC-LLOQ", "1.17", "1"}, {"QC-LLOQ", "1.18", "1"}, {"QC-LLOQ", "1.19", "1"},
        {"QC-MID", "11.7", "10"}, {"QC-MID", "11.8", "10"}, {"QC-MID", "11.9", "10"}});

    /** The accuracy section of a cell with {@code extra} lines (options) added. */
    private static SectionResult section(String extra) {
        String text = """
                ---
                title: Accuracy test
                sources:
                  runs: runs.xlsx
                ---

                ```accuracy
                data: runs!Rec!A1:C10
                measured: Found
                known: Nominal
                level: Level
                """ + extra + "```\n";
        Study study = StudyParser.parse(text, Path.of("study.md"));
        return new AccuracyAnalysis().run(study.cells().get(0), new AnalysisContext(study, ref -> DATA));
    }

    private static List<Verdict> judged(SectionResult s) {
        return BuiltInProfiles.all().get("bioanalysis-m10").judge(s).verdicts();
    }

    @Test
    void theLevelTheCellNamesIsTheLloqWhateverItsLabel() {
        SectionResult s = section("lloq-level: QC-LLOQ\n");
        List<Verdict> v = judged(s);
        assertEquals(List.of("Accuracy (QC-HIGH)", "Accuracy (QC-LLOQ, LLOQ)", "Accuracy (QC-MID)"),
                v.stream().map(Verdict::characteristic).toList(), v.toString());
        assertEquals(List.of(Verdict.Outcome.PASS, Verdict.Outcome.PASS, Verdict.Outcome.FAIL),
                v.stream().map(Verdict::outcome).toList(), v.toString());
        assertEquals(-9.0, s.quantity("error_percent:QC-HIGH").orElseThrow().value(), 1e-12);
        assertTrue(s.settings().stream().anyMatch(x -> x.label().equals("LLOQ level")
                && x.value().equals("QC-LLOQ: named in the cell (lloq-level: QC-LLOQ)")), s.settings().toString());
    }

    @Test
    void withoutLloqLevelTheLowestLevelIsHeldToTheGeneralLimit() {
        List<Verdict> v = judged(section(""));
        assertEquals(List.of(Verdict.Outcome.PASS, Verdict.Outcome.FAIL, Verdict.Outcome.FAIL),
                v.stream().map(Verdict::outcome).toList(), v.toString());
        assertTrue(v.get(1).reason().endsWith("LLOQ not identified (name it with 'lloq-level:' in the cell), general "
                + "limit applied"), v.get(1).reason());
    }

    @Test
    void aLevelTheSectionDoesNotHaveIsRefusedAtItsLine() {
        InputException e = assertThrows(InputException.class, () -> section("lloq-level: QC-LOW\n"));
        assertTrue(e.getMessage().contains("study.md line 12"), e.getMessage());
        assertTrue(e.getMessage().contains("levels in column 'Level': QC-HIGH, QC-LLOQ, QC-MID"), e.getMessage());
        assertTrue(e.getMessage().contains("'QC-LOW'"), e.getMessage());
    }
}
