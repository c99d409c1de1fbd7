package org.meritbook.analysis.accuracy;

import java.util.ArrayList;
import java.util.List;
import org.meritbook.analysis.AnalysisContext;
import org.meritbook.analysis.SectionBuilder;
import org.meritbook.analysis.SectionBuilder.QuantityDraft;
import org.meritbook.analysis.SectionResult;
import org.meritbook.analysis.calibration.CalibrationLine;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.stats.regression.LineModel;
import org.meritbook.study.AnalysisCell;
import org.meritbook.trail.StepInput;

/**
 * Measured signals read back as concentrations through an earlier straight-line calibration,
 * x = (y − a) / b, with the calibration's slope and intercept as trail inputs linked to its steps.
 *
 * @param line        the calibration's line
 * @param calibration the calibration's section
 */
record ReadBack(CalibrationLine line, SectionResult calibration) {

    static ReadBack of(AnalysisCell cell, AnalysisContext context) {
        CalibrationLine line = context.earlier(cell, "calibration", CalibrationLine.class, CalibrationLine.DESCRIPTION);
        if (line.fit().slope() == 0) {
            throw new InputException(ErrorKey.ZERO_VARIANCE, context.where(cell.lineOf("calibration")),
                    "a calibration with a non-zero slope to read signals back through",
                    "the slope of '" + line.cellId() + "' is 0", "Check the calibration cell and its data.");
        }
        if (line.ratio()) {
            // Plain signals read back through a line fitted to ratios would be on another scale.
            throw new InputException(ErrorKey.BAD_OPTION_VALUE, context.where(cell.lineOf("calibration")),
                    "a calibration on plain responses to read the measured signals back through",
                    "'" + line.cellId() + "' calibrates the ratio to its internal standard ('" + line.internalStandard()
                            + "')", "Give the measured values as concentrations, or read the samples back in an "
                            + "unknowns cell with internal-standard:.");
        }
        return new ReadBack(line, context.earlierSection(cell, "calibration"));
    }

    boolean throughOrigin() {
        return line.fit().model() == LineModel.THROUGH_ORIGIN;
    }

    double concentration(double signal) {
        return line.fit().inverse(signal);
    }

    String formula() {
        return throughOrigin() ? "x = y / b" : "x = (y − a) / b";
    }

    /** The calibration's slope (and intercept) as inputs linked to the calibration's own steps. */
    List<StepInput> lineInputs() {
        List<StepInput> inputs = new ArrayList<>();
        if (!throughOrigin()) {
            inputs.add(SectionBuilder.fromEarlier("a", CalibrationLine.quantity(calibration, "intercept")));
        }
        inputs.add(SectionBuilder.fromEarlier("b", CalibrationLine.quantity(calibration, "slope")));
        return inputs;
    }

    /** Records one reading as the reported quantity {@code read_back:<label>}; returns its step id. */
    String recordQuantity(SectionBuilder section, String label, String what, StepInput signal) {
        List<StepInput> inputs = new ArrayList<>(List.of(signal));
        inputs.addAll(lineInputs());
        return section.quantity(QuantityDraft.of("read_back:" + label, what + " read back through calibration '"
                + line.cellId() + "'", formula(), inputs, concentration(signal.value()), line.xUnit())
                .withMethod("inverse of the calibration line"));
    }

    /** Records one reading as an intermediate step (an unspiked portion's signal); returns its step id. */
    String recordStep(SectionBuilder section, String name, String what, StepInput signal) {
        List<StepInput> inputs = new ArrayList<>(List.of(signal));
        inputs.addAll(lineInputs());
        return section.step(name, what + " read back through calibration '" + line.cellId() + "'", formula(), inputs,
                concentration(signal.value()), line.xUnit(), "inverse of the calibration line");
    }
}
