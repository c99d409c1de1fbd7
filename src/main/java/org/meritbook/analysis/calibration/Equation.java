package org.meritbook.analysis.calibration;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import org.meritbook.stats.Interval;
import org.meritbook.stats.regression.LineFit;
import org.meritbook.stats.regression.LineModel;

/**
 * The calibration equation written out with the column names and units, e.g. "Peak area (mAU·s) =
 * 0.396 + 41.55 · Nominal (mg/L)". For the settings each coefficient is rounded as the dossier rounds a
 * quantity with an interval (the half-width to two significant figures, the value to the same
 * decimals, half up); the trail step carries every digit of the double.
 */
final class Equation {
    private static final String MINUS = "\u2212";
    /** Significant figures of the half-width that set the rounding (as the dossier's formatter). */
    private static final int HALF_WIDTH_SIGNIFICANT = 2;

    private Equation() {
    }

    /** The equation with coefficients rounded by their 95 % intervals. */
    static String rounded(CalibrationData data, LineFit fit) {
        return text(data, fit.model(), round(fit.intercept(), fit.interceptInterval(CalibrationAnalysis.LEVEL)),
                round(fit.slope(), fit.slopeInterval(CalibrationAnalysis.LEVEL)));
    }

    /** The equation with every digit of the fitted coefficients. */
    static String full(CalibrationData data, LineFit fit) {
        return text(data, fit.model(), plain(new BigDecimal(Double.toString(fit.intercept()))),
                plain(new BigDecimal(Double.toString(fit.slope()))));
    }

    private static String text(CalibrationData data, LineModel model, String a, String b) {
        String y = titled(data.responseName(), data.yUnit());
        String x = titled(data.xColumn().name(), data.xUnit());
        if (model == LineModel.THROUGH_ORIGIN) {
            return y + " = " + b + " · " + x;
        }
        // intercept first, as a calibration is usually written; a negative slope reads "a − |b| · x"
        String sign = b.startsWith(MINUS) ? " " + MINUS + " " : " + ";
        String slope = b.startsWith(MINUS) ? b.substring(1) : b;
        return y + " = " + a + sign + slope + " · " + x;
    }

    private static String round(double value, Interval ci) {
        double half = (ci.high() - ci.low()) / 2;
        if (!(half > 0)) {
            return plain(new BigDecimal(value).round(new MathContext(4, RoundingMode.HALF_UP)));
        }
        BigDecimal h = new BigDecimal(half).round(new MathContext(HALF_WIDTH_SIGNIFICANT, RoundingMode.HALF_UP));
        int decimals = Math.min(12, HALF_WIDTH_SIGNIFICANT - 1 - (h.precision() - h.scale() - 1));
        BigDecimal v = new BigDecimal(value).setScale(decimals, RoundingMode.HALF_UP);
        if (decimals < 0) {
            v = v.setScale(0, RoundingMode.UNNECESSARY);
        }
        return plain(v);
    }

    private static String plain(BigDecimal b) {
        String s = b.abs().toPlainString();
        return b.signum() < 0 ? MINUS + s : s;
    }

    private static String titled(String name, String unit) {
        return unit == null ? name : name + " (" + unit + ")";
    }
}
