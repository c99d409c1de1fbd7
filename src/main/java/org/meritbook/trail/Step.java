package org.meritbook.trail;

import java.util.List;
import java.util.Objects;

/**
 * One step of the calculation trail: how one quantity was obtained.
 *
 * @param id      unique within the study: {@code <section id>.<quantity name>}, e.g. {@code calibration.slope}
 * @param label   plain-language label, e.g. "Slope (sensitivity)"
 * @param formula the formula in plain notation, e.g. {@code b = Σw(x−x̄w)(y−ȳw) / Σw(x−x̄w)²}
 * @param inputs  the named inputs with their sources
 * @param value   the result at full precision
 * @param unit    its unit, or null for dimensionless
 * @param method  the published method or reference, or null
 */
public record Step(String id, String label, String formula, List<StepInput> inputs, double value, String unit,
                   String method) {
    public Step {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(label, "label");
        Objects.requireNonNull(formula, "formula");
        inputs = List.copyOf(inputs);
        if (!Double.isFinite(value)) {
            // As for a quantity: an ∞ or NaN never reaches a trail; the analysis says "not evaluable" instead.
            throw new IllegalArgumentException("step " + id + " is not finite: " + value);
        }
    }
}
