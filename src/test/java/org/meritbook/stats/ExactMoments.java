package org.meritbook.stats;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.List;

/**
 * Exact reference arithmetic for the tests: the mean and sums of squares of the given doubles
 * (each double is an exact binary fraction, converted to BigDecimal without rounding) carried at
 * 60 significant digits. It separates what an algorithm loses from what the inputs' binary
 * representation has already lost.
 */
public final class ExactMoments {
    private static final MathContext MC = new MathContext(60);

    private ExactMoments() {
    }

    public static BigDecimal mean(double[] values) {
        BigDecimal sum = BigDecimal.ZERO;
        for (double v : values) {
            sum = sum.add(new BigDecimal(v));
        }
        return sum.divide(BigDecimal.valueOf(values.length), MC);
    }

    public static BigDecimal sumOfSquares(double[] values) {
        BigDecimal mean = mean(values);
        BigDecimal ss = BigDecimal.ZERO;
        for (double v : values) {
            BigDecimal d = new BigDecimal(v).subtract(mean, MC);
            ss = ss.add(d.multiply(d, MC), MC);
        }
        return ss;
    }

    public static double sd(double[] values) {
        return sumOfSquares(values).divide(BigDecimal.valueOf(values.length - 1L), MC).sqrt(MC).doubleValue();
    }

    /** Between-group and within-group sums of squares of a one-way layout. */
    public static double[] anovaSums(List<double[]> groups) {
        BigDecimal total = BigDecimal.ZERO;
        long n = 0;
        for (double[] g : groups) {
            for (double v : g) {
                total = total.add(new BigDecimal(v));
            }
            n += g.length;
        }
        BigDecimal grand = total.divide(BigDecimal.valueOf(n), MC);
        BigDecimal between = BigDecimal.ZERO;
        BigDecimal within = BigDecimal.ZERO;
        for (double[] g : groups) {
            BigDecimal d = mean(g).subtract(grand, MC);
            between = between.add(d.multiply(d, MC).multiply(BigDecimal.valueOf(g.length), MC), MC);
            within = within.add(sumOfSquares(g), MC);
        }
        return new double[] {between.doubleValue(), within.doubleValue()};
    }
}
