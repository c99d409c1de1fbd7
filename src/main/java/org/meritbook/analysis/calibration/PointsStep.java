package org.meritbook.analysis.calibration;

import java.util.ArrayList;
import java.util.List;
import org.meritbook.analysis.SectionBuilder;
import org.meritbook.analysis.SectionBuilder.QuantityDraft;
import org.meritbook.stats.regression.Weighting;
import org.meritbook.trail.StepInput;

/**
 * The first trail step of every calibration: the points in the fit with their cells and weights,
 * the points left out with their reasons, and what the reader decided while reading the block.
 */
final class PointsStep {
    private PointsStep() {
    }

    /** Records quantity {@code n}; returns its step id, which later steps cite for "the points". */
    static String record(SectionBuilder section, CalibrationData data, Weighting weighting, double[] weights, int n) {
        List<StepInput> inputs = new ArrayList<>();
        int k = 0;
        for (CalibrationPoint p : data.points()) {
            if (p.used()) {
                k++;
                inputs.add(StepInput.number("x" + k, p.x(), data.xUnit(), p.xCell().ref().address()));
                inputs.add(StepInput.number("y" + k, p.y(), data.yUnit(), p.yCell().ref().address()));
                if (weighting != Weighting.NONE) {
                    inputs.add(StepInput.number("w" + k, weights[k - 1], null,
                            weighting.notation() + ", normalised to mean 1"));
                }
            } else {
                inputs.add(StepInput.text("excluded " + p.yCell().ref().address(), p.exclusionReason(),
                        "notebook exclude"));
            }
        }
        String block = data.block().sheet() + "!" + data.block().range();
        for (String decision : data.block().decisions()) {
            inputs.add(StepInput.text("reading " + block, decision, data.block().file().getFileName().toString()));
        }
        return section.quantity(QuantityDraft.of("n", "Number of calibration points in the fit",
                "n = points in the range not excluded", inputs, n, null));
    }
}
