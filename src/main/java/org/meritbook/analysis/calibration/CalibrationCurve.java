package org.meritbook.analysis.calibration;

import java.util.OptionalDouble;
import org.meritbook.stats.LineFit;
import org.meritbook.stats.QuadraticFit;

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
        return new CalibrationCurve() {
            @Override
            public double predict(double x) {
                return fit.predict(x);
            }

            @Override
            public double inverse(double y) {
                return fit.inverse(y);
            }

            @Override
            public double confidenceHalfWidth(double x, double level) {
                return fit.confidenceHalfWidth(x, level);
            }

            @Override
            public double predictionHalfWidth(double x, double level) {
                return fit.predictionHalfWidth(x, level);
            }

            @Override
            public double[] standardizedResiduals() {
                return fit.standardizedResiduals();
            }
        };
    }

    /** A quadratic, inverted on the calibrated span [xLow, xHigh] (the root there is the physical one). */
    static CalibrationCurve of(QuadraticFit fit, double xLow, double xHigh) {
        return new CalibrationCurve() {
            @Override
            public double predict(double x) {
                return fit.predict(x);
            }

            @Override
            public double inverse(double y) {
                return fit.inverse(y, xLow, xHigh);
            }

            @Override
            public double confidenceHalfWidth(double x, double level) {
                return fit.confidenceHalfWidth(x, level);
            }

            @Override
            public double predictionHalfWidth(double x, double level) {
                return fit.predictionHalfWidth(x, level);
            }

            @Override
            public double[] standardizedResiduals() {
                return fit.standardizedResiduals();
            }
        };
    }
}
