package org.meritbook.stats;

/**
 * Log relative error, the accuracy measure NIST uses for its StRD (McCullough, "Assessing the
 * reliability of statistical software", The American Statistician 52, 1998): the number of
 * significant digits on which a computed value agrees with a certified one.
 */
public final class Lre {

    /** Digits a double can carry; a perfect match scores this. */
    public static final double CAP = 15.9;

    private Lre() {
    }

    public static double of(double computed, double certified) {
        double error = certified == 0 ? Math.abs(computed) : Math.abs(computed - certified) / Math.abs(certified);
        return error == 0 ? CAP : Math.min(CAP, -Math.log10(error));
    }
}
