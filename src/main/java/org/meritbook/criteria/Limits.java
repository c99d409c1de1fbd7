package org.meritbook.criteria;

import java.math.BigDecimal;
import java.math.MathContext;

/** Numbers inside verdict texts: six significant figures, trailing zeros dropped (not display rounding). */
final class Limits {
    private Limits() {
    }

    static String text(double v) {
        return new BigDecimal(v).round(new MathContext(6)).stripTrailingZeros().toPlainString().replace('-', '−');
    }
}
