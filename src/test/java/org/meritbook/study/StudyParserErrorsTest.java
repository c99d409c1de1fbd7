package org.meritbook.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.error.Problem;

/** Every notebook error: its key, its line and, for the common ones, the exact message. */
class StudyParserErrorsTest {
    private static final Path FILE = Path.of("/lab/study.md");

    private static final String HEADER = """
            ---
            title: Errors on purpose
            sources:
              runs: runs.xlsx
              blanks: blanks.xlsx
            ---
            """;

    private static List<Problem> problems(String notebook) {
        return assertThrows(InputException.class, () -> StudyParser.parse(notebook, FILE)).problems();
    }

    private static Problem only(String notebook) {
        List<Problem> found = problems(notebook);
        assertEquals(1, found.size(), () -> "expected one problem, got " + found);
        return found.get(0);
    }

    private static void assertProblem(ErrorKey key, String where, Problem problem) {
        assertEquals(key, problem.key(), problem::message);
        assertEquals(where, problem.where(), problem::message);
    }

    @Test
    void unknownOptionNamesTheLineAndTheAllowedOptions() {
        Problem p = only(HEADER + """
                ```calibration
                data: runs!Cal!A1:B9
                x: A
                y: B
                wieghting: 1/x
                ```
                """);
        assertProblem(ErrorKey.UNKNOWN_OPTION, "study.md line 11", p);
        assertEquals("study.md line 11: expected an option of a calibration cell (data, x, y, weighting, model,"
                + " internal-standard, exclude, id, role, censored, formulas, hidden, merged) but found 'wieghting'. Correct the option name"
                + " (did you mean 'weighting'?) or remove the line.", p.message());
    }

    @Test
    void unknownKindListsTheKinds() {
        Problem p = only(HEADER + """
                Some words.

                ```calibraton
                data: runs!Cal!A1:B9
                ```
                """);
        assertProblem(ErrorKey.UNKNOWN_KIND, "study.md line 9", p);
        assertEquals("study.md line 9: expected an analysis kind after the fence (calibration, detection-limit,"
                + " accuracy, precision, range, unknowns) but found 'calibraton'. Write one of the kinds (did you mean"
                + " 'calibration'?), or mark a block that only shows text as ```text.", p.message());
    }

    @Test
    void ordinaryCodeBlocksAreNotMistakenForCells() {
        Study s = StudyParser.parse(HEADER + """
                ```python
                print("not options")
                ```

                ```
                key: value
                ```

                ```yaml
                data: shown, not run
                ```
                """, FILE);
        assertEquals(List.of(7), s.elements().stream().map(StudyElement::line).toList());
        assertEquals(List.of(), s.cells());
    }

    @Test
    void missingRequiredOptionIsReportedAtTheFence() {
        Problem p = only(HEADER + """
                ## Recovery
                ```accuracy
                data: runs!Spikes!A1:C20
                ```
                """);
        assertProblem(ErrorKey.MISSING_OPTION, "study.md line 8", p);
        assertEquals("study.md line 8: expected the options a accuracy cell needs (data, measured, known) but found"
                + " no measured, known. Add 'measured: ...', 'known: ...' to the cell.", p.message());
    }

    @Test
    void undeclaredSourceListsTheDeclaredAliases() {
        Problem p = only(HEADER + """
                ```precision
                value: Result
                data: ruins!Repeats!A1:C30
                ```
                """);
        assertProblem(ErrorKey.UNDECLARED_SOURCE, "study.md line 9", p);
        assertEquals("study.md line 9: expected a source declared under 'sources:' (runs, blanks) but found 'ruins' in"
                + " 'ruins!Repeats!A1:C30'. Use a declared alias (did you mean 'runs'?) or declare it in the front"
                + " matter: 'sources:' then '  ruins: <file>.xlsx'.", p.message());
    }

