package org.meritbook.workbook;

import org.apache.poi.ss.util.NumberToTextConverter;

/**
 * The display text of a number in the "General" format, without POI's formatting machinery for
 * the common case. POI's {@code DataFormatter} writes such a number as its 15-digit text
 * ({@link NumberToTextConverter}), then parses that again and formats it through
 * {@code BigDecimal} and {@code DecimalFormat} to at most 10 significant digits; for a plain text of
 * at most 10 significant and 10 decimal digits, between 1e-9 and 1e10, that leaves the text
 * unchanged. A measurement is nearly always such a number, and one block may hold 100,000 of
 * them; anything else is left to POI ({@code GeneralNumberTest} compares the two).
 *
 * <p>When the sheet stored the number as a plain decimal of at most 15 significant digits, that text
 * is POI's 15-digit text already, once written without a sign '+', leading zeros or trailing zeros:
 * the double nearest to it lies within 1.2·10<sup>-16</sup> of it (relative), and the 15-digit
 * rounding that POI does is off by more than 5·10<sup>-16</sup> only across the edge of a rounding
 * step, so it gives the stored digits back. Reading them saves POI's exact-binary expansion, the
 * costliest step of reading a large block.
 */
final class GeneralNumber {
    /** Most significant digits, and most decimals, that the "General" format keeps unchanged. */
    private static final int DIGITS = 10;

    private GeneralNumber() {
    }

    /** True for the format text POI reads as "General" (it compares it ignoring case). */
    static boolean isGeneral(String format) {
        return format != null && format.equalsIgnoreCase("General");
    }

    /** The text POI shows for the value in the "General" format, or null when POI's own formatting is needed. */
    static String plain(double value) {
        return plain(value, null);
    }

    /**
     * As {@link #plain(double)}, for a value read from {@code stored}, its text in the sheet (stripped);
     * null when there is none.
     */
    static String plain(double value, String stored) {
        double abs = Math.abs(value);
        if (!(abs >= 1e-9 && abs < 1e10)) {
            return null; // zero, the scientific range, the integers of 11 digits, NaN and infinities
        }
        String text = stored == null ? null : fifteenDigitText(stored);
        if (text == null) {
            text = NumberToTextConverter.toText(value);
        }
        int significant = 0;
        int decimals = -1;
        boolean leading = true;
        for (int i = text.charAt(0) == '-' ? 1 : 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c == '.' && decimals < 0) {
                decimals = 0;
                continue;
            }
            if (c < '0' || c > '9') {
                return null; // an exponent
            }
            if (decimals >= 0) {
                decimals++;
            }
            leading &= c == '0';
            if (!leading) {
                significant++;
            }
        }
        if (significant > DIGITS || decimals > DIGITS || decimals == 0 || (decimals > 0 && text.endsWith("0"))) {
            return null;
        }
        return text;
    }

    /**
     * A plain decimal of at most 15 significant digits ("+012.50", "-.031") written as POI writes its
     * value ("12.5", "-0.031"), or null for any other text (an exponent, more digits, no digit).
     */
    static String fifteenDigitText(String stored) {
        int n = stored.length();
        int point = -1;
        int firstNonZero = -1;
        int lastNonZero = -1;
        for (int i = n > 0 && (stored.charAt(0) == '-' || stored.charAt(0) == '+') ? 1 : 0; i < n; i++) {
            char c = stored.charAt(i);
            if (c == '.' && point < 0) {
                point = i;
            } else if (c < '0' || c > '9') {
                return null;
            } else if (c != '0') {
                firstNonZero = firstNonZero < 0 ? i : firstNonZero;
                lastNonZero = i;
            }
        }
        if (firstNonZero < 0) {
            return null; // zero, or no digit at all
        }
        // The digits that rounding could touch run from the first non-zero one to the last; zeros
        // outside them only place the point.
        int significant = lastNonZero - firstNonZero + 1 - (point > firstNonZero && point < lastNonZero ? 1 : 0);
        if (significant > 15) {
            return null;
        }
        int integerEnd = point < 0 ? n : point;
        int start = stored.charAt(0) == '-' ? 1 : 0;
        boolean asWritten = stored.charAt(0) != '+'
                && (firstNonZero < integerEnd ? firstNonZero == start : integerEnd == start + 1 && stored.charAt(start) == '0')
                && (point < 0 || lastNonZero == n - 1);
        if (asWritten) {
            return stored; // the usual case: the one text serves the sheet's rows and the block
        }
        StringBuilder out = new StringBuilder(n + 1);
        if (stored.charAt(0) == '-') {
            out.append('-');
        }
        if (firstNonZero < integerEnd) {
            out.append(stored, firstNonZero, integerEnd);
        } else {
            out.append('0');
        }
        if (point >= 0 && lastNonZero > point) {
            out.append('.').append(stored, point + 1, lastNonZero + 1);
        }
        return out.toString();
    }
}
