package org.meritbook.workbook;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeSet;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.Problem;
import org.meritbook.study.ReadingOptions;
import org.meritbook.study.ReadingOptions.Merged;

/**
 * Cells of a block covered by a merged region. A spreadsheet shows the region's value across it,
 * so a label ("Day 1" merged over its replicates) is read in every cell it covers, as the analyst
 * sees it. A <em>number</em> merged over several cells is different: it is one value, and reading
 * it in every row would turn it into replicates nobody measured. So it is read only as the
 * notebook says ({@code merged:}): {@code repeat} when it holds for every row (a nominal level
 * written once for its injections), {@code once} when it is one measurement (read at its first cell,
 * the region's other rows left out with the reason); otherwise a located error.
 */
final class MergedValues {
    private static final String FIX = "Unmerge the cells and enter the value of each row, or say in the notebook cell what the merged "
            + "number means: '" + ReadingOptions.MERGED + ": repeat' (it holds for every row of the region, e.g. a nominal "
            + "level written once for its injections) or '" + ReadingOptions.MERGED + ": once' (it is one measurement: read at "
            + "the region's first cell, its other rows left out and recorded).";

    private MergedValues() {
    }

    static void apply(BlockDraft d, Merged policy) {
        for (Map.Entry<Area, List<int[]>> e : covered(d).entrySet()) {
            Area m = e.getKey();
            CellValue src = d.grid.value(m.firstRow(), m.firstCol());
            if (src.isNumber()) {
                number(d, policy, m, src, e.getValue());
            } else if (labels(src)) {
                fill(d, m, src, e.getValue());
                d.decisions.add("cells in merged region " + m.a1() + " read with its value '" + src.raw() + "'");
            }
        }
    }

    /** Merged regions over the block's blank data cells (other than each region's own first cell), with those cells. */
    private static Map<Area, List<int[]>> covered(BlockDraft d) {
        Map<Area, List<int[]>> out = new LinkedHashMap<>();
        for (int ci = 0; ci < d.cols.size(); ci++) {
            int c = d.cols.get(ci);
            for (int ri = 0; ri < d.rows.size(); ri++) {
                int r = d.rows.get(ri);
                Optional<Area> m = d.grid.merged(r, c);
                if (m.isEmpty() || (m.get().firstRow() == r && m.get().firstCol() == c)
                        || d.value(ci, ri).kind() != CellValue.Kind.BLANK) {
                    continue;
                }
                out.computeIfAbsent(m.get(), k -> new ArrayList<>()).add(new int[] {ci, ri});
            }
        }
        return out;
    }

    /** Text a region shows everywhere: a label or a censored entry, never a formula without result or damaged value. */
    private static boolean labels(CellValue src) {
        boolean text = src.kind() == CellValue.Kind.TEXT || src.kind() == CellValue.Kind.CENSORED;
        boolean unreadable = src.note() != null && src.note().contains(Notes.UNREADABLE);
        return text && !unreadable && !src.isFormulaWithoutResult();
    }

    private static void fill(BlockDraft d, Area m, CellValue src, List<int[]> cells) {
        for (int[] cell : cells) {
            CellValue v = d.value(cell[0], cell[1]);
            d.set(cell[0], cell[1], new CellValue(v.ref(), src.kind(), src.number(), src.raw(),
                    Notes.join(src.note(), Notes.MERGED + m.a1())));
        }
    }

    private static void number(BlockDraft d, Merged policy, Area m, CellValue src, List<int[]> cells) {
        String first = CellRef.columnLetters(m.firstCol()) + (m.firstRow() + 1);
        switch (policy) {
            case REFUSE -> d.problems.add(new Problem(ErrorKey.MERGED_VALUE, d.at(m.a1()),
                    "one value per cell of the block; a number merged over several cells is one value, not one per row",
                    "the number " + src.raw() + " (" + first + ") merged over " + m.a1() + ", which covers "
                            + (cells.size() + 1) + " cells of the block", FIX));
            case REPEAT -> {
                fill(d, m, src, cells);
                d.decisions.add("cells in merged region " + m.a1() + " read with its value '" + src.raw() + "' ("
                        + ReadingOptions.MERGED + ": repeat)");
            }
            case ONCE -> {
                TreeSet<Integer> rows = new TreeSet<>();
                for (int[] cell : cells) {
                    int sheetRow = d.rows.get(cell[1]);
                    if (sheetRow != m.firstRow()) {
                        rows.add(sheetRow);
                        d.leftOut.putIfAbsent(cell[1], "row " + (sheetRow + 1) + " lies in merged region " + m.a1()
                                + ", whose value '" + src.raw() + "' is read once, at " + first + " (" + ReadingOptions.MERGED + ": once)");
                    }
                }
                d.decisions.add("merged region " + m.a1() + ": its value '" + src.raw() + "' read once, at " + first
                        + (rows.isEmpty() ? "" : "; " + BlockDraft.rowList(List.copyOf(rows), 20) + " left out")
                        + " (" + ReadingOptions.MERGED + ": once)");
            }
            default -> throw new IllegalStateException("merged: " + policy);
        }
    }
}
