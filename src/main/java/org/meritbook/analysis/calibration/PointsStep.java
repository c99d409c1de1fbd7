package org.meritbook.analysis.calibration;

import java.util.ArrayList;
import java.util.List;
import org.meritbook.analysis.NumberKind;
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
        boolean replicates = weighting == Weighting.INVERSE_VARIANCE;
        List<String> levelSd = replicates ? ReplicateWeights.record(section, data) : List.of();
        int k = 0;
        for (CalibrationPoint p : data.points()) {
            if (p.used()) {
                k++;
                inputs.add(StepInput.number("x" + k, p.x(), data.xUnit(), p.xCell().ref().address()));
                inputs.add(StepInput.number("y" + k, p.y(), data.yUnit(), ResponseRatios.source(section, p)));
                if (weighting != Weighting.NONE) {
                    inputs.add(StepInput.number("w" + k, weights[k - 1], null, replicates
                            ? "1/s² of " + levelSd.get(k - 1) + ", normalised to mean 1"
                            : weighting.notation() + ", normalised to mean 1"));
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
        String id = section.quantity(QuantityDraft.of("n", "Number of calibration points in the fit",
                "n = points in the range not excluded", inputs, n, null).as(NumberKind.COUNT));
        if (replicates) {
            recordReplicateScale(section, data, id);
        } else if (weighting != Weighting.NONE) {
            recordScale(section, data, weighting, id);
        }
        return id;
    }

    /**
     * How the weights are scaled: each raw weight is divided by their mean, so they average 1. The
     * slope and intercept do not depend on that choice, but s(y/x) and the sums of squares do: they
     * are those of a point of average weight.
     */
    private static void recordScale(SectionBuilder section, CalibrationData data, Weighting weighting, String points) {
        double[] raw = weighting.rawWeights(data.usedX(), data.usedY());
        double mean = 0;
        for (double v : raw) {
            mean += v;
        }
        mean /= raw.length;
        String symbol = weighting.basis() + "ᵢ" + (weighting.power() == 2 ? "²" : "");
        String basisUnit = "x".equals(weighting.basis()) ? data.xUnit() : data.yUnit();
        String unit = basisUnit == null ? null : "1/(" + basisUnit + ")" + (weighting.power() == 2 ? "²" : "");
        section.step("weight_scale", "Mean raw weight, the divisor that scales the weights to average 1",
                "w′ᵢ = 1/" + symbol + ";  w̄′ = Σw′ᵢ / n;  wᵢ = w′ᵢ / w̄′, so Σwᵢ = n",
                List.of(StepInput.text(weighting.basis() + ", n", "the points listed in " + points, points)),
                mean, unit, null);
    }

    /** As {@link #recordScale}, for weights 1/s² of each point's level (unit: 1 over the response squared). */
    private static void recordReplicateScale(SectionBuilder section, CalibrationData data, String points) {
        double[] raw = Weighting.INVERSE_VARIANCE.rawWeights(data.usedX(), data.usedY());
        double mean = 0;
        for (double v : raw) {
            mean += v;
        }
        mean /= raw.length;
        section.step("weight_scale", "Mean raw weight, the divisor that scales the weights to average 1",
                "w′ᵢ = 1/sᵢ², sᵢ the replicate SD of xᵢ's level;  w̄′ = Σw′ᵢ / n;  wᵢ = w′ᵢ / w̄′, so Σwᵢ = n",
                List.of(StepInput.text("s, n", "the level SDs and the points listed in " + points, points)),
                mean, Units.inverseSquare(data.yUnit()), null);
    }

    /** The settings line that says how the weights are scaled. */
    static String scaling(Weighting weighting) {
        return weighting == Weighting.NONE ? "none: every weight is 1"
                : "each weight " + weighting.notation() + " divided by the mean weight of the points in the fit, so "
                + "the weights average 1 (Σw = n); s(y/x) and the sums of squares are those of a point of average "
                + "weight";
    }
}
