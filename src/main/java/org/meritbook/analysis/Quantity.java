package org.meritbook.analysis;

import java.util.Objects;
import org.meritbook.stats.Interval;

/**
 * One named result of an analysis, as results.json and the dossier carry it.
 *
 * @param name     the stable results.json name (DESIGN §4), e.g. {@code slope},
 *                 {@code back_calculated:C5}
 * @param label    plain-language label for the dossier, e.g. "Slope (sensitivity)"
 * @param value    the value at full double precision (finite)
 * @param unit     unit, or null when dimensionless
 * @param stepId   id of the trail step that computed it
 * @param interval its confidence interval, or null
 * @param summary  whether it appears in the dossier's summary of characteristics
 * @param kind     what kind of number it is, which sets its display rounding (not in results.json)
 */
public record Quantity(String name, String label, double value, String unit, String stepId, Interval interval,
                       boolean summary, NumberKind kind) {
    public Quantity {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(label, "label");
        Objects.requireNonNull(stepId, "stepId");
        if (!Double.isFinite(value)) {
            // A bare NaN never reaches a dossier: analyses report "not evaluable" as a warning instead.
            throw new IllegalArgumentException("quantity " + name + " is not finite: " + value);
        }
    }

    /** A quantity whose kind its unit tells: a percentage with unit %, a measure otherwise. */
    public Quantity(String name, String label, double value, String unit, String stepId, Interval interval,
                    boolean summary) {
        this(name, label, value, unit, stepId, interval, summary, NumberKind.ofUnit(unit));
    }
}
