package org.meritbook.trail;

import java.math.BigDecimal;

/**
 * Writes a double so that a reviewer can recompute from it: the shortest decimal that reads back
 * to the same double, in plain notation for ordinary magnitudes and scientific otherwise.
 */
public final class FullPrecision {
    private FullPrecision() {
    }

    public static String of(double v) {
        if (!Double.isFinite(v)) {
            return Double.toString(v);
        }
        if (v == 0) {
            return "0";
        }
        double a = Math.abs(v);
        BigDecimal d = new BigDecimal(Double.toString(v)).stripTrailingZeros();
        if (a >= 1e-6 && a < 1e15) {
            return d.toPlainString();
        }
        return d.toString().replace("E+", "e").replace("E", "e");
    }
}
