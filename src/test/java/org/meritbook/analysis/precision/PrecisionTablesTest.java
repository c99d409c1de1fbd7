package org.meritbook.analysis.precision;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meritbook.analysis.AnalysisContext;
import org.meritbook.analysis.ResultTable;
import org.meritbook.analysis.SectionResult;
import org.meritbook.dossier.DossierRenderer;
import org.meritbook.pipeline.StudyResults;
import org.meritbook.study.Study;
import org.meritbook.study.StudyParser;
import org.meritbook.workbook.DataBlock;

/**
 * The precision section's tables: the one-way ANOVA, the summary by level and the outlier tests.
 * Reference values are those of {@link PrecisionAnalysisTest} (R 4.2.2, {@code anova(lm(x ~ g))}, the
 * script there); the total row is R's two sums of squares added (0.03 + 0.57) and N − 1 = 8.
 */
class PrecisionTablesTest {
    private static Study study(String options) {
        return StudyParser.parse(PrecisionAnalysisTest.notebook(options), Path.of("study.md"));
    }

    private static SectionResult run(Study study, DataBlock block) {
        return new PrecisionAnalysis().run(study.cells().get(0), new AnalysisContext(study, ref -> block));
    }

    private static ResultTable table(SectionResult s, String titleStart) {
        return s.tables().stream().filter(t -> t.title().startsWith(titleStart)).findFirst()
                .orElseThrow(() -> new AssertionError("no table " + titleStart + " in "
                        + s.tables().stream().map(ResultTable::title).toList()));
    }

    /** The number a cell shows, looked up as the dossier does. */
    private static double value(SectionResult s, ResultTable.Cell c) {
        return switch (c.show()) {
            case QUANTITY -> s.quantity(c.ref()).orElseThrow().value();
            case STEP -> c.ownValue() ? c.value()
                    : s.steps().stream().filter(x -> x.id().equals(c.ref())).findFirst().orElseThrow().value();
            default -> throw new AssertionError("not a number: " + c);
        };
    }

    @Test
    void theAnovaTableHoldsBetweenWithinAndTotalFromTheSteps() {
        SectionResult s = run(study("group: Run\n"), PrecisionAnalysisTest.block(PrecisionAnalysisTest.GROUPS,
                PrecisionAnalysisTest.VALUES));
        ResultTable t = table(s, "One-way ANOVA by Run");
        assertEquals(List.of("Source", "SS", "df", "MS", "F", "p"), t.columns().stream().map(ResultTable.Column::name).toList());
        assertEquals("(mg/kg)²", t.columns().get(1).unit());
        assertEquals(3, t.rows().size());
        List<ResultTable.Cell> between = t.rows().get(0);
        List<ResultTable.Cell> within = t.rows().get(1);
        List<ResultTable.Cell> total = t.rows().get(2);
        assertEquals("Between Runs", between.get(0).text());
        assertEquals(0.030000000000000176, value(s, between.get(1)), 1e-15);
        assertEquals(2, value(s, between.get(2)));
        assertEquals(0.030000000000000176 / 2, value(s, between.get(3)), 1e-15);
        assertEquals(0.15789473684210606, value(s, between.get(4)), 1e-13);
        assertEquals(0.857374999999999, value(s, between.get(5)), 1e-12);
        assertEquals(0.57000000000000051, value(s, within.get(1)), 1e-14);
        assertEquals(6, value(s, within.get(2)));
        assertEquals(0.57000000000000051 / 6, value(s, within.get(3)), 1e-15);
        assertEquals("Total", total.get(0).text());
        assertEquals(0.6, value(s, total.get(1)), 1e-14);
        assertEquals(8, value(s, total.get(2)));
        assertEquals("precision.ss_total", total.get(1).ref(), "the total has a trail step of its own");
    }