    @Test
    void undeclaredSourceInsideANestedDataSet() {
        Problem p = only(HEADER + """
                ```detection-limit
                methods: [blank]
                blanks:
                  column: Signal
                  data: lab!Blanks
                ```
                """);
        assertProblem(ErrorKey.UNDECLARED_SOURCE, "study.md line 11", p);
    }

    @Test
    void malformedDataReferenceSaysTheAcceptedForms() {
        Problem p = only(HEADER + """
                ```calibration
                data: runs!Cal!A1:B9
                x: A
                y: B
                ```

                ```unknowns
                calibration: calibration
                data: runs!Samples!A1-C9
                y: Signal
                sample: Sample
                ```
                """);
        assertProblem(ErrorKey.BAD_DATA_REFERENCE, "study.md line 15", p);
        assertEquals("study.md line 15: expected a data reference source!Sheet!A1:D40, source!Sheet!B:C, source!Name or"
                + " source!Sheet (a sheet name with spaces or '!' in quotes: source!'Day 1'!A1:C9) but found"
                + " 'runs!Samples!A1-C9' ('A1-C9' as the range). Write the range as two corners (A4:C25) or whole"
                + " columns (B:C), inside Excel's grid (A1 to XFD1048576).", p.message());
    }

    @Test
    void enumeratedValuesListTheAllowedValues() {
        List<Problem> found = problems(HEADER + """
                ```calibration
                data: runs!Cal!A1:B9
                x: A
                y: B
                weighting: 1/x3
                model: cubic
                censored: keep
                ```

                ```detection-limit
                methods: [blank, lod, blank]
                sigma: noise
                ```
                """);
        assertEquals(List.of(ErrorKey.BAD_OPTION_VALUE), found.stream().map(Problem::key).distinct().toList());
        assertEquals(List.of("study.md line 11", "study.md line 12", "study.md line 13", "study.md line 17",
                "study.md line 17", "study.md line 18"), found.stream().map(Problem::where).toList());
        assertEquals("study.md line 11: expected weighting one of none, 1/x, 1/x^2, 1/y, 1/y^2, 1/s^2, auto but found"
                + " '1/x3'. Choose one of the listed values (did you mean '1/x'?).", found.get(0).message());
        assertEquals("study.md line 12: expected model one of linear, quadratic, linear-through-origin but found"
                + " 'cubic'. Choose one of the listed values.", found.get(1).message());
        assertEquals("study.md line 13: expected censored one of reject, drop but found 'keep'. Choose one of the"
                + " listed values.", found.get(2).message());
        assertEquals("study.md line 17: expected a detection-limit method, one of blank, response-sd, mdl, lob-lod,"
                + " prediction-band, signal-noise but found 'lod'. Choose methods from the list.", found.get(3).message());
        assertEquals("study.md line 17: expected each method once but found 'blank' again. Remove the repeated"
                + " method.", found.get(4).message());
        assertEquals("study.md line 18: expected sigma one of blank, residual, intercept but found 'noise'. Choose"
                + " one of the listed values.", found.get(5).message());
    }

    @Test
    void squaredWeightingsAreAcceptedInBothSpellings() {
        Study s = StudyParser.parse(HEADER + """
                ```calibration
                data: runs!Cal!A1:B9
                x: A
                y: B
                weighting: 1/y^2
                ```

                ```calibration
                data: runs!Cal!A1:B9
                x: A
                y: B
                weighting: 1/y²
                ```
                """, FILE);
        assertEquals(List.of("1/y^2", "1/y²"),
                s.cells().stream().map(c -> c.option("weighting").orElseThrow().text()).toList());
    }

