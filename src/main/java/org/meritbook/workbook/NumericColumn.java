package org.meritbook.workbook;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.function.IntPredicate;
import java.util.function.Predicate;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.error.Problem;

/**
 * Turns a column into numbers for the statistics. Every cell that is not a number, and is not
 * skipped (excluded with a reason), becomes a located problem; all of them are reported at once.
 * Censored entries and text are never read as 0.
 */
public final class NumericColumn {
    private NumericColumn() {
    }

    /**
     * @param file   the workbook, for messages
     * @param column the column
     * @param skip   cells the notebook excluded; their slots hold NaN and are not judged
     * @return one value per row, NaN where skipped
     * @throws InputException listing every non-numeric, censored or blank cell
     */
    public static double[] values(Path file, Column column, Predicate<CellRef> skip) {
        Objects.requireNonNull(skip, "skip");
        return valuesSkipping(file, column, i -> skip.test(column.values().get(i).ref()));
    }

    /** As {@link #values(Path, Column, Predicate)}, skipping by the value's index in the column. */
    public static double[] valuesSkipping(Path file, Column column, IntPredicate skip) {
        Objects.requireNonNull(skip, "skip");
        double[] out = new double[column.values().size()];
        List<Problem> problems = new ArrayList<>();
        for (int i = 0; i < out.length; i++) {
            CellValue v = column.values().get(i);
            if (skip.test(i)) {
                out[i] = Double.NaN;
            } else if (v.isNumber()) {
                out[i] = v.number();
            } else {
                problems.add(problem(file, column, v));
                out[i] = Double.NaN;
            }
        }
        if (!problems.isEmpty()) {
            throw new InputException(problems);
        }
        return out;
    }

    /** Every cell must be a number; nothing is excluded. */
    public static double[] values(Path file, Column column) {
        return values(file, column, ref -> false);
    }

    private static Problem problem(Path file, Column column, CellValue v) {
        String where = file.getFileName() + ", " + v.ref().address();
        String expected = "a number in column '" + column.header() + "'";
        String exclude = "exclude it in the notebook with a reason (exclude: - cell: " + v.ref().address()
                + ", reason: ...)";
        return switch (v.kind()) {
            case BLANK -> new Problem(ErrorKey.NOT_A_NUMBER, where, expected, "an empty cell",
                    "Enter the value, or " + exclude + ".");
            case CENSORED -> new Problem(ErrorKey.CENSORED_VALUE, where, expected,
                    "the censored result '" + v.raw() + "'",
                    "This method needs measured values; report the measured value, or " + exclude + ".");
            default -> v.isFormulaWithoutResult()
                    ? new Problem(ErrorKey.FORMULA_WITHOUT_RESULT, where, expected,
                            "the formula " + v.raw() + " saved without its result",
                            "Open the workbook in Excel, let it calculate and save it, or " + exclude + ".")
                    : new Problem(ErrorKey.NOT_A_NUMBER, where, expected, found(v),
                            "Correct the cell, or " + exclude + ".");
        };
    }

    /** Names what the cell holds, so "#DIV/0!" reads as an error value and a date as a date. */
    private static String found(CellValue v) {
        String note = v.note() == null ? "" : v.note();
        int unreadable = note.indexOf(Notes.UNREADABLE);
        if (unreadable >= 0) {
            return note.substring(unreadable + Notes.UNREADABLE.length());
        }
        if (note.contains(Notes.ERROR)) {
            return "the error value '" + v.raw() + "'";
        }
        if (note.contains(Notes.DATE)) {
            return "the date '" + v.raw() + "'";
        }
        return "the text '" + v.raw() + "'";
    }
}
