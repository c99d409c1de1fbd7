package org.meritbook.analysis.calibration;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.meritbook.analysis.SectionBuilder;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.error.Problem;
import org.meritbook.stats.regression.LevelVariances;
import org.meritbook.trail.StepInput;

/**
 * Inverse-variance weighting ({@code weighting: 1/s^2}) as the section records it: the replicate SD
 * of each level as a trail step citing its response cells, and, before any fit, every level that
 * cannot give a weight (one replicate, or replicates that do not scatter) as a located error.
 */
final class ReplicateWeights {
    private ReplicateWeights() {
    }

    /** Every level of the points in the fit that gives no weight, each a problem naming its cells. */
    static void check(CalibrationData data, String weightingLine) {
        List<CalibrationPoint> used = data.used();
        LevelVariances v = LevelVariances.of(data.usedX(), data.usedY());
        List<Problem> problems = new ArrayList<>();
        for (LevelVariances.Level level : v.levels()) {
            if (level.usable()) {
                continue;
            }
            List<String> cells = new ArrayList<>();
            for (int i = 0; i < used.size(); i++) {
                if (v.levelOf(i).equals(level)) {
                    cells.add(used.get(i).yCell().ref().address());
                }
            }
            String at = "x = " + plain(level.x()) + (data.xUnit() == null ? "" : " " + data.xUnit());
            String where = data.block().file().getFileName() + ", " + String.join(", ", cells);
            String expected = "at least 2 replicate responses that differ at each concentration level under weighting "
                    + "1/s^2 (" + weightingLine + ")";
            if (level.count() < 2) {
                problems.add(new Problem(ErrorKey.TOO_FEW_POINTS, where, expected,
                        "1 response at " + at + " in the fit, so no replicate SD",
                        "Measure this level in replicate, exclude it with a reason, or choose another weighting."));
            } else {
                problems.add(new Problem(ErrorKey.ZERO_VARIANCE, where, expected,
                        level.count() + " equal responses at " + at + " (s = 0), which would give an infinite weight",
                        "Check the responses of this level (copied values?), or choose another weighting."));
            }
        }
        if (!problems.isEmpty()) {
            throw new InputException(problems);
        }
    }

    /**
     * Records the replicate SD of each level as a step and returns, per point in the fit (in order), the id
     * of its level's step.
     */
    static List<String> record(SectionBuilder section, CalibrationData data) {
        List<CalibrationPoint> used = data.used();
        LevelVariances v = LevelVariances.of(data.usedX(), data.usedY());
        Map<LevelVariances.Level, String> ids = new LinkedHashMap<>();
        for (LevelVariances.Level level : v.levels()) {
            List<StepInput> inputs = new ArrayList<>();
            int k = 0;
            for (int i = 0; i < used.size(); i++) {
                if (v.levelOf(i).equals(level)) {
                    CalibrationPoint p = used.get(i);
                    inputs.add(StepInput.number("y" + ++k, p.y(), data.yUnit(), ResponseRatios.source(section, p)));
                }
            }
            String at = plain(level.x());
            ids.put(level, section.step("level_sd:" + at, "Replicate SD of the responses at x = " + at
                            + (data.xUnit() == null ? "" : " " + data.xUnit()),
                    "sₖ = √(Σ(yᵢ − ȳₖ)² / (k − 1)), k = " + level.count(), inputs, level.sd(), data.yUnit(),
                    "sample standard deviation of the level's replicates (weighting 1/s^2)"));
        }
        List<String> perPoint = new ArrayList<>();
        for (int i = 0; i < used.size(); i++) {
            perPoint.add(ids.get(v.levelOf(i)));
        }
        return perPoint;
    }

    static String plain(double x) {
        return new BigDecimal(Double.toString(x)).stripTrailingZeros().toPlainString();
    }
}
