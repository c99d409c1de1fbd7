package org.meritbook.stats.regression;

import java.util.Objects;
import org.meritbook.stats.Interval;
import org.meritbook.stats.SampleChecks;
import org.meritbook.stats.UnusableDataException;
import org.meritbook.stats.descriptive.Moments;
import org.meritbook.stats.distributions.StudentT;

/**
 * A concentration read back from a calibration line (inverse prediction), with its standard error
 * and confidence interval: the unknowns and QC samples of a validation.
 *
 * <p>Formulas, for m replicate readings with mean ȳ₀ of a sample, on a line fitted to n standards
 * (Miller &amp; Miller, <i>Statistics and Chemometrics for Analytical Chemistry</i>, ch. 5, eq. 5.9
 * and its weighted form; Draper &amp; Smith, ch. 3.2; ISO 8466-1):
 * <pre>
 *   x₀ = (ȳ₀ − a) / b
 *   unweighted:   s(x₀) = (s(y/x)/|b|) · √( 1/m + 1/n + (ȳ₀ − ȳ)² / (b²·Σ(xᵢ − x̄)²) )
 *   weighted:     s(x₀) = (s(y/x)/|b|) · √( 1/(w₀·m) + 1/Σw + (ȳ₀ − ȳw)² / (b²·(Σwᵢxᵢ² − n·x̄w²)) )
 *   through the origin:  s(x₀) = (s(y/x)/|b|) · √( 1/(w₀·m) + ȳ₀² / (b²·Σwᵢxᵢ²) )
 *   interval:     x₀ ± t(1 − α/2; n − p)·s(x₀)        p = 2 (1 through the origin)
 * </pre>
 * The weights are the fit's, normalised to average 1 (so Σw = n and Σwᵢxᵢ² − n·x̄w² = Σwᵢ(xᵢ − x̄w)²,
 * the form Miller &amp; Miller print), and w₀ is the weight the fit's weighting gives at x₀ on that
 * scale ({@link LineFit#weightAt}; for 1/y weighting the predicted response at x₀, which is ȳ₀). The
 * expression is the first-order (delta-method) variance of (ȳ₀ − a)/b; it is adequate while
 * g = t²·s²/(b²·Sxx) is small (below about 0.05, Miller &amp; Miller), i.e. the slope is well
 * determined. Preconditions: a non-zero slope, m ≥ 1 finite readings, and for a weighted fit a
 * reading whose x₀ the weighting can weigh (x₀ &gt; 0 under 1/x, 1/x²).
 *
 * @param meanResponse     ȳ₀, the mean of the m readings
 * @param replicates       m
 * @param x0               the concentration read back
 * @param weightAtX0       w₀ (1 for an unweighted fit)
 * @param standardError    s(x₀)
 * @param degreesOfFreedom the fit's residual degrees of freedom, n − p
 */
public record InversePrediction(double meanResponse, int replicates, double x0, double weightAtX0,
        double standardError, int degreesOfFreedom) {

    public InversePrediction {
        SampleChecks.finite("the mean response", meanResponse);
        SampleChecks.finite("x₀", x0);
        if (replicates < 1 || degreesOfFreedom < 1) {
            throw new IllegalArgumentException("replicates and degrees of freedom must be at least 1, but are "
                    + replicates + " and " + degreesOfFreedom);
        }
        if (!(weightAtX0 > 0) || Double.isInfinite(weightAtX0) || !(standardError >= 0)
                || Double.isInfinite(standardError)) {
            throw new IllegalArgumentException("w₀ must be positive and s(x₀) not negative, both finite, but are "
                    + weightAtX0 + " and " + standardError);
        }
    }

    /**
     * Reads back the mean of replicate readings.
     *
     * @param fit       the calibration line
     * @param responses the sample's readings, at least one, finite
     * @throws UnusableDataException {@code TOO_FEW_VALUES}, {@code NOT_FINITE}, {@code ZERO_SLOPE}, or
     *                               {@code OUT_OF_DOMAIN} when the weighting gives no weight at x₀
     */
    public static InversePrediction of(LineFit fit, double[] responses) {
        double[] r = SampleChecks.finiteCopy("the sample's readings", responses, 1);
        return of(fit, Moments.mean(r), r.length);
    }

    /**
     * Reads back a mean response of {@code replicates} readings.
     *
     * @throws UnusableDataException as {@link #of(LineFit, double[])}
     */
    public static InversePrediction of(LineFit fit, double meanResponse, int replicates) {
        Objects.requireNonNull(fit, "fit");
        SampleChecks.finite("the mean response", meanResponse);
        if (replicates < 1) {
            throw new UnusableDataException(UnusableDataException.Reason.TOO_FEW_VALUES,
                    "a concentration needs at least 1 reading, but there are " + replicates);
        }
        double b = fit.slope();
        if (b == 0) {
            throw new UnusableDataException(UnusableDataException.Reason.ZERO_SLOPE,
                    "the calibration slope is 0, so no concentration corresponds to a response");
        }
        double x0 = (meanResponse - fit.intercept()) / b;
        double w0;
        try {
            w0 = fit.weightAt(x0);
        } catch (IllegalArgumentException e) {
            throw new UnusableDataException(UnusableDataException.Reason.OUT_OF_DOMAIN, "the weighting "
                    + fit.weighting().notation() + " gives no weight at the concentration read back, x₀ = " + x0, e);
        }
        double factor = 1 / (w0 * replicates);
        if (fit.model() == LineModel.WITH_INTERCEPT) {
            double sumW = 0;
            for (double w : fit.weights()) {
                sumW += w;
            }
            double d = meanResponse - fit.weightedMeanY();
            factor += 1 / sumW + d * d / (b * b * fit.sxx());
        } else {
            factor += meanResponse * meanResponse / (b * b * fit.sxx());
        }
        double se = fit.residualSd() / Math.abs(b) * Math.sqrt(factor);
        return new InversePrediction(meanResponse, replicates, x0, w0, se, fit.degreesOfFreedom());
    }

    /** The two-sided t interval x₀ ± t(1 − α/2; df)·s(x₀). */
    public Interval interval(double level) {
        double half = new StudentT(degreesOfFreedom).twoSidedQuantile(level) * standardError;
        return new Interval(x0 - half, x0 + half, level);
    }
}