    @Test
    void nestedDataSetsAreCheckedLikeCells() {
        List<Problem> found = problems(HEADER + """
                ```detection-limit
                methods: [lob-lod, mdl]
                low-samples:
                  data: runs!Low!A1:B20
                  column: Result
                  colour: red
                spikes: runs!Spikes
                blanks:
                  data: blanks!Blanks
                ```
                """);
        assertEquals(List.of(ErrorKey.MISSING_OPTION, ErrorKey.UNKNOWN_OPTION, ErrorKey.BAD_OPTION_VALUE,
                ErrorKey.MISSING_OPTION), found.stream().map(Problem::key).toList());
        assertEquals("study.md line 9: expected the entries of 'low-samples' (data, column, sample) but found no"
                + " sample. Add 'sample: ...' under 'low-samples:'.", found.get(0).message());
        assertEquals("study.md line 12: expected an entry of 'low-samples' (data, column, sample) but found 'colour'."
                + " Correct the name or remove the line.", found.get(1).message());
        assertEquals("study.md line 13", found.get(2).where());
        assertEquals("study.md line 14: expected the entries of 'blanks' (data, column) but found no column. Add"
                + " 'column: ...' under 'blanks:'.", found.get(3).message());
    }

    @Test
    void exclusionsNeedASheetCellAndAReason() {
        List<Problem> found = problems(HEADER + """
                ```calibration
                data: runs!Cal!A1:B9
                x: A
                y: B
                exclude:
                  - cell: C17
                    reason: Vial cracked
                  - cell: Cal!C18
                  - cell: Cal!C19
                    reason: "  "
                  - cell: Cal!C20
                    reason: Spilled
                    note: see log
                  - cell: Cal!C21
                    reason: Spilled
                  - cell: Cal!c21
                    reason: Twice
                  - Cal!C22
                ```
                """);
        assertEquals(List.of(ErrorKey.BAD_OPTION_VALUE, ErrorKey.BAD_OPTION_VALUE, ErrorKey.BAD_OPTION_VALUE,
                ErrorKey.UNKNOWN_OPTION, ErrorKey.BAD_OPTION_VALUE, ErrorKey.BAD_OPTION_VALUE),
                found.stream().map(Problem::key).toList());
        assertEquals(List.of(12, 14, 16, 19, 22, 24), found.stream().map(StudyParserErrorsTest::line).toList());
        assertEquals("study.md line 12: expected one cell as Sheet!A1 (a sheet name with spaces in quotes:"
                + " \"'Day 1'!C5\") but found 'C17'. Write the sheet, '!', then the cell, e.g. Calibration!C17; quote"
                + " the whole value when the sheet name is quoted.", found.get(0).message());
        assertEquals("study.md line 14: expected a reason for the exclusion but found no reason. Say why the point is"
                + " left out, e.g. 'reason: Injection failure recorded in run log'.", found.get(1).message());
        assertEquals("study.md line 22: expected each excluded cell once but found 'Cal!C21' again (first at line 20)."
                + " Remove one of the two entries.", found.get(4).message());
    }

    @Test
    void idsMustBeWellFormedAndUnique() {
        List<Problem> found = problems(HEADER + """
                ```calibration
                data: runs!Cal!A1:B9
                x: A
                y: B
                ```

                ```calibration
                id: Cal_2
                data: runs!Cal!A1:B9
                x: A
                y: B
                ```

                ```range
                id: calibration
                calibration: calibration
                ```
                """);
        assertEquals(List.of(ErrorKey.BAD_OPTION_VALUE, ErrorKey.DUPLICATE_ID), found.stream().map(Problem::key).toList());
        assertEquals("study.md line 14: expected an id of lower-case letters, digits and '-', not starting with '-'"
                + " but found 'Cal_2'. Choose an id such as 'linearity' or 'day-2'.", found.get(0).message());
        assertEquals("study.md line 21: expected a cell id used once but found 'calibration' at line 7 and again at"
                + " line 21. Give one of the two cells another id with 'id: <name>'.", found.get(1).message());
    }

