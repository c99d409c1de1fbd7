package org.meritbook.dossier;

import java.math.BigDecimal;
import java.math.RoundingMode;
import org.meritbook.analysis.NumberKind;
import org.meritbook.analysis.Quantity;
import org.meritbook.analysis.Rounding;
import org.meritbook.stats.Interval;

/**
 * The one place where numbers become display text (rules in docs/dossier.md). Locale-independent:
 * full stop as decimal mark, no digit grouping, U+2212 as minus sign, a space before every unit
 * including %. Values are rounded only here, for display; results.json keeps full precision.
 */
public final class DisplayFormatter {
    static final String MINUS = "\u2212";
    private static final int DEFAULT_SIGNIFICANT = 4;
    private static final int TRAIL_SIGNIFICANT = 6;

    /** How one quantity reads in the dossier. {@code uncertainty} is empty when there is no interval. */
    public record Formatted(String value, String unit, String withUnit, String uncertainty) {
    }

    public Formatted quantity(Quantity q) {
        return number(q.value(), q.unit(), q.interval(), q.kind());
    }

    /**
     * A value of this kind of number, with its interval or null: the interval sets the rounding
     * unless the kind has its own (counts, p-values, correlations).
     */
    public Formatted number(double v, String unitOrNull, Interval ci, NumberKind kind) {
        String unit = unitOrNull == null ? "" : unitOrNull;
        if (ci != null && kind.roundedByInterval()) {
            // The interval sets the rounding: half-width to two significant figures, value alike.
            int d = uncertaintyDecimals(ci);
            String value = fixed(v, d);
            String limits = level(ci) + " CI " + fixed(ci.low(), d) + " to " + fixed(ci.high(), d) + withSpace(unit);
            String withUnit = symmetric(v, ci)
                    ? value + " ± " + fixed((ci.high() - ci.low()) / 2, d) + withSpace(unit)
                    : value + withSpace(unit);
            return new Formatted(value, unit, withUnit, limits);
        }
        String value = switch (kind) {
            case COUNT -> fixed(v, 0);
            case CORRELATION -> correlation(v);
            case P_VALUE -> pValue(v);
            case PERCENT -> fixed(v, Math.max(1, decimalsFor(v, 2)));
            case MEASURE, STATISTIC, RATIO -> significant(v, DEFAULT_SIGNIFICANT);
        };
        String uncertainty = ci == null ? "" : level(ci) + " CI " + significant(ci.low(), DEFAULT_SIGNIFICANT)
                + " to " + significant(ci.high(), DEFAULT_SIGNIFICANT);
        return new Formatted(value, unit, value + withSpace(unit), uncertainty);
    }

    /** A quantity's confidence interval by its limits, without unit or level ("0.007 to 0.027"), or empty. */
    public String limits(Quantity q) {
        Interval ci = q.interval();
        if (ci == null) {
            return "";
        }
        if (q.kind().roundedByInterval()) {
            int d = uncertaintyDecimals(ci);
            return fixed(ci.low(), d) + " to " + fixed(ci.high(), d);
        }
        return significant(ci.low(), DEFAULT_SIGNIFICANT) + " to " + significant(ci.high(), DEFAULT_SIGNIFICANT);
    }

    /**
     * A trail value: six significant figures, enough for a reviewer to recompute the next step, with
     * trailing zeros dropped so that a cell value 0.05 reads 0.05, not 0.0500000.
     */
    public String trailValue(double v, String unit) {
        if (Double.isNaN(v)) {
            return "";
        }
        return stripZeros(significant(v, TRAIL_SIGNIFICANT)) + withSpace(unit == null ? "" : unit);
    }

    private static String stripZeros(String s) {
        if (s.contains("×") || !s.contains(".")) {
            return s;
        }
        String t = s.replaceAll("0+$", "");
        return t.endsWith(".") ? t.substring(0, t.length() - 1) : t;
    }

    /** A file size in plain digits (digit grouping would differ between locales). */
    public String bytes(long n) {
        return n + (n == 1 ? " byte" : " bytes");
    }

    static String withSpace(String unit) {
        return unit == null || unit.isEmpty() ? "" : " " + unit;
    }

    /** Four decimals; more (up to eight) when four would show a value below 1 as 1.0000. */
    static String correlation(double v) {
        int d = 4;
        while (d < 8 && Math.abs(v) < 1 && new BigDecimal(v).setScale(d, RoundingMode.HALF_UP).abs()
                .compareTo(BigDecimal.ONE) == 0) {
            d++;
        }
        return fixed(v, d);
    }

    static String pValue(double p) {
        return p < 0.001 ? "< 0.001" : fixed(p, 3);
    }

    static boolean symmetric(double value, Interval ci) {
        if (ci == null) {
            return false;
        }
        double half = (ci.high() - ci.low()) / 2;
        double centre = (ci.high() + ci.low()) / 2;
        return Math.abs(centre - value) <= 1e-9 * Math.max(Math.abs(value), half);
    }

    static String level(Interval ci) {
        BigDecimal pct = BigDecimal.valueOf(ci.level()).movePointRight(2).stripTrailingZeros();
        return pct.toPlainString() + " %";
    }

    /** Decimal places that give the interval's half-width two significant figures (GUM practice). */
    static int uncertaintyDecimals(Interval ci) {
        return Rounding.intervalDecimals(ci).orElse(DEFAULT_SIGNIFICANT);
    }

    /** Decimal places for {@code sig} significant figures; negative means rounding to tens, hundreds… */
    static int decimalsFor(double v, int sig) {
        return Rounding.decimalsFor(v, sig);
    }

    /**
     * {@code sig} significant figures in plain notation for 1e-4 ≤ |v| < 1e7, never dropping integer
     * digits; scientific ("1.234 × 10⁻⁵") outside that range.
     */
    static String significant(double v, int sig) {
        double a = Math.abs(v);
        if (a != 0 && (a < 1e-4 || a >= 1e7)) {
            return scientific(v, sig);
        }
        return fixed(v, Math.max(0, decimalsFor(v, sig)));
    }

    static String fixed(double v, int decimals) {
        return Rounding.plain(Rounding.toDecimals(v, decimals));
    }

    static String scientific(double v, int sig) {
        BigDecimal b = Rounding.toSignificant(v, sig);
        int exponent = b.precision() - b.scale() - 1;
        BigDecimal mantissa = b.movePointLeft(exponent).setScale(sig - 1, RoundingMode.HALF_UP);
        String m = mantissa.abs().toPlainString();
        return (mantissa.signum() < 0 ? MINUS : "") + m + " × 10" + superscript(exponent);
    }

    private static String superscript(int n) {
        String digits = "⁰¹²³⁴⁵⁶⁷⁸⁹";
        StringBuilder b = new StringBuilder();
        if (n < 0) {
            b.append('⁻');
        }
        for (char c : Integer.toString(Math.abs(n)).toCharArray()) {
            b.append(digits.charAt(c - '0'));
        }
        return b.toString();
    }
}
