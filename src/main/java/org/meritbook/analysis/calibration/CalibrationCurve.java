package org.meritbook.analysis.calibration;

import java.util.OptionalDouble;
import java.util.function.DoubleBinaryOperator;
import java.util.function.DoubleUnaryOperator;
import org.meritbook.stats.regression.LineFit;
import org.meritbook.stats.regression.QuadraticFit;

/**
 * What the table, figures and back-calculation need of a fitted calibration function, whatever the
 * model: predicted response, inverse prediction, 95 % bands and standardized residuals.
 */
interface CalibrationCurve {
    double predict(double x);

    /**
     * The concentration whose predicted response is {@code y}.
     *
     * @throws IllegalArgumentException when the function does not reach {@code y} near the calibrated span
     */
    double inverse(double y);

    /**
     * The inverse where it exists; empty where it does not (the back-calculation has already said so
     * in a warning, so callers drawing figures just leave the point out).
     */
    default OptionalDouble inverseIfAny(double y) {
        try {
            return OptionalDouble.of(inverse(y));
        } catch (IllegalArgumentException e) {
            return OptionalDouble.empty();
        }
    }

    double confidenceHalfWidth(double x, double level);

    double predictionHalfWidth(double x, double level);

    /** Standardized residuals of the points in the fit, in fit order. */
    double[] standardizedResiduals();

    static CalibrationCurve of(LineFit fit) {
        return new Fitted(fit::predict, fit::inverse, fit::confidenceHalfWidth, fit::predictionHalfWidth,
                fit.standardizedResiduals());
    }

    /** A quadratic, inverted on the calibrated span [xLow, xHigh] (the root there is the physical one). */
    static CalibrationCurve of(QuadraticFit fit, double xLow, double xHigh) {
        return new Fitted(fit::predict, y -> fit.inverse(y, xLow, xHigh), fit::confidenceHalfWidth,
                fit::predictionHalfWidth, fit.standardizedResiduals());
    }

    /** Either model, as the functions the figures, table and back-calculation call. */
    record Fitted(DoubleUnaryOperator predictor, DoubleUnaryOperator inverter, DoubleBinaryOperator confidence,
                  DoubleBinaryOperator prediction, double[] residuals) implements CalibrationCurve {
        @Override
        public double predict(double x) {
            return predictor.applyAsDouble(x);
        }

        @Override
        public double inverse(double y) {
            return inverter.applyAsDouble(y);
        }

        @Override
        public double confidenceHalfWidth(double x, double level) {
            return confidence.applyAsDouble(x, level);
        }

        @Override
        public double predictionHalfWidth(double x, double level) {
            return prediction.applyAsDouble(x, level);
        }

        @Override
        public double[] standardizedResiduals() {
            return residuals.clone();
        }
    }
}
