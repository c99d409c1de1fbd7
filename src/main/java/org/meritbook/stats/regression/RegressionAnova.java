package org.meritbook.stats.regression;

import java.util.Objects;
import java.util.Optional;
import org.apache.commons.math3.special.Beta;

/**
 * The analysis of variance of a (weighted) least-squares calibration, on the weights the fit used
 * (normalised to average 1, so the sums of squares are in squared response units of an average point):
 * <pre>
 *   SSreg = Σw(ŷ − ȳw)²   df = p − 1        (through the origin: Σw·ŷ², df = p)
 *   SSres = Σw(y − ŷ)²    df = n − p
 *   SStot = Σw(y − ȳw)²   df = n − 1        (through the origin: Σw·y², df = n)
 *   MS = SS/df   F = MSreg/MSres   p = P(F(df_reg, df_res) ≥ F)
 * </pre>
 * SSreg is formed from the fitted values, not as SStot − SSres, so it does not cancel for a close fit;
 * SSreg + SSres = SStot holds for least squares up to rounding. With replicated levels the residual
 * row splits into lack of fit and pure error ({@link LackOfFit}). The p-value is the regularised
 * incomplete beta (Apache Commons Math). References: Draper &amp; Smith, <i>Applied Regression
 * Analysis</i>, 3rd ed., §1.3 (the ANOVA table), §2.1 (lack of fit), ch. 9 (weighted).
 *
 * @param regressionDf df of the regression row
 * @param residualDf   df of the residual row
 * @param ssRegression regression sum of squares
 * @param ssResidual   residual sum of squares
 * @param ssTotal      total sum of squares (centred, or uncentred through the origin)
 * @param f            MSreg / MSres
 * @param p            upper tail of F(regressionDf, residualDf) at f
 * @param lackOfFit    the split of the residual row, when levels are replicated and scatter
 */
public record RegressionAnova(int regressionDf, int residualDf, double ssRegression, double ssResidual,
        double ssTotal, double f, double p, Optional<LackOfFit> lackOfFit) {

    public RegressionAnova {
        Objects.requireNonNull(lackOfFit, "lackOfFit");
        if (regressionDf < 1 || residualDf < 1) {
            throw new IllegalArgumentException("the ANOVA needs at least 1 df for regression and residual, but has "
                    + regressionDf + " and " + residualDf);
        }
        if (!(ssRegression >= 0 && ssResidual >= 0 && ssTotal > 0) || Double.isInfinite(ssTotal)) {
            throw new IllegalArgumentException("sums of squares must be finite and not negative (total positive), but are "
                    + ssRegression + ", " + ssResidual + ", " + ssTotal);
        }
    }

    /** Total df: regression plus residual. */
    public int totalDf() {
        return regressionDf + residualDf;
    }

    public double msRegression() {
        return ssRegression / regressionDf;
    }

    public double msResidual() {
        return ssResidual / residualDf;
    }

    /**
     * The table of a fitted model.
     *
     * @param y          responses
     * @param weights    the fit's weights (all 1 unweighted)
     * @param fitted     the fitted values
     * @param x          concentrations, for the lack-of-fit split
     * @param parameters p, the parameters the model estimated
     * @param centred    false through the origin
     * @return the table, or empty when the residual sum of squares is 0 (F has no finite value)
     */
    public static Optional<RegressionAnova> of(double[] x, double[] y, double[] weights, double[] fitted,
                                               int parameters, boolean centred) {
        int n = y.length;
        double sumW = 0;
        for (double w : weights) {
            sumW += w;
        }
        double meanY = centred ? WeightedMean.of(y, weights, sumW) : 0;
        double ssReg = 0;
        double ssRes = 0;
        double ssTot = 0;
        for (int i = 0; i < n; i++) {
            double dr = fitted[i] - meanY;
            double de = y[i] - fitted[i];
            double dt = y[i] - meanY;
            ssReg += weights[i] * dr * dr;
            ssRes += weights[i] * de * de;
            ssTot += weights[i] * dt * dt;
        }
        int dfReg = centred ? parameters - 1 : parameters;
        int dfRes = n - parameters;
        if (!(ssRes > 0) || dfReg < 1 || dfRes < 1) {
            return Optional.empty();
        }
        double f = (ssReg / dfReg) / (ssRes / dfRes);
        double p = Beta.regularizedBeta(dfRes / (dfRes + dfReg * f), dfRes / 2.0, dfReg / 2.0);
        return Optional.of(new RegressionAnova(dfReg, dfRes, ssReg, ssRes, ssTot, f, p,
                LackOfFit.of(x, y, weights, fitted, parameters)));
    }

    /** The table of a straight-line fit. */
    public static Optional<RegressionAnova> of(LineFit fit) {
        return of(fit.x(), fit.y(), fit.weights(), fit.fitted(), fit.model().parameterCount(),
                fit.model() == LineModel.WITH_INTERCEPT);
    }
}