    @Test
    void referencesMustNameACalibrationCell() {
        Problem p = only(HEADER + """
                ```calibration
                id: linearity
                data: runs!Cal!A1:B9
                x: A
                y: B
                ```

                ```precision
                data: runs!Rep!A1:B9
                value: B
                ```

                ```range
                calibration: precision
                ```
                """);
        assertProblem(ErrorKey.UNKNOWN_REFERENCE, "study.md line 20", p);
        assertEquals("study.md line 20: expected the id of a calibration cell (linearity) but found 'precision'."
                + " Name one of the calibration cells.", p.message());
    }

    @Test
    void aCellCanUseOnlyACalibrationAboveIt() {
        // Cells run in notebook order: a reference to a later cell would read a result not yet computed.
        Problem p = only(HEADER + """
                ```range
                calibration: linearity
                ```

                ```calibration
                id: linearity
                data: runs!Cal!A1:B9
                x: A
                y: B
                ```
                """);
        assertProblem(ErrorKey.UNKNOWN_REFERENCE, "study.md line 8", p);
        assertEquals("study.md line 8: expected a calibration cell above this cell (cells run in notebook order) but"
                + " found 'linearity', which comes later in the notebook. Move this cell below the calibration cell"
                + " 'linearity'.", p.message());
    }

    @Test
    void frontMatterErrors() {
        Problem none = only("""
                # No front matter
                """);
        assertProblem(ErrorKey.FRONT_MATTER, "study.md line 1", none);

        List<Problem> found = problems("""
                ---
                method: X-1
                revision: 0
                date: 2025-02-30
                sources:
                  run data: runs.xlsx
                ---
                """);
        assertEquals(List.of(ErrorKey.FRONT_MATTER), found.stream().map(Problem::key).distinct().toList());
        assertEquals(List.of(1, 3, 4, 6), found.stream().map(StudyParserErrorsTest::line).toList());
        assertEquals("study.md line 1: expected a 'title:' in the front matter but found no title. Add 'title: <what is"
                + " validated>' between the '---' lines.", found.get(0).message());
        assertEquals("study.md line 3: expected a positive whole number for 'revision' but found '0'. Write the"
                + " revision as 1, 2, 3, ...", found.get(1).message());
        assertEquals("study.md line 4: expected a date as yyyy-mm-dd, e.g. 2025-03-14 but found '2025-02-30'. Write"
                + " the date in ISO form (year-month-day) and check that the day exists.", found.get(2).message());
        assertTrue(found.get(3).message().startsWith("study.md line 6: expected a source alias of letters, digits"),
                found.get(3).message());

        assertProblem(ErrorKey.FRONT_MATTER, "study.md line 1", only("""
                ---
                title: Never closed
                """));
        assertProblem(ErrorKey.FRONT_MATTER, "study.md line 3", only("""
                ---
                title: Twice
                title: Again
                ---
                """));
    }

    @Test
    void malformedYamlIsReportedAtItsNotebookLine() {
        Problem front = only("""
                ---
                title: [unclosed
                method: X
                ---
                """);
        assertProblem(ErrorKey.FRONT_MATTER, "study.md line 3", front);
        assertEquals("study.md line 3: expected valid YAML ('name: value', one per line) but found a YAML error:"
                + " expected ',' or ']', but got : (while parsing a flow sequence at line 2). Correct the YAML on this"
                + " line; put quotes around a value that starts with a quote, '!', '&', '*' or '{', or contains ': '"
                + " (e.g. cell: \"'Day 1'!C5\").", front.message());

        Problem cell = only(HEADER + """
                ```calibration
                data: runs!Cal!A1:B9
                x: A
                y: B
                exclude:
                  - cell: 'Day 1'!C5
                    reason: Quoted sheet not quoted as a whole
                ```
                """);
        assertProblem(ErrorKey.NOTEBOOK_SYNTAX, "study.md line 12", cell);
    }

