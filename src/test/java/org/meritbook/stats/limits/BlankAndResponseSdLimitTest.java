package org.meritbook.stats.limits;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.meritbook.stats.UnusableDataException;
import org.meritbook.stats.descriptive.SampleSummary;
import org.meritbook.stats.regression.LeastSquares;
import org.meritbook.stats.regression.LineFit;
import org.meritbook.stats.regression.LineModel;
import org.meritbook.stats.regression.Weighting;

class BlankAndResponseSdLimitTest {

    // Miller & Miller's fluorescence calibration (ch. 5), as in stats.regression.HandbookExampleTest.
    private static final LineFit FLUORESCENCE = LeastSquares.fitLine(new double[] {0, 2, 4, 6, 8, 10, 12},
            new double[] {2.1, 5.0, 9.0, 12.6, 17.3, 21.0, 24.7}, Weighting.NONE, LineModel.WITH_INTERCEPT);

    // Source: Miller & Miller, ch. 5, the detection limit of the fluorescence calibration (from memory):
    // the intercept a = 1.52 plays the blank signal and s(y/x) = 0.4329 its SD, so y_B + 3s_B = 2.82, which
    // the line converts to 0.67 pg/mL.
    @Test
    void calibrationAsTheBlankGivesTheHandbookLimit() {
        BlankLimit lod = BlankLimit.fromCalibration(FLUORESCENCE, BlankLimit.DETECTION_K);
        assertEquals(BlankBasis.CALIBRATION_INTERCEPT, lod.basis());
        assertEquals(2.82, lod.level(), 0.005);
        assertEquals(0.67, lod.concentration(), 0.005);
        // Exactly k·s(y/x)/b when the intercept is the blank.
        assertEquals(3 * FLUORESCENCE.residualSd() / FLUORESCENCE.slope(), lod.concentration(), 1e-14);
        assertEquals(7, lod.blankCount());
    }

    // Source: hand arithmetic: blanks 1.8, 2.0, 1.7, 1.9, 2.1, 1.9 (mean 1.9, Σd² = 0.10, s = √0.02 = 0.141421);
    // level = 1.9 + 3·0.141421 = 2.324264; through a = 1.517857, b = 1.930357: (2.324264 − 1.517857)/1.930357
    // = 0.417750; with k = 10 the level is 3.314214 and the limit 0.930582.
    @Test
    void measuredBlankSignalsThroughTheLine() {
        SampleSummary blanks = SampleSummary.of(new double[] {1.8, 2.0, 1.7, 1.9, 2.1, 1.9});
        BlankLimit lod = BlankLimit.fromSignals(blanks, 3, FLUORESCENCE);
        assertEquals(2.324264, lod.level(), 5e-7);
        assertEquals(0.417750, lod.concentration(), 5e-7);
        BlankLimit loq = BlankLimit.fromSignals(blanks, BlankLimit.QUANTITATION_K, FLUORESCENCE);
        assertEquals(3.314214, loq.level(), 5e-7);
        assertEquals(0.930582, loq.concentration(), 5e-7);
        // Blank results in concentration units are not converted.
        BlankLimit direct = BlankLimit.fromConcentrations(blanks, 3);
        assertEquals(direct.level(), direct.concentration());
        assertEquals(BlankBasis.BLANK_CONCENTRATIONS, direct.basis());
    }

    // Source: hand arithmetic with ICH Q2's formulas on the fluorescence line: s(y/x) = 0.432848,
    // SE(a) = 0.294936, b = 1.930357: 3.3·0.432848/b = 0.739965, 10·0.432848/b = 2.242319,
    // 3.3·0.294936/b = 0.504201.
    @Test
    void ichQ2LimitsFromTheResponseSdAndSlope() {
        ResponseSdLimit residual = ResponseSdLimit.fromResidualSd(FLUORESCENCE);
        assertEquals(SigmaSource.RESIDUAL_SD, residual.source());
        assertEquals(0.739965, residual.lod(), 5e-7);
        assertEquals(2.242319, residual.loq(), 5e-7);
        assertEquals(0.504201, ResponseSdLimit.fromInterceptSe(FLUORESCENCE).lod(), 5e-7);
        ResponseSdLimit blank = ResponseSdLimit.fromBlankSd(SampleSummary.of(new double[] {1.8, 2.0, 1.7, 1.9, 2.1, 1.9}),
                2.0);
        assertEquals(3.3 * Math.sqrt(0.02) / 2, blank.lod(), 1e-15);
    }

    @Test
    void limitsTheDataCannotSupportSayWhy() {
        SampleSummary equal = SampleSummary.of(new double[] {2, 2, 2});
        assertEquals(UnusableDataException.Reason.NO_VARIATION, assertThrows(UnusableDataException.class,
                () -> BlankLimit.fromSignals(equal, 3, FLUORESCENCE)).reason());
        SampleSummary blanks = SampleSummary.of(new double[] {1.8, 2.0, 1.7});
        assertEquals(UnusableDataException.Reason.NON_POSITIVE_SLOPE, assertThrows(UnusableDataException.class,
                () -> BlankLimit.fromSignals(blanks, 3, 0.1, -2)).reason());
        UnusableDataException below = assertThrows(UnusableDataException.class,
                () -> BlankLimit.fromSignals(blanks, 3, 5.0, 2));
        assertEquals(UnusableDataException.Reason.OUT_OF_DOMAIN, below.reason());
        LineFit origin = LeastSquares.fitLine(new double[] {1, 2, 3}, new double[] {2.1, 3.9, 6.2}, Weighting.NONE,
                LineModel.THROUGH_ORIGIN);
        assertEquals(UnusableDataException.Reason.OUT_OF_DOMAIN, assertThrows(UnusableDataException.class,
                () -> ResponseSdLimit.fromInterceptSe(origin)).reason());
        assertEquals(UnusableDataException.Reason.OUT_OF_DOMAIN, assertThrows(UnusableDataException.class,
                () -> BlankLimit.fromCalibration(origin, 3)).reason());
        LineFit falling = LeastSquares.fitLine(new double[] {1, 2, 3}, new double[] {6.1, 4.0, 1.9}, Weighting.NONE,
                LineModel.WITH_INTERCEPT);
        assertEquals(UnusableDataException.Reason.NON_POSITIVE_SLOPE, assertThrows(UnusableDataException.class,
                () -> ResponseSdLimit.fromResidualSd(falling)).reason());
    }
}
