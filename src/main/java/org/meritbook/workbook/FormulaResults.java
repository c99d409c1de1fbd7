package org.meritbook.workbook;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.Problem;
import org.meritbook.study.ReadingOptions;
import org.meritbook.study.ReadingOptions.Formulas;

/**
 * Formula cells of a block that the workbook holds no result for (written by a program that does
 * not calculate, such as a script library, a LIMS export or a converter). Their value is unknown;
 * reading them as 0 or as their formula text would be a number or a text from nothing. By default
 * ({@code formulas: stored}) every such cell of the block is named in one located error; under
 * {@code formulas: evaluate} meritbook evaluates each with POI's formula evaluator, records each
 * cell with its formula and value, and reports each one it cannot evaluate.
 */
final class FormulaResults {
    /** Cells listed with their formula before the rest are given as ranges. */
    private static final int WITH_FORMULA = 12;

    private FormulaResults() {
    }

    static void apply(BlockDraft d, Formulas policy) {
        List<int[]> missing = new ArrayList<>();
        for (int ci = 0; ci < d.cols.size(); ci++) {
            for (int ri = 0; ri < d.rows.size(); ri++) {
                if (!d.leftOut.containsKey(ri) && d.value(ci, ri).isFormulaWithoutResult()) {
                    missing.add(new int[] {ci, ri});
                }
            }
        }
        if (missing.isEmpty()) {
            return;
        }
        if (policy == Formulas.STORED) {
            refuse(d, missing);
        } else {
            evaluate(d, missing);
        }
    }

    private static void refuse(BlockDraft d, List<int[]> missing) {
        List<CellValue> cells = missing.stream().map(m -> d.value(m[0], m[1]))
                .sorted(Comparator.comparingInt((CellValue v) -> v.ref().col()).thenComparingInt(v -> v.ref().row())).toList();
        List<String> named = new ArrayList<>();
        for (CellValue v : cells.subList(0, Math.min(WITH_FORMULA, cells.size()))) {
            named.add(v.ref().address() + " (" + v.raw() + ")");
        }
        if (cells.size() > WITH_FORMULA) {
            named.add("and " + ranges(cells.subList(WITH_FORMULA, cells.size())));
        }
        String found = (cells.size() == 1 ? "a formula" : cells.size() + " formulas") + " saved without "
                + (cells.size() == 1 ? "its result" : "their results") + ": " + String.join(", ", named);
        d.problems.add(new Problem(ErrorKey.FORMULA_WITHOUT_RESULT, d.where(),
                "the results a spreadsheet program stores with each formula when it saves the workbook", found,
                "Open the workbook in a spreadsheet program, let it calculate and save it (the file was written by a program "
                        + "that does not calculate); or add '" + ReadingOptions.FORMULAS + ": evaluate' to the notebook cell "
                        + "to have meritbook evaluate them, each recorded in the calculation trail."));
    }

    private static void evaluate(BlockDraft d, List<int[]> missing) {
        for (int[] m : missing) {
            CellValue before = d.value(m[0], m[1]);
            CellRef ref = before.ref();
            try {
                CellValue v = d.grid.evaluate(ref.row(), ref.col());
                d.set(m[0], m[1], v);
                d.decisions.add(ref.address() + ": formula " + before.raw() + " had no stored result; evaluated by meritbook to "
                        + (v.raw().isEmpty() ? "an empty value" : "'" + v.raw() + "'") + " (" + ReadingOptions.FORMULAS + ": evaluate)");
            } catch (FormulaFailure e) {
                d.problems.add(new Problem(ErrorKey.FORMULA_NOT_EVALUATED, d.at(ref.a1()),
                        "a formula meritbook can evaluate (" + ReadingOptions.FORMULAS + ": evaluate)", e.getMessage(),
                        "Open the workbook in a spreadsheet program, let it calculate and save it, so that its stored results "
                                + "are read instead; or replace the formula by its value."));
            }
        }
    }

    /** "Calibration!C21:C31, Calibration!D5": vertical runs of cells, column by column. */
    static String ranges(List<CellValue> cells) {
        List<String> out = new ArrayList<>();
        int i = 0;
        while (i < cells.size()) {
            CellRef start = cells.get(i).ref();
            int j = i;
            while (j + 1 < cells.size() && cells.get(j + 1).ref().col() == start.col()
                    && cells.get(j + 1).ref().row() == cells.get(j).ref().row() + 1) {
                j++;
            }
            CellRef end = cells.get(j).ref();
            out.add(i == j ? start.address() : start.address() + ":" + end.a1());
            i = j + 1;
        }
        return String.join(", ", out);
    }
}
