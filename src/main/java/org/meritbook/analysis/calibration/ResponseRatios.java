package org.meritbook.analysis.calibration;

import org.meritbook.analysis.InternalStandard;
import org.meritbook.analysis.SectionBuilder;

/**
 * The internal-standard ratios of a calibration as trail steps: one per point whose ratio exists
 * (every point in the fit, and excluded points whose cells allow one), recorded before the fit so
 * that every later step cites the ratio rather than the raw response cell.
 */
final class ResponseRatios {
    private ResponseRatios() {
    }

    static void record(SectionBuilder section, CalibrationData data) {
        if (!data.ratio()) {
            return;
        }
        for (CalibrationPoint p : data.points()) {
            if (Double.isFinite(p.y()) && p.yCell().isNumber()) {
                InternalStandard.record(section, p.label(), p.yCell(), data.yColumn().unit(), p.isCell(),
                        data.isColumns().get(0).unit());
            }
        }
    }

    /** Where a point's response comes from: its cell, or the step of its ratio. */
    static String source(SectionBuilder section, CalibrationPoint p) {
        return p.isCell() == null ? p.yCell().ref().address() : section.stepId(InternalStandard.stepName(p.label()));
    }
}
