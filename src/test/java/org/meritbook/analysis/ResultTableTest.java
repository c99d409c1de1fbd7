package org.meritbook.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.meritbook.stats.Interval;
import org.meritbook.study.AnalysisKind;
import org.meritbook.trail.Step;

/** A section's tables hold references only, and a reference to nothing is refused when the section is made. */
class ResultTableTest {
    private static final Quantity F = new Quantity("anova_f", "F", 1.5, null, "p.anova_f", null, false,
            NumberKind.STATISTIC);
    private static final Quantity SD = new Quantity("sd", "SD", 0.2, "mg/L", "p.sd", new Interval(0.1, 0.4, 0.95), false,
            NumberKind.MEASURE);
    private static final List<Step> STEPS = List.of(new Step("p.anova_f", "F", "F = a / b", List.of(), 1.5, null, null),
            new Step("p.sd", "SD", "s", List.of(), 0.2, "mg/L", null),
            new Step("p.ss", "SS", "SS", List.of(), 0.6, null, null));

    private static SectionResult section(ResultTable.Cell cell) {
        ResultTable t = new ResultTable("T", List.of(ResultTable.Column.of("a")), List.of(List.of(cell)));
        return new SectionResult("p", AnalysisKind.PRECISION, "P", List.of(), List.of(F, SD), STEPS, null, List.of(t),
                List.of(), List.of(), List.of(), List.of());
    }

    @Test
    void cellsNamingTheSectionsQuantitiesAndStepsAreAccepted() {
        assertEquals(1, section(ResultTable.Cell.quantity("anova_f")).tables().size());
        section(ResultTable.Cell.interval("sd"));
        section(ResultTable.Cell.step("p.ss", NumberKind.MEASURE));
        section(ResultTable.Cell.inputOf("p.anova_f", 3, NumberKind.COUNT));
        assertTrue(section(ResultTable.Cell.text("x")).withVerdicts(List.of()).tables().size() == 1,
                "judging keeps the tables");
    }

    @Test
    void aReferenceToNothingIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> section(ResultTable.Cell.quantity("anova_p")));
        assertThrows(IllegalArgumentException.class, () -> section(ResultTable.Cell.interval("anova_f")),
                "F has no interval");
        assertThrows(IllegalArgumentException.class, () -> section(ResultTable.Cell.step("p.ms", NumberKind.MEASURE)));
        assertThrows(IllegalArgumentException.class, () -> ResultTable.Cell.inputOf("p.ss", Double.NaN, NumberKind.COUNT));
        assertThrows(IllegalArgumentException.class, () -> new ResultTable("T", List.of(ResultTable.Column.of("a"),
                ResultTable.Column.of("b")), List.of(List.of(ResultTable.Cell.empty()))), "a row short of a cell");
    }
}
