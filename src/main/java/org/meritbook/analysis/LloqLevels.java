package org.meritbook.analysis;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.study.AnalysisCell;
import org.meritbook.study.OptionValue;

/**
 * Finds the LLOQ level of an accuracy, precision or unknowns section ({@link LloqLevel}). ICH M10 makes
 * the LLOQ the lowest calibration standard, and a QC "at the LLOQ" one of that concentration. The cell
 * may name its LLOQ level(s) ({@code lloq-level:}); QC samples read back through a calibration in its
 * own units are at the LLOQ when their known value is the calibration's lowest standard above zero.
 * Nothing else is guessed: the lowest level of a study is often a low QC at about three times the
 * LLOQ, which the general limit judges.
 */
public final class LloqLevels {
    /** The cell option naming the LLOQ level, or a list of them. */
    public static final String OPTION = "lloq-level";

    private LloqLevels() {
    }

    /**
     * The levels the cell names with {@code lloq-level:}, each checked against the section's levels;
     * empty when the cell names none.
     *
     * @param levels    the section's member labels, in order
     * @param levelsAre what those labels are, for the message: "levels in column 'Level'"
     */
    public static Optional<LloqLevel> named(AnalysisCell cell, AnalysisContext context, Collection<String> levels,
                                            String levelsAre) {
        Optional<OptionValue> option = cell.option(OPTION);
        if (option.isEmpty()) {
            return Optional.empty();
        }
        OptionValue v = option.get(); // one level or a list of them (checked when the notebook was read)
        List<String> named = v.isScalar() ? List.of(v.text().strip())
                : v.list().stream().map(item -> item.text().strip()).toList();
        if (levels.isEmpty()) {
            throw new InputException(ErrorKey.BAD_OPTION_VALUE, context.where(cell.lineOf(OPTION)),
                    "'" + OPTION + ":' naming one of the " + levelsAre, "a section without such levels",
                    "Remove '" + OPTION + ":', or give the cell its levels (a precision cell: 'level: <column>').");
        }
        List<String> labels = new ArrayList<>();
        for (String name : named) {
            String label = levels.contains(name) ? name : sameNumber(name, levels);
            if (label == null) {
                throw new InputException(ErrorKey.BAD_OPTION_VALUE, context.where(cell.lineOf(OPTION)),
                        "'" + OPTION + ":' naming one of the " + levelsAre + ": " + String.join(", ", levels),
                        "'" + name + "'", "Write the level as the section shows it, or a list of them.");
            }
            if (!labels.contains(label)) {
                labels.add(label);
            }
        }
        return Optional.of(new LloqLevel(labels, "named in the cell (" + OPTION + ": " + String.join(", ", named) + ")"));
    }

    /** The level whose label is the same number as {@code name} ("1.0" for a level labelled "1"), or null. */
    private static String sameNumber(String name, Collection<String> levels) {
        double v = number(name);
        if (Double.isNaN(v)) {
            return null;
        }
        return levels.stream().filter(l -> number(l) == v).findFirst().orElse(null);
    }

    private static double number(String text) {
        try {
            double v = Double.parseDouble(text.strip());
            return Double.isFinite(v) ? v : Double.NaN;
        } catch (NumberFormatException e) {
            return Double.NaN; // a text label such as "QC-L": compared as written
        }
    }

    /** The members of both, {@code first}'s in order, then the others; both bases said. */
    public static LloqLevel union(LloqLevel first, LloqLevel second) {
        List<String> labels = new ArrayList<>(first.labels());
        second.labels().stream().filter(l -> !labels.contains(l)).forEach(labels::add);
        if (labels.size() == first.labels().size()) {
            return first;
        }
        return new LloqLevel(labels, first.basis() + "; " + second.basis());
    }

    /**
     * The members whose known value is the calibration's lowest standard above zero.
     *
     * @param knownByLabel each member's known value, in the calibration's concentration unit
     * @param lowest       the calibration's lowest standard above zero
     * @param what         the standard as the basis names it: "the lowest standard above zero of calibration 'cal' (2 mg/L)"
     */
    public static LloqLevel atLowestStandard(Map<String, Double> knownByLabel, double lowest, String what) {
        List<String> at = new ArrayList<>();
        for (Map.Entry<String, Double> e : knownByLabel.entrySet()) {
            if (NominalValues.sameLevel(e.getValue(), lowest)) {
                at.add(e.getKey());
            }
        }
        return new LloqLevel(at, (at.isEmpty() ? "no known value equals " : "known value equal to ") + what);
    }

    /** Shows the identified LLOQ among the section's settings and exports it for the acceptance rules. */
    public static void record(SectionBuilder section, LloqLevel lloq) {
        section.setting("LLOQ level", (lloq.labels().isEmpty() ? "none" : String.join(", ", lloq.labels())) + ": "
                + lloq.basis());
        section.export(lloq);
    }
}
