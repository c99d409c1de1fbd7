package org.meritbook.analysis.calibration;

import java.util.Locale;
import org.meritbook.analysis.SectionBuilder;

/**
 * A fit whose residuals are at rounding level: every response on the curve. The results stand (the
 * line is the line), but measured data rarely do this, the intervals have zero width, and the tests
 * that need residual scatter are not evaluable; the section says so.
 */
final class PerfectFit {
    /**
     * s(y/x) at or below this fraction of the responses' spread is rounding, not scatter (the level
     * Mandel's test uses for the same question; common practice, no source).
     */
    static final double ROUNDING_LEVEL = 1e-12;

    private PerfectFit() {
    }

    /** Whether the fit is perfect; when it is, the section gets its warning. */
    static boolean check(SectionBuilder section, double residualSd, double[] y, String yUnit) {
        double mean = 0;
        for (double v : y) {
            mean += v / y.length;
        }
        double ss = 0;
        for (double v : y) {
            ss += (v - mean) * (v - mean);
        }
        double spread = Math.sqrt(ss / (y.length - 1));
        if (residualSd > ROUNDING_LEVEL * spread) {
            return false;
        }
        section.warning(String.format(Locale.ROOT, "Perfect fit: every response lies on the fitted curve (s(y/x) = %.3g%s"
                + " against a response spread of %.4g), which measured responses rarely do. Check that the responses"
                + " are measured values, not computed ones; the confidence intervals have zero width.",
                residualSd, yUnit == null ? "" : " " + yUnit, spread));
        return true;
    }
}
