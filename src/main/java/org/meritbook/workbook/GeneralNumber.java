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
        double abs = Math.abs(value);
        if (!(abs >= 1e-9 && abs < 1e10)) {
            return null; // zero, the scientific range, the integers of 11 digits, NaN and infinities
        }
        String text = NumberToTextConverter.toText(value);
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
}
