package org.meritbook.workbook;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Locale;
import java.util.SplittableRandom;
import org.apache.poi.ss.usermodel.DataFormatter;
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
}
