package org.meritbook.stats.limits;

import java.util.Objects;
import org.meritbook.stats.SampleChecks;
import org.meritbook.stats.UnusableDataException;
import org.meritbook.stats.distributions.StudentT;
import org.meritbook.stats.regression.LineFit;
import org.meritbook.stats.regression.LineModel;
import org.meritbook.stats.regression.Weighting;

/**
 * The critical value x_C and the minimum detectable value x_D of a straight-line calibration,
 * from its prediction band (ISO 11843-2:2000; Hubaux &amp; Vos, Anal. Chem. 42, 849–855, 1970; from
 * memory for ISO's notation).
 *
 * <p>With ν = n − 2 residual degrees of freedom, s = s(y/x), K future replicate measurements of the
 * sample, and the variance factor of a future mean response at concentration x
 * <pre>
 *   h(x)² = 1/(w(x)·K) + 1/Σw + (x − x̄w)² / Sxx          (w ≡ 1, Σw = n unweighted)
 * </pre>
 * the limits are
 * <pre>
 *   critical response  y_C = a + t(1 − α; ν)·s·h(0)
 *   critical value     x_C = t(1 − α; ν)·s·h(0) / b
 *   unweighted:        x_D = δ·s·h(0) / b,  δ ≈ t(1 − α; ν) + t(1 − β; ν)
 *                      (ISO 11843-2's closed form: δ(ν; α; β), the non-centrality parameter of the
 *                      non-central t, approximated by the sum of the two central quantiles; for
 *                      α = β it is 2·t(1 − α; ν), so x_D = 2·x_C)
 *   weighted:          x_D solves  b·x_D − t(1 − β; ν)·s·h(x_D) = t(1 − α; ν)·s·h(0)
 * </pre>
 * In words: y_C is the upper one-sided (1 − α) prediction limit of a blank's response, so a blank
 * exceeds it with probability α; x_D is the concentration whose lower (1 − β) prediction limit
 * reaches y_C, so a sample at x_D stays below y_C with probability about β. Unweighted, the
 * variance at x_D is taken as the variance at zero (ISO's closed form). Weighted, the variance
 * changes with concentration, so x_D is found by bisection with the weight at x_D itself, as
 * Hubaux and Vos draw it (ISO 11843-2 likewise iterates when the SD depends on x); the weight at
 * zero is the one {@link ZeroWeightSource} says. Weights are the fit's, normalised to average 1.
 *
 * <p>Preconditions: a line with intercept, slope b &gt; 0, s &gt; 0, 0 &lt; α, β &lt; 0.5, K ≥ 1;
 * weighted, the lower band must rise above y_C (it does when b/SE(b) &gt; t(1 − β; ν)).
 *
 * @param alpha              α, the false-positive probability
 * @param beta               β, the false-negative probability
 * @param replicates         K
 * @param degreesOfFreedom   ν
 * @param tAlpha             t(1 − α; ν)
 * @param tBeta              t(1 − β; ν)
 * @param zeroWeightSource   where the weight of a blank came from
 * @param weightAtZero       w(0) as used (1 unweighted)
 * @param criticalResponse   y_C
 * @param criticalValue      x_C
 * @param minimumDetectable  x_D
 * @param weightAtMinimum    w(x_D) as used (1 unweighted, where ISO's form uses h(0) for x_D)
 */
