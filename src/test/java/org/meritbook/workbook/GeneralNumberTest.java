package org.meritbook.workbook;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Locale;
import java.util.SplittableRandom;
import org.apache.poi.ss.usermodel.DataFormatter;
import org.apache.poi.ss.util.NumberToTextConverter;
import org.junit.jupiter.api.Test;

/**
 * {@link GeneralNumber} gives POI's own "General" text wherever it answers: checked against POI's
 * {@code DataFormatter} (the reference library), on numbers as sheets hold them (measurements of
 * a few decimals, integers, ties at the tenth significant digit) and on random doubles.
 */
class GeneralNumberTest {
    private final DataFormatter poi = new DataFormatter(Locale.US);

    private void samePoi(double value) {
        String quick = GeneralNumber.plain(value);
        if (quick != null) {
            assertEquals(poi.formatRawCellContents(value, 0, "General"), quick, () -> "value " + value);
        }
    }

    @Test
    void measurementsAndIntegersAreShownAsPoiShowsThem() {
        for (double v : new double[] {2.0312, -0.031, 20.0, 1, 9_999_999_999.0, 123_456.789, 0.5, 1e-9, 0.1 + 0.2,
            4.35e-5, 1234.56789, 0.000_000_001_5}) {
            samePoi(v);
            samePoi(-v);
        }
        assertEquals("2.0312", GeneralNumber.plain(2.0312));
        assertEquals("-0.5", GeneralNumber.plain(-0.5));
        assertEquals("9999999999", GeneralNumber.plain(9_999_999_999.0));
    }

    @Test
    void leavesToPoiWhatItWouldChange() {
        assertNull(GeneralNumber.plain(0)); // POI writes 0 and -0 its own way
        assertNull(GeneralNumber.plain(1e10)); // 11 digits
        assertNull(GeneralNumber.plain(1e-10)); // POI's scientific range
        assertNull(GeneralNumber.plain(1.23456789012)); // 12 significant digits
        assertNull(GeneralNumber.plain(Double.NaN));
        assertNull(GeneralNumber.plain(Double.POSITIVE_INFINITY));
        assertTrue(GeneralNumber.isGeneral("general") && !GeneralNumber.isGeneral("0.00") && !GeneralNumber.isGeneral(null));
    }

    @Test
    void randomNumbersAgreeWithPoi() {
        SplittableRandom r = new SplittableRandom(20261203L);
        for (int k = 0; k < 100_000; k++) {
            double v = switch (k % 5) {
                case 0 -> Double.longBitsToDouble(r.nextLong());
                case 1 -> r.nextLong(1, 1_000_000_000_000_000L) / Math.pow(10, r.nextInt(0, 20)); // up to 15 digits
                case 2 -> Math.round(r.nextGaussian() * 1e4 * Math.pow(10, r.nextInt(-6, 8))) / 1e4;
                case 3 -> (r.nextLong(1, 100_000_000_000L) * 10 + 5) / Math.pow(10, r.nextInt(1, 14)); // a 5 to round
                default -> r.nextDouble() * Math.pow(10, r.nextInt(-12, 12));
            };
            if (Double.isFinite(v)) {
                samePoi(r.nextBoolean() ? v : -v);
            }
        }
    }

    @Test
    void aStoredDecimalIsWrittenAsPoiWritesItsValue() {
        assertEquals("12.5", GeneralNumber.fifteenDigitText("+012.50"));
        assertEquals("-0.031", GeneralNumber.fifteenDigitText("-.031"));
        assertEquals("5", GeneralNumber.fifteenDigitText("5."));
        assertEquals("1200", GeneralNumber.fifteenDigitText("1200.00"));
        assertEquals("123456789012345", GeneralNumber.fifteenDigitText("123456789012345"));
        assertEquals("0.000123456789012345", GeneralNumber.fifteenDigitText("0.000123456789012345"));
        assertNull(GeneralNumber.fifteenDigitText("1234567890123456")); // 16 digits: POI rounds them
        assertNull(GeneralNumber.fifteenDigitText("1.5E-3"));
        assertNull(GeneralNumber.fifteenDigitText("-0.000"));
        assertNull(GeneralNumber.fifteenDigitText("."));
        assertNull(GeneralNumber.fifteenDigitText("1.2.3"));
        String canonical = "-0.031";
        assertTrue(GeneralNumber.fifteenDigitText(canonical) == canonical, "a text already in POI's form is kept, not copied");
        assertEquals("0.5", GeneralNumber.fifteenDigitText("00.5"));
        assertEquals("7", GeneralNumber.fifteenDigitText("07"));
        assertEquals("70", GeneralNumber.fifteenDigitText("70"));
    }

    /** Texts as sheets store them, 1 to 17 significant digits at many scales, against POI's own conversion of their value. */
    @Test
    void randomStoredDecimalsAgreeWithPoi() {
        SplittableRandom r = new SplittableRandom(20261204L);
        int compared = 0;
        for (int k = 0; k < 100_000; k++) {
            int digits = r.nextInt(1, 18);
            StringBuilder d = new StringBuilder();
            d.append((char) ('1' + r.nextInt(9)));
            for (int i = 1; i < digits; i++) {
                d.append(k % 7 == 0 && i == digits - 1 ? '5' : (char) ('0' + r.nextInt(10))); // some ties at the last digit
            }
            int pointAt = r.nextInt(-12, digits + 12); // the point before, inside or after the digits
            String text = pointAt <= 0 ? "0." + "0".repeat(-pointAt) + d
                    : pointAt >= digits ? d + "0".repeat(pointAt - digits) + (r.nextBoolean() ? ".0" : "")
                    : d.substring(0, pointAt) + "." + d.substring(pointAt) + "0".repeat(r.nextInt(3));
            text = (r.nextInt(4) == 0 ? "-" : "") + text;
            double value = Double.parseDouble(text);
            String fromText = GeneralNumber.fifteenDigitText(text);
            String poiText = NumberToTextConverter.toText(value);
            if (fromText != null && !poiText.contains("E")) {
                assertEquals(poiText, fromText, text);
                compared++;
            }
            String quick = GeneralNumber.plain(value, text);
            assertEquals(GeneralNumber.plain(value), quick, text);
            if (quick != null) {
                assertEquals(poi.formatRawCellContents(value, 0, "General"), quick, text);
            }
        }
        assertTrue(compared > 40_000, "compared " + compared);
    }
}