    @Test
    void theOutlierTableListsGrubbsOnResultsAndMeansAndCochran() {
        SectionResult s = run(study("group: Run\n"), PrecisionAnalysisTest.block(PrecisionAnalysisTest.GROUPS,
                PrecisionAnalysisTest.VALUES));
        ResultTable t = table(s, "Outlier tests");
        assertEquals(List.of("Grubbs, results", "Cochran, Run variances", "Grubbs, Run means"),
                t.rows().stream().map(r -> r.get(0).text()).toList());
        for (List<ResultTable.Cell> row : t.rows()) {
            double stat = value(s, row.get(2));
            double c5 = value(s, row.get(3));
            double c1 = value(s, row.get(4));
            assertTrue(c5 < c1, "the 1 % critical value is the larger");
            String flagged = stat > c1 ? "outlier" : stat > c5 ? "straggler" : "not\u00a0flagged";
            assertEquals(flagged, row.get(5).text(), row.get(0).text());
        }
        // Grubbs on the nine results: the farthest from 10.1 is 10.5 or 9.7 (both 0.4 away); G = 0.4 / s.
        assertEquals(0.4 / 0.27386127875258315, value(s, t.rows().get(0).get(2)), 1e-12);
    }

    @Test
    void levelsGetASummaryTableBeforeTheirOtherTables() {
        String[] values = {"10.1", "10.5", "9.7", "20.2", "19.8", "20.4", "19.9", "20.0", "20.3"};
        String[] levels = {"low", "low", "low", "high", "high", "high", "high", "high", "high"};
        SectionResult s = run(study("level: Level\n"), PrecisionAnalysisTest.block(PrecisionAnalysisTest.GROUPS,
                values, levels));
        ResultTable t = s.tables().get(0);
        assertEquals("Summary by level", t.title());
        assertEquals(List.of("low", "high"), t.rows().stream().map(r -> r.get(0).text()).toList());
        List<ResultTable.Cell> low = t.rows().get(0);
        assertEquals(3, value(s, low.get(1)));
        assertEquals(10.1, value(s, low.get(2)), 1e-14);
        assertEquals(0.4, value(s, low.get(3)), 1e-15); // deviations 0, 0.4, −0.4: s = √(0.32/2)
        assertEquals(100 * 0.4 / 10.1, value(s, low.get(4)), 1e-12);
        assertEquals(ResultTable.Show.INTERVAL, low.get(5).show());
        assertEquals("sd:low", low.get(5).ref());
    }

    @Test
    void theRenderedHtmlShowsTheAnovaTableWithItsValuesFormatted(@TempDir Path dir) throws IOException {
        String notebook = PrecisionAnalysisTest.notebook("group: Run\n");
        Path file = Files.writeString(dir.resolve("study.md"), notebook, StandardCharsets.UTF_8); // the dossier attaches it
        Study study = StudyParser.parse(notebook, file);
        SectionResult s = run(study, PrecisionAnalysisTest.block(PrecisionAnalysisTest.GROUPS, PrecisionAnalysisTest.VALUES));
        StudyResults results = new StudyResults(study, List.of(), List.of(s),
                List.of(new StudyResults.SoftwareComponent("meritbook", "test")));
        String html = new String(new DossierRenderer(Optional.empty()).renderHtml(results, "{}".getBytes(StandardCharsets.UTF_8)),
                StandardCharsets.UTF_8);
        int at = html.indexOf("One-way ANOVA by Run");
        assertTrue(at > 0, "the ANOVA table's caption");
        String table = html.substring(at, html.indexOf("</table>", at));
        // docs/dossier.md: sums of squares and mean squares 4 significant figures, df as integers,
        // F a statistic (4 significant figures), p 3 decimals; each a link to its trail step.
        for (String shown : List.of(">0.03000</a>", ">2</a>", ">0.01500</a>", ">0.1579</a>", ">0.857</a>",
                ">0.5700</a>", ">6</a>", ">0.09500</a>", ">0.6000</a>", ">8</a>", "Within Runs", "(mg/kg)²")) {
            assertTrue(table.contains(shown), shown + " in " + table);
        }
        assertTrue(table.contains("href=\"#"), "values link to the trail");
    }
}
