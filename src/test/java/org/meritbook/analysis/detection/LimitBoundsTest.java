package org.meritbook.analysis.detection;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.meritbook.analysis.detection.DetectionFixture.numbers;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.meritbook.analysis.Quantity;
import org.meritbook.analysis.SectionResult;
import org.meritbook.criteria.BuiltInProfiles;
import org.meritbook.analysis.Verdict;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.trail.Step;

/**
 * The LOQ against the lowest calibration standard and the reporting limit (issue 9). Data: Miller &amp;
 * Miller's fluorescence calibration (handbook worked example, from memory), 0 to 12 pg/mL, whose
 * calibration-as-blank LOQ is 10·s(y/x)/b = 2.2423 pg/mL (R: 10*s/b = 2.24231932853312, as in
 * DetectionLimitAnalysisTest).
 */
class LimitBoundsTest {
    private static final String CALIBRATION = """
            ```calibration
            id: cal
            data: lab!Cal!A1:B8
            x: Conc
            y: Signal
            ```

            """;

    private static DetectionFixture fixture() {
        return new DetectionFixture().block("Cal", 0, "A1:B8", new String[] {"Conc (pg/mL)", "Signal (units)"},
                new String[][] {numbers(0, 2, 4, 6, 8, 10, 12), numbers(2.1, 5.0, 9.0, 12.6, 17.3, 21.0, 24.7)});
    }

    private static SectionResult run(String extra) {
        return fixture().run(CALIBRATION + "## Limits\n\n```detection-limit\nmethods: [blank]\ncalibration: cal\n"
                + extra + "```\n");
    }

    private static Quantity q(SectionResult s, String name) {
        return s.quantity(name).orElseThrow(() -> new AssertionError("no " + name + " in "
                + s.quantities().stream().map(Quantity::name).toList()));
    }

    @Test
    void theLowestStandardIsTheLowestAboveZeroAndTheReportingLimitTakesTheConcentrationUnit() {
        SectionResult s = run("reporting-limit: 2.5\n");
        // The zero calibrator is a blank standard: the LOQ is compared with the next one up, 2 pg/mL.
        assertEquals(2.0, q(s, "lowest_standard").value(), 0);
        assertEquals("pg/mL", q(s, "lowest_standard").unit());
        assertEquals(2.5, q(s, "reporting_limit").value(), 0);
        assertEquals("pg/mL", q(s, "reporting_limit").unit());
        assertEquals(2.24231932853312, q(s, "loq").value(), 1e-12);
        Step low = s.steps().stream().filter(st -> st.id().equals(q(s, "lowest_standard").stepId())).findFirst()
                .orElseThrow();
        assertTrue(low.inputs().get(0).source().startsWith("Cal!"), "the trail names the standard's cell: " + low);
        Step rl = s.steps().stream().filter(st -> st.id().equals(q(s, "reporting_limit").stepId())).findFirst()
                .orElseThrow();
        assertTrue(rl.inputs().get(0).source().startsWith("notebook line "), rl.toString());
    }

    @Test
    void theTraceProfileJudgesTheLoqAgainstTheReportingLimitOrSaysItWasNotGiven() {
        var profile = BuiltInProfiles.all().get("trace-environmental");
        List<Verdict> pass = verdictsOnLoq(profile.judge(run("reporting-limit: 2.5 pg/mL\n")));
        assertEquals(Verdict.Outcome.PASS, pass.get(0).outcome(), pass.toString());
        assertEquals("LOQ = 2.24232 pg/mL, reporting limit = 2.5 pg/mL", pass.get(0).reason());
        List<Verdict> fail = verdictsOnLoq(profile.judge(run("reporting-limit: 2\n")));
        assertEquals(Verdict.Outcome.FAIL, fail.get(0).outcome());
        List<Verdict> none = verdictsOnLoq(profile.judge(run("")));
        assertEquals(Verdict.Outcome.NOT_EVALUABLE, none.get(0).outcome());
        assertEquals("no reporting limit given (option 'reporting-limit:' of the cell)", none.get(0).reason());
        // loq is a family: each method's LOQ (loq:blank) and the first method's (loq) are judged, in section order
        assertEquals(List.of("loq:blank", "loq"), none.stream().map(Verdict::quantity).toList());
    }

    private static List<Verdict> verdictsOnLoq(SectionResult s) {
        return s.verdicts().stream().filter(v -> v.quantity() != null && v.quantity().startsWith("loq")).toList();
    }

    @Test
    void aReportingLimitThatIsNotAPositiveNumberOrInAnotherUnitIsALocatedError() {
        InputException e = assertThrows(InputException.class, () -> run("reporting-limit: low\n"));
        assertEquals(ErrorKey.BAD_OPTION_VALUE, e.key());
        assertTrue(e.getMessage().contains("expected reporting-limit: a positive concentration, e.g. "
                + "'reporting-limit: 0.05' (in pg/mL) but found 'low'"), e.getMessage());
        assertTrue(e.getMessage().startsWith("study.md line "), e.getMessage());
        e = assertThrows(InputException.class, () -> run("reporting-limit: 2.5 ng/mL\n"));
        assertTrue(e.getMessage().contains("a value in the cell's concentration unit pg/mL"), e.getMessage());
        assertThrows(InputException.class, () -> run("reporting-limit: -1\n"));
    }

    @Test
    void withoutACalibrationThereIsNoLowestStandard() {
        SectionResult s = new DetectionFixture()
                .block("Blanks", 0, "A1:A9", new String[] {"Result (mg/kg)"},
                        new String[][] {numbers(0.02, 0.01, 0.03, 0.02, 0.015, 0.025, 0.02, 0.018)})
                .run("```detection-limit\nmethods: [blank]\nblanks: {data: lab!Blanks!A1:A9, column: Result, "
                        + "units: concentration}\nreporting-limit: 0.1\n```\n");
        assertFalse(s.quantity("lowest_standard").isPresent());
        assertEquals(0.1, q(s, "reporting_limit").value(), 0);
        assertEquals("mg/kg", q(s, "reporting_limit").unit(), "without a calibration, the unit of the cell's LOQ");
    }
}
