package org.meritbook.workbook;

import java.util.regex.Pattern;

/**
 * A number written as text (a sheet's stored value, a CSV field, a number typed as text) read
 * faithfully as a finite double, or the reason it cannot be: "NaN" and "INF" are not measurements,
 * 1e309 lies beyond the largest double (about 1.8·10^308) and 1e-400 below the smallest (about
 * 4.9·10^-324), so reading them would give ∞ or 0, a number the sheet does not hold. Values inside
 * the range, subnormal ones included, are read to the nearest double, as any program reads them.
 */
final class StoredNumber {
    /** Plain decimal number: sign, digits, optional '.' fraction, optional exponent. */
    static final Pattern DECIMAL = Pattern.compile("[+-]?(?:\\d+\\.?\\d*|\\.\\d+)(?:[eE][+-]?\\d+)?");
    /** The spellings of not-a-number and infinity that programs write (XML Schema, Java, C, Excel exports). */
    private static final Pattern NOT_FINITE = Pattern.compile("(?i)[+-]?(?:nan|inf|infinity|1\\.#inf|1\\.#qnan|1\\.#ind)");

    private StoredNumber() {
    }

    /**
     * @param value   the number when {@code problem} is null
     * @param problem why the text is no finite number, phrased for the "found" part of a message; null
     *                when it is one; also null, with {@code decimal} false, for text that does not look
     *                like a number at all
     * @param decimal whether the text has the form of a decimal number (or of NaN/infinity)
     */
    record Parsed(double value, String problem, boolean decimal) {
        boolean ok() {
            return decimal && problem == null;
        }
    }

    static Parsed parse(String text) {
        String t = text.strip();
        boolean plain = plainDecimal(t);
        if (!plain && NOT_FINITE.matcher(t).matches()) {
            return new Parsed(Double.NaN, "the stored value '" + t + "', which is not a finite number", true);
        }
        if (!plain && !DECIMAL.matcher(t).matches()) {
            return new Parsed(Double.NaN, null, false);
        }
        double d = Double.parseDouble(t);
        if (Double.isInfinite(d)) {
            return new Parsed(Double.NaN, "the number " + t
                    + ", which is beyond the largest number a double holds (about 1.8e308)", true);
        }
        if (d == 0 && hasNonZeroDigit(t)) {
            return new Parsed(Double.NaN, "the number " + t
                    + ", which is below the smallest number a double holds (about 4.9e-324) and would read as 0", true);
        }
        return new Parsed(d, null, true);
    }

    /**
     * True for the commonest form, digits with at most one point and no exponent ("12.5", "-0.031"):
     * a {@link #DECIMAL} number and no spelling of NaN or infinity, told without the two regular
     * expressions (a sheet's stored values are read 100,000 at a time).
     */
    private static boolean plainDecimal(String t) {
        int i = !t.isEmpty() && (t.charAt(0) == '-' || t.charAt(0) == '+') ? 1 : 0;
        boolean digit = false;
        boolean point = false;
        for (; i < t.length(); i++) {
            char c = t.charAt(i);
            if (c >= '0' && c <= '9') {
                digit = true;
            } else if (c == '.' && !point) {
                point = true;
            } else {
                return false;
            }
        }
        return digit;
    }

    private static boolean hasNonZeroDigit(String t) {
        int e = Math.max(t.indexOf('e'), t.indexOf('E'));
        String mantissa = e < 0 ? t : t.substring(0, e);
        return mantissa.chars().anyMatch(ch -> ch >= '1' && ch <= '9');
    }
}