    @Test
    void unclosedAnalysisCellIsReported() {
        Problem p = only(HEADER + """
                ```range
                calibration: calibration
                """ + """
                ```calibration
                data: runs!Cal!A1:B9
                """);
        assertProblem(ErrorKey.NOTEBOOK_SYNTAX, "study.md line 7", p);
    }

    @Test
    void allProblemsOfANotebookComeTogetherInLineOrder() {
        InputException e = assertThrows(InputException.class, () -> StudyParser.parse("""
                ---
                title: Many slips
                revision: two
                sources:
                  runs: runs.xlsx
                ---
                ```calibration
                data: run!Cal!A1:B9
                x: A
                ```

                ```precison
                data: runs!Rep!A1:B9
                ```
                """, FILE));
        assertEquals(List.of(ErrorKey.FRONT_MATTER, ErrorKey.MISSING_OPTION, ErrorKey.UNDECLARED_SOURCE,
                ErrorKey.UNKNOWN_KIND), e.problems().stream().map(Problem::key).toList());
        assertEquals(ErrorKey.FRONT_MATTER, e.key());
        assertEquals(String.join(System.lineSeparator(), e.problems().stream().map(Problem::message).toList()),
                e.getMessage());
    }

    private static int line(Problem p) {
        return Integer.parseInt(p.where().substring(p.where().lastIndexOf(' ') + 1));
    }

    // Issue 6: the front matter never silently drops or overstates what the dossier says.

    private static String front(String keys) {
        return "---\ntitle: T\n" + keys + "---\n\nText.\n";
    }

    @Test
    void anUnknownFrontMatterKeyIsALocatedErrorWithDidYouMean() {
        Problem p = only(front("prepard-by: A. Analyst\n"));
        assertProblem(ErrorKey.FRONT_MATTER, "study.md line 3", p);
        assertTrue(p.found().contains("(did you mean 'prepared-by'?)"), p.message());
        assertTrue(p.fix().contains("'x-prepard-by'"), p.message());
    }

    @Test
    void aLabsOwnKeyStartsWithX() {
        Study study = StudyParser.parse(front("x-instrument: IC-3\n"), FILE);
        assertEquals("IC-3", study.frontMatter().all().get("x-instrument"));
    }

    @Test
    void placeholdersLeftByNewBlockTheDossier() {
        FrontMatter fm = StudyParser.parse(front("method: <method id>\nlaboratory: Lab of <analyte> tests\n"), FILE)
                .frontMatter();
        List<Problem> found = assertThrows(InputException.class, fm::requireFilledIn).problems();
        assertEquals(2, found.size(), found::toString);
        assertProblem(ErrorKey.FRONT_MATTER, "study.md line 3", found.get(0));
        assertTrue(found.get(0).found().contains("'<method id>'"), found.get(0).message());
        assertTrue(found.get(1).found().contains("'<analyte>'"), found.get(1).message());
    }

    @Test
    void theStatusIsOneOfAFixedSet() {
        Problem p = only(front("status: Aproved\n"));
        assertProblem(ErrorKey.FRONT_MATTER, "study.md line 3", p);
        assertTrue(p.found().contains("did you mean 'approved'"), p.message());
    }

    @Test
    void anApprovalNeedsTheSignOffsItClaims() {
        List<Problem> found = problems(front("status: approved\nreviewed-by: C. Checker\n"));
        assertEquals(List.of("'reviewed-on:' for status: approved", "'approved-by:' for status: approved",
                "'approved-on:' for status: approved"), found.stream().map(Problem::expected).toList());
        Study ok = StudyParser.parse(front("status: approved\nreviewed-by: C. Checker\nreviewed-on: 2025-03-01\n"
                + "approved-by: D. Head\napproved-on: 2025-03-04\n"), FILE);
        assertEquals(Status.APPROVED, Status.of(ok.frontMatter()));
        assertEquals(Status.DRAFT, Status.of(StudyParser.parse(front(""), FILE).frontMatter()));
    }
}
