package org.meritbook.analysis.precision;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.meritbook.analysis.AnalysisContext;
import org.meritbook.analysis.SectionResult;
import org.meritbook.analysis.Verdict;
import org.meritbook.criteria.BuiltInProfiles;
import org.meritbook.error.InputException;
import org.meritbook.study.Study;
import org.meritbook.study.StudyParser;
import org.meritbook.workbook.DataBlock;

/**
 * A real precision section judged by bioanalysis-m10 (ICH M10 (2022): CV ≤ 15 %, ≤ 20 % at the LLOQ;
 * from memory), with its LLOQ level named in the cell. Level "1.0", by hand: runs A (0.80, 1.00) and
 * B (1.20, 1.05); MS_within = 0.03125 / 2 = 0.015625, MS_between = 0.050625, n₀ = 2, s_I² = 0.015625
 * + (0.050625 − 0.015625) / 2 = 0.033125, mean 1.0125: between-run CV 17.98 %, CV of all results
 * 16.3 %, both between the two limits. Level "50" is far inside both.
 */
class PrecisionLloqTest {
    private static final DataBlock DATA = PrecisionAnalysisTest.block(
            new String[] {"A", "A", "B", "B", "A", "A", "B", "B", "B"},
            new String[] {"0.80", "1.00", "1.20", "1.05", "50", "51", "49", "50.5", "49.5"},
            new String[] {"1.0", "1.0", "1.0", "1.0", "50", "50", "50", "50", "50"});

    private static SectionResult run(String options) {
        Study study = StudyParser.parse(PrecisionAnalysisTest.notebook(options), Path.of("study.md"));
        return new PrecisionAnalysis().run(study.cells().get(0), new AnalysisContext(study, ref -> DATA));
    }

    private static Verdict verdict(SectionResult s, String characteristic) {
        List<Verdict> v = BuiltInProfiles.all().get("bioanalysis-m10").judge(s).verdicts();
        return v.stream().filter(x -> x.characteristic().equals(characteristic)).findFirst()
                .orElseThrow(() -> new AssertionError("no verdict " + characteristic + " in " + v));
    }

    @Test
    void theNamedLevelIsJudgedAtTheLloqAndANumberMatchesTheLevelWrittenWithDecimals() {
        SectionResult s = run("group: Run\nlevel: Level\nlloq-level: 1\n");
        assertEquals(17.98, s.quantity("intermediate_cv_percent:1.0").orElseThrow().value(), 0.01);
        Verdict between = verdict(s, "Precision, between runs (1.0, LLOQ)");
        assertEquals(Verdict.Outcome.PASS, between.outcome(), between.reason());
        assertEquals(Verdict.Outcome.PASS, verdict(s, "Precision, all results (1.0, LLOQ)").outcome());
        assertEquals(Verdict.Outcome.PASS, verdict(s, "Precision, between runs (50)").outcome());
        assertTrue(s.settings().stream().anyMatch(x -> x.label().equals("LLOQ level")
                && x.value().equals("1.0: named in the cell (lloq-level: 1)")), s.settings().toString());
    }

    @Test
    void unnamedTheSameLevelFailsTheGeneralLimitAndSaysWhy() {
        Verdict between = verdict(run("group: Run\nlevel: Level\n"), "Precision, between runs (1.0)");
        assertEquals(Verdict.Outcome.FAIL, between.outcome());
        assertTrue(between.reason().endsWith("limit ≤ 15 %; LLOQ not identified (name it with 'lloq-level:' in the "
                + "cell), general limit applied"), between.reason());
    }

    @Test
    void aCellWithoutLevelsOrWithAnEmptyListIsRefused() {
        InputException noLevels = assertThrows(InputException.class, () -> run("group: Run\nlloq-level: 1\n"));
        assertTrue(noLevels.getMessage().contains("a precision cell: 'level: <column>'"), noLevels.getMessage());
        InputException empty = assertThrows(InputException.class, () -> run("group: Run\nlevel: Level\nlloq-level: []\n"));
        assertTrue(empty.getMessage().contains("one level or a list of levels for 'lloq-level' but found an empty list"),
                empty.getMessage());
    }
}
