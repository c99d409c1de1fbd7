package org.meritbook.stats.limits;

import java.util.Objects;
import org.meritbook.stats.SampleChecks;
import org.meritbook.stats.UnusableDataException;
import org.meritbook.stats.descriptive.SampleSummary;
import org.meritbook.stats.regression.LineFit;
import org.meritbook.stats.regression.LineModel;

/**
 * ICH Q2 limits from the SD of the response and the slope.
 *
 * <p>Formulas (ICH Q2(R1), 2005, and Q2(R2), 2023: the approach "based on the standard deviation of
 * the response and the slope", from memory):
 * <pre>
 *   LOD = 3.3·σ / S        LOQ = 10·σ / S
 * </pre>
 * S the calibration slope, σ from the blank SD, the residual SD s(y/x) of the line, or the SE of its
 * intercept ({@link SigmaSource}). With a weighted line, s(y/x) and SE(a) are on the scale of the
 * weights (here normalised to average 1): s(y/x) is then the SD of a response of weight 1, not of a
 * response near zero, and the caller must say so. Preconditions: σ &gt; 0, S &gt; 0.
 *
 * @param source where σ came from
 * @param sigma  σ
 * @param slope  S
 * @param lod    3.3·σ/S
 * @param loq    10·σ/S
 */
public record ResponseSdLimit(SigmaSource source, double sigma, double slope, double lod, double loq) {
    /** ICH Q2's factor for detection (≈ 2 × 1.645, rounded). */
    public static final double DETECTION_FACTOR = 3.3;
    /** ICH Q2's factor for quantitation. */
    public static final double QUANTITATION_FACTOR = 10;

    public ResponseSdLimit {
        Objects.requireNonNull(source, "source");
        if (!(sigma > 0) || Double.isInfinite(sigma)) {
            throw new IllegalArgumentException("σ must be positive, but is " + sigma);
        }
        SampleChecks.positiveSlope(slope);
        if (lod != DETECTION_FACTOR * sigma / slope || loq != QUANTITATION_FACTOR * sigma / slope) {
            throw new IllegalArgumentException("LOD and LOQ must be 3.3·σ/S and 10·σ/S");
        }
    }

    /** From the SD of blank responses and the slope. */
    public static ResponseSdLimit fromBlankSd(SampleSummary blanks, double slope) {
        Objects.requireNonNull(blanks, "blanks");
        return of(SigmaSource.BLANK_SD, blanks.sd(), slope, "all " + blanks.n() + " blank responses are equal");
    }

    /** From the residual SD s(y/x) of a fitted line. */
    public static ResponseSdLimit fromResidualSd(LineFit fit) {
        return of(SigmaSource.RESIDUAL_SD, fit.residualSd(), fit.slope(), "the calibration fits exactly (s(y/x) = 0)");
    }

    /**
     * From the standard error of a fitted line's intercept.
     *
     * @throws UnusableDataException {@code OUT_OF_DOMAIN} for a line through the origin
     */
    public static ResponseSdLimit fromInterceptSe(LineFit fit) {
        if (fit.model() != LineModel.WITH_INTERCEPT) {
            throw new UnusableDataException(UnusableDataException.Reason.OUT_OF_DOMAIN,
                    "a line through the origin has no intercept, so no intercept SE to take σ from");
        }
        return of(SigmaSource.INTERCEPT_SE, fit.interceptSe(), fit.slope(), "the calibration fits exactly (SE(a) = 0)");
    }

    private static ResponseSdLimit of(SigmaSource source, double sigma, double slope, String whyNoSpread) {
        SampleChecks.positiveSlope(slope);
        if (!(sigma > 0)) {
            throw new UnusableDataException(UnusableDataException.Reason.NO_VARIATION, whyNoSpread + ", so σ = 0 gives no limit");
        }
        return new ResponseSdLimit(source, sigma, slope, DETECTION_FACTOR * sigma / slope, QUANTITATION_FACTOR * sigma / slope);
    }
}
