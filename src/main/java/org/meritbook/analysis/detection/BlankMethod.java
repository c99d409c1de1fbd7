package org.meritbook.analysis.detection;

import java.util.List;
import org.meritbook.analysis.SectionBuilder.QuantityDraft;
import org.meritbook.analysis.calibration.CalibrationLine;
import org.meritbook.stats.descriptive.SampleSummary;
import org.meritbook.stats.limits.BlankLimit;
import org.meritbook.trail.StepInput;

/**
 * {@code blank}: ȳ_b + k·s_b through the calibration (k = 3, and 10 for the LOQ); blank results in
 * concentration units are not converted; without blanks the calibration's intercept and s(y/x)
 * play the blank (Miller &amp; Miller, ch. 5).
 */
final class BlankMethod {
    static final String NAME = "blank";
    static final String PROCEDURE = "Blank mean + k·s (IUPAC; Long & Winefordner 1983; Miller & Miller ch. 5)";

    private BlankMethod() {
    }

    static LimitRow record(DetectionInputs in) {
        var s = in.section();
        double k = in.options().k();
        StepInput kInput = StepInput.number("k", k, null,
                in.options().kLine() > 0 ? "notebook line " + in.options().kLine() : "default k = 3");
        StepInput tenInput = StepInput.number("k_Q", BlankLimit.QUANTITATION_K, null, "convention, k = 10 for the LOQ");
        if (in.blanks().isPresent() && in.blanksAreConcentrations()) {
            SampleSummary b = in.blankSummary(NAME);
            BlankLimit lod = BlankLimit.fromConcentrations(b, k);
            BlankLimit loq = BlankLimit.fromConcentrations(b, BlankLimit.QUANTITATION_K);
            String unit = in.blanks().get().unit();
            List<StepInput> common = List.of(s.ref("ȳ_b", s.stepId("blank_mean")), s.ref("s_b", s.stepId("blank_sd")));
            s.quantity(QuantityDraft.of("lod:blank", "LOD from the blank results (no conversion: results)",
                    "LOD = ȳ_b + k·s_b", DetectionInputs.concat(common, List.of(kInput)), lod.concentration(), unit)
                    .withMethod(PROCEDURE));
            s.quantity(QuantityDraft.of("loq:blank", "LOQ from the blank results", "LOQ = ȳ_b + 10·s_b",
                    DetectionInputs.concat(common, List.of(tenInput)), loq.concentration(), unit).withMethod(PROCEDURE));
            in.mark("blank: ȳ_b + k·s_b (LOD)", lod.concentration(), unit, true);
            return new LimitRow(NAME, unit, b.n() + " blank results", PROCEDURE, true, false);
        }
        CalibrationLine line = in.calibration(NAME);
        StepInput a = in.fromCalibration("a", "intercept");
        StepInput slope = in.fromCalibration("b", "slope");
        if (in.blanks().isEmpty()) {
            BlankLimit lod = BlankLimit.fromCalibration(line.fit(), k);
            BlankLimit loq = BlankLimit.fromCalibration(line.fit(), BlankLimit.QUANTITATION_K);
            StepInput syx = in.fromCalibration("s(y/x)", "residual_sd");
            s.quantity(QuantityDraft.of("lod:blank", "LOD with the calibration as the blank (ȳ_b = a, s_b = s(y/x))",
                    "LOD = (a + k·s(y/x) − a) / b = k·s(y/x) / b", List.of(a, syx, slope, kInput), lod.concentration(),
                    line.xUnit()).withMethod(PROCEDURE));
            s.quantity(QuantityDraft.of("loq:blank", "LOQ with the calibration as the blank",
                    "LOQ = 10·s(y/x) / b", List.of(a, syx, slope, tenInput), loq.concentration(), line.xUnit())
                    .withMethod(PROCEDURE));
            if (line.fit().weighting() != org.meritbook.stats.regression.Weighting.NONE) {
                in.section().warning("Method blank: with no blanks measured, s(y/x) of the "
                        + line.fit().weighting().notation() + "-weighted calibration plays the blank SD; it is the SD "
                        + "of a response of weight 1, not of a blank. Measure blanks for a blank-based limit.");
            }
            in.mark("LOD, blank", lod.concentration(), line.xUnit(), false);
            return new LimitRow(NAME, line.xUnit(), "calibration " + line.cellId() + ": intercept and s(y/x)",
                    PROCEDURE, true, false);
        }
        MeasuredSet blanks = in.blanks().get();
        if (line.yUnit() != null && blanks.unit() != null && !line.yUnit().equals(blanks.unit())) {
            in.section().warning("The blank signals are in " + blanks.unit() + " but the calibration's responses in "
                    + line.yUnit() + ": the blank method assumes they are the same response.");
        }
        SampleSummary b = in.blankSummary(NAME);
        BlankLimit lod = BlankLimit.fromSignals(b, k, line.fit());
        BlankLimit loq = BlankLimit.fromSignals(b, BlankLimit.QUANTITATION_K, line.fit());
        StepInput mean = s.ref("ȳ_b", s.stepId("blank_mean"));
        StepInput sd = s.ref("s_b", s.stepId("blank_sd"));
        String lodLevel = s.step("blank_level_lod", "Blank signal level for the LOD", "y_L = ȳ_b + k·s_b",
                List.of(mean, sd, kInput), lod.level(), blanks.unit(), null);
        String loqLevel = s.step("blank_level_loq", "Blank signal level for the LOQ", "y_Q = ȳ_b + 10·s_b",
                List.of(mean, sd, tenInput), loq.level(), blanks.unit(), null);
        s.quantity(QuantityDraft.of("lod:blank", "LOD from the blank signals through the calibration",
                "LOD = (y_L − a) / b", List.of(s.ref("y_L", lodLevel), a, slope), lod.concentration(), line.xUnit())
                .withMethod(PROCEDURE));
        s.quantity(QuantityDraft.of("loq:blank", "LOQ from the blank signals through the calibration",
                "LOQ = (y_Q − a) / b", List.of(s.ref("y_Q", loqLevel), a, slope), loq.concentration(), line.xUnit())
                .withMethod(PROCEDURE));
        in.mark("blank: y_L = ȳ_b + k·s_b", lod.level(), blanks.unit(), true);
        in.mark("LOD, blank", lod.concentration(), line.xUnit(), false);
        return new LimitRow(NAME, line.xUnit(), b.n() + " blank signals through calibration " + line.cellId(),
                PROCEDURE, true, false);
    }
}
