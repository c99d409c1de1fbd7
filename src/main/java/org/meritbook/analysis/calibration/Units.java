package org.meritbook.analysis.calibration;

/** Units of derived calibration quantities, built from the column units as the workbook states them. */
final class Units {
    private Units() {
    }

    /** The unit of a ratio such as the slope: "mAU·s per mg/L"; null when both parts are unitless. */
    static String ratio(String numerator, String denominator) {
        if (numerator == null || denominator == null) {
            return numerator == null && denominator == null ? null
                    : (numerator == null ? "1/(" + denominator + ")" : numerator);
        }
        return numerator + " per " + denominator;
    }

    static String squared(String unit) {
        return unit == null ? null : "(" + unit + ")²";
    }

    /** The unit of a weight 1/s² on the response scale: "1/(mAU·s)²"; null when the response is unitless. */
    static String inverseSquare(String unit) {
        return unit == null ? null : "1/(" + unit + ")²";
    }

    /** The unit of the quadratic coefficient: response per concentration squared. */
    static String perSquare(String numerator, String denominator) {
        return ratio(numerator, squared(denominator));
    }
}
