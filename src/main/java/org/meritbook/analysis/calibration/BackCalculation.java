package org.meritbook.analysis.calibration;

import java.util.ArrayList;
import java.util.List;
import org.meritbook.analysis.SectionBuilder;
import org.meritbook.analysis.SectionBuilder.QuantityDraft;
import org.meritbook.trail.StepInput;

/**
 * Back-calculated concentration of every standard with numbers (excluded ones too, labelled, so a
 * reviewer sees what an exclusion changed) and its % deviation from nominal.
 */
final class BackCalculation {
    private BackCalculation() {
    }

    /**
     * How the model inverts a response.
     *
     * @param formula      e.g. {@code x̂ = (y − a) / b}
     * @param coefficients the coefficient steps the formula uses, as inputs
     */
    record Inversion(String formula, List<StepInput> coefficients) {
        Inversion {
            coefficients = List.copyOf(coefficients);
        }
    }

    static void record(SectionBuilder section, CalibrationData data, CalibrationCurve curve, Inversion inversion) {
        for (CalibrationPoint p : data.points()) {
            if (!Double.isFinite(p.x()) || !Double.isFinite(p.y())) {
                continue;
            }
            String yAddress = p.yCell().ref().address();
            String suffix = p.used() ? "" : " (excluded)";
            double back;
            try {
                back = curve.inverse(p.y());
            } catch (IllegalArgumentException e) {
                // A quadratic may not reach a response near the calibrated span: said, not hidden.
                section.warning("No back-calculated concentration for " + yAddress + suffix + ": " + e.getMessage());
                continue;
            }
            List<StepInput> in = new ArrayList<>();
            in.add(StepInput.number("y", p.y(), data.yUnit(), ResponseRatios.source(section, p)));
            in.addAll(inversion.coefficients());
            String backId = section.quantity(QuantityDraft.of("back_calculated:" + p.label(),
                    "Back-calculated concentration, " + yAddress + suffix, inversion.formula(), in, back,
                    data.xUnit()));
            double deviation = p.x() == 0 ? Double.NaN : (back - p.x()) / p.x() * 100.0;
            if (p.x() != 0 && !Double.isFinite(deviation)) {
                section.warning("No % deviation for " + yAddress + suffix + ": its nominal concentration " + p.x()
                        + " is so close to zero that the relative deviation is not a finite number.");
            } else if (p.x() != 0) {
                section.quantity(QuantityDraft.of("deviation_percent:" + p.label(),
                        "Deviation from nominal, " + yAddress + suffix, "%dev = (x̂ − x) / x × 100",
                        List.of(section.ref("x̂", backId),
                                StepInput.number("x", p.x(), data.xUnit(), p.xCell().ref().address())),
                        deviation, "%"));
                section.nominal(p.label(), p.x());
            }
        }
    }
}
