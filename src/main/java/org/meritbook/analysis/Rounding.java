package org.meritbook.analysis;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.OptionalInt;
import org.meritbook.stats.Interval;

/**
 * The rounding rule for a value with a confidence interval, in one place for the dossier's formatter
 * and for text an analysis writes itself (the calibration equation): the half-width to two
 * significant figures sets the decimals of the value (GUM practice), half up; negative decimals round
 * to tens, hundreds… Display only: results keep every digit.
 */
public final class Rounding {
    /** Significant figures of the interval's half-width. */
    public static final int HALF_WIDTH_SIGNIFICANT = 2;
    /** Never more decimals than this, however narrow the interval. */
    private static final int MAX_DECIMALS = 12;
    private static final String MINUS = "\u2212";

    private Rounding() {
    }

    /** Decimals that give the interval's half-width two significant figures; empty when the half-width is not positive. */
    public static OptionalInt intervalDecimals(Interval ci) {
        double half = (ci.high() - ci.low()) / 2;
        if (!(half > 0)) {
            return OptionalInt.empty();
        }
        return OptionalInt.of(Math.min(MAX_DECIMALS, decimalsFor(half, HALF_WIDTH_SIGNIFICANT)));
    }

    /** Decimal places for {@code sig} significant figures; negative means rounding to tens, hundreds… */
    public static int decimalsFor(double v, int sig) {
        if (v == 0) {
            return sig - 1;
        }
        BigDecimal rounded = new BigDecimal(Math.abs(v)).round(new MathContext(sig, RoundingMode.HALF_UP));
        int exponent = rounded.precision() - rounded.scale() - 1;
        return sig - 1 - exponent;
    }

    /** {@code v} rounded half up to {@code decimals} places (a negative count rounds to tens, hundreds…). */
    public static BigDecimal toDecimals(double v, int decimals) {
        BigDecimal b = new BigDecimal(v).setScale(decimals, RoundingMode.HALF_UP);
        return decimals < 0 ? b.setScale(0, RoundingMode.UNNECESSARY) : b;
    }

    /** {@code v} rounded half up to {@code sig} significant figures. */
    public static BigDecimal toSignificant(double v, int sig) {
        return new BigDecimal(v).round(new MathContext(sig, RoundingMode.HALF_UP));
    }

    /** Plain digits with U+2212 as minus sign; never "−0". */
    public static String plain(BigDecimal b) {
        String s = b.abs().toPlainString();
        return b.signum() < 0 ? MINUS + s : s;
    }
}
