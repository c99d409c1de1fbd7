package org.meritbook.analysis;

import java.nio.file.Path;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.Problem;
import org.meritbook.trail.StepInput;
import org.meritbook.workbook.CellValue;
import org.meritbook.workbook.Column;

/**
 * The internal-standard ratio as the response ({@code internal-standard: <column>} on calibration and
 * unknowns cells): each response is the analyte's response divided by the internal standard's in the
 * same row, y = A / A_IS, and each ratio is a trail step citing both cells. An internal-standard cell
 * that is empty, censored, text or not positive gives no ratio: a located error naming the cell.
 */
public final class InternalStandard {
    /** The cell option that names the internal-standard column. */
    public static final String OPTION = "internal-standard";

    private InternalStandard() {
    }

    /**
     * What is wrong with one internal-standard cell, or empty when it holds a positive number.
     *
     * @param file       the workbook, for the location
     * @param column     the internal-standard column
     * @param cell       the cell
     * @param optionLine where the notebook names the column ("study.md line 12")
     */
    public static Optional<Problem> problem(Path file, Column column, CellValue cell, String optionLine) {
        if (cell.isNumber() && cell.number() > 0 && Double.isFinite(cell.number())) {
            return Optional.empty();
        }
        String where = file.getFileName() + ", " + cell.ref().address();
        String expected = "a positive internal-standard response in column '" + column.header() + "' ("
                + OPTION + ": " + optionLine + "), the divisor of the response ratio";
        String exclude = "exclude the reading in the notebook with a reason (exclude: - cell: "
                + cell.ref().address() + ", reason: ...)";
        Problem p = switch (cell.kind()) {
            case BLANK -> new Problem(ErrorKey.NOT_A_NUMBER, where, expected, "an empty cell",
                    "Enter the internal standard's response, or " + exclude + ".");
            case CENSORED -> new Problem(ErrorKey.CENSORED_VALUE, where, expected,
                    "the censored result '" + cell.raw() + "'",
                    "An internal standard that was not detected gives no ratio: re-inject, or " + exclude + ".");
            case TEXT -> new Problem(ErrorKey.NOT_A_NUMBER, where, expected, "the text '" + cell.raw() + "'",
                    "Correct the cell, or " + exclude + ".");
            case NUMBER -> new Problem(ErrorKey.UNUSABLE_VALUES, where, expected, "'" + cell.raw() + "'",
                    "A response ratio needs an internal-standard response above 0: correct the cell, or "
                            + exclude + ".");
        };
        return Optional.of(p);
    }

    /** The problems of the given cells, in order (every bad cell at once). */
    public static List<Problem> problems(Path file, Column column, List<CellValue> cells, String optionLine) {
        return cells.stream().map(c -> problem(file, column, c, optionLine)).flatMap(Optional::stream).toList();
    }

    /** The ratio's unit: none when both responses share a unit (or have none), else "a/b". */
    public static String unit(String analyteUnit, String standardUnit) {
        if (Objects.equals(analyteUnit, standardUnit)) {
            return null;
        }
        return (analyteUnit == null ? "1" : analyteUnit) + "/" + (standardUnit == null ? "1" : standardUnit);
    }

    /** The step name of the ratio of the response in {@code label} (its A1 address or reading label). */
    public static String stepName(String label) {
        return "response_ratio:" + label;
    }

    /**
     * Records one ratio y = A / A_IS as a step and returns its id.
     *
     * @param label    the point's label (step name {@code response_ratio:<label>})
     * @param analyte  the analyte's response cell
     * @param standard the internal standard's response cell, a positive number
     */
    public static String record(SectionBuilder section, String label, CellValue analyte, String analyteUnit,
                                CellValue standard, String standardUnit) {
        return section.step(stepName(label), "Response ratio to the internal standard, " + analyte.ref().address(),
                "y = A / A_IS", List.of(StepInput.number("A", analyte.number(), analyteUnit, analyte.ref().address()),
                        StepInput.number("A_IS", standard.number(), standardUnit, standard.ref().address())),
                analyte.number() / standard.number(), unit(analyteUnit, standardUnit), null);
    }
}
