package org.meritbook.analysis.detection;

import java.util.List;
import java.util.Optional;
import org.meritbook.analysis.SectionBuilder;
import org.meritbook.analysis.SectionResult;
import org.meritbook.analysis.SectionBuilder.QuantityDraft;
import org.meritbook.analysis.calibration.CalibrationLine;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.study.OptionValue;
import org.meritbook.trail.Step;
import org.meritbook.trail.StepInput;

/**
 * What a profile may compare the LOQ with (docs/criteria.md, "not-above"): {@code lowest_standard},
 * the lowest calibration standard above zero in the referenced calibration's fit, and
 * {@code reporting_limit}, the cell's {@code reporting-limit:} in the concentration unit. Both are
 * reported as quantities of the section, so a rule judges them like any other and the trail shows
 * where they come from.
 */
final class LimitBounds {
    static final String OPTION = "reporting-limit";

    private LimitBounds() {
    }

    /**
     * Records both bounds the cell has; a malformed {@code reporting-limit:} is a located error.
     *
     * @param loqUnit the unit of the cell's {@code loq}, the reporting limit's unit when no calibration gives one
     */
    static void record(DetectionInputs in, String loqUnit) {
        SectionBuilder s = in.section();
        Optional<CalibrationLine> line = in.calibrationIfAny();
        line.ifPresent(l -> lowestStandard(s, l, in.calibrationSectionIfAny().orElse(null)));
        Optional<OptionValue> written = in.cell().option(OPTION);
        if (written.isEmpty()) {
            return;
        }
        String unit = line.map(CalibrationLine::xUnit).orElse(loqUnit);
        String text = written.get().text().strip();
        String[] parts = text.split("\\s+", 2);
        double value;
        try {
            value = Double.parseDouble(parts[0]);
        } catch (NumberFormatException e) {
            value = Double.NaN;
        }
        String where = in.context().where(written.get().line());
        if (!(value > 0 && Double.isFinite(value))) {
            throw new InputException(ErrorKey.BAD_OPTION_VALUE, where,
                    OPTION + ": a positive concentration, e.g. '" + OPTION + ": 0.05'" + (unit == null ? "" : " (in "
                            + unit + ")"), "'" + text + "'", "Write the reporting limit as a number after '" + OPTION
                            + ":', in the cell's concentration unit.");
        }
        if (parts.length > 1) {
            if (unit != null && !parts[1].equals(unit)) {
                throw new InputException(ErrorKey.BAD_OPTION_VALUE, where,
                        OPTION + ": a value in the cell's concentration unit " + unit, "'" + text + "'",
                        "Give the reporting limit in " + unit + ", or leave the unit out.");
            }
            unit = parts[1];
        }
        s.quantity(QuantityDraft.of("reporting_limit", "Reporting limit (as stated in the cell)", "RL as stated",
                List.of(StepInput.number("RL", value, unit, "notebook line " + written.get().line())), value, unit));
    }

    /**
     * The lowest standard above zero in the fit: the calibration's lower end, or, when that is a zero
     * calibrator, the next one up (an LOQ is never compared with a blank standard).
     */
    private static void lowestStandard(SectionBuilder s, CalibrationLine line, SectionResult calibration) {
        double lowest = line.lowestStandardAboveZero().orElse(Double.NaN);
        if (!Double.isFinite(lowest)) {
            s.warning("No lowest calibration standard to compare the LOQ with: calibration " + line.cellId()
                    + " has no standard above zero.");
            return;
        }
        s.quantity(QuantityDraft.of("lowest_standard", "Lowest calibration standard above zero (calibration "
                        + line.cellId() + ")", "x_low = min(x[i] > 0) of the standards in the fit",
                List.of(StepInput.number("x_low", lowest, line.xUnit(), address(calibration, lowest, line.cellId()))),
                lowest, line.xUnit()));
    }

    /** The cell that holds a standard's nominal x, from the calibration's % deviation steps. */
    private static String address(SectionResult calibration, double x, String cellId) {
        if (calibration != null) {
            for (Step step : calibration.steps()) {
                for (StepInput input : step.inputs()) {
                    if (input.name().equals("x") && input.value() == x && input.source().contains("!")) {
                        return input.source();
                    }
                }
            }
        }
        return "calibration " + cellId;
    }
}