public record PredictionBandLimits(double alpha, double beta, int replicates, int degreesOfFreedom, double tAlpha,
        double tBeta, ZeroWeightSource zeroWeightSource, double weightAtZero, double criticalResponse,
        double criticalValue, double minimumDetectable, double weightAtMinimum) {

    /** The default α and β of ISO 11843-2. */
    public static final double DEFAULT_PROBABILITY = 0.05;

    public PredictionBandLimits {
        Objects.requireNonNull(zeroWeightSource, "zeroWeightSource");
        requireProbability("α", alpha);
        requireProbability("β", beta);
        if (replicates < 1 || degreesOfFreedom < 1) {
            throw new IllegalArgumentException("K and ν must be at least 1, but are " + replicates + " and "
                    + degreesOfFreedom);
        }
        SampleChecks.finite("y_C", criticalResponse);
        if (!(tAlpha > 0 && tBeta > 0 && weightAtZero > 0 && weightAtMinimum > 0) || Double.isInfinite(weightAtZero)
                || Double.isInfinite(weightAtMinimum)) {
            throw new IllegalArgumentException("the t values and weights must be positive and finite");
        }
        if (!(criticalValue > 0) || !(minimumDetectable > criticalValue) || Double.isInfinite(minimumDetectable)) {
            throw new IllegalArgumentException("0 < x_C < x_D must hold, but x_C = " + criticalValue + ", x_D = "
                    + minimumDetectable);
        }
    }

    /** The limits for α = β = 0.05 and one future measurement (K = 1). */
    public static PredictionBandLimits of(LineFit fit) {
        return of(fit, DEFAULT_PROBABILITY, DEFAULT_PROBABILITY, 1);
    }

    /**
     * The limits of a fitted line.
     *
     * @param fit        a straight line with intercept, unweighted or weighted
     * @param alpha      α, in (0, 0.5)
     * @param beta       β, in (0, 0.5)
     * @param replicates K, the measurements averaged for one sample result
     * @throws UnusableDataException {@code OUT_OF_DOMAIN} for a line through the origin, when no weight
     *                               can be given to a blank, or when the lower band never reaches y_C;
     *                               {@code NON_POSITIVE_SLOPE}; {@code NO_VARIATION} for s(y/x) = 0
     */
    public static PredictionBandLimits of(LineFit fit, double alpha, double beta, int replicates) {
        Objects.requireNonNull(fit, "fit");
        requireProbability("α", alpha);
        requireProbability("β", beta);
        if (replicates < 1) {
            throw new IllegalArgumentException("K must be at least 1, but is " + replicates);
        }
        if (fit.model() != LineModel.WITH_INTERCEPT) {
            throw new UnusableDataException(UnusableDataException.Reason.OUT_OF_DOMAIN,
                    "the prediction-band limits need a line with an estimated intercept, not one through the origin");
        }
        double b = SampleChecks.positiveSlope(fit.slope());
        double s = fit.residualSd();
        if (!(s > 0)) {
            throw new UnusableDataException(UnusableDataException.Reason.NO_VARIATION,
                    "the calibration fits exactly (s(y/x) = 0), so it has no prediction band");
        }
        StudentT t = new StudentT(fit.degreesOfFreedom());
        double tA = t.quantile(1 - alpha);
        double tB = t.quantile(1 - beta);
        Band band = new Band(fit, replicates);

        ZeroWeightSource source;
        double w0;
        if (fit.weighting() == Weighting.NONE) {
            source = ZeroWeightSource.UNWEIGHTED;
            w0 = 1;
        } else {
            Double atZero = band.weightOrNull(0);
            if (atZero != null) {
                source = ZeroWeightSource.AT_ZERO;
                w0 = atZero;
            } else {
                double lowest = Double.POSITIVE_INFINITY;
                for (double x : fit.x()) {
                    lowest = Math.min(lowest, x);
                }
                Double atLowest = band.weightOrNull(lowest);
                if (atLowest == null) {
                    throw new UnusableDataException(UnusableDataException.Reason.OUT_OF_DOMAIN, "the weighting "
                            + fit.weighting().notation() + " gives no weight at zero nor at the lowest standard");
                }
                source = ZeroWeightSource.AT_LOWEST_STANDARD;
                w0 = atLowest;
            }
        }
        double rise = tA * s * band.factor(0, w0);
        double xC = rise / b;
        double xD;
        double wD;
        if (source == ZeroWeightSource.UNWEIGHTED) {
            xD = (tA + tB) * s * band.factor(0, 1) / b;
            wD = 1;
        } else {
            xD = band.solveMinimum(b, s, tB, rise, xC);
            wD = band.weightOrNull(xD);
        }
        return new PredictionBandLimits(alpha, beta, replicates, fit.degreesOfFreedom(), tA, tB, source, w0,
                fit.intercept() + rise, xC, xD, wD);
    }

    private static void requireProbability(String name, double p) {
        if (!(p > 0 && p < 0.5)) {
            throw new IllegalArgumentException(name + " must lie strictly between 0 and 0.5, but is " + p);
        }
    }

    /** The prediction band of one fit: h(x) and the weighted x_D. */
    private static final class Band {
        private static final int MAX_DOUBLINGS = 200;
        private static final int BISECTIONS = 200;

        private final LineFit fit;
        private final int replicates;
        private final double sumW;

        Band(LineFit fit, int replicates) {
            this.fit = fit;
            this.replicates = replicates;
            double sum = 0;
            for (double w : fit.weights()) {
                sum += w;
            }
            this.sumW = sum;
        }

        /** h(x) for a weight w at x. */
        double factor(double x, double w) {
            double d = x - fit.weightedMeanX();
            return Math.sqrt(1 / (w * replicates) + 1 / sumW + d * d / fit.sxx());
        }

        /** The fit's weight at x, or null where its weighting gives none (a basis x or a + b·x not positive). */
        Double weightOrNull(double x) {
            if (fit.weighting() == Weighting.NONE) {
                return 1.0;
            }
            if (fit.weighting() == Weighting.INVERSE_VARIANCE) {
                return fit.weightAt(x); // the replicate SD, interpolated, held at the lowest level's below it
            }
            double basis = "x".equals(fit.weighting().basis()) ? x : fit.predict(x);
            return basis > 0 ? fit.weightAt(x) : null;
        }

        /** The x_D > x_C where b·x − t_β·s·h(x) = rise, by doubling then bisection. */
        double solveMinimum(double b, double s, double tB, double rise, double xC) {
            double low = xC;
            double high = 2 * xC;
            int doublings = 0;
            while (gap(high, b, s, tB, rise) < 0) {
                low = high;
                high *= 2;
                if (++doublings > MAX_DOUBLINGS) {
                    throw new UnusableDataException(UnusableDataException.Reason.OUT_OF_DOMAIN,
                            "the lower prediction band never rises above the critical response: the slope is too "
                                    + "uncertain for a minimum detectable value");
                }
            }
            for (int i = 0; i < BISECTIONS && high - low > 1e-15 * high; i++) {
                double mid = 0.5 * (low + high);
                if (gap(mid, b, s, tB, rise) < 0) {
                    low = mid;
                } else {
                    high = mid;
                }
            }
            return high;
        }

        private double gap(double x, double b, double s, double tB, double rise) {
            Double w = weightOrNull(x);
            if (w == null) {
                throw new UnusableDataException(UnusableDataException.Reason.OUT_OF_DOMAIN, "the weighting "
                        + fit.weighting().notation() + " gives no weight at x = " + x + " on the way to x_D");
            }
            return b * x - tB * s * factor(x, w) - rise;
        }
    }
}
