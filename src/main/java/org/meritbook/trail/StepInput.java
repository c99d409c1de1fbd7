package org.meritbook.trail;

import java.util.Objects;

/**
 * One named input of a trail step.
 *
 * @param name   symbol or name as used in the step's formula, e.g. {@code "x[3]"} or {@code "s(y/x)"}
 * @param value  the numeric value, or NaN when the input is not numeric (see {@code text})
 * @param text   a non-numeric input (an option such as the weighting "1/x"), or null
 * @param unit   unit, or null
 * @param source where it came from: a cell address ({@code Calibration!C17}), another step's id,
 *               or {@code "notebook line 14"}
 */
public record StepInput(String name, double value, String text, String unit, String source) {
    public StepInput {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(source, "source");
    }

    public static StepInput number(String name, double value, String unit, String source) {
        return new StepInput(name, value, null, unit, source);
    }

    public static StepInput text(String name, String text, String source) {
        return new StepInput(name, Double.NaN, text, null, source);
    }
}
