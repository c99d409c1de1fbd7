package org.meritbook.analysis.calibration;

import java.math.BigDecimal;
import java.util.OptionalInt;
import org.meritbook.analysis.Rounding;
import org.meritbook.stats.Interval;
import org.meritbook.stats.regression.LineFit;
import org.meritbook.stats.regression.LineModel;

/**
 * The calibration equation written out with the column names and units, e.g. "Peak area (mAU·s) =
 * 0.396 + 41.55 · Nominal (mg/L)". For the settings each coefficient is rounded as the dossier rounds a
 * quantity with an interval ({@link Rounding}: the half-width to two significant figures, the value to the
 * same decimals, half up); the trail step carries every digit of the double.
 */
final class Equation {
    private static final String MINUS = "\u2212";
    /** Significant figures of a coefficient whose interval has no width. */
    private static final int FALLBACK_SIGNIFICANT = 4;

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
        OptionalInt decimals = Rounding.intervalDecimals(ci);
        return plain(decimals.isPresent() ? Rounding.toDecimals(value, decimals.getAsInt())
                : Rounding.toSignificant(value, FALLBACK_SIGNIFICANT));
    }

    private static String plain(BigDecimal b) {
        return Rounding.plain(b);
    }

    private static String titled(String name, String unit) {
        return unit == null ? name : name + " (" + unit + ")";
    }
}
