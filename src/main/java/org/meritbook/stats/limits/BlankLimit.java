package org.meritbook.stats.limits;

import java.util.Objects;
import org.meritbook.stats.SampleChecks;
import org.meritbook.stats.UnusableDataException;
import org.meritbook.stats.descriptive.SampleSummary;
import org.meritbook.stats.regression.LineFit;
import org.meritbook.stats.regression.LineModel;

/**
 * A limit from the blank: the level ȳ_b + k·s_b, read through the calibration line as a
 * concentration.
 *
 * <p>Formulas (IUPAC, Long &amp; Winefordner, Anal. Chem. 55, 712A, 1983; Miller &amp; Miller, ch. 5):
 * <pre>
 *   level y_L = ȳ_b + k·s_b              k = 3 for detection, 10 for quantitation (by convention)
 *   limit x_L = (y_L − a) / b            (no conversion when the blanks are concentrations)
 *   calibration as the blank:  ȳ_b = a, s_b = s(y/x), so x_L = k·s(y/x) / b
 * </pre>
 * Preconditions: blank SD &gt; 0 (a zero spread gives no limit), slope b &gt; 0, and a level above
 * the intercept so that the limit is positive. k is a convention, not a probability: it implies a
 * false-positive rate only under assumptions (normal blanks, known σ) the method does not check.
 *
 * @param basis         what played the blank
 * @param blankMean     ȳ_b (the intercept under {@link BlankBasis#CALIBRATION_INTERCEPT})
 * @param blankSd       s_b (s(y/x) under {@link BlankBasis#CALIBRATION_INTERCEPT})
 * @param blankCount    the number of blank results (of calibration points for the intercept basis)
 * @param k             the multiplier
 * @param level         ȳ_b + k·s_b, in the blank's units
 * @param intercept     a (0 for blank concentrations)
 * @param slope         b (1 for blank concentrations: no conversion)
 * @param concentration the limit, (level − a)/b
 */
public record BlankLimit(BlankBasis basis, double blankMean, double blankSd, int blankCount, double k,
        double level, double intercept, double slope, double concentration) {

    /** The conventional multiplier for a detection limit. */
    public static final double DETECTION_K = 3;
    /** The conventional multiplier for a quantitation limit. */
    public static final double QUANTITATION_K = 10;

    public BlankLimit {
        Objects.requireNonNull(basis, "basis");
        SampleChecks.finite("the blank mean", blankMean);
        SampleChecks.finite("the intercept", intercept);
        if (!(blankSd > 0) || Double.isInfinite(blankSd) || !(k > 0) || Double.isInfinite(k) || blankCount < 2) {
            throw new IllegalArgumentException("blank SD and k must be positive and there must be 2 or more blanks, but "
                    + blankSd + ", " + k + ", " + blankCount);
        }
        SampleChecks.positiveSlope(slope);
        if (basis == BlankBasis.BLANK_CONCENTRATIONS && (intercept != 0 || slope != 1)) {
            throw new IllegalArgumentException("blank concentrations are not converted: intercept 0 and slope 1");
        }
        if (!(concentration > 0) || Double.isInfinite(concentration)) {
            throw new IllegalArgumentException("the limit must be positive and finite, but is " + concentration);
        }
    }

    /**
     * From measured blank signals and a calibration line y = a + b·x.
     *
     * @throws UnusableDataException {@code NO_VARIATION} for equal blanks, {@code NON_POSITIVE_SLOPE},
     *                               or {@code OUT_OF_DOMAIN} when the level does not exceed the intercept
     */
    public static BlankLimit fromSignals(SampleSummary blanks, double k, double intercept, double slope) {
        Objects.requireNonNull(blanks, "blanks");
        return build(BlankBasis.BLANK_SIGNALS, blanks.mean(), requireSpread(blanks), blanks.n(), k,
                SampleChecks.finite("the intercept", intercept), SampleChecks.positiveSlope(slope));
    }

    /** From measured blank signals and a fitted line (its intercept and slope). */
    public static BlankLimit fromSignals(SampleSummary blanks, double k, LineFit fit) {
        return fromSignals(blanks, k, fit.intercept(), fit.slope());
    }

    /**
     * From blank results already in concentration units.
     *
     * @throws UnusableDataException {@code NO_VARIATION} for equal blanks, {@code OUT_OF_DOMAIN} when
     *                               ȳ_b + k·s_b is not positive
     */
    public static BlankLimit fromConcentrations(SampleSummary blanks, double k) {
        Objects.requireNonNull(blanks, "blanks");
        return build(BlankBasis.BLANK_CONCENTRATIONS, blanks.mean(), requireSpread(blanks), blanks.n(), k, 0, 1);
    }

    /**
     * The calibration as the blank: ȳ_b = a, s_b = s(y/x) (Miller &amp; Miller's treatment).
     *
     * @throws UnusableDataException {@code OUT_OF_DOMAIN} for a line through the origin (no intercept
     *                               estimated), {@code NO_VARIATION} for a perfect fit (s(y/x) = 0),
     *                               {@code NON_POSITIVE_SLOPE}
     */
    public static BlankLimit fromCalibration(LineFit fit, double k) {
        Objects.requireNonNull(fit, "fit");
        if (fit.model() != LineModel.WITH_INTERCEPT) {
            throw new UnusableDataException(UnusableDataException.Reason.OUT_OF_DOMAIN,
                    "a line through the origin estimates no intercept to play the blank");
        }
        if (!(fit.residualSd() > 0)) {
            throw new UnusableDataException(UnusableDataException.Reason.NO_VARIATION,
                    "the calibration fits exactly (s(y/x) = 0), so it gives no blank SD");
        }
        return build(BlankBasis.CALIBRATION_INTERCEPT, fit.intercept(), fit.residualSd(), fit.n(), k, fit.intercept(),
                SampleChecks.positiveSlope(fit.slope()));
    }

    private static BlankLimit build(BlankBasis basis, double mean, double sd, int n, double k, double a, double b) {
        if (!(k > 0) || Double.isInfinite(k)) {
            throw new IllegalArgumentException("k must be positive, but is " + k);
        }
        double level = mean + k * sd;
        double x = (level - a) / b;
        if (!(x > 0)) {
            throw new UnusableDataException(UnusableDataException.Reason.OUT_OF_DOMAIN, "the blank level ȳ_b + k·s_b = "
                    + level + " does not exceed the calibration intercept " + a + ", so the limit would not be positive");
        }
        return new BlankLimit(basis, mean, sd, n, k, level, a, b, x);
    }

    private static double requireSpread(SampleSummary blanks) {
        if (!(blanks.sd() > 0)) {
            throw new UnusableDataException(UnusableDataException.Reason.NO_VARIATION,
                    "all " + blanks.n() + " blank results are equal, so their SD is 0 and gives no limit");
        }
        return blanks.sd();
    }
}
