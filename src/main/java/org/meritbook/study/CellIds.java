package org.meritbook.study;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.meritbook.error.ErrorKey;

/**
 * Gives every cell its id and checks the references between cells. A cell without {@code id:} is
 * named by its kind, numbered by its position among the cells of that kind from the second on
 * ({@code calibration}, {@code calibration-2}); counting every cell of the kind keeps an id stable
 * when another cell of the kind is given an explicit id.
 */
final class CellIds {
    /** A cell as read, before it has an id. */
    record Draft(AnalysisKind kind, int line, String heading, CellOptionsParser.Result options) {
    }

    private final Problems problems;

    CellIds(Problems problems) {
        this.problems = problems;
    }

    List<AnalysisCell> assign(List<Draft> drafts) {
        Map<AnalysisKind, Integer> count = new EnumMap<>(AnalysisKind.class);
        Map<String, Integer> firstLine = new HashMap<>();
        List<AnalysisCell> cells = new ArrayList<>();
        for (Draft d : drafts) {
            int n = count.merge(d.kind(), 1, Integer::sum);
            OptionValue explicit = d.options().options().get(OptionRules.ID);
            String id = explicit != null ? explicit.text() : n == 1 ? d.kind().keyword() : d.kind().keyword() + "-" + n;
            int idLine = explicit != null ? explicit.line() : d.line();
            // A rejected id is already reported; its stand-in must not add a duplicate of its own.
            boolean badId = d.options().rejected().contains(OptionRules.ID);
            Integer first = badId ? null : firstLine.putIfAbsent(id, idLine);
            if (first != null) {
                problems.add(ErrorKey.DUPLICATE_ID, idLine, "a cell id used once",
                        Problems.quote(id) + " at line " + first + " and again at line " + idLine,
                        "Give one of the two cells another id with 'id: <name>'.");
            }
            String title = d.heading() != null ? d.heading() : id;
            cells.add(new AnalysisCell(id, d.kind(), title, d.line(), d.options().options(), d.options().exclusions()));
        }
        checkCalibrationReferences(cells);
        return cells;
    }

    /**
     * A {@code calibration:} option names a calibration cell above it: cells run in notebook order,
     * so a cell can use only what an earlier cell computed.
     */
    private void checkCalibrationReferences(List<AnalysisCell> cells) {
        List<String> all = cells.stream().filter(c -> c.kind() == AnalysisKind.CALIBRATION).map(AnalysisCell::id).toList();
        List<String> above = new ArrayList<>();
        for (AnalysisCell cell : cells) {
            List<String> before = List.copyOf(above);
            cell.option(OptionRules.CALIBRATION).filter(OptionValue::isScalar).ifPresent(ref -> {
                if (before.contains(ref.text())) {
                    return;
                }
                if (all.contains(ref.text())) {
                    problems.add(ErrorKey.UNKNOWN_REFERENCE, ref.line(),
                            "a calibration cell above this cell (cells run in notebook order)",
                            Problems.quote(ref.text()) + ", which comes later in the notebook",
                            "Move this cell below the calibration cell '" + ref.text() + "'.");
                    return;
                }
                problems.add(ErrorKey.UNKNOWN_REFERENCE, ref.line(),
                        "the id of a calibration cell (" + (all.isEmpty()
                                ? "this notebook has none" : Problems.list(all)) + ")",
                        Problems.quote(ref.text()),
                        all.isEmpty() ? "Add a calibration cell, or give its id here."
                                : "Name one of the calibration cells" + Suggestion.hint(ref.text(), all) + ".");
            });
            if (cell.kind() == AnalysisKind.CALIBRATION) {
                above.add(cell.id());
            }
        }
    }
}
